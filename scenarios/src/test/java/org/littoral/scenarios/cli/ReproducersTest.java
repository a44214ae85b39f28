package org.littoral.scenarios.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import org.littoral.scenarios.output.SafeNames;
import org.littoral.scenarios.run.WorkEstimate;
import org.littoral.scenarios.scenario.BuiltinScenarios;

/**
 * The crashes, unclear errors, silent acceptances and path escapes of issue 14, each run through the real command
 * line: every one now ends in one line on stderr (exit 2), or, for failed sweep members, in exit 1 with a report.
 */
class ReproducersTest {
    /** A small linear scenario (runs in about a second). */
    static final String SMALL = """
            name: small
            description: reproducer
            coast: {latitude_deg: 45, bearing_land_to_sea_deg: 270}
            grid: {points: 128, spacing_km: 4, levels: 24}
            physics: {harmonics: 4}
            sites:
              - {name: a, inland_km: 10}
            """;

    @TempDir
    Path dir;

    record Result(int code, String err) {
        String line() {
            return err.strip();
        }
    }

    static Result execute(String... args) {
        PrintStream old = System.err;
        PrintStream oldOut = System.out;
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        System.setErr(new PrintStream(buf, true, StandardCharsets.UTF_8));
        System.setOut(new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8));
        try {
            return new Result(Main.execute(args), buf.toString(StandardCharsets.UTF_8));
        } finally {
            System.setErr(old);
            System.setOut(oldOut);
        }
    }

    static void oneLine(Result r, String... fragments) {
        assertEquals(2, r.code(), r.err());
        String[] lines = r.err().strip().split("\n");
        assertEquals(1, lines.length, "exactly one line: " + r.err());
        assertTrue(lines[0].startsWith("littoral: error: "), r.err());
        assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
        for (String f : fragments) {
            assertTrue(lines[0].contains(f), "'" + f + "' in: " + lines[0]);
        }
    }

    Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.createDirectories(f.getParent());
        Files.writeString(f, text);
        return f;
    }

    // ------------------------------------------------------------------ crashes: work limits

    @ParameterizedTest(name = "{0}: {1}")
    @CsvSource({
        "flights, cadence_min, 0.000001, 1 to 1440 min",
        "output, step_min, 0.000001, 1 to 360 min",
        "flights, bin_m, 0.000001, 1 to 500 m",
    })
    void aTinyStepThatUsedToExhaustTheHeapIsRefusedByItsLowerBound(String section, String key, String value, String range)
            throws Exception {
        Path f = write("tiny.yaml", SMALL + section + ": {" + key + ": " + value + "}\n");
        oneLine(execute("run", f.toString(), "--out", dir.resolve("o").toString()), "tiny.yaml:", section + "." + key + " = ",
                range);
        assertFalse(Files.exists(dir.resolve("o")), "nothing is created before the input is known to be good");
    }

    @Test
    void aRunThatCannotFitInMemoryIsRefusedWithTheFigureBeforeItStarts() throws Exception {
        Path f = write("huge.yaml", SMALL.replace("grid: {points: 128, spacing_km: 4, levels: 24}",
                "grid: {points: 128, spacing_km: 4, levels: 24, top_m: 10000}")
                + "flights: {cadence_min: 1, start_h: 0, end_h: 24, bin_m: 1, ceiling_m: 10000}\n");
        oneLine(execute("run", f.toString(), "--out", dir.resolve("o").toString()), "huge.yaml: this run needs about",
                "GB of memory", "available", "the soundings (1441 profiles of 10000 bins)", "flights.cadence_min");
    }

    @Test
    void theEstimateRefusesAgainstTheMemoryAvailableAndNamesTheLargestPart() {
        WorkEstimate w = WorkEstimate.of(BuiltinScenarios.resolve("sea-barrier-bay"));
        assertTrue(w.bytes() > 100L << 20, w.describe());
        UserInputException e = assertThrows(UserInputException.class, () -> w.check(2, "sweep s.yaml", 50L << 20));
        assertTrue(e.getMessage().startsWith("sweep s.yaml: this run needs about ") && e.getMessage().contains("(2 members at once)")
                && e.getMessage().contains("50.0 MB is available") && e.getMessage().contains("grid.points x grid.levels"), e.getMessage());
        w.check(1, "enough", 64L << 30); // 64 GB: fits
    }

    @Test
    void aLongSiteNameIsRefusedAndALongButAllowedOneGivesFileNamesTheDiskAccepts() throws Exception {
        String long250 = "s".repeat(250);
        Path bad = write("long.yaml", SMALL.replace("{name: a,", "{name: " + long250 + ","));
        oneLine(execute("run", bad.toString(), "--out", dir.resolve("o1").toString()), "sites[0].name", "longer than 120 characters",
                "shorten it");
        String name = "site/with:odd*chars " + "q".repeat(100);
        Path ok = write("ok.yaml", SMALL.replace("{name: a,", "{name: '" + name + "',"));
        Result r = execute("run", ok.toString(), "--out", dir.resolve("o2").toString());
        assertEquals(0, r.code(), r.err());
        try (var s = Files.list(dir.resolve("o2"))) {
            List<String> names = s.map(p -> p.getFileName().toString()).toList();
            assertTrue(names.stream().anyMatch(n -> n.startsWith("site_site_with_odd_chars_q")), names.toString());
            assertTrue(names.stream().allMatch(n -> n.length() <= 120), names.toString());
        }
    }

    @Test
    void aNameWithPathPartsBecomesOneSafeFileName() {
        for (String n : List.of("../../x", "..", ".", "/etc/passwd", "a/b", "C:\\x", "", "x".repeat(300))) {
            String s = SafeNames.fileName(n);
            assertFalse(s.contains("/") || s.contains("\\") || s.startsWith(".") || s.isEmpty(), n + " -> " + s);
            assertTrue(s.length() <= SafeNames.MAX, s);
        }
        assertEquals("classic-45N", SafeNames.fileName("classic-45N"));
        assertFalse(SafeNames.fileName("a b").equals(SafeNames.fileName("a_b")), "changed names keep a distinguishing hash");
    }

    // ------------------------------------------------------------------ crashes: --out

    @Test
    void anOutThatIsAFileEmptyADanglingLinkOrImpossibleGivesOneLine() throws Exception {
        Path f = write("small.yaml", SMALL);
        Path file = write("afile.txt", "x");
        oneLine(execute("run", f.toString(), "--out", file.toString()), "is a file, not a folder");
        oneLine(execute("run", f.toString(), "--out", ""), "--out is empty");
        Path link = dir.resolve("dangling");
        Files.createSymbolicLink(link, dir.resolve("nowhere/at/all"));
        oneLine(execute("run", f.toString(), "--out", link.toString()), "is a link to", "which does not exist");
        oneLine(execute("run", f.toString(), "--out", file.resolve("sub").toString()), "is a file, so no folder can be made under it");
        if (Files.isDirectory(Path.of("/proc/self"))) {
            oneLine(execute("run", f.toString(), "--out", "/proc/littoral-cannot-be-here"), "cannot create the folder");
        }
    }

    @Test
    void aFullDiskIsOneLineWithExit2() {
        assertEquals(2, Main.exitCode(new UncheckedIOException(new IOException("No space left on device"))));
        assertTrue(Main.message(new UncheckedIOException(new IOException("No space left on device"))).contains("the disk is full; free"));
        UserInputException e = assertThrows(UserInputException.class, () -> OutputFolder.checkFreeSpace(dir, Long.MAX_VALUE));
        assertTrue(e.getMessage().contains("free on its disk") && e.getMessage().contains("free some space"), e.getMessage());
    }

    @Test
    void aSecondRunIntoTheSameFolderAsksForOverwriteWhichRemovesTheEarlierRunsFiles() throws Exception {
        Path two = write("two.yaml", SMALL.replace("  - {name: a, inland_km: 10}", "  - {name: a, inland_km: 10}\n  - {name: b, inland_km: 20}"));
        Path one = write("one.yaml", SMALL);
        Path out = dir.resolve("o");
        assertEquals(0, execute("run", two.toString(), "--out", out.toString()).code());
        assertTrue(Files.exists(out.resolve("site_b_breeze.png")));
        oneLine(execute("run", one.toString(), "--out", out.toString()), "already holds the outputs of an earlier 'run ",
                "add --overwrite");
        Result r = execute("run", one.toString(), "--out", out.toString(), "--overwrite");
        assertEquals(0, r.code(), r.err());
        assertFalse(Files.exists(out.resolve("site_b_breeze.png")), "the earlier run's figure of site b is gone, not mixed in");
        JsonNode m = new ObjectMapper().readTree(out.resolve(OutputFolder.MANIFEST).toFile());
        assertTrue(m.path("complete").asBoolean() && m.path("files").toString().contains("summary.json"), m.toString());
    }

    // ------------------------------------------------------------------ paths in files

    @Test
    void aBaseNamingASystemFileIsRefusedWithoutShowingItsContents() throws Exception {
        Path s = write("s.yaml", "base: /etc/passwd\naxes:\n  ambient_wind.speed_m_per_s: [1, 2]\n");
        Result r = execute("sweep", s.toString(), "--out", dir.resolve("o").toString());
        oneLine(r, "s.yaml:1:7: base:", "not a scenario file");
        assertFalse(r.err().contains("root:"), r.err());
    }

    @Test
    void aValueOf300KilobytesIsShownShortened() throws Exception {
        Path f = write("big.yaml", SMALL + "kind: " + "x".repeat(300_000) + "\n");
        Result r = execute("run", f.toString(), "--out", dir.resolve("o").toString());
        oneLine(r, "kind = 'xxxxxxxxxx", "(300000 characters)");
        assertTrue(r.err().length() < 400, r.err().length() + " characters");
    }

    // ------------------------------------------------------------------ numbers

    @Test
    void fiftyKelvinPerHourIsOutsideTheSchemaAndFiveStopsWithItsOutputsMarkedInvalid() throws Exception {
        Path f50 = write("h50.yaml", SMALL + "heating: {shape: classic, amplitude_K_per_h: 50}\n");
        oneLine(execute("run", f50.toString(), "--out", dir.resolve("o50").toString()), "heating.amplitude_K_per_h = 50",
                "0 to 5 K/h");
        Path f5 = write("h5.yaml", SMALL + "heating: {shape: classic, amplitude_K_per_h: 5}\n");
        Result r = execute("run", f5.toString(), "--out", dir.resolve("o5").toString());
        oneLine(r, "h5.yaml: the linear solution's wind reaches", "beyond the 50 m/s", "lower the heating", "marked invalid");
        JsonNode s = new ObjectMapper().readTree(dir.resolve("o5/summary.json").toFile());
        assertFalse(s.path("result_check").path("valid").asBoolean(true), s.path("result_check").toString());
        assertTrue(s.path("result_check").path("max_wind_m_per_s").asDouble() > 50);
        assertTrue(Files.size(dir.resolve("o5/soundings.csv")) > 0, "what was computed is kept");
    }

    @Test
    void schemaLimitsAreTheModelsLimitsAndNameTheYamlKeys() throws Exception {
        Path sst = write("sst.yaml", SMALL + "surface: [{name: sea, type: water, ends_at_km: 0, sst_K: 320}, {name: land, type: land}]\n");
        oneLine(execute("run", sst.toString(), "--out", dir.resolve("o").toString()), "surface[0].sst_K = 320",
                "between 260 and 320 (both exclusive) K");
        Path fr = write("fr.yaml", SMALL.replace("physics: {harmonics: 4}", "physics: {harmonics: 4, friction_per_s: 0.01}"));
        Result r = execute("run", fr.toString(), "--out", dir.resolve("o").toString());
        oneLine(r, "physics.friction_per_s = 0.01", "0 up to (not including) 0.01 1/s");
        assertFalse(r.err().contains("frictionPerS"), r.err());
    }

    // ------------------------------------------------------------------ sweeps: resume and scratch

    @Test
    void resumeReportsAFailedMemberExitsNonZeroAndClearsScratchUnderTheOutputFolder() throws Exception {
        write("base.yaml", SMALL);
        Path s = write("s.yaml", "base: base.yaml\naxes:\n  heating.amplitude_K_per_h: [0.5, 5]\n");
        Path out = dir.resolve("o");
        Result first = execute("sweep", s.toString(), "--out", out.toString(), "--no-run-files", "--threads", "1");
        assertEquals(1, first.code(), first.err());
        assertTrue(first.err().contains("1 failed"), first.err());
        assertFalse(Files.exists(out.resolve(".scratch")), "scratch folders are removed when members finish");
        // a killed run leaves scratch behind; a resumed run clears it and still reports the failed member
        Files.createDirectories(out.resolve(".scratch/m0001"));
        Files.writeString(out.resolve(".scratch/m0001/soundings.csv"), "half");
        Result again = execute("sweep", s.toString(), "--out", out.toString(), "--no-run-files", "--resume", "--threads", "1");
        assertEquals(1, again.code(), again.err());
        assertTrue(again.err().contains("1 failed (1 of them in an earlier run; --resume --retry-failed runs them again)"), again.err());
        assertTrue(again.err().contains("scratch file(s) left by an interrupted run"), again.err());
        assertFalse(Files.exists(out.resolve(".scratch")));
        oneLine(execute("sweep", s.toString(), "--out", out.toString()), "add --resume to continue that run");
    }

    @Test
    void aSweepWithAnInlineBaseGetsEveryDefaultSoAnyKeyCanBeSwept() throws Exception {
        Path s = write("inline.yaml", "base:\n" + SMALL.indent(2) + "axes:\n  ambient_wind.speed_m_per_s: [1, 2]\n");
        Result r = execute("sweep", s.toString(), "--out", dir.resolve("o").toString(), "--no-run-files", "--threads", "1");
        assertEquals(0, r.code(), r.err());
    }

    // ------------------------------------------------------------------ accepted silently

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "sweep | base: classic-45N\\naxes:\\n  ambient_wind.speed_m_per_s: [1]\\naxes:\\n  ambient_wind.from_deg: [90]\\n | key 'axes' appears twice",
        "plan | base: classic-45N\\nbase: classic-20N\\n | key 'base' appears twice",
        "check-timing | date: 2031-06-25\\ndate: 2031-06-26\\n | key 'date' appears twice",
        "observe | coast:\\n  latitude_deg: 40\\n  latitude_deg: 41\\n | key 'latitude_deg' appears twice in 'coast'",
        "run | name: a\\n---\\nname: b\\n | a second YAML document ('---') starts here",
        "sweep | base: classic-45N\\naxes: {ambient_wind.speed_m_per_s: [1]}\\n---\\nbase: classic-20N\\n | a second YAML document",
    })
    void duplicateKeysAndSecondDocumentsAreRefusedInEveryYamlFile(String command, String yaml, String expected) throws Exception {
        Path f = write(command + ".yaml", yaml.replace("\\n", "\n"));
        Path obs = write("obs.csv", "day,site,time_local,height_m\n");
        String out = dir.resolve("o-" + command).toString();
        Result r = switch (command) {
            case "check-timing" -> execute("check-timing", obs.toString(), "--day", f.toString(), "--out", out);
            case "observe" -> execute("observe", obs.toString(), "--coast", f.toString(), "--out", out);
            default -> execute(command, f.toString(), "--out", out);
        };
        oneLine(r, command + ".yaml:", expected);
    }

    // ------------------------------------------------------------------ unclear errors

    @Test
    void invalidUtf8IsNamedByLineAndColumn() throws Exception {
        Path f = dir.resolve("latin1.yaml");
        Files.write(f, "name: caf\u00e9\n".getBytes(StandardCharsets.ISO_8859_1));
        oneLine(execute("run", f.toString(), "--out", dir.resolve("o").toString()), "latin1.yaml:1:10: byte 0xE9 is not UTF-8 text",
                "save the file as UTF-8");
        Path csv = dir.resolve("obs.csv");
        Files.write(csv, "day,site,time_local,height_m\n2031-06-25,s\u00e9,10:00,5\n".getBytes(StandardCharsets.ISO_8859_1));
        oneLine(execute("observe", csv.toString(), "--coast", "classic-45N", "--out", dir.resolve("o2").toString()),
                "obs.csv:2:13: byte 0xE9 is not UTF-8 text");
    }

    @Test
    void aDamagedGzipFileIsNamedAsDamagedNotAsAWrongPath() throws Exception {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        try (GZIPOutputStream g = new GZIPOutputStream(b)) {
            g.write("day,site,time_local,height_m\n".repeat(2000).getBytes(StandardCharsets.UTF_8));
        }
        byte[] gz = b.toByteArray();
        Path f = dir.resolve("obs.csv.gz");
        Files.write(f, java.util.Arrays.copyOf(gz, gz.length / 2));
        oneLine(execute("observe", f.toString(), "--coast", "classic-45N", "--out", dir.resolve("o").toString()),
                "obs.csv.gz", "the gzip data is damaged or cut short", "replace the file");
        Path notGz = write("plain.csv.gz", "day,site\n");
        oneLine(execute("observe", notGz.toString(), "--coast", "classic-45N", "--out", dir.resolve("o2").toString()),
                "plain.csv.gz: the name ends in .gz but the file is not gzip data");
    }

    @Test
    void aBadValueInThePerDayTableNamesTheFileAndLine() throws Exception {
        Path days = write("days.csv", "day,breeze_type\n2031-06-25,pure\n2031-06-26,sideways\n");
        Path obs = write("obs.csv", "day,site,time_local,height_m,pressure_hPa,temperature_C,rh_percent,wind_speed_m_per_s,"
                + "wind_direction_deg\n2031-06-25,a,10:00,5,1000,20,50,3,270\n");
        oneLine(execute("observe", obs.toString(), "--coast", "classic-45N", "--days", days.toString(), "--out",
                dir.resolve("o").toString()), "days.csv line 3: column 'breeze_type' value 'sideways' is not a breeze type",
                "use one of pure");
    }
}
