package org.littoral.model.nonlinear;

/**
 * The steady wind of one horizontally uniform column in which Coriolis, Rayleigh damping, turbulent mixing
 * and surface drag balance: the Ekman boundary layer (Ekman 1905, Ark. Mat. Astron. Fys. 2(11); in the
 * atmosphere e.g. Holton 2004, An Introduction to Dynamic Meteorology, section 5.3.4). With W = u + i v:
 *
 * <pre>
 *   d/dz (K dW/dz) - (a + i f) (W - Wg) = 0,   K dW/dz = C_D |V| W at the ground,   no flux at the lid
 * </pre>
 *
 * solved exactly on the nonlinear model's own levels and interface diffusivities (the same finite
 * differences as its implicit mixing, so a column that starts here stays here while K and the drag do not
 * change). With constant K and a no-slip ground it is the classic spiral
 * u = Ug (1 - e^(-gz) cos gz), v = Ug e^(-gz) sin gz, g = (f / 2K)^(1/2) (Holton 2004, eq. 5.38, from memory).
 * Stateless; one complex tridiagonal (Thomas) solve, no allocation beyond two work arrays per call.
 */
public final class EkmanBalance {
    private EkmanBalance() {
    }

    /**
     * @param dzf layer thicknesses, m (nz)
     * @param dzc distance between the centres of layers k - 1 and k, m (index 1..nz-1 used)
     * @param kInterfaces diffusivity at interfaces 0..nz, m2/s (the ground and lid values are not used: the
     *        ground flux is the drag, the lid flux is zero)
     * @param dragMPerS C_D |V| of the lowest layer, m/s (the drag is linear in W at fixed |V|)
     * @param coriolisPerS f
     * @param dampingPerS a per layer, 1/s, relaxing W toward Wg (Rayleigh friction plus any damping layer)
     * @param ug geostrophic cross-shore wind, m/s
     * @param vg geostrophic alongshore wind, m/s
     * @param u out: steady cross-shore wind per layer
     * @param v out: steady alongshore wind per layer
     * @return false (and u, v = Wg) when the balance is singular (no rotation, damping, drag or mixing to fix it)
     */
    public static boolean solve(double[] dzf, double[] dzc, double[] kInterfaces, double dragMPerS, double coriolisPerS,
                                double[] dampingPerS, double ug, double vg, double[] u, double[] v) {
        int nz = dzf.length;
        // rows: lo W(k-1) + b W(k) + hi W(k+1) = d, with b and d complex (re, im); multiplied through by dzf[k]
        double[] cRe = new double[nz];
        double[] cIm = new double[nz];
        double[] dRe = u;
        double[] dIm = v;
        double prevCRe = 0;
        double prevCIm = 0;
        double prevDRe = 0;
        double prevDIm = 0;
        for (int k = 0; k < nz; k++) {
            double lo = k > 0 ? kInterfaces[k] / dzc[k] : 0.0;
            double hi = k < nz - 1 ? kInterfaces[k + 1] / dzc[k + 1] : 0.0;
            double bRe = -(lo + hi) - dzf[k] * dampingPerS[k] - (k == 0 ? dragMPerS : 0.0);
            double bIm = -dzf[k] * coriolisPerS;
            // right-hand side -dzf (a + i f) Wg
            double aRe = dzf[k] * dampingPerS[k];
            double aIm = dzf[k] * coriolisPerS;
            double rRe = -(aRe * ug - aIm * vg);
            double rIm = -(aRe * vg + aIm * ug);
            // forward elimination: b' = b - lo c'(k-1), d' = d - lo d'(k-1), c'(k) = hi / b', d'(k) = d' / b'
            bRe -= lo * prevCRe;
            bIm -= lo * prevCIm;
            rRe -= lo * prevDRe;
            rIm -= lo * prevDIm;
            double den = bRe * bRe + bIm * bIm;
            if (!(den > 1e-300)) {
                java.util.Arrays.fill(u, ug);
                java.util.Arrays.fill(v, vg);
                return false;
            }
            cRe[k] = hi * bRe / den;
            cIm[k] = -hi * bIm / den;
            dRe[k] = (rRe * bRe + rIm * bIm) / den;
            dIm[k] = (rIm * bRe - rRe * bIm) / den;
            prevCRe = cRe[k];
            prevCIm = cIm[k];
            prevDRe = dRe[k];
            prevDIm = dIm[k];
        }
        for (int k = nz - 2; k >= 0; k--) {
            double wRe = dRe[k + 1];
            double wIm = dIm[k + 1];
            dRe[k] -= cRe[k] * wRe - cIm[k] * wIm;
            dIm[k] -= cRe[k] * wIm + cIm[k] * wRe;
        }
        return true;
    }
}
