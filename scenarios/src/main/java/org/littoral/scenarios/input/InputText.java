package org.littoral.scenarios.input;

import java.io.BufferedInputStream;
import java.io.BufferedReader;
import java.io.CharConversionException;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.zip.GZIPInputStream;
import java.util.zip.ZipException;

/**
 * Reads the text of any input file the one way littoral reads input: strict UTF-8 (a byte order mark is
 * dropped), gzip unpacked when the file starts with the gzip signature, and every failure — a missing file, a
 * folder, no permission, bytes that are not UTF-8, damaged gzip data, a file far too large — turned into one
 * {@link UserInputException} line naming the file, the line where it went wrong and the fix.
 *
 * <p>{@code label} names what the file is for ("sweep file", "observations file"); messages start with
 * {@code label path}.
 */
public final class InputText {
    /** Largest YAML/JSON input read whole (a littoral settings file is a few KB). */
    public static final long SETTINGS_MAX_BYTES = 4L << 20;

    private InputText() {
    }

    /** The whole file as text; {@code maxBytes} bounds the (unpacked) size. */
    public static String read(Path file, String label, long maxBytes) {
        byte[] raw = readBytes(file, label, maxBytes);
        if (isGzip(raw)) {
            try (InputStream in = new GZIPInputStream(new java.io.ByteArrayInputStream(raw))) {
                raw = readBounded(in, maxBytes, file, label);
            } catch (IOException e) {
                throw failure(file, label, e, -1);
            }
        } else if (file.getFileName() != null && file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".gz")) {
            throw new UserInputException(prefix(file, label) + ": the name ends in .gz but the file is not gzip data; "
                    + "remove the .gz ending or compress the file with gzip");
        }
        return decode(raw, file, label);
    }

    /**
     * A line reader over the file's text (unpacked when gzip), for tables read line by line. Reading errors
     * surface as {@link IOException}s from {@code readLine}; turn them into a message with
     * {@link #failure(Path, String, IOException, long)} and the line number reached.
     */
    public static BufferedReader open(Path file, String label) {
        checkReadable(file, label);
        try {
            InputStream in = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
            in.mark(2);
            int b0 = in.read();
            int b1 = in.read();
            in.reset();
            boolean gz = b0 == 0x1f && b1 == 0x8b;
            if (!gz && file.getFileName() != null && file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".gz")) {
                in.close();
                throw new UserInputException(prefix(file, label) + ": the name ends in .gz but the file is not gzip data; "
                        + "remove the .gz ending or compress the file with gzip");
            }
            if (gz) {
                in = new GZIPInputStream(in, 1 << 16);
            }
            CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT);
            return new BufferedReader(new InputStreamReader(in, dec), 1 << 16);
        } catch (IOException e) {
            throw failure(file, label, e, -1);
        }
    }

    /** "label path" as every message about the file starts. */
    public static String prefix(Path file, String label) {
        return label == null || label.isEmpty() ? file.toString() : label + " " + file;
    }

    /**
     * One line for a failure while reading a file.
     *
     * @param line the 1-based line being read when it failed, or -1 when unknown
     */
    public static UserInputException failure(Path file, String label, IOException e, long line) {
        String at = prefix(file, label) + (line > 0 ? ":" + line : "");
        if (e instanceof NoSuchFileException) {
            return new UserInputException(prefix(file, label) + " does not exist; check the path", e);
        }
        if (e instanceof AccessDeniedException) {
            return new UserInputException(prefix(file, label) + " cannot be read: permission denied; check the file's permissions", e);
        }
        if (e instanceof CharacterCodingException || e instanceof CharConversionException) {
            // a buffered reader decodes ahead of the lines it hands out: find the first bad byte itself
            long[] bad = firstBadUtf8(file);
            String where = bad == null ? at : prefix(file, label) + ":" + bad[0] + ":" + bad[1];
            return new UserInputException(where + ": " + (bad != null ? String.format(Locale.ROOT, "byte 0x%02X is", bad[2])
                    : line > 0 ? "this line holds bytes that are" : "the file holds bytes that are")
                    + " not UTF-8 text; save the file as UTF-8 (in a spreadsheet: 'CSV UTF-8')", e);
        }
        if (e instanceof ZipException || e instanceof EOFException) {
            return new UserInputException(at + ": the gzip data is damaged or cut short" + (line > 0 ? " (the unpacked text reads "
                    + "only up to here)" : "") + "; replace the file with a complete copy, or unpack it with gunzip to see what is left", e);
        }
        if (e instanceof FileSystemException fs && fs.getReason() != null && fs.getReason().contains("directory")) {
            return new UserInputException(prefix(file, label) + " is a folder, not a file; give the path of a file", e);
        }
        String why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        if (e instanceof FileSystemException fs && fs.getReason() != null) {
            why = fs.getReason();
        }
        return new UserInputException(at + ": cannot be read (" + Shown.bare(why) + "); check the file and the disk", e);
    }

    /** {line, column, byte} of the first byte that is not UTF-8 in the (unpacked) file, or null. */
    static long[] firstBadUtf8(Path file) {
        try (InputStream raw = new BufferedInputStream(Files.newInputStream(file), 1 << 16)) {
            raw.mark(2);
            boolean gz = raw.read() == 0x1f && raw.read() == 0x8b;
            raw.reset();
            InputStream in = gz ? new GZIPInputStream(raw, 1 << 16) : raw;
            long line = 1;
            long col = 1;
            int need = 0; // continuation bytes still expected
            int b;
            int lead = 0;
            while ((b = in.read()) >= 0) {
                if (need > 0) {
                    if ((b & 0xC0) != 0x80) {
                        return new long[] {line, col, lead};
                    }
                    need--;
                    if (need == 0) {
                        col++;
                    }
                    continue;
                }
                if (b == '\n') {
                    line++;
                    col = 1;
                } else if (b < 0x80) {
                    col++;
                } else if (b >= 0xC2 && b <= 0xDF) {
                    need = 1;
                    lead = b;
                } else if (b >= 0xE0 && b <= 0xEF) {
                    need = 2;
                    lead = b;
                } else if (b >= 0xF0 && b <= 0xF4) {
                    need = 3;
                    lead = b;
                } else {
                    return new long[] {line, col, b};
                }
            }
            return need > 0 ? new long[] {line, col, lead} : null;
        } catch (IOException e) {
            return null;
        }
    }

    static boolean isGzip(byte[] b) {
        return b.length >= 2 && (b[0] & 0xff) == 0x1f && (b[1] & 0xff) == 0x8b;
    }

    private static void checkReadable(Path file, String label) {
        if (Files.isDirectory(file)) {
            throw new UserInputException(prefix(file, label) + " is a folder, not a file; give the path of a file");
        }
        if (!Files.exists(file)) {
            if (Files.isSymbolicLink(file)) {
                throw new UserInputException(prefix(file, label) + " is a link to a file that does not exist; check the path");
            }
            throw new UserInputException(prefix(file, label) + " does not exist; check the path");
        }
    }

    private static byte[] readBytes(Path file, String label, long maxBytes) {
        checkReadable(file, label);
        try {
            long size = Files.size(file);
            if (size > maxBytes) {
                throw tooLarge(file, label, size, maxBytes);
            }
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw failure(file, label, e, -1);
        }
    }

    private static byte[] readBounded(InputStream in, long maxBytes, Path file, String label) throws IOException {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        byte[] buf = new byte[1 << 15];
        long total = 0;
        int n;
        while ((n = in.read(buf)) > 0) {
            total += n;
            if (total > maxBytes) {
                throw tooLarge(file, label, total, maxBytes);
            }
            out.write(buf, 0, n);
        }
        return out.toByteArray();
    }

    private static UserInputException tooLarge(Path file, String label, long size, long maxBytes) {
        return new UserInputException(String.format(Locale.ROOT, "%s: the file is %s, more than the %s a file of this kind may "
                + "hold; check that it is the right file", prefix(file, label), bytes(size), bytes(maxBytes)));
    }

    /** A size in B, KB, MB or GB. */
    public static String bytes(long n) {
        if (n < 1024) {
            return n + " B";
        }
        if (n < 1024L * 1024) {
            return String.format(Locale.ROOT, "%.0f KB", n / 1024.0);
        }
        if (n < 1024L * 1024 * 1024) {
            return String.format(Locale.ROOT, "%.1f MB", n / 1048576.0);
        }
        return String.format(Locale.ROOT, "%.1f GB", n / 1073741824.0);
    }

    /** Strict UTF-8; the first bad byte is reported by line and column. */
    static String decode(byte[] raw, Path file, String label) {
        CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(raw);
        CharBuffer out = CharBuffer.allocate(raw.length + 1);
        CoderResult r = dec.decode(in, out, true);
        if (r.isError()) {
            int at = in.position();
            int line = 1;
            int lineStart = 0;
            for (int i = 0; i < at; i++) {
                if (raw[i] == '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
            // column in characters: decode the start of the line (valid up to the bad byte)
            int col = new String(raw, lineStart, at - lineStart, StandardCharsets.UTF_8).length() + 1;
            throw new UserInputException(String.format(Locale.ROOT, "%s:%d:%d: byte 0x%02X is not UTF-8 text; save the file as "
                    + "UTF-8 (or replace the character there)", prefix(file, label), line, col, raw[at] & 0xff));
        }
        dec.flush(out);
        out.flip();
        String s = out.toString();
        return !s.isEmpty() && s.charAt(0) == '\uFEFF' ? s.substring(1) : s;
    }
}
