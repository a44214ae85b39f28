package org.littoral.scenarios.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.List;
import org.littoral.scenarios.output.AtomicFile;
import org.littoral.scenarios.output.Csv;

/**
 * Writes {@link Table}s as CSV in the project's one dialect ({@link Csv}: comma separated, LF line ends, RFC 4180
 * quoting, a missing number as an empty field) and as pretty JSON (an array of objects, keys in column order, NaN
 * as null). Every write is atomic ({@link AtomicFile}).
 */
public final class TableWriter {
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
            .findAndRegisterModules();

    private TableWriter() {
    }

    public static String toCsv(Table t) {
        StringBuilder sb = new StringBuilder();
        Csv.line(sb, t.columns());
        for (List<Object> r : t.rows()) {
            String[] cells = new String[r.size()];
            for (int i = 0; i < cells.length; i++) {
                cells[i] = Table.csvText(r.get(i));
            }
            Csv.line(sb, List.of(cells));
        }
        return sb.toString();
    }

    public static JsonNode toJsonNode(Table t) {
        ArrayNode arr = JsonNodeFactory.instance.arrayNode();
        for (List<Object> r : t.rows()) {
            ObjectNode o = arr.addObject();
            for (int i = 0; i < r.size(); i++) {
                put(o, t.columns().get(i), r.get(i));
            }
        }
        return arr;
    }

    private static void put(ObjectNode o, String key, Object v) {
        if (v == null) {
            o.putNull(key);
        } else if (v instanceof Double || v instanceof Float) {
            double x = ((Number) v).doubleValue();
            if (Double.isFinite(x)) {
                o.put(key, x);
            } else {
                o.putNull(key);
            }
        } else if (v instanceof Integer || v instanceof Short || v instanceof Byte) {
            o.put(key, ((Number) v).intValue());
        } else if (v instanceof Long) {
            o.put(key, (Long) v);
        } else if (v instanceof BigDecimal) {
            o.put(key, (BigDecimal) v);
        } else if (v instanceof BigInteger) {
            o.put(key, (BigInteger) v);
        } else if (v instanceof Number) {
            o.put(key, ((Number) v).doubleValue());
        } else if (v instanceof Boolean) {
            o.put(key, (Boolean) v);
        } else {
            o.put(key, v.toString());
        }
    }

    public static String toJson(Table t) {
        try {
            return JSON.writeValueAsString(toJsonNode(t)) + "\n";
        } catch (IOException e) {
            throw new IllegalStateException("JSON encoding failed", e);
        }
    }

    public static void writeCsv(Table t, Path target) throws IOException {
        AtomicFile.writeString(target, toCsv(t));
    }

    public static void writeJson(Table t, Path target) throws IOException {
        AtomicFile.writeString(target, toJson(t));
    }

    /** Any Jackson-serialisable value (records, maps, lists) as pretty JSON, atomically. */
    public static void writeJsonValue(Object value, Path target) throws IOException {
        AtomicFile.writeString(target, JSON.writeValueAsString(value) + "\n");
    }

    /** Records as CSV, columns in component order. */
    public static void writeCsv(List<? extends Record> records, Class<? extends Record> type, Path target)
            throws IOException {
        writeCsv(Table.fromRecords(type, records), target);
    }
}
