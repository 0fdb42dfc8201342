package dev.coilwise.error;

import java.util.Locale;

/**
 * Every message template of the library in one place. Each names the quantity, the value found and what is allowed.
 * Placeholders are {@link String#format} specifiers; {@code MessageTest} checks their count against {@link #arity()}.
 * A unit placeholder follows its number directly: callers pass the unit with its leading blank (see {@code Check}).
 */
public enum Message {
    NOT_FINITE("%s must be a finite number, got %s", 2),
    NOT_POSITIVE("%s must be a finite number greater than zero, got %s%s", 3),
    NEGATIVE("%s must be a finite number of zero or more, got %s%s", 3),
    OUT_OF_RANGE("%s must lie between %s and %s%s, got %s%s", 6),
    MISSING("%s is required", 1),
    WIRE_OUT_OF_MATERIAL_RANGE("wire diameter %.3f mm is outside the range of %s (%.3f to %.3f mm); coilwise does not extrapolate a material fit", 4),
    UNKNOWN_MATERIAL("unknown material '%s'; known materials: %s", 2),
    UNKNOWN_KEY("unknown %s '%s'; allowed: %s", 3),
    INDEX_TOO_LOW("spring index C = D/d must exceed 0.75 for the curvature factor to be defined, got %s", 1),
    SPRING_INDEX_TOO_LOW("spring index C = D/d must exceed 1 (the inner diameter D - d must be positive), got %s", 1),
    WAHL_INDEX_TOO_LOW("spring index C = D/d must exceed 1 for the Wahl factor to be defined, got %s", 1),
    SOLID_EXCEEDS_FREE("free length %.3f mm must exceed the solid length %.3f mm", 2),
    NO_SEPARATION("the spring cannot throw the payload: stored energy %.4g J does not exceed the work against gravity over the stroke", 1);

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

    /** The filled-in message. */
    public String format(Object... args) {
        if (args.length != arity) {
            throw new InternalFaultException("message " + name() + " takes " + arity + " arguments, got " + args.length);
        }
        return String.format(Locale.ROOT, template, args);
    }
}
