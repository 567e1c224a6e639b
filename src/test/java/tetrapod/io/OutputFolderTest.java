package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.common.OutputException;
import tetrapod.testing.EndedProcess;

/** One run's outputs as a unit: checked before, staged beside, swapped in whole, never mixed. */
class OutputFolderTest {

    private static final Set<String> OUTPUTS = Set.of("results.json", "report.html");
    private static final String NONCE = "0123456789abcdef";

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void aNewFolderAppearsWholeAndNothingIsLeftBeside(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("tower");
        try (OutputFolder set = OutputFolder.open(out, OUTPUTS)) {
            assertFalse(Files.exists(out), "nothing in place before the commit");
            assertEquals(set.staging().getParent(), dir, "staged beside the folder, on the same file system");
            assertTrue(Files.readString(dir.resolve("tower.lock")).startsWith(ProcessHandle.current().pid() + " "));
            Files.writeString(set.staging().resolve("results.json"), "{}");
            Files.writeString(set.staging().resolve("report.html"), "<html>");
            set.commit();
        }
        assertEquals(List.of("report.html", "results.json"), names(out));
        assertEquals(List.of("tower"), names(dir), "no staging folder, old folder or lock left");
    }

    @Test
    void aReplacedFolderNeverMixesRunsButKeepsFilesTheRunDoesNotWrite(@TempDir Path dir) throws Exception {
        Path out = Files.createDirectory(dir.resolve("tower"));
        Files.writeString(out.resolve("results.json"), "old");
        Files.writeString(out.resolve("report.html"), "old report");
        Files.writeString(out.resolve("size-history.json"), "history");
        try (OutputFolder set = OutputFolder.open(out, OUTPUTS)) {
            assertEquals("history", Files.readString(set.staging().resolve("size-history.json")),
                    "carried into the new set before the run writes, so the report can read it");
            Files.writeString(set.staging().resolve("results.json"), "new");
            assertEquals("old", Files.readString(out.resolve("results.json")), "the old set stays until the commit");
            set.commit();
        }
        assertEquals(List.of("results.json", "size-history.json"), names(out), "the old report.html is gone with its run");
        assertEquals("new", Files.readString(out.resolve("results.json")));
        assertEquals(List.of("tower"), names(dir));
    }

    @Test
    void aRunThatFailsLeavesThePreviousSetUntouched(@TempDir Path dir) throws Exception {
        Path out = Files.createDirectory(dir.resolve("tower"));
        Files.writeString(out.resolve("results.json"), "old");
        try (OutputFolder set = OutputFolder.open(out, OUTPUTS)) {
            Files.writeString(set.staging().resolve("results.json"), "half");
        }
        assertEquals("old", Files.readString(out.resolve("results.json")));
        assertEquals(List.of("tower"), names(dir));
    }

    @Test
    void aFolderInUseByARunningAnalysisIsRefusedAndAStaleLockIsTakenOver(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("tower");
        try (OutputFolder first = OutputFolder.open(out, OUTPUTS)) {
            OutputException e = assertThrows(OutputException.class, () -> OutputFolder.open(out, OUTPUTS));
            assertTrue(e.getMessage().contains("in use by another tetrapod run (process " + ProcessHandle.current().pid()),
                    e.getMessage());
            assertThrows(OutputException.class, () -> OutputFiles.check(out.resolve("tower.png")),
                    "a single file is not written into a folder being replaced either");
        }
        Files.writeString(dir.resolve("tower.lock"), EndedProcess.pid() + " 0");
        try (OutputFolder again = OutputFolder.open(out, OUTPUTS)) {
            again.commit();
        }
        assertFalse(Files.exists(dir.resolve("tower.lock")));
    }

    @Test
    void leftoversOfDeadRunsAreRemovedAndThoseOfLiveRunsKept(@TempDir Path dir) throws Exception {
        long dead = EndedProcess.pid();
        long live = ProcessHandle.current().pid();
        Path out = Files.createDirectory(dir.resolve("tower"));
        Files.writeString(out.resolve("results.json"), "old");
        Files.writeString(out.resolve(".report.html." + dead + "-123-0.tmp"), "half");
        Files.writeString(out.resolve(".report.html." + live + "-123-0.tmp"), "being written");
        Files.createDirectories(dir.resolve("tower.tmp-" + dead + "-" + NONCE).resolve("x"));
        Files.createDirectories(dir.resolve("tower.tmp-" + live + "-" + NONCE));
        Files.createDirectories(dir.resolve("towers.tmp-" + dead + "-" + NONCE));
        try (OutputFolder set = OutputFolder.open(out, OUTPUTS)) {
            assertFalse(Files.exists(dir.resolve("tower.tmp-" + dead + "-" + NONCE)));
            assertTrue(Files.exists(dir.resolve("tower.tmp-" + live + "-" + NONCE)), "a live run's staging stays");
            assertTrue(Files.exists(dir.resolve("towers.tmp-" + dead + "-" + NONCE)), "another folder's is not ours");
            assertFalse(Files.exists(out.resolve(".report.html." + dead + "-123-0.tmp")));
            assertTrue(Files.exists(out.resolve(".report.html." + live + "-123-0.tmp")));
            assertFalse(Files.exists(set.staging().resolve(".report.html." + live + "-123-0.tmp")), "temp files are not carried");
        }
    }

    @Test
    void aSetStrandedBetweenTheTwoRenamesIsPutBack(@TempDir Path dir) throws Exception {
        Path old = Files.createDirectory(dir.resolve("tower.old-" + EndedProcess.pid() + "-" + NONCE));
        Files.writeString(old.resolve("results.json"), "previous");
        Path out = dir.resolve("tower");
        try (OutputFolder set = OutputFolder.open(out, OUTPUTS)) {
            assertEquals("previous", Files.readString(out.resolve("results.json")));
        }
        assertEquals("previous", Files.readString(out.resolve("results.json")));
    }

    @Test
    void foldersThatCannotBeUsedAreRefusedWithThePathAndTheReason(@TempDir Path dir) throws Exception {
        Path file = Files.writeString(dir.resolve("plain.txt"), "x");
        OutputException onto = assertThrows(OutputException.class, () -> OutputFolder.open(file, OUTPUTS));
        assertEquals(file + " is a file, not a folder: choose a folder with -o", onto.getMessage());
        OutputException under = assertThrows(OutputException.class, () -> OutputFolder.open(file.resolve("sub/out"), OUTPUTS));
        assertTrue(under.getMessage().contains(file + " is a file"), under.getMessage());
        Path holding = Files.createDirectories(dir.resolve("mine").resolve("photos"));
        OutputException folders = assertThrows(OutputException.class, () -> OutputFolder.open(holding.getParent(), OUTPUTS));
        assertTrue(folders.getMessage().contains("holds the folder photos"), folders.getMessage());
        assertTrue(Files.exists(holding), "nothing of the user's is touched");
        assertEquals(List.of("mine", "plain.txt"), names(dir), "no lock or staging left by a refusal");
    }
}
