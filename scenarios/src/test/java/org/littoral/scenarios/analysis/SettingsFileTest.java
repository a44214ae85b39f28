package org.littoral.scenarios.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.analysis.detect.Penalty;
import org.littoral.scenarios.analysis.metrics.MetricSettings;
import org.littoral.scenarios.input.UserInputException;

class SettingsFileTest {
    @TempDir
    Path dir;

    Path write(String text) throws IOException {
        Path p = dir.resolve("settings.yaml");
        Files.writeString(p, text);
        return p;
    }

    @Test
    void documentedSettingsOfEveryKindAreReadFromAFile() throws IOException {
        AnalysisSettings s = SettingsFile.apply(write(String.join("\n",
                "ambientLayer: 250-550",
                "ingest: {binStepM: 10, useDescent: true}",
                "detection:",
                "  windLayer: 150-350",
                "  penalty: mbic",
                "  minSegmentProfiles: 3",
                "  multiLayers: [50-150, 150-400]",
                "  multiVariables: [theta, mixing_ratio]",
                "metrics: {reference: daily-mean}",
                "stats: {groupBy: [breeze_type, convection]}",
                "")), new AnalysisSettings());
        assertEquals(new Layer(250, 550), s.ambientLayer);
        assertEquals(10.0, s.ingest.binStepM);
        assertTrue(s.ingest.useDescent);
        assertEquals(new Layer(150, 350), s.detection.windLayer);
        assertEquals(Penalty.Kind.MBIC, s.detection.penalty.kind());
        assertEquals(3, s.detection.minSegmentProfiles);
        assertEquals(List.of(new Layer(50, 150), new Layer(150, 400)), s.detection.multiLayers);
        assertEquals(List.of(Variable.THETA, Variable.MIXING_RATIO), s.detection.multiVariables);
        assertEquals(MetricSettings.Reference.DAILY_MEAN, s.metrics.reference);
        assertEquals(List.of("breeze_type", "convection"), s.stats.groupBy);
        assertEquals(6.0, s.ambientFromHours); // untouched keys keep their defaults
    }

    @Test
    void theResolvedSettingsAreEchoedAsJson() throws IOException {
        AnalysisSettings s = SettingsFile.apply(write("detection: {windLayer: 150-350}\n"), new AnalysisSettings());
        ObjectNode j = SettingsFile.toJson(s);
        assertEquals("150-350", j.get("detection").get("windLayer").asText());
        assertEquals("BIC", j.get("detection").get("penalty").asText());
        assertEquals(5.0, j.get("ingest").get("binStepM").asDouble());
    }

    @Test
    void anUnknownKeyNamesTheFileTheKeyAndWhatIsAllowed() throws IOException {
        Path p = write("detection: {windLayr: 150-350}\n");
        String m = assertThrows(UserInputException.class, () -> SettingsFile.apply(p, new AnalysisSettings())).getMessage();
        assertTrue(m.startsWith("settings file " + p + ": detection.windLayr: unknown setting; allowed here: ["), m);
        assertTrue(m.contains("windL"), m);  // the allowed list is clipped to 200 characters
    }

    @Test
    void aValueOfTheWrongKindNamesTheKeyAndTheForm() throws IOException {
        Path p = write("ingest: {binStepM: five}\n");
        String m = assertThrows(UserInputException.class, () -> SettingsFile.apply(p, new AnalysisSettings())).getMessage();
        assertTrue(m.startsWith("settings file " + p + ": ingest.binStepM: value 'five' is not a number; give a number"), m);
        Path q = write("detection: {windLayer: 300-100}\n");
        String m2 = assertThrows(UserInputException.class, () -> SettingsFile.apply(q, new AnalysisSettings())).getMessage();
        assertTrue(m2.startsWith("settings file " + q + ": detection.windLayer: layer 300.0-100.0 m: top must be above bottom"), m2);
    }

    @Test
    void aValueOutsideItsRangeIsCaughtByValidation() throws IOException {
        Path p = write("detection: {minSegmentProfiles: 0}\n");
        String m = assertThrows(UserInputException.class, () -> SettingsFile.apply(p, new AnalysisSettings())).getMessage();
        assertTrue(m.startsWith("settings file " + p + ": detection.minSegmentProfiles = 0 must be >= 1"), m);
    }
}
