package org.littoral.model.nonlinear;

import org.littoral.model.field.Background;
import org.littoral.model.thermo.Thermo;

/**
 * Background (ambient) potential temperature theta_0(z) of the nonlinear model; the linear model takes the
 * same profile's buoyancy frequency N^2(z) = (g / theta_0) d theta_0 / dz when it is not constant-N.
 */
public sealed interface ThetaProfile permits ThetaProfile.ConstantN, ThetaProfile.Tabulated, ThetaProfile.Layered {
    double thetaK(double zM);

    /** d theta_0 / dz, K/m. */
    double gradientKPerM(double zM);

    /** N^2 = (g / theta_0) d theta_0 / dz at height z, 1/s^2. */
    default double buoyancyFrequencySquared(double zM) {
        return Thermo.G * gradientKPerM(zM) / thetaK(zM);
    }

    /**
     * The mean of N^2 over [za, zb]: (1 / (zb - za)) Integral (g / theta) d theta = g ln(theta(zb) / theta(za)) / (zb - za),
     * exact for any profile; N^2 itself where the layer is thinner than a millimetre.
     */
    default double meanBuoyancyFrequencySquared(double za, double zb) {
        if (!(zb - za > 1e-3)) {
            return buoyancyFrequencySquared(0.5 * (za + zb));
        }
        return Thermo.G * Math.log(thetaK(zb) / thetaK(za)) / (zb - za);
    }

    /** Height above which N is constant, m (0 for a constant-N profile). */
    double constantAboveM();

    /** Heights where N^2 jumps (layer interfaces), m; empty when it has none. */
    default double[] interfacesM() {
        return new double[0];
    }

    /**
     * Constant buoyancy frequency: theta_0 = theta_s exp(N^2 z / g), so that N^2 = (g / theta_0) d theta_0 / dz
     * exactly (the same profile as {@link Background#constantN}).
     */
    record ConstantN(double surfaceThetaK, double buoyancyFrequencyPerS) implements ThetaProfile {
        public ConstantN {
            if (!(surfaceThetaK > 200 && surfaceThetaK < 350)) {
                throw new IllegalArgumentException("background: surface potential temperature must be in 200..350 K; got " + surfaceThetaK);
            }
            if (!(buoyancyFrequencyPerS >= 0 && buoyancyFrequencyPerS <= 0.05)) {
                throw new IllegalArgumentException("background: buoyancy frequency N must be in 0..0.05 1/s; got " + buoyancyFrequencyPerS);
            }
        }

        @Override
        public double thetaK(double zM) {
            return surfaceThetaK * Math.exp(buoyancyFrequencyPerS * buoyancyFrequencyPerS * zM / Thermo.G);
        }

        @Override
        public double gradientKPerM(double zM) {
            return thetaK(zM) * buoyancyFrequencyPerS * buoyancyFrequencyPerS / Thermo.G;
        }

        @Override
        public double constantAboveM() {
            return 0.0;
        }
    }

    /** A tabulated sounding, linearly interpolated (held constant-gradient beyond the ends). */
    record Tabulated(double[] zM, double[] thetaK) implements ThetaProfile {
        public Tabulated {
            if (zM.length < 2 || zM.length != thetaK.length) {
                throw new IllegalArgumentException("background: a tabulated theta profile needs >= 2 heights and as many values; got "
                        + zM.length + " heights and " + thetaK.length + " values");
            }
            for (int k = 1; k < zM.length; k++) {
                if (!(zM[k] > zM[k - 1])) {
                    throw new IllegalArgumentException("background: profile heights must increase; height " + k + " is " + zM[k]
                            + " m after " + zM[k - 1] + " m");
                }
                if (thetaK[k] < thetaK[k - 1]) {
                    throw new IllegalArgumentException("background: theta must not decrease with height (statically unstable) at "
                            + zM[k] + " m; make the profile stable or neutral");
                }
            }
            zM = zM.clone();
            thetaK = thetaK.clone();
        }

        @Override
        public double thetaK(double z) {
            int n = zM.length;
            if (z < zM[0]) {
                return thetaK[0] + (z - zM[0]) * gradientKPerM(zM[0]);
            }
            if (z > zM[n - 1]) {
                return thetaK[n - 1] + (z - zM[n - 1]) * gradientKPerM(zM[n - 1]);
            }
            return Background.interpolate(zM, thetaK, z);
        }

        @Override
        public double gradientKPerM(double z) {
            int n = zM.length;
            int k = 1;
            while (k < n - 1 && zM[k] < z) {
                k++;
            }
            return (thetaK[k] - thetaK[k - 1]) / (zM[k] - zM[k - 1]);
        }

        /** Above the table theta keeps its last gradient, so N^2 only drifts slowly there (taken as constant). */
        @Override
        public double constantAboveM() {
            return zM[zM.length - 1];
        }

        @Override
        public double[] interfacesM() {
            return zM.clone();
        }
    }

    /**
     * A convective boundary layer's sounding: a neutral mixed layer of depth h (theta = theta_s), a capping inversion
     * through which theta rises linearly by a jump over a depth, and the free atmosphere above with constant N,
     * theta = theta_top exp(N^2 (z - z_top) / g) (the zero-order and first-order jump pictures of the mixed layer,
     * e.g. Stull 1988, ch. 11; common practice).
     *
     * @param mixedLayerDepthM h, m (0: no mixed layer)
     * @param inversionJumpK theta rise across the inversion, K (0: none)
     * @param inversionDepthM inversion thickness, m (must be positive when the jump is)
     * @param freeBuoyancyFrequencyPerS N above the inversion
     */
    record Layered(double surfaceThetaK, double mixedLayerDepthM, double inversionJumpK, double inversionDepthM,
                   double freeBuoyancyFrequencyPerS) implements ThetaProfile {
        public Layered {
            if (!(surfaceThetaK > 200 && surfaceThetaK < 350)) {
                throw new IllegalArgumentException("background: surface potential temperature must be in 200..350 K; got " + surfaceThetaK);
            }
            if (!(mixedLayerDepthM >= 0 && mixedLayerDepthM <= 5000)) {
                throw new IllegalArgumentException("background: mixed-layer depth must be in 0..5000 m; got " + mixedLayerDepthM);
            }
            if (!(inversionJumpK >= 0 && inversionJumpK <= 30)) {
                throw new IllegalArgumentException("background: inversion jump must be in 0..30 K; got " + inversionJumpK);
            }
            if (!(inversionDepthM >= 0 && inversionDepthM <= 2000) || (inversionJumpK > 0 && !(inversionDepthM > 0))) {
                throw new IllegalArgumentException("background: inversion depth must be in 0..2000 m and positive with a jump; got "
                        + inversionDepthM + " m for a jump of " + inversionJumpK + " K");
            }
            if (!(freeBuoyancyFrequencyPerS > 0 && freeBuoyancyFrequencyPerS <= 0.05)) {
                throw new IllegalArgumentException("background: free-atmosphere N must be in (0, 0.05] 1/s; got " + freeBuoyancyFrequencyPerS);
            }
        }

        private double inversionTopM() {
            return mixedLayerDepthM + (inversionJumpK > 0 ? inversionDepthM : 0.0);
        }

        @Override
        public double thetaK(double z) {
            if (z <= mixedLayerDepthM) {
                return surfaceThetaK;
            }
            double top = inversionTopM();
            if (z < top) {
                return surfaceThetaK + inversionJumpK * (z - mixedLayerDepthM) / inversionDepthM;
            }
            double n2 = freeBuoyancyFrequencyPerS * freeBuoyancyFrequencyPerS;
            return (surfaceThetaK + inversionJumpK) * Math.exp(n2 * (z - top) / Thermo.G);
        }

        @Override
        public double gradientKPerM(double z) {
            if (z < mixedLayerDepthM) {
                return 0.0;
            }
            if (z < inversionTopM()) {
                return inversionJumpK / inversionDepthM;
            }
            return thetaK(z) * freeBuoyancyFrequencyPerS * freeBuoyancyFrequencyPerS / Thermo.G;
        }

        @Override
        public double constantAboveM() {
            return inversionTopM();
        }

        @Override
        public double[] interfacesM() {
            return inversionJumpK > 0 ? new double[] {mixedLayerDepthM, inversionTopM()} : new double[] {mixedLayerDepthM};
        }
    }
}
