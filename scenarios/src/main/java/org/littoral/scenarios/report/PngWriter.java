package org.littoral.scenarios.report;

import java.io.IOException;
import java.nio.file.Path;
import org.littoral.scenarios.output.AtomicFile;

/** Writes figures as PNG files atomically (temporary file in the same folder, then rename). */
public final class PngWriter {
    private PngWriter() {
    }

    public static void write(Figure figure, Path target) throws IOException {
        AtomicFile.write(target, figure.toPngBytes());
    }
}
