package org.littoral.scenarios.analysis.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.input.UserInputException;

/** Binned input gets the range, RH and spike checks of the raw path; whole columns in the wrong unit stop the run. */
class SameQcEveryPathTest {
    @TempDir
    Path dir;

    static final String HEADER = "day,site,time_local,height_m,pressure_hPa,temperature_C,rh_percent,mixing_ratio_g_per_kg,"
            + "wind_speed_m_per_s,wind_direction_deg";

    /** One binned profile of 40 bins; {@code edit} may change a row's cells (index = bin). */
    Path profile(String name, java.util.function.BiFunction<Integer, String[], String[]> edit) throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add(HEADER);
        for (int k = 0; k < 40; k++) {
            double z = 2.5 + 5 * k;
            String[] c = {"2024-07-01", "A", "10:00", fmt(z), fmt(1000 - z / 8.5), fmt(25 - 0.0098 * z), "60", "10",
                    fmt(4 + 0.01 * z), "270"};
            lines.add(String.join(",", edit.apply(k, c)));
        }
        Path p = dir.resolve(name);
        Files.write(p, lines);
        return p;
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }

    IngestResult read(Path p) {
        return new ProfileCsvReader(new IngestSettings()).read(p);
    }

    @Test
    void aBinnedFileWithMixingRatioStillHasItsRhAbove100Capped() throws IOException {
        IngestResult r = read(profile("b.csv", (k, c) -> {
            if (k == 20) {
                c[6] = "101.5";
            }
            return c;
        }));
        assertEquals(1, r.qc().count("rh-above-100"));
        assertEquals(22, r.qc().entries().get(0).line()); // header is line 1, bin 20 is line 22
    }

    @Test
    void aBinnedWindSpikeIsRemovedAndLoggedWithItsLine() throws IOException {
        IngestResult r = read(profile("b.csv", (k, c) -> {
            if (k == 17) {
                c[8] = "27.0";
            }
            return c;
        }));
        assertEquals(1, r.qc().count("wind-speed-spike"));
        assertEquals(19, r.qc().entries().get(0).line());
        Profile p = r.profiles().get(0);
        assertTrue(Double.isNaN(p.windEastMPerS()[17]) && Double.isNaN(p.windNorthMPerS()[17]));
        assertTrue(!Double.isNaN(p.windEastMPerS()[16]) && !Double.isNaN(p.windEastMPerS()[18]));
    }

    @Test
    void aSmoothJetIsNotASpike() throws IOException {
        // a jet nose of 6 m/s over 50 m: 1.2 m/s per bin, far below the 10 m/s spike threshold
        IngestResult r = read(profile("b.csv", (k, c) -> {
            c[8] = fmt(5 + 6 * Math.exp(-Math.pow((k - 20) / 4.0, 2)));
            return c;
        }));
        assertEquals(0, r.qc().count("wind-speed-spike"));
    }

    @Test
    void aTemperatureColumnInKelvinStopsTheRunNamingKelvin() throws IOException {
        Path p = profile("k.csv", (k, c) -> {
            c[5] = fmt(Double.parseDouble(c[5]) + 273.15);
            return c;
        });
        String m = assertThrows(UserInputException.class, () -> read(p)).getMessage();
        assertTrue(m.startsWith("k.csv: column 'temperature_C': the values look like kelvin (K)"), m);
        assertTrue(m.contains("--columns") && m.contains("unit: K"), m);
    }

    @Test
    void aPressureColumnInPascalStopsTheRunNamingPascal() throws IOException {
        Path p = profile("pa.csv", (k, c) -> {
            c[4] = fmt(Double.parseDouble(c[4]) * 100);
            return c;
        });
        String m = assertThrows(UserInputException.class, () -> read(p)).getMessage();
        assertTrue(m.contains("column 'pressure_hPa': the values look like pascal (Pa)"), m);
    }

    @Test
    void windSpeedsThatLookLikeKnotsWarnInTheLog() throws IOException {
        IngestResult r = read(profile("kn.csv", (k, c) -> {
            c[8] = "19.4";
            return c;
        }));
        assertEquals(1, r.qc().count("wind-speed-implausible"));
        assertTrue(r.qc().warnings().get(0).contains("knots"), r.qc().warnings().get(0));
    }

    @Test
    void aSemicolonFileIsReadLikeACommaFile() throws IOException {
        Path p = profile("s.csv", (k, c) -> c);
        Path q = dir.resolve("semi.csv");
        Files.writeString(q, Files.readString(p).replace(',', ';'));
        assertEquals(read(p).profiles().get(0).temperatureK()[10], read(q).profiles().get(0).temperatureK()[10]);
    }

    /** The planted binned faults of the demo (truth/glitches.csv: RH over 100 %, wind-speed spikes) are all in the QC log. */
    @Test
    void theDemoQcLogListsEveryPlantedBinnedFault() throws IOException {
        Path demo = Path.of("..", "demo-data");
        IngestResult r = read(demo.resolve("binned").resolve("profiles-binned.csv.gz"));
        Set<String> logged = new HashSet<>();
        for (QcLog.Entry e : r.qc().entries()) {
            if (e.what().equals("wind-speed-spike") || e.what().equals("rh-above-100")) {
                logged.add(e.day() + " " + e.site() + " " + e.profile().replace("time ", "") + " "
                        + (e.what().equals("wind-speed-spike") ? "wind_speed_spike" : "rh_over_100"));
            }
        }
        int planted = 0;
        for (String line : Files.readAllLines(demo.resolve("truth").resolve("glitches.csv"))) {
            String[] c = line.split(",");
            if (c.length > 5 && c[0].equals("binned")) {
                planted++;
                String key = c[1] + " " + c[2] + " " + c[4] + " " + c[5];
                assertTrue(logged.contains(key), "planted fault not in the QC log: " + line);
            }
        }
        assertTrue(planted >= 10, "expected the demo to plant binned faults; found " + planted);
        assertEquals(planted, logged.size(), "every logged spike or RH cap is a planted fault: " + logged);
    }
}
