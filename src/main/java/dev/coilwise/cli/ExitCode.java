package dev.coilwise.cli;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.CoilwiseException;

/** The exit codes of every coilwise command. */
public final class ExitCode {
    /** Success: the job was done (for size: at least one feasible design). */
    public static final int OK = 0;
    /** Internal fault: a bug or an unexpected state; the message says what, --debug shows the stack trace. */
    public static final int INTERNAL = 1;
    /** Bad input: a file or option is wrong or contradicts itself. Nothing is written. */
    public static final int BAD_INPUT = 2;
    /** A valid requirement that no design meets (or a checked spring that fails a limit). */
    public static final int NOTHING_FEASIBLE = 3;

    /** Help-section text listing the codes. */
    public static final String[] LIST = {
        "0:Success.",
        "1:Internal fault (a bug); run with --debug for the stack trace.",
        "2:Bad input: a file or option is wrong; nothing was written.",
        "3:Valid requirement, but no design meets every limit (a diagnosis is printed and written)."};

    private ExitCode() {
    }

    /**
     * The one line printed for an internal fault: what kind of fault and its message, on one line whatever the
     * message holds, and where to look next.
     */
    public static String faultLine(Throwable t, boolean debug) {
        String what = t instanceof StackOverflowError ? "ran out of stack space"
                : t instanceof OutOfMemoryError ? "ran out of memory (give Java more with -Xmx, e.g. java -Xmx2g -jar ...)"
                : t.getClass().getSimpleName() + (t.getMessage() == null ? "" : ": " + t.getMessage());
        String line = what.replaceAll("[\\r\\n\\t]+", " ").strip();
        if (line.length() > MAX_FAULT_CHARS) {
            line = line.substring(0, MAX_FAULT_CHARS - 3) + "...";
        }
        return "internal fault: " + line + (debug ? "" : " (a bug in coilwise; run again with --debug for the details)");
    }

    /** Longest fault message printed, characters. */
    static final int MAX_FAULT_CHARS = 300;

    /** Maps an exception to its exit code. */
    public static int of(Throwable t) {
        if (t instanceof BadInputException) {
            return BAD_INPUT;
        }
        if (t instanceof CoilwiseException) {
            return INTERNAL;
        }
        return INTERNAL;
    }
}
