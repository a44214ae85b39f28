package org.littoral.model.sounding;

/**
 * One vertical profile (an ascent), binned in height, observed or synthetic. All SI: K, Pa, kg/kg,
 * RH as a fraction, winds in m/s as earth components (east, north). Missing values are NaN.
 *
 * @param site site name
 * @param day day label (ISO date for observations; scenario name or member for synthetic)
 * @param timeHours local clock time of the profile (hours since local midnight of that day)
 */
public record Profile(String site, String day, double timeHours, double[] heightM, double[] pressurePa,
                      double[] temperatureK, double[] relativeHumidity, double[] mixingRatioKgPerKg,
                      double[] dewpointK, double[] windEastMPerS, double[] windNorthMPerS,
                      double[] thetaK, double[] thetaVK, double[] thetaEK) {

    public int size() {
        return heightM.length;
    }

    public double windSpeed(int k) {
        return Math.hypot(windEastMPerS[k], windNorthMPerS[k]);
    }

    /** Meteorological direction the wind blows from, degrees (NaN when calm or missing). */
    public double windDirectionDeg(int k) {
        return org.littoral.model.coast.Coast.directionFromDeg(windEastMPerS[k], windNorthMPerS[k]);
    }

    /**
     * Builds a profile from the state variables and derives RH, dewpoint, theta, theta-v and theta-e
     * with {@link org.littoral.model.thermo.Thermo} (Bolton 1980 formulas).
     */
    public static Profile fromState(String site, String day, double timeHours, double[] heightM, double[] pressurePa,
                                    double[] temperatureK, double[] mixingRatioKgPerKg,
                                    double[] windEastMPerS, double[] windNorthMPerS) {
        int n = heightM.length;
        double[] rh = new double[n];
        double[] td = new double[n];
        double[] th = new double[n];
        double[] thv = new double[n];
        double[] the = new double[n];
        for (int k = 0; k < n; k++) {
            double p = pressurePa[k];
            double t = temperatureK[k];
            double r = mixingRatioKgPerKg[k];
            double e = org.littoral.model.thermo.Thermo.vapourPressurePa(r, p);
            rh[k] = e / org.littoral.model.thermo.Thermo.saturationVapourPressurePa(t);
            td[k] = r > 0 ? org.littoral.model.thermo.Thermo.dewpointK(e) : Double.NaN;
            th[k] = org.littoral.model.thermo.Thermo.potentialTemperatureK(t, p);
            thv[k] = org.littoral.model.thermo.Thermo.virtualPotentialTemperatureK(th[k], r);
            the[k] = r > 0 ? org.littoral.model.thermo.Thermo.equivalentPotentialTemperatureK(t, p, r) : th[k];
        }
        return new Profile(site, day, timeHours, heightM, pressurePa, temperatureK, rh, mixingRatioKgPerKg, td,
                windEastMPerS, windNorthMPerS, th, thv, the);
    }
}
