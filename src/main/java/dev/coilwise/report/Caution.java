package dev.coilwise.report;

/** The safety caution every user-facing output carries. */
public final class Caution {
    /** One line, for headers and chart footers. */
    public static final String TEXT = "Design aid only: springs store energy; confirm the design by test. Local codes, "
            + "standards and licensed engineering practice govern.";

    private Caution() {
    }
}
