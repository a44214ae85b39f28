package org.littoral.scenarios.demo;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisChain;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.detect.DetectionScore;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.bench.Benchmark;

/**
 * The INVENTED campaign in gradual-turn mode (every front's wind turn spread over 20-40 min, so one or two flights
 * fly mid-turn) put through the analysis chain, scored against its answer key: one-front site-days shown as two
 * onshore passages, true passages found within one flight interval, false onshore passages, and bay-then-sea
 * site-days with both passages found. {@code littoral bench gradual-turns} prints the figures with the rules added one
 * by one (change points only; the gradual-turn rule; the low layer, drift test and half-way timing), and the demo
 * campaign's sharp fronts with and without the last ones.
 */
public final class GradualTurnSkill implements Benchmark {
    public static final double TURN_MINUTES_LO = 20.0;
    public static final double TURN_MINUTES_HI = 40.0;

    /** The figures of one run. */
    public record Figures(int oneFrontSiteDays, int doubled, int truths, int hits, int onshorePassages, int falsePassages,
                          int bayThenSeaSiteDays, int separated) {
        public double doubledFraction() {
            return (double) doubled / oneFrontSiteDays;
        }

        public double hitRate() {
            return (double) hits / truths;
        }

        public double falseFraction() {
            return (double) falsePassages / onshorePassages;
        }

        public double separatedFraction() {
            return (double) separated / bayThenSeaSiteDays;
        }

        Figures plus(Figures o) {
            return new Figures(oneFrontSiteDays + o.oneFrontSiteDays, doubled + o.doubled, truths + o.truths, hits + o.hits,
                    onshorePassages + o.onshorePassages, falsePassages + o.falsePassages, bayThenSeaSiteDays + o.bayThenSeaSiteDays,
                    separated + o.separated);
        }

        public String line() {
            return String.format(Locale.ROOT, "one-front site-days shown as two onshore passages %d/%d (%.1f %%); true passages "
                    + "found within one flight interval %d/%d (%.1f %%); false onshore passages %d/%d (%.1f %%); bay-then-sea "
                    + "site-days separated %d/%d (%.1f %%)", doubled, oneFrontSiteDays, 100 * doubledFraction(), hits, truths,
                    100 * hitRate(), falsePassages, onshorePassages, 100 * falseFraction(), separated, bayThenSeaSiteDays,
                    100 * separatedFraction());
        }
    }

    /** Binned profiles of every flight of a campaign, in gradual-turn mode (allocates). */
    public static List<Profile> profiles(DemoCampaign c, double turnMinutesLo, double turnMinutesHi) {
        List<Profile> out = new ArrayList<>();
        for (DemoDay d : c.days()) {
            for (int s = 0; s < DemoCoast.SITES.size(); s++) {
                for (DemoFlights.Flight f : DemoFlights.schedule(d, s)) {
                    out.add(DemoFlights.binned(d, f, turnMinutesLo, turnMinutesHi).toProfile(d));
                }
            }
        }
        return out;
    }

    /** Scores an analysis of campaign {@code c} against its prescribed fronts. */
    public static Figures score(DemoCampaign c, AnalysisResult ar) {
        Map<String, double[]> truth = new HashMap<>();
        for (DemoDay d : c.days()) {
            for (int s = 0; s < DemoCoast.SITES.size(); s++) {
                final int site = s;
                double[] t = d.fronts().stream().filter(f -> f.siteIndex() == site).mapToDouble(DemoDay.Front::arrivalHours).toArray();
                truth.put(d.date() + "/" + DemoCoast.SITES.get(s).name(), t);
            }
        }
        Figures sum = new Figures(0, 0, 0, 0, 0, 0, 0, 0);
        for (SiteDayResult r : ar.siteDays()) {
            double[] tr = truth.getOrDefault(r.siteDay().day() + "/" + r.siteDay().site(), new double[0]);
            double[] on = r.passages().stream().filter(Passage::turnsOnshore).mapToDouble(Passage::timeHours).toArray();
            DetectionScore ds = DetectionScore.score(tr, on, r.siteDay().timeHours());
            sum = sum.plus(new Figures(tr.length == 1 ? 1 : 0, tr.length == 1 && on.length >= 2 ? 1 : 0, ds.truths(), ds.hits(),
                    ds.detections(), ds.falseDetections(), tr.length == 2 ? 1 : 0, tr.length == 2 && ds.hits() == 2 ? 1 : 0));
        }
        return sum;
    }

    /** Which passage rules run (each row of the benchmark adds rules to the one before). */
    public enum Rules {
        /** One passage per change point of the detection layer, midpoint timing (the chain before issue 12). */
        CHANGE_POINTS,
        /** + the gradual-turn rule. */
        GRADUAL_TURNS,
        /** + the low layer for shallow breezes, the drift test and half-way timing (the defaults). */
        SHALLOW_LAYER
    }

    /** The campaigns of {@code seeds} in gradual-turn mode through the chain with the given rules. */
    public static Figures measure(long[] seeds, Rules rules) {
        return measure(seeds, rules, TURN_MINUTES_LO, TURN_MINUTES_HI);
    }

    /** As {@link #measure(long[], Rules)} with other turn durations (0, 0: the demo's sharp fronts). */
    public static Figures measure(long[] seeds, Rules rules, double turnMinutesLo, double turnMinutesHi) {
        Figures sum = new Figures(0, 0, 0, 0, 0, 0, 0, 0);
        for (long seed : seeds) {
            DemoCampaign c = DemoCampaign.generate(seed);
            AnalysisSettings s = new AnalysisSettings();
            s.detection.mergeGradualTurns = rules != Rules.CHANGE_POINTS;
            boolean shallow = rules == Rules.SHALLOW_LAYER;
            s.detection.useShallowLayer = shallow;
            s.detection.driftTest = shallow;
            s.detection.halfTurnTiming = shallow;
            Coast coast = DemoCoast.coast(DemoCampaign.SEASON_START.getDayOfYear() + 35);
            sum = sum.plus(score(c, AnalysisChain.run(profiles(c, turnMinutesLo, turnMinutesHi), coast, s)));
        }
        return sum;
    }

    static final long[] BENCH_SEEDS = {DemoCampaign.DEFAULT_SEED, 7L, 11L};

    @Override
    public String name() {
        return "gradual-turns";
    }

    @Override
    public String description() {
        return "Passage detection on the INVENTED campaign with 20-40 min wind turns (3 seeds): doubled passages, hits, "
                + "false passages, bay-then-sea separation; rules added one by one";
    }

    @Override
    public int run(PrintStream out, boolean quick) {
        long[] seeds = quick ? new long[] {DemoCampaign.DEFAULT_SEED} : BENCH_SEEDS;
        out.println("gradual-turns: " + seeds.length + " invented campaign(s), every wind turn spread over "
                + (int) TURN_MINUTES_LO + "-" + (int) TURN_MINUTES_HI + " min");
        out.println("  change points only (midpoint timing):      " + measure(seeds, Rules.CHANGE_POINTS).line());
        out.println("  + one passage per gradual turn:            " + measure(seeds, Rules.GRADUAL_TURNS).line());
        out.println("  + low layer, drift test, half-way timing:  " + measure(seeds, Rules.SHALLOW_LAYER).line());
        long[] demo = {DemoCampaign.DEFAULT_SEED};
        out.println("  demo campaign (sharp fronts), gradual-turn rule alone: " + measure(demo, Rules.GRADUAL_TURNS, 0, 0).line());
        out.println("  demo campaign (sharp fronts), all rules (defaults):    " + measure(demo, Rules.SHALLOW_LAYER, 0, 0).line());
        out.println("  targets: doubled <= 3 %, hits >= 95 %, false <= 5 %, bay-then-sea separated >= 90 %");
        return 0;
    }
}
