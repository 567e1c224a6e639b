package tetrapod.cli;

import java.io.PrintStream;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import tetrapod.common.ProgressListener;

/**
 * Progress of long work as a bar with an estimate of the time left, on the terminal's error
 * stream: one bar per task that has more than one step, closed when the next task starts or when
 * this is closed. Quiet (nothing at all) when asked, or when there is no terminal, as in CI or
 * when the output is piped.
 */
final class ProgressBars implements ProgressListener, AutoCloseable {

    private final PrintStream terminal;
    private ProgressBar bar;
    private String task;

    private ProgressBars(PrintStream terminal) {
        this.terminal = terminal;
    }

    /** A listener that draws bars on a terminal, or none when {@code quiet} or when there is no terminal. */
    static ProgressBars forCommand(boolean quiet) {
        return new ProgressBars(quiet || System.console() == null ? null : System.err);
    }

    /** Whether this draws nothing. */
    boolean quiet() {
        return terminal == null;
    }

    @Override
    public void progress(String name, long done, long total) {
        if (terminal == null || total <= 1) {
            return;
        }
        if (bar == null || !name.equals(task)) {
            close();
            task = name;
            bar = new ProgressBarBuilder().setTaskName(name).setInitialMax(total).setStyle(ProgressBarStyle.ASCII)
                    .setUpdateIntervalMillis(200).setConsumer(new ConsoleProgressBarConsumer(terminal))
                    .build();
        }
        bar.stepTo(done);
    }

    @Override
    public void close() {
        if (bar != null) {
            bar.close();
            bar = null;
            task = null;
        }
    }
}
