package org.littoral.model.surface;

/**
 * Global (short-wave, downward) irradiance at the surface: Kasten &amp; Czeplak (1980), Solar Energy 24,
 * 177-189: clear sky G0 = 910 sin(alpha) - 30 W/m2, reduced by cloud as G = G0 (1 - 0.75 (N/8)^3.4)
 * with N the total cloud cover in oktas (here as a fraction N/8 in 0..1).
 */
public final class ClearSkyRadiation {
    private ClearSkyRadiation() {
    }

    /** Clear-sky global irradiance, W/m2, never negative (zero at low sun where the fit turns negative). */
    public static double clearSkyGlobalWm2(double sinElevation) {
        return Math.max(0.0, 910.0 * sinElevation - 30.0);
    }

    /** Cloud transmission factor 1 - 0.75 (N/8)^3.4, cloud fraction N/8 in 0..1. Kasten &amp; Czeplak (1980). */
    public static double cloudFactor(double cloudFraction) {
        checkCloud(cloudFraction);
        return 1.0 - 0.75 * Math.pow(cloudFraction, 3.4);
    }

    /** Global irradiance under cloud fraction N/8, W/m2. */
    public static double globalWm2(double sinElevation, double cloudFraction) {
        return clearSkyGlobalWm2(sinElevation) * cloudFactor(cloudFraction);
    }

    static void checkCloud(double cloudFraction) {
        if (!(cloudFraction >= 0 && cloudFraction <= 1)) {
            throw new IllegalArgumentException("cloud fraction must be in 0..1 (oktas / 8); got " + cloudFraction);
        }
    }
}
