package org.littoral.model.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The discrete steady boundary layer against the analytic Ekman spiral. */
class EkmanBalanceTest {
    /**
     * Constant K, no-slip ground: u = Ug (1 - e^(-gz) cos gz), v = Ug e^(-gz) sin gz with g = (f / 2K)^(1/2)
     * (Ekman 1905; Holton 2004, An Introduction to Dynamic Meteorology, eq. 5.38, from memory; f > 0 turns the
     * low-level wind to the left of the geostrophic wind, toward low pressure). No slip at z = 0 on layers of
     * depth dz centred at dz/2 is a ground stress K W0 / (dz/2): drag "velocity" 2K/dz.
     */
    @ParameterizedTest
    @CsvSource({"1.0e-4, 10.0, 10.0", "1.0e-4, 5.0, 5.0", "-1.0e-4, 10.0, 10.0", "0.6e-4, 20.0, 10.0"})
    void constantKWithNoSlipIsTheEkmanSpiral(double f, double kM2s, double dz) {
        double gamma = Math.sqrt(Math.abs(f) / (2 * kM2s));
        // the spiral is for an unbounded layer: put the lid 10 e-folding depths up (e^-10 of Ug is left there)
        int nz = (int) Math.ceil(10.0 / gamma / dz);
        double[] dzf = new double[nz];
        double[] dzc = new double[nz];
        double[] kI = new double[nz + 1];
        java.util.Arrays.fill(dzf, dz);
        java.util.Arrays.fill(dzc, dz);
        java.util.Arrays.fill(kI, kM2s);
        double ug = 8.0;
        double[] u = new double[nz];
        double[] v = new double[nz];
        assertTrue(EkmanBalance.solve(dzf, dzc, kI, 2 * kM2s / dz, f, new double[nz], ug, 0.0, u, v));
        double worst = 0;
        for (int k = 0; k < nz; k++) {
            double z = (k + 0.5) * dz;
            double e = Math.exp(-gamma * z);
            double ua = ug * (1 - e * Math.cos(gamma * z));
            double va = Math.signum(f) * ug * e * Math.sin(gamma * z);
            worst = Math.max(worst, Math.hypot(u[k] - ua, v[k] - va));
        }
        // second-order differences: error ~ (gamma dz)^2 Ug
        assertTrue(worst < 2.0 * Math.pow(gamma * dz, 2) * ug, "largest vector error " + worst + " m/s");
        assertEquals(ug, u[nz - 1], 1e-3 * ug);
    }

    @ParameterizedTest
    @CsvSource({"1.0e-4", "-1.0e-4"})
    void theBalanceSatisfiesTheDiscreteEquationsWithAVaryingK(double f) {
        int nz = 40;
        double[] dzf = new double[nz];
        double[] dzc = new double[nz];
        double[] kI = new double[nz + 1];
        double[] damp = new double[nz];
        for (int k = 0; k < nz; k++) {
            dzf[k] = 20.0 * Math.pow(1.08, k);
            damp[k] = k > 30 ? 1e-3 : 0.0;
        }
        for (int k = 1; k < nz; k++) {
            dzc[k] = 0.5 * (dzf[k - 1] + dzf[k]);
            kI[k] = 0.4 * 0.3 * k * 20.0 * Math.exp(-k / 8.0) + 0.5;
        }
        double drag = 0.02;
        double[] u = new double[nz];
        double[] v = new double[nz];
        double ug = -3.0;
        double vg = 6.0;
        EkmanBalance.solve(dzf, dzc, kI, drag, f, damp, ug, vg, u, v);
        for (int k = 0; k < nz; k++) {
            double fluxTopU = k < nz - 1 ? kI[k + 1] * (u[k + 1] - u[k]) / dzc[k + 1] : 0.0;
            double fluxTopV = k < nz - 1 ? kI[k + 1] * (v[k + 1] - v[k]) / dzc[k + 1] : 0.0;
            double fluxBotU = k > 0 ? kI[k] * (u[k] - u[k - 1]) / dzc[k] : drag * u[0];
            double fluxBotV = k > 0 ? kI[k] * (v[k] - v[k - 1]) / dzc[k] : drag * v[0];
            double du = (fluxTopU - fluxBotU) / dzf[k] + f * (v[k] - vg) - damp[k] * (u[k] - ug);
            double dv = (fluxTopV - fluxBotV) / dzf[k] - f * (u[k] - ug) - damp[k] * (v[k] - vg);
            assertEquals(0.0, du, 1e-12, "u tendency at layer " + k);
            assertEquals(0.0, dv, 1e-12, "v tendency at layer " + k);
        }
    }
}
