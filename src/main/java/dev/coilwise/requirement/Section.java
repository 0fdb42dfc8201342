package dev.coilwise.requirement;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import dev.coilwise.requirement.YamlNode.Mapping;
import dev.coilwise.requirement.YamlNode.Position;
import dev.coilwise.requirement.YamlNode.Scalar;
import dev.coilwise.requirement.YamlNode.Sequence;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * Typed, position-aware access to one mapping of a file (the top level or a section such as {@code limits}). Every
 * accessor reports what is wrong to {@link Problems} under the dotted key and returns empty, so reading goes on and
 * all problems of a file are found in one pass. Keys not in the allowed list are reported when the section is made.
 */
final class Section {
    /** Sign rule for a quantity. */
    enum Sign { POSITIVE, NON_NEGATIVE, ANY }

    private static final Pattern NOT_FINITE = Pattern.compile("[+-]?\\.?(?:nan|inf|infinity)", Pattern.CASE_INSENSITIVE);

    private final String path;
    private final Mapping map;
    private final Position where;
    private final Problems problems;
    private final Map<String, Optional<Section>> children = new HashMap<>();

    Section(String path, Mapping map, Position where, Problems problems, List<String> allowed) {
        this.path = path;
        this.map = map;
        this.where = where;
        this.problems = problems;
        map.entries().forEach((k, e) -> {
            if (!allowed.contains(k)) {
                problems.add(e.keyPosition(), key(Shown.value(k)),
                        Message.UNKNOWN_FIELD.format(Shown.value(k), Suggest.hint(k, allowed), String.join(", ", allowed)));
            }
        });
    }

    Problems problems() {
        return problems;
    }

    /** The dotted key of {@code name} in this section. */
    String key(String name) {
        return path.isEmpty() ? name : path + "." + name;
    }

    /** Where the section starts (its key in the parent), for problems about missing keys. */
    Position where() {
        return where;
    }

    boolean has(String name) {
        return map.entries().containsKey(name);
    }

    /** Position of the value under {@code name}, or of the section when the key is absent. */
    Position at(String name) {
        YamlNode.Entry e = map.entries().get(name);
        return e == null ? where : e.value().position();
    }

    /** Position of the key {@code name} itself, or of the section when absent. */
    Position keyAt(String name) {
        YamlNode.Entry e = map.entries().get(name);
        return e == null ? where : e.keyPosition();
    }

    /** The text of a scalar value as written, for quoting in messages; empty string when absent. */
    String raw(String name) {
        YamlNode.Entry e = map.entries().get(name);
        return e != null && e.value() instanceof Scalar s ? Shown.value(s.text()) : "";
    }

    void problem(String name, String message) {
        problems.add(at(name), key(name), message);
    }

    void missing(String name, String what) {
        problems.add(where, key(name), Message.MISSING_FIELD.format(what));
    }

    Optional<YamlNode> node(String name) {
        YamlNode.Entry e = map.entries().get(name);
        return e == null ? Optional.empty() : Optional.of(e.value());
    }

    /** A nested section; a value that is not a mapping is reported. Asking again gives the same section, unreported. */
    Optional<Section> section(String name, List<String> allowed) {
        return children.computeIfAbsent(name, k -> child(k, allowed));
    }

    private Optional<Section> child(String name, List<String> allowed) {
        return node(name).flatMap(n -> {
            if (n instanceof Mapping m) {
                return Optional.of(new Section(key(name), m, keyAt(name), problems, allowed));
            }
            problem(name, Message.EXPECTED.format("keys " + String.join(", ", allowed), n.describe()));
            return Optional.empty();
        });
    }

    /** A scalar with non-empty text; lists, mappings and empty values are reported. */
    Optional<Scalar> scalar(String name, String expected) {
        return node(name).flatMap(n -> scalarOf(n, key(name), expected));
    }

    Optional<Scalar> scalarOf(YamlNode n, String key, String expected) {
        if (n instanceof Scalar s && !s.text().isBlank()) {
            return Optional.of(s);
        }
        problems.add(n.position(), key, Message.EXPECTED.format(expected, n.describe()));
        return Optional.empty();
    }

    Optional<String> text(String name) {
        return scalar(name, "text").map(s -> s.text().strip());
    }

    /** A quantity with its unit, in SI, checked for sign. Counts towards the file's unit system. */
    OptionalDouble quantity(String name, QuantityKind kind, Sign sign) {
        Optional<Quantities.Measured> m = measured(name, sign, kind);
        return m.isEmpty() ? OptionalDouble.empty() : OptionalDouble.of(m.get().value());
    }

    /** A quantity of any of {@code kinds}, with the kind it turned out to be. */
    Optional<Quantities.Measured> measured(String name, Sign sign, QuantityKind... kinds) {
        String expected = Arrays.stream(kinds).map(k -> k.description() + " such as " + k.examples())
                .collect(Collectors.joining(" or "));
        return node(name).flatMap(n -> scalarOf(n, key(name), expected)).flatMap(s -> measuredOf(s, key(name), sign, kinds));
    }

    OptionalDouble quantityOf(Scalar s, String key, QuantityKind kind, Sign sign) {
        Optional<Quantities.Measured> m = measuredOf(s, key, sign, kind);
        return m.isEmpty() ? OptionalDouble.empty() : OptionalDouble.of(m.get().value());
    }

    Optional<Quantities.Measured> measuredOf(Scalar s, String key, Sign sign, QuantityKind... kinds) {
        try {
            Quantities.Measured m = Quantities.measure(s.text(), kinds);
            problems.tally(m.system());
            boolean negative = m.value() < 0 || m.value() == 0 && Grammar.trim(s.text()).startsWith("-");
            if (sign == Sign.POSITIVE && (m.value() <= 0 || negative)) {
                problems.add(s.position(), key, Message.MUST_BE_POSITIVE.format(Shown.value(s.text())));
                return Optional.empty();
            }
            if (sign == Sign.NON_NEGATIVE && negative) {
                problems.add(s.position(), key, Message.MUST_NOT_BE_NEGATIVE.format(Shown.value(s.text())));
                return Optional.empty();
            }
            if (m.kind().dimensional()) {
                Optional<String> outOfBounds = Magnitudes.of(key).flatMap(b -> b.check(m.value(), s.text()));
                if (outOfBounds.isPresent()) {
                    problems.add(s.position(), key, outOfBounds.get());
                    return Optional.empty();
                }
            }
            return Optional.of(m);
        } catch (BadInputException e) {
            problems.add(s.position(), key, e.getMessage());
            return Optional.empty();
        }
    }

    /** A percentage within [min, max] (given as ratios, e.g. 0.95 for 95 %). */
    OptionalDouble fraction(String name, double min, double max) {
        OptionalDouble f = quantity(name, QuantityKind.FRACTION, Sign.NON_NEGATIVE);
        if (f.isPresent() && (f.getAsDouble() < min || f.getAsDouble() > max)) {
            problem(name, Message.NOT_IN_RANGE.format(plain(min * 100) + " %", plain(max * 100) + " %", raw(name)));
            return OptionalDouble.empty();
        }
        return f;
    }

    /** One of a fixed set of words. */
    Optional<String> choice(String name, List<String> allowed) {
        return scalar(name, "one of " + String.join(", ", allowed)).flatMap(s -> choiceOf(s, key(name), allowed));
    }

    /** One of a fixed set of words, written exactly (as the schema's enums require). */
    Optional<String> choiceOf(Scalar s, String key, List<String> allowed) {
        String v = s.text();
        if (allowed.contains(v)) {
            return Optional.of(v);
        }
        problems.add(s.position(), key, Message.NOT_A_CHOICE.format(Shown.value(v), Suggest.hint(v, allowed),
                String.join(", ", allowed)));
        return Optional.empty();
    }

    /** {@code true} or {@code false}. */
    Optional<Boolean> flag(String name) {
        return scalar(name, "true or false").flatMap(s -> {
            if (s.bool() != null) {
                return Optional.of(s.bool());
            }
            problem(name, Message.EXPECTED.format("true or false", s.describe()));
            return Optional.empty();
        });
    }

    /** A plain number (no unit) within [min, max]. */
    OptionalDouble number(String name, double min, double max) {
        return number(name, min, max, false);
    }

    private OptionalDouble number(String name, double min, double max, boolean whole) {
        Optional<Scalar> s = scalar(name, numberWords(min, max, whole));
        return s.isEmpty() ? OptionalDouble.empty() : numberOf(s.get(), key(name), min, max, whole);
    }

    OptionalDouble numberOf(Scalar s, String key, double min, double max) {
        return numberOf(s, key, min, max, false);
    }

    /** "a plain number from 1 to 1e10", "a whole number from 1 to 100". */
    private static String numberWords(double min, double max, boolean whole) {
        return (whole ? "a whole number" : "a plain number") + " from " + plain(min) + " to " + plain(max);
    }

    private OptionalDouble numberOf(Scalar s, String key, double min, double max, boolean whole) {
        String text = Grammar.trim(s.text());
        String words = numberWords(min, max, whole);
        if (!Grammar.NUMBER.matcher(text).matches()) {
            String what = NOT_FINITE.matcher(text).matches() ? Message.NOT_A_FINITE_NUMBER.format(Shown.value(text), words)
                    : Message.EXPECTED.format(words, s.describe());
            problems.add(s.position(), key, what);
            return OptionalDouble.empty();
        }
        double v = Double.parseDouble(text.replace("_", ""));
        if (!Double.isFinite(v)) {
            problems.add(s.position(), key, Message.NOT_A_FINITE_NUMBER.format(Shown.value(text), words));
            return OptionalDouble.empty();
        }
        if (v < min || v > max) {
            problems.add(s.position(), key, Message.NOT_IN_RANGE.format(plain(min), plain(max), Shown.value(s.text())));
            return OptionalDouble.empty();
        }
        if (whole && v != Math.rint(v)) {
            problems.add(s.position(), key, Message.EXPECTED.format(words, s.describe()));
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(v);
    }

    /** A whole number within [min, max]. */
    Optional<Integer> integer(String name, int min, int max) {
        OptionalDouble v = number(name, min, max, true);
        return v.isEmpty() ? Optional.empty() : Optional.of((int) v.getAsDouble());
    }

    /** The items of a list; a single scalar counts as a list of one. */
    Optional<List<YamlNode>> items(String name, String expected) {
        return node(name).flatMap(n -> {
            if (n instanceof Sequence seq) {
                return Optional.of(seq.items());
            }
            if (n instanceof Scalar s && !s.text().isBlank()) {
                return Optional.of(List.<YamlNode>of(s));
            }
            problem(name, Message.EXPECTED.format(expected, n.describe()));
            return Optional.empty();
        });
    }

    /** Builds a model record, turning a check it fails into a problem at {@code name} (the record's own checks). */
    <T> Optional<T> build(String name, Supplier<T> constructor) {
        try {
            return Optional.of(constructor.get());
        } catch (BadInputException e) {
            problems.add(name.isEmpty() ? where : at(name), name.isEmpty() ? path : key(name), e.getMessage());
            return Optional.empty();
        }
    }

    /** A number as people write it: 4, 0.5, 1e10 (not 4.0 or 10000000000). */
    static String plain(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e7) {
            return String.valueOf((long) v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            String digits = String.valueOf((long) Math.abs(v));
            String mantissa = digits.replaceAll("0+$", "");
            if (mantissa.length() == 1) {
                return (v < 0 ? "-" : "") + mantissa + "e" + (digits.length() - 1);
            }
            return String.valueOf((long) v);
        }
        return String.valueOf(v);
    }
}
