package org.littoral.model.field;

import org.littoral.model.thermo.Hydrostatic;
import org.littoral.model.thermo.Thermo;

/**
 * The horizontally uniform basic state that perturbations are measured against, tabulated on the
 * solution's levels: potential temperature, water-vapour mixing ratio, hydrostatic pressure and the
 * ambient (large-scale) wind in model axes (u cross-shore, onshore positive; v alongshore).
 */
public record Background(double[] zM, double[] thetaK, double[] mixingRatioKgPerKg, double[] pressurePa,
                         double[] ambientUMPerS, double[] ambientVMPerS) {

    /**
     * Constant-N stratification theta = theta_s exp(N^2 z / g), mixing ratio falling linearly at
     * {@code mixingRatioGradientPerM} (clipped at 1e-5 kg/kg), pressure integrated hydrostatically.
     */
    public static Background constantN(double[] zM, double surfaceThetaK, double buoyancyFrequencyPerS,
                                       double surfaceMixingRatio, double mixingRatioGradientPerM,
                                       double surfacePressurePa, double ambientU, double ambientV) {
        int n = zM.length;
        double[] th = new double[n];
        double[] r = new double[n];
        double[] u = new double[n];
        double[] v = new double[n];
        double n2 = buoyancyFrequencyPerS * buoyancyFrequencyPerS;
        for (int k = 0; k < n; k++) {
            th[k] = surfaceThetaK * Math.exp(n2 * zM[k] / Thermo.G);
            r[k] = Math.max(1e-5, surfaceMixingRatio + mixingRatioGradientPerM * zM[k]);
            u[k] = ambientU;
            v[k] = ambientV;
        }
        return new Background(zM.clone(), th, r, pressureFromTheta(zM, th, r, surfacePressurePa), u, v);
    }

    /**
     * A tabulated theta profile on the given levels, with the mixing ratio falling linearly at
     * {@code mixingRatioGradientPerM} (clipped at 1e-5 kg/kg) and the pressure integrated hydrostatically.
     */
    public static Background ofTheta(double[] zM, double[] thetaK, double surfaceMixingRatio, double mixingRatioGradientPerM,
                                     double surfacePressurePa, double ambientU, double ambientV) {
        int n = zM.length;
        double[] r = new double[n];
        double[] u = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            r[k] = Math.max(1e-5, surfaceMixingRatio + mixingRatioGradientPerM * zM[k]);
            u[k] = ambientU;
            v[k] = ambientV;
        }
        return new Background(zM.clone(), thetaK.clone(), r, pressureFromTheta(zM, thetaK, r, surfacePressurePa), u, v);
    }

    /** Hydrostatic pressure for a theta profile: iterate T from theta and p (two passes suffice at 1e-6). */
    public static double[] pressureFromTheta(double[] zM, double[] thetaK, double[] r, double surfacePressurePa) {
        int n = zM.length;
        double[] t = new double[n];
        double[] p = new double[n];
        java.util.Arrays.fill(p, surfacePressurePa);
        for (int pass = 0; pass < 4; pass++) {
            for (int k = 0; k < n; k++) {
                t[k] = Thermo.temperatureFromPotentialK(thetaK[k], p[k]);
            }
            p = Hydrostatic.pressureProfilePa(zM, t, r, surfacePressurePa);
        }
        return p;
    }

    /** Linear interpolation of a tabulated profile at height z (clamped at the ends). */
    public static double interpolate(double[] zM, double[] values, double z) {
        int n = zM.length;
        if (z <= zM[0]) {
            return values[0];
        }
        if (z >= zM[n - 1]) {
            return values[n - 1];
        }
        int lo = 0;
        int hi = n - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (zM[mid] <= z) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double w = (z - zM[lo]) / (zM[hi] - zM[lo]);
        return values[lo] + w * (values[hi] - values[lo]);
    }
}
