package dev.coilwise.error;

import java.util.Locale;

/**
 * Argument checks that return the value they checked, so they fit inside record constructors. A NaN or infinite
 * value fails every range check with the message of that range, so the user always reads what is allowed.
 */
public final class Check {
    private Check() {
    }

    public static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw BadInputException.of(Message.NOT_FINITE, name, value);
        }
        return value;
    }

    /** Checks value &gt; 0 and finite; {@code unit} is only used in the message. */
    public static double positive(String name, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw BadInputException.of(Message.NOT_POSITIVE, name, fmt(value), unit);
        }
        return value;
    }

    /** Checks value ≥ 0 and finite. */
    public static double nonNegative(String name, double value, String unit) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw BadInputException.of(Message.NEGATIVE, name, fmt(value), unit);
        }
        return value;
    }

    /** Checks min ≤ value ≤ max (a NaN fails). */
    public static double inRange(String name, double value, double min, double max, String unit) {
        if (!(value >= min && value <= max)) {
            throw BadInputException.of(Message.OUT_OF_RANGE, name, fmt(min), fmt(max), unit, fmt(value), unit);
        }
        return value;
    }

    public static <T> T notNull(String name, T value) {
        if (value == null) {
            throw BadInputException.of(Message.MISSING, name);
        }
        return value;
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
