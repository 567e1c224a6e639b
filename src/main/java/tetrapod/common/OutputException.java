package tetrapod.common;

/**
 * An output cannot be written where it was asked for: the folder cannot be created, is a file,
 * is not writable, is in use by another run, or a write failed. The message names the path and
 * the reason.
 */
public final class OutputException extends Exception {

    public OutputException(String message) {
        super(message);
    }

    public OutputException(String message, Throwable cause) {
        super(message, cause);
    }
}
