package org.littoral.scenarios.analysis.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;

class BreezeTypingTest {
    // Sea to the east (bearing land to sea 90 deg), Northern Hemisphere.
    final Coast east = new Coast(40, -74, -5, 90, 180);
    final Coast eastSouth = new Coast(-35, 150, 10, 90, 15);
    final BreezeTyping typing = BreezeTyping.defaults();

    @Test
    void windFromTheWestIsOffshoreAndGivesAPureBreeze() {
        double[] w = Coast.eastNorthFromDirection(6, 270);
        assertEquals(BreezeType.PURE, typing.classify(w[0], w[1], east));
    }

    @Test
    void windFromTheSeaIsSynoptic() {
        double[] w = Coast.eastNorthFromDirection(6, 90);
        assertEquals(BreezeType.SYNOPTIC, typing.classify(w[0], w[1], east));
    }

    @Test
    void northboundFlowOnAnEastCoastHasLandOnTheLeftAndIsCorkscrewInTheNorth() {
        // Blowing from the south towards the north: looking downwind the land (west) is on the left.
        double[] w = Coast.eastNorthFromDirection(6, 180);
        assertEquals(BreezeType.CORKSCREW, typing.classify(w[0], w[1], east));
    }

    @Test
    void southboundFlowOnAnEastCoastIsBackdoorInTheNorth() {
        double[] w = Coast.eastNorthFromDirection(6, 0);
        assertEquals(BreezeType.BACKDOOR, typing.classify(w[0], w[1], east));
    }

    @Test
    void theSouthernHemisphereMirrorsCorkscrewAndBackdoor() {
        double[] w = Coast.eastNorthFromDirection(6, 180);
        assertEquals(BreezeType.BACKDOOR, typing.classify(w[0], w[1], eastSouth));
        double[] w2 = Coast.eastNorthFromDirection(6, 0);
        assertEquals(BreezeType.CORKSCREW, typing.classify(w2[0], w2[1], eastSouth));
    }

    @Test
    void weakAmbientWindIsPureWhateverItsDirection() {
        double[] w = Coast.eastNorthFromDirection(1.5, 90);
        assertEquals(BreezeType.PURE, typing.classify(w[0], w[1], east));
    }

    @Test
    void narrowerOnshoreSectorTurnsAnObliqueOnshoreWindIntoShoreParallel() {
        double[] w = Coast.eastNorthFromDirection(6, 130); // 40 deg off the onshore direction
        assertEquals(BreezeType.SYNOPTIC, typing.classify(w[0], w[1], east));
        assertEquals(BreezeType.CORKSCREW, new BreezeTyping(30, 45, 2).classify(w[0], w[1], east));
    }

    @Test
    void missingAmbientWindIsUndetermined() {
        assertEquals(BreezeType.UNDETERMINED, typing.classify(Double.NaN, Double.NaN, east));
    }
}
