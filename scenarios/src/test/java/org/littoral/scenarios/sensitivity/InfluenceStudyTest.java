package org.littoral.scenarios.sensitivity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.sweep.SweepExecutor;
import org.littoral.scenarios.timing.DayFile;
import org.littoral.scenarios.timing.DaySpec;

/**
 * littoral influence end to end on a designed case (linear quick look, coarse grid, INVENTED coast): the ambient speed
 * is drawn over 0-8 m/s offshore while the land heating varies by 1 %, so the ambient speed must come out as the
 * input that controls the onset at the inland site (its total index the largest, the heating's near zero). The study
 * runs through the sweep machinery: a second run with --resume reuses every member file.
 */
class InfluenceStudyTest {
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
    static final String DAY = """
            date: 2031-07-04
            coast: coast.yaml
            ambient_wind: {from_deg: 90, speed_m_per_s: 4.0}
            flights: {interval_min: 15, first_h: 6, last_h: 20}
            ensemble:
              model: linear
              grid: {points: 256, spacing_km: 1.0, levels: 24}
              harmonics: 6
              ambient_from_deg: fixed
              ambient_speed_m_per_s: {uniform: {from: 0.0, to: 8.0}}
              heating_peak_flux_W_per_m2: {uniform: {from: 247.5, to: 252.5}}
              buoyancy_frequency_per_s: fixed
              sst_K: fixed
              mixed_layer_start_depth_m: fixed
            """;

    @TempDir
    static Path tmp;
    static InfluenceStudy.Result result;
    static InfluenceStudy.Settings settings = new InfluenceStudy.Settings(16, SampleDesign.Points.SOBOL, 5, 200, 0.95);
    static DaySpec spec;

    @BeforeAll
    static void runTheStudyOnce() throws IOException {
        Files.writeString(tmp.resolve("coast.yaml"), COAST);
        spec = DayFile.parse("day.yaml", DAY, tmp);
        PrintStream quiet = new PrintStream(new ByteArrayOutputStream());
        result = InfluenceStudy.run(spec, settings, tmp.resolve("study"), new SweepExecutor.Options(2, false, quiet, false, 60_000),
                Solver.standard());
        InfluenceOutputs.write(tmp.resolve("study"), result, settings);
    }

    @Test
    void theStudyRunsNTimesKPlusTwoMembersOfTheDaysInputs() {
        assertEquals(2, result.inputs().size());
        assertEquals(16 * 4, result.members().size());
        assertEquals(0, result.outcome().failed());
    }

    @Test
    void theDominantInputOfTheDesignedCaseComesOutFirst() {
        InfluenceStudy.OutputIndices farm = result.outputs().stream().filter(o -> o.key().equals("arrival:farm")).findFirst()
                .orElseThrow();
        int speed = 0;
        assertEquals("ambient speed", result.inputs().get(speed).name());
        assertEquals(speed, InfluenceOutputs.dominant(farm), "indices " + farm.indices().indices()[0] + " / "
                + farm.indices().indices()[1]);
        assertTrue(farm.indices().indices()[speed].total() > 0.8, "S_T of the speed " + farm.indices().indices()[speed].total());
        assertTrue(farm.indices().indices()[1].total() < 0.1, "S_T of the 1 % heating " + farm.indices().indices()[1].total());
    }

    @Test
    void theOutputsAreWrittenAndAResumedStudyReusesEveryMember() throws IOException {
        Path dir = tmp.resolve("study");
        for (String f : new String[] {"indices.csv", "outcomes.csv", "influence.json", InfluenceOutputs.FIGURE, "report.html",
            "sweep.json"}) {
            assertTrue(Files.size(dir.resolve(f)) > 0, f);
        }
        assertTrue(Files.readString(dir.resolve("report.html")).contains("ambient speed controls the arrival most"));
        PrintStream quiet = new PrintStream(new ByteArrayOutputStream());
        InfluenceStudy.Result again = InfluenceStudy.run(spec, settings, dir, new SweepExecutor.Options(2, true, quiet, false, 60_000),
                Solver.standard());
        assertEquals(0, again.outcome().ran());
        assertEquals(result.outputs().get(0).indices().indices()[0].total(), again.outputs().get(0).indices().indices()[0].total());
    }
}
