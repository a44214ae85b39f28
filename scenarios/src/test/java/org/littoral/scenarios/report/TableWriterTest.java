package org.littoral.scenarios.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.littoral.scenarios.output.Csv;
import org.junit.jupiter.api.io.TempDir;

class TableWriterTest {
    // RFC 4180 (Shafranovich 2005), section 2, rule 7: "aaa","b""bb","ccc" - a double quote inside a
    // quoted field is escaped by preceding it with another double quote.
    @Test
    void innerDoubleQuoteIsDoubledAndTheFieldQuoted() {
        assertEquals("\"b\"\"bb\"", Csv.field("b\"bb"));
    }

    // RFC 4180 section 2, rule 6: fields containing line breaks (CRLF), double quotes and commas
    // should be enclosed in double quotes: "aaa","b CRLF bb","ccc".
    @Test
    void fieldsWithLineBreaksOrCommasAreQuoted() {
        assertEquals("\"b\r\nbb\"", Csv.field("b\r\nbb"));
        assertEquals("\"a,b\"", Csv.field("a,b"));
        assertEquals("plain", Csv.field("plain"));
    }

    // RFC 4180 section 2, rules 1-3: one record per line and an optional header line of the same form; the project
    // ends lines with LF (common practice on Unix; every CSV reader accepts it) rather than the RFC's CRLF.
    @Test
    void csvHasAHeaderAndLfLineEndsInColumnOrder() {
        Table t = Table.of("zeta_K", "alpha_m").row(1.5, 2.0).row(Double.NaN, -0.25);
        assertEquals("zeta_K,alpha_m\n1.5,2\n,-0.25\n", TableWriter.toCsv(t));
    }

    record Row(String site, double distanceKm, double arrivalLocalH) {
    }

    @Test
    void recordsKeepComponentOrderNotAlphabetical(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("rows.csv");
        TableWriter.writeCsv(List.of(new Row("A", 5, 12.5), new Row("B, inland", 12, Double.NaN)), Row.class, csv);
        String s = Files.readString(csv);
        assertTrue(s.startsWith("site,distanceKm,arrivalLocalH\n"), s);
        assertTrue(s.contains("\"B, inland\",12,\n"), s);
    }

    @Test
    void jsonIsAnArrayOfObjectsInColumnOrderWithNanAsNull(@TempDir Path dir) throws Exception {
        Table t = Table.of("site", "dT_K", "n").row("A", Double.NaN, 3).row("B", -1.25, 4);
        Path p = dir.resolve("t.json");
        TableWriter.writeJson(t, p);
        JsonNode root = new ObjectMapper().readTree(Files.readString(p));
        assertEquals(2, root.size());
        assertTrue(root.get(0).get("dT_K").isNull());
        assertEquals(-1.25, root.get(1).get("dT_K").asDouble(), 0);
        Iterator<String> names = root.get(0).fieldNames();
        assertEquals("site", names.next());
        assertEquals("dT_K", names.next());
        assertEquals("n", names.next());
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void aRowOfTheWrongLengthIsRejectedWithTheColumns() {
        Table t = Table.of("a", "b");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> t.row(1.0));
        assertTrue(e.getMessage().contains("[a, b]"));
    }
}
