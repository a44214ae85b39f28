package org.littoral.scenarios.analysis.detect;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.LayerMeans;
import org.littoral.scenarios.analysis.SiteDay;

/**
 * Runs the detectors on a site-day, matches their changes, and turns them into ordered, labelled
 * passages with a timing uncertainty and a confidence from the detectors' agreement.
 */
public final class PassageFinder {

    /**
     * @param passages    accepted passages in time order
     * @param unconfirmed changes not accepted (secondary-only, or too small a wind change), with the reason in notes
     * @param notes       one line per rejected change
     */
    public record Outcome(List<Passage> passages, List<ChangeCandidate> unconfirmed, List<String> notes) {
    }

    private PassageFinder() {
    }

    /** The detectors the settings ask for: the wind-shift detector first (the primary), then the multivariate one. */
    public static List<PassageDetector> detectors(DetectionSettings s) {
        List<PassageDetector> d = new ArrayList<>();
        d.add(new WindShiftDetector(s));
        if (s.useMultivariate) {
            d.add(new MultivariateDetector(s));
        }
        return d;
    }

    public static Outcome find(SiteDay sd, Coast coast, List<PassageDetector> detectors, DetectionSettings s) {
        List<List<ChangeCandidate>> found = new ArrayList<>();
        for (PassageDetector d : detectors) {
            found.add(new ArrayList<>(d.detect(sd, coast)));
        }
        List<ChangeCandidate> unconfirmed = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        List<Cluster> clusters = new ArrayList<>();
        for (ChangeCandidate c : found.get(0)) {
            clusters.add(new Cluster(c));
        }
        for (int k = 1; k < found.size(); k++) {
            List<ChangeCandidate> others = found.get(k);
            boolean[] used = new boolean[others.size()];
            for (Cluster cl : clusters) {
                int best = -1;
                double bestDt = Double.POSITIVE_INFINITY;
                for (int j = 0; j < others.size(); j++) {
                    if (used[j]) {
                        continue;
                    }
                    ChangeCandidate o = others.get(j);
                    double dt = Math.abs(o.timeHours() - cl.anchor.timeHours());
                    double tol = Math.max(o.uncertaintyHours() + cl.anchor.uncertaintyHours(), s.matchMinHours);
                    if (dt <= tol && dt < bestDt) {
                        best = j;
                        bestDt = dt;
                    }
                }
                if (best >= 0) {
                    used[best] = true;
                    cl.members.add(others.get(best));
                }
            }
            for (int j = 0; j < others.size(); j++) {
                if (!used[j]) {
                    if (s.requirePrimary) {
                        unconfirmed.add(others.get(j));
                        notes.add(String.format(java.util.Locale.ROOT, "%s: %s change at %.2f h not confirmed by %s",
                                sd.key(), others.get(j).detector(), others.get(j).timeHours(), detectors.get(0).name()));
                    } else {
                        clusters.add(new Cluster(others.get(j)));
                    }
                }
            }
        }
        clusters.sort(Comparator.comparingDouble(c -> c.anchor.timeHours()));
        // Reject primary changes that hardly change the wind vector, then label with the rest.
        double[][] wind = windSeries(sd, s);
        List<Cluster> kept = new ArrayList<>();
        for (int i = 0; i < clusters.size(); i++) {
            double[][] ba = beforeAfter(clusters, i, wind, sd.size());
            double dv = Math.hypot(ba[1][0] - ba[0][0], ba[1][1] - ba[0][1]);
            if (!(dv >= s.minVectorChangeMPerS)) {
                unconfirmed.add(clusters.get(i).anchor);
                notes.add(String.format(java.util.Locale.ROOT,
                        "%s: change at %.2f h rejected: layer-mean wind vector changes by %.2f m/s < %.2f m/s",
                        sd.key(), clusters.get(i).anchor.timeHours(), dv, s.minVectorChangeMPerS));
            } else {
                kept.add(clusters.get(i));
            }
        }
        List<Passage> out = new ArrayList<>();
        for (int i = 0; i < kept.size(); i++) {
            Cluster cl = kept.get(i);
            double[][] ba = beforeAfter(kept, i, wind, sd.size());
            double unc = cl.anchor.uncertaintyHours();
            List<String> names = new ArrayList<>();
            for (ChangeCandidate m : cl.members) {
                names.add(m.detector());
                unc = Math.max(unc, Math.abs(m.timeHours() - cl.anchor.timeHours()));
            }
            double cb = coast.crossShore(ba[0][0], ba[0][1]);
            double ca = coast.crossShore(ba[1][0], ba[1][1]);
            boolean inB = inOnshoreSector(ba[0][0], ba[0][1], coast, s);
            boolean inA = inOnshoreSector(ba[1][0], ba[1][1], coast, s);
            PassageKind kind = !inB && inA ? PassageKind.INTO_ONSHORE
                    : inB && inA && ca > cb ? PassageKind.ONSHORE_STRENGTHENING
                    : inB && !inA ? PassageKind.OUT_OF_ONSHORE : PassageKind.OTHER;
            out.add(new Passage(sd.site(), sd.day(), i + 1, cl.anchor.timeHours(), unc,
                    (double) cl.members.size() / detectors.size(), names, cl.anchor.lastBefore(), cl.anchor.firstAfter(),
                    ba[0], ba[1], cb, ca, Coast.directionFromDeg(ba[0][0], ba[0][1]),
                    Coast.directionFromDeg(ba[1][0], ba[1][1]), kind));
        }
        return new Outcome(out, unconfirmed, notes);
    }

    /** True when the wind blows from sea to land within the sector half-width of the inland direction. */
    public static boolean inOnshoreSector(double east, double north, Coast coast, DetectionSettings s) {
        if (!(Math.hypot(east, north) >= s.calmSpeedMPerS)) {
            return false;
        }
        double cross = coast.crossShore(east, north);
        double along = coast.alongshore(east, north);
        return Math.toDegrees(Math.atan2(Math.abs(along), cross)) <= s.onshoreHalfWidthDeg;
    }

    private static double[][] windSeries(SiteDay sd, DetectionSettings s) {
        int n = sd.size();
        double[][] w = new double[2][n];
        for (int i = 0; i < n; i++) {
            Profile p = sd.profiles().get(i);
            w[0][i] = LayerMeans.mean(p, p.windEastMPerS(), s.windLayer, s.minValidFraction);
            w[1][i] = LayerMeans.mean(p, p.windNorthMPerS(), s.windLayer, s.minValidFraction);
        }
        return w;
    }

    /** Mean wind {east, north} before and after cluster i, bounded by its neighbours. */
    private static double[][] beforeAfter(List<Cluster> cl, int i, double[][] w, int n) {
        int from = i == 0 ? 0 : cl.get(i - 1).anchor.firstAfter();
        int mid = cl.get(i).anchor.lastBefore();
        int to = i == cl.size() - 1 ? n - 1 : cl.get(i + 1).anchor.lastBefore();
        return new double[][] {meanWind(w, from, mid), meanWind(w, cl.get(i).anchor.firstAfter(), to)};
    }

    private static double[] meanWind(double[][] w, int a, int b) {
        double e = 0;
        double no = 0;
        int c = 0;
        for (int i = a; i <= b; i++) {
            if (!Double.isNaN(w[0][i]) && !Double.isNaN(w[1][i])) {
                e += w[0][i];
                no += w[1][i];
                c++;
            }
        }
        return c == 0 ? new double[] {Double.NaN, Double.NaN} : new double[] {e / c, no / c};
    }

    private static final class Cluster {
        final ChangeCandidate anchor;
        final List<ChangeCandidate> members = new ArrayList<>();

        Cluster(ChangeCandidate anchor) {
            this.anchor = anchor;
            members.add(anchor);
        }
    }
}
