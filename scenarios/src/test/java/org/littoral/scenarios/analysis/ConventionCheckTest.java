package org.littoral.scenarios.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.observe.CoastFile;
import org.littoral.scenarios.observe.ObserveIngest;

/** Convention mistakes found campaign-wide on the INVENTED demo campaign (binned file, land-to-sea bearing 135 deg). */
class ConventionCheckTest {
    static Coast coast;
    static AnalysisResult result;

    @BeforeAll
    static void analyseTheDemo() throws IOException {
        coast = CoastFile.load(Path.of("..", "demo-data", "coast.yaml").toString());
        AnalysisSettings s = new AnalysisSettings();
        result = AnalysisChain.run(ObserveIngest.ingest(Path.of("..", "demo-data", "binned"), s).profiles(), coast, s);
    }

    static Coast withBearing(double deg) {
        return new Coast(coast.latitudeDeg(), coast.longitudeDeg(), coast.utcOffsetHours(), deg, coast.dayOfYear());
    }

    @Test
    void theRightBearingRaisesNoWarning() {
        assertEquals(List.of(), ConventionCheck.warnings(result, coast, new AnalysisSettings()));
    }

    @Test
    void aBearingGivenSeaToLandIsCalledReversedWithBothDirections() {
        List<String> w = ConventionCheck.warnings(result, withBearing(315), new AnalysisSettings());
        assertEquals(1, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("the coast bearing may be reversed:"), w.get(0));
        assertTrue(w.get(0).contains("onshore is centred on 315 deg"), w.get(0));
    }

    @Test
    void aBearing90DegreesOffIsSaid() {
        List<String> w = ConventionCheck.warnings(result, withBearing(45), new AnalysisSettings());
        assertEquals(1, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("the coast bearing may be 90 deg off:"), w.get(0));
    }

    @Test
    void swappedSiteDistancesShowAsInlandBeforeCoast() {
        AnalysisSettings s = new AnalysisSettings();
        s.siteInlandM.put("marsh-4km", 25000.0);
        s.siteInlandM.put("plain-25km", 4000.0);
        List<String> w = ConventionCheck.warnings(result, coast, s);
        assertTrue(w.size() >= 5 && w.stream().allMatch(x -> x.contains("inland before coast")), w.toString());
        s.siteInlandM.put("marsh-4km", 4000.0);
        s.siteInlandM.put("plain-25km", 25000.0);
        assertEquals(List.of(), ConventionCheck.warnings(result, coast, s));
    }

    @Test
    void anObservedSiteMissingFromTheListIsNamed() {
        AnalysisSettings s = new AnalysisSettings();
        s.siteInlandM.put("marsh-4km", 4000.0);
        List<String> w = ConventionCheck.warnings(result, coast, s);
        assertTrue(w.get(0).startsWith("sites [plain-25km] are not in the coast file's sites list"), w.toString());
    }
}
