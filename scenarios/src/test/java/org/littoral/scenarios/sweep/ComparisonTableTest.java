package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ComparisonTableTest {

    @TempDir
    Path tmp;

    @Test
    void theTableHasOneRowPerMemberWithSettingsBreezeTypeAndFlattenedResults() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, false));
        ComparisonTable t = ComparisonTable.build(spec, members, new MemberStore(tmp));
        assertEquals(24, t.rows().size());
        assertTrue(t.columns().containsAll(List.of("member", "status", "ambient_wind.from_deg", "ambient_wind.speed_m_per_s",
                "breeze_type", "sites.S5.arrival_solar_h", "sites.S20.delta_theta_K", "error")), t.columns().toString());
        // test coast: sea to the west (bearing 270), 40 N; members 0-5 from 90 (offshore), speed 1 is below the
        // 2 m/s weak-wind threshold of the analysis chain's typing
        Map<String, Object> offshore3 = t.rows().get(1);
        assertEquals("pure", offshore3.get("breeze_type"));
        assertEquals(-3.0, (Double) offshore3.get("ambient_onshore_m_per_s"), 1e-9);
        assertEquals("backdoor", t.rows().get(6 + 1).get("breeze_type"), "from 180 blows north = +y, land on the right");
        assertEquals("synoptic", t.rows().get(12 + 1).get("breeze_type"));
        assertEquals("corkscrew", t.rows().get(18 + 1).get("breeze_type"));
        Map<String, Object> failed = t.rows().get(4); // speed 9
        assertEquals("failed", failed.get("status"));
        assertTrue(failed.get("error").toString().contains("blew up"));
        assertTrue(!failed.containsKey("max_penetration_km"));

        t.write(tmp);
        List<String> csv = Files.readAllLines(tmp.resolve("comparison.csv"));
        assertEquals(25, csv.size());
        assertTrue(csv.get(0).startsWith("member,status,ambient_wind.from_deg,ambient_wind.speed_m_per_s,breeze_type"), csv.get(0));
        assertTrue(Files.readString(tmp.resolve("comparison.json")).contains("\"breeze_type\" : \"corkscrew\""));
        List<Path> figs = ComparisonFigures.write(t, tmp);
        assertEquals(3, figs.size(), "arrival, penetration and post-passage (delta_theta_K) figures");
        for (Path p : figs) {
            assertTrue(Files.size(p) > 1000, p.toString());
        }
    }
}
