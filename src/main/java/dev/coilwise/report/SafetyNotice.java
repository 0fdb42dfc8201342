package dev.coilwise.report;

/** The caution every output carries. */
public final class SafetyNotice {
    /** One line for terminals and CSV comments. */
    public static final String LINE = "CAUTION: springs store energy, and launched payloads and failing buffers can hurt"
            + " people. These results are a design aid: confirm them by test; local codes, standards and licensed"
            + " engineering practice govern.";

    private SafetyNotice() {
    }
}
