package org.littoral.model.thermo;

/**
 * Moist thermodynamics in SI units (K, Pa, kg/kg). Conversions to deg C, hPa and g/kg happen only
 * at the edges of the application.
 *
 * <p>Sources: Bolton (1980), Mon. Wea. Rev. 108, 1046-1053 (saturation vapour pressure eq. 10,
 * dewpoint as its inverse, LCL temperature eq. 15 from T and Td, eq. 21 from T and e, eq. 22 from T and
 * RH, theta-e eqs. 39 and 43); mixing ratio and virtual
 * temperature as in Wallace &amp; Hobbs (2006), Atmospheric Science, ch. 3 (common practice).
 *
 * <p>Equation numbers of the LCL forms checked against a secondary source (NCAR Command Language
 * documentation of its Bolton-based functions): the T, Td form is eq. 15; the "eq. 22" often quoted for it
 * is the T, RH form (docs/references.md section 6).
 */
public final class Thermo {
    /** Gas constant of dry air, J/(kg K) (Bolton 1980 uses 287.04). */
    public static final double RD = 287.04;
    /** Specific heat of dry air at constant pressure, J/(kg K). */
    public static final double CP = 1005.7;
    /** Poisson constant R_d / c_p; Bolton (1980) takes 0.2854. */
    public static final double KAPPA = 0.2854;
    /** Ratio of the gas constants of dry air and water vapour. */
    public static final double EPSILON = 0.622;
    /** Standard gravity, m/s^2 (US Standard Atmosphere 1976). */
    public static final double G = 9.80665;
    /** Reference pressure for potential temperature, Pa. */
    public static final double P0 = 100000.0;
    /** 0 deg C in kelvin. */
    public static final double T0 = 273.15;
    /** Latent heat of vaporisation near 0-20 C, J/kg (common practice). */
    public static final double LV = 2.501e6;

    private Thermo() {
    }

    /**
     * Latent heat of vaporisation at temperature T, J/kg: L_v = (2.501 - 0.00237 T_c) 1e6, T_c in deg C.
     * Bolton (1980), eq. 2 (equation number from memory).
     */
    public static double latentHeatOfVaporisation(double temperatureK) {
        return (2.501 - 0.00237 * (temperatureK - T0)) * 1e6;
    }

    /** Saturation vapour pressure over water, Pa. Bolton (1980), eq. 10; 0.1% from -30 to 35 C. */
    public static double saturationVapourPressurePa(double temperatureK) {
        double tc = temperatureK - T0;
        return 611.2 * Math.exp(17.67 * tc / (tc + 243.5));
    }

    /** Dewpoint (K) from the vapour pressure (Pa): the exact inverse of Bolton (1980) eq. 10. */
    public static double dewpointK(double vapourPressurePa) {
        double lnRatio = Math.log(vapourPressurePa / 611.2);
        return T0 + 243.5 * lnRatio / (17.67 - lnRatio);
    }

    /** Mixing ratio r = eps e / (p - e), kg/kg. */
    public static double mixingRatio(double vapourPressurePa, double pressurePa) {
        return EPSILON * vapourPressurePa / (pressurePa - vapourPressurePa);
    }

    /** Vapour pressure e = r p / (eps + r), Pa: the inverse of {@link #mixingRatio}. */
    public static double vapourPressurePa(double mixingRatioKgPerKg, double pressurePa) {
        return mixingRatioKgPerKg * pressurePa / (EPSILON + mixingRatioKgPerKg);
    }

    /** Saturation mixing ratio over water, kg/kg. */
    public static double saturationMixingRatio(double temperatureK, double pressurePa) {
        return mixingRatio(saturationVapourPressurePa(temperatureK), pressurePa);
    }

    /** Specific humidity q = r / (1 + r), kg/kg. */
    public static double specificHumidity(double mixingRatioKgPerKg) {
        return mixingRatioKgPerKg / (1.0 + mixingRatioKgPerKg);
    }

    /** Mixing ratio from specific humidity, r = q / (1 - q). */
    public static double mixingRatioFromSpecificHumidity(double specificHumidityKgPerKg) {
        return specificHumidityKgPerKg / (1.0 - specificHumidityKgPerKg);
    }

    /** Relative humidity as a fraction (0-1) with respect to water, e / e_s. */
    public static double relativeHumidity(double mixingRatioKgPerKg, double temperatureK, double pressurePa) {
        return vapourPressurePa(mixingRatioKgPerKg, pressurePa) / saturationVapourPressurePa(temperatureK);
    }

    /** Mixing ratio (kg/kg) from relative humidity (fraction), temperature and pressure. */
    public static double mixingRatioFromRelativeHumidity(double rhFraction, double temperatureK, double pressurePa) {
        return mixingRatio(rhFraction * saturationVapourPressurePa(temperatureK), pressurePa);
    }

    /** Potential temperature theta = T (P0 / p)^kappa (Poisson's equation). */
    public static double potentialTemperatureK(double temperatureK, double pressurePa) {
        return temperatureK * Math.pow(P0 / pressurePa, KAPPA);
    }

    /** Temperature from potential temperature: the inverse of {@link #potentialTemperatureK}. */
    public static double temperatureFromPotentialK(double thetaK, double pressurePa) {
        return thetaK * Math.pow(pressurePa / P0, KAPPA);
    }

    /** Virtual temperature T_v = T (1 + r/eps) / (1 + r). */
    public static double virtualTemperatureK(double temperatureK, double mixingRatioKgPerKg) {
        return temperatureK * (1.0 + mixingRatioKgPerKg / EPSILON) / (1.0 + mixingRatioKgPerKg);
    }

    /** Virtual potential temperature theta_v = theta (1 + r/eps) / (1 + r). */
    public static double virtualPotentialTemperatureK(double thetaK, double mixingRatioKgPerKg) {
        return thetaK * (1.0 + mixingRatioKgPerKg / EPSILON) / (1.0 + mixingRatioKgPerKg);
    }

    /** Temperature at the lifting condensation level from T and Td. Bolton (1980), eq. 15. */
    public static double lclTemperatureK(double temperatureK, double dewpointK) {
        return 1.0 / (1.0 / (dewpointK - 56.0) + Math.log(temperatureK / dewpointK) / 800.0) + 56.0;
    }

    /** LCL temperature from T (K) and vapour pressure e: T_L = 2840 / (3.5 ln T - ln e - 4.805) + 55, e in hPa. Bolton (1980), eq. 21. */
    public static double lclTemperatureFromVapourPressureK(double temperatureK, double vapourPressurePa) {
        return 2840.0 / (3.5 * Math.log(temperatureK) - Math.log(vapourPressurePa / 100.0) - 4.805) + 55.0;
    }

    /** LCL temperature from T (K) and RH (fraction): T_L = 1 / (1/(T - 55) - ln(RH)/2840) + 55. Bolton (1980), eq. 22. */
    public static double lclTemperatureFromRelativeHumidityK(double temperatureK, double rhFraction) {
        return 1.0 / (1.0 / (temperatureK - 55.0) - Math.log(rhFraction) / 2840.0) + 55.0;
    }

    /**
     * Equivalent potential temperature, Bolton (1980) eq. 39 with T_L from eq. 15:
     * theta_DL = T (P0 / (p - e))^kappa (T / T_L)^(0.28e-3 r),
     * theta_e = theta_DL exp[(3.036 / T_L - 0.00178) r (1 + 0.448e-3 r)], r in g/kg.
     */
    public static double equivalentPotentialTemperatureK(double temperatureK, double pressurePa,
                                                         double mixingRatioKgPerKg) {
        double e = vapourPressurePa(mixingRatioKgPerKg, pressurePa);
        double td = dewpointK(e);
        double tl = lclTemperatureK(temperatureK, td);
        double rg = mixingRatioKgPerKg * 1000.0;
        double thetaDl = temperatureK * Math.pow(P0 / (pressurePa - e), KAPPA) * Math.pow(temperatureK / tl, 0.28e-3 * rg);
        return thetaDl * Math.exp((3.036 / tl - 0.00178) * rg * (1.0 + 0.448e-3 * rg));
    }

    /**
     * Equivalent potential temperature, Bolton (1980) eq. 43 (the older, simpler form):
     * theta_e = T (P0/p)^(0.2854 (1 - 0.28e-3 r)) exp[(3.376/T_L - 0.00254) r (1 + 0.81e-3 r)].
     */
    public static double equivalentPotentialTemperatureEq43K(double temperatureK, double pressurePa,
                                                             double mixingRatioKgPerKg) {
        double e = vapourPressurePa(mixingRatioKgPerKg, pressurePa);
        double tl = lclTemperatureK(temperatureK, dewpointK(e));
        double rg = mixingRatioKgPerKg * 1000.0;
        double thetaDl = temperatureK * Math.pow(P0 / pressurePa, KAPPA * (1.0 - 0.28e-3 * rg));
        return thetaDl * Math.exp((3.376 / tl - 0.00254) * rg * (1.0 + 0.81e-3 * rg));
    }

    /** Density of moist air from the ideal-gas law with virtual temperature, kg/m^3. */
    public static double densityKgM3(double pressurePa, double temperatureK, double mixingRatioKgPerKg) {
        return pressurePa / (RD * virtualTemperatureK(temperatureK, mixingRatioKgPerKg));
    }
}
