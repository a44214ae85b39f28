package org.littoral.scenarios.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.ingest.CsvTable;
import org.littoral.scenarios.analysis.ingest.IngestResult;
import org.littoral.scenarios.analysis.ingest.IngestSettings;
import org.littoral.scenarios.analysis.ingest.ProfileColumns;
import org.littoral.scenarios.analysis.ingest.ProfileCsvReader;

/** The contract between littoral run and the analysis chain: soundings.csv re-ingests unchanged. */
class SoundingsReingestTest {

    static Profile profile(double hours, double t0) {
        int n = 20;
        double[] z = new double[n];
        double[] p = new double[n];
        double[] t = new double[n];
        double[] r = new double[n];
        double[] u = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            z[k] = 5.0 * k;
            p[k] = 101000 - 11.8 * z[k];
            t[k] = t0 - 0.0098 * z[k];
            r[k] = 0.009 - 1e-6 * z[k];
            u[k] = -2.0 + 0.01 * z[k];
            v[k] = 3.5;
        }
        return Profile.fromState("inland-4km", "sea-breeze/member-3", hours, z, p, t, r, u, v);
    }

    @Test
    void theSoundingsHeaderIsTheAnalysisChainsBinnedColumnSet() {
        String csv = ScenarioRun.soundingsCsv(List.of(profile(10.25, 295.0)));
        assertEquals(ProfileColumns.binnedHeader(), csv.substring(0, csv.indexOf('\n')));
    }

    @Test
    void soundingsWrittenByRunAreReadBackByTheAnalysisChain() throws IOException {
        List<Profile> in = List.of(profile(10.25, 295.0), profile(10.75, 295.6));
        String csv = ScenarioRun.soundingsCsv(in);
        IngestResult res = new ProfileCsvReader(new IngestSettings())
                .read(CsvTable.read("soundings.csv", new BufferedReader(new StringReader(csv))));
        assertEquals(2, res.profiles().size());
        for (int i = 0; i < 2; i++) {
            Profile a = in.get(i);
            Profile b = res.profiles().get(i);
            assertEquals(a.timeHours(), b.timeHours(), 1e-4);
            assertEquals(a.day(), b.day());
            for (int k = 0; k < a.size(); k++) {
                // Tolerances: the precision soundings.csv is written with.
                assertEquals(a.temperatureK()[k], b.temperatureK()[k], 1e-3);
                assertEquals(a.mixingRatioKgPerKg()[k], b.mixingRatioKgPerKg()[k], 1e-6);
                assertEquals(a.thetaEK()[k], b.thetaEK()[k], 0.01);
                assertEquals(a.windEastMPerS()[k], b.windEastMPerS()[k], 0.02);
                assertEquals(a.windNorthMPerS()[k], b.windNorthMPerS()[k], 0.02);
            }
        }
        assertEquals(0, res.qc().entries().size());
    }
}
