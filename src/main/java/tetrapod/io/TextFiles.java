package tetrapod.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

/**
 * Reads the user's text files, bounded: only a regular file (never a device such as /dev/zero, a
 * pipe or a socket, which could be read forever), no larger than a limit checked before reading
 * and again while reading; UTF-8, with or without a byte-order mark. A file that cannot be read
 * is bad input, with a plain reason.
 */
final class TextFiles {

    /**
     * The largest model file, bytes. A model written node by node takes about 250 bytes per member
     * with its share of nodes (the 660-member hilltop example: 168 kB from {@code tetrapod geometry}),
     * so 20 MB holds some 80,000 members, over ten times a large lattice tower, while the parsed
     * tree (a few times the text) stays far inside a default Java heap.
     */
    static final long MODEL_MAX_BYTES = 20_000_000;
    /**
     * The largest results or history file, bytes: results.json is much larger than its model (the
     * 660-member example writes 26 MB), and a tree of 1 GB of text needs a heap of several GB.
     */
    static final long RESULTS_MAX_BYTES = 1_000_000_000;

    private static final char BYTE_ORDER_MARK = '\uFEFF';

    private TextFiles() { }

    /** A model file's text. */
    static String readUtf8(Path file) throws BadInputException {
        return readUtf8(file, MODEL_MAX_BYTES, "model file");
    }

    /** The text of {@code file}, refused when it is no regular file or holds more than {@code maxBytes}. */
    static String readUtf8(Path file, long maxBytes, String kind) throws BadInputException {
        requireReadable(file, maxBytes, kind);
        try {
            byte[] bytes;
            try (InputStream in = Files.newInputStream(file)) {
                bytes = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, maxBytes + 1));
            }
            if (bytes.length > maxBytes) { // it grew while being read
                throw tooLarge(file, bytes.length, maxBytes, kind);
            }
            String text = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
            return !text.isEmpty() && text.charAt(0) == BYTE_ORDER_MARK ? text.substring(1) : text;
        } catch (NoSuchFileException e) {
            throw refusal(file, "no such file");
        } catch (CharacterCodingException e) {
            throw refusal(file, "it is not UTF-8 text");
        } catch (IOException e) {
            throw refusal(file, e.getMessage());
        }
    }

    /** Refuses a folder, a device, a missing file or one larger than {@code maxBytes}, each with its reason. */
    static void requireReadable(Path file, long maxBytes, String kind) throws BadInputException {
        if (Files.isDirectory(file)) {
            throw refusal(file, "it is a folder, not a " + kind);
        }
        if (Files.exists(file) && !Files.isRegularFile(file)) {
            throw refusal(file, "it is not a regular file (a device, pipe or socket); give a " + kind);
        }
        try {
            long size = Files.size(file);
            if (size > maxBytes) {
                throw tooLarge(file, size, maxBytes, kind);
            }
        } catch (NoSuchFileException e) {
            throw refusal(file, "no such file");
        } catch (IOException e) {
            throw refusal(file, e.getMessage());
        }
    }

    /** A file that cannot be read as it should, with the reason (bad input). */
    static BadInputException refusal(Path file, String reason) {
        return new BadInputException(Problem.at("$", "cannot read " + file + ": " + reason));
    }

    private static BadInputException tooLarge(Path file, long size, long maxBytes, String kind) {
        return refusal(file, String.format(Locale.ROOT, "%s is larger than the %s limit of a %s",
                megabytes(size), megabytes(maxBytes), kind));
    }

    private static String megabytes(long bytes) {
        return String.format(Locale.ROOT, "%.1f MB (%d bytes)", bytes / 1e6, bytes);
    }

}
