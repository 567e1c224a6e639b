package tetrapod.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Optional;
import tetrapod.common.OutputException;

/**
 * The claim of one run on an output folder: a file {@code <folder>.lock} beside the folder (the
 * folder itself is replaced) holding the process id and start time of its owner. A lock whose
 * owner no longer runs is stale and taken over. Used by analyze's output folder and by a batch
 * run's folder, so that two runs never work on one folder at once.
 */
public final class FolderLock implements AutoCloseable {

    private final Path file;

    private FolderLock(Path file) {
        this.file = file;
    }

    static Path fileOf(Path folder) {
        return folder.resolveSibling(folder.getFileName() + ".lock");
    }

    /** Takes the lock of {@code folder}, or fails naming the running owner. */
    public static FolderLock take(Path folder) throws OutputException, IOException {
        Path file = fileOf(folder);
        String mine = Processes.currentPid() + " " + Processes.currentStart();
        for (int attempt = 0; attempt < 5; attempt++) {
            try {
                Files.writeString(file, mine, StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW,
                        StandardOpenOption.WRITE, StandardOpenOption.SYNC);
                return new FolderLock(file);
            } catch (FileAlreadyExistsException e) {
                Optional<Long> owner = runningOwner(file);
                if (owner.isPresent()) {
                    throw new OutputException(folder + " is in use by another tetrapod run (process " + owner.get()
                            + ", lock " + file + "); wait for it to finish or choose another folder with -o");
                }
                takeOverStale(file);
            }
        }
        throw new OutputException("cannot take the lock " + file + ": other runs keep taking it");
    }

    /** The pid of a running process that holds the lock file, if any. */
    static Optional<Long> runningOwner(Path lock) throws IOException {
        String text;
        try {
            text = Files.readString(lock, StandardCharsets.UTF_8).strip();
        } catch (NoSuchFileException e) {
            return Optional.empty();
        }
        String[] parts = text.split(" ");
        long pid;
        long start;
        try {
            pid = Long.parseLong(parts[0]);
            start = parts.length > 1 ? Long.parseLong(parts[1]) : 0;
        } catch (NumberFormatException e) {
            // a lock being written this very moment is empty: held while it is young
            boolean young = Files.getLastModifiedTime(lock).toMillis() > System.currentTimeMillis() - 10_000;
            return text.isEmpty() && young ? Optional.of(-1L) : Optional.empty();
        }
        return Processes.isAlive(pid, start) ? Optional.of(pid) : Optional.empty();
    }

    /** Moves a stale lock aside in one step, so that of two runs taking it over only one succeeds. */
    private static void takeOverStale(Path lock) throws IOException {
        Path aside = lock.resolveSibling(lock.getFileName() + ".stale-" + Processes.currentPid() + "-" + System.nanoTime());
        try {
            Files.move(lock, aside, StandardCopyOption.ATOMIC_MOVE);
        } catch (NoSuchFileException e) {
            return; // another run took it over first
        }
        if (runningOwner(aside).isPresent()) {
            // another run took the stale lock over between our look and our move: give it back
            try {
                Files.createLink(lock, aside);
            } catch (FileAlreadyExistsException | UnsupportedOperationException e) {
                // a third run holds it now, or links are not supported: the other run will find its lock gone
            }
        }
        Files.deleteIfExists(aside);
    }

    @Override
    public void close() throws IOException {
        Files.deleteIfExists(file);
    }
}
