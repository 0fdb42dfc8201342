package dev.coilwise.testing;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;

/**
 * jqwik generators of broken input files: a valid file (a shipped example, a template, a demo catalogue) with one to
 * four mutations, each on one line picked at random, so that every mutant is still mostly right and reaches deep
 * into the readers. YAML mutations: delete, rename or duplicate a key, swap a unit, scale a number by up to 10⁴ either
 * way, put an extreme or non-finite number, garbage text or a value of the wrong type, insert a YAML construct (anchor, alias, tag, merge key, second
 * document), change the indentation. CSV mutations: delete, duplicate or cut a row, change a cell to an extreme
 * number, garbage or a formula, add or drop a delimiter, insert quotes and control characters.
 */
public final class TextMutations {
    /** Keys of the requirement format, for renames that land on another valid key. */
    static final List<String> KEYS = List.of("title", "job", "load", "mass", "weight", "motion", "drop_height", "speed",
            "direction", "drive_force", "launch", "height", "losses", "limits", "stroke", "peak_force", "deceleration",
            "envelope", "bore", "rod", "clearance", "max_free_length", "pocket_length", "spring", "materials", "ends", "index",
            "active_coils", "clash_allowance", "solid_safe", "set_removed", "seating", "wire_series", "cycles",
            "shot_peened", "fatigue_margin", "tolerance_grade", "stock", "ranking", "by", "shortlist", "prefer",
            "dynamics", "min_probability");
    static final List<String> UNITS = List.of("mm", "m", "km", "in", "ft", "N", "kN", "lbf", "kg", "g", "t", "lb", "gn",
            "m/s", "km/h", "m/s^2", "%", "deg", "°", "rad", "N/mm", "MPa", "dm", "kgf", "furlong", "MM", "", " ", "mm mm");
    static final List<String> NUMBERS = List.of("0", "-0", "-1", "1e308", "1e-320", "1e400", "-1e400", "NaN", ".nan",
            ".inf", "-.inf", "Infinity", "99999999999999999999", "0.0000001", "1_000", "0x1F", "0o17", "1e", ".", "+",
            "2.5", "1.0e+3", "٣", "１２");
    static final List<String> VALUES = List.of("[1, 2]", "{a: 1}", "true", "no", "", "~", "null", "- x", "'quoted'",
            "\"45 mm\"", "[]", "{}", "[[[[]]]]", "&a 45 mm", "*a", "!!str 45 mm", "!!binary aGVsbG8=", "|\n  block",
            "\"\\u001b[31mred\"", "\"a\\0b\"", "'''", "\"", "[", "{", "@x", "`x`", "%x", "? x");
    static final List<String> LINES = List.of("---", "...", "%YAML 1.2", "<<: *x", "x: &a [1, 2]", "y: *a",
            "!!python/object:os.system", "? [a]\n: b", "  - item", "stroke: 30 mm", "job: launch", "\t", "# comment",
            "spring: {materials: [music-wire]}", "ranking:\n  shortlist: 100", "title: |\n  two\n  lines");
    static final List<String> CELLS = List.of("", "0", "-1", "1e400", "NaN", "=1+1", "+SUM(A1)", "-2", "@x",
            "\"unclosed", "\"a,b\"", "a\"b", "\u001b[2J", "music-wire", "closed", "squared", "1,5", " ", "\t=1", "１２");

    private TextMutations() {
    }

    /** A requirement or spring file with one to four mutations. */
    public static Arbitrary<String> yaml(List<String> bases) {
        Arbitrary<UnaryOperator<String>> one = Arbitraries.oneOf(List.of(
                line().map(i -> t -> deleteLine(t, i)),
                Combinators.combine(line(), Arbitraries.oneOf(Arbitraries.of(KEYS), Arbitraries.strings().ofMaxLength(8)),
                        Arbitraries.integers().between(0, 5)).as((i, k, how) -> t -> renameKey(t, i, k, how)),
                Combinators.combine(line(), Arbitraries.of(UNITS)).as((i, u) -> t -> swapUnit(t, i, u)),
                Combinators.combine(line(), Arbitraries.of(NUMBERS)).as((i, n) -> t -> replaceNumber(t, i, n)),
                Combinators.combine(line(), Arbitraries.of(1e-4, 1e-3, 0.01, 0.1, 0.5, 2.0, 10.0, 100.0, 1000.0, 1e4))
                        .as((i, f) -> t -> scaleNumber(t, i, f)),
                Combinators.combine(line(), Arbitraries.oneOf(Arbitraries.of(VALUES), Arbitraries.strings().ofMaxLength(24)))
                        .as((i, v) -> t -> replaceValue(t, i, v)),
                line().map(i -> t -> duplicateLine(t, i)),
                Combinators.combine(line(), Arbitraries.of(LINES)).as((i, l) -> t -> insertLine(t, i, l)),
                Combinators.combine(line(), Arbitraries.integers().between(-4, 4)).as((i, d) -> t -> reindent(t, i, d))));
        return Combinators.combine(Arbitraries.of(bases), one.list().ofMinSize(1).ofMaxSize(4)).as((base, ms) -> {
            String text = base;
            for (UnaryOperator<String> m : ms) {
                text = m.apply(text);
            }
            return text;
        });
    }

    /** A catalogue CSV with one to four mutations. */
    public static Arbitrary<String> csv(List<String> bases) {
        Arbitrary<UnaryOperator<String>> one = Arbitraries.oneOf(List.of(
                line().map(i -> t -> deleteLine(t, i)),
                line().map(i -> t -> duplicateLine(t, i)),
                Combinators.combine(line(), Arbitraries.integers().between(0, 40),
                        Arbitraries.oneOf(Arbitraries.of(CELLS), Arbitraries.strings().ofMaxLength(12)))
                        .as((i, c, v) -> t -> replaceCell(t, i, c, v)),
                Combinators.combine(line(), Arbitraries.integers().between(0, 200)).as((i, at) -> t -> cut(t, i, at)),
                Combinators.combine(line(), Arbitraries.of(",", ";", "\"", "\t", "\n", "\r", "#", "\u0000", "\ufeff"),
                        Arbitraries.integers().between(0, 200)).as((i, s, at) -> t -> insertAt(t, i, at, s))));
        return Combinators.combine(Arbitraries.of(bases), one.list().ofMinSize(1).ofMaxSize(4)).as((base, ms) -> {
            String text = base;
            for (UnaryOperator<String> m : ms) {
                text = m.apply(text);
            }
            return text;
        });
    }

    private static Arbitrary<Integer> line() {
        return Arbitraries.integers().between(0, 10_000);
    }

    private static List<String> lines(String t) {
        return new ArrayList<>(List.of(t.split("\n", -1)));
    }

    private static String join(List<String> lines) {
        return String.join("\n", lines);
    }

    static String deleteLine(String t, int i) {
        List<String> l = lines(t);
        l.remove(i % l.size());
        return join(l);
    }

    static String duplicateLine(String t, int i) {
        List<String> l = lines(t);
        int at = i % l.size();
        l.add(at, l.get(at));
        return join(l);
    }

    static String insertLine(String t, int i, String line) {
        List<String> l = lines(t);
        l.add(i % (l.size() + 1), line);
        return join(l);
    }

    private static final Pattern KEY = Pattern.compile("^(\\s*(?:- )?)([A-Za-z_]+)(\\s*:.*)$");

    static String renameKey(String t, int i, String other, int how) {
        List<String> l = lines(t);
        int at = i % l.size();
        Matcher m = KEY.matcher(l.get(at));
        if (m.matches()) {
            String k = m.group(2);
            String renamed = switch (how) {
                case 0 -> k.substring(0, k.length() - 1);
                case 1 -> k + "s";
                case 2 -> k.toUpperCase(java.util.Locale.ROOT);
                case 3 -> k.replace('_', '-');
                default -> other;
            };
            l.set(at, m.group(1) + renamed + m.group(3));
        }
        return join(l);
    }

    private static final Pattern UNIT = Pattern.compile("([0-9.])\\s*([A-Za-z%°/^²]+)");

    static String swapUnit(String t, int i, String unit) {
        List<String> l = lines(t);
        int at = i % l.size();
        l.set(at, UNIT.matcher(l.get(at)).replaceFirst("$1 " + Matcher.quoteReplacement(unit)));
        return join(l);
    }

    private static final Pattern NUMBER = Pattern.compile("-?[0-9]+(?:\\.[0-9]*)?(?:[eE][+-]?[0-9]+)?");

    static String replaceNumber(String t, int i, String n) {
        List<String> l = lines(t);
        int at = i % l.size();
        l.set(at, NUMBER.matcher(l.get(at)).replaceFirst(Matcher.quoteReplacement(n)));
        return join(l);
    }

    /** Multiplies the first number of the line: extreme values that are still in range reach deep into sizing. */
    static String scaleNumber(String t, int i, double f) {
        List<String> l = lines(t);
        int at = i % l.size();
        Matcher m = NUMBER.matcher(l.get(at));
        if (m.find()) {
            String scaled = String.valueOf(Double.parseDouble(m.group()) * f);
            l.set(at, l.get(at).substring(0, m.start()) + scaled + l.get(at).substring(m.end()));
        }
        return join(l);
    }

    static String replaceValue(String t, int i, String v) {
        List<String> l = lines(t);
        int at = i % l.size();
        String line = l.get(at);
        int colon = line.indexOf(':');
        if (colon >= 0 && !line.strip().startsWith("#")) {
            l.set(at, line.substring(0, colon + 1) + " " + v);
        }
        return join(l);
    }

    static String reindent(String t, int i, int delta) {
        List<String> l = lines(t);
        int at = i % l.size();
        String line = l.get(at);
        l.set(at, delta >= 0 ? " ".repeat(delta) + line : line.substring(Math.min(-delta, line.length() - line.stripLeading().length())));
        return join(l);
    }

    static String replaceCell(String t, int i, int cell, String v) {
        List<String> l = lines(t);
        int at = i % l.size();
        List<String> cells = new ArrayList<>(List.of(l.get(at).split(",", -1)));
        cells.set(cell % cells.size(), v);
        l.set(at, String.join(",", cells));
        return join(l);
    }

    static String cut(String t, int i, int at) {
        List<String> l = lines(t);
        int row = i % l.size();
        String line = l.get(row);
        l.set(row, line.substring(0, Math.min(at, line.length())));
        return join(l);
    }

    static String insertAt(String t, int i, int at, String s) {
        List<String> l = lines(t);
        int row = i % l.size();
        String line = l.get(row);
        int pos = Math.min(at, line.length());
        l.set(row, line.substring(0, pos) + s + line.substring(pos));
        return join(l);
    }
}
