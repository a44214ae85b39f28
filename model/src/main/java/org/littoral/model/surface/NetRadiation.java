package org.littoral.model.surface;

/**
 * Net radiation and ground heat flux from routine quantities.
 *
 * <p>Holtslag &amp; van Ulden (1983), J. Climate Appl. Meteor. 22, 517-529:
 * Q* = ((1 - albedo) K_down + c1 T^6 - sigma T^4 + c2 N) / (1 + c3), with T the near-surface air
 * temperature, N the cloud fraction, c1 T^6 Swinbank's clear-sky long-wave emission, c2 N the extra
 * long-wave from cloud and c3 the correction for the surface being warmer (cooler) than the air by
 * day (night). Constants c1 = 5.31e-13 W m-2 K-6, c2 = 60 W/m2, c3 = 0.12 are <b>from memory</b>.
 *
 * <p>Ground heat flux G = 0.1 Q* by day (Holtslag &amp; van Ulden 1983) and G = 0.5 Q* at night
 * (Allen et al. 1998, FAO Irrigation and Drainage Paper 56, eqs. 45-46; <b>from memory</b>).
 */
public final class NetRadiation {
    /** Stefan-Boltzmann constant, W m-2 K-4. */
    public static final double SIGMA = 5.670374e-8;
    /** Swinbank clear-sky long-wave coefficient, W m-2 K-6 (Holtslag &amp; van Ulden 1983; from memory). */
    public static final double C1 = 5.31e-13;
    /** Cloud long-wave term, W/m2 (Holtslag &amp; van Ulden 1983; from memory). */
    public static final double C2 = 60.0;
    /** Surface-air temperature difference correction (Holtslag &amp; van Ulden 1983; from memory). */
    public static final double C3 = 0.12;
    /** Ground heat flux fraction of Q* by day (Holtslag &amp; van Ulden 1983). */
    public static final double GROUND_FRACTION_DAY = 0.1;
    /** Ground heat flux fraction of Q* at night (Allen et al. 1998, FAO-56 eq. 46; from memory). */
    public static final double GROUND_FRACTION_NIGHT = 0.5;

    private NetRadiation() {
    }

    /**
     * Net radiation Q*, W/m2 (positive downward into the surface).
     *
     * @param albedo surface albedo 0..1
     * @param globalWm2 downward short-wave irradiance K_down
     * @param airTemperatureK near-surface air temperature
     * @param cloudFraction total cloud fraction 0..1
     */
    public static double netRadiationWm2(double albedo, double globalWm2, double airTemperatureK, double cloudFraction) {
        ClearSkyRadiation.checkCloud(cloudFraction);
        if (!(albedo >= 0 && albedo <= 1)) {
            throw new IllegalArgumentException("albedo must be in 0..1; got " + albedo);
        }
        if (!(airTemperatureK > 150 && airTemperatureK < 350)) {
            throw new IllegalArgumentException("air temperature must be in 150..350 K; got " + airTemperatureK);
        }
        double t2 = airTemperatureK * airTemperatureK;
        double t4 = t2 * t2;
        return ((1.0 - albedo) * globalWm2 + C1 * t4 * t2 - SIGMA * t4 + C2 * cloudFraction) / (1.0 + C3);
    }

    /**
     * Ground (soil) heat flux G, W/m2, positive into the ground: 0.1 Q* while the sun is up and
     * Q* &gt; 0, otherwise 0.5 Q*.
     */
    public static double groundHeatFluxWm2(double netRadiationWm2, boolean daytime) {
        boolean day = daytime && netRadiationWm2 > 0;
        return (day ? GROUND_FRACTION_DAY : GROUND_FRACTION_NIGHT) * netRadiationWm2;
    }
}
