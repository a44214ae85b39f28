package org.littoral.scenarios.analysis;

import java.util.Arrays;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;

/**
 * Profiles of one site put on a time-height grid (one column per flight, one row per height bin) for the
 * time-height sections of the reports: the cross-shore wind (onshore positive) and potential temperature. The
 * same binning serves compare (observed days beside the model) and observe (each observed site-day).
 *
 * @param timeH    flight times, local clock hours, increasing
 * @param heightM  height bins, m, increasing and evenly spaced
 * @param crossShoreMPerS [height][time], NaN where a flight has no value in that bin
 * @param thetaK   [height][time]
 */
public record TimeHeightGrid(double[] timeH, double[] heightM, double[][] crossShoreMPerS, double[][] thetaK) {

    /** Most height bins a grid holds (a 5 m step to 5 km). */
    static final int MAX_LEVELS = 1000;

    /**
     * The profiles (of one site and day, in time order) on evenly spaced height bins: the step is the median bin
     * spacing of the profiles, the bins run from the lowest to the highest height flown. Allocates.
     */
    public static TimeHeightGrid of(List<Profile> profiles, Coast coast) {
        if (profiles.isEmpty()) {
            throw new IllegalArgumentException("a time-height grid needs at least one profile");
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        double[] steps = new double[0];
        for (Profile p : profiles) {
            double[] z = p.heightM();
            int n0 = steps.length;
            steps = Arrays.copyOf(steps, n0 + Math.max(0, z.length - 1));
            for (int k = 0; k < z.length; k++) {
                lo = Math.min(lo, z[k]);
                hi = Math.max(hi, z[k]);
                if (k > 0) {
                    steps[n0 + k - 1] = z[k] - z[k - 1];
                }
            }
        }
        Arrays.sort(steps);
        double dz = steps.length == 0 ? 5.0 : Math.max(steps[steps.length / 2], (hi - lo) / (MAX_LEVELS - 1));
        if (!(dz > 0)) {
            dz = 5.0;
        }
        int nz = lo > hi ? 1 : (int) Math.round((hi - lo) / dz) + 1;
        double[] z = new double[nz];
        for (int k = 0; k < nz; k++) {
            z[k] = (lo > hi ? 0 : lo) + k * dz;
        }
        int nt = profiles.size();
        double[] t = new double[nt];
        double[][] u = new double[nz][nt];
        double[][] th = new double[nz][nt];
        double[] uCol = new double[nz];
        double[] thCol = new double[nz];
        for (int j = 0; j < nt; j++) {
            Profile p = profiles.get(j);
            t[j] = p.timeHours();
            onBins(p, z, 0.5 * dz, coast, uCol, thCol);
            for (int k = 0; k < nz; k++) {
                u[k][j] = uCol[k];
                th[k][j] = thCol[k];
            }
        }
        return new TimeHeightGrid(t, z, u, th);
    }

    /**
     * Cross-shore wind (onshore positive) and theta of a profile on the height bins z: each level goes to the
     * nearest bin when it lies within halfBin of it, bins without a level are NaN.
     */
    public static void onBins(Profile p, double[] z, double halfBin, Coast coast, double[] u, double[] th) {
        Arrays.fill(u, Double.NaN);
        Arrays.fill(th, Double.NaN);
        for (int k = 0; k < p.size(); k++) {
            int kk = nearest(z, p.heightM()[k]);
            if (Math.abs(z[kk] - p.heightM()[k]) <= halfBin + 1e-9) {
                u[kk] = coast.crossShore(p.windEastMPerS()[k], p.windNorthMPerS()[k]);
                th[kk] = p.thetaK()[k];
            }
        }
    }

    /** Index of the element of a closest to v (the first on a tie). */
    public static int nearest(double[] a, double v) {
        int best = 0;
        for (int i = 1; i < a.length; i++) {
            if (Math.abs(a[i] - v) < Math.abs(a[best] - v)) {
                best = i;
            }
        }
        return best;
    }
}
