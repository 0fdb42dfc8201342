package dev.coilwise.cli;

import dev.coilwise.scatter.ScatterProgress;
import java.io.PrintWriter;

/**
 * A progress bar on standard error, shown only when standard error is a terminal and the work has run for more than
 * a second.
 */
final class Progress implements ScatterProgress {
    private static final long DELAY_NANOS = 1_000_000_000L;
    private final PrintWriter err;
    private final String label;
    private final long start = System.nanoTime();
    private final boolean terminal;
    private boolean shown;

    Progress(PrintWriter err, String label) {
        this.err = err;
        this.label = label;
        this.terminal = System.console() != null;
    }

    @Override
    public synchronized void advanced(long done, long total) {
        if (!terminal || System.nanoTime() - start < DELAY_NANOS || total <= 0) {
            return;
        }
        int width = 30;
        int filled = (int) (width * done / total);
        err.print("\r" + label + " [" + "#".repeat(filled) + " ".repeat(width - filled) + "] "
                + (100 * done / total) + " %");
        shown = true;
        if (done >= total) {
            err.println();
        }
        err.flush();
    }

    /** Ends the bar's line if one was drawn and not finished. */
    synchronized void close() {
        if (shown) {
            err.print("\r");
            err.flush();
        }
    }
}
