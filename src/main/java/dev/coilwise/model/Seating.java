package dev.coilwise.model;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import java.util.Arrays;
import java.util.stream.Collectors;

/**
 * How the spring's ends are held, which sets the end-condition constant α of the buckling check
 * (Shigley's MED 9th ed., Sec. 10-10, from memory).
 */
public enum Seating {
    /** Both ends on flat parallel plates: α = 0.5. */
    FLAT_FLAT("flat-flat", 0.5),
    /** One end on a flat plate, the other pivoted: α = 0.707. */
    FLAT_PIVOT("flat-pivot", 0.707),
    /** Both ends pivoted: α = 1. */
    PIVOT_PIVOT("pivot-pivot", 1.0),
    /** One end clamped, the other free: α = 2. */
    FREE("free", 2.0);

    private final String key;
    private final double alpha;

    Seating(String key, double alpha) {
        this.key = key;
        this.alpha = alpha;
    }

    public String key() {
        return key;
    }

    /** End-condition constant α. */
    public double alpha() {
        return alpha;
    }

    public static Seating fromKey(String key) {
        for (Seating s : values()) {
            if (s.key.equals(key)) {
                return s;
            }
        }
        throw BadInputException.of(Message.UNKNOWN_KEY, "seating", key,
                Arrays.stream(values()).map(Seating::key).collect(Collectors.joining(", ")));
    }
}
