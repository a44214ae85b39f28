package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/** Turns a {@link SweepSpec} into its members: deterministic, and each member computable on its own. */
public final class MemberExpander {

    private MemberExpander() {
    }

    public static List<Member> expand(SweepSpec spec) {
        int points = spec.axisPoints();
        int draws = spec.ensemble() == null ? 1 : spec.ensemble().members();
        int total = spec.memberCount();
        String fmt = "m%0" + Math.max(4, Integer.toString(total - 1).length()) + "d";
        List<Member> out = new ArrayList<>(total);
        int index = 0;
        for (int p = 0; p < points; p++) {
            List<SweepSpec.Setting> axisSettings = axisPoint(spec, p);
            for (int e = 0; e < draws; e++) {
                List<SweepSpec.Setting> settings = new ArrayList<>(axisSettings);
                if (spec.ensemble() != null) {
                    settings.addAll(drawsFor(spec.ensemble(), e));
                }
                ObjectNode doc = spec.base().deepCopy();
                for (SweepSpec.Setting s : spec.fixed()) {
                    s.path().set(doc, s.value().value());
                }
                for (SweepSpec.Setting s : settings) {
                    s.path().set(doc, s.value().value());
                }
                out.add(new Member(index, String.format(fmt, index), settings, doc, CanonicalJson.sha256(doc)));
                index++;
            }
        }
        return out;
    }

    /** Axis values of point p: the first axis varies slowest in a product; all advance together in zip mode. */
    static List<SweepSpec.Setting> axisPoint(SweepSpec spec, int p) {
        List<SweepSpec.Setting> s = new ArrayList<>();
        List<Axis> axes = spec.axes();
        if (spec.zip()) {
            for (Axis a : axes) {
                s.add(new SweepSpec.Setting(a.path(), a.values().get(p)));
            }
            return s;
        }
        int[] idx = new int[axes.size()];
        int rem = p;
        for (int k = axes.size() - 1; k >= 0; k--) {
            int n = axes.get(k).values().size();
            idx[k] = rem % n;
            rem /= n;
        }
        for (int k = 0; k < axes.size(); k++) {
            s.add(new SweepSpec.Setting(axes.get(k).path(), axes.get(k).values().get(idx[k])));
        }
        return s;
    }

    /** The draws of ensemble member e: a generator seeded from (seed, e) only, inputs drawn in file order. */
    static List<SweepSpec.Setting> drawsFor(SweepSpec.Ensemble ens, int e) {
        SplittableRandom r = new SplittableRandom(memberSeed(ens.seed(), e));
        List<SweepSpec.Setting> s = new ArrayList<>();
        for (SweepSpec.Draw d : ens.draws()) {
            AxisValue v = d.distribution().draw(r);
            s.add(new SweepSpec.Setting(d.path(), v));
        }
        return s;
    }

    /**
     * Seed of draw e: the SplitMix64 finaliser (Steele, Lea and Flood 2014, OOPSLA) of seed + (e + 1) times
     * the golden gamma, so neighbouring members get unrelated streams.
     */
    static long memberSeed(long seed, int e) {
        long z = seed + (e + 1L) * 0x9E3779B97F4A7C15L;
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** Convenience for tests and tables: the value a member has at a path. */
    static JsonNode valueAt(Member m, KeyPath path) {
        return path.get(m.document());
    }
}
