package dev.coilwise.error;

import java.util.Locale;

/**
 * Every message template of the library in one place. Each names the quantity, the value found and what is allowed.
 * Placeholders are {@link String#format} specifiers; {@code MessageTest} checks their count against {@link #arity()}.
 */
public enum Message {
    NOT_FINITE("%s must be a finite number, got %s", 2),
    NOT_POSITIVE("%s must be greater than zero, got %s %s", 3),
    NEGATIVE("%s must not be negative, got %s %s", 3),
    OUT_OF_RANGE("%s must lie between %s and %s %s, got %s %s", 6),
    WIRE_OUT_OF_MATERIAL_RANGE("wire diameter %.3f mm is outside the range of %s (%.3f to %.3f mm); coilwise does not extrapolate a material fit", 4),
    UNKNOWN_MATERIAL("unknown material '%s'; known materials: %s", 2),
    UNKNOWN_KEY("unknown %s '%s'; allowed: %s", 3),
    INDEX_TOO_LOW("spring index C = D/d must exceed 0.75 for the curvature factor to be defined, got %s", 1),
    SOLID_EXCEEDS_FREE("free length %.3f mm must exceed the solid length %.3f mm", 2),
    NO_SEPARATION("the spring cannot throw the payload: stored energy %.4g J does not exceed the work against gravity over the stroke", 1),
    CATALOG_MAPPING_INVALID("%s: the column mapping has %d problem(s):%n%s", 3),
    CATALOG_MISSING_FIELD("no column for %s (%s); expected one of: %s", 3),
    CATALOG_EMPTY_VALUE("%s is required but the cell is empty", 1),
    CATALOG_BAD_NUMBER("%s must be a number in %s, got '%s'", 3),
    CATALOG_RAGGED_ROW("row has %d fields but the header has %d", 2),
    CATALOG_STATED_DIFFERS("stated %s %.4g %s differs from the computed %.4g %s by %.0f %% (more than %.0f %%); the part is evaluated with the computed value", 7),
    CATALOG_INVALID("%s: %d error(s); nothing was imported (fix the rows, or read the catalogue leniently to skip them):%n%s", 3);

    private final String template;
    private final int arity;

    Message(String template, int arity) {
        this.template = template;
        this.arity = arity;
    }

    public String template() {
        return template;
    }

    public int arity() {
        return arity;
    }

    public String format(Object... args) {
        if (args.length != arity) {
            throw new InternalFaultException("message " + name() + " takes " + arity + " arguments, got " + args.length);
        }
        return String.format(Locale.ROOT, template, args);
    }
}
