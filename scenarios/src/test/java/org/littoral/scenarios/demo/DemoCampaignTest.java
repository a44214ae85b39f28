package org.littoral.scenarios.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.zip.GZIPInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.coast.Coast;

/** The INVENTED demo campaign: reproducible, truthful about its passages, and marked as invented. */
class DemoCampaignTest {
    private static final DemoCampaign CAMPAIGN = DemoCampaign.generate(DemoCampaign.DEFAULT_SEED);

    @Test
    void theSameSeedGivesByteIdenticalFiles(@TempDir Path tmp) throws IOException {
        DemoDataWriter a = new DemoDataWriter(DemoCampaign.generate(7L));
        DemoDataWriter b = new DemoDataWriter(DemoCampaign.generate(7L));
        assertEquals(a.daysCsv(), b.daysCsv());
        assertEquals(a.passagesCsv(), b.passagesCsv());
        assertEquals(a.glitchesCsv(a.defaultRawSiteDays()), b.glitchesCsv(b.defaultRawSiteDays()));
        DemoDataWriter.RawSiteDay sd = a.defaultRawSiteDays().get(0);
        DemoDay dayA = DemoCampaign.generate(7L).day(sd.date());
        DemoDay dayB = DemoCampaign.generate(7L).day(sd.date());
        a.writeRaw(dayA, sd.siteIndex(), DemoFlights.schedule(dayA, sd.siteIndex()).subList(0, 3), tmp.resolve("a.csv.gz"));
        b.writeRaw(dayB, sd.siteIndex(), DemoFlights.schedule(dayB, sd.siteIndex()).subList(0, 3), tmp.resolve("b.csv.gz"));
        assertArrayEquals(Files.readAllBytes(tmp.resolve("a.csv.gz")), Files.readAllBytes(tmp.resolve("b.csv.gz")));
        DemoFlights.Flight f = DemoFlights.schedule(dayA, 1).get(10);
        assertArrayEquals(DemoFlights.binned(dayA, f).temperatureC(), DemoFlights.binned(dayA, f).temperatureC());
    }

    @Test
    void differentSeedsGiveDifferentCampaigns() {
        DemoDataWriter a = new DemoDataWriter(DemoCampaign.generate(1L));
        DemoDataWriter b = new DemoDataWriter(DemoCampaign.generate(2L));
        assertNotEquals(a.passagesCsv().lines().skip(4).toList(), b.passagesCsv().lines().skip(4).toList());
    }

    @Test
    void theCampaignHasEveryKindOfDay() {
        Set<String> types = CAMPAIGN.days().stream().map(DemoDay::breezeType).collect(Collectors.toSet());
        assertEquals(Set.of("pure", "corkscrew", "backdoor", "synoptic"), types);
        assertEquals(36, CAMPAIGN.days().size());
        assertTrue(CAMPAIGN.days().stream().filter(DemoDay::isNullDay).count() >= 6, "null days");
        assertTrue(CAMPAIGN.days().stream().filter(DemoDay::convective).count() >= 4, "convective days");
        assertTrue(CAMPAIGN.days().stream().filter(d -> d.tags().contains("bay-breeze-first")).count() >= 3);
        // Onshore ambient flow of a few m/s suppresses the front (Crosman & Horel 2010, from memory).
        for (DemoDay d : CAMPAIGN.days()) {
            if (d.breezeType().equals("synoptic")) {
                assertTrue(d.isNullDay(), d.date() + " synoptic day with a front");
            }
        }
    }

    @Test
    void bayBreezeDaysHaveTwoOrderedPassagesAtTheBayShore() {
        for (DemoDay d : CAMPAIGN.days()) {
            if (!d.tags().contains("bay-breeze-first")) {
                continue;
            }
            List<DemoDay.Front> bay = d.fronts().stream().filter(f -> f.siteIndex() == 0).toList();
            assertEquals(2, bay.size(), d.date().toString());
            assertEquals("bay_breeze", bay.get(0).kind());
            assertEquals("sea_breeze", bay.get(1).kind());
            assertTrue(bay.get(1).arrivalHours() - bay.get(0).arrivalHours() >= 1.0, d.date().toString());
        }
    }

    @Test
    void theInlandPassageIsLaterByTheDistanceOverTheFrontSpeed() {
        double dx = DemoCoast.PLAIN_25KM.inlandDistanceM() - DemoCoast.MARSH_4KM.inlandDistanceM();
        int pairs = 0;
        for (DemoDay d : CAMPAIGN.days()) {
            DemoDay.Front coastal = null;
            DemoDay.Front inland = null;
            for (DemoDay.Front f : d.fronts()) {
                if (f.kind().equals("sea_breeze")) {
                    if (f.siteIndex() == 0) {
                        coastal = f;
                    } else {
                        inland = f;
                    }
                }
            }
            if (coastal == null || inland == null) {
                continue;
            }
            pairs++;
            assertEquals(dx / coastal.speedMPerS(), 3600.0 * (inland.arrivalHours() - coastal.arrivalHours()), 1e-6);
            // Simpson (1994), from memory: sea-breeze fronts move at about 1-5 m/s.
            assertTrue(coastal.speedMPerS() >= 1.0 && coastal.speedMPerS() <= 5.0);
        }
        assertTrue(pairs >= 20, "pairs " + pairs);
    }

    @Test
    void thePassagesFileAgreesWithTheCampaignToTheSecond() {
        List<String> rows = CAMPAIGN_ROWS();
        for (String row : rows) {
            String[] c = row.split(",");
            String[] hms = c[5].split(":");
            double hours = Integer.parseInt(hms[0]) + Integer.parseInt(hms[1]) / 60.0 + Integer.parseInt(hms[2]) / 3600.0;
            assertEquals(Double.parseDouble(c[6]), hours, 1.0 / 3600.0, row);
        }
        assertEquals(CAMPAIGN.days().stream().mapToInt(d -> d.fronts().size()).sum(), rows.size());
    }

    private static List<String> CAMPAIGN_ROWS() {
        return new DemoDataWriter(CAMPAIGN).passagesCsv().lines().filter(l -> !l.startsWith("#")).skip(1).toList();
    }

    /**
     * The TRUE passage time is where the wind shift is: in the binned profiles the mean onshore wind
     * (50-300 m) of the flights in the 40 min after a passage exceeds that in the 40 min before, the
     * post-passage wind blows from within 50 degrees of the front's direction, and the largest
     * flight-to-flight rise of the onshore wind is within one flight of the passage.
     */
    @Test
    void thePassageTimesAreWhereTheWindShifts() {
        int checked = 0;
        int largestRiseAtPassage = 0;
        for (DemoDay d : CAMPAIGN.days()) {
            Coast coast = DemoCoast.coast(d.date().getDayOfYear());
            for (int s = 0; s < DemoCoast.SITES.size(); s++) {
                List<DemoFlights.Flight> flights = DemoFlights.schedule(d, s);
                double[] t = new double[flights.size()];
                double[] onshore = new double[flights.size()];
                double[] east = new double[flights.size()];
                double[] north = new double[flights.size()];
                for (int i = 0; i < flights.size(); i++) {
                    DemoFlights.BinnedAscent a = ascents(d, s).get(i);
                    t[i] = flights.get(i).takeoffHours();
                    int n = 0;
                    for (int k = 0; k < a.heightM().length; k++) {
                        double z = a.heightM()[k];
                        if (z >= 50 && z <= 300 && a.windSpeedMPerS()[k] < 20) {
                            double[] en = Coast.eastNorthFromDirection(a.windSpeedMPerS()[k], a.windDirectionDeg()[k]);
                            east[i] += en[0];
                            north[i] += en[1];
                            n++;
                        }
                    }
                    east[i] /= n;
                    north[i] /= n;
                    onshore[i] = coast.crossShore(east[i], north[i]);
                }
                List<DemoDay.Front> fronts = new java.util.ArrayList<>();
                for (DemoDay.Front f : d.fronts()) {
                    if (f.siteIndex() == s) {
                        fronts.add(f);
                    }
                }
                for (DemoDay.Front f : fronts) {
                    double ta = f.arrivalHours();
                    double before = meanIn(t, onshore, ta - 0.67, ta - 0.05);
                    double after = meanIn(t, onshore, ta + 0.15, ta + 0.67);
                    if (Double.isNaN(before) || Double.isNaN(after)) {
                        continue; // flights lost around this passage
                    }
                    checked++;
                    assertTrue(after > before + 0.5, d.date() + " " + s + " " + f.kind() + " onshore before " + before + " after " + after);
                    int firstAfter = -1;
                    for (int i = 0; i < t.length; i++) {
                        if (t[i] > ta + 0.1) {
                            firstAfter = i;
                            break;
                        }
                    }
                    double dir = Coast.directionFromDeg(east[firstAfter], north[firstAfter]);
                    double diff = Math.abs(((dir - f.directionFromDeg()) % 360 + 540) % 360 - 180);
                    assertTrue(diff < 50, d.date() + " " + s + " direction after " + dir + " front " + f.directionFromDeg());
                    if (fronts.size() == 1) {
                        int best = 1;
                        for (int i = 1; i < t.length; i++) {
                            if (onshore[i] - onshore[i - 1] > onshore[best] - onshore[best - 1]) {
                                best = i;
                            }
                        }
                        if (Math.abs(best - firstAfter) <= 1) {
                            largestRiseAtPassage++;
                        }
                    }
                }
            }
        }
        assertTrue(checked >= 45, "passages checked " + checked);
        assertTrue(largestRiseAtPassage >= 0.9 * (checked - 8), "largest rise at passage " + largestRiseAtPassage + " of " + checked);
    }

    private static double meanIn(double[] t, double[] v, double from, double to) {
        double sum = 0;
        int n = 0;
        for (int i = 0; i < t.length; i++) {
            if (t[i] >= from && t[i] <= to) {
                sum += v[i];
                n++;
            }
        }
        return n == 0 ? Double.NaN : sum / n;
    }

    @Test
    void everyFileSaysTheDataAreInvented(@TempDir Path tmp) throws IOException {
        DemoDataWriter w = new DemoDataWriter(CAMPAIGN);
        DemoDay day = CAMPAIGN.days().get(0);
        w.writeBinned(tmp.resolve("binned.csv.gz"), List.of(day));
        w.writeRaw(day, 1, DemoFlights.schedule(day, 1).subList(0, 1), tmp.resolve("raw.csv.gz"));
        List<String> firstLines = new java.util.ArrayList<>(List.of(w.coastYaml(), w.daysCsv(), w.passagesCsv(),
                w.glitchesCsv(List.of())).stream().map(t -> t.lines().findFirst().orElse("")).toList());
        firstLines.add(firstLine(tmp.resolve("binned.csv.gz")));
        firstLines.add(firstLine(tmp.resolve("raw.csv.gz")));
        for (String first : firstLines) {
            assertTrue(first.startsWith("# INVENTED"), first);
        }
    }

    /** The files go through the analysis chain's own reader unchanged (binned and raw, gzipped). */
    @Test
    void theAnalysisIngestReadsTheDemoFiles(@TempDir Path tmp) throws IOException {
        DemoDataWriter w = new DemoDataWriter(CAMPAIGN);
        DemoDay day = CAMPAIGN.day(w.defaultRawSiteDays().get(0).date());
        w.writeBinned(tmp.resolve("binned.csv.gz"), List.of(day));
        List<DemoFlights.Flight> flights = DemoFlights.schedule(day, 0);
        w.writeRaw(day, 0, flights.subList(0, 4), tmp.resolve("raw.csv.gz"));
        org.littoral.scenarios.analysis.ingest.ProfileCsvReader reader =
                new org.littoral.scenarios.analysis.ingest.ProfileCsvReader(new org.littoral.scenarios.analysis.ingest.IngestSettings());
        var binned = reader.read(tmp.resolve("binned.csv.gz"));
        assertFalse(binned.raw());
        assertEquals(DemoFlights.schedule(day, 0).size() + DemoFlights.schedule(day, 1).size(), binned.profiles().size());
        var raw = reader.read(tmp.resolve("raw.csv.gz"));
        assertTrue(raw.raw());
        assertEquals(4, raw.profiles().size());
        // The raw ascent binned by the analysis chain agrees with the generator's own 5 m profile of the same
        // flight to within the instruments' noise and lag (0.5 K near 300 m).
        DemoFlights.BinnedAscent mine = DemoFlights.binned(day, flights.get(1));
        org.littoral.model.sounding.Profile theirs = raw.profiles().get(1);
        int k = 0;
        while (k < theirs.size() && Math.abs(theirs.heightM()[k] - 302.5) > 2.6) {
            k++;
        }
        assertTrue(k < theirs.size(), "no bin near 300 m");
        assertEquals(mine.temperatureC()[60] + 273.15, theirs.temperatureK()[k], 0.5);
    }

    @Test
    void theScenarioAndCoastFilesReadAsTheInventedCoast(@TempDir Path tmp) throws IOException {
        DemoDataWriter w = new DemoDataWriter(CAMPAIGN);
        var scenario = org.littoral.scenarios.scenario.ScenarioFile.parse("scenario-quillmarsh-pure.yaml", w.scenarioYaml(), false);
        assertEquals(DemoCoast.BEARING_LAND_TO_SEA_DEG, scenario.coast().bearingLandToSeaDeg());
        assertEquals(DemoCoast.LATITUDE_DEG, scenario.coast().latitudeDeg());
        Files.writeString(tmp.resolve("coast.yaml"), w.coastYaml());
        Coast c = org.littoral.scenarios.observe.CoastFile.load(tmp.resolve("coast.yaml").toString());
        assertEquals(scenario.coast(), c);
    }

    /** The small files in demo-data/ are exactly what the documented generator writes with the default seed. */
    @Test
    void theRepositoryDemoFilesComeFromTheGenerator() throws IOException {
        Path dir = Path.of("..", "demo-data");
        DemoDataWriter w = new DemoDataWriter(CAMPAIGN);
        assertEquals(w.daysCsv(), Files.readString(dir.resolve("days.csv")));
        assertEquals(w.passagesCsv(), Files.readString(dir.resolve("truth/passages.csv")));
        assertEquals(w.glitchesCsv(w.defaultRawSiteDays()), Files.readString(dir.resolve("truth/glitches.csv")));
        assertEquals(w.coastYaml(), Files.readString(dir.resolve("coast.yaml")));
        assertEquals(w.scenarioYaml(), Files.readString(dir.resolve("scenario-quillmarsh-pure.yaml")));
    }

    @Test
    void humidityOver100PercentOccursOnlyWherePlanted() {
        Set<String> planted = new HashSet<>();
        int over = 0;
        for (DemoDay d : CAMPAIGN.days()) {
            for (int s = 0; s < 2; s++) {
                for (DemoFlights.BinnedAscent a : ascents(d, s)) {
                    DemoFlights.Flight f = a.flight();
                    for (double rh : a.rhPercent()) {
                        if (rh > 100.0) {
                            assertEquals("rh_over_100", f.binnedGlitch(), f.id());
                            planted.add(f.id());
                            over++;
                        }
                    }
                }
            }
        }
        assertFalse(planted.isEmpty(), "no RH > 100 % glitch planted");
        assertTrue(over >= 3 * planted.size());
    }

    private static final java.util.Map<String, List<DemoFlights.BinnedAscent>> ASCENTS = new java.util.HashMap<>();

    /** Binned ascents of one site-day, computed once for all tests. */
    private static synchronized List<DemoFlights.BinnedAscent> ascents(DemoDay d, int site) {
        return ASCENTS.computeIfAbsent(d.date() + "/" + site,
                k -> DemoFlights.schedule(d, site).stream().map(f -> DemoFlights.binned(d, f)).toList());
    }

    private static String firstLine(Path f) throws IOException {
        try (InputStream in = f.toString().endsWith(".gz") ? new GZIPInputStream(Files.newInputStream(f)) : Files.newInputStream(f)) {
            byte[] b = in.readNBytes(200);
            return new String(b, StandardCharsets.UTF_8).lines().findFirst().orElse("");
        }
    }
}
