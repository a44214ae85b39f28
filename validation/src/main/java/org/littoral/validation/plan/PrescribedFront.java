package org.littoral.validation.plan;

import org.littoral.model.coast.Coast;
import org.littoral.model.field.Background;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.field.Snapshot;

/**
 * A kinematic reference field with a closed-form front: until {@code startClockH} the whole domain has the
 * ambient (offshore) wind; afterwards the front stands at x_f(t) = c (t - t0) and behind it (x &lt; x_f) a
 * breeze layer of depth D carries onshore wind, cooler and moister air. The front is smoothed over
 * {@code widthM} with tanh. Arrival at inland distance x &gt; 0 is t0 + x / c exactly: the planner is
 * checked against this known answer.
 */
final class PrescribedFront implements BreezeSolution {
    private final double[] x;
    private final double[] z;
    private final Background bg;
    private final Coast coast;
    private final double startClockH;
    private final double speedMPerS;
    static final double DEPTH_M = 500;
    static final double WIDTH_M = 500;
    static final double AMBIENT_U = -2.0;
    static final double BREEZE_U = 4.0;

    PrescribedFront(double[] xM, double[] zM, Coast coast, double startClockH, double speedMPerS) {
        this.x = xM;
        this.z = zM;
        this.coast = coast;
        this.startClockH = startClockH;
        this.speedMPerS = speedMPerS;
        this.bg = Background.constantN(zM, 300.0, 0.01, 0.012, -3e-6, 101000.0, AMBIENT_U, 0.0);
    }

    /** Closed-form arrival at inland distance x, local clock hours. */
    double arrivalClockH(double xM) {
        return startClockH + xM / speedMPerS / 3600.0;
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
        return 2 * 86400.0;
    }

    @Override
    public String modelName() {
        return "prescribed constant-speed front (reference)";
    }

    @Override
    public Snapshot snapshotAt(double timeSec) {
        int nx = x.length;
        int nz = z.length;
        double clockH = coast.clockHoursFromSolar(timeSec / 3600.0);
        double xf = clockH < startClockH ? Double.NEGATIVE_INFINITY : speedMPerS * (clockH - startClockH) * 3600.0;
        double[] u = new double[nx * nz];
        double[] v = new double[nx * nz];
        double[] w = new double[nx * nz];
        double[] th = new double[nx * nz];
        double[] r = new double[nx * nz];
        double[] p = new double[nx * nz];
        for (int k = 0; k < nz; k++) {
            double inLayer = 0.5 * (1 - Math.tanh((z[k] - DEPTH_M) / 50.0));
            for (int i = 0; i < nx; i++) {
                double behind = xf == Double.NEGATIVE_INFINITY ? 0.0 : 0.5 * (1 - Math.tanh((x[i] - xf) / WIDTH_M));
                double b = behind * inLayer;
                int a = k * nx + i;
                u[a] = AMBIENT_U + b * (BREEZE_U - AMBIENT_U);
                v[a] = 1.0;
                th[a] = bg.thetaK()[k] - 2.0 * b;
                r[a] = bg.mixingRatioKgPerKg()[k] + 0.002 * b;
            }
        }
        return new Snapshot(timeSec, nx, nz, u, v, w, th, r, p);
    }
}
