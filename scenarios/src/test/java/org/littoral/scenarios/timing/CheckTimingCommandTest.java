package org.littoral.scenarios.timing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.timing.TimingFlag.Kind;

/**
 * check-timing end to end on a small real ensemble (linear model, coarse grid, 5 members run once and reused
 * with --resume): planted timing errors raise the flag with the right reason, a consistent day raises none, the
 * linear envelope (onset of onshore flow: linear theory has no front) never flags a passage on its own, and the
 * outputs are written. The planted times are built from the ensemble's own medians and the density-current
 * speed of Simpson &amp; Britter (1980, from memory: 0.87 sqrt(g'h) + 0.59 U_x). Timings depend only on
 * this small ensemble and the formulas, never on hard-coded times.
 */
class CheckTimingCommandTest {
    static final String COAST = """
            # INVENTED test coast: sea to the west, land to the east
            coast: {latitude_deg: 40.0, bearing_land_to_sea_deg: 270.0, day_of_year: 190}
            surface:
              - {name: sea, type: water, ends_at_km: 0.0, sst_K: 293.15}
              - {name: land, type: land}
            sites:
              - {name: shore, inland_km: 3.0}
              - {name: farm, inland_km: 12.0}
            """;
    /** A tight ensemble (only the ambient speed spread a little), so one flight off is outside the envelope. */
    static final String DAY = """
            date: 2031-07-04
            coast: coast.yaml
            ambient_wind: {from_deg: 90, speed_m_per_s: 1.0}
            front: {theta_v_contrast_K: %s, breeze_depth_m: 500}
            flights: {interval_min: 15, first_h: %s, last_h: 20}
            passage_uncertainty_min: 2
            ensemble:
              model: linear
              members: 5
              seed: 7
              grid: {points: 256, spacing_km: 1.0, levels: 24}
              harmonics: 6
              ambient_from_deg: fixed
              ambient_speed_m_per_s: {normal: {mean: 1.0, sd: 0.02, min: 0.94, max: 1.06}}
              heating_peak_flux_W_per_m2: fixed
              buoyancy_frequency_per_s: fixed
              sst_K: fixed
              mixed_layer_start_depth_m: fixed
            """;

    @TempDir
    static Path tmp;
    static Path ensembleDir;
    static double shoreMedian;
    static double farmMedian;
    static double contrastK;
    static double firstFlightH;
    static String log;

    @BeforeAll
    static void runTheEnsembleOnce() throws IOException {
        Files.writeString(tmp.resolve("coast.yaml"), COAST);
        ensembleDir = tmp.resolve("ensemble");
        CheckTimingResult r = run(day(2.0, 5.0), passages("shore,2031-07-04,11:00\nfarm,2031-07-04,13:00\n"), false);
        shoreMedian = p50(r, "shore");
        farmMedian = p50(r, "farm");
        assertTrue(farmMedian > shoreMedian, "model front must reach the farm after the shore: " + shoreMedian + " " + farmMedian);
        // Contrast for which the Simpson & Britter speed equals the model's own speed between the sites.
        double v = 9000.0 / ((farmMedian - shoreMedian) * 3600.0);
        double sqrtGh = (v + 0.59 * 1.0) / 0.87; // offshore 1 m/s: U_x = -1
        contrastK = sqrtGh * sqrtGh / 500.0 * 300.0 / DensityCurrent.G;
        // Flights every 15 min with one exactly at the farm's median arrival (to the second, as the flight times are).
        firstFlightH = farmMedian - Math.floor((farmMedian - 5.0) * 4) / 4.0;
    }

    private static double p50(CheckTimingResult r, String site) {
        int col = r.envelopeTable().columns().indexOf("p50_local_h");
        for (List<Object> row : r.envelopeTable().rows()) {
            if (row.get(0).equals(site)) {
                return ((Number) row.get(col)).doubleValue();
            }
        }
        throw new AssertionError("no envelope row for " + site);
    }

    private static Path day(double contrast, double first) throws IOException {
        Path p = tmp.resolve(String.format(Locale.ROOT, "day-%.4f-%.5f.yaml", contrast, first));
        Files.writeString(p, String.format(Locale.ROOT, DAY, String.format(Locale.ROOT, "%.4f", contrast),
                String.format(Locale.ROOT, "%.6f", first)));
        return p;
    }

    private static int files;

    private static Path passages(String rows) throws IOException {
        Path p = tmp.resolve("passages-" + files++ + ".csv");
        Files.writeString(p, "# INVENTED test passages\nsite,date,passage_time_local\n" + rows);
        return p;
    }

    private static CheckTimingResult run(Path dayFile, Path passagesFile, boolean resume) throws IOException {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        CheckTimingResult r = CheckTimingRun.run(DayFile.read(dayFile), passagesFile, ensembleDir,
                new CheckTimingRun.Options(null, 2, resume, new PrintStream(buf, true, StandardCharsets.UTF_8), false),
                Solver.standard());
        log = buf.toString(StandardCharsets.UTF_8);
        return r;
    }

    private static String hhmmss(double h) {
        long s = Math.round(h * 3600);
        return String.format(Locale.ROOT, "%02d:%02d:%02d", s / 3600, (s / 60) % 60, s % 60);
    }

    private static CheckTimingResult check(double shore, double farm) throws IOException {
        return run(day(contrastK, firstFlightH), passages("shore,2031-07-04," + hhmmss(shore) + "\nfarm,2031-07-04,"
                + hhmmss(farm) + "\n"), true);
    }

    private static TimingFlag flag(CheckTimingResult r, Kind kind, String site) {
        return r.check().flags().stream().filter(f -> f.kind() == kind && f.site().equals(site)).findFirst()
                .orElseThrow(() -> new AssertionError("no " + kind + " at " + site + "; flags: " + r.check().flags()));
    }

    @Test
    void aDayAtTheEnsembleMediansAndTheDensityCurrentSpeedRaisesNoFlag() throws IOException {
        CheckTimingResult r = check(shoreMedian, Math.round(farmMedian * 3600) / 3600.0);
        assertTrue(r.check().flags().isEmpty(), r.check().flags().toString());
        assertEquals(1, r.check().pairs().size());
        assertTrue(log.contains("already done"), "the ensemble is reused with --resume: " + log);
        assertEquals(5, r.members());
    }

    @Test
    void anInlandPassageBeforeTheCoastalOneIsFlaggedInlandBeforeCoast() throws IOException {
        CheckTimingResult r = check(shoreMedian, shoreMedian - 0.5);
        TimingFlag f = flag(r, Kind.INLAND_BEFORE_COAST, "farm");
        assertTrue(f.reason().contains("before shore"), f.reason());
    }

    @Test
    void aCoastalPassageAtThreeInTheMorningIsEarlierThanAnyPlausibleOnset() throws IOException {
        CheckTimingResult r = check(3.0, farmMedian);
        TimingFlag f = flag(r, Kind.EARLIER_THAN_ANY_PLAUSIBLE_ONSET, "shore");
        // a linear ensemble is not evidence: the floor is sunrise (40 N, day 190: about 04:35 local solar time, from memory)
        assertTrue(f.reason().contains("earlier than any plausible arrival") && f.reason().contains("04:"), f.reason());
        assertTrue(f.value() > 1.0, "hours early: " + f.value());
        assertFalse(r.check().flagged(Kind.EARLIER_THAN_ANY_PLAUSIBLE_ONSET, "farm"), r.check().flags().toString());
    }

    @Test
    void nineKilometresInFiveMinutesIsAnImplausibleSpeed() throws IOException {
        CheckTimingResult r = check(shoreMedian, shoreMedian + 5.0 / 60.0);
        TimingFlag f = flag(r, Kind.IMPLIED_SPEED_IMPLAUSIBLE, "farm");
        assertEquals(9000.0 / 300.0 / r.check().pairs().get(0).nominalMPerS(), f.value(), 0.05 * f.value());
        assertTrue(f.reason().contains("Simpson & Britter"), f.reason());
    }

    @Test
    void aFarmPassageOneFlightTooSoonAfterTheShoreIsFlaggedWithTheLaterFlightFavoured() throws IOException {
        // the density current from the shore passage cannot reach the farm before shore + 9 km / fastest plausible speed
        double fastest = check(shoreMedian, Math.round(farmMedian * 3600) / 3600.0).check().pairs().get(0).plausibleMaxMPerS();
        double windowStart = shoreMedian + 9000.0 / fastest / 3600.0;
        double tooSoon = firstFlightH + 0.25 * Math.floor((windowStart - firstFlightH) / 0.25);
        double next = tooSoon + 0.25;
        CheckTimingResult r = check(shoreMedian, Math.round(tooSoon * 3600) / 3600.0);
        TimingFlag f = flag(r, Kind.ONE_CADENCE_OFF, "farm");
        assertEquals("later", f.favoured());
        assertEquals(next, f.suggestedTimeHours(), 1.5 / 3600.0);
        assertTrue(f.reason().contains("density-current speed"), f.reason());
    }

    @Test
    void aLinearEnvelopeNeverFlagsAPassageOnItsOwn() throws IOException {
        // three hours after the linear ensemble's every member, at the density-current speed between the sites
        CheckTimingResult r = check(shoreMedian + 3.0, Math.round((farmMedian + 3.0) * 3600) / 3600.0);
        assertTrue(r.check().flags().isEmpty(), r.check().flags().toString());
        assertTrue(r.check().passages().get(0).envelopePercentile() > 95, "the percentile is still reported");
        assertTrue(r.flagsCaption().startsWith("No flag") && r.flagsCaption().contains("never flags a passage on its own"),
                r.flagsCaption());
        assertTrue(r.figureCaption().contains("onset of onshore flow (linear theory has no front"), r.figureCaption());
    }

    @Test
    void theFlagsCaptionCountsTheFlagsOfItsTable() throws IOException {
        CheckTimingResult r = check(shoreMedian, shoreMedian - 0.5);
        assertEquals(r.check().flags().size(), r.flagsView().rowCount());
        assertTrue(r.flagsCaption().startsWith(r.check().flags().size() + " flag(s)") && r.flagsCaption().contains("inland before coast"),
                r.flagsCaption());
    }

    @Test
    void modelNonlinearReachesTheSolverThroughTheScenarioKind() throws IOException {
        java.util.Set<org.littoral.scenarios.scenario.Scenario.Kind> kinds = java.util.concurrent.ConcurrentHashMap.newKeySet();
        // A recording solver: it notes the kind each member asks for, then solves with the linear model.
        Solver recording = s -> {
            kinds.add(s.kind());
            return org.littoral.model.linear.LinearBreezeModel.solve(s.toLinearConfig());
        };
        CheckTimingResult r = CheckTimingRun.run(DayFile.read(day(contrastK, firstFlightH)),
                passages("shore,2031-07-04,11:00\n"), tmp.resolve("nonlinear"),
                new CheckTimingRun.Options("nonlinear", 2, false, new PrintStream(java.io.OutputStream.nullOutputStream()), false),
                recording);
        assertEquals(java.util.Set.of(org.littoral.scenarios.scenario.Scenario.Kind.NONLINEAR), kinds);
        assertEquals(5, r.members());
        assertTrue(Files.readString(tmp.resolve("nonlinear/members/m0000.json")).contains("\"kind\" : \"nonlinear\""));
    }

    @Test
    void theOutputsAreWrittenAndTheFlagIsAdviceOnly() throws IOException {
        Path obs = passages("shore,2031-07-04," + hhmmss(shoreMedian) + "\nfarm,2031-07-04," + hhmmss(shoreMedian - 0.5) + "\n");
        byte[] before = Files.readAllBytes(obs);
        CheckTimingResult r = run(day(contrastK, firstFlightH), obs, true);
        for (Path p : List.of(r.flagsCsv(), r.envelopeCsv(), r.summaryJson(), r.figurePng(), r.reportHtml())) {
            assertTrue(Files.size(p) > 100, p.toString());
        }
        String flags = Files.readString(r.flagsCsv());
        assertTrue(flags.startsWith("date,site,inland_km,label,observed_local,observed_local_h,flag,"), flags);
        assertTrue(flags.contains("INLAND_BEFORE_COAST"), flags);
        assertTrue(Files.readString(r.reportHtml()).contains("not a weather forecast"));
        assertTrue(Files.readString(r.summaryJson()).contains("\"plausible_max\""));
        assertEquals(new String(before, StandardCharsets.UTF_8), Files.readString(obs), "the passage table is never edited");
    }
}
