package tetrapod.cli;

import java.nio.file.Path;

/**
 * Where output goes when the user does not say: {@code out/<model file name without .json>/}. A name
 * made only of dots ({@code ...json}, {@code ..json}) would climb out of {@code out/}: it gets a
 * leading underscore.
 */
final class OutputFolders {

    private OutputFolders() { }

    static Path forModel(Path model) {
        return Path.of("out", stem(model));
    }

    /** The model file's name without {@code .json}, safe as one folder name. */
    static String stem(Path model) {
        Path name = model.getFileName();
        String file = name == null ? "" : name.toString();
        String stem = file.endsWith(".json") ? file.substring(0, file.length() - 5) : file;
        return stem.isEmpty() || stem.chars().allMatch(c -> c == '.') ? "_" + stem : stem;
    }
}
