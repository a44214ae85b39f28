package org.littoral.scenarios.observe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.ingest.ColumnMap;
import org.littoral.scenarios.cli.Main;
import org.littoral.scenarios.input.UserInputException;

/**
 * A drone team's own export: one long file, semicolons, UTC timestamps ending in Z, three temperature sensors,
 * wind in knots, ascent and descent, their own column names; read through a column map in one command.
 */
class OwnColumnsTest {
    @TempDir
    Path dir;

    static final double KNOT_M_PER_S = 1852.0 / 3600.0; // the international knot (exact by definition)

    static final String MAP = String.join("\n",
            "delimiter: semicolon",
            "time: {column: Stamp, form: iso, zone: \"+11:00\"}",
            "site: {fixed: ridge-3km}",
            "quantities:",
            "  height: {column: AltAGL_ft, unit: ft}",
            "  pressure: {column: Baro, unit: Pa}",
            "  temperature: {columns: [T_a, T_b, T_c], unit: K}",
            "  rh: {column: Hum, unit: \"%\"}",
            "  wind_speed: {column: WS_kt, unit: knots}",
            "  wind_direction: {column: WD, unit: deg}",
            "");

    /**
     * Flights every 30 min from 07:00 to 17:00 local (UTC+11, so the local day spans two UTC dates): offshore wind
     * from 300 deg before 12:10 local, onshore from 135 deg after (coast bearing 135 deg), 1 Hz samples up and down.
     */
    Path campaignCsv() throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add("Stamp;AltAGL_ft;Baro;T_a;T_b;T_c;Hum;WS_kt;WD;Battery");
        Instant localMidnight = Instant.parse("2026-12-04T13:00:00Z"); // 2026-12-05 00:00 at +11:00
        for (int f = 0; f <= 20; f++) {
            double localH = 7.0 + 0.5 * f;
            boolean onshore = localH > 12.17;
            for (int s = 0; s < 240; s++) {
                double z = s < 134 ? 3.0 * s : Math.max(0.0, 400.0 - 5.0 * (s - 134)); // up at 3 m/s, down at 5 m/s
                Instant t = localMidnight.plusMillis(Math.round((localH * 3600.0 + s) * 1000.0));
                double tK = 293.15 - 0.0098 * z + (onshore ? -1.0 : 0.0);
                double wsMps = onshore ? 5.0 : 4.0;
                lines.add(String.join(";", t.toString(), fmt(z / 0.3048), fmt(101300.0 * Math.exp(-z / 8400.0)),
                        fmt(tK - 0.1), fmt(tK), fmt(tK + 0.1), "60", fmt(wsMps / KNOT_M_PER_S), onshore ? "135" : "300", "88"));
            }
        }
        Path p = dir.resolve("team-export.csv");
        Files.write(p, lines);
        return p;
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }

    Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    Path coast() throws IOException {
        return write("coast.yaml", "coast: {latitude_deg: -36.0, longitude_deg: 165.0, utc_offset_h: 11, "
                + "bearing_land_to_sea_deg: 135.0, day_of_year: 339}\n");
    }

    @Test
    void aTeamExportWithItsOwnColumnsGoesThroughObserveInOneCommand() throws IOException {
        Path out = dir.resolve("out");
        int code = Main.execute("observe", campaignCsv().toString(), "--columns", write("cols.yaml", MAP).toString(),
                "--coast", coast().toString(), "--out", out.toString());
        assertEquals(0, code);
        List<String> days = Files.readAllLines(out.resolve("site-days.csv"));
        assertEquals(2, days.size(), "one local day, one site: " + days); // header + 1 row; UTC dates would give two
        assertTrue(days.get(1).startsWith("2026-12-05,ridge-3km,21,"), days.get(1));
        List<String> passages = Files.readAllLines(out.resolve("passages.csv"));
        assertTrue(passages.get(0).endsWith(",time_local,time_utc"), passages.get(0));
        long onshore = passages.stream().skip(1).filter(l -> l.contains(",true,")).count();
        assertEquals(1, onshore, String.join("\n", passages));
        String row = passages.stream().skip(1).filter(l -> l.contains(",true,")).findFirst().orElseThrow();
        String[] c = row.split(",");
        double h = Double.parseDouble(c[3]);
        assertTrue(h > 12.0 && h < 12.6, "passage between the 12:00 and 12:30 flights: " + row);
        assertTrue(c[c.length - 1].startsWith("2026-12-05T01:") && c[c.length - 1].endsWith("Z"), row);
        assertTrue(c[c.length - 2].startsWith("2026-12-05T12:") && c[c.length - 2].endsWith("+11:00"), row);
    }

    @Test
    void aOneDayReportSaysInSentencesWhatTooSmallASampleCannotPlot() throws IOException {
        Path out = dir.resolve("out1");
        assertEquals(0, Main.execute("observe", campaignCsv().toString(), "--columns", write("cols.yaml", MAP).toString(),
                "--coast", coast().toString(), "--out", out.toString()));
        String html = Files.readString(out.resolve("report.html"));
        assertTrue(html.contains("First onshore passage: ridge-3km on 2026-12-05 at 12:"), "sentence for the histogram");
        assertTrue(html.contains("(too few for a box plot)"), "sentence for the one-value boxes");
        assertTrue(!Files.exists(out.resolve("passage-times.png")) && !Files.exists(out.resolve("response-boxes.png")));
    }

    @Test
    void aOneDayReportShowsEveryFlightsProfilesAndTheTimeHeightSectionsOfTheObservations() throws IOException {
        Path out = dir.resolve("out2");
        assertEquals(0, Main.execute("observe", campaignCsv().toString(), "--columns", write("cols.yaml", MAP).toString(),
                "--coast", coast().toString(), "--out", out.toString()));
        String html = Files.readString(out.resolve("report.html"));
        for (String name : List.of("flights-2026-12-05-ridge-3km.png", "time-height-2026-12-05-ridge-3km.png")) {
            Path png = out.resolve(name);
            assertTrue(Files.exists(png), name);
            String b64 = java.util.Base64.getEncoder().encodeToString(Files.readAllBytes(png));
            assertTrue(html.contains("data:image/png;base64," + b64 + "\""), "report.html embeds " + name);
        }
        // captions computed from the data: 21 flights every 30 min from 07:00 to 17:00 local, ascents to 400 m
        assertTrue(html.contains("Observed profiles at ridge-3km on 2026-12-05: all 21 flights from 07:00 to 17:00 local time, "
                + "up to 400 m above ground"), "profile caption");
        assertTrue(html.contains("Onshore passage: 12:15 +/- 15 min (flights at 12:00 and 12:30 on either side)"), "passage in caption");
        assertTrue(html.contains("Time-height sections of the observations at ridge-3km on 2026-12-05: 21 flights from 07:00 to "
                + "17:00 local time, each flight one column of 5 m bins"), "section caption");
        assertTrue(html.contains("The observed flights"), "a section of its own");
    }

    @Test
    void mappedUnitsAreConvertedAndTheThreeSensorsAveraged() throws IOException {
        AnalysisSettings s = new AnalysisSettings();
        s.localZone = ZoneOffset.ofHours(11);
        ColumnMap map = ColumnMap.load(write("cols.yaml", MAP));
        List<Profile> ps = ObserveIngest.ingest(campaignCsv(), s, map).profiles();
        assertEquals(21, ps.size());
        Profile p = ps.get(0);
        assertEquals(7.0, p.timeHours(), 1.0 / 3600.0);
        int k = 20; // 100 m bin
        assertEquals(100.0, p.heightM()[k], 1e-9);
        assertEquals(293.15 - 0.98, p.temperatureK()[k], 0.05);
        assertEquals(101300.0 * Math.exp(-100.0 / 8400.0), p.pressurePa()[k], 30.0);
        assertEquals(4.0, p.windSpeed(k), 1e-3); // knots back to m/s
    }

    @Test
    void withDescentEachFlightGivesAnAscentAndADescentProfile() throws IOException {
        AnalysisSettings s = new AnalysisSettings();
        s.ingest.useDescent = true;
        List<Profile> ps = ObserveIngest.ingest(campaignCsv(), s, ColumnMap.load(write("cols.yaml", MAP))).profiles();
        assertEquals(42, ps.size());
        Profile up = ps.get(0);
        Profile down = ps.get(1);
        assertEquals(7.0, up.timeHours(), 1.0 / 3600.0);
        assertEquals(7.0 + 134.0 / 3600.0, down.timeHours(), 0.5 / 3600.0); // the top (400 m) is the sample at 134 s
        assertEquals(down.temperatureK()[20], up.temperatureK()[20], 0.05);
        assertTrue(down.heightM()[down.size() - 1] >= 395.0);
    }

    @Test
    void anUnknownUnitNamesTheMapFileTheKeyAndTheFix() throws IOException {
        Path m = write("cols.yaml", MAP.replace("unit: knots", "unit: furlongs_per_fortnightz"));
        String msg = assertThrows(UserInputException.class, () -> ColumnMap.load(m)).getMessage();
        assertTrue(msg.startsWith("column map " + m + ": quantities.wind_speed.unit: 'furlongs_per_fortnightz': "), msg);
        assertTrue(msg.contains("m/s, knots, km/h"), msg);
        assertEquals(1, msg.lines().count());
    }

    @Test
    void aMissingColumnNamesTheMapKeyAndTheFileColumns() throws IOException {
        Path m = write("cols.yaml", MAP.replace("column: WD,", "column: WindDir,"));
        Path csv = campaignCsv();
        AnalysisSettings s = new AnalysisSettings();
        String msg = assertThrows(UserInputException.class, () -> ObserveIngest.ingest(csv, s, ColumnMap.load(m))).getMessage();
        assertTrue(msg.startsWith("column map " + m + ": quantities.wind_direction.column: 'WindDir': no such column in team-export.csv"),
                msg);
        assertTrue(msg.contains("Stamp, AltAGL_ft"), msg);
    }

    @Test
    void anUnknownTimeZoneNamesTheKeyAndShowsTheForms() throws IOException {
        Path m = write("cols.yaml", MAP.replace("zone: \"+11:00\"", "zone: Pacific/Atlantis"));
        String msg = assertThrows(UserInputException.class, () -> ColumnMap.load(m)).getMessage();
        assertTrue(msg.startsWith("column map " + m + ": time.zone: 'Pacific/Atlantis': not a time zone"), msg);
        assertTrue(msg.contains("+11:00"), msg);
    }

    @Test
    void aBadMapExitsWith2() throws IOException {
        Path m = write("cols.yaml", MAP.replace("unit: Pa", "unit: parsecs_per_ohm"));
        assertEquals(2, Main.execute("observe", campaignCsv().toString(), "--columns", m.toString(), "--coast",
                coast().toString(), "--out", dir.resolve("o").toString()));
    }

    @Test
    void aTemperatureMappedAsCelsiusButGivenInKelvinStopsNamingTheUsersColumn() throws IOException {
        Path m = write("cols.yaml", MAP.replace("unit: K}", "unit: degC}"));
        Path csv = campaignCsv();
        String msg = assertThrows(UserInputException.class,
                () -> ObserveIngest.ingest(csv, new AnalysisSettings(), ColumnMap.load(m))).getMessage();
        assertTrue(msg.contains("your column 'T_a' in degC") && msg.contains("look like kelvin (K)"), msg);
        assertTrue(msg.contains("correct the unit given for it in the column map"), msg);
    }

    @Test
    void directionsGivenAsBlowingTowardsAreTurnedToMeteorologicalFrom() throws IOException {
        Path m = write("cols.yaml", MAP + "wind_direction_convention: towards\n");
        AnalysisSettings s = new AnalysisSettings();
        List<Profile> ps = ObserveIngest.ingest(campaignCsv(), s, ColumnMap.load(m)).profiles();
        assertEquals(120.0, ps.get(0).windDirectionDeg(20), 1e-6); // towards 300 = from 120
    }
}
