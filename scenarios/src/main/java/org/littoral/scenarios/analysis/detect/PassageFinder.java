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
        double[][] low = s.useShallowLayer ? windSeries(sd, s.shallowWindLayer, s.minValidFraction) : null;
        if (low != null) {
            addShallowOnshoreTurns(sd, coast, s, low, kept, notes);
        }
        // Groups of kept changes [first, last]: one per change, or several changes of one gradual turn.
        List<int[]> groups = new ArrayList<>();
        for (int i = 0; i < kept.size(); i++) {
            groups.add(new int[] {i, i});
        }
        if (s.mergeGradualTurns) {
            mergeGradualTurns(groups, kept, wind, sd, coast, s, notes);
        }
        List<Passage> out = new ArrayList<>();
        boolean shallowOnshoreBefore = false; // an earlier passage brought onshore flow to the low layer only
        for (int g = 0; g < groups.size(); g++) {
            Cluster first = kept.get(groups.get(g)[0]);
            Cluster last = kept.get(groups.get(g)[1]);
            double[][] ba = groupBeforeAfter(groups, g, kept, wind, sd.size());
            double cb = coast.crossShore(ba[0][0], ba[0][1]);
            double ca = coast.crossShore(ba[1][0], ba[1][1]);
            double time = first.anchor.timeHours();
            double unc = first.anchor.uncertaintyHours();
            java.util.LinkedHashSet<String> names = new java.util.LinkedHashSet<>();
            for (int i = groups.get(g)[0]; i <= groups.get(g)[1]; i++) {
                for (ChangeCandidate m : kept.get(i).members) {
                    names.add(m.detector());
                    unc = Math.max(unc, Math.abs(m.timeHours() - kept.get(i).anchor.timeHours()));
                }
            }
            if (first != last) {
                // One gradual turn: the passage is when the cross-shore wind is half way from its before to its after value.
                int a = first.anchor.lastBefore();
                int b = last.anchor.firstAfter();
                time = halfTurnTime(sd, wind, coast, a, b, 0.5 * (cb + ca), 0.5 * (first.anchor.timeHours() + last.anchor.timeHours()));
                unc = Math.max(unc, 0.25 * (sd.timeHours()[b] - sd.timeHours()[a]));
            }
            boolean inB = inOnshoreSector(ba[0][0], ba[0][1], coast, s);
            boolean inA = inOnshoreSector(ba[1][0], ba[1][1], coast, s);
            PassageKind kind = kindOf(inB, inA, cb, ca);
            ChangeCandidate lowTurn = null;
            for (int i = groups.get(g)[0]; i <= groups.get(g)[1] && lowTurn == null; i++) {
                lowTurn = kept.get(i).lowOnshore;
            }
            if (lowTurn != null && !kind.onshore()) {
                // a shallow breeze: the low layer turns onshore, the detection layer above it does not (or not yet)
                int from = g == 0 ? 0 : kept.get(groups.get(g - 1)[1]).anchor.firstAfter();
                int to = g == groups.size() - 1 ? sd.size() - 1 : kept.get(groups.get(g + 1)[0]).anchor.lastBefore();
                double[][] lba = {meanWind(low, from, lowTurn.lastBefore()), meanWind(low, lowTurn.firstAfter(), to)};
                notes.add(String.format(java.util.Locale.ROOT, "%s: change at %.2f h turns the %s wind onshore (%.0f -> %.0f deg) "
                        + "while the %s wind does not (%.0f -> %.0f deg): a shallow onshore passage", sd.key(), lowTurn.timeHours(),
                        s.shallowWindLayer.label(), Coast.directionFromDeg(lba[0][0], lba[0][1]), Coast.directionFromDeg(lba[1][0], lba[1][1]),
                        s.windLayer.label(), Coast.directionFromDeg(ba[0][0], ba[0][1]), Coast.directionFromDeg(ba[1][0], ba[1][1])));
                ba = lba;
                cb = coast.crossShore(ba[0][0], ba[0][1]);
                ca = coast.crossShore(ba[1][0], ba[1][1]);
                kind = PassageKind.INTO_ONSHORE;
                shallowOnshoreBefore = true;
                time = s.halfTurnTiming ? halfTurnTime(sd, low, coast, lowTurn.lastBefore(), lowTurn.firstAfter(), 0.5 * (cb + ca),
                        lowTurn.timeHours()) : lowTurn.timeHours();
                unc = Math.max(unc, lowTurn.uncertaintyHours());
                names.add(lowTurn.detector());
            } else if (kind.onshore() && first == last && s.halfTurnTiming) {
                // one change: the passage is when the onshore component is half way from its before to its after value
                time = halfTurnTime(sd, wind, coast, first.anchor.lastBefore(), first.anchor.firstAfter(), 0.5 * (cb + ca), time);
                if (lowTurn != null) {
                    // the low layer turned onshore too: time the passage there, nearer the front's arrival at the ground
                    // (the head of a density current leans back, so its upper part arrives later)
                    int from = g == 0 ? 0 : kept.get(groups.get(g - 1)[1]).anchor.firstAfter();
                    int to = g == groups.size() - 1 ? sd.size() - 1 : kept.get(groups.get(g + 1)[0]).anchor.lastBefore();
                    double lcb = coast.crossShore(meanWind(low, from, lowTurn.lastBefore())[0], meanWind(low, from, lowTurn.lastBefore())[1]);
                    double lca = coast.crossShore(meanWind(low, lowTurn.firstAfter(), to)[0], meanWind(low, lowTurn.firstAfter(), to)[1]);
                    double lowTime = halfTurnTime(sd, low, coast, lowTurn.lastBefore(), lowTurn.firstAfter(), 0.5 * (lcb + lca),
                            lowTurn.timeHours());
                    unc = Math.max(unc, Math.abs(lowTime - time));
                    time = lowTime;
                    names.add(lowTurn.detector());
                }
            }
            if (kind == PassageKind.INTO_ONSHORE && shallowOnshoreBefore && lowTurn == null) {
                // the detection layer turns onshore above low-layer onshore flow that arrived earlier (a bay breeze): the
                // sea breeze after it strengthens onshore flow, as when both layers see both breezes
                int from = g == 0 ? 0 : kept.get(groups.get(g - 1)[1]).anchor.firstAfter();
                double[] lowBefore = meanWind(low, from, first.anchor.lastBefore());
                if (inOnshoreSector(lowBefore[0], lowBefore[1], coast, s)) {
                    kind = PassageKind.ONSHORE_STRENGTHENING;
                }
            }
            if (s.mergeGradualTurns && kind == PassageKind.ONSHORE_STRENGTHENING && out.stream().anyMatch(Passage::turnsOnshore)) {
                // A second onshore passage needs a shift of its own: the wind turns towards onshore by
                // strengtheningMinTurnDeg or the onshore component rises by strengtheningMinGainMPerS; a veer or a speed
                // change inside onshore flow that has already arrived is not a new front.
                double offB = Math.abs(signedTurnDeg(coast.bearingLandToSeaDeg(), Coast.directionFromDeg(ba[0][0], ba[0][1])));
                double offA = Math.abs(signedTurnDeg(coast.bearingLandToSeaDeg(), Coast.directionFromDeg(ba[1][0], ba[1][1])));
                int from = g == 0 ? 0 : kept.get(groups.get(g - 1)[1]).anchor.firstAfter();
                int to = g == groups.size() - 1 ? sd.size() - 1 : kept.get(groups.get(g + 1)[0]).anchor.lastBefore();
                if (s.driftTest && driftFitsAsWell(sd.timeHours(), wind, from, first.anchor.lastBefore(), last.anchor.firstAfter(), to,
                        noiseSd(wind, s.windSdFloorMPerS))) {
                    notes.add(String.format(java.util.Locale.ROOT, "%s: change at %.2f h inside onshore flow (%.0f -> %.0f deg) is a "
                            + "steady turn, not a step (a straight line in time fits as well): labelled OTHER", sd.key(), time,
                            Coast.directionFromDeg(ba[0][0], ba[0][1]), Coast.directionFromDeg(ba[1][0], ba[1][1])));
                    kind = PassageKind.OTHER;
                } else if (offB - offA < s.strengtheningMinTurnDeg && ca - cb < s.strengtheningMinGainMPerS) {
                    notes.add(String.format(java.util.Locale.ROOT, "%s: change at %.2f h inside onshore flow (%.0f -> %.0f deg, "
                            + "onshore wind %+.1f m/s) is not a second front: labelled OTHER", sd.key(), time,
                            Coast.directionFromDeg(ba[0][0], ba[0][1]), Coast.directionFromDeg(ba[1][0], ba[1][1]), ca - cb));
                    kind = PassageKind.OTHER;
                }
            }
            out.add(new Passage(sd.site(), sd.day(), g + 1, time, unc,
                    Math.min(1.0, (double) names.stream().map(PassageFinder::family).distinct().count() / detectors.size()),
                    new ArrayList<>(names), first.anchor.lastBefore(),
                    last.anchor.firstAfter(), ba[0], ba[1], cb, ca, Coast.directionFromDeg(ba[0][0], ba[0][1]),
                    Coast.directionFromDeg(ba[1][0], ba[1][1]), kind));
        }
        return new Outcome(out, unconfirmed, notes);
    }

    private static PassageKind kindOf(boolean inB, boolean inA, double cb, double ca) {
        return !inB && inA ? PassageKind.INTO_ONSHORE
                : inB && inA && ca > cb ? PassageKind.ONSHORE_STRENGTHENING
                : inB && !inA ? PassageKind.OUT_OF_ONSHORE : PassageKind.OTHER;
    }

    /**
     * The gradual-turn rule: adjacent groups merge when the state between them is short (at most
     * gradualTurnMaxHours from its first to its last profile), the wind turns the same way through both changes
     * (neither turn reverses the other by more than turnBackToleranceDeg), and the merged change turns the wind
     * onshore or strengthens onshore flow. A second onshore passage on a site-day therefore needs a wind state of
     * its own between two shifts, or a turn back: evidence of two separate shifts.
     */
    private static void mergeGradualTurns(List<int[]> groups, List<Cluster> kept, double[][] wind, SiteDay sd, Coast coast,
                                          DetectionSettings s, List<String> notes) {
        boolean merged = true;
        while (merged) {
            merged = false;
            for (int g = 0; g + 1 < groups.size(); g++) {
                Cluster left = kept.get(groups.get(g)[1]);
                Cluster right = kept.get(groups.get(g + 1)[0]);
                double holdH = sd.timeHours()[right.anchor.lastBefore()] - sd.timeHours()[left.anchor.firstAfter()];
                if (holdH > s.gradualTurnMaxHours + 1e-9) {
                    continue;
                }
                double[][] outer = groupBeforeAfter(groups, g, kept, wind, sd.size());
                double[][] outerR = groupBeforeAfter(groups, g + 1, kept, wind, sd.size());
                double[] before = outer[0];
                double[] mid = outer[1];
                double[] after = outerR[1];
                double dB = Coast.directionFromDeg(before[0], before[1]);
                double dM = Coast.directionFromDeg(mid[0], mid[1]);
                double dA = Coast.directionFromDeg(after[0], after[1]);
                if (Double.isNaN(dB) || Double.isNaN(dM) || Double.isNaN(dA)) {
                    continue;
                }
                double t1 = signedTurnDeg(dB, dM);
                double t2 = signedTurnDeg(dM, dA);
                boolean sameWay = t1 * t2 >= 0 || Math.min(Math.abs(t1), Math.abs(t2)) < s.turnBackToleranceDeg;
                double cb = coast.crossShore(before[0], before[1]);
                double ca = coast.crossShore(after[0], after[1]);
                PassageKind k = kindOf(inOnshoreSector(before[0], before[1], coast, s), inOnshoreSector(after[0], after[1], coast, s),
                        cb, ca);
                if (sameWay && k.onshore()) {
                    notes.add(String.format(java.util.Locale.ROOT, "%s: changes at %.2f h and %.2f h are one gradual turn "
                            + "(%.0f -> %.0f -> %.0f deg, %.2f h between): one passage", sd.key(), left.anchor.timeHours(),
                            right.anchor.timeHours(), dB, dM, dA, holdH));
                    groups.get(g)[1] = groups.get(g + 1)[1];
                    groups.remove(g + 1);
                    merged = true;
                    break;
                }
            }
        }
    }

    /** The wind-shift detector on the low layer is the same detector: it adds no agreement of its own to the confidence. */
    private static String family(String detector) {
        return detector.equals(LOW_LAYER_DETECTOR) ? "pelt-wind" : detector;
    }

    /** Name of the wind-shift detector on the low layer, as it appears in the passages' detectors column. */
    public static final String LOW_LAYER_DETECTOR = "pelt-wind-low";

    /** Signed turn from direction a to b, degrees in (-180, 180] (positive clockwise, veering). */
    public static double signedTurnDeg(double a, double b) {
        double d = (b - a) % 360.0;
        if (d > 180.0) {
            d -= 360.0;
        } else if (d <= -180.0) {
            d += 360.0;
        }
        return d;
    }

    /** Time the layer cross-shore wind crosses {@code target} between profiles a and b (linear); {@code dflt} when it does not. */
    private static double halfTurnTime(SiteDay sd, double[][] w, Coast coast, int a, int b, double target, double dflt) {
        double[] t = sd.timeHours();
        int prev = -1;
        for (int i = a; i <= b; i++) {
            if (Double.isNaN(w[0][i]) || Double.isNaN(w[1][i])) {
                continue;
            }
            if (prev >= 0) {
                double c0 = coast.crossShore(w[0][prev], w[1][prev]) - target;
                double c1 = coast.crossShore(w[0][i], w[1][i]) - target;
                if (c0 < 0 && c1 >= 0 || c0 > 0 && c1 <= 0) {
                    return t[prev] + (t[i] - t[prev]) * c0 / (c0 - c1);
                }
            }
            prev = i;
        }
        return dflt;
    }

    /** Mean wind {east, north} before and after group g, bounded by the neighbouring groups. */
    private static double[][] groupBeforeAfter(List<int[]> groups, int g, List<Cluster> kept, double[][] w, int n) {
        int from = g == 0 ? 0 : kept.get(groups.get(g - 1)[1]).anchor.firstAfter();
        int mid = kept.get(groups.get(g)[0]).anchor.lastBefore();
        int after = kept.get(groups.get(g)[1]).anchor.firstAfter();
        int to = g == groups.size() - 1 ? n - 1 : kept.get(groups.get(g + 1)[0]).anchor.lastBefore();
        return new double[][] {meanWind(w, from, mid), meanWind(w, after, to)};
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

    /** The wind-shift detector's noise scale: the larger robust scale of the two components, at least the floor. */
    private static double noiseSd(double[][] w, double floor) {
        double sd = floor;
        for (double[] c : w) {
            double[] f = java.util.Arrays.stream(c).filter(Double::isFinite).toArray();
            double r = RobustScale.noiseSdFromDifferences(f);
            if (r > sd) {
                sd = r;
            }
        }
        return sd;
    }

    private static double[][] windSeries(SiteDay sd, DetectionSettings s) {
        return windSeries(sd, s.windLayer, s.minValidFraction);
    }

    private static double[][] windSeries(SiteDay sd, org.littoral.scenarios.analysis.Layer layer, double minValid) {
        int n = sd.size();
        double[][] w = new double[2][n];
        for (int i = 0; i < n; i++) {
            Profile p = sd.profiles().get(i);
            w[0][i] = LayerMeans.mean(p, p.windEastMPerS(), layer, minValid);
            w[1][i] = LayerMeans.mean(p, p.windNorthMPerS(), layer, minValid);
        }
        return w;
    }

    /**
     * The wind-shift detector on the low layer: its changes that turn the low-layer wind into the onshore sector (from
     * outside it, by at least the minimum vector change) are attached to the detection-layer change they match, or become
     * changes of their own; the rest of the low layer's changes are ignored (the detection layer speaks for them).
     */
    private static void addShallowOnshoreTurns(SiteDay sd, Coast coast, DetectionSettings s, double[][] low, List<Cluster> kept,
                                               List<String> notes) {
        List<ChangeCandidate> lc = new WindShiftDetector(s, s.shallowWindLayer, LOW_LAYER_DETECTOR).detect(sd, coast);
        int n = sd.size();
        List<Cluster> added = new ArrayList<>();
        for (int i = 0; i < lc.size(); i++) {
            ChangeCandidate c = lc.get(i);
            int from = i == 0 ? 0 : lc.get(i - 1).firstAfter();
            int to = i == lc.size() - 1 ? n - 1 : lc.get(i + 1).lastBefore();
            double[] b = meanWind(low, from, c.lastBefore());
            double[] a = meanWind(low, c.firstAfter(), to);
            if (!(Math.hypot(a[0] - b[0], a[1] - b[1]) >= s.minVectorChangeMPerS)
                    || inOnshoreSector(b[0], b[1], coast, s) || !inOnshoreSector(a[0], a[1], coast, s)) {
                continue;
            }
            Cluster best = null;
            double bestDt = Double.POSITIVE_INFINITY;
            for (Cluster k : kept) {
                double dt = Math.abs(k.anchor.timeHours() - c.timeHours());
                if (dt <= Math.max(k.anchor.uncertaintyHours() + c.uncertaintyHours(), s.matchMinHours) && dt < bestDt) {
                    best = k;
                    bestDt = dt;
                }
            }
            if (best != null) {
                if (best.lowOnshore == null) {
                    best.lowOnshore = c;
                }
            } else {
                Cluster own = new Cluster(c);
                own.lowOnshore = c;
                added.add(own);
            }
        }
        kept.addAll(added);
        kept.sort(Comparator.comparingDouble(k -> k.anchor.timeHours()));
    }

    /**
     * True when one straight line in time fits the layer wind of profiles from..to as well as the step between
     * lastBefore and firstAfter does, by Schwarz's (1978) BIC with the noise scale sd known: the step has one more
     * parameter (its location) per change and two means where the line has an intercept and a slope per component, so
     * the line wins when its extra squared misfit, in units of sd^2, is at most ln n (n profiles used).
     */
    static boolean driftFitsAsWell(double[] t, double[][] w, int from, int lastBefore, int firstAfter, int to, double sd) {
        double rssStep = 0;
        double rssLine = 0;
        int used = 0;
        for (int c = 0; c < 2; c++) {
            double[] mean = new double[2];
            int[] cnt = new int[2];
            double st = 0;
            double sy = 0;
            double stt = 0;
            double sty = 0;
            int m = 0;
            for (int i = from; i <= to; i++) {
                double y = w[c][i];
                if (Double.isNaN(y) || i > lastBefore && i < firstAfter) {
                    continue;
                }
                int side = i <= lastBefore ? 0 : 1;
                mean[side] += y;
                cnt[side]++;
                st += t[i];
                sy += y;
                stt += t[i] * t[i];
                sty += t[i] * y;
                m++;
            }
            if (cnt[0] < 2 || cnt[1] < 2) {
                return false;
            }
            mean[0] /= cnt[0];
            mean[1] /= cnt[1];
            double slope = (m * sty - st * sy) / (m * stt - st * st);
            double icept = (sy - slope * st) / m;
            for (int i = from; i <= to; i++) {
                double y = w[c][i];
                if (Double.isNaN(y) || i > lastBefore && i < firstAfter) {
                    continue;
                }
                double ds = y - mean[i <= lastBefore ? 0 : 1];
                double dl = y - (icept + slope * t[i]);
                rssStep += ds * ds;
                rssLine += dl * dl;
            }
            used = Math.max(used, m);
        }
        return (rssLine - rssStep) / (sd * sd) <= Math.log(used);
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
        /** A low-layer change at the same time that turns the low-layer wind onshore, or null. */
        ChangeCandidate lowOnshore;
        final List<ChangeCandidate> members = new ArrayList<>();

        Cluster(ChangeCandidate anchor) {
            this.anchor = anchor;
            members.add(anchor);
        }
    }
}
