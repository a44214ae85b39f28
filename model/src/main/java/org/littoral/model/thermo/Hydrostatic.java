package org.littoral.model.thermo;

/** Hydrostatic pressure from temperature and humidity profiles (hypsometric equation, layer-mean T_v). */
public final class Hydrostatic {
    private Hydrostatic() {
    }

    /**
     * Integrates dp/dz = -g p / (R_d T_v) upward with the layer-mean virtual temperature
     * (hypsometric equation, Wallace &amp; Hobbs 2006 eq. 3.29).
     *
     * @param heightM heights, strictly increasing; pressure at heightM[0] is surfacePressurePa
     * @param temperatureK temperatures at those heights
     * @param mixingRatioKgPerKg mixing ratios at those heights
     */
    public static double[] pressureProfilePa(double[] heightM, double[] temperatureK, double[] mixingRatioKgPerKg,
                                             double surfacePressurePa) {
        int n = heightM.length;
        if (temperatureK.length != n || mixingRatioKgPerKg.length != n) {
            throw new IllegalArgumentException("profile arrays differ in length: heights " + n
                    + ", temperatures " + temperatureK.length + ", mixing ratios " + mixingRatioKgPerKg.length);
        }
        double[] p = new double[n];
        if (n == 0) {
            return p;
        }
        p[0] = surfacePressurePa;
        for (int k = 1; k < n; k++) {
            double dz = heightM[k] - heightM[k - 1];
            if (!(dz > 0)) {
                throw new IllegalArgumentException("heights must increase strictly: " + heightM[k - 1] + " then " + heightM[k] + " m");
            }
            double tv = 0.5 * (Thermo.virtualTemperatureK(temperatureK[k], mixingRatioKgPerKg[k])
                    + Thermo.virtualTemperatureK(temperatureK[k - 1], mixingRatioKgPerKg[k - 1]));
            p[k] = p[k - 1] * Math.exp(-Thermo.G * dz / (Thermo.RD * tv));
        }
        return p;
    }
}
