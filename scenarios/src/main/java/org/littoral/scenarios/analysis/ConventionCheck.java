package org.littoral.scenarios.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.detect.PassageFinder;

/**
 * Campaign-wide checks for convention mistakes that no single value shows: a coast bearing given the wrong way
 * round (or wind directions given as "blowing towards"), which makes most wind shifts end in the sector opposite
 * to onshore or 90 deg off; and, with a site list (inland distances), passages that reach an inland site before
 * the site nearer the coast, and observed sites missing from the list. Each finding is one line for the terminal,
 * analysis.json and the report.
 */
public final class ConventionCheck {
    /** Fewest changes before the bearing check speaks. */
    static final int MIN_SHIFTS = 5;

    private ConventionCheck() {
    }

    public static List<String> warnings(AnalysisResult r, Coast coast, AnalysisSettings s) {
        List<String> out = new ArrayList<>();
        bearing(r, coast, out);
        if (!s.siteInlandM.isEmpty()) {
            sites(r, s.siteInlandM, out);
        }
        return out;
    }

    /** Where the wind ends up after the campaign's changes, relative to the onshore direction. */
    static void bearing(AnalysisResult r, Coast coast, List<String> out) {
        double onshoreFrom = coast.bearingLandToSeaDeg();
        int n = 0;
        int opposite = 0;
        int across = 0;
        double se = 0;
        double sn = 0;
        for (Passage p : r.passages()) {
            double d = p.directionAfterDeg();
            double b = p.directionBeforeDeg();
            if (Double.isNaN(d) || Double.isNaN(b)) {
                continue;
            }
            n++;
            double off = Math.abs(signed(onshoreFrom, d));
            if (off >= 120) {
                opposite++;
            } else if (off > 60) {
                across++;
            }
            se += Math.sin(Math.toRadians(d));
            sn += Math.cos(Math.toRadians(d));
        }
        if (n < MIN_SHIFTS) {
            return;
        }
        double mean = (Math.toDegrees(Math.atan2(se, sn)) + 360.0) % 360.0;
        String where = String.format(Locale.ROOT, "most shifts turn to %.0f deg; onshore is centred on %.0f deg", mean, onshoreFrom);
        if (opposite > n / 2) {
            out.add(String.format(Locale.ROOT, "the coast bearing may be reversed: %d of %d wind shifts end in the sector opposite "
                    + "to onshore; %s. Check bearing_land_to_sea_deg in the coast file (it points from land to sea) and that "
                    + "wind directions are where the wind blows FROM", opposite, n, where));
        } else if (across > n / 2) {
            out.add(String.format(Locale.ROOT, "the coast bearing may be 90 deg off: %d of %d wind shifts end more than 60 deg from "
                    + "onshore; %s. Check bearing_land_to_sea_deg in the coast file", across, n, where));
        }
    }

    /** Passage order between sites (first onshore passage per site-day) and sites missing from the list. */
    static void sites(AnalysisResult r, Map<String, Double> inlandM, List<String> out) {
        TreeSet<String> missing = new TreeSet<>();
        Map<String, TreeMap<Double, Passage>> byDay = new TreeMap<>();
        for (SiteDayResult d : r.siteDays()) {
            String site = d.siteDay().site();
            Double x = inlandM.get(site);
            if (x == null) {
                missing.add(site);
                continue;
            }
            Passage p = d.firstOnshorePassage();
            if (p != null) {
                byDay.computeIfAbsent(d.siteDay().day(), k -> new TreeMap<>()).put(x, p);
            }
        }
        if (!missing.isEmpty()) {
            out.add("sites " + missing + " are not in the coast file's sites list " + inlandM.keySet()
                    + "; add them (name, inland_km) so their passage order can be checked");
        }
        for (Map.Entry<String, TreeMap<Double, Passage>> e : byDay.entrySet()) {
            Passage prev = null;
            for (Passage p : e.getValue().values()) {
                if (prev != null && p.timeHours() + p.uncertaintyHours() < prev.timeHours() - prev.uncertaintyHours()) {
                    out.add(String.format(Locale.ROOT, "%s: the onshore passage reaches %s (%.1f km inland) at %.2f h, before %s "
                            + "(%.1f km) at %.2f h: inland before coast; check the site names and distances in the sites list, "
                            + "or the passages", e.getKey(), p.site(), inlandM.get(p.site()) / 1000.0, p.timeHours(), prev.site(),
                            inlandM.get(prev.site()) / 1000.0, prev.timeHours()));
                }
                prev = p;
            }
        }
    }

    private static double signed(double a, double b) {
        return PassageFinder.signedTurnDeg(a, b);
    }
}
