package dev.coilwise.requirement;

import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * The text the reader accepts for quantities and plain numbers, written once as regular expressions that are also
 * the patterns of the requirement schema ({@code docs/requirement.schema.json}; a test checks they are the same
 * text). The expressions use only what Java and ECMAScript regular expressions share, since editors check the
 * schema with the latter.
 */
final class Grammar {
    /** Blanks allowed around a number and its unit: space, tab, line ends and the no-break and thin spaces. */
    static final String SPACE = "[ \\t\\n\\r\\u00a0\\u2009\\u202f]";
    /** A decimal number: digits with an optional fraction, or a fraction alone, and an optional exponent. */
    static final String DECIMAL = "(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?";
    /** A plain number as the reader accepts it: optional sign, '_' between digits allowed (YAML 1.1 style). */
    static final String PLAIN_NUMBER = "[+-]?(?:[0-9][0-9_]*(?:\\.[0-9_]*)?|\\.[0-9][0-9_]*)(?:[eE][+-]?[0-9]+)?";

    /** A number, then its unit; groups: 1 the number with its sign, 2 the unit text. */
    static final Pattern NUMBER_THEN_UNIT = Pattern.compile(SPACE + "*([+-]?" + DECIMAL + ")" + SPACE + "*(.*?)" + SPACE + "*",
            Pattern.DOTALL);
    /** A plain number, blanks around it allowed. */
    static final Pattern NUMBER = Pattern.compile(SPACE + "*(" + PLAIN_NUMBER + ")" + SPACE + "*");

    private Grammar() {
    }

    /** The text with the blanks of {@link #SPACE} removed from both ends. */
    static String trim(String text) {
        int from = 0;
        int to = text.length();
        while (from < to && blank(text.charAt(from))) {
            from++;
        }
        while (to > from && blank(text.charAt(to - 1))) {
            to--;
        }
        return text.substring(from, to);
    }

    private static boolean blank(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\u00a0' || c == '\u2009' || c == '\u202f';
    }

    /**
     * The schema pattern of a quantity of {@code kind}: a number and one of the kind's units, nothing else. Only
     * angles may carry a minus sign; every other quantity of a requirement is zero or more.
     */
    static String quantityPattern(QuantityKind kind) {
        String sign = kind == QuantityKind.ANGLE ? "[+-]?" : "\\+?";
        String units = kind.units().stream().map(Grammar::escape).collect(Collectors.joining("|"));
        return "^" + SPACE + "*" + sign + DECIMAL + SPACE + "*(?:" + units + ")" + SPACE + "*$";
    }

    /** The schema pattern of a plain number written as text. */
    static String numberPattern() {
        return "^" + SPACE + "*" + PLAIN_NUMBER + SPACE + "*$";
    }

    private static String escape(String unit) {
        return unit.replaceAll("([\\\\^$.|?*+()\\[\\]{}])", "\\\\$1");
    }
}
