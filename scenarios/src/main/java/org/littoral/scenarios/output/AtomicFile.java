package org.littoral.scenarios.output;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NotDirectoryException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFilePermissions;
import org.littoral.scenarios.input.UserInputException;

/**
 * The one way littoral writes an output file: into a hidden temporary file in the target's folder, flushed to
 * disk, then renamed over the target. A reader (or a resumed sweep) sees either the old file or the complete new
 * one, never half of it. A target that cannot be written (no permission, a read-only disk, a path through a file)
 * raises a one-line {@link UserInputException} naming the file and the fix; other I/O failures name the file too.
 */
public final class AtomicFile {
    /** Suffix of the temporary files; a resumed sweep removes leftovers of an interrupted write by it. */
    public static final String TMP_SUFFIX = ".tmp";

    private AtomicFile() {
    }

    /** Writes the content to a temporary file it is given (the file exists and is empty). */
    @FunctionalInterface
    public interface PathBody {
        void writeTo(Path tmp) throws IOException;
    }

    /** Writes the content to a stream (buffered; closed by the caller of the body). */
    @FunctionalInterface
    public interface StreamBody {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes text to a UTF-8 writer (buffered). */
    @FunctionalInterface
    public interface TextBody {
        void writeTo(Writer out) throws IOException;
    }

    public static void write(Path target, byte[] content) throws IOException {
        writeStream(target, out -> out.write(content));
    }

    public static void writeString(Path target, String content) throws IOException {
        write(target, content.getBytes(StandardCharsets.UTF_8));
    }

    public static void writeText(Path target, TextBody body) throws IOException {
        writeStream(target, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            body.writeTo(w);
            w.flush();
        });
    }

    public static void writeStream(Path target, StreamBody body) throws IOException {
        writeWith(target, tmp -> {
            try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(tmp, StandardOpenOption.TRUNCATE_EXISTING), 1 << 16)) {
                body.writeTo(out);
            }
        });
    }

    /**
     * The general form, for libraries that write to a path themselves (netCDF-Java): the body writes the
     * temporary file, which is then flushed to disk and renamed over the target.
     */
    public static void writeWith(Path target, PathBody body) throws IOException {
        Path abs = target.toAbsolutePath();
        Path parent = abs.getParent();
        Path tmp = null;
        try {
            Files.createDirectories(parent);
            tmp = Files.createTempFile(parent, "." + abs.getFileName() + ".", TMP_SUFFIX);
            body.writeTo(tmp);
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE)) {
                ch.force(true);
            }
            shareable(tmp);
            try {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (AccessDeniedException | NotDirectoryException | FileAlreadyExistsException e) {
            throw unwritable(target, e);
        } catch (FileSystemException e) {
            if (e.getReason() != null && e.getReason().toLowerCase(java.util.Locale.ROOT).contains("read-only")) {
                throw unwritable(target, e);
            }
            throw new IOException("cannot write " + target + ": " + reason(e), e);
        } finally {
            if (tmp != null) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    private static UserInputException unwritable(Path target, FileSystemException e) {
        String why = e instanceof AccessDeniedException ? "permission denied"
                : e instanceof NotDirectoryException || e instanceof FileAlreadyExistsException ? "a part of the path is a file, not a folder"
                : reason(e);
        return new UserInputException("cannot write " + target + " (" + why + (e.getFile() != null && !e.getFile().equals(target.toString())
                ? ": " + e.getFile() : "") + "); choose an output folder you can write to (--out DIR)", e);
    }

    private static String reason(FileSystemException e) {
        return e.getReason() != null ? e.getReason() : e.getClass().getSimpleName();
    }

    /**
     * Temporary files are created owner-only (rw-------); outputs are meant to be read by colleagues too, so the
     * file gets the usual rw-r--r-- before it is renamed into place (no-op off POSIX file systems).
     */
    private static void shareable(Path tmp) throws IOException {
        if (tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(tmp, PosixFilePermissions.fromString("rw-r--r--"));
        }
    }
}
