package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.littoral.scenarios.sweep.BreezeSectors.Type;

/**
 * Breeze types (REFERENCES.md section 3; NH corkscrew = land on the left looking downwind, from memory,
 * consistent with common practice). Worked geometry: a south-facing coast (land to the north, land-to-sea
 * bearing 180 deg, like the south coast of England in Steele et al. 2013): a westerly blows towards the east
 * with the land on its left, so it is a corkscrew in the Northern Hemisphere.
 */
class BreezeSectorsTest {
    final BreezeSectors q = BreezeSectors.QUADRANTS;

    @Test
    void aWesterlyOnASouthFacingNorthernCoastIsACorkscrew() {
        assertEquals(Type.CORKSCREW, q.classify(270, 5, 180, 50));
        assertEquals(Type.BACKDOOR, q.classify(90, 5, 180, 50));
    }

    @Test
    void theSouthernHemisphereIsMirrored() {
        assertEquals(Type.BACKDOOR, q.classify(270, 5, 180, -35));
        assertEquals(Type.CORKSCREW, q.classify(90, 5, 180, -35));
    }

    @Test
    void windFromTheSeaIsSynopticAndWindFromTheLandIsPure() {
        assertEquals(Type.SYNOPTIC, q.classify(180, 5, 180, 50));
        assertEquals(Type.PURE, q.classify(0, 5, 180, 50));
        assertEquals(Type.SYNOPTIC, q.classify(270, 5, 270, 40)); // west-facing coast, westerly
    }

    @Test
    void aWeakAmbientWindIsPureWhateverItsDirection() {
        assertEquals(Type.PURE, q.classify(180, 0.5, 180, 50));
    }

    @Test
    void theSectorHalfWidthMovesTheBoundary() {
        // 40 deg off the coastline towards the sea side: shore-parallel with quadrants, onshore with 30 deg sectors.
        assertEquals(Type.CORKSCREW, q.classify(230, 5, 180, 50));
        assertEquals(Type.SYNOPTIC, new BreezeSectors(30, 1).classify(230, 5, 180, 50));
    }

    @Test
    void theOnshoreComponentFollowsTheCoastConvention() {
        assertEquals(5.0, BreezeSectors.onshoreComponentMPerS(180, 5, 180), 1e-12);
        assertEquals(-5.0, BreezeSectors.onshoreComponentMPerS(0, 5, 180), 1e-12);
        // westerly on a south-facing coast blows towards -y (y is 90 deg left of inland = west)
        assertEquals(-5.0, BreezeSectors.alongshoreComponentMPerS(270, 5, 180), 1e-12);
    }
}
