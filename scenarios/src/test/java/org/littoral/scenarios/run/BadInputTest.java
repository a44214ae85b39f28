package org.littoral.scenarios.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.cli.Main;

/** Bad scenario input through the real command line: one clear line on stderr and exit code 2. */
class BadInputTest {
    static final String GOOD = """
            name: t
            description: bad-input tests
            coast:
              latitude_deg: 45
              bearing_land_to_sea_deg: 270
            grid:
              points: 256
            sites:
              - {name: a, inland_km: 10}
            """;

    @TempDir
    Path dir;

    record Result(int code, String err) {
    }

    Result runWith(String yaml, String... extra) throws Exception {
        Path f = dir.resolve("case.yaml");
        Files.writeString(f, yaml);
        String[] args = new String[3 + extra.length];
        args[0] = "run";
        args[1] = f.toString();
        args[2] = "--out=" + dir.resolve("out");
        System.arraycopy(extra, 0, args, 3, extra.length);
        return execute(args);
    }

    static Result execute(String... args) {
        PrintStream old = System.err;
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        System.setErr(new PrintStream(buf, true, StandardCharsets.UTF_8));
        try {
            int code = Main.execute(args);
            return new Result(code, buf.toString(StandardCharsets.UTF_8));
        } finally {
            System.setErr(old);
        }
    }

    void assertOneLineError(Result r, String... fragments) {
        assertEquals(2, r.code(), r.err());
        String[] lines = r.err().strip().split("\n");
        assertEquals(1, lines.length, "exactly one line: " + r.err());
        assertTrue(lines[0].startsWith("littoral: error: "), r.err());
        assertFalse(r.err().contains("\tat "), "no stack trace without --debug");
        for (String f : fragments) {
            assertTrue(lines[0].contains(f), "'" + f + "' in: " + lines[0]);
        }
    }

    @Test
    void aMissingFileNamesThePathAndTheBuiltins() {
        Result r = execute("run", dir.resolve("nope.yaml").toString(), "--out", dir.toString());
        assertOneLineError(r, "nope.yaml: no such scenario file", "classic-45N");
    }

    @Test
    void anUnknownBuiltinNameListsTheBuiltins() {
        assertOneLineError(execute("run", "classic-46N"), "'classic-46N' is neither a built-in scenario nor an existing file", "sea-barrier-bay");
    }

    @Test
    void malformedYamlGivesFileLineAndColumn() throws Exception {
        Result r = runWith(GOOD + "flights: {cadence_min: 30\n");
        assertOneLineError(r, "case.yaml:", "YAML syntax error");
        assertTrue(r.err().matches("(?s)littoral: error: \\S*case\\.yaml:\\d+:\\d+: YAML syntax error.*"), r.err());
    }

    @Test
    void anUnknownKeyListsTheValidKeys() throws Exception {
        assertOneLineError(runWith(GOOD.replace("points: 256", "pionts: 256")), "case.yaml:7:3: unknown key 'grid.pionts'",
                "did you mean 'points'?", "valid keys in 'grid': points, spacing_km, levels, top_m, first_level_spacing_m");
    }

    @Test
    void aWrongTypeNamesKeyValueAndWhatIsAllowed() throws Exception {
        assertOneLineError(runWith(GOOD.replace("points: 256", "points: lots")), "case.yaml:7:11: grid.points = 'lots': not a whole number",
                "16 to 16384");
    }

    @Test
    void latitude95IsOutOfRange() throws Exception {
        assertOneLineError(runWith(GOOD.replace("latitude_deg: 45", "latitude_deg: 95")),
                "case.yaml:4:17: coast.latitude_deg = 95: outside the allowed range; give a number, -90 to 90 deg");
    }

    @Test
    void aNegativeGridSizeIsOutOfRange() throws Exception {
        assertOneLineError(runWith(GOOD.replace("points: 256", "points: -256")), "case.yaml:7:11: grid.points = -256: outside the allowed range",
                "16 to 16384");
    }

    @Test
    void aNegativeGridSpacingIsOutOfRange() throws Exception {
        assertOneLineError(runWith(GOOD.replace("points: 256", "points: 256\n  spacing_km: -2")),
                "grid.spacing_km = -2", "0.05 to 100 km");
    }

    @Test
    void aSiteOutsideTheDomainIsRejected() throws Exception {
        assertOneLineError(runWith(GOOD.replace("inland_km: 10", "inland_km: 300")),
                "case.yaml:9:26: sites[0].inland_km = 300 (site 'a') is outside the model domain -256 to 254 km", "widen the domain");
    }

    @Test
    void aNonlinearScenarioWithABadAmbientKeyGetsOneLine() throws Exception {
        String yaml = GOOD.replace("points: 256", "points: 400\n  spacing_km: 1") + "kind: nonlinear\nambient_wind:\n  speed_m_per_s: 3\n"
                + "  direction_from_deg: 90\n";
        assertOneLineError(runWith(yaml), "case.yaml:14:3: unknown key 'ambient_wind.direction_from_deg'",
                "valid keys in 'ambient_wind': speed_m_per_s, from_deg");
    }

    @Test
    void aNonlinearScenarioWithAnAmbientSpeedOutOfRangeGetsOneLine() throws Exception {
        String yaml = GOOD.replace("points: 256", "points: 400\n  spacing_km: 1") + "kind: nonlinear\nambient_wind:\n  speed_m_per_s: 45\n";
        assertOneLineError(runWith(yaml), "case.yaml:13:18: ambient_wind.speed_m_per_s = 45: outside the allowed range", "0 to 40 m/s");
    }

    @Test
    void debugAddsTheStackTrace() throws Exception {
        Result r = runWith(GOOD.replace("latitude_deg: 45", "latitude_deg: 95"), "--debug");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("\tat "), r.err());
    }
}
