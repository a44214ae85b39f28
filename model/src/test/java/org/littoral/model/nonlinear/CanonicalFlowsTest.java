package org.littoral.model.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CanonicalFlowsTest {

    /** Benjamin (1968): energy-conserving full-depth lock exchange, front speed 0.5 sqrt(g' H); 10 % tolerance. */
    @Test
    void lockExchangeFrontRunsAtHalfTheLongWaveSpeed() {
        CanonicalFlows.LockExchange le = CanonicalFlows.lockExchange(1000.0, 1.0, 256, 100.0, 20, 1800.0);
        System.out.println("lock exchange Froude number " + le.froudeNumber());
        assertEquals(0.5, le.froudeNumber(), 0.05);
    }

    /** Haurwitz (1947), from memory: the breeze turns clockwise in the Northern Hemisphere, anticlockwise in the Southern. */
    @Test
    void breezeHodographTurnsClockwiseInTheNorthAndAnticlockwiseInTheSouth() {
        double[] north = CanonicalFlows.breezeHodographArea(45.0);
        double[] south = CanonicalFlows.breezeHodographArea(-45.0);
        System.out.println("hodograph area N " + north[0] + " S " + south[0] + " peak " + north[1]);
        assertTrue(north[1] > 0.5, "the breeze must form; peak " + north[1]);
        assertTrue(north[0] < 0, "NH area " + north[0]);
        assertTrue(south[0] > 0, "SH area " + south[0]);
    }

    /** Tennekes (1973) zero-order jump with A = 0.2 (from memory): h^2 = h0^2 + 2 (1 + 2A) Integral(H dt) / gamma. */
    @Test
    void slabMixedLayerOverHeatedLandFollowsTheZeroOrderJumpAndTheResolvedLayerAgrees() {
        double[] r = CanonicalFlows.heatedColumn(200.0, 0.005, 0.2, 12.0);
        assertEquals(r[1], r[0], 0.05 * r[1]);
        assertEquals(r[0], r[2], 0.15 * r[0], "resolved well-mixed depth " + r[2]);
    }
}
