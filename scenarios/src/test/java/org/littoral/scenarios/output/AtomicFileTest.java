package org.littoral.scenarios.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.input.UserInputException;

class AtomicFileTest {
    @TempDir
    Path dir;

    @Test
    void aWriteReplacesTheOldContentAndLeavesNoTemporaryFile() throws Exception {
        Path f = dir.resolve("sub/out.csv");
        AtomicFile.writeString(f, "old\n");
        AtomicFile.writeString(f, "new\n");
        assertEquals("new\n", Files.readString(f));
        try (Stream<Path> s = Files.list(f.getParent())) {
            assertEquals(1, s.count());
        }
    }

    @Test
    void aFailingBodyKeepsTheOldFileAndRemovesItsTemporaryFile() throws Exception {
        Path f = dir.resolve("out.csv");
        AtomicFile.writeString(f, "complete\n");
        assertThrows(IOException.class, () -> AtomicFile.writeText(f, w -> {
            w.write("half");
            throw new IOException("disk trouble");
        }));
        assertEquals("complete\n", Files.readString(f));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(1, s.count());
        }
    }

    @Test
    void aTargetBelowAFileGivesOneLineNamingTheFileAndTheFix() throws Exception {
        Path file = dir.resolve("not-a-folder");
        Files.writeString(file, "x");
        Path target = file.resolve("summary.json");
        UserInputException e = assertThrows(UserInputException.class, () -> AtomicFile.writeString(target, "{}"));
        assertTrue(e.getMessage().contains(target.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("--out"), e.getMessage());
        assertFalse(e.getMessage().contains("\n"), e.getMessage());
    }
}
