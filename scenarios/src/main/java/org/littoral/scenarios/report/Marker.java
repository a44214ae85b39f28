package org.littoral.scenarios.report;

/** Point marker shapes for line and scatter figures. */
public enum Marker {
    NONE, CIRCLE, SQUARE, TRIANGLE, DIAMOND, CROSS, PLUS;

    public static Marker cycle(int i) {
        Marker[] m = {CIRCLE, SQUARE, TRIANGLE, DIAMOND, CROSS, PLUS};
        return m[Math.floorMod(i, m.length)];
    }
}
