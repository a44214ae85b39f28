package org.littoral.scenarios.run;

import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.Snapshot;
import org.littoral.scenarios.scenario.Scenario;

/**
 * A hand-made breeze with known answers: u' = A sin(omega (t - 6 h)) exp(-(x/L)^2) h(z), with
 * h(z) = 1 - z/D up to 2D (onshore below D, return flow between D and 2D, peaking at 2D), then
 * h rising linearly back to 0 at 3D, and 0 above; theta and moisture are the background; ambient
 * cross-shore wind U is added.
 */
final class FakeBreeze implements BreezeSolution {
    static final double OMEGA = 2 * Math.PI / 86400.0;
    final double amplitude;
    final double widthM;
    final double depthM;
    final double ambientU;
    private final double[] x;
    private final double[] z;
    private final Background bg;

    FakeBreeze(Scenario s, double amplitude, double widthM, double depthM) {
        this.amplitude = amplitude;
        this.widthM = widthM;
        this.depthM = depthM;
        this.ambientU = s.ambientWind().crossShoreMPerS();
        x = s.xGrid().pointsM();
        z = s.zGrid().levelsM();
        Scenario.Atmosphere a = s.atmosphere();
        bg = Background.constantN(z, a.surfaceThetaK(), a.buoyancyFrequencyPerS(), a.surfaceMixingRatio(),
                a.mixingRatioGradientPerM(), a.surfacePressurePa(), ambientU, s.ambientWind().alongshoreMPerS());
    }

    double h(double zM) {
        if (zM <= 2 * depthM) {
            return 1 - zM / depthM;
        }
        if (zM <= 3 * depthM) {
            return -1 + (zM - 2 * depthM) / depthM;
        }
        return 0;
    }

    double breeze(double xM, double zM, double t) {
        return amplitude * Math.sin(OMEGA * (t - 6 * 3600.0)) * Math.exp(-(xM / widthM) * (xM / widthM)) * h(zM);
    }

    @Override
    public double[] xM() {
        return x.clone();
    }

    @Override
    public double[] zM() {
        return z.clone();
    }

    @Override
    public Background background() {
        return bg;
    }

    @Override
    public double startSec() {
        return -86400;
    }

    @Override
    public double endSec() {
        return 2 * 86400;
    }

    @Override
    public Snapshot snapshotAt(double t) {
        int nx = x.length;
        int nz = z.length;
        double[] u = new double[nx * nz];
        double[] v = new double[nx * nz];
        double[] w = new double[nx * nz];
        double[] th = new double[nx * nz];
        double[] r = new double[nx * nz];
        double[] p = new double[nx * nz];
        for (int k = 0; k < nz; k++) {
            for (int i = 0; i < nx; i++) {
                int a = k * nx + i;
                u[a] = ambientU + breeze(x[i], z[k], t);
                v[a] = bg.ambientVMPerS()[k];
                th[a] = bg.thetaK()[k];
                r[a] = bg.mixingRatioKgPerKg()[k];
            }
        }
        return new Snapshot(t, nx, nz, u, v, w, th, r, p);
    }

    @Override
    public String modelName() {
        return "fake analytic breeze (test)";
    }
}
