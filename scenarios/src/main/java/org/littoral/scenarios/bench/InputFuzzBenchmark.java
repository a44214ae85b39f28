package org.littoral.scenarios.bench;

import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.ingest.DayTableReader;
import org.littoral.scenarios.observe.CoastFile;
import org.littoral.scenarios.observe.ObserveIngest;
import org.littoral.scenarios.plan.PlanFile;
import org.littoral.scenarios.plan.PlanMemberRunner;
import org.littoral.scenarios.plan.PlanSpec;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.run.WorkEstimate;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberExpander;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;
import org.littoral.scenarios.sweep.SweepFile;
import org.littoral.scenarios.sweep.SweepSpec;
import org.littoral.scenarios.timing.ArrivalMemberRunner;
import org.littoral.scenarios.timing.DayFile;
import org.littoral.scenarios.timing.DaySpec;
import org.littoral.scenarios.timing.PassageTable;

/**
 * {@code littoral bench input-fuzz}: how every input reader answers mutated files (see {@link InputFuzz}): per
 * kind of file, how many mutants were accepted, refused with one clear line, or answered any other way, and the
 * commonest reasons for the last. Exit 0 when nothing falls in "other".
 */
public final class InputFuzzBenchmark implements Benchmark {
    /** Seed of the corpus: the same seed gives the same mutants. */
    public static final long SEED = 20261205L;

    @Override
    public String name() {
        return "input-fuzz";
    }

    @Override
    public String description() {
        return "Mutated input files through every reader: clean / clear error / other, per kind of file";
    }

    /**
     * What each command does with its input before any model runs: read, validate, expand the members and read
     * every member's scenario (so that a bad combination stops before the first member).
     */
    public static Map<InputFuzz.Kind, InputFuzz.Reader> standardReaders(Path work) throws Exception {
        Map<InputFuzz.Kind, InputFuzz.Reader> m = new EnumMap<>(InputFuzz.Kind.class);
        // littoral run: read, then the memory estimate before solving
        m.put(InputFuzz.Kind.SCENARIO, f -> WorkEstimate.of(BuiltinScenarios.resolve(f.toString())).check(1, f.toString()));
        m.put(InputFuzz.Kind.SWEEP, f -> {
            SweepSpec spec = SweepFile.load(f.toString(), ScenarioMemberRunner.scenarioSource());
            List<Member> members = MemberExpander.expand(spec);
            new ScenarioMemberRunner(spec.source(), null, Solver.standard()).checkAll(members, 2);
        });
        m.put(InputFuzz.Kind.PLAN, f -> {
            PlanSpec plan = PlanFile.load(f.toString());
            PlanMemberRunner probe = new PlanMemberRunner(plan, Solver.standard(), null, new AnalysisSettings());
            for (Member mm : MemberExpander.expand(plan.ensemble())) {
                WorkEstimate.of(probe.scenarioOf(mm)).check(2, f.toString());
            }
        });
        m.put(InputFuzz.Kind.COAST, f -> CoastFile.load(f.toString()));
        m.put(InputFuzz.Kind.DAY, f -> {
            DaySpec d = DayFile.read(f);
            ArrivalMemberRunner r = new ArrivalMemberRunner(d.source(), Solver.standard(), new double[] {1000.0});
            for (Member mm : MemberExpander.expand(d.ensemble())) {
                WorkEstimate.of(r.scenarioOf(mm)).check(2, f.toString());
            }
        });
        m.put(InputFuzz.Kind.OBSERVATIONS, f -> ObserveIngest.ingest(f, new AnalysisSettings()));
        m.put(InputFuzz.Kind.DAY_TABLE, DayTableReader::read);
        m.put(InputFuzz.Kind.COLUMN_MAP, org.littoral.scenarios.analysis.ingest.ColumnMap::load);
        m.put(InputFuzz.Kind.SETTINGS, f -> org.littoral.scenarios.analysis.SettingsFile.apply(f, new AnalysisSettings()));
        // a passage table is read against a day file: the clean seed day
        Path dayDir = Files.createDirectories(work.resolve("passage-day"));
        InputFuzz.Seed day = InputFuzz.standardSeeds().get(InputFuzz.Kind.DAY).get(0);
        for (Map.Entry<String, byte[]> e : day.support().entrySet()) {
            Files.write(dayDir.resolve(e.getKey()), e.getValue());
        }
        Files.write(dayDir.resolve(day.fileName()), day.content());
        DaySpec spec = DayFile.read(dayDir.resolve(day.fileName()));
        m.put(InputFuzz.Kind.PASSAGES, f -> PassageTable.read(f, spec));
        return m;
    }

    @Override
    public int run(PrintStream out, boolean quick) throws Exception {
        int perKind = quick ? 60 : 750;
        Path work = Files.createTempDirectory("littoral-input-fuzz-");
        try {
            InputFuzz fuzz = new InputFuzz(standardReaders(work), InputFuzz.standardSeeds());
            long t0 = System.nanoTime();
            List<InputFuzz.Outcome> all = fuzz.run(SEED, perKind, work.resolve("cases"), null);
            double sec = (System.nanoTime() - t0) / 1e9;
            return report(out, all, sec, SEED);
        } finally {
            InputFuzz.deleteTree(work);
        }
    }

    /** {accepted, all} among YAML mutants whose only mutation starts with {@code op} (and contains {@code tag}). */
    static int[] silent(List<InputFuzz.Outcome> all, String op, String... tag) {
        int[] n = new int[2];
        for (InputFuzz.Outcome o : all) {
            boolean yaml = o.seed().endsWith(".yaml");
            if (yaml && o.mutation().startsWith(op) && (tag.length == 0 || o.mutation().contains(tag[0]))) {
                n[1]++;
                if (o.category() == InputFuzz.Category.CLEAN) {
                    n[0]++;
                }
            }
        }
        return n;
    }

    /** Prints the table and the reasons; returns 0 when no outcome is "other". */
    public static int report(PrintStream out, List<InputFuzz.Outcome> all, double sec, long seed) {
        out.printf(Locale.ROOT, "input-fuzz: %d mutated files (seed %d) in %.1f s%n", all.size(), seed, sec);
        out.printf(Locale.ROOT, "%-16s %6s %7s %12s %7s %12s%n", "file kind", "cases", "clean", "clear error", "other",
                "clear share");
        int[] tot = new int[3];
        for (Map.Entry<InputFuzz.Kind, int[]> e : InputFuzz.counts(all).entrySet()) {
            int[] c = e.getValue();
            for (int i = 0; i < 3; i++) {
                tot[i] += c[i];
            }
            out.printf(Locale.ROOT, "%-16s %6d %7d %12d %7d %11.0f%%%n", e.getKey().label, c[0] + c[1] + c[2], c[0], c[1], c[2],
                    100.0 * c[1] / Math.max(1, c[1] + c[2]));
        }
        out.printf(Locale.ROOT, "%-16s %6d %7d %12d %7d %11.0f%%%n", "all", tot[0] + tot[1] + tot[2], tot[0], tot[1], tot[2],
                100.0 * tot[1] / Math.max(1, tot[1] + tot[2]));
        out.println("(clear share = clear errors / all errors; an error is clear when it exits 2 with one line of at most "
                + InputFuzz.MAX_MESSAGE + " characters that names the file, says what to do, and shows no Java internals)");
        int[] extra = silent(all, "extra-document");
        int[] dup = silent(all, "repeat-line", "(a key)");
        out.printf(Locale.ROOT, "accepted silently: %d of %d YAML files with a second document; %d of %d YAML files with a "
                + "repeated key line (a duplicate key, unless it is a list item)%n", extra[0], extra[1], dup[0], dup[1]);
        Map<String, List<InputFuzz.Outcome>> reasons = InputFuzz.otherReasons(all);
        if (!reasons.isEmpty()) {
            out.println("other, by reason (count, one example):");
            reasons.entrySet().stream().sorted((a, b) -> b.getValue().size() - a.getValue().size()).forEach(e -> {
                InputFuzz.Outcome o = e.getValue().get(0);
                String msg = o.message() == null ? "" : o.message().replace("\n", "\\n");
                out.printf(Locale.ROOT, "  %5d  %s%n         e.g. %s [%s]: %s%n", e.getValue().size(), e.getKey(), o.seed(),
                        o.mutation(), msg.length() > 240 ? msg.substring(0, 240) + "..." : msg);
            });
        }
        return tot[2] == 0 ? 0 : 1;
    }
}
