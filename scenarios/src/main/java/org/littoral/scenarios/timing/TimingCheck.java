package org.littoral.scenarios.timing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.timing.TimingFlag.Kind;
import org.littoral.scenarios.timing.TimingInputs.ArrivalEnvelope;
import org.littoral.scenarios.timing.TimingInputs.DayConditions;
import org.littoral.scenarios.timing.TimingInputs.ObservedPassage;

/**
 * Sanity checks of observed front-passage times for one day: against an ensemble envelope of model
 * arrival times (percentile of each observed time), against the density-current speed between sites
 * (Benjamin 1968; Simpson &amp; Britter 1980, via {@link DensityCurrent}), and against the flight times
 * (is the passage one flight early or late?). Produces flags with reasons; the passages are not changed.
 */
public final class TimingCheck {
    private final TimingInputs.Settings settings;

    public TimingCheck(TimingInputs.Settings settings) {
        this.settings = settings;
    }

    /** Per passage: its percentile in the envelope (NaN without one) and the share of members that never arrive. */
    public record PassageAssessment(ObservedPassage passage, double envelopePercentile, int envelopeMembers,
                                    double fractionNeverArriving) {
    }

    /** Per pair of neighbouring sites: the implied speed with its range from the timing uncertainty, and the plausible range. */
    public record PairAssessment(String day, String label, String coastalSite, String inlandSite, double impliedSpeedMPerS,
                                 double impliedMinMPerS, double impliedMaxMPerS, double plausibleMinMPerS,
                                 double nominalMPerS, double plausibleMaxMPerS) {
    }

    public record Result(List<PassageAssessment> passages, List<PairAssessment> pairs, List<TimingFlag> flags) {
        public boolean flagged(Kind kind, String site) {
            return flags.stream().anyMatch(f -> f.kind() == kind && f.site().equals(site));
        }
    }

    /**
     * Checks one day.
     *
     * @param flightHours flight (take-off) times per site
     * @param envelopes ensemble arrival times per site and label (may be empty)
     */
    public Result check(DayConditions day, List<ObservedPassage> observed, Map<String, double[]> flightHours,
                        List<ArrivalEnvelope> envelopes) {
        List<TimingFlag> flags = new ArrayList<>();
        List<PassageAssessment> assessments = new ArrayList<>();
        List<PairAssessment> pairs = new ArrayList<>();
        double[] speed = DensityCurrent.plausibleSpeedRangeMPerS(day.thetaVContrastK(), day.contrastUncertaintyK(),
                day.thetaVK(), day.breezeDepthM(), day.depthUncertaintyM(), day.totalDepthM(), day.crossShoreWindMPerS(),
                settings.retardationMin);

        for (ObservedPassage p : observed) {
            double[] env = envelopeFor(envelopes, p, observed);
            double pct = Double.NaN;
            double never = Double.NaN;
            if (env != null) {
                pct = percentile(env, p.timeHours());
                never = fractionNaN(env);
            }
            if (env != null && settings.envelopeFlags) {
                double lo = quantile(env, settings.envelopeLowPercentile);
                double hi = quantile(env, settings.envelopeHighPercentile);
                if (Double.isInfinite(lo)) {
                    int arrived = (int) Math.round(env.length * (1.0 - never));
                    flags.add(new TimingFlag(Kind.OUTSIDE_ENVELOPE, p.day(), p.site(), p.label(), p.timeHours(), pct, "",
                            Double.NaN, String.format(Locale.ROOT, "a front passed at %s, but only %d of %d ensemble members' "
                                    + "fronts reach this site at all (the rest never arrive), so even the %.0f %% point of the envelope "
                                    + "is 'never'", clock(p.timeHours()), arrived, env.length, settings.envelopeLowPercentile)));
                } else if (p.timeHours() + p.uncertaintyHours() < lo || p.timeHours() - p.uncertaintyHours() > hi) {
                    flags.add(new TimingFlag(Kind.OUTSIDE_ENVELOPE, p.day(), p.site(), p.label(), p.timeHours(), pct, "",
                            Double.NaN, String.format(Locale.ROOT, "%s +/- %.0f min is at the %.1f percentile of %d ensemble "
                                    + "members; the %.0f-%.0f %% envelope is %s-%s", clock(p.timeHours()),
                                    60 * p.uncertaintyHours(), pct, env.length, settings.envelopeLowPercentile,
                                    settings.envelopeHighPercentile, clock(lo), clock(hi))));
                }
            }
            assessments.add(new PassageAssessment(p, pct, env == null ? 0 : env.length, never));

            // Earliest plausible arrival: the earliest ensemble member, or onset at the coast plus the distance
            // at the fastest plausible speed; the more lenient of the two when both are known.
            double earliest = Double.NaN;
            String why = "";
            if (env != null && settings.envelopeFlags && finiteMin(env) < Double.POSITIVE_INFINITY) {
                earliest = finiteMin(env);
                why = "the earliest of " + env.length + " ensemble members arrives at " + clock(earliest);
            }
            if (!Double.isNaN(day.earliestOnsetHours()) && speed[2] > 0) {
                double byOnset = day.earliestOnsetHours() + Math.max(0.0, p.inlandDistanceM()) / speed[2] / 3600.0;
                if (Double.isNaN(earliest) || byOnset < earliest) {
                    earliest = byOnset;
                    why = String.format(Locale.ROOT, "onset at the coast no earlier than %s plus %.1f km at the fastest "
                            + "plausible %.1f m/s gives %s", clock(day.earliestOnsetHours()), p.inlandDistanceM() / 1000.0,
                            speed[2], clock(byOnset));
                }
            }
            if (!Double.isNaN(earliest) && p.timeHours() + p.uncertaintyHours() < earliest) {
                flags.add(new TimingFlag(Kind.EARLIER_THAN_ANY_PLAUSIBLE_ONSET, p.day(), p.site(), p.label(), p.timeHours(),
                        earliest - p.timeHours(), "", Double.NaN, String.format(Locale.ROOT,
                        "%s +/- %.0f min is earlier than any plausible arrival: %s", clock(p.timeHours()),
                        60 * p.uncertaintyHours(), why)));
            }
        }

        // Neighbouring sites, same label, ordered inland.
        List<ObservedPassage> sorted = new ArrayList<>(observed);
        sorted.sort(Comparator.comparing(ObservedPassage::label).thenComparingDouble(ObservedPassage::inlandDistanceM));
        for (int i = 1; i < sorted.size(); i++) {
            ObservedPassage a = sorted.get(i - 1);
            ObservedPassage b = sorted.get(i);
            if (!a.label().equals(b.label()) || b.inlandDistanceM() <= a.inlandDistanceM()) {
                continue;
            }
            double dx = b.inlandDistanceM() - a.inlandDistanceM();
            double dtH = b.timeHours() - a.timeHours();
            double u = a.uncertaintyHours() + b.uncertaintyHours();
            if (dtH <= 0) {
                flags.add(new TimingFlag(Kind.INLAND_BEFORE_COAST, b.day(), b.site(), b.label(), b.timeHours(), -dtH, "",
                        Double.NaN, String.format(Locale.ROOT, "%s (%.1f km inland) passes at %s, %.0f min before %s "
                                + "(%.1f km) at %s%s", b.site(), b.inlandDistanceM() / 1000, clock(b.timeHours()), -60 * dtH,
                        a.site(), a.inlandDistanceM() / 1000, clock(a.timeHours()),
                        -dtH <= u ? " (within the combined uncertainty of " + Math.round(60 * u) + " min)" : "")));
                continue;
            }
            double implied = dx / (dtH * 3600.0);
            double impliedMin = dx / ((dtH + u) * 3600.0);
            double impliedMax = dtH > u ? dx / ((dtH - u) * 3600.0) : Double.POSITIVE_INFINITY;
            pairs.add(new PairAssessment(b.day(), b.label(), a.site(), b.site(), implied, impliedMin, impliedMax, speed[0],
                    speed[1], speed[2]));
            if (impliedMin > speed[2] || impliedMax < speed[0]) {
                double ratio = implied / speed[1];
                flags.add(new TimingFlag(Kind.IMPLIED_SPEED_IMPLAUSIBLE, b.day(), b.site(), b.label(), b.timeHours(), ratio,
                        "", Double.NaN, String.format(Locale.ROOT, "%s -> %s implies %.2f m/s (%.2f-%s m/s with the timing "
                                + "uncertainty), %.2f times the density-current speed %.2f m/s; plausible %.2f-%.2f m/s "
                                + "(Benjamin 1968; Simpson & Britter 1980)", a.site(), b.site(), implied, impliedMin,
                                Double.isInfinite(impliedMax) ? "inf" : String.format(Locale.ROOT, "%.2f", impliedMax), ratio,
                                speed[1], speed[0], speed[2])));
            }
        }

        for (ObservedPassage p : observed) {
            TimingFlag f = oneCadenceOff(p, observed, flightHours.get(p.site()), envelopeFor(envelopes, p, observed), speed);
            if (f != null) {
                flags.add(f);
            }
        }
        return new Result(assessments, pairs, flags);
    }

    /** A window of consistent times with the evidence it comes from. */
    private record Window(double from, double to, String evidence) {
        boolean contains(double t) {
            return t >= from && t <= to;
        }
    }

    private TimingFlag oneCadenceOff(ObservedPassage p, List<ObservedPassage> all, double[] flights, double[] env,
                                     double[] speed) {
        if (flights == null || flights.length < 3) {
            return null;
        }
        List<Window> windows = new ArrayList<>();
        if (env != null && settings.envelopeFlags) {
            windows.add(new Window(quantile(env, settings.envelopeLowPercentile), quantile(env, settings.envelopeHighPercentile),
                    String.format(Locale.ROOT, "ensemble %.0f-%.0f %% envelope", settings.envelopeLowPercentile,
                            settings.envelopeHighPercentile)));
        }
        for (ObservedPassage o : all) {
            if (o == p || !o.label().equals(p.label()) || o.site().equals(p.site()) || speed[2] <= 0) {
                continue;
            }
            double dxM = p.inlandDistanceM() - o.inlandDistanceM();
            double slowH = speed[0] > 0 ? Math.abs(dxM) / speed[0] / 3600.0 : Double.POSITIVE_INFINITY;
            double fastH = Math.abs(dxM) / speed[2] / 3600.0;
            String ev = "density-current speed " + String.format(Locale.ROOT, "%.1f-%.1f m/s", speed[0], speed[2])
                    + " from " + o.site() + " at " + clock(o.timeHours());
            windows.add(dxM > 0 ? new Window(o.timeHours() + fastH, o.timeHours() + slowH, ev)
                    : new Window(o.timeHours() - slowH, o.timeHours() - fastH, ev));
        }
        List<Window> violated = windows.stream().filter(w -> !w.contains(p.timeHours())).toList();
        if (violated.isEmpty()) {
            return null;
        }
        double[] f = flights.clone();
        Arrays.sort(f);
        int k = nearest(f, p.timeHours());
        double earlier;
        double later;
        double gap = k > 0 ? f[k] - f[k - 1] : f[k + 1] - f[k];
        if (Math.abs(p.timeHours() - f[k]) <= 0.25 * gap) {
            earlier = k > 0 ? f[k - 1] : Double.NaN;
            later = k < f.length - 1 ? f[k + 1] : Double.NaN;
        } else {
            // The time lies between two flights (e.g. their midpoint): shift by one flight either way.
            int j = p.timeHours() > f[k] ? k : k - 1;
            if (j < 0 || j + 1 >= f.length) {
                return null; // before the first or after the last flight: no neighbouring flight to move to
            }
            double offset = (p.timeHours() - f[j]) / (f[j + 1] - f[j]);
            earlier = j > 0 ? f[j - 1] + offset * (f[j] - f[j - 1]) : Double.NaN;
            later = j + 2 < f.length ? f[j + 1] + offset * (f[j + 2] - f[j + 1]) : Double.NaN;
        }
        boolean earlierOk = !Double.isNaN(earlier) && windows.stream().allMatch(w -> w.contains(earlier));
        boolean laterOk = !Double.isNaN(later) && windows.stream().allMatch(w -> w.contains(later));
        if (!earlierOk && !laterOk) {
            return null; // more than one flight off: the other flags say so
        }
        boolean pickEarlier;
        if (earlierOk && laterOk) {
            double centre = env != null && settings.envelopeFlags ? quantile(env, 50.0) : 0.5 * (violated.get(0).from() + violated.get(0).to());
            pickEarlier = Math.abs(earlier - centre) <= Math.abs(later - centre);
        } else {
            pickEarlier = earlierOk;
        }
        double t = pickEarlier ? earlier : later;
        StringBuilder ev = new StringBuilder();
        for (Window w : windows) {
            ev.append(ev.length() == 0 ? "" : "; ").append(w.evidence()).append(String.format(Locale.ROOT, " %s-%s",
                    clock(w.from()), clock(w.to())));
        }
        return new TimingFlag(Kind.ONE_CADENCE_OFF, p.day(), p.site(), p.label(), p.timeHours(), t - p.timeHours(),
                pickEarlier ? "earlier" : "later", t, String.format(Locale.ROOT, "%s is outside %s but one flight %s (%s) "
                        + "agrees with all the evidence: %s", clock(p.timeHours()), violated.get(0).evidence(),
                        pickEarlier ? "earlier" : "later", clock(t), ev));
    }

    private static int nearest(double[] sorted, double t) {
        int best = 0;
        for (int i = 1; i < sorted.length; i++) {
            if (Math.abs(sorted[i] - t) < Math.abs(sorted[best] - t)) {
                best = i;
            }
        }
        return best;
    }

    /**
     * The envelope a passage is compared with. The model's arrival at a site is the first time its front gets there
     * (docs/fronts.md), so only the first observed passage of the day at that site has a counterpart, whatever its
     * label: at a site behind a bay the first is the bay breeze, and a sea breeze after it is a second passage the
     * model's one leading edge does not hold. Later passages get no envelope (null); the density-current and flight
     * checks still apply to them.
     */
    private static double[] envelopeFor(List<ArrivalEnvelope> envelopes, ObservedPassage p, List<ObservedPassage> observed) {
        if (!firstAtSite(p, observed)) {
            return null;
        }
        for (ArrivalEnvelope e : envelopes) {
            if (e.site().equals(p.site()) && e.arrivalHours().length > 0) {
                return e.arrivalHours();
            }
        }
        return null;
    }

    /** True when no other observed passage at the same site on the same day is earlier. */
    public static boolean firstAtSite(ObservedPassage p, List<ObservedPassage> observed) {
        for (ObservedPassage o : observed) {
            if (o != p && o.day().equals(p.day()) && o.site().equals(p.site()) && o.timeHours() < p.timeHours()) {
                return false;
            }
        }
        return true;
    }

    /** Mid-rank percentile of t among the members (a member that never arrives counts as later than any time). */
    static double percentile(double[] members, double t) {
        double below = 0;
        for (double m : members) {
            double v = Double.isNaN(m) ? Double.POSITIVE_INFINITY : m;
            if (v < t) {
                below += 1;
            } else if (v == t) {
                below += 0.5;
            }
        }
        return 100.0 * below / members.length;
    }

    /** Empirical quantile (linear interpolation between order statistics, Hyndman &amp; Fan 1996 type 7); NaN = +inf. */
    static double quantile(double[] members, double percent) {
        double[] v = new double[members.length];
        for (int i = 0; i < v.length; i++) {
            v[i] = Double.isNaN(members[i]) ? Double.POSITIVE_INFINITY : members[i];
        }
        Arrays.sort(v);
        double pos = percent / 100.0 * (v.length - 1);
        int lo = (int) Math.floor(pos);
        int hi = Math.min(v.length - 1, lo + 1);
        if (Double.isInfinite(v[hi]) || Double.isInfinite(v[lo])) {
            return pos - lo == 0 ? v[lo] : v[hi];
        }
        return v[lo] + (pos - lo) * (v[hi] - v[lo]);
    }

    private static double finiteMin(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double x : v) {
            if (!Double.isNaN(x)) {
                m = Math.min(m, x);
            }
        }
        return m;
    }

    private static double fractionNaN(double[] v) {
        int n = 0;
        for (double x : v) {
            if (Double.isNaN(x)) {
                n++;
            }
        }
        return (double) n / v.length;
    }

    static String clock(double hours) {
        if (Double.isInfinite(hours)) {
            return "never";
        }
        long m = Math.round(hours * 60.0);
        return String.format(Locale.ROOT, "%02d:%02d", m / 60, m % 60);
    }
}
