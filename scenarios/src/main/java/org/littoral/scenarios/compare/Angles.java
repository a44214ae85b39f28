package org.littoral.scenarios.compare;

/**
 * Differences of compass directions. A direction difference is the shortest signed turn from one
 * direction to another, wrapped to (-180, 180] degrees: model 10 deg against observed 350 deg is +20 deg,
 * not -340 deg (the usual circular difference of directional statistics, e.g. Fisher 1993,
 * "Statistical Analysis of Circular Data", section 2.3, from memory).
 */
public final class Angles {
    private Angles() {
    }

    /** The angle wrapped to (-180, 180] degrees; NaN stays NaN. */
    public static double wrapDeg(double deg) {
        if (!Double.isFinite(deg)) {
            return Double.NaN;
        }
        double w = deg % 360.0;
        if (w > 180.0) {
            w -= 360.0;
        } else if (w <= -180.0) {
            w += 360.0;
        }
        return w;
    }

    /** Signed difference a - b of two directions, degrees, wrapped to (-180, 180]; positive when a is clockwise of b. */
    public static double differenceDeg(double aDeg, double bDeg) {
        return wrapDeg(aDeg - bDeg);
    }
}
