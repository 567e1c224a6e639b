package tetrapod.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import tetrapod.common.OutputException;

/**
 * The check, before any work, that a single output file (a sized spec, a picture, a history) can
 * be written: its folder exists or can be created, it is no folder itself, and the folder is not
 * being replaced by a running analysis. Leftover temporary files of killed runs in the folder are
 * removed. The file itself is then written by {@link AtomicFiles}.
 */
public final class OutputFiles {

    private OutputFiles() { }

    public static void check(Path file) throws OutputException {
        Path target = file.toAbsolutePath().normalize();
        Path folder = target.getParent();
        if (Files.isDirectory(target)) {
            throw new OutputException(file + " is a folder: give a file name");
        }
        OutputFolder.createFolder(folder);
        try {
            if (!Files.isWritable(folder)) {
                throw new OutputException("cannot write into " + folder + ": permission denied");
            }
            if (folder.getParent() != null) {
                Optional<Long> owner = FolderLock.runningOwner(FolderLock.fileOf(folder));
                if (owner.isPresent()) {
                    throw new OutputException(folder + " is being written by another analysis (process " + owner.get()
                            + "); wait for it to finish or write " + file.getFileName() + " elsewhere");
                }
            }
            Leftovers.cleanFiles(folder);
        } catch (IOException e) {
            throw new OutputException("cannot write into " + folder + ": " + OutputFolder.reason(e), e);
        }
    }
}
