package dev.coilwise.requirement;

import dev.coilwise.error.Message;
import java.util.Map;
import java.util.Optional;

/**
 * The largest (and for lengths and masses the smallest) value coilwise accepts for each quantity of a requirement or
 * spring file. The bounds are coilwise's own choice, not published figures: each lies well beyond what a helical
 * compression spring coiled from the wires of the material table (0.1 to 12.7 mm) could serve, so a value past
 * one is a slip of the number or the unit (a drop of 30 km, a 10 t load written as 10 kt, a stroke of 45 m for
 * 45 mm) and is refused with the bound rather than searched. They are listed in {@code docs/requirement-format.md}
 * and in the description of each key in {@code docs/requirement.schema.json}.
 */
final class Magnitudes {
    /**
     * Bounds of one key, SI.
     *
     * @param min     smallest value accepted (0: any value above zero allowed by the key's sign rule)
     * @param max     largest value accepted
     * @param minText {@code min} as shown in messages
     * @param maxText {@code max} as shown in messages
     * @param what    the quantity, for "the largest drop height coilwise accepts"
     */
    record Bound(double min, double max, String minText, String maxText, String what) {
        /** The problem with {@code value} (SI) written as {@code text}, or empty when it lies within the bounds. */
        Optional<String> check(double value, String text) {
            if (value > max) {
                return Optional.of(Message.TOO_LARGE.format(Shown.value(text), maxText, what));
            }
            if (value < min) {
                return Optional.of(Message.TOO_SMALL.format(Shown.value(text), minText, what));
            }
            return Optional.empty();
        }
    }

    /** Smallest length accepted anywhere, m: 0.01 mm, a tenth of the thinnest wire in the material table. */
    static final double MIN_LENGTH = 1e-5;
    private static final String MIN_LENGTH_TEXT = "0.01 mm";

    private static final Map<String, Bound> BOUNDS = Map.ofEntries(
            // requirement files
            Map.entry("load.mass", new Bound(1e-4, 1e4, "0.1 g", "10 t (22000 lb)", "load mass")),
            Map.entry("load.weight", new Bound(1e-3, 1e5, "0.001 N", "100 kN (22500 lbf)", "load weight")),
            Map.entry("motion.drop_height", length(10, "10 m (32.8 ft)", "drop height")),
            Map.entry("motion.speed", new Bound(1e-6, 50, "0.001 mm/s", "50 m/s (164 ft/s)", "contact speed")),
            Map.entry("motion.drive_force", new Bound(0, 1e6, "", "1 MN (225000 lbf)", "drive force")),
            Map.entry("launch.height", length(100, "100 m (328 ft)", "launch height")),
            Map.entry("limits.stroke", length(1, "1 m (39.4 in)", "stroke")),
            Map.entry("limits.peak_force", new Bound(0, 1e6, "", "1 MN (225000 lbf)", "peak force")),
            Map.entry("limits.deceleration", new Bound(0, 1e4 * 9.80665, "", "10000 gn", "deceleration")),
            Map.entry("envelope.bore", length(1, "1 m (39.4 in)", "bore")),
            Map.entry("envelope.rod", length(1, "1 m (39.4 in)", "rod diameter")),
            Map.entry("envelope.clearance", new Bound(0, 0.1, "", "100 mm (3.94 in)", "clearance")),
            Map.entry("envelope.max_free_length", length(5, "5 m (16.4 ft)", "free length")),
            Map.entry("envelope.pocket_length", length(5, "5 m (16.4 ft)", "pocket length")),
            // spring files
            Map.entry("mean_diameter", length(1, "1 m (39.4 in)", "mean coil diameter")),
            Map.entry("outer_diameter", length(1, "1 m (39.4 in)", "outer coil diameter")),
            Map.entry("free_length", length(5, "5 m (16.4 ft)", "free length")));

    private Magnitudes() {
    }

    private static Bound length(double max, String maxText, String what) {
        return new Bound(MIN_LENGTH, max, MIN_LENGTH_TEXT, maxText, what);
    }

    /** The bounds of a dotted key, if it has any. */
    static Optional<Bound> of(String key) {
        return Optional.ofNullable(BOUNDS.get(key));
    }

    /** Every bounded key, for tests and the documentation. */
    static Map<String, Bound> all() {
        return BOUNDS;
    }
}
