package org.littoral.scenarios.run;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes a file so that readers see either the old or the complete new content: temp file, then rename. */
public final class AtomicWrite {
    private AtomicWrite() {
    }

    public static void write(Path target, byte[] content) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        org.littoral.scenarios.report.AtomicFiles.write(target, content);
    }
}
