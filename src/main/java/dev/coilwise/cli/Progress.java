package dev.coilwise.cli;

import dev.coilwise.scatter.ScatterProgress;
import java.io.PrintWriter;

/** A one-line progress bar on standard error, drawn only for a person at a terminal and only after a second. */
final class Progress implements ScatterProgress {
    /** Wait before the bar appears, ns: short runs print nothing. */
    static final long DELAY_NS = 1_000_000_000L;
    private static final int WIDTH = 30;

    private final PrintWriter err;
    private final String label;
    private final boolean terminal;
    private final long delayNs;
    private final long start = System.nanoTime();
    private boolean drawn;

    Progress(PrintWriter err, boolean terminal) {
        this(err, "sweep", terminal, DELAY_NS);
    }

    Progress(PrintWriter err, String label, boolean terminal) {
        this(err, label, terminal, DELAY_NS);
    }

    Progress(PrintWriter err, boolean terminal, long delayNs) {
        this(err, "sweep", terminal, delayNs);
    }

    Progress(PrintWriter err, String label, boolean terminal, long delayNs) {
        this.err = err;
        this.label = label;
        this.terminal = terminal;
        this.delayNs = delayNs;
    }

    /** Shows that {@code done} of {@code total} steps are finished. */
    synchronized void update(long done, long total) {
        if (!terminal || System.nanoTime() - start < delayNs) {
            return;
        }
        int filled = (int) (WIDTH * done / Math.max(1, total));
        err.print("\r" + label + " [" + "#".repeat(filled) + " ".repeat(WIDTH - filled) + "] " + done + "/" + total);
        err.flush();
        drawn = true;
    }

    @Override
    public void advanced(long done, long total) {
        update(done, total);
    }

    /** Ends the bar's line, if one was drawn. */
    synchronized void finish() {
        if (drawn) {
            err.println();
            err.flush();
            drawn = false;
        }
    }
}
