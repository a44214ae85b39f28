package org.littoral.model.thermo;

/**
 * US Standard Atmosphere 1976, lowest layer (troposphere, geopotential height 0-11 km):
 * T = 288.15 - 0.0065 H; p = 101325 (T/288.15)^(g M / (R* L)); rho = p M / (R* T).
 * Constants from the 1976 document (NOAA/NASA/USAF, table 1 and eq. 33a).
 */
public final class StandardAtmosphere {
    public static final double SEA_LEVEL_TEMPERATURE_K = 288.15;
    public static final double SEA_LEVEL_PRESSURE_PA = 101325.0;
    public static final double LAPSE_RATE_K_PER_M = 0.0065;
    /** Universal gas constant used by the 1976 standard, J/(kmol K). */
    public static final double R_STAR = 8314.32;
    /** Mean molecular weight of air at sea level, kg/kmol. */
    public static final double MOLAR_MASS = 28.9644;
    /** g0 of the 1976 standard, m/s^2. */
    public static final double G0 = 9.80665;
    public static final double TOP_OF_LAYER_M = 11000.0;

    private StandardAtmosphere() {
    }

    private static void checkHeight(double geopotentialHeightM) {
        if (geopotentialHeightM < -500.0 || geopotentialHeightM > TOP_OF_LAYER_M) {
            throw new IllegalArgumentException("standard atmosphere lower layer covers -500 to 11000 m; got "
                    + geopotentialHeightM + " m");
        }
    }

    public static double temperatureK(double geopotentialHeightM) {
        checkHeight(geopotentialHeightM);
        return SEA_LEVEL_TEMPERATURE_K - LAPSE_RATE_K_PER_M * geopotentialHeightM;
    }

    public static double pressurePa(double geopotentialHeightM) {
        double t = temperatureK(geopotentialHeightM);
        double exponent = G0 * MOLAR_MASS / (R_STAR * LAPSE_RATE_K_PER_M);
        return SEA_LEVEL_PRESSURE_PA * Math.pow(t / SEA_LEVEL_TEMPERATURE_K, exponent);
    }

    public static double densityKgM3(double geopotentialHeightM) {
        return pressurePa(geopotentialHeightM) * MOLAR_MASS / (R_STAR * temperatureK(geopotentialHeightM));
    }
}
