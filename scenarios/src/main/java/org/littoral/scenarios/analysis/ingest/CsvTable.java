package org.littoral.scenarios.analysis.ingest;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.littoral.scenarios.input.InputText;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;

/**
 * A minimal comma-separated reader that keeps file line numbers for error messages. Handles
 * double-quoted fields without embedded line breaks; '#' at the start of a line is a comment.
 */
public final class CsvTable {
    private final String fileName;
    private final List<String> header;
    private final Map<String, Integer> index = new HashMap<>();
    private final List<String[]> rows;
    private final int[] lineNumbers;
    /** What a tidy column was made from (a column map or a netCDF variable), for messages; absent for a plain file. */
    private final Map<String, String> origins;
    /** "line" for text files, "record" for tables built from netCDF variables. */
    private final String rowWord;

    private CsvTable(String fileName, List<String> header, List<String[]> rows, int[] lineNumbers) {
        this(fileName, header, rows, lineNumbers, Map.of(), "line");
    }

    private CsvTable(String fileName, List<String> header, List<String[]> rows, int[] lineNumbers, Map<String, String> origins,
                     String rowWord) {
        this.fileName = fileName;
        this.header = header;
        this.rows = rows;
        this.lineNumbers = lineNumbers;
        this.origins = origins;
        this.rowWord = rowWord;
        for (int i = 0; i < header.size(); i++) {
            index.put(header.get(i), i);
        }
    }

    public static CsvTable read(Path file) {
        return read(file, '\0');
    }

    /**
     * Reads a delimited text file.
     *
     * @param delimiter ',', ';' or '\t'; '\0' detects it from the header line (the one of the three that splits it most)
     */
    public static CsvTable read(Path file, char delimiter) {
        // Gzipped CSV is read transparently (the demo campaign ships that way); text must be UTF-8 (InputText).
        LineCounter lines = new LineCounter(InputText.open(file, ""));
        try (BufferedReader r = lines) {
            return read(file.getFileName().toString(), r, delimiter);
        } catch (IOException e) {
            throw InputText.failure(file, "", e, lines.lines + 1);
        }
    }

    /** Counts the lines read, so a decoding or gzip failure can name the line it happened on. */
    private static final class LineCounter extends BufferedReader {
        long lines;

        LineCounter(BufferedReader in) {
            super(in, 1 << 12);
        }

        @Override
        public String readLine() throws IOException {
            String l = super.readLine();
            if (l != null) {
                lines++;
            }
            return l;
        }
    }

    public static CsvTable read(String fileName, BufferedReader r) throws IOException {
        return read(fileName, r, '\0');
    }

    public static CsvTable read(String fileName, BufferedReader r, char delimiter) throws IOException {
        char delim = delimiter;
        String line;
        int lineNo = 0;
        List<String> header = null;
        int headerLine = 0;
        List<String[]> rows = new ArrayList<>();
        List<Integer> lines = new ArrayList<>();
        while ((line = r.readLine()) != null) {
            lineNo++;
            if (lineNo == 1 && !line.isEmpty() && line.charAt(0) == '\uFEFF') {
                line = line.substring(1);
            }
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            if (delim == '\0') {
                delim = detectDelimiter(line);
            }
            String[] cells = split(line, delim);
            if (header == null) {
                header = new ArrayList<>();
                for (String c : cells) {
                    header.add(c.trim());
                }
                headerLine = lineNo;
                java.util.Set<String> seen = new java.util.HashSet<>();
                for (String h : header) {
                    if (!seen.add(h)) {
                        throw new UserInputException(fileName + " line " + headerLine + ": column " + Shown.text(h)
                                + " appears twice in the header; give each column a distinct name");
                    }
                }
                continue;
            }
            if (cells.length != header.size()) {
                throw new UserInputException(fileName + " line " + lineNo + ": " + cells.length + " fields but the header on line "
                        + headerLine + " has " + header.size() + "; give every row one value (or an empty cell) per column");
            }
            rows.add(cells);
            lines.add(lineNo);
        }
        if (header == null) {
            throw new UserInputException(fileName + " line 1: the file is empty; give a header line with the column names, "
                    + "then one row per sample");
        }
        int[] ln = new int[lines.size()];
        for (int i = 0; i < ln.length; i++) {
            ln[i] = lines.get(i);
        }
        return new CsvTable(fileName, header, rows, ln);
    }

    /**
     * A tidy table built in memory from another layout (a column map, a netCDF file): rows keep the line (or
     * record) numbers of their source, and {@code origins} says for each tidy column where it came from.
     */
    public static CsvTable of(String fileName, List<String> header, List<String[]> rows, int[] lineNumbers,
                              Map<String, String> origins, String rowWord) {
        return new CsvTable(fileName, List.copyOf(header), rows, lineNumbers, Map.copyOf(origins), rowWord);
    }

    /** "column 'x'", or for a mapped column "column 'x' (from ...)". */
    public String describe(int column) {
        String h = header.get(column);
        String o = origins.get(h);
        return o == null ? "column " + Shown.text(h) : "column " + Shown.text(h) + " (" + Shown.clip(o, 80) + ")";
    }

    /** Where the tidy column came from, or null for a plain file's own column. */
    public String origin(String column) {
        return origins.get(column);
    }

    /** The one of comma, semicolon and tab that splits a header line into the most fields (comma on a tie). */
    static char detectDelimiter(String headerLine) {
        char best = ',';
        int most = count(headerLine, ',');
        for (char c : new char[] {';', '\t'}) {
            int n = count(headerLine, c);
            if (n > most) {
                most = n;
                best = c;
            }
        }
        return best;
    }

    private static int count(String s, char c) {
        int n = 0;
        for (int i = 0; i < s.length(); i++) {
            if (s.charAt(i) == c) {
                n++;
            }
        }
        return n;
    }

    static String[] split(String line) {
        return split(line, ',');
    }

    static String[] split(String line, char delim) {
        if (line.indexOf('"') < 0) {
            String[] parts = line.split(java.util.regex.Pattern.quote(String.valueOf(delim)), -1);
            for (int i = 0; i < parts.length; i++) {
                parts[i] = parts[i].trim();
            }
            return parts;
        }
        List<String> out = new ArrayList<>();
        StringBuilder sb = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        sb.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    sb.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == delim) {
                out.add(sb.toString().trim());
                sb.setLength(0);
            } else {
                sb.append(c);
            }
        }
        out.add(sb.toString().trim());
        return out.toArray(new String[0]);
    }

    public String fileName() {
        return fileName;
    }

    public List<String> header() {
        return header;
    }

    public boolean has(String column) {
        return index.containsKey(column);
    }

    /** Column index or -1. */
    public int column(String name) {
        Integer i = index.get(name);
        return i == null ? -1 : i;
    }

    public int rowCount() {
        return rows.size();
    }

    public String cell(int row, int column) {
        return rows.get(row)[column];
    }

    /** File line number of a data row (1-based, counting the header and comments). */
    public int line(int row) {
        return lineNumbers[row];
    }

    /** "file line N". */
    public String where(int row) {
        return fileName + " " + rowWord + " " + lineNumbers[row];
    }

    /** True for an empty cell or a conventional missing-value token (NA, NaN, null, -). */
    public static boolean isMissing(String cell) {
        return cell.isEmpty() || cell.equalsIgnoreCase("na") || cell.equalsIgnoreCase("nan")
                || cell.equalsIgnoreCase("null") || cell.equals("-");
    }

    /** Parses a number; missing cells give NaN; anything else unparsable is a user error naming file and line. */
    public double number(int row, int column) {
        String c = rows.get(row)[column];
        if (isMissing(c)) {
            return Double.NaN;
        }
        try {
            double v = Double.parseDouble(c);
            if (!Double.isFinite(v) || c.endsWith("d") || c.endsWith("D") || c.endsWith("f") || c.endsWith("F")) {
                throw new NumberFormatException(c);
            }
            return v;
        } catch (NumberFormatException e) {
            throw new UserInputException(where(row) + ": " + describe(column) + " value " + Shown.text(c)
                    + " is not a number; write a decimal number (point as separator) or leave the cell empty for missing");
        }
    }
}
