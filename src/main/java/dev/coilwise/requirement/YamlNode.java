package dev.coilwise.requirement;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A YAML document read to a plain tree that keeps the position of every key and value. Scalars keep their text;
 * nothing is ever turned into an object of a class named by the file.
 */
sealed interface YamlNode permits YamlNode.Scalar, YamlNode.Mapping, YamlNode.Sequence {

    /** 1-based line and column in the file. */
    record Position(int line, int column) {
        static final Position FILE = new Position(0, 0);
    }

    Position position();

    /** A short description for "expected ..., got ..." messages. */
    String describe();

    /** What the YAML parser took a scalar for: quoted text is always {@code STRING}. */
    enum Type { STRING, NUMBER, BOOLEAN, NULL }

    /**
     * A scalar value.
     *
     * @param text     the text as written (without quotes); empty for a key with no value
     * @param bool     for a plain {@code true}/{@code false} (YAML 1.1 also reads yes/no, on/off), its value; else null
     * @param type     what the parser took it for (for the schema check, which sees types as an editor does)
     * @param position where the value starts
     */
    record Scalar(String text, Boolean bool, Type type, Position position) implements YamlNode {
        @Override
        public String describe() {
            return text.isEmpty() ? "no value" : "'" + Shown.value(text) + "'";
        }
    }

    /** A value under a key, and where the key was written. */
    record Entry(Position keyPosition, YamlNode value) {
    }

    /** A mapping in file order. */
    record Mapping(Map<String, Entry> entries, Position position) implements YamlNode {
        public Mapping {
            entries = Collections.unmodifiableMap(new LinkedHashMap<>(entries));
        }

        @Override
        public String describe() {
            return "a group of keys";
        }
    }

    /** A list. */
    record Sequence(List<YamlNode> items, Position position) implements YamlNode {
        public Sequence {
            items = List.copyOf(items);
        }

        @Override
        public String describe() {
            return "a list";
        }
    }
}
