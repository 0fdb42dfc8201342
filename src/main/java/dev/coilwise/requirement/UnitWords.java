package dev.coilwise.requirement;

import java.util.Collection;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Unit names written out in full, or abbreviated with a full stop, that people put where a symbol belongs ("inches"
 * for in, "newtons" for N). coilwise reads symbols only, in requirement files and catalogues alike; these words give the
 * "did you mean" hint, since edit distance alone cannot tie "inches" to "in".
 */
public final class UnitWords {
    private static final Map<String, String> SYMBOLS = Map.ofEntries(
            Map.entry("inch", "in"), Map.entry("inches", "in"), Map.entry("in.", "in"),
            Map.entry("foot", "ft"), Map.entry("feet", "ft"), Map.entry("ft.", "ft"),
            Map.entry("millimetre", "mm"), Map.entry("millimetres", "mm"), Map.entry("millimeter", "mm"),
            Map.entry("millimeters", "mm"), Map.entry("centimetre", "cm"), Map.entry("centimetres", "cm"),
            Map.entry("centimeter", "cm"), Map.entry("centimeters", "cm"), Map.entry("metre", "m"),
            Map.entry("metres", "m"), Map.entry("meter", "m"), Map.entry("meters", "m"),
            Map.entry("newton", "N"), Map.entry("newtons", "N"), Map.entry("kilonewton", "kN"),
            Map.entry("kilonewtons", "kN"), Map.entry("pound-force", "lbf"), Map.entry("pounds-force", "lbf"),
            Map.entry("pound", "lb"), Map.entry("pounds", "lb"), Map.entry("lbs", "lb"),
            Map.entry("gram", "g"), Map.entry("grams", "g"), Map.entry("kilogram", "kg"), Map.entry("kilograms", "kg"),
            Map.entry("kilo", "kg"), Map.entry("kilos", "kg"), Map.entry("degree", "deg"), Map.entry("degrees", "deg"),
            Map.entry("percent", "%"), Map.entry("megapascal", "MPa"), Map.entry("megapascals", "MPa"));

    private UnitWords() {
    }

    /** The symbol that {@code word} names (case, spacing and underscores ignored), if any. */
    public static Optional<String> symbolFor(String word) {
        return Optional.ofNullable(SYMBOLS.get(word.strip().toLowerCase(Locale.ROOT).replace('_', '-')));
    }

    /**
     * The "did you mean" hint for a unit: the symbol the word names when it is allowed here, otherwise the nearest
     * allowed symbol by spelling ({@link Suggest#hint}).
     */
    public static String hint(String word, Collection<String> allowed) {
        return symbolFor(word).filter(allowed::contains).map(s -> " (did you mean '" + s + "'?)")
                .orElseGet(() -> Suggest.hint(word, allowed));
    }
}
