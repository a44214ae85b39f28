package org.littoral.scenarios.analysis.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.sounding.Profile;
import org.littoral.model.thermo.Thermo;
import org.littoral.scenarios.input.UserInputException;

class ProfileCsvReaderTest {
    @TempDir
    Path dir;

    static final String BINNED_HEADER = "day,site,time_local,height_m,pressure_hPa,temperature_C,rh_percent,wind_speed_m_per_s,wind_direction_deg";
    static final String RAW_HEADER = "day,site,flight_id,time_local,time_s,height_m,pressure_hPa,temperature_C_1,temperature_C_2,rh_percent_1,rh_percent_2,wind_speed_m_per_s,wind_direction_deg";

    Path write(String name, String... lines) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, String.join("\n", lines) + "\n");
        return p;
    }

    IngestResult read(Path p) {
        return new ProfileCsvReader(new IngestSettings()).read(p);
    }

    UserInputException error(Path p) {
        return assertThrows(UserInputException.class, () -> read(p));
    }

    @Test
    void missingColumnsAreListedWithTheFileAndLine() throws IOException {
        Path p = write("obs.csv", "day,site,time_local,height_m,temperature_C,rh_percent", "2024-07-01,A,10.0,5,20,50");
        String m = error(p).getMessage();
        assertTrue(m.startsWith("obs.csv line 1:"), m);
        assertTrue(m.contains("pressure_hPa") && m.contains("wind_speed_m_per_s") && m.contains("wind_direction_deg"), m);
    }

    @Test
    void aBadNumberNamesTheFileLineAndColumn() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER, "2024-07-01,A,10.0,5,1000,20,50,3,270",
                "2024-07-01,A,10.0,10,999.4,abc,50,3,270");
        String m = error(p).getMessage();
        assertTrue(m.startsWith("obs.csv line 3:"), m);
        assertTrue(m.contains("temperature_C") && m.contains("'abc'"), m);
    }

    @Test
    void aDuplicateProfileNamesBothPlaces() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER,
                "2024-07-01,A,10.0,5,1000,20,50,3,270",
                "2024-07-01,A,10.5,5,1000,20,50,3,270",
                "2024-07-01,A,10.0,10,999.4,20,50,3,270");
        String m = error(p).getMessage();
        assertTrue(m.startsWith("obs.csv line 4:"), m);
        assertTrue(m.contains("lines 2-2"), m);
    }

    @Test
    void aRepeatedHeightInOneProfileIsAnError() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER,
                "2024-07-01,A,10.0,5,1000,20,50,3,270",
                "2024-07-01,A,10.0,5,1000,20,50,3,270");
        String m = error(p).getMessage();
        assertTrue(m.startsWith("obs.csv line 3:") && m.contains("appears twice"), m);
    }

    @Test
    void timeGoingBackwardsWithinAFlightNamesTheLine() throws IOException {
        Path p = write("raw.csv", RAW_HEADER,
                "2024-07-01,A,F1,10.0,0.0,0,1000,20,20,50,50,3,270",
                "2024-07-01,A,F1,10.0,0.1,1,1000,20,20,50,50,3,270",
                "2024-07-01,A,F1,10.0,0.05,2,1000,20,20,50,50,3,270");
        String m = error(p).getMessage();
        assertTrue(m.startsWith("raw.csv line 4:") && m.contains("line 3") && m.contains("sort the samples of each flight by time"), m);
    }

    @Test
    void aFlightSplitIntoTwoBlocksIsADuplicate() throws IOException {
        StringBuilder sb = new StringBuilder(RAW_HEADER).append('\n');
        for (int i = 0; i < 10; i++) {
            sb.append("2024-07-01,A,F1,10.0,").append(i).append(',').append(i).append(",1000,20,20,50,50,3,270\n");
        }
        sb.append("2024-07-01,A,F2,10.5,0,0,1000,20,20,50,50,3,270\n");
        sb.append("2024-07-01,A,F1,10.0,20,5,1000,20,20,50,50,3,270\n");
        Path p = dir.resolve("raw.csv");
        Files.writeString(p, sb.toString());
        String m = error(p).getMessage();
        assertTrue(m.startsWith("raw.csv line 13:") && m.contains("F1") && m.contains("lines 2-11"), m);
    }

    @Test
    void aWrongNumberOfFieldsNamesTheLine() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER, "2024-07-01,A,10.0,5,1000,20,50,3");
        assertTrue(error(p).getMessage().startsWith("obs.csv line 2:"));
    }

    @Test
    void aBadTimeNamesTheLine() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER, "2024-07-01,A,noon,5,1000,20,50,3,270");
        String m = error(p).getMessage();
        assertTrue(m.startsWith("obs.csv line 2:") && m.contains("time_local"), m);
    }

    @Test
    void kelvinInACelsiusColumnIsRemovedAndCounted() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER,
                "2024-07-01,A,10.0,5,1000,293.1,50,3,270",
                "2024-07-01,A,10.0,10,999.4,293.0,50,3,270",
                "2024-07-01,A,10.0,15,998.8,19.9,50,3,270");
        IngestResult r = read(p);
        assertEquals(2, r.qc().count("temperature-looks-like-kelvin"));
        Profile pr = r.profiles().get(0);
        assertTrue(Double.isNaN(pr.temperatureK()[0]) && Double.isNaN(pr.temperatureK()[1]));
        assertEquals(19.9 + Thermo.T0, pr.temperatureK()[2], 1e-9);
        assertTrue(r.qc().warnings().get(0).startsWith("2 x temperature-looks-like-kelvin"));
    }

    @Test
    void rhJustAbove100IsCappedAndFarAboveIsRemovedBothLogged() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER,
                "2024-07-01,A,10.0,5,1000,20,103,3,270",
                "2024-07-01,A,10.0,10,999.4,20,130,3,270");
        IngestResult r = read(p);
        assertEquals(1, r.qc().count("rh-above-100"));
        assertEquals(1, r.qc().count("rh-out-of-range"));
        Profile pr = r.profiles().get(0);
        assertEquals(1.0, pr.relativeHumidity()[0], 1e-9);
        assertTrue(Double.isNaN(pr.mixingRatioKgPerKg()[1]));
    }

    @Test
    void theQcLogCsvHasOneRowPerRecordWithFileAndLine() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER, "2024-07-01,A,10.0,5,1000,293.1,50,3,270");
        StringWriter w = new StringWriter();
        read(p).qc().writeCsv(w);
        String[] lines = w.toString().split("\n");
        assertEquals(QcLog.CSV_HEADER, lines[0]);
        assertTrue(lines[1].startsWith("obs.csv,2,2024-07-01,A,"), lines[1]);
    }

    @Test
    void binnedRowsGiveOneProfilePerTimeWithDerivedThermodynamics() throws IOException {
        Path p = write("obs.csv", BINNED_HEADER,
                "2024-07-01,A,2024-07-01T10:30:00,5,1000,20,50,3,270",
                "2024-07-01,A,2024-07-01T10:30:00,10,999.4,19.95,50,3,270",
                "2024-07-01,A,2024-07-01T11:00:00,5,1000,21,50,3,270");
        IngestResult r = read(p);
        assertEquals(2, r.profiles().size());
        Profile pr = r.profiles().get(0);
        assertEquals(10.5, pr.timeHours(), 1e-12);
        // Mixing ratio from RH with Bolton (1980) eq. 10 and r = eps e / (p - e).
        double r0 = Thermo.mixingRatio(0.5 * Thermo.saturationVapourPressurePa(293.15), 100000);
        assertEquals(r0, pr.mixingRatioKgPerKg()[0], 1e-12);
        assertEquals(Thermo.potentialTemperatureK(293.15, 100000), pr.thetaK()[0], 1e-9);
        // Wind from 270 (west) blows towards the east.
        assertEquals(3.0, pr.windEastMPerS()[0], 1e-12);
    }

    @Test
    void rawFlightsKeepOnlyTheAscentAndAverageTheSensors() throws IOException {
        StringBuilder sb = new StringBuilder(RAW_HEADER).append('\n');
        int line = 0;
        // 20 s up at 1 m/s (0..20 m), then 10 s down; sensors 19 and 21 C average to 20 C.
        for (int i = 0; i <= 30; i++) {
            double z = i <= 20 ? i : 20 - 2 * (i - 20);
            double t2 = i <= 20 ? 21 : 35; // descent readings must not leak into the bins
            sb.append("2024-07-01,A,F1,10.0,").append(i).append(',').append(z).append(",1000,19,").append(t2)
                    .append(",50,60,3,270\n");
            line++;
        }
        Path p = dir.resolve("raw.csv");
        Files.writeString(p, sb.toString());
        IngestResult r = read(p);
        assertTrue(r.raw());
        Profile pr = r.profiles().get(0);
        assertEquals(5, pr.size()); // bins 0, 5, 10, 15, 20 m
        for (int k = 0; k < pr.size(); k++) {
            assertEquals(20.0 + Thermo.T0, pr.temperatureK()[k], 1e-9);
        }
        assertEquals(1, r.qc().count("descent-samples"));
        assertTrue(r.qc().entries().stream().anyMatch(e -> e.value().equals("10")));
    }
}
