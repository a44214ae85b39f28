package org.littoral.scenarios.bench;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import java.util.zip.GZIPInputStream;
import java.util.zip.GZIPOutputStream;
import org.littoral.scenarios.input.Failures;

/**
 * A seeded fuzzer for every input file littoral reads. It takes a small valid seed of each kind, applies
 * random mutations (numbers at the edges, deleted and repeated lines, bad bytes, broken gzip, extra YAML
 * documents, long values, path-like names, wrong types, ...), hands each mutant to the same reader and pre-run
 * checks a command uses, and sorts the outcome as the command line would report it (exit code and message,
 * {@link Failures#exitCode(Throwable)}):
 * <ul>
 * <li>{@link Category#CLEAN}: accepted;</li>
 * <li>{@link Category#CLEAR_ERROR}: exit 2 with one line that names the file, is at most {@link #MAX_MESSAGE}
 *     characters, shows no Java internals or echoed file contents, and says what to do;</li>
 * <li>{@link Category#OTHER}: anything else (exit 1, an uncaught error, a message that fails the rules above,
 *     or a reader that takes longer than {@link #TIMEOUT_SEC} s).</li>
 * </ul>
 * {@code littoral bench input-fuzz} prints the counts per kind; the test suite runs it and requires no OTHER.
 */
public final class InputFuzz {

    /** Longest message that still counts as one readable line. */
    public static final int MAX_MESSAGE = 500;
    /** A reader that takes longer than this on a small file has hung or explodes in work. */
    public static final int TIMEOUT_SEC = 20;

    /** The input files, each with the reader and pre-run checks its command applies. */
    public enum Kind {
        SCENARIO("scenario"), SWEEP("sweep"), PLAN("plan"), COAST("coast"), DAY("day file"),
        OBSERVATIONS("observations"), DAY_TABLE("per-day table"), PASSAGES("passage table"), COLUMN_MAP("column map"),
        SETTINGS("settings file");

        public final String label;

        Kind(String label) {
            this.label = label;
        }
    }

    /** How an outcome counts. */
    public enum Category { CLEAN, CLEAR_ERROR, OTHER }

    /** One mutant and what became of it. */
    public record Outcome(Kind kind, int index, String seed, String mutation, int exit, String message, Category category,
                          String reason) {
    }

    /** A valid file of one kind; {@code support} files sit beside it (e.g. the coast file a day file names). */
    public record Seed(Kind kind, String fileName, byte[] content, Map<String, byte[]> support) {
    }

    /** Reads (and checks) one file of a kind the way its command does before any model runs. */
    @FunctionalInterface
    public interface Reader {
        void read(Path file) throws Exception;
    }

    private static final String SEEDS = "/org/littoral/scenarios/bench/fuzz-seeds/";
    private static final Pattern NUMBER = Pattern.compile("(?<![A-Za-z_0-9.])-?\\d+(\\.\\d+)?([eE][-+]?\\d+)?(?![A-Za-z_0-9])");
    private static final Pattern VALUE = Pattern.compile("(:\\s+)([^\\s#{}\\[\\],][^#\\n,}]*)");
    private static final Pattern INTERNALS = Pattern.compile("Exception|java\\.|javax\\.|com\\.fasterxml|org\\.yaml|snakeyaml"
            + "|Input length|\\[Source:|line: \\d+, column: \\d+|reference chain|Unrecognized token|Unexpected character"
            + "|\\bat [a-z]+\\.[a-z]+\\.");
    /** Unit symbols written in mixed case (udunits), not Java names. */
    private static final java.util.Set<String> UNITS = java.util.Set.of("degC", "degF", "hPa", "kPa", "mbar", "mPa", "gPerKg");
    private static final Pattern CAMEL = Pattern.compile("\\b[a-z]+[A-Z][A-Za-z]*\\b");
    private static final Pattern FIX = Pattern.compile("\\b(give|use|set|remove|fix|write|check|add|make|choose|lower|raise|"
            + "move|split|leave|rename|convert|list|swap|delete|save|widen|replace|keep|put|start|end|pick|try|quote|indent|"
            + "shorten|drop|label|spread|narrow|reduce|increase|coarsen|change|close|separate|save|simplify|complete|unpack|free|rerun|sort)\\b", Pattern.CASE_INSENSITIVE);
    /** Text of files that must never be echoed (a leaked system file). */
    private static final Pattern LEAK = Pattern.compile("root:.*:0:0:");

    private static final String[] EDGE_NUMBERS = {"0", "-1", "1e-6", "0.000001", "1e-300", "1e308", "1e400", "-0",
        "99999999999999999999", "nan", ".nan", ".inf", "-.inf", "1_000", "0x10", "3.5e", "-1e9", "2147483648", "16385",
        "0.5", "7", "1e6", "360", "-90", "500"};
    private static final String[] ODD_VALUES = {"[1, 2]", "{a: 1}", "true", "null", "~", "''", "\"\"", "- x", "&a", "*a", "!!binary x",
        "'unterminated", "\"unterminated", "{", "[", "x: y: z", "%", "@x", "`x`", "|", ">"};
    private static final String[] PATHS = {"../../x", "../../../../tmp/escape", "/etc/passwd", "a/b", "C:\\x", "nul", ".", "..",
        "x\u0000y", "ok name with spaces", "/", "~/x", "$(rm -rf x)"};

    private final Map<Kind, Reader> readers;
    private final Map<Kind, List<Seed>> seeds;

    public InputFuzz(Map<Kind, Reader> readers, Map<Kind, List<Seed>> seeds) {
        this.readers = readers;
        this.seeds = seeds;
    }

    /** The seed files that ship in the jar: built-in scenarios, sweeps and plans, and small invented data files. */
    public static Map<Kind, List<Seed>> standardSeeds() {
        Map<Kind, List<Seed>> m = new EnumMap<>(Kind.class);
        for (String s : List.of("classic-45N", "sea-barrier-bay", "quillmarsh-reach", "nl-onshore-2ms", "critical-30N-friction")) {
            add(m, Kind.SCENARIO, s + ".yaml", resource("/org/littoral/scenarios/builtin/" + s + ".yaml"));
        }
        // JSON follows another syntax path (the reader picks it by the .json ending)
        add(m, Kind.SCENARIO, "classic-json.json", yamlToJson(resource("/org/littoral/scenarios/builtin/classic-45N.yaml")));
        for (String s : List.of("ambient-flow", "ambient-ensemble", "quillmarsh-ambient")) {
            add(m, Kind.SWEEP, s + ".yaml", resource("/org/littoral/scenarios/builtin/sweeps/" + s + ".yaml"));
        }
        for (String s : List.of("bay-coast-plan", "quillmarsh-plan")) {
            add(m, Kind.PLAN, s + ".yaml", resource("/org/littoral/scenarios/builtin/plans/" + s + ".yaml"));
        }
        byte[] coast = resource(SEEDS + "coast.yaml");
        add(m, Kind.COAST, "coast.yaml", coast);
        m.get(Kind.COAST).add(new Seed(Kind.COAST, "coast-only.yaml", (
                "coast:\n  latitude_deg: 39.6\n  longitude_deg: -45.0\n  utc_offset_h: -3\n  bearing_land_to_sea_deg: 135\n"
                        + "  day_of_year: 202\n").getBytes(StandardCharsets.UTF_8), Map.of()));
        m.put(Kind.DAY, new ArrayList<>(List.of(new Seed(Kind.DAY, "day.yaml", resource(SEEDS + "day.yaml"),
                Map.of("coast.yaml", coast)))));
        byte[] binnedGz = resource(SEEDS + "profiles-binned.csv.gz");
        add(m, Kind.OBSERVATIONS, "profiles-binned.csv", gunzip(binnedGz));
        add(m, Kind.OBSERVATIONS, "profiles-binned.csv.gz", binnedGz);
        add(m, Kind.OBSERVATIONS, "flights-raw.csv", resource(SEEDS + "flights-raw.csv"));
        add(m, Kind.DAY_TABLE, "days.csv", resource(SEEDS + "days.csv"));
        add(m, Kind.PASSAGES, "passages-user.csv", resource(SEEDS + "passages-user.csv"));
        add(m, Kind.PASSAGES, "passages-observe.csv", resource(SEEDS + "passages-observe.csv"));
        add(m, Kind.COLUMN_MAP, "column-map.yaml", resource(SEEDS + "column-map.yaml"));
        add(m, Kind.SETTINGS, "settings.yaml", resource(SEEDS + "settings.yaml"));
        return m;
    }

    private static void add(Map<Kind, List<Seed>> m, Kind k, String name, byte[] content) {
        m.computeIfAbsent(k, x -> new ArrayList<>()).add(new Seed(k, name, content, Map.of()));
    }

    /**
     * Runs {@code perKind} mutants of every kind (seeded), each in its own folder under {@code work}.
     *
     * @param each called with every outcome as it is known (progress, logging); may be null
     */
    public List<Outcome> run(long seed, int perKind, Path work, Consumer<Outcome> each) throws IOException {
        Random rnd = new Random(seed);
        List<Outcome> out = new ArrayList<>();
        ExecutorService pool = newWorker();
        try {
            int n = 0;
            for (Kind k : Kind.values()) {
                List<Seed> ss = seeds.get(k);
                Reader r = readers.get(k);
                if (ss == null || ss.isEmpty() || r == null) {
                    continue;
                }
                for (int i = 0; i < perKind; i++) {
                    Seed s = ss.get(rnd.nextInt(ss.size()));
                    long caseSeed = rnd.nextLong();
                    Mutant mu = mutate(s, new Random(caseSeed));
                    Path dir = work.resolve(String.format(Locale.ROOT, "c%05d", n));
                    Files.createDirectories(dir);
                    for (Map.Entry<String, byte[]> e : s.support().entrySet()) {
                        Files.write(dir.resolve(e.getKey()), e.getValue());
                    }
                    String fileName = String.format(Locale.ROOT, "fuzz%05d-%s", n, s.fileName());
                    Path file = dir.resolve(fileName);
                    Files.write(file, mu.bytes);
                    Future<Throwable> f = pool.submit(() -> {
                        try {
                            r.read(file);
                            return null;
                        } catch (Throwable t) {
                            return t;
                        }
                    });
                    Outcome o;
                    try {
                        Throwable t = f.get(TIMEOUT_SEC, TimeUnit.SECONDS);
                        o = classify(k, n, s.fileName(), mu.description, fileName, t);
                    } catch (TimeoutException e) {
                        f.cancel(true);
                        pool.shutdownNow();
                        pool = newWorker();
                        o = new Outcome(k, n, s.fileName(), mu.description, -1, null, Category.OTHER,
                                "no answer within " + TIMEOUT_SEC + " s");
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                        throw new IOException("interrupted", e);
                    } catch (ExecutionException e) {
                        throw new IllegalStateException(e);
                    }
                    out.add(o);
                    if (each != null) {
                        each.accept(o);
                    }
                    deleteTree(dir);
                    n++;
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return out;
    }

    private static ExecutorService newWorker() {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(null, r, "input-fuzz", 64L << 20);
            t.setDaemon(true);
            return t;
        });
    }

    /** Sorts one result the way the command line reports it. */
    public static Outcome classify(Kind k, int index, String seed, String mutation, String fileName, Throwable t) {
        if (t == null) {
            return new Outcome(k, index, seed, mutation, 0, null, Category.CLEAN, "");
        }
        int exit = Failures.exitCode(t);
        String msg = Failures.message(t);
        String why = unclear(exit, msg, fileName, k == Kind.SETTINGS ? k : null);
        return new Outcome(k, index, seed, mutation, exit, msg, why == null ? Category.CLEAR_ERROR : Category.OTHER,
                why == null ? "" : why);
    }

    /** Why a message fails the one-clear-line rules, or null when it passes. */
    public static String unclear(int exit, String msg, String fileName) {
        return unclear(exit, msg, fileName, null);
    }

    /**
     * As {@link #unclear(int, String, String)}; {@code camelKeys} non-null for a file whose own keys are written in
     * camelCase (the analysis settings file), where such words are the file's keys, not Java internals.
     */
    public static String unclear(int exit, String msg, String fileName, Kind camelKeys) {
        if (exit != 2) {
            return "exit " + exit;
        }
        if (msg == null || msg.isBlank()) {
            return "no message";
        }
        if (msg.indexOf('\n') >= 0 || msg.indexOf('\r') >= 0) {
            return "several lines";
        }
        if (msg.length() > MAX_MESSAGE) {
            return "longer than " + MAX_MESSAGE + " characters";
        }
        if (!msg.contains(fileName)) {
            return "does not name the file";
        }
        if (LEAK.matcher(msg).find()) {
            return "echoes another file's contents";
        }
        Matcher m = INTERNALS.matcher(msg);
        if (m.find()) {
            return "Java or parser internals ('" + m.group() + "')";
        }
        Matcher c = CAMEL.matcher(msg.replaceAll("'[^']*'", "").replaceAll("\"[^\"]*\"", ""));
        while (c.find()) {
            if (camelKeys == null && !UNITS.contains(c.group())) {
                return "names a Java field ('" + c.group() + "')";
            }
        }
        if (!FIX.matcher(msg).find()) {
            return "says nothing about the fix";
        }
        return null;
    }

    /** Counts per kind and category, in kind order. */
    public static Map<Kind, int[]> counts(List<Outcome> outcomes) {
        Map<Kind, int[]> m = new EnumMap<>(Kind.class);
        for (Outcome o : outcomes) {
            m.computeIfAbsent(o.kind(), k -> new int[3])[o.category().ordinal()]++;
        }
        return m;
    }

    /** The most frequent reasons for OTHER, per kind, with one example each. */
    public static Map<String, List<Outcome>> otherReasons(List<Outcome> outcomes) {
        Map<String, List<Outcome>> m = new LinkedHashMap<>();
        outcomes.stream().filter(o -> o.category() == Category.OTHER)
                .forEach(o -> m.computeIfAbsent(o.kind().label + ": " + o.reason(), x -> new ArrayList<>()).add(o));
        return m;
    }

    // ------------------------------------------------------------------ mutations

    private record Mutant(byte[] bytes, String description) {
    }

    private static final String[] OPS = {"number", "delete-line", "repeat-line", "swap-lines", "truncate", "indent", "tab",
        "bad-utf8", "extra-document", "long-value", "path-value", "odd-value", "key-typo", "unknown-key", "flip-bytes", "empty",
        "bom-crlf", "null-value", "csv-cell", "csv-commas", "gzip-corrupt", "combination"};

    static Mutant mutate(Seed s, Random rnd) {
        boolean gz = s.fileName().endsWith(".gz");
        String op = OPS[rnd.nextInt(OPS.length)];
        if (gz && op.equals("gzip-corrupt")) {
            byte[] b = s.content().clone();
            if (rnd.nextBoolean()) {
                int cut = 1 + rnd.nextInt(b.length - 1);
                return new Mutant(java.util.Arrays.copyOf(b, cut), "gzip-corrupt: cut at byte " + cut);
            }
            for (int i = 0; i < 1 + rnd.nextInt(4); i++) {
                b[rnd.nextInt(b.length)] ^= (byte) (1 + rnd.nextInt(255));
            }
            return new Mutant(b, "gzip-corrupt: flipped bytes");
        }
        byte[] plain = gz ? gunzip(s.content()) : s.content();
        Mutant m;
        if (op.equals("combination")) {
            m = new Mutant(plain, "combination:");
            for (int i = 0; i < 2 + rnd.nextInt(2); i++) {
                String o2 = OPS[rnd.nextInt(OPS.length - 2)];
                Mutant next = apply(o2, m.bytes, rnd);
                m = new Mutant(next.bytes, m.description + " " + next.description);
            }
        } else {
            m = apply(op.equals("gzip-corrupt") ? "flip-bytes" : op, plain, rnd);
        }
        return gz ? new Mutant(gzip(m.bytes), m.description + " (gzipped)") : m;
    }

    private static Mutant apply(String op, byte[] in, Random rnd) {
        String text = new String(in, StandardCharsets.ISO_8859_1); // byte-preserving
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        int li = lines.isEmpty() ? 0 : rnd.nextInt(lines.size());
        switch (op) {
            case "number" -> {
                List<int[]> spans = spans(NUMBER, text);
                if (spans.isEmpty()) {
                    return new Mutant(in, "number: none");
                }
                int[] sp = spans.get(rnd.nextInt(spans.size()));
                String v = EDGE_NUMBERS[rnd.nextInt(EDGE_NUMBERS.length)];
                return new Mutant(bytes(text.substring(0, sp[0]) + v + text.substring(sp[1])), "number: " + v);
            }
            case "delete-line" -> {
                lines.remove(li);
                return new Mutant(bytes(String.join("\n", lines)), "delete-line " + (li + 1));
            }
            case "repeat-line" -> {
                String l = lines.get(li);
                lines.add(li, l);
                boolean key = l.matches("\\s*(- )?[A-Za-z_][A-Za-z_0-9]*:(\\s.*)?");
                return new Mutant(bytes(String.join("\n", lines)), "repeat-line " + (li + 1) + (key ? " (a key)" : ""));
            }
            case "swap-lines" -> {
                int lj = rnd.nextInt(lines.size());
                String t = lines.get(li);
                lines.set(li, lines.get(lj));
                lines.set(lj, t);
                return new Mutant(bytes(String.join("\n", lines)), "swap-lines " + (li + 1) + " " + (lj + 1));
            }
            case "truncate" -> {
                int cut = rnd.nextInt(Math.max(1, in.length));
                return new Mutant(java.util.Arrays.copyOf(in, cut), "truncate at " + cut);
            }
            case "indent" -> {
                String l = lines.get(li);
                lines.set(li, rnd.nextBoolean() ? " ".repeat(1 + rnd.nextInt(3)) + l : l.stripLeading());
                return new Mutant(bytes(String.join("\n", lines)), "indent line " + (li + 1));
            }
            case "tab" -> {
                String l = lines.get(li);
                int at = rnd.nextInt(l.length() + 1);
                lines.set(li, l.substring(0, at) + "\t" + l.substring(at));
                return new Mutant(bytes(String.join("\n", lines)), "tab in line " + (li + 1));
            }
            case "bad-utf8" -> {
                byte[][] bad = {{(byte) 0xC3, (byte) 0x28}, {(byte) 0xFF}, {(byte) 0xE2, (byte) 0x82}, {(byte) 0xF0, (byte) 0x28,
                    (byte) 0x8C, (byte) 0x28}, {(byte) 0xC0, (byte) 0xAF}};
                byte[] b = bad[rnd.nextInt(bad.length)];
                int at = rnd.nextInt(in.length + 1);
                ByteArrayOutputStream o = new ByteArrayOutputStream();
                o.write(in, 0, at);
                o.write(b, 0, b.length);
                o.write(in, at, in.length - at);
                return new Mutant(o.toByteArray(), "bad-utf8 at byte " + at);
            }
            case "extra-document" -> {
                String extra = rnd.nextBoolean() ? "\n---\nname: second\n" : "\n---\n" + text;
                return new Mutant(bytes(text + extra), "extra-document");
            }
            case "long-value" -> {
                int n = new int[] {300, 5000, 300_000}[rnd.nextInt(3)];
                return replaceValue(text, rnd, "x".repeat(n), "long-value " + n);
            }
            case "path-value" -> {
                String p = PATHS[rnd.nextInt(PATHS.length)];
                if (rnd.nextInt(4) == 0) {
                    p = "n".repeat(250);
                }
                return replaceValue(text, rnd, p, "path-value " + (p.length() > 20 ? p.length() + " chars" : p));
            }
            case "odd-value" -> {
                String v = ODD_VALUES[rnd.nextInt(ODD_VALUES.length)];
                return replaceValue(text, rnd, v, "odd-value " + v);
            }
            case "null-value" -> {
                return replaceValue(text, rnd, rnd.nextBoolean() ? "" : "null", "null-value");
            }
            case "key-typo" -> {
                String l = lines.get(li);
                int colon = l.indexOf(':');
                if (colon > 1) {
                    int at = rnd.nextInt(colon);
                    char c = l.charAt(at);
                    if (Character.isLetter(c)) {
                        lines.set(li, l.substring(0, at) + (char) (c == 'z' ? 'a' : c + 1) + l.substring(at + 1));
                    }
                }
                return new Mutant(bytes(String.join("\n", lines)), "key-typo line " + (li + 1));
            }
            case "unknown-key" -> {
                String l = lines.get(li);
                String indent = l.substring(0, l.length() - l.stripLeading().length());
                lines.add(li, indent + "zz_unknown: 1");
                return new Mutant(bytes(String.join("\n", lines)), "unknown-key at line " + (li + 1));
            }
            case "flip-bytes" -> {
                byte[] b = in.clone();
                if (b.length == 0) {
                    return new Mutant(b, "flip-bytes: empty");
                }
                for (int i = 0; i < 1 + rnd.nextInt(3); i++) {
                    b[rnd.nextInt(b.length)] = (byte) rnd.nextInt(256);
                }
                return new Mutant(b, "flip-bytes");
            }
            case "empty" -> {
                return new Mutant(rnd.nextBoolean() ? new byte[0] : bytes("# only a comment\n"), "empty");
            }
            case "bom-crlf" -> {
                String t = rnd.nextBoolean() ? text.replace("\n", "\r\n") : text;
                byte[] body = bytes(t);
                byte[] b = new byte[body.length + 3];
                b[0] = (byte) 0xEF;
                b[1] = (byte) 0xBB;
                b[2] = (byte) 0xBF;
                System.arraycopy(body, 0, b, 3, body.length);
                return new Mutant(b, "bom-crlf");
            }
            case "csv-cell" -> {
                String l = lines.get(li);
                String[] cells = l.split(",", -1);
                int c = rnd.nextInt(cells.length);
                String[] vals = {"abc", "", "\"", "NaN", "-", "1e999", "--5", "12:99", "2031-13-45", "\"a,b\"", "x".repeat(400), "25:00:00",
                    "TRUE", "-999", "0"};
                cells[c] = vals[rnd.nextInt(vals.length)];
                lines.set(li, String.join(",", cells));
                return new Mutant(bytes(String.join("\n", lines)), "csv-cell line " + (li + 1) + " column " + (c + 1));
            }
            case "csv-commas" -> {
                String l = lines.get(li);
                lines.set(li, rnd.nextBoolean() ? l + "," : l.replaceFirst(",", ""));
                return new Mutant(bytes(String.join("\n", lines)), "csv-commas line " + (li + 1));
            }
            default -> {
                return new Mutant(in, "unchanged");
            }
        }
    }

    private static Mutant replaceValue(String text, Random rnd, String v, String what) {
        List<int[]> spans = new ArrayList<>();
        Matcher m = VALUE.matcher(text);
        while (m.find()) {
            spans.add(new int[] {m.start(2), m.end(2)});
        }
        if (text.indexOf(',') >= 0 && (spans.isEmpty() || rnd.nextBoolean())) {
            // CSV (or flow YAML): replace one comma-separated cell
            spans.clear();
            Matcher c = Pattern.compile("(?<=,|^)[^,\\n]*(?=,|\\n|$)", Pattern.MULTILINE).matcher(text);
            while (c.find()) {
                spans.add(new int[] {c.start(), c.end()});
            }
        }
        if (spans.isEmpty()) {
            return new Mutant(bytes(text), what + ": no value");
        }
        int[] sp = spans.get(rnd.nextInt(spans.size()));
        return new Mutant(bytes(text.substring(0, sp[0]) + v + text.substring(sp[1])), what);
    }

    private static List<int[]> spans(Pattern p, String text) {
        List<int[]> out = new ArrayList<>();
        Matcher m = p.matcher(text);
        while (m.find()) {
            out.add(new int[] {m.start(), m.end()});
        }
        return out;
    }

    private static byte[] bytes(String isoLatin1) {
        return isoLatin1.getBytes(StandardCharsets.ISO_8859_1);
    }

    // ------------------------------------------------------------------ helpers

    static byte[] resource(String name) {
        try (InputStream in = InputFuzz.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static byte[] gunzip(byte[] gz) {
        try (InputStream in = new GZIPInputStream(new java.io.ByteArrayInputStream(gz))) {
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static byte[] gzip(byte[] plain) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        try (GZIPOutputStream g = new GZIPOutputStream(o)) {
            g.write(plain);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return o.toByteArray();
    }

    private static byte[] yamlToJson(byte[] yaml) {
        try {
            var tree = new com.fasterxml.jackson.databind.ObjectMapper(new com.fasterxml.jackson.dataformat.yaml.YAMLFactory())
                    .readTree(yaml);
            return new com.fasterxml.jackson.databind.ObjectMapper().writerWithDefaultPrettyPrinter().writeValueAsBytes(tree);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static void deleteTree(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // scratch only
        }
    }
}
