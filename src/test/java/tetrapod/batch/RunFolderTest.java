package tetrapod.batch;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.common.OutputException;
import tetrapod.testing.EndedProcess;

/** One run at a time on a batch folder: its lock is held from open to close. */
class RunFolderTest {

    private static final String PROGRAM = "tetrapod test";

    @Test
    void aSecondRunIsRefusedWhileTheFirstHoldsTheFolderAndMayGoOnAfter(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("run");
        Path manifest = Files.createDirectories(dir.resolve("towers"));
        try (RunFolder first = RunFolder.open(out, false, manifest, PROGRAM)) {
            assertTrue(Files.readString(dir.resolve("run.lock")).startsWith(ProcessHandle.current().pid() + " "));
            OutputException e = assertThrows(OutputException.class, () -> RunFolder.open(out, true, manifest, PROGRAM));
            assertTrue(e.getMessage().contains("in use by another tetrapod run (process " + ProcessHandle.current().pid()),
                    e.getMessage());
            assertFalse(e.getMessage().contains("\n"), "one line");
        }
        assertFalse(Files.exists(dir.resolve("run.lock")), "released at the end of the run");
        try (RunFolder again = RunFolder.open(out, true, manifest, PROGRAM)) {
            assertTrue(Files.isDirectory(again.root().resolve("work")));
        }
    }

    @Test
    void aStaleLockOfAnEndedRunIsTakenOver(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("run");
        Path manifest = Files.createDirectories(dir.resolve("towers"));
        Files.writeString(dir.resolve("run.lock"), EndedProcess.pid() + " 0");
        try (RunFolder taken = RunFolder.open(out, false, manifest, PROGRAM)) {
            assertTrue(Files.readString(dir.resolve("run.lock")).startsWith(ProcessHandle.current().pid() + " "));
        }
        assertFalse(Files.exists(dir.resolve("run.lock")));
    }

    @Test
    void aRefusedFolderDoesNotKeepTheLock(@TempDir Path dir) throws Exception {
        Path out = Files.createDirectories(dir.resolve("run"));
        Files.writeString(out.resolve("notes.txt"), "mine");
        Path manifest = Files.createDirectories(dir.resolve("towers"));
        assertThrows(tetrapod.common.BadInputException.class, () -> RunFolder.open(out, true, manifest, PROGRAM));
        assertFalse(Files.exists(dir.resolve("run.lock")));
    }
}
