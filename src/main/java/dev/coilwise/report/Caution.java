package dev.coilwise.report;

/** The safety caution every user-facing output carries. */
public final class Caution {
    /** One paragraph, plain text. */
    public static final String TEXT = "Caution: springs store energy. A launched payload or a failing buffer can "
            + "injure people. These figures are a design aid, not a certification: confirm the design by test in its "
            + "application before use. Local codes, standards and licensed engineering practice govern.";

    private Caution() {
    }
}
