package org.littoral.scenarios.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;

/** Write-then-rename, so a reader (or a resumed sweep) never sees a half-written file. */
public final class AtomicFiles {
    private AtomicFiles() {
    }

    public static void write(Path target, byte[] content) throws IOException {
        Path abs = target.toAbsolutePath();
        Path parent = abs.getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Path tmp = Files.createTempFile(parent, "." + abs.getFileName(), ".tmp");
        try {
            Files.write(tmp, content);
            shareable(tmp);
            try {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * Temp files are created owner-only (rw-------); outputs are meant to be read by others too, so give
     * the temp file the usual rw-r--r-- before it is renamed into place (no-op off POSIX file systems).
     */
    public static void shareable(Path tmp) throws IOException {
        try {
            Files.setPosixFilePermissions(tmp, PosixFilePermissions.fromString("rw-r--r--"));
        } catch (UnsupportedOperationException e) {
            // not a POSIX file system: keep the platform default
        }
    }

    public static void writeString(Path target, String content) throws IOException {
        write(target, content.getBytes(StandardCharsets.UTF_8));
    }
}
