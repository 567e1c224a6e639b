package tetrapod.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes files so that a reader sees either the old file or the complete new one, never a
 * half-written one: the content goes to a hidden temporary file in the same directory, is
 * flushed to disk, and is then moved over the target in one step.
 */
public final class AtomicFiles {

    /** Writes characters to the file (UTF-8). */
    @FunctionalInterface
    public interface TextContent {
        void writeTo(Writer out) throws IOException;
    }

    /** Writes bytes to the file. */
    @FunctionalInterface
    public interface ByteContent {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFiles() { }

    /** Replaces {@code target} with {@code text} in UTF-8; creates missing parent directories. */
    public static void writeString(Path target, String text) throws IOException {
        writeText(target, out -> out.write(text));
    }

    /** Replaces {@code target} with {@code bytes}; creates missing parent directories. */
    public static void writeBytes(Path target, byte[] bytes) throws IOException {
        writeStream(target, out -> out.write(bytes));
    }

    /** Replaces {@code target} with what {@code content} writes, in UTF-8. */
    public static void writeText(Path target, TextContent content) throws IOException {
        writeStream(target, stream -> {
            Writer writer = new BufferedWriter(new OutputStreamWriter(stream, StandardCharsets.UTF_8));
            content.writeTo(writer);
            writer.flush();
        });
    }

    /** Replaces {@code target} with what {@code content} writes. */
    public static void writeStream(Path target, ByteContent content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path directory = absolute.getParent();
        Files.createDirectories(directory);
        Path temporary = createTemporary(directory, absolute.getFileName().toString());
        boolean moved = false;
        try {
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE)) {
                OutputStream stream = Channels.newOutputStream(channel);
                content.writeTo(stream);
                stream.flush();
                channel.force(true);
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                // a file system without atomic rename: still replace, as near to atomic as it allows
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
        } finally {
            if (!moved) {
                Files.deleteIfExists(temporary);
            }
        }
    }

    /** A new empty file beside the target, with the directory's ordinary permissions. */
    private static Path createTemporary(Path directory, String name) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path candidate = directory.resolve("." + name + "." + ProcessHandle.current().pid()
                    + "-" + System.nanoTime() + "-" + attempt + ".tmp");
            try {
                Files.newOutputStream(candidate, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
                return candidate;
            } catch (FileAlreadyExistsException e) {
                // another writer chose the same name: try the next one
            }
        }
    }
}
