package org.littoral.scenarios.run;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.field.Background;
import org.littoral.model.field.Snapshot;

/**
 * The headline numbers of a run, all from the near-surface cross-shore breeze wind u' (model wind
 * minus ambient wind) unless stated: peak onshore breeze, onset at the coast, arrival at each site,
 * maximum inland penetration, and the depth of the circulation at its peak.
 *
 * <p>Definitions (ours): <b>onset</b> is the first time u' at x = 0 rises through the onshore
 * threshold within the output window (linear interpolation between output times); <b>arrival</b> at a
 * site is the first such rise at the site; <b>penetration</b> is the farthest x inland to which u'
 * exceeds the threshold continuously from the coast; the <b>onshore-layer depth</b> is the height at
 * which u' first changes sign above the near-surface level, in the column of peak onshore breeze at the
 * peak time, and the <b>circulation depth</b> the top of the return flow above it (where u' comes
 * back above -10 % of the return-flow peak).
 *
 * <p>For a nonlinear run the searches keep to the interior clear of the far-field sponges
 * ({@link FieldSections#interiorFromM}), and arrival at a site inland only counts once the breeze's
 * onshore reach from the coast has come near it ({@link #onshoreAfterFront}), because resolved
 * convection over land makes brief onshore gusts ahead of the front. The <b>front</b> at each time is
 * where the near-surface convergence of the total wind peaks within {@link #FRONT_WINDOW_M} of the
 * onshore reach.
 */
public final class BreezeDiagnostics {
    private BreezeDiagnostics() {
    }

    /** Timing and strength at one site. */
    public record SiteTiming(String name, double xM, Double arrivalClockH, double peakBreezeMPerS, double peakClockH) {
    }

    /** Speed implied by arrivals at two sites. */
    public record ImpliedSpeed(String from, String to, double speedMPerS) {
    }

    /** Column structure at the peak. */
    public record Circulation(double clockH, double xM, double onshoreLayerDepthM, double circulationDepthM,
                              double returnFlowMPerS, double returnFlowHeightM) {
    }

    /**
     * @param reachM per output time, the onshore reach of the breeze wind from the coast, m (NaN where the
     *        coast is not onshore)
     * @param frontXM per output time, the front: where the near-surface convergence -du/dx of the total wind
     *        peaks within {@link #FRONT_WINDOW_M} of the reach, m (NaN without a reach)
     * @param frontConvergencePerS that peak convergence, 1/s (NaN without a reach)
     */
    public record Result(double thresholdMPerS, double peakBreezeMPerS, double peakTotalMPerS, double peakClockH, double peakXM,
                         int peakTimeIndex, Double onsetClockH, boolean onshoreAtOutputStart, double maxPenetrationM,
                         Double penetrationClockH, List<SiteTiming> sites, List<ImpliedSpeed> speeds, double[] reachM,
                         double[] frontXM, double[] frontConvergencePerS) {
    }

    /** Half-width of the search for the front's convergence maximum around the onshore reach, m. */
    public static final double FRONT_WINDOW_M = 10_000.0;
    /** A nonlinear run's arrival at a site counts once the onshore reach from the coast is this close, m. */
    public static final double ARRIVAL_WINDOW_M = 5_000.0;

    public static Result compute(FieldSections fs, List<String> siteNames, double[] siteXM, double threshold) {
        int nt = fs.clockH.length;
        if (nt == 0) {
            throw new IllegalArgumentException("no output times inside the solution's span; widen output.start_h..end_h");
        }
        int nx = fs.xM.length;
        int iLo = 0;
        while (iLo < nx - 1 && fs.xM[iLo] < fs.interiorFromM) {
            iLo++;
        }
        int iHi = nx - 1;
        while (iHi > 0 && fs.xM[iHi] > fs.interiorToM) {
            iHi--;
        }
        double best = Double.NEGATIVE_INFINITY;
        int bn = 0;
        int bi = iLo;
        for (int n = 0; n < nt; n++) {
            for (int i = iLo; i <= iHi; i++) {
                if (fs.nearSurfaceU[n][i] > best) {
                    best = fs.nearSurfaceU[n][i];
                    bn = n;
                    bi = i;
                }
            }
        }
        // Onset and arrivals are read from the TOTAL near-surface cross-shore wind (ambient included): the
        // wind a site sees turn onshore, which is what a profiling campaign (and the analysis chain) detects.
        // With an onshore ambient wind the total is onshore from the start and there is no arrival.
        double[] atCoast = seriesAt(fs.nearSurfaceTotalU, fs, 0.0);
        Double onset = firstRise(fs.clockH, atCoast, threshold);
        boolean onshoreAtStart = atCoast[0] >= threshold;

        int i0 = FieldSections.bracket(fs.xM, 0.0);
        double pen = 0;
        Double penTime = null;
        double[] reachM = new double[nt];
        double[] frontX = new double[nt];
        double[] frontC = new double[nt];
        for (int n = 0; n < nt; n++) {
            double reach = Double.NaN;
            for (int i = i0; i <= iHi; i++) {
                if (fs.nearSurfaceU[n][i] >= threshold) {
                    reach = fs.xM[i];
                } else if (fs.xM[i] >= 0) {
                    break;
                }
            }
            reachM[n] = reach;
            frontX[n] = Double.NaN;
            frontC[n] = Double.NaN;
            if (!Double.isNaN(reach)) {
                double c = Double.NEGATIVE_INFINITY;
                for (int i = Math.max(1, iLo); i <= Math.min(nx - 2, iHi); i++) {
                    if (Math.abs(fs.xM[i] - reach) > FRONT_WINDOW_M) {
                        continue;
                    }
                    double conv = -(fs.nearSurfaceTotalU[n][i + 1] - fs.nearSurfaceTotalU[n][i - 1]) / (fs.xM[i + 1] - fs.xM[i - 1]);
                    if (conv > c) {
                        c = conv;
                        frontX[n] = fs.xM[i];
                    }
                }
                frontC[n] = c;
            }
            if (!Double.isNaN(reach) && reach > pen) {
                pen = reach;
                penTime = fs.clockH[n];
            }
        }

        List<SiteTiming> sites = new ArrayList<>();
        for (int s = 0; s < siteXM.length; s++) {
            double[] series = seriesAt(fs, siteXM[s]);
            double[] total = seriesAt(fs.nearSurfaceTotalU, fs, siteXM[s]);
            double[] along = seriesAt(fs.nearSurfaceTotalV, fs, siteXM[s]);
            int pk = 0;
            for (int n = 1; n < nt; n++) {
                if (series[n] > series[pk]) {
                    pk = n;
                }
            }
            Double arrival = fs.arrivalFollowsFront && siteXM[s] > 0
                    ? onshoreAfterFront(fs.clockH, total, along, threshold, reachM, siteXM[s])
                    : firstOnshore(fs.clockH, total, along, threshold);
            sites.add(new SiteTiming(siteNames.get(s), siteXM[s], arrival, series[pk], fs.clockH[pk]));
        }
        List<SiteTiming> byX = new ArrayList<>(sites);
        byX.sort((a, b) -> Double.compare(a.xM(), b.xM()));
        List<ImpliedSpeed> speeds = new ArrayList<>();
        for (int s = 1; s < byX.size(); s++) {
            SiteTiming a = byX.get(s - 1);
            SiteTiming b = byX.get(s);
            if (a.arrivalClockH() != null && b.arrivalClockH() != null && b.arrivalClockH() > a.arrivalClockH()) {
                speeds.add(new ImpliedSpeed(a.name(), b.name(), (b.xM() - a.xM()) / ((b.arrivalClockH() - a.arrivalClockH()) * 3600.0)));
            }
        }
        return new Result(threshold, best, fs.nearSurfaceTotalU[bn][bi], fs.clockH[bn], fs.xM[bi], bn, onset, onshoreAtStart, pen,
                penTime, sites, speeds, reachM, frontX, frontC);
    }

    /**
     * Arrival at an inland site of a nonlinear run: as {@link #firstOnshore}, but only once the breeze's
     * onshore reach from the coast has come within {@link #ARRIVAL_WINDOW_M} of the site, so that a gust of
     * resolved convection ahead of the front does not count. If the total wind is already in the onshore
     * sector when the front comes near (a gust that stayed), the arrival is that time. Null when the reach
     * never comes near, or the wind never turns onshore after it has.
     */
    static Double onshoreAfterFront(double[] t, double[] cross, double[] along, double threshold, double[] reachM, double x) {
        int n0 = -1;
        for (int n = 0; n < t.length; n++) {
            if (!Double.isNaN(reachM[n]) && reachM[n] >= x - ARRIVAL_WINDOW_M) {
                n0 = n;
                break;
            }
        }
        if (n0 < 0) {
            return null;
        }
        double tan = Math.tan(Math.toRadians(ONSHORE_HALF_WIDTH_DEG));
        int from = Math.max(0, n0 - 1);
        if (from > 0 && inSector(cross[from], along[from], threshold, tan)) {
            if (inSector(cross[from - 1], along[from - 1], threshold, tan)) {
                return t[from];
            }
            from--;
        }
        double[] tt = java.util.Arrays.copyOfRange(t, from, t.length);
        double[] cc = java.util.Arrays.copyOfRange(cross, from, t.length);
        double[] aa = java.util.Arrays.copyOfRange(along, from, t.length);
        return firstOnshore(tt, cc, aa, threshold);
    }

    /** u' along the output times at position x (linear in x). */
    static double[] seriesAt(FieldSections fs, double x) {
        return seriesAt(fs.nearSurfaceU, fs, x);
    }

    /** A near-surface section (u' or total u, [time][x]) along the output times at position x (linear in x). */
    static double[] seriesAt(double[][] section, FieldSections fs, double x) {
        int i = FieldSections.bracket(fs.xM, x);
        double w = Math.max(0, Math.min(1, (x - fs.xM[i]) / (fs.xM[i + 1] - fs.xM[i])));
        double[] out = new double[fs.clockH.length];
        for (int n = 0; n < out.length; n++) {
            out[n] = (1 - w) * section[n][i] + w * section[n][i + 1];
        }
        return out;
    }

    /**
     * Half-width of the onshore sector, degrees either side of the inland direction: the same default as
     * the analysis chain's (analysis.detect.DetectionSettings.onshoreHalfWidthDeg), so the model's own arrival
     * and what the chain detects in its synthetic soundings mean the same thing.
     */
    public static final double ONSHORE_HALF_WIDTH_DEG = 60.0;

    /**
     * Arrival of the onshore flow at a site: the first time the TOTAL near-surface wind, having been outside,
     * enters the onshore sector (cross-shore component at least the threshold and within
     * {@link #ONSHORE_HALF_WIDTH_DEG} of the inland direction); interpolated between output times on the
     * cross-shore component; null when it never does (e.g. onshore from the start, or never onshore).
     */
    static Double firstOnshore(double[] t, double[] cross, double[] along, double threshold) {
        double tan = Math.tan(Math.toRadians(ONSHORE_HALF_WIDTH_DEG));
        boolean prevIn = inSector(cross[0], along[0], threshold, tan);
        for (int n = 1; n < cross.length; n++) {
            boolean in = inSector(cross[n], along[n], threshold, tan);
            if (!prevIn && in) {
                // the sector edge is reached when cross = max(threshold, |along| / tan): interpolate on that margin
                double m0 = cross[n - 1] - Math.max(threshold, Math.abs(along[n - 1]) / tan);
                double m1 = cross[n] - Math.max(threshold, Math.abs(along[n]) / tan);
                double f = m1 > m0 ? Math.max(0, Math.min(1, -m0 / (m1 - m0))) : 1.0;
                return t[n - 1] + f * (t[n] - t[n - 1]);
            }
            prevIn = in;
        }
        return null;
    }

    private static boolean inSector(double cross, double along, double threshold, double tanHalfWidth) {
        return cross >= threshold && Math.abs(along) <= cross * tanHalfWidth;
    }

    /** First time the series rises through the threshold (interpolated), or null. */
    static Double firstRise(double[] t, double[] v, double threshold) {
        for (int n = 1; n < v.length; n++) {
            if (v[n - 1] < threshold && v[n] >= threshold) {
                double f = (threshold - v[n - 1]) / (v[n] - v[n - 1]);
                return t[n - 1] + f * (t[n] - t[n - 1]);
            }
        }
        return null;
    }

    /** The vertical structure of the breeze in the column of the peak, from a snapshot at the peak time. */
    public static Circulation circulation(Snapshot s, double[] xM, double[] zM, Background bg, double clockH, double peakXM,
                                          double nearSurfaceM) {
        double[] ambient = new double[zM.length];
        for (int k = 0; k < zM.length; k++) {
            ambient[k] = Background.interpolate(bg.zM(), bg.ambientUMPerS(), zM[k]);
        }
        return circulation(s, xM, zM, ambient, clockH, peakXM, nearSurfaceM);
    }

    /** As above, with the ambient cross-shore wind given at each level (a nonlinear run's far-field reference). */
    public static Circulation circulation(Snapshot s, double[] xM, double[] zM, double[] ambientU, double clockH, double peakXM,
                                          double nearSurfaceM) {
        int nx = xM.length;
        int i = FieldSections.bracket(xM, peakXM);
        if (Math.abs(xM[i + 1] - peakXM) < Math.abs(xM[i] - peakXM)) {
            i++;
        }
        int nz = zM.length;
        double[] u = new double[nz];
        for (int k = 0; k < nz; k++) {
            u[k] = s.uMPerS()[k * nx + i] - ambientU[k];
        }
        int kStart = FieldSections.bracket(zM, nearSurfaceM);
        double depth = Double.NaN;
        int kCross = -1;
        for (int k = kStart + 1; k < nz; k++) {
            if (u[k - 1] > 0 && u[k] <= 0) {
                depth = zM[k - 1] + (zM[k] - zM[k - 1]) * u[k - 1] / (u[k - 1] - u[k]);
                kCross = k;
                break;
            }
        }
        double ret = Double.NaN;
        double retZ = Double.NaN;
        double top = Double.NaN;
        if (kCross > 0) {
            int km = kCross;
            for (int k = kCross; k < nz && u[k] <= 0; k++) {
                if (u[k] < u[km]) {
                    km = k;
                }
            }
            ret = u[km];
            retZ = zM[km];
            double lim = 0.1 * ret;
            for (int k = km + 1; k < nz; k++) {
                if (u[k] >= lim) {
                    top = zM[k - 1] + (zM[k] - zM[k - 1]) * (lim - u[k - 1]) / (u[k] - u[k - 1]);
                    break;
                }
            }
        }
        return new Circulation(clockH, xM[i], depth, top, ret, retZ);
    }
}
