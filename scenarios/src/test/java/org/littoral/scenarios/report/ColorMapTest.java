package org.littoral.scenarios.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ColorMapTest {
    // ColorBrewer RdBu end anchors (#053061 dark blue, #67001f dark red) with a pure white centre.
    @Test
    void divergingMapIsBlueAtMinWhiteAtCentreRedAtMax() {
        ColorMap m = ColorMap.diverging();
        assertEquals(0x053061, m.rgb(0));
        assertEquals(0xffffff, m.rgb(0.5));
        assertEquals(0x67001f, m.rgb(1));
        int lo = m.rgb(0.2);
        int hi = m.rgb(0.8);
        assertTrue((lo & 0xff) > (lo >> 16), "negative side is blue");
        assertTrue((hi >> 16) > (hi & 0xff), "positive side is red");
    }

    // viridis end points #440154 and #fde725 (van der Walt and Smith 2015).
    @Test
    void sequentialMapRunsFromDarkPurpleToYellowWithRisingLightness() {
        ColorMap m = ColorMap.sequential();
        assertEquals(0x440154, m.rgb(0));
        assertEquals(0xfde725, m.rgb(1));
        double prev = -1;
        for (int i = 0; i <= 20; i++) {
            int c = m.rgb(i / 20.0);
            // Rec. 709 luma as a monotonicity proxy
            double y = 0.2126 * (c >> 16) + 0.7152 * ((c >> 8) & 0xff) + 0.0722 * (c & 0xff);
            assertTrue(y > prev, "lightness rises at t = " + i / 20.0);
            prev = y;
        }
    }

    @Test
    void positionsOutsideZeroToOneAreClamped() {
        ColorMap m = ColorMap.diverging();
        assertEquals(m.rgb(0), m.rgb(-3));
        assertEquals(m.rgb(1), m.rgb(7));
    }
}
