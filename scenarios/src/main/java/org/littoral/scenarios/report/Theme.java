package org.littoral.scenarios.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.GraphicsEnvironment;
import java.util.Arrays;

/** Fonts, sizes and colours shared by every figure (sizes in pixels, tuned for 900 x 600). */
final class Theme {
    private Theme() {
    }

    static final String FAMILY = pickFamily();
    static final Font TICK = new Font(FAMILY, Font.PLAIN, 13);
    static final Font AXIS = new Font(FAMILY, Font.PLAIN, 14);
    static final Font TITLE = new Font(FAMILY, Font.BOLD, 16);
    static final Font LEGEND = new Font(FAMILY, Font.PLAIN, 13);
    static final Font NOTE = new Font(FAMILY, Font.PLAIN, 12);

    static final Color INK = new Color(0x222222);
    static final Color GRID = new Color(0xe3e3e3);
    static final Color NO_DATA = new Color(0xd4d4d4);
    static final int PAD = 14;
    static final int TICK_LEN = 5;

    /**
     * Okabe and Ito (2008), "Color universal design": eight colours distinguishable under the common
     * colour-vision deficiencies (black moved last; yellow dropped, too faint on white).
     */
    static final Color[] QUALITATIVE = {
        new Color(0x0072b2), new Color(0xd55e00), new Color(0x009e73), new Color(0xcc79a7),
        new Color(0xe69f00), new Color(0x56b4e9), new Color(0x000000),
    };

    static Color qualitative(int i) {
        return QUALITATIVE[Math.floorMod(i, QUALITATIVE.length)];
    }

    static Color withAlpha(Color c, double alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), (int) Math.round(255 * alpha));
    }

    static BasicStroke solid(float w) {
        return new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND);
    }

    static BasicStroke dashed(float w) {
        return new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {7f, 4f}, 0f);
    }

    static BasicStroke dotted(float w) {
        return new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f, new float[] {1.5f, 3.5f}, 0f);
    }

    static BasicStroke dashDot(float w) {
        return new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {8f, 3f, 2f, 3f}, 0f);
    }

    private static String pickFamily() {
        try {
            String[] names = GraphicsEnvironment.getLocalGraphicsEnvironment().getAvailableFontFamilyNames();
            if (Arrays.asList(names).contains("DejaVu Sans")) {
                return "DejaVu Sans";
            }
        } catch (RuntimeException | Error e) {
            // no fontconfig: fall back to the logical font (see BUILD-NOTES)
        }
        return Font.SANS_SERIF;
    }

    /** "label (unit)", or the label alone when the unit is empty. */
    static String axisTitle(String label, String unit) {
        if (unit == null || unit.isBlank()) {
            return label == null ? "" : label;
        }
        return (label == null ? "" : label) + " (" + unit + ")";
    }
}
