package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    @Test
    void writesAndReplaces(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("out/deeper/results.json");
        AtomicFiles.writeString(file, "first");
        assertEquals("first", Files.readString(file));
        AtomicFiles.writeString(file, "second, longer ·");
        assertEquals("second, longer ·", Files.readString(file));
        AtomicFiles.writeBytes(file, new byte[] {1, 2, 3});
        assertArrayEquals(new byte[] {1, 2, 3}, Files.readAllBytes(file));
        assertEquals(List.of(file), listing(file.getParent()));
    }

    @Test
    void aFailedWriteLeavesTheOldFileAndNoTemporary(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("report.html");
        AtomicFiles.writeString(file, "old");
        IOException e = assertThrows(IOException.class, () -> AtomicFiles.writeText(file, out -> {
            out.write("half of the new");
            throw new IOException("disk full");
        }));
        assertEquals("disk full", e.getMessage());
        assertEquals("old", Files.readString(file));
        assertEquals(List.of(file), listing(dir));
    }

    @Test
    void jsonOutputWritesThroughIt(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("a.json");
        JsonOutput.write(file, List.of(1, 2));
        assertEquals("[1, 2]\n", Files.readString(file));
    }

    private static List<Path> listing(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.sorted().toList();
        }
    }
}
