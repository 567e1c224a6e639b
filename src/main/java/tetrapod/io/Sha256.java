package tetrapod.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** The SHA-256 digest of a file's bytes, as 64 lower-case hex digits (FIPS 180-4). */
public final class Sha256 {

    private Sha256() { }

    public static String of(Path file) throws IOException {
        return of(Files.readAllBytes(file));
    }

    public static String of(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
