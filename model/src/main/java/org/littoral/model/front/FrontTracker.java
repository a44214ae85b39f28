package org.littoral.model.front;

/**
 * Finds the breeze's leading edge at every time of a {@link NearSurfaceSection}: the onshore reach (landward
 * edge of the onshore flow connected to the coast) and, for a model that makes fronts, the front at that edge
 * when it passes the tests of {@link FrontCriteria}. Stateless; see {@link FrontTrack} for what is derived.
 */
public final class FrontTracker {
    private FrontTracker() {
    }

    /** Tracks the leading edge through every time of the section (allocates a few arrays of one value per time). */
    public static FrontTrack track(NearSurfaceSection s, FrontCriteria c) {
        int nt = s.times();
        int nx = s.columns();
        double dx = s.dxM();
        double[] x = s.xM();
        int iLo = 0;
        while (iLo < nx - 1 && x[iLo] < s.zone().fromM() - 1e-6) {
            iLo++;
        }
        int iHi = nx - 1;
        while (iHi > 0 && x[iHi] > s.zone().toM() + 1e-6) {
            iHi--;
        }
        int coast = iLo;
        for (int i = iLo; i <= iHi; i++) {
            if (Math.abs(x[i]) < Math.abs(x[coast])) {
                coast = i;
            }
        }
        int window = Math.max(1, (int) Math.round(c.frontWindowM() / dx));
        int side = Math.max(1, (int) Math.round(c.sideWindowM() / dx));
        boolean sector = !s.fronts() && s.totalAlongshoreMPerS() != null;
        double tan = Math.tan(Math.toRadians(c.onshoreHalfWidthDeg()));
        double[] reach = new double[nt];
        boolean[] reachAtLimit = new boolean[nt];
        double[] front = new double[nt];
        double[] convergence = new double[nt];
        double[] jump = new double[nt];
        double[] contrast = new double[nt];
        for (int n = 0; n < nt; n++) {
            double[] u = s.totalCrossShoreMPerS()[n];
            double[] ub = s.breezeCrossShoreMPerS()[n];
            double[] v = sector ? s.totalAlongshoreMPerS()[n] : null;
            reach[n] = Double.NaN;
            front[n] = Double.NaN;
            convergence[n] = Double.NaN;
            jump[n] = Double.NaN;
            contrast[n] = Double.NaN;
            int edge = -1;
            for (int i = coast; i <= iHi && margin(u, ub, v, i, c, tan) >= 0; i++) {
                edge = i;
            }
            if (edge < 0) {
                continue;
            }
            reachAtLimit[n] = edge >= iHi - 1;
            reach[n] = x[edge];
            if (edge < iHi) {
                // where the onshore margin min(u, u') - threshold crosses zero between the last onshore column and the next
                double m0 = margin(u, ub, v, edge, c, tan);
                double m1 = margin(u, ub, v, edge + 1, c, tan);
                reach[n] += m0 / (m0 - m1) * (x[edge + 1] - x[edge]);
            }
            if (!s.fronts()) {
                continue;
            }
            // (a) the strongest convergence -du/dx of the total wind near the edge
            int best = -1;
            double cMax = Double.NEGATIVE_INFINITY;
            for (int i = Math.max(iLo + 1, edge - window); i <= Math.min(iHi - 1, edge + window); i++) {
                double conv = -(u[i + 1] - u[i - 1]) / (x[i + 1] - x[i - 1]);
                if (conv > cMax) {
                    cMax = conv;
                    best = i;
                }
            }
            if (best < 0) {
                continue;
            }
            // (b) the mean wind drops across it, onshore behind; (c) denser (lower theta-v) air behind
            int bLo = Math.max(iLo, best - side);
            int aHi = Math.min(iHi, best + side);
            if (bLo > best - 1 || aHi < best + 1) {
                continue;
            }
            double uBehind = mean(u, bLo, best - 1);
            double uAhead = mean(u, best + 1, aHi);
            double[] tv = s.thetaVK()[n];
            double dTheta = mean(tv, best + 1, aHi) - mean(tv, bLo, best - 1);
            convergence[n] = cMax;
            jump[n] = uBehind - uAhead;
            contrast[n] = dTheta;
            if (uBehind >= c.onshoreThresholdMPerS() && jump[n] >= c.minJumpMPerS() && dTheta >= c.minThetaVContrastK()) {
                front[n] = x[best] + subgridOffset(u, x, best) ;
            }
        }
        // (d) a front is a coherent feature: found at two consecutive output times, no faster than MAX_SPEED apart
        double[] kept = front.clone();
        double[] t = s.timeH();
        for (int n = 0; n < nt; n++) {
            if (Double.isNaN(front[n])) {
                continue;
            }
            boolean before = n > 0 && consistent(front[n - 1], front[n], t[n] - t[n - 1]);
            boolean after = n + 1 < nt && consistent(front[n], front[n + 1], t[n + 1] - t[n]);
            if (!before && !after) {
                kept[n] = Double.NaN;
            }
        }
        return new FrontTrack(s, c, reach, reachAtLimit, kept, convergence, jump, contrast, x[iLo], x[iHi]);
    }

    /**
     * Fastest plausible front motion between two output times, m/s: twice the top of the typical 1-5 m/s of
     * sea-breeze fronts (Simpson 1994, from memory). Candidates farther apart are different features.
     */
    public static final double MAX_SPEED_M_PER_S = 10.0;

    private static boolean consistent(double a, double b, double dtH) {
        return !Double.isNaN(a) && !Double.isNaN(b) && Math.abs(b - a) <= MAX_SPEED_M_PER_S * dtH * 3600.0;
    }

    /**
     * How far column i is into "onshore", m/s (>= 0: onshore): min(u - threshold, u' - threshold) and, when the
     * alongshore wind v is given (linear theory), u - |v| / tan(half-width) (inside the onshore sector).
     */
    static double margin(double[] u, double[] ub, double[] v, int i, FrontCriteria c, double tanHalfWidth) {
        double m = Math.min(u[i], ub[i]) - c.onshoreThresholdMPerS();
        return v == null ? m : Math.min(m, u[i] - Math.abs(v[i]) / tanHalfWidth);
    }

    private static double mean(double[] a, int from, int to) {
        double sum = 0;
        for (int i = from; i <= to; i++) {
            sum += a[i];
        }
        return sum / (to - from + 1);
    }

    /**
     * Sub-grid position of a convergence maximum at column i: the vertex of the parabola through the
     * convergence at i - 1, i, i + 1 (clamped to half a cell), m. Zero at the ends of the grid.
     */
    private static double subgridOffset(double[] u, double[] x, int i) {
        if (i < 2 || i > x.length - 3) {
            return 0.0;
        }
        double cm = -(u[i] - u[i - 2]);
        double c0 = -(u[i + 1] - u[i - 1]);
        double cp = -(u[i + 2] - u[i]);
        double den = cm - 2 * c0 + cp;
        if (!(den < 0)) {
            return 0.0;
        }
        double off = 0.5 * (cm - cp) / den;
        return Math.max(-0.5, Math.min(0.5, off)) * (x[i + 1] - x[i]);
    }
}
