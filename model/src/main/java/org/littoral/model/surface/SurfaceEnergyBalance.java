package org.littoral.model.surface;

import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.thermo.Thermo;

/**
 * Land surface energy balance: sun, cloud and air temperature give Q* and G (see {@link NetRadiation}),
 * and the available energy Q* - G is split into H and LE by one of two published rules:
 * <ul>
 * <li>{@link Partition#BOWEN_RATIO}: H = beta/(1 + beta) (Q* - G), LE = (Q* - G)/(1 + beta), with the
 * segment's Bowen ratio beta (values in Oke 1987, Boundary Layer Climates, table 4.2 and ch. 4).</li>
 * <li>{@link Partition#PRIESTLEY_TAYLOR}: de Bruin &amp; Holtslag (1982), J. Appl. Meteor. 21, 1610-1621,
 * modified Priestley-Taylor form as used by Holtslag &amp; van Ulden (1983):
 * LE = alpha s/(s + gamma) (Q* - G) + beta', H = ((1 - alpha) s + gamma)/(s + gamma) (Q* - G) - beta',
 * with s = d e_s/dT (from Bolton 1980 eq. 10), gamma = c_p p/(eps L_v(T)) the psychrometric constant,
 * beta' = 20 W/m2 (from memory) and alpha = ALPHA_WET times the segment's soil-moisture availability
 * (0..1). ALPHA_WET = 1.0 is de Bruin &amp; Holtslag's value for well-watered grass (from memory); the
 * linear scaling with moisture availability is this project's stated choice, following Holtslag &amp;
 * van Ulden's use of alpha as a moisture parameter.</li>
 * </ul>
 */
public final class SurfaceEnergyBalance {
    /** How the available energy is split between H and LE. */
    public enum Partition { BOWEN_RATIO, PRIESTLEY_TAYLOR }

    /** de Bruin &amp; Holtslag (1982) beta', W/m2 (from memory). */
    public static final double BETA_PRIME_WM2 = 20.0;
    /** Priestley-Taylor alpha of a fully moist surface in the de Bruin-Holtslag form (from memory). */
    public static final double ALPHA_WET = 1.0;

    private SurfaceEnergyBalance() {
    }

    /** H and LE from the available energy and a Bowen ratio beta = H / LE. Oke (1987). */
    public static EnergyBalance partitionByBowenRatio(double netRadiationWm2, double groundHeatFluxWm2, double bowenRatio) {
        if (!(bowenRatio > -0.99)) {
            throw new IllegalArgumentException("Bowen ratio must exceed -0.99 (the partition is singular at -1); got " + bowenRatio);
        }
        double a = netRadiationWm2 - groundHeatFluxWm2;
        double le = a / (1.0 + bowenRatio);
        return new EnergyBalance(netRadiationWm2, groundHeatFluxWm2, a - le, le);
    }

    /**
     * H and LE by the de Bruin &amp; Holtslag (1982) modified Priestley-Taylor form.
     *
     * @param alpha Priestley-Taylor moisture parameter (0 dry .. about 1.26 saturated)
     */
    public static EnergyBalance partitionByPriestleyTaylor(double netRadiationWm2, double groundHeatFluxWm2, double alpha,
                                                           double airTemperatureK, double pressurePa) {
        if (!(alpha >= 0 && alpha <= 1.5)) {
            throw new IllegalArgumentException("Priestley-Taylor alpha must be in 0..1.5; got " + alpha);
        }
        double a = netRadiationWm2 - groundHeatFluxWm2;
        double sOverGamma = slopeOverPsychrometric(airTemperatureK, pressurePa);
        double w = sOverGamma / (1.0 + sOverGamma);
        double le = alpha * w * a + BETA_PRIME_WM2;
        return new EnergyBalance(netRadiationWm2, groundHeatFluxWm2, a - le, le);
    }

    /**
     * s / gamma: slope of the saturation vapour pressure curve (derivative of Bolton 1980 eq. 10) over
     * the psychrometric constant gamma = c_p p / (eps L_v(T)), L_v(T) from Bolton (1980) eq. 2.
     */
    public static double slopeOverPsychrometric(double airTemperatureK, double pressurePa) {
        double tc = airTemperatureK - Thermo.T0;
        double es = Thermo.saturationVapourPressurePa(airTemperatureK);
        double s = es * 17.67 * 243.5 / ((tc + 243.5) * (tc + 243.5));
        double gamma = Thermo.CP * pressurePa / (Thermo.EPSILON * Thermo.latentHeatOfVaporisation(airTemperatureK));
        return s / gamma;
    }

    /**
     * The full land energy balance of one segment at model time t.
     *
     * @param coast latitude and day of year
     * @param land the land segment (albedo, Bowen ratio, soil moisture)
     * @param modelTimeS seconds since solar midnight of the coast's day
     * @param cloudFraction total cloud 0..1
     * @param airTemperatureK near-surface air temperature (first model level or screen height)
     * @param pressurePa surface pressure (enters only the psychrometric constant)
     */
    public static EnergyBalance land(Coast coast, SurfaceSegment.Land land, double modelTimeS, double cloudFraction,
                                     double airTemperatureK, double pressurePa, Partition partition) {
        double sinAlpha = SolarGeometry.sinElevationAt(coast, modelTimeS);
        double kDown = ClearSkyRadiation.globalWm2(sinAlpha, cloudFraction);
        return land(land, sinAlpha, kDown, cloudFraction, airTemperatureK, pressurePa, partition);
    }

    /**
     * {@link #land(Coast, SurfaceSegment.Land, double, double, double, double, Partition)} with the sun
     * already evaluated (for many columns at one time: the solar geometry is the same for all of them).
     *
     * @param sinAlpha sine of the solar elevation ({@link SolarGeometry#sinElevationAt})
     * @param kDown global irradiance ({@link ClearSkyRadiation#globalWm2}) for that sun and cloud
     */
    public static EnergyBalance land(SurfaceSegment.Land land, double sinAlpha, double kDown, double cloudFraction,
                                     double airTemperatureK, double pressurePa, Partition partition) {
        double qStar = NetRadiation.netRadiationWm2(land.albedo(), kDown, airTemperatureK, cloudFraction);
        double g = NetRadiation.groundHeatFluxWm2(qStar, sinAlpha > 0);
        return switch (partition) {
            case BOWEN_RATIO -> partitionByBowenRatio(qStar, g, land.bowenRatio());
            case PRIESTLEY_TAYLOR -> partitionByPriestleyTaylor(qStar, g, ALPHA_WET * land.soilMoistureFraction(),
                    airTemperatureK, pressurePa);
        };
    }
}
