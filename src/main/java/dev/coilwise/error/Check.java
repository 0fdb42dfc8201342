package dev.coilwise.error;

import java.math.BigDecimal;
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
            throw BadInputException.of(Message.NOT_POSITIVE, name, fmt(value), unit(unit));
        }
        return value;
    }

    /** Checks value ≥ 0 and finite. */
    public static double nonNegative(String name, double value, String unit) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw BadInputException.of(Message.NEGATIVE, name, fmt(value), unit(unit));
        }
        return value;
    }

    /** Checks min ≤ value ≤ max (a NaN fails). */
    public static double inRange(String name, double value, double min, double max, String unit) {
        if (!(value >= min && value <= max)) {
            throw BadInputException.of(Message.OUT_OF_RANGE, name, fmt(min), fmt(max), unit(unit), fmt(value), unit(unit));
        }
        return value;
    }

    public static <T> T notNull(String name, T value) {
        if (value == null) {
            throw BadInputException.of(Message.MISSING, name);
        }
        return value;
    }

    /** A number to six significant digits without trailing zeros: "0.002", "150", "2.5E-9". */
    static String fmt(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        BigDecimal b = new BigDecimal(String.format(Locale.ROOT, "%.6g", v)).stripTrailingZeros();
        double a = Math.abs(v);
        return a == 0 || (a >= 1e-4 && a < 1e7) ? b.toPlainString() : b.toString();
    }

    /** The unit as it follows a number in a message: " m", or nothing for a dimensionless value. */
    static String unit(String unit) {
        return unit == null || unit.isBlank() ? "" : " " + unit.strip();
    }
}
