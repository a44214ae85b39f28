package org.littoral.scenarios.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class NiceTicksTest {
    // Heckbert (1990), "Nice numbers for graph labels", Graphics Gems, p. 61: "if the data range is
    // 105 to 543, we'd probably want to plot the range from 100 to 600 and put tick marks every 100
    // units"; "if the data range is 2.03 to 2.17, ... a range from 2.00 to 2.20 with a tick spacing
    // of .05". Both are the paper's loose labelling with 5 ticks (its Fig. 1 uses ntick = 5).
    @Test
    void looseLabelling105To543GivesHundredsFrom100To600() {
        NiceTicks t = NiceTicks.loose(105, 543, 5);
        assertEquals(100, t.graphMin(), 1e-12);
        assertEquals(600, t.graphMax(), 1e-12);
        assertEquals(100, t.spacing(), 1e-12);
        assertArrayEquals(new double[] {100, 200, 300, 400, 500, 600}, t.values(), 1e-9);
        assertEquals(0, t.fractionDigits());
        assertEquals("100", t.label(0));
    }

    @Test
    void looseLabelling2point03To2point17GivesFiveHundredthsFrom2To2point2() {
        NiceTicks t = NiceTicks.loose(2.03, 2.17, 5);
        assertEquals(2.00, t.graphMin(), 1e-12);
        assertEquals(2.20, t.graphMax(), 1e-12);
        assertEquals(0.05, t.spacing(), 1e-12);
        assertEquals(5, t.count());
        // Heckbert: nfrac = max(-floor(log10(0.05)), 0) = 2 fraction digits
        assertEquals(2, t.fractionDigits());
        assertEquals("2.05", t.label(1));
        assertEquals("2.20", t.label(4));
    }

    // nicenum by hand from Heckbert's thresholds: round: <1.5 -> 1, <3 -> 2, <7 -> 5, else 10;
    // ceiling: <=1 -> 1, <=2 -> 2, <=5 -> 5, else 10.
    @Test
    void niceNumberFollowsHeckbertThresholds() {
        assertEquals(500, NiceTicks.niceNumber(438, false), 1e-9);
        assertEquals(100, NiceTicks.niceNumber(125, true), 1e-9);
        assertEquals(0.2, NiceTicks.niceNumber(0.14, false), 1e-12);
        assertEquals(0.05, NiceTicks.niceNumber(0.05, true), 1e-12);
        assertEquals(2, NiceTicks.niceNumber(1.5, true), 1e-12);
        assertEquals(10, NiceTicks.niceNumber(7, true), 1e-12);
        assertEquals(5, NiceTicks.niceNumber(5, false), 1e-12);
        assertEquals(10, NiceTicks.niceNumber(5.01, false), 1e-12);
    }

    @Test
    void withinKeepsTheDataRangeAndPutsTicksInsideIt() {
        NiceTicks t = NiceTicks.within(-40.25, 80.25, 7);
        assertEquals(-40.25, t.graphMin(), 0);
        assertEquals(80.25, t.graphMax(), 0);
        for (double v : t.values()) {
            assertTrue(v >= -40.25 && v <= 80.25, "tick " + v + " outside range");
        }
        assertArrayEquals(new double[] {-40, -20, 0, 20, 40, 60, 80}, t.values(), 1e-9);
    }

    // By hand from Heckbert's algorithm: range = nicenum(12, false) = 20, d = nicenum(20 / 6, true) = 5,
    // graph range -10 .. 10: the range rounding makes loose labels coarse for small tick counts.
    @Test
    void negativeLabelsUseATrueMinusSignAndZeroHasNoSign() {
        NiceTicks t = NiceTicks.loose(-6, 6, 7);
        assertArrayEquals(new double[] {-10, -5, 0, 5, 10}, t.values(), 1e-12);
        assertEquals("\u221210", t.label(0));
        assertEquals("0", t.label(2));
    }

    @Test
    void roundOutEndsOnTicksNearTheRequestedSpacing() {
        // spacing nicenum(5.8 / 3, true) = 2 -> [0, 6]; nicenum(4.2 / 3) = 1 -> [0, 5]
        assertArrayEquals(new double[] {0, 6}, NiceTicks.roundOut(0, 5.8, 4), 1e-12);
        assertArrayEquals(new double[] {0, 5}, NiceTicks.roundOut(0, 4.2, 4), 1e-12);
        // (304.6 - 299.7) / 5 = 0.98 -> nicenum 1 -> [299, 305]
        assertArrayEquals(new double[] {299, 305}, NiceTicks.roundOut(299.7, 304.6, 6), 1e-9);
    }

    @Test
    void degenerateRangeIsWidenedInsteadOfFailing() {
        NiceTicks t = NiceTicks.loose(5, 5, 5);
        assertTrue(t.graphMin() < 5 && t.graphMax() > 5);
    }
}
