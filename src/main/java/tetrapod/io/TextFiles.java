package tetrapod.io;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/** Reads the user's text files; a file that cannot be read is bad input, with a plain reason. */
final class TextFiles {

    private TextFiles() { }

    static String readUtf8(Path file) throws BadInputException {
        try {
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new BadInputException(Problem.at("$", "cannot read " + file + ": no such file"));
        } catch (CharacterCodingException e) {
            throw new BadInputException(Problem.at("$", "cannot read " + file + ": it is not UTF-8 text"));
        } catch (IOException e) {
            throw new BadInputException(Problem.at("$", "cannot read " + file + ": " + e.getMessage()));
        }
    }
}
