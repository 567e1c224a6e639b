package tetrapod.cli;

import java.nio.file.Path;

/** Where output goes when the user does not say: {@code out/<model file name without .json>/}. */
final class OutputFolders {

    private OutputFolders() { }

    static Path forModel(Path model) {
        String file = model.getFileName().toString();
        String stem = file.endsWith(".json") ? file.substring(0, file.length() - 5) : file;
        return Path.of("out", stem);
    }
}
