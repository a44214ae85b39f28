package org.littoral.scenarios.analysis;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.composite.CompositeRow;
import org.littoral.scenarios.analysis.composite.CompositeSpec;
import org.littoral.scenarios.analysis.composite.Composites;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.metrics.DistributionRow;
import org.littoral.scenarios.analysis.metrics.PassageResponse;
import org.littoral.scenarios.analysis.metrics.ResponseMetrics;
import org.littoral.scenarios.analysis.stats.ComparisonRow;
import org.littoral.scenarios.analysis.stats.GroupComparisons;
import org.littoral.scenarios.analysis.detect.PassageDetector;
import org.littoral.scenarios.analysis.detect.PassageFinder;
import org.littoral.scenarios.analysis.stats.BreezeType;
import org.littoral.scenarios.input.UserInputException;

/**
 * The single entry point of the analysis chain: the same path for observed profiles and for the
 * synthetic soundings the models write. Groups profiles into site-days, detects and labels
 * passages, types each day by its ambient wind, then computes response metrics, composites and
 * group comparisons.
 */
public final class AnalysisChain {
    private AnalysisChain() {
    }

    public static AnalysisResult run(List<Profile> profiles, Coast coast, AnalysisSettings settings) {
        settings.validate();
        List<String> notes = new ArrayList<>();
        List<SiteDay> siteDays = group(profiles);
        List<PassageDetector> detectors = PassageFinder.detectors(settings.detection);
        List<SiteDayResult> results = new ArrayList<>();
        for (SiteDay sd : siteDays) {
            PassageFinder.Outcome o = PassageFinder.find(sd, coast, detectors, settings.detection);
            notes.addAll(o.notes());
            Map<String, String> user = userAttributes(settings, sd);
            double[] ambient = new double[] {Double.NaN, Double.NaN};
            String source = "none";
            String us = user.get("ambient_wind_speed_m_per_s");
            String ud = user.get("ambient_wind_direction_deg");
            if (us != null && ud != null) {
                ambient = Coast.eastNorthFromDirection(parse(us, "ambient_wind_speed_m_per_s", sd),
                        parse(ud, "ambient_wind_direction_deg", sd));
                source = "user";
            } else {
                double[] a = ambientFromProfiles(sd, o.passages(), coast, settings);
                if (!Double.isNaN(a[0])) {
                    ambient = a;
                    source = "profiles";
                }
            }
            BreezeType type;
            String ut = user.get("breeze_type");
            if (ut != null) {
                try {
                    type = BreezeType.valueOf(ut.trim().toUpperCase(Locale.ROOT));
                } catch (IllegalArgumentException e) {
                    throw new UserInputException("day attribute breeze_type = " + org.littoral.scenarios.input.Shown.text(ut) + " for "
                            + sd.key() + " is not a breeze type; use one of " + java.util.Arrays.toString(BreezeType.values()));
                }
                source = source.equals("none") ? "user" : source;
            } else {
                type = settings.breezeTyping.classify(ambient[0], ambient[1], coast);
            }
            Map<String, String> attrs = new LinkedHashMap<>();
            attrs.put("site", sd.site());
            attrs.put("day", sd.day());
            attrs.put("month", month(sd.day()));
            attrs.put("breeze_type", type.name());
            attrs.putAll(user);
            attrs.put("breeze_type", type.name());
            results.add(new SiteDayResult(sd, o.passages(), o.unconfirmed(), o.notes(), ambient, source, type, attrs));
        }
        List<PassageResponse> responses = new ArrayList<>();
        for (SiteDayResult r : results) {
            responses.addAll(ResponseMetrics.responses(r.siteDay(), r.passages(), coast, settings.metrics));
        }
        responses = ResponseMetrics.standardise(responses);
        List<DistributionRow> distributions = ResponseMetrics.distributions(responses, settings.metrics);
        List<CompositeRow> composites = new ArrayList<>();
        for (CompositeSpec spec : settings.composites) {
            composites.addAll(Composites.compute(results, coast, spec, settings.metrics.preWindowHours,
                    settings.metrics.minValidFraction, notes));
        }
        List<ComparisonRow> comparisons = GroupComparisons.withHolm(compareGroups(results, responses, settings));
        String note = GroupComparisons.note(comparisons.size(), settings.stats.alpha);
        return new AnalysisResult(results, responses, distributions, composites, comparisons, note, notes);
    }

    /**
     * Pairwise comparisons of every attribute in stats.groupBy, for the change of every metric layer and
     * variable at the first onshore passage of each site-day (one value per site-day keeps the samples independent).
     */
    static List<ComparisonRow> compareGroups(List<SiteDayResult> days, List<PassageResponse> responses, AnalysisSettings s) {
        List<ComparisonRow> rows = new ArrayList<>();
        Map<Passage, SiteDayResult> first = new java.util.IdentityHashMap<>();
        for (SiteDayResult r : days) {
            Passage p = r.firstOnshorePassage();
            if (p != null) {
                first.put(p, r);
            }
        }
        for (String attr : s.stats.groupBy) {
            for (Layer layer : s.metrics.layers) {
                for (Variable v : s.metrics.variables) {
                    TreeMap<String, List<Double>> groups = new TreeMap<>();
                    for (PassageResponse pr : responses) {
                        SiteDayResult r = first.get(pr.passage());
                        if (r == null || !pr.layer().equals(layer) || pr.variable() != v || Double.isNaN(pr.change())) {
                            continue;
                        }
                        groups.computeIfAbsent(r.attributes().getOrDefault(attr, "(none)"), k -> new ArrayList<>())
                                .add(pr.change());
                    }
                    List<String> names = new ArrayList<>();
                    for (Map.Entry<String, List<Double>> e : groups.entrySet()) {
                        if (e.getValue().size() >= s.stats.minGroupSize) {
                            names.add(e.getKey());
                        }
                    }
                    for (int i = 0; i < names.size(); i++) {
                        for (int j = i + 1; j < names.size(); j++) {
                            double[] a = groups.get(names.get(i)).stream().mapToDouble(Double::doubleValue).toArray();
                            double[] b = groups.get(names.get(j)).stream().mapToDouble(Double::doubleValue).toArray();
                            rows.add(GroupComparisons.compare("change " + v.column() + " " + layer.label(), attr, names.get(i), a,
                                    names.get(j), b, s.stats));
                        }
                    }
                }
            }
        }
        return rows;
    }

    /** Site-days sorted by day then site, profiles in time order; two profiles at the same time are an error. */
    public static List<SiteDay> group(List<Profile> profiles) {
        TreeMap<String, List<Profile>> byKey = new TreeMap<>();
        for (Profile p : profiles) {
            byKey.computeIfAbsent(p.day() + "\u0000" + p.site(), k -> new ArrayList<>()).add(p);
        }
        List<SiteDay> out = new ArrayList<>();
        for (List<Profile> l : byKey.values()) {
            l.sort(Comparator.comparingDouble(Profile::timeHours));
            double[] t = new double[l.size()];
            for (int i = 0; i < t.length; i++) {
                t[i] = l.get(i).timeHours();
                if (i > 0 && t[i] == t[i - 1]) {
                    throw new UserInputException(String.format(Locale.ROOT,
                            "two profiles for site %s on day %s at the same time %.4f h; remove the duplicate",
                            l.get(i).site(), l.get(i).day(), t[i]));
                }
            }
            out.add(new SiteDay(l.get(0).site(), l.get(0).day(), List.copyOf(l), t));
        }
        return out;
    }

    /** Mean layer wind over morning profiles before the first passage; {NaN, NaN} when there are none. */
    static double[] ambientFromProfiles(SiteDay sd, List<Passage> passages, Coast coast, AnalysisSettings s) {
        double limit = passages.isEmpty() ? Double.POSITIVE_INFINITY : passages.get(0).timeHours();
        double e = 0;
        double n = 0;
        int c = 0;
        for (int i = 0; i < sd.size(); i++) {
            double t = sd.timeHours()[i];
            if (t < s.ambientFromHours || t >= s.ambientToHours || t >= limit) {
                continue;
            }
            Profile p = sd.profiles().get(i);
            double pe = LayerMeans.mean(p, p.windEastMPerS(), s.ambientLayer, s.detection.minValidFraction);
            double pn = LayerMeans.mean(p, p.windNorthMPerS(), s.ambientLayer, s.detection.minValidFraction);
            if (!Double.isNaN(pe) && !Double.isNaN(pn)) {
                e += pe;
                n += pn;
                c++;
            }
        }
        return c == 0 ? new double[] {Double.NaN, Double.NaN} : new double[] {e / c, n / c};
    }

    private static Map<String, String> userAttributes(AnalysisSettings s, SiteDay sd) {
        Map<String, String> m = new LinkedHashMap<>();
        Map<String, String> byDay = s.dayAttributes.get(sd.day());
        if (byDay != null) {
            m.putAll(byDay);
        }
        Map<String, String> bySiteDay = s.dayAttributes.get(sd.key());
        if (bySiteDay != null) {
            m.putAll(bySiteDay);
        }
        return m;
    }

    private static double parse(String v, String key, SiteDay sd) {
        try {
            return Double.parseDouble(v.trim());
        } catch (NumberFormatException e) {
            throw new UserInputException("day attribute " + key + " = " + org.littoral.scenarios.input.Shown.text(v) + " for "
                    + sd.key() + " is not a number; write a decimal number in the per-day table");
        }
    }

    static String month(String day) {
        try {
            return String.format(Locale.ROOT, "%02d", LocalDate.parse(day).getMonthValue());
        } catch (DateTimeParseException e) {
            return "unknown";
        }
    }
}
