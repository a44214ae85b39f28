package org.littoral.model.nonlinear;

import org.littoral.model.field.Background;
import org.littoral.model.thermo.Thermo;

/** Background (ambient) potential temperature theta_0(z) of the nonlinear model. */
public sealed interface ThetaProfile permits ThetaProfile.ConstantN, ThetaProfile.Tabulated {
    double thetaK(double zM);

    /** d theta_0 / dz, K/m. */
    double gradientKPerM(double zM);

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
    }
}
