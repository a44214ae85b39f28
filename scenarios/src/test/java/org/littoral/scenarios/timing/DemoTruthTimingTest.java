package org.littoral.scenarios.timing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.analysis.ingest.CsvTable;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.timing.TimingFlag.Kind;

/**
 * The true passages of the invented demo campaign (demo-data/truth/passages.csv, drawn by a generator that is
 * independent of littoral's models) checked with check-timing against a small linear ensemble per day, built
 * from that day's row of demo-data/days.csv: none is inland-before-coast, implausibly fast or earlier than any
 * plausible onset, and most are not flagged at all. The linear envelope (onset of onshore flow) never flags on its
 * own, so only the density-current and flight-time checks can flag here; the nonlinear check of the demo's
 * consistent day is in DemoCommandTest.
 */
class DemoTruthTimingTest {
    private static final Path DEMO = Path.of("..", "demo-data").toAbsolutePath().normalize();

    @TempDir
    Path tmp;

    @Test
    void theDemoCampaignsTruePassagesAreMostlyUnflaggedAndNeverStructurallyImplausible() throws Exception {
        Path truth = DEMO.resolve("truth/passages.csv");
        CsvTable passages = CsvTable.read(truth);
        Set<String> breezeDays = new LinkedHashSet<>();
        for (int r = 0; r < passages.rowCount(); r++) {
            breezeDays.add(passages.cell(r, passages.column("day")));
        }
        CsvTable days = CsvTable.read(DEMO.resolve("days.csv"));
        List<TimingFlag> all = new ArrayList<>();
        int checked = 0;
        int used = 0;
        for (int r = 0; r < days.rowCount() && used < 3; r++) {
            String day = days.cell(r, days.column("day"));
            if (!breezeDays.contains(day)) {
                continue;
            }
            used++;
            Path dayFile = tmp.resolve(day + ".yaml");
            Files.writeString(dayFile, String.format(Locale.ROOT, """
                    # INVENTED demo day (from demo-data/days.csv)
                    date: %s
                    coast: %s
                    ambient_wind: {from_deg: %s, speed_m_per_s: %s}
                    front: {theta_v_contrast_K: %s, breeze_depth_m: %s}
                    flights: {interval_min: 30, first_h: 7, last_h: 18}
                    ensemble: {model: linear, members: 6, seed: 1, grid: {points: 256, spacing_km: 1.0, levels: 32}, harmonics: 8}
                    """, day, DEMO.resolve("coast.yaml"), days.cell(r, days.column("ambient_wind_direction_deg")),
                    days.cell(r, days.column("ambient_wind_speed_m_per_s")),
                    days.cell(r, days.column("land_sea_theta_v_contrast_K")), days.cell(r, days.column("breeze_depth_m"))));
            CheckTimingResult res = CheckTimingRun.run(DayFile.read(dayFile), truth, tmp.resolve("out-" + day),
                    new CheckTimingRun.Options(null, 2, false, new PrintStream(OutputStream.nullOutputStream()), false),
                    Solver.standard());
            assertEquals(0, res.failedMembers(), day);
            checked += (int) res.check().passages().stream().filter(p -> p.passage().label().equals("sea_breeze")).count();
            all.addAll(res.check().flags());
        }
        assertEquals(3, used);
        for (TimingFlag f : all) {
            assertTrue(f.kind() == Kind.OUTSIDE_ENVELOPE || f.kind() == Kind.ONE_CADENCE_OFF, f.toString());
        }
        long flaggedPassages = all.stream().map(f -> f.day() + f.site() + f.label()).distinct().count();
        assertTrue(checked >= 6, "sea-breeze passages checked: " + checked);
        assertTrue(flaggedPassages * 3 <= checked, flaggedPassages + " of " + checked + " true passages flagged: " + all);
    }
}
