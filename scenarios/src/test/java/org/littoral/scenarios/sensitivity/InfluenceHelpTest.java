package org.littoral.scenarios.sensitivity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.littoral.scenarios.cli.Main;
import org.littoral.scenarios.input.UserInputException;
import picocli.CommandLine;

/** What README and --help say influence writes is what it writes (InfluenceStudyTest writes them), and bad options are one line. */
class InfluenceHelpTest {
    private static final String[] FILES = {"indices.csv", "outcomes.csv", "influence.json", InfluenceOutputs.FIGURE, "report.html",
        "members/"};

    @Test
    void helpAndReadmeListEveryFileTheStudyWrites() throws IOException {
        CommandLine cl = new CommandLine(new Main());
        StringWriter w = new StringWriter();
        cl.getSubcommands().get("influence").usage(new PrintWriter(w));
        String help = w.toString().replaceAll("\\s+", " ");
        String row = Files.readString(Path.of("..", "README.md")).lines().filter(l -> l.startsWith("| `littoral influence "))
                .findFirst().orElseThrow();
        for (String f : FILES) {
            assertTrue(help.contains(f), "influence --help misses " + f);
            assertTrue(row.contains(f), "README's influence row misses " + f);
        }
    }

    @Test
    void anUnknownDesignIsOneLineNamingTheOptionAndTheChoices() {
        UserInputException e = org.junit.jupiter.api.Assertions.assertThrows(UserInputException.class,
                () -> InfluenceCommand.points("halton"));
        assertTrue(e.getMessage().contains("--points halton") && e.getMessage().contains("sobol"), e.getMessage());
        assertEquals(1, e.getMessage().lines().count());
    }
}
