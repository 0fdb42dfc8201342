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
import java.util.stream.Collectors;

/**
 * Typed, position-aware access to one mapping of a file (the top level or a section such as {@code limits}). Every
 * accessor reports what is wrong to {@link Problems} under the dotted key and returns empty, so reading goes on and
 * all problems of a file are found in one pass. Keys not in the allowed list are reported when the section is made.
 */
final class Section {
    /** Sign rule for a quantity. */
    enum Sign { POSITIVE, NON_NEGATIVE, ANY }

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
                problems.add(e.keyPosition(), key(k),
                        Message.UNKNOWN_FIELD.format(k, Suggest.hint(k, allowed), String.join(", ", allowed)));
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
        return e != null && e.value() instanceof Scalar s ? s.text() : "";
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
            if (sign == Sign.POSITIVE && m.value() <= 0) {
                problems.add(s.position(), key, Message.MUST_BE_POSITIVE.format(s.text()));
                return Optional.empty();
            }
            if (sign == Sign.NON_NEGATIVE && m.value() < 0) {
                problems.add(s.position(), key, Message.MUST_NOT_BE_NEGATIVE.format(s.text()));
                return Optional.empty();
            }
            return Optional.of(m);
        } catch (BadInputException e) {
            problems.add(s.position(), key, e.getMessage());
            return Optional.empty();
        }
    }

    /** A percentage within [min, max] (given as ratios, e.g. 0.95 for 95 %). */
    OptionalDouble fraction(String name, double min, double max) {
        OptionalDouble f = quantity(name, QuantityKind.FRACTION, Sign.ANY);
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

    Optional<String> choiceOf(Scalar s, String key, List<String> allowed) {
        String v = s.text().strip();
        if (allowed.contains(v)) {
            return Optional.of(v);
        }
        problems.add(s.position(), key, Message.NOT_A_CHOICE.format(v, Suggest.hint(v, allowed), String.join(", ", allowed)));
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
        Optional<Scalar> s = scalar(name, "a number");
        return s.isEmpty() ? OptionalDouble.empty() : numberOf(s.get(), key(name), min, max);
    }

    OptionalDouble numberOf(Scalar s, String key, double min, double max) {
        double v;
        try {
            v = Double.parseDouble(s.text().strip().replace("_", ""));
        } catch (NumberFormatException e) {
            problems.add(s.position(), key, Message.EXPECTED.format("a plain number", s.describe()));
            return OptionalDouble.empty();
        }
        if (!Double.isFinite(v)) {
            problems.add(s.position(), key, Message.NOT_A_FINITE_NUMBER.format(s.text()));
            return OptionalDouble.empty();
        }
        if (v < min || v > max) {
            problems.add(s.position(), key, Message.NOT_IN_RANGE.format(plain(min), plain(max), s.text()));
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(v);
    }

    /** A whole number within [min, max]. */
    Optional<Integer> integer(String name, int min, int max) {
        OptionalDouble v = number(name, min, max);
        if (v.isEmpty()) {
            return Optional.empty();
        }
        if (v.getAsDouble() != Math.rint(v.getAsDouble())) {
            problem(name, Message.EXPECTED.format("a whole number", "'" + raw(name) + "'"));
            return Optional.empty();
        }
        return Optional.of((int) v.getAsDouble());
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

    static String plain(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }
}
