package org.littoral.scenarios.observe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.ingest.QcLog;
import org.littoral.scenarios.cli.Main;

/**
 * Profiles in netCDF-3 and netCDF-4 written by an outside library (Debian's python3-netcdf4, installed by .ci/run):
 * one file per flight, and a CF-1.8 profile collection. Variables are found by CF standard_name, units converted
 * (K, Pa, fraction, knots, kg/kg), fill values masked, CF time decoded to the local clock (UTC+11).
 */
class NetcdfProfilesInTest {
    @TempDir
    static Path dir;

    @BeforeAll
    static void writeFilesWithPython() throws Exception {
        Path script = dir.resolve("make_profiles_nc.py");
        try (InputStream in = NetcdfProfilesInTest.class.getResourceAsStream("make_profiles_nc.py")) {
            Files.copy(in, script);
        }
        Process p;
        try {
            p = new ProcessBuilder("/usr/bin/python3", script.toString(), dir.toString()).redirectErrorStream(true).start();
        } catch (IOException e) {
            fail("/usr/bin/python3 not found: apt-get install -y python3-netcdf4 (.ci/run does)");
            return;
        }
        String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue(), "python3-netcdf4 failed (apt-get install -y python3-netcdf4): " + text);
    }

    AnalysisSettings settings() {
        AnalysisSettings s = new AnalysisSettings();
        s.localZone = ZoneOffset.ofHours(11);
        return s;
    }

    Path coast() throws IOException {
        Path c = dir.resolve("coast.yaml");
        Files.writeString(c, "coast: {latitude_deg: -36.0, longitude_deg: 165.0, utc_offset_h: 11, "
                + "bearing_land_to_sea_deg: 135.0, day_of_year: 339}\n");
        return c;
    }

    @ParameterizedTest
    @ValueSource(strings = {"nc3", "nc4"})
    void oneFlightPerFileIsBinnedLikeARawFlightWithUnitsConverted(String tag) throws IOException {
        ObserveIngest.Observed o = ObserveIngest.ingest(dir.resolve("flights-" + tag), settings(), null);
        assertEquals(21, o.profiles().size());
        Profile p = o.profiles().get(0);
        assertEquals("ridge-3km", p.site());
        assertEquals("2026-12-05", p.day());
        assertEquals(7.0, p.timeHours(), 1.0 / 3600.0);
        int k = 20;
        assertEquals(100.0, p.heightM()[k], 1e-9);
        assertEquals(293.15 - 0.98, p.temperatureK()[k], 0.02);
        assertEquals(101300.0 * Math.exp(-100.0 / 8400.0), p.pressurePa()[k], 10.0); // bin mean of samples at 99 and 102 m
        assertEquals(4.0, p.windSpeed(k), 1e-3); // written in knots (1 kn = 1852/3600 m/s, exact by definition)
        assertEquals(300.0, p.windDirectionDeg(k), 1e-3);
        assertEquals(0.6, p.relativeHumidity()[k], 1e-3);
        long descent = o.qc().entries().stream().filter(e -> e.what().equals("descent-samples")).count();
        assertEquals(21, descent);
    }

    @ParameterizedTest
    @ValueSource(strings = {"nc3", "nc4"})
    void aCfProfileCollectionGivesBinnedProfilesPerSiteWithFillMasked(String tag) throws IOException {
        ObserveIngest.Observed o = ObserveIngest.ingest(dir.resolve("collection-" + tag + ".nc"), settings(), null);
        List<Profile> ps = o.profiles();
        assertEquals(42, ps.size());
        assertEquals(21, ps.stream().filter(p -> p.site().equals("flats-20km")).count());
        Profile p3 = ps.stream().filter(p -> p.site().equals("flats-20km") && Math.abs(p.timeHours() - 7.5) < 1e-6)
                .findFirst().orElseThrow();
        assertTrue(Double.isNaN(p3.temperatureK()[10]), "fill value masked");
        assertEquals(293.15 - 0.0098 * 47.5, p3.temperatureK()[9], 0.01); // degC written, K read; bin 9 at 47.5 m
        assertEquals(8.0e-3, p3.mixingRatioKgPerKg()[0], 1e-9);
        for (QcLog.Entry e : o.qc().entries()) {
            fail("clean file, yet QC logged " + e);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"nc3", "nc4"})
    void observeFindsTheOnshorePassageInAPythonWrittenFile(String tag) throws IOException {
        Path out = dir.resolve("out-" + tag);
        assertEquals(0, Main.execute("observe", dir.resolve("collection-" + tag + ".nc").toString(), "--coast",
                coast().toString(), "--out", out.toString()));
        List<String> passages = Files.readAllLines(out.resolve("passages.csv"));
        assertEquals(2, passages.stream().skip(1).filter(l -> l.contains(",true,")).count(), String.join("\n", passages));
        assertTrue(passages.stream().skip(1).allMatch(l -> l.contains("T01:") && l.endsWith("Z")), String.join("\n", passages));
    }

    @ParameterizedTest
    @ValueSource(strings = {"nc4"})
    void observeReadsAFolderOfNetcdf4Flights(String tag) throws IOException {
        Path out = dir.resolve("flights-out-" + tag);
        assertEquals(0, Main.execute("observe", dir.resolve("flights-" + tag).toString(), "--coast", coast().toString(),
                "--out", out.toString()));
        List<String> passages = Files.readAllLines(out.resolve("passages.csv"));
        assertEquals(1, passages.stream().skip(1).filter(l -> l.contains(",true,")).count(), String.join("\n", passages));
    }
}
