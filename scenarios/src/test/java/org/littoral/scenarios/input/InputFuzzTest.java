package org.littoral.scenarios.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.bench.InputFuzz;
import org.littoral.scenarios.bench.InputFuzzBenchmark;

/**
 * Seeded mutations of every kind of input file (scenario, sweep, plan, coast, day file, observations, per-day and
 * passage tables) through the reader and pre-run checks each command uses, in one JVM: no mutant may end any way
 * but accepted or refused with one clear line (exit 2, one line that names the file and the fix, no Java
 * internals, no stack trace). The same corpus, larger, is {@code littoral bench input-fuzz}.
 */
class InputFuzzTest {
    /** 300 mutants per kind: 3,000 in all. */
    private static final int PER_KIND = 300;

    @Test
    void everyMutatedInputIsAcceptedOrRefusedWithOneClearLineNamingTheFile(@TempDir Path tmp) throws Exception {
        InputFuzz fuzz = new InputFuzz(InputFuzzBenchmark.standardReaders(tmp), InputFuzz.standardSeeds());
        List<InputFuzz.Outcome> all = fuzz.run(InputFuzzBenchmark.SEED, PER_KIND, tmp.resolve("cases"), null);
        assertEquals(PER_KIND * InputFuzz.Kind.values().length, all.size());
        List<InputFuzz.Outcome> other = all.stream().filter(o -> o.category() == InputFuzz.Category.OTHER).toList();
        String examples = other.stream().limit(5).map(o -> o.kind().label + " [" + o.mutation() + "] " + o.reason() + ": "
                + o.message()).collect(Collectors.joining("\n"));
        assertTrue(other.isEmpty(), other.size() + " mutant(s) not answered with one clear line, e.g.\n" + examples);
        assertTrue(all.stream().noneMatch(o -> o.exit() == 1), "no mutant ends with exit 1");
        // the corpus exercises both sides of every reader (a fuzzer that only produced garbage would prove little)
        Map<InputFuzz.Kind, int[]> counts = InputFuzz.counts(all);
        for (InputFuzz.Kind k : InputFuzz.Kind.values()) {
            int[] c = counts.get(k);
            assertTrue(c[0] >= PER_KIND / 10 && c[1] >= PER_KIND / 10, k.label + ": clean " + c[0] + ", refused " + c[1]);
        }
    }

    @Test
    void theClassifierRefusesWhatTheIssueCalledUnclear() {
        assertEquals("Java or parser internals ('Input length')",
                InputFuzz.unclear(2, "x.csv: cannot read (Input length = 1); check the path", "x.csv"));
        assertEquals("several lines", InputFuzz.unclear(2, "p.yaml: not valid YAML: while scanning\n in 'reader'", "p.yaml"));
        assertEquals("does not name the file", InputFuzz.unclear(2, "line 3: column 'day' is empty; give a day", "days.csv"));
        assertEquals("exit 1", InputFuzz.unclear(1, "java.lang.ArrayIndexOutOfBoundsException", "t.csv"));
        assertEquals("names a Java field ('frictionPerS')",
                InputFuzz.unclear(2, "s.yaml: frictionPerS must be in [0, 0.01); change it", "s.yaml"));
        assertEquals(null, InputFuzz.unclear(2, "s.yaml:4:17: coast.latitude_deg = 95: outside the allowed range; give a "
                + "number, -90 to 90 deg", "s.yaml"));
    }
}
