package org.littoral.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.plan.PlanFile;
import org.littoral.scenarios.sweep.SweepFile;
import picocli.CommandLine;

/** What README and --help tell a reader is true: every built-in is listed, and run writes what they say it writes. */
class HelpTruthTest {
    private static final Path README = Path.of("..", "README.md").toAbsolutePath().normalize();

    private static String help(String command) {
        StringWriter w = new StringWriter();
        CommandLine cl = new CommandLine(new Main());
        cl.getSubcommands().get(command).usage(new PrintWriter(w));
        return w.toString().replaceAll("\\s+", " ");
    }

    @Test
    void sweepHelpAndTheReadmeListEveryBuiltInSweep() throws Exception {
        String h = help("sweep");
        String readme = Files.readString(README);
        for (String b : SweepFile.BUILTINS) {
            assertTrue(h.contains(b), "sweep --help misses " + b);
            assertTrue(readme.contains("`" + b + "`"), "README misses sweep " + b);
        }
    }

    @Test
    void planHelpAndTheReadmeListEveryBuiltInPlan() throws Exception {
        String h = help("plan");
        String readme = Files.readString(README);
        for (String b : PlanFile.BUILTINS) {
            assertTrue(h.contains(b), "plan --help misses " + b);
            assertTrue(readme.contains("`" + b + "`"), "README misses plan " + b);
        }
    }

    @Test
    void runWritesEveryFileItsHelpAndTheReadmeName(@TempDir Path out) throws Exception {
        assertEquals(0, Main.execute("run", "classic-45N", "--out", out.toString()));
        String h = help("run");
        String row = Files.readString(README).lines().filter(l -> l.startsWith("| `littoral run ")).findFirst().orElseThrow();
        for (String f : new String[] {"summary.json", "soundings.csv", "soundings.nc", "fields.nc", "near_surface_breeze.csv",
            "near_surface_breeze.png", "report.html"}) {
            assertTrue(Files.size(out.resolve(f)) > 0, f);
            assertTrue(h.contains(f), "run --help misses " + f);
            assertTrue(row.contains(f), "README's run row misses " + f);
        }
        String html = Files.readString(out.resolve("report.html"));
        assertTrue(html.contains("data:image/png;base64,") && html.contains("onset of onshore flow"),
                "the report embeds the figures and labels the linear model's times");
    }
}
