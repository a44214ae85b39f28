package org.littoral.scenarios.analysis.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.input.UserInputException;

class DayTableReaderTest {
    @TempDir
    Path dir;

    @Test
    void rowsWithAndWithoutSiteGiveDayAndDaySiteKeys() throws IOException {
        Path p = dir.resolve("days.csv");
        Files.writeString(p, "day,site,convection,tag\n2024-07-01,,yes,IOP1\n2024-07-02,B,no,\n");
        Map<String, Map<String, String>> m = DayTableReader.read(p);
        assertEquals(Map.of("convection", "yes", "tag", "IOP1"), m.get("2024-07-01"));
        assertEquals(Map.of("convection", "no"), m.get("2024-07-02/B"));
    }

    @Test
    void aRepeatedDayNamesBothLines() throws IOException {
        Path p = dir.resolve("days.csv");
        Files.writeString(p, "day,convection\n2024-07-01,yes\n2024-07-01,no\n");
        String msg = assertThrows(UserInputException.class, () -> DayTableReader.read(p)).getMessage();
        assertTrue(msg.startsWith("days.csv line 3:") && msg.contains("line 2"), msg);
    }

    @Test
    void extraColumnsOfAProfileFileBecomePerDayAttributes() throws IOException {
        Path p = dir.resolve("obs.csv");
        Files.writeString(p, "day,site,time_local,height_m,pressure_hPa,temperature_C,rh_percent,wind_speed_m_per_s,"
                + "wind_direction_deg,convection\n2024-07-01,A,10.0,5,1000,20,50,3,270,yes\n2024-07-01,A,10.5,5,1000,20,50,3,270,no\n");
        IngestResult r = new ProfileCsvReader(new IngestSettings()).read(p);
        assertEquals("yes", r.dayAttributes().get("2024-07-01/A").get("convection"));
        assertEquals(1, r.qc().count("attribute-varies-within-day"));
    }
}
