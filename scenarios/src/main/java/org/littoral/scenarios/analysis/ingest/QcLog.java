package org.littoral.scenarios.analysis.ingest;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.output.AtomicFile;
import org.littoral.scenarios.output.Csv;

/**
 * Everything quality control removed, changed or flagged, and why: nothing is dropped silently.
 * Written as CSV ({@link #writeCsv}); {@link #warnings()} gives one line per kind with its count.
 */
public final class QcLog {

    /** What happened to the datum. */
    public enum Action { REMOVED_VALUE, REMOVED_SAMPLE, REMOVED_PROFILE, CAPPED_VALUE, FLAGGED }

    /**
     * One QC record.
     *
     * @param file  source file (or "memory")
     * @param line  file line, 0 when the record concerns a whole profile or a derived quantity
     * @param what  short stable category, e.g. "temperature-looks-like-kelvin"
     */
    public record Entry(String file, int line, String day, String site, String profile, String column, String value,
                        Action action, String what, String reason) {
    }

    private final List<Entry> entries = new ArrayList<>();
    private final Map<String, Integer> counts = new LinkedHashMap<>();
    private final Map<String, String> firstReason = new LinkedHashMap<>();

    public void add(Entry e) {
        entries.add(e);
        counts.merge(e.what(), 1, Integer::sum);
        firstReason.putIfAbsent(e.what(), e.reason());
    }

    public void add(String file, int line, String day, String site, String profile, String column, String value,
                    Action action, String what, String reason) {
        add(new Entry(file, line, day, site, profile, column, value, action, what, reason));
    }

    public List<Entry> entries() {
        return Collections.unmodifiableList(entries);
    }

    public int count(String what) {
        return counts.getOrDefault(what, 0);
    }

    public boolean isEmpty() {
        return entries.isEmpty();
    }

    /** One line per kind: "12 x temperature-looks-like-kelvin: ...first reason...". */
    public List<String> warnings() {
        List<String> out = new ArrayList<>();
        for (Map.Entry<String, Integer> e : counts.entrySet()) {
            out.add(String.format(Locale.ROOT, "%d x %s (e.g. %s)", e.getValue(), e.getKey(), firstReason.get(e.getKey())));
        }
        return out;
    }

    public void addAll(QcLog other) {
        other.entries.forEach(this::add);
    }

    public static final String CSV_HEADER = "file,line,day,site,profile,column,value,action,what,reason";

    public void writeCsv(Writer w) throws IOException {
        w.write(CSV_HEADER);
        w.write('\n');
        for (Entry e : entries) {
            w.write(String.join(",", q(e.file()), Integer.toString(e.line()), q(e.day()), q(e.site()), q(e.profile()),
                    q(e.column()), q(e.value()), e.action().name().toLowerCase(Locale.ROOT), q(e.what()), q(e.reason())));
            w.write('\n');
        }
    }

    /** Writes the log atomically. */
    public void writeCsv(Path file) throws IOException {
        AtomicFile.writeText(file, this::writeCsv);
    }

    private static String q(String s) {
        return Csv.field(s);
    }
}
