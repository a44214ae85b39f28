package org.littoral.model.front;

import org.littoral.model.grid.Bracket;

import java.util.ArrayList;
import java.util.List;
import org.littoral.model.field.Background;
import org.littoral.model.field.Snapshot;
import org.littoral.model.front.Arrival;
import org.littoral.model.front.Extent;
import org.littoral.model.front.FrontCriteria;
import org.littoral.model.front.FrontTrack;
import org.littoral.model.front.FrontTracker;
import org.littoral.model.front.ImpliedSpeed;

/**
 * The headline numbers of a run: peak onshore breeze, onset at the coast, arrival at each site, maximum inland
 * penetration, implied speeds between sites, and the depth of the circulation at its peak. The timing
 * definitions are not written here: they are THE definitions of {@link FrontTrack} (model layer,
 * docs/fronts.md), which every job uses; this class only lays them out for a run and its sites.
 */
public final class BreezeDiagnostics {
    private BreezeDiagnostics() {
    }

    /** Timing and strength at one site. */
    public record SiteTiming(String name, double xM, Arrival arrival, double peakBreezeMPerS, double peakClockH) {
        /** The arrival time, local clock hours, or null when there is none ({@link Arrival#note()} says why). */
        public Double arrivalClockH() {
            return arrival.timeH();
        }
    }

    /** Speed implied by the arrivals at two neighbouring sites (nearer the coast first). */
    public record SpeedBetween(String from, String to, ImpliedSpeed speed) {
        /** m/s, or NaN when not resolved. */
        public double speedMPerS() {
            return speed.resolved() ? speed.mPerS() : Double.NaN;
        }
    }

    /** Column structure at the peak. */
    public record Circulation(double clockH, double xM, double onshoreLayerDepthM, double circulationDepthM,
                              double returnFlowMPerS, double returnFlowHeightM) {
    }

    /**
     * @param track the leading edge through time and THE definitions
     * @param peak the largest breeze wind in the searched zone (a lower bound when at its edge)
     * @param peakTotalMPerS the total cross-shore wind there and then
     * @param peakTimeIndex output-time index of the peak
     * @param onset the onset at the coast ({@link FrontTrack#onsetAtCoast()})
     * @param penetration the maximum inland penetration ({@link FrontTrack#maxPenetration()})
     */
    public record Result(FrontTrack track, Extent peak, double peakTotalMPerS, int peakTimeIndex, Arrival onset, Extent penetration,
                         List<SiteTiming> sites, List<SpeedBetween> speeds) {
        public double thresholdMPerS() {
            return track.criteria().onshoreThresholdMPerS();
        }

        public double peakBreezeMPerS() {
            return peak.value();
        }

        public double peakClockH() {
            return peak.timeH();
        }

        public double peakXM() {
            return peak.xM();
        }

        /** Onset time at the coast, local clock hours, or null. */
        public Double onsetClockH() {
            return onset.timeH();
        }

        /** True when the coast is already onshore (or behind the front) at the first output time. */
        public boolean onshoreAtOutputStart() {
            return !onset.exists() && onset.note() != null && onset.note().startsWith("already");
        }

        /** Farthest inland position of the leading edge, m; NaN when none (a lower bound when at the search limit). */
        public double maxPenetrationM() {
            return penetration.exists() ? penetration.value() : Double.NaN;
        }

        public Double penetrationClockH() {
            return penetration.timeH();
        }

        /** Per output time: the onshore reach, m (NaN = the coast is not onshore). Allocates. */
        public double[] reachM() {
            double[] r = new double[track.section().times()];
            for (int n = 0; n < r.length; n++) {
                r[n] = track.reachM(n);
            }
            return r;
        }

        /** Per output time: the front, m (NaN = none). Allocates. */
        public double[] frontXM() {
            double[] r = new double[track.section().times()];
            for (int n = 0; n < r.length; n++) {
                r[n] = track.frontXM(n);
            }
            return r;
        }
    }

    public static Result compute(FieldSections fs, List<String> siteNames, double[] siteXM, double threshold) {
        int nt = fs.clockH.length;
        if (nt == 0) {
            throw new IllegalArgumentException("no output times inside the solution's span; widen output.start_h..end_h");
        }
        FrontTrack track = FrontTracker.track(fs.section(), FrontCriteria.standard(threshold));
        Extent peak = track.peakBreeze();
        int bn = 0;
        while (bn < nt - 1 && fs.clockH[bn] != peak.timeH()) {
            bn++;
        }
        int bi = Bracket.index(fs.xM, peak.xM());
        if (fs.xM[bi + 1] == peak.xM()) {
            bi++;
        }
        List<SiteTiming> sites = new ArrayList<>();
        for (int s = 0; s < siteXM.length; s++) {
            double[] series = seriesAt(fs, siteXM[s]);
            int pk = 0;
            for (int n = 1; n < nt; n++) {
                if (series[n] > series[pk]) {
                    pk = n;
                }
            }
            sites.add(new SiteTiming(siteNames.get(s), siteXM[s], track.arrivalAt(siteXM[s]), series[pk], fs.clockH[pk]));
        }
        List<SiteTiming> byX = new ArrayList<>(sites);
        byX.sort((a, b) -> Double.compare(a.xM(), b.xM()));
        List<SpeedBetween> speeds = new ArrayList<>();
        for (int s = 1; s < byX.size(); s++) {
            SiteTiming a = byX.get(s - 1);
            SiteTiming b = byX.get(s);
            if (a.arrival().exists() || b.arrival().exists()) {
                speeds.add(new SpeedBetween(a.name(), b.name(), FrontTrack.impliedSpeed(a.arrival(), a.xM(), b.arrival(), b.xM())));
            }
        }
        return new Result(track, peak, fs.nearSurfaceTotalU[bn][bi], bn, track.onsetAtCoast(), track.maxPenetration(), sites, speeds);
    }

    /** u' along the output times at position x (linear in x). */
    static double[] seriesAt(FieldSections fs, double x) {
        return seriesAt(fs.nearSurfaceU, fs, x);
    }

    /** A near-surface section (u' or total u, [time][x]) along the output times at position x (linear in x). */
    static double[] seriesAt(double[][] section, FieldSections fs, double x) {
        int i = Bracket.index(fs.xM, x);
        double w = Math.max(0, Math.min(1, (x - fs.xM[i]) / (fs.xM[i + 1] - fs.xM[i])));
        double[] out = new double[fs.clockH.length];
        for (int n = 0; n < out.length; n++) {
            out[n] = (1 - w) * section[n][i] + w * section[n][i + 1];
        }
        return out;
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
        int i = Bracket.index(xM, peakXM);
        if (Math.abs(xM[i + 1] - peakXM) < Math.abs(xM[i] - peakXM)) {
            i++;
        }
        int nz = zM.length;
        double[] u = new double[nz];
        for (int k = 0; k < nz; k++) {
            u[k] = s.uMPerS()[k * nx + i] - ambientU[k];
        }
        int kStart = Bracket.index(zM, nearSurfaceM);
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
