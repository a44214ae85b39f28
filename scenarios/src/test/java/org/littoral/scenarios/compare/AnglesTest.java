package org.littoral.scenarios.compare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

/** Circular differences; check values from the definition (shortest signed turn, wrapped to (-180, 180]). */
class AnglesTest {

    @Test
    void tenDegreesAgainstThreeHundredFiftyIsTwentyDegreesClockwise() {
        assertEquals(20.0, Angles.differenceDeg(10, 350), 1e-12);
        assertEquals(-20.0, Angles.differenceDeg(350, 10), 1e-12);
    }

    @Test
    void oppositeDirectionsDifferByPlusOneEightyWhicheverWayRound() {
        assertEquals(180.0, Angles.differenceDeg(0, 180), 1e-12);
        assertEquals(180.0, Angles.differenceDeg(180, 0), 1e-12);
        assertEquals(180.0, Angles.wrapDeg(-180), 1e-12);
        assertEquals(180.0, Angles.wrapDeg(540), 1e-12);
    }

    @Test
    void equalDirectionsDifferByZeroAcrossNorth() {
        assertEquals(0.0, Angles.differenceDeg(360, 0), 1e-12);
        assertEquals(0.0, Angles.differenceDeg(720, 0), 1e-12);
    }

    @Test
    void missingDirectionGivesNaN() {
        assertTrue(Double.isNaN(Angles.differenceDeg(Double.NaN, 10)));
    }

    /** Property: the wrapped difference lies in (-180, 180] and turns b onto a (same unit vector). */
    @RepeatedTest(20)
    void wrappedDifferenceIsInRangeAndTurnsOneDirectionOntoTheOther(RepetitionInfo info) {
        Random r = new Random(1993L + info.getCurrentRepetition());
        for (int i = 0; i < 500; i++) {
            double a = (r.nextDouble() - 0.5) * 2000;
            double b = (r.nextDouble() - 0.5) * 2000;
            double d = Angles.differenceDeg(a, b);
            assertTrue(d > -180 && d <= 180, "difference " + d);
            assertEquals(Math.cos(Math.toRadians(a)), Math.cos(Math.toRadians(b + d)), 1e-9);
            assertEquals(Math.sin(Math.toRadians(a)), Math.sin(Math.toRadians(b + d)), 1e-9);
        }
    }
}
