package tetrapod.batch;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import tetrapod.common.BadInputException;
import tetrapod.common.OutputException;
import tetrapod.io.AtomicFiles;
import tetrapod.io.FolderLock;
import tetrapod.io.JsonOutput;
import tetrapod.io.PlainJson;

/**
 * The folder of a fleet run: {@value #MARKER} says a batch run owns it; {@code work/<hash>.json}
 * holds each finished piece of work, so that a resumed run skips it; {@code scenarios/<scenario>/}
 * the patched models; {@code reports/<tower>/<scenario>/} the reports when asked for; and the summary.
 * A folder that holds anything else, or another run's results without {@code --resume}, is refused.
 * The run holds the folder's lock ({@link FolderLock}, {@code <folder>.lock} beside it) from open to
 * close, so that a second run on the same folder is refused while the first works.
 */
public final class RunFolder implements AutoCloseable {

    static final String MARKER = "batch.json";
    static final String FORMAT = "tetrapod-batch/1";

    private final Path root;
    private final FolderLock lock;

    private RunFolder(Path root, FolderLock lock) {
        this.root = root;
        this.lock = lock;
    }

    /** Opens {@code folder} for a run; {@code resume} allows one that holds an earlier run's results. */
    public static RunFolder open(Path folder, boolean resume, Path manifest, String program)
            throws BadInputException, OutputException, IOException {
        if (Files.exists(folder) && !Files.isDirectory(folder)) {
            throw BadInputException.at("-o", folder + " is a file, not a folder: choose a folder with -o");
        }
        Path absolute = folder.toAbsolutePath().normalize();
        if (absolute.getParent() == null) {
            throw BadInputException.at("-o", absolute + " is the root of the file system: choose a folder below it");
        }
        Files.createDirectories(absolute.getParent());
        FolderLock lock = FolderLock.take(absolute);
        try {
            return open(folder, resume, manifest, program, lock);
        } catch (BadInputException | IOException | RuntimeException e) {
            lock.close();
            throw e;
        }
    }

    private static RunFolder open(Path folder, boolean resume, Path manifest, String program, FolderLock lock)
            throws BadInputException, IOException {
        boolean empty = !Files.exists(folder);
        if (!empty) {
            try (Stream<Path> entries = Files.list(folder)) {
                empty = entries.findAny().isEmpty();
            }
        }
        Path marker = folder.resolve(MARKER);
        if (!empty && !Files.isRegularFile(marker)) {
            throw BadInputException.at("-o", folder + " holds files that no batch run wrote: choose a new or empty"
                    + " folder with -o");
        }
        if (!empty && !resume) {
            // the Spark job opens folders too and has no --resume: the advice names the command that has it
            throw BadInputException.at("-o", folder + " holds the results of an earlier batch run: choose a new"
                    + " folder with -o, or finish that run with 'tetrapod batch ... --resume'");
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("format", FORMAT);
        m.put("program", program);
        m.put("manifest", manifest.toAbsolutePath().normalize().toString());
        JsonOutput.write(marker, m);
        Files.createDirectories(folder.resolve("work"));
        return new RunFolder(folder, lock);
    }

    /** Releases the folder for the next run. */
    @Override
    public void close() throws IOException {
        lock.close();
    }

    public Path root() {
        return root;
    }

    /** Where the patched model of {@code tower} under {@code scenario} is written. */
    Path patchedModel(String scenario, String towerId) {
        return root.resolve("scenarios").resolve(scenario).resolve(towerId + ".json");
    }

    /** The report folder of {@code tower} under {@code scenario}, relative to the run's folder. */
    static String reportLink(String towerId, String scenario) {
        return "reports/" + towerId + "/" + scenario;
    }

    /** A finished piece of work, if an earlier run recorded one. */
    Optional<Outcome> finished(String hash) {
        Path file = root.resolve("work").resolve(hash + ".json");
        if (!Files.isRegularFile(file)) {
            return Optional.empty();
        }
        try {
            return Optional.of(Outcome.fromMap((Map<?, ?>) PlainJson.read(file)));
        } catch (BadInputException | RuntimeException unreadable) {
            return Optional.empty(); // not what this program writes: the work is done again
        }
    }

    void record(String hash, Outcome outcome) throws IOException {
        JsonOutput.write(root.resolve("work").resolve(hash + ".json"), outcome.toMap());
    }

    void writePatched(Path file, byte[] bytes) throws IOException {
        AtomicFiles.writeBytes(file, bytes);
    }

}
