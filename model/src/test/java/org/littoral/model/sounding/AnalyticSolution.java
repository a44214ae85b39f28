package org.littoral.model.sounding;

import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.Snapshot;

/**
 * A hand-made solution whose fields are linear in x, z and t, so bilinear-in-(x, z), linear-in-t
 * sampling must reproduce them exactly: u = U, v = V, theta = theta0 + gammaZ z + betaT t,
 * r = r0 + rz z, p' = px x; background pressure exactly exponential, p0 exp(-z / Hs).
 */
final class AnalyticSolution implements BreezeSolution {
    final double u;
    final double v;
    final double theta0 = 300.0;
    final double gammaZ = 0.004;
    final double betaT = 1.0 / 3600.0;
    final double r0 = 0.010;
    final double rz = -2e-6;
    final double px = 1e-4;
    final double p0 = 101000.0;
    final double scaleHeightM = 8000.0;
    private final double[] x;
    private final double[] z;
    private final Background bg;

    AnalyticSolution(double u, double v) {
        this.u = u;
        this.v = v;
        x = new double[64];
        for (int i = 0; i < x.length; i++) {
            x[i] = -100e3 + i * 3.3e3;
        }
        z = new double[] {0, 10, 30, 60, 100, 160, 250, 400, 600, 900, 1400, 2000};
        double[] th = new double[z.length];
        double[] r = new double[z.length];
        double[] p = new double[z.length];
        double[] uu = new double[z.length];
        double[] vv = new double[z.length];
        for (int k = 0; k < z.length; k++) {
            th[k] = theta0 + gammaZ * z[k];
            r[k] = r0 + rz * z[k];
            p[k] = pressureBackground(z[k]);
            uu[k] = u;
            vv[k] = v;
        }
        bg = new Background(z, th, r, p, uu, vv);
    }

    double pressureBackground(double zM) {
        return p0 * Math.exp(-zM / scaleHeightM);
    }

    double theta(double zM, double tSec) {
        return theta0 + gammaZ * zM + betaT * tSec;
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
        return 0;
    }

    @Override
    public double endSec() {
        return 86400;
    }

    @Override
    public Snapshot snapshotAt(double t) {
        int nx = x.length;
        int nz = z.length;
        double[] us = new double[nx * nz];
        double[] vs = new double[nx * nz];
        double[] ws = new double[nx * nz];
        double[] th = new double[nx * nz];
        double[] r = new double[nx * nz];
        double[] pp = new double[nx * nz];
        for (int k = 0; k < nz; k++) {
            for (int i = 0; i < nx; i++) {
                int a = k * nx + i;
                us[a] = u;
                vs[a] = v;
                th[a] = theta(z[k], t);
                r[a] = r0 + rz * z[k];
                pp[a] = px * x[i];
            }
        }
        return new Snapshot(t, nx, nz, us, vs, ws, th, r, pp);
    }

    @Override
    public String modelName() {
        return "analytic test field";
    }
}
