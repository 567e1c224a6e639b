package tetrapod.io;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Removes what runs that were killed left behind, recognised by name, and only when the process
 * named in it no longer runs: hidden {@code .<file>.<pid>-<nanos>-<n>.tmp} files of
 * {@link AtomicFiles}, and {@code <folder>.tmp-<pid>-<nonce>} and {@code <folder>.old-<pid>-<nonce>}
 * folders of {@link OutputFolder}. A previous output set caught between its two renames (the folder
 * missing, its {@code .old} copy present) is put back in place.
 */
final class Leftovers {

    /** The temporary file name AtomicFiles uses: {@code .results.json.12345-678901234-0.tmp}. */
    static final Pattern TEMP_FILE = Pattern.compile("\\..+\\.(\\d+)-\\d+-\\d+\\.tmp");

    private Leftovers() { }

    /** {@code <name>.tmp-<pid>-<nonce>} or {@code <name>.old-<pid>-<nonce>}. */
    static Pattern folderPattern(String name) {
        return Pattern.compile(Pattern.quote(name) + "\\.(tmp|old)-(\\d+)-[0-9a-f]{16}");
    }

    /** Deletes the temporary files of dead processes in {@code dir} (nothing when it does not exist). */
    static void cleanFiles(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return;
        }
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(dir)) {
            for (Path p : entries) {
                Matcher m = TEMP_FILE.matcher(p.getFileName().toString());
                if (m.matches() && Files.isRegularFile(p) && !Processes.isAlive(Long.parseLong(m.group(1)), 0)) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    /** Cleans the staging and old folders of dead runs beside {@code target}; puts a stranded old set back. */
    static void cleanFolders(Path target) throws IOException {
        Path parent = target.getParent();
        Pattern pattern = folderPattern(target.getFileName().toString());
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(parent)) {
            for (Path p : entries) {
                Matcher m = pattern.matcher(p.getFileName().toString());
                if (!m.matches() || !Files.isDirectory(p) || Processes.isAlive(Long.parseLong(m.group(2)), 0)) {
                    continue;
                }
                if (m.group(1).equals("old") && !Files.exists(target)) {
                    Files.move(p, target, StandardCopyOption.ATOMIC_MOVE);
                } else {
                    deleteTree(p);
                }
            }
        }
    }

    /** Deletes a folder and everything under it (symbolic links are removed, not followed). */
    static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
