package tetrapod.io;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;
import tetrapod.common.OutputException;

/**
 * The outputs of one run written as a unit. {@link #open} checks the folder before any work (it
 * can be created, is a folder, holds no sub-folder, is writable, no other running analysis holds
 * its lock), cleans up after killed runs and makes a staging folder {@code <folder>.tmp-<pid>-<nonce>}
 * beside it; the run writes every output there; {@link #commit} then swaps the staging folder in.
 *
 * <p>Guarantee: the folder holds either the previous complete set or the new complete set, never
 * a mix of two runs. Linux cannot rename a folder over a non-empty one, so the swap is two
 * atomic renames (old folder to {@code <folder>.old-<pid>-<nonce>}, staging folder to the folder);
 * between them, for a moment, the folder does not exist. A run killed then leaves the previous set
 * in the {@code .old} folder, and the next run on that folder puts it back before it starts. Files
 * in the old folder that this run does not write (e.g. size-history.json) are copied into the new set.
 */
public final class OutputFolder implements AutoCloseable {

    /**
     * Free space the file system must have before a run starts, bytes: a full disk is refused at
     * once; the smallest example writes 0.4 MB. A disk that fills during the writes fails the
     * commit, and the previous set stays in place.
     */
    static final long MIN_FREE_BYTES = 1_000_000;

    private static final SecureRandom NONCES = new SecureRandom();

    private final Path target;
    private final Path staging;
    private final FolderLock lock;
    private boolean committed;

    private OutputFolder(Path target, Path staging, FolderLock lock) {
        this.target = target;
        this.staging = staging;
        this.lock = lock;
    }

    /**
     * Prepares {@code folder} for a run that writes the files named {@code outputs}; fails with the
     * path and the reason when the folder cannot be used.
     */
    public static OutputFolder open(Path folder, Set<String> outputs) throws OutputException {
        Path target = folder.toAbsolutePath().normalize();
        if (target.getParent() == null) {
            throw new OutputException(folder + " cannot be an output folder: it is the root of the file system");
        }
        Path parent = target.getParent();
        createFolder(parent);
        if (Files.exists(target) && !Files.isDirectory(target)) {
            throw new OutputException(folder + " is a file, not a folder: choose a folder with -o");
        }
        FolderLock lock = null;
        try {
            long free = Files.getFileStore(parent).getUsableSpace();
            if (free < MIN_FREE_BYTES) {
                throw new OutputException(folder + " cannot be used as the output folder: only " + free
                        + " bytes free on its file system, " + MIN_FREE_BYTES + " needed to start");
            }
            lock = FolderLock.take(target);
            Leftovers.cleanFolders(target);
            List<Path> carried = carriedOver(folder, target, outputs);
            Path staging = parent.resolve(target.getFileName() + ".tmp-" + Processes.currentPid() + "-" + nonce());
            Files.createDirectory(staging);
            for (Path p : carried) {
                Files.copy(p, staging.resolve(p.getFileName()), StandardCopyOption.COPY_ATTRIBUTES);
            }
            return new OutputFolder(target, staging, lock);
        } catch (IOException e) {
            releaseQuietly(lock);
            throw new OutputException(folder + " cannot be used as the output folder: " + reason(e), e);
        } catch (OutputException e) {
            releaseQuietly(lock);
            throw e;
        }
    }

    /** Where the outputs go until {@link #commit}. */
    public Path staging() {
        return staging;
    }

    /** Swaps the staging folder in as the output folder. */
    public void commit() throws OutputException {
        try {
            if (!Files.exists(target)) {
                move(staging, target);
            } else {
                Path old = target.resolveSibling(target.getFileName() + ".old-" + Processes.currentPid() + "-" + nonce());
                move(target, old);
                try {
                    move(staging, target);
                } catch (IOException e) {
                    move(old, target);
                    throw e;
                }
                Leftovers.deleteTree(old);
            }
            committed = true;
        } catch (IOException e) {
            throw new OutputException("cannot put the outputs in place in " + target + ": " + reason(e), e);
        }
    }

    /** Removes the staging folder when the run did not commit, and releases the lock. */
    @Override
    public void close() throws OutputException {
        try {
            if (!committed && Files.exists(staging)) {
                Leftovers.deleteTree(staging);
            }
            lock.close();
        } catch (IOException e) {
            throw new OutputException("cannot clean up " + staging + ": " + reason(e), e);
        }
    }

    static void createFolder(Path dir) throws OutputException {
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            Path existing = dir;
            while (existing != null && !Files.exists(existing)) {
                existing = existing.getParent();
            }
            String reason = existing != null && !Files.isDirectory(existing) ? existing + " is a file" : reason(e);
            throw new OutputException("cannot create the folder " + dir + ": " + reason, e);
        }
    }

    /** The files of an existing folder that this run does not write; refuses a folder that holds folders. */
    private static List<Path> carriedOver(Path given, Path target, Set<String> outputs) throws IOException, OutputException {
        List<Path> carried = new ArrayList<>();
        if (!Files.isDirectory(target)) {
            return carried;
        }
        Leftovers.cleanFiles(target);
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(target)) {
            for (Path p : entries) {
                String name = p.getFileName().toString();
                if (Files.isDirectory(p)) {
                    throw new OutputException(given + " holds the folder " + name + ", which analyze did not write; "
                            + "an output folder is replaced as a whole: choose a new or empty folder with -o");
                }
                if (!outputs.contains(name) && !Leftovers.TEMP_FILE.matcher(name).matches()) {
                    carried.add(p);
                }
            }
        }
        return carried;
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    private static String nonce() {
        byte[] bytes = new byte[8];
        NONCES.nextBytes(bytes);
        return HexFormat.of().formatHex(bytes);
    }

    private static void releaseQuietly(FolderLock lock) {
        if (lock != null) {
            try {
                lock.close();
            } catch (IOException ignored) {
                // the lock names this process: the next run takes it over as stale
            }
        }
    }

    /** The reason of an I/O failure for a person: the OS's words and the path it concerns. */
    static String reason(IOException e) {
        if (e instanceof FileSystemException fs) {
            String what = fs.getReason() != null ? fs.getReason()
                    : e instanceof java.nio.file.AccessDeniedException ? "permission denied" : e.getClass().getSimpleName();
            return (fs.getFile() != null ? fs.getFile() + ": " : "") + what;
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }
}
