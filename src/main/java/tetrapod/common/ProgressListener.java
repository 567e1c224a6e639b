package tetrapod.common;

/** How long work tells the outside world how far it has come. The core never prints. */
@FunctionalInterface
public interface ProgressListener {

    ProgressListener NONE = (task, done, total) -> { };

    /** {@code done} of {@code total} steps of {@code task} are finished. */
    void progress(String task, long done, long total);
}
