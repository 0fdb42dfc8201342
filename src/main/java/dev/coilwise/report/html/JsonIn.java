package dev.coilwise.report.html;

import com.fasterxml.jackson.databind.JsonNode;
import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import dev.coilwise.error.SafeText;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * One object of a saved shortlist with its path in the file ({@code designs[2].margins[0]}), so that a missing or
 * mistyped field is reported by name. Numbers written as {@code null} (a figure that does not apply, or an infinite
 * one) read as NaN.
 */
final class JsonIn {
    private final JsonNode node;
    private final String path;

    private JsonIn(JsonNode node, String path) {
        this.node = node;
        this.path = path;
    }

    static JsonIn root(JsonNode node) {
        if (node == null || !node.isObject()) {
            throw BadInputException.of(Message.SAVED_FIELD, "the top level", kind(node), "a JSON object");
        }
        return new JsonIn(node, "");
    }

    String path() {
        return path.isEmpty() ? "the top level" : path;
    }

    /** The keys of this object, in file order. */
    List<String> keys() {
        List<String> out = new ArrayList<>();
        node.fieldNames().forEachRemaining(out::add);
        return out;
    }

    boolean has(String key) {
        return node.has(key);
    }

    JsonIn object(String key) {
        return optionalObject(key).orElseThrow(() -> wrong(key, "a JSON object"));
    }

    Optional<JsonIn> optionalObject(String key) {
        JsonNode n = node.get(key);
        if (n == null || n.isNull()) {
            return Optional.empty();
        }
        if (!n.isObject()) {
            throw wrong(key, "a JSON object");
        }
        return Optional.of(new JsonIn(n, at(key)));
    }

    /** The objects of a required array. */
    List<JsonIn> objects(String key) {
        JsonNode n = node.get(key);
        if (n == null || !n.isArray()) {
            throw wrong(key, "a list of JSON objects");
        }
        List<JsonIn> out = new ArrayList<>();
        for (int i = 0; i < n.size(); i++) {
            JsonNode e = n.get(i);
            if (!e.isObject()) {
                throw BadInputException.of(Message.SAVED_FIELD, at(key) + "[" + i + "]", kind(e), "a JSON object");
            }
            out.add(new JsonIn(e, at(key) + "[" + i + "]"));
        }
        return out;
    }

    /** The texts of an optional array; empty when absent. */
    List<String> texts(String key) {
        JsonNode n = node.get(key);
        if (n == null || n.isNull()) {
            return List.of();
        }
        if (!n.isArray()) {
            throw wrong(key, "a list of texts");
        }
        List<String> out = new ArrayList<>();
        n.forEach(e -> out.add(e.asText()));
        return out;
    }

    /** The numbers of an optional array; empty when absent. */
    double[] numbers(String key) {
        JsonNode n = node.get(key);
        if (n == null || n.isNull()) {
            return new double[0];
        }
        if (!n.isArray()) {
            throw wrong(key, "a list of numbers");
        }
        double[] out = new double[n.size()];
        for (int i = 0; i < out.length; i++) {
            JsonNode e = n.get(i);
            if (!e.isNumber() && !e.isNull()) {
                throw BadInputException.of(Message.SAVED_FIELD, at(key) + "[" + i + "]", kind(e), "a number");
            }
            out[i] = e.isNull() ? Double.NaN : plausible(at(key) + "[" + i + "]", e);
        }
        return out;
    }

    /**
     * Largest magnitude of a number in a saved shortlist: 10¹², far past anything coilwise writes (cycles reach 10¹⁰).
     * A larger one, or one too large for a double, comes from an edited or foreign file and would break the charts.
     */
    static final double MAX_MAGNITUDE = 1e12;

    private static double plausible(String where, JsonNode n) {
        double v = n.asDouble();
        if (!Double.isFinite(v) || Math.abs(v) > MAX_MAGNITUDE) {
            throw BadInputException.of(Message.SAVED_FIELD, where, kind(n), "a number no larger than 1e12 in size, as"
                    + " coilwise writes it");
        }
        return v;
    }

    String text(String key) {
        JsonNode n = node.get(key);
        if (n == null || !n.isTextual()) {
            throw wrong(key, "a text");
        }
        return n.asText();
    }

    String text(String key, String absent) {
        return node.hasNonNull(key) ? text(key) : absent;
    }

    /** A number that must be present; {@code null} reads as NaN. */
    double number(String key) {
        JsonNode n = node.get(key);
        if (n == null || !(n.isNumber() || n.isNull())) {
            throw wrong(key, "a number");
        }
        return n.isNull() ? Double.NaN : plausible(at(key), n);
    }

    /** A number that may be absent or null (NaN then). */
    double optionalNumber(String key) {
        return node.has(key) ? number(key) : Double.NaN;
    }

    /** A length written in millimetres, in metres. */
    double mm(String key) {
        return number(key) * 1e-3;
    }

    int integer(String key) {
        JsonNode n = node.get(key);
        if (n == null || !n.canConvertToInt() || !n.isIntegralNumber()) {
            throw wrong(key, "a whole number");
        }
        return n.asInt();
    }

    boolean flag(String key) {
        JsonNode n = node.get(key);
        if (n == null || !n.isBoolean()) {
            throw wrong(key, "true or false");
        }
        return n.asBoolean();
    }

    private String at(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    private BadInputException wrong(String key, String expected) {
        return BadInputException.of(Message.SAVED_FIELD, at(key), kind(node.get(key)), expected);
    }

    private static String kind(JsonNode n) {
        if (n == null || n.isMissingNode()) {
            return "missing";
        }
        if (n.isNull()) {
            return "null";
        }
        String shown = SafeText.quote(n.isTextual() ? "'" + n.asText() + "'" : n.toString(), 40);
        return (n.isObject() ? "an object " : n.isArray() ? "a list " : "") + shown;
    }
}
