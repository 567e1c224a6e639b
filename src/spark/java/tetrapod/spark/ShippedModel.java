package tetrapod.spark;

import java.io.IOException;
import java.io.Serializable;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import tetrapod.batch.Outcome;
import tetrapod.cli.TowerAnalysis;

/**
 * A piece of work as it travels to an executor: the bytes of the model file the plain batch would
 * analyse (the tower's own file, or its patched model), that file's name, and how a row's message
 * names it. The executor needs no access to the run's files.
 */
record ShippedModel(String fileName, String shown, byte[] bytes) implements Serializable {

    /**
     * Analyses the model as analyze does it, from a file of the same name and bytes in a folder of
     * its own (so that the line numbers of its problems are those of the original file).
     */
    Outcome analyse() {
        try {
            Path folder = Files.createTempDirectory("tetrapod-fleet-");
            Path model = folder.resolve(fileName);
            try {
                Files.write(model, bytes);
                return TowerAnalysis.outcome(model, shown);
            } finally {
                Files.deleteIfExists(model);
                Files.deleteIfExists(folder);
            }
        } catch (IOException e) {
            // the executor's own disk, not the model: Spark runs the task again, elsewhere if it can
            throw new UncheckedIOException("cannot write the model " + shown + " to a local temporary file", e);
        }
    }
}
