package org.littoral.scenarios.report;

/** Dash pattern of a line. */
public enum LineStyle {
    SOLID, DASHED, DOTTED, DASH_DOT;

    java.awt.BasicStroke stroke(float width) {
        switch (this) {
            case DASHED:
                return Theme.dashed(width);
            case DOTTED:
                return Theme.dotted(width);
            case DASH_DOT:
                return Theme.dashDot(width);
            default:
                return Theme.solid(width);
        }
    }

    static LineStyle cycle(int i) {
        LineStyle[] s = values();
        return s[Math.floorMod(i, s.length)];
    }
}
