package org.littoral.scenarios.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class SchemaDocTest {
    static final Path DOC = Path.of("..", "docs", "scenario-schema.md");

    @Test
    void theSchemaDocumentMatchesTheSchemaTheReaderEnforces() throws Exception {
        String expected = SchemaDoc.markdown();
        if (Boolean.getBoolean("littoral.updateDocs")) {
            Files.writeString(DOC, expected);
        }
        assertTrue(Files.exists(DOC), "docs/scenario-schema.md is missing; regenerate with -Dlittoral.updateDocs=true");
        assertEquals(expected, Files.readString(DOC), "docs/scenario-schema.md is stale; regenerate with -Dlittoral.updateDocs=true");
    }

    @Test
    void everyKeyOfTheSchemaAppearsInTheDocument() {
        String md = SchemaDoc.markdown();
        for (String key : new String[] {"latitude_deg", "bearing_land_to_sea_deg", "sst_K", "buoyancy_frequency_per_s",
            "friction_per_s", "speed_m_per_s", "from_deg", "dense_cadence_min", "temperature_sigma_K", "onshore_threshold_m_per_s"}) {
            assertTrue(md.contains("`" + key + "`"), key);
        }
    }
}
