package org.littoral.model.grid;

import java.util.Arrays;

/** Heights of model levels, m, strictly increasing from {@code levelsM[0] >= 0}. */
public final class VerticalGrid {
    private final double[] levelsM;

    private VerticalGrid(double[] levelsM) {
        for (int k = 1; k < levelsM.length; k++) {
            if (!(levelsM[k] > levelsM[k - 1])) {
                throw new IllegalArgumentException("vertical levels must increase strictly; level " + k + " is " + levelsM[k]
                        + " m after " + levelsM[k - 1] + " m");
            }
        }
        this.levelsM = levelsM;
    }

    public static VerticalGrid of(double[] levelsM) {
        return new VerticalGrid(levelsM.clone());
    }

    /** nz uniformly spaced levels from 0 to topM inclusive. */
    public static VerticalGrid uniform(int nz, double topM) {
        check(nz, topM);
        double[] z = new double[nz];
        for (int k = 0; k < nz; k++) {
            z[k] = topM * k / (nz - 1);
        }
        return new VerticalGrid(z);
    }

    /**
     * nz levels from 0 to topM, spacing growing geometrically from firstSpacingM at the ground.
     * The ratio r solves firstSpacingM (r^(nz-1) - 1)/(r - 1) = topM (bisection).
     */
    public static VerticalGrid stretched(int nz, double topM, double firstSpacingM) {
        check(nz, topM);
        if (!(firstSpacingM > 0) || firstSpacingM * (nz - 1) > topM) {
            throw new IllegalArgumentException("first spacing must be in (0, top/(levels-1)] = (0, " + topM / (nz - 1)
                    + "] m; got " + firstSpacingM + " m");
        }
        int m = nz - 1;
        double lo = 1.0;
        double hi = 2.0;
        while (sum(firstSpacingM, hi, m) < topM) {
            hi *= 2;
        }
        for (int it = 0; it < 200; it++) {
            double mid = 0.5 * (lo + hi);
            if (sum(firstSpacingM, mid, m) < topM) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double r = 0.5 * (lo + hi);
        double[] z = new double[nz];
        double dz = firstSpacingM;
        for (int k = 1; k < nz; k++) {
            z[k] = z[k - 1] + dz;
            dz *= r;
        }
        z[nz - 1] = topM;
        return new VerticalGrid(z);
    }

    private static double sum(double d, double r, int m) {
        return Math.abs(r - 1) < 1e-12 ? d * m : d * (Math.pow(r, m) - 1) / (r - 1);
    }

    private static void check(int nz, double topM) {
        if (nz < 2) {
            throw new IllegalArgumentException("a vertical grid needs at least 2 levels; got " + nz);
        }
        if (!(topM > 0)) {
            throw new IllegalArgumentException("top of the vertical grid must be positive; got " + topM + " m");
        }
    }

    public int size() {
        return levelsM.length;
    }

    public double levelM(int k) {
        return levelsM[k];
    }

    /** A copy of the level heights. */
    public double[] levelsM() {
        return levelsM.clone();
    }

    public double topM() {
        return levelsM[levelsM.length - 1];
    }

    @Override
    public String toString() {
        return "VerticalGrid" + Arrays.toString(levelsM);
    }
}
