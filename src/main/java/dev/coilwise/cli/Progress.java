package dev.coilwise.cli;

import java.io.PrintWriter;

/** A one-line progress bar on standard error, drawn only for a person at a terminal and only after a second. */
final class Progress {
    /** Wait before the bar appears, ns: short runs print nothing. */
    static final long DELAY_NS = 1_000_000_000L;
    private static final int WIDTH = 30;

    private final PrintWriter err;
    private final boolean terminal;
    private final long delayNs;
    private final long start = System.nanoTime();
    private boolean drawn;

    Progress(PrintWriter err, boolean terminal) {
        this(err, terminal, DELAY_NS);
    }

    Progress(PrintWriter err, boolean terminal, long delayNs) {
        this.err = err;
        this.terminal = terminal;
        this.delayNs = delayNs;
    }

    /** Shows that {@code done} of {@code total} steps are finished. */
    synchronized void update(int done, int total) {
        if (!terminal || System.nanoTime() - start < delayNs) {
            return;
        }
        int filled = (int) ((long) WIDTH * done / Math.max(1, total));
        err.print("\rsweep [" + "#".repeat(filled) + " ".repeat(WIDTH - filled) + "] " + done + "/" + total);
        err.flush();
        drawn = true;
    }

    /** Ends the bar's line, if one was drawn. */
    synchronized void finish() {
        if (drawn) {
            err.println();
            err.flush();
        }
    }
}
