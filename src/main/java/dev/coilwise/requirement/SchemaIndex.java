package dev.coilwise.requirement;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.MissingNode;
import com.networknt.schema.JsonNodePath;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Finds the part of the requirement schema that governs a place in a file, and says in words what it allows, in the
 * reader's wording ("a length such as '45 mm' or '1.8 in'", "one of arrest, launch", "keys mass, weight").
 * Understands the constructs the requirement schema uses: {@code properties}, {@code items}, local {@code $ref}s,
 * {@code anyOf} and {@code enum}.
 */
final class SchemaIndex {
    /** The schema's quantity definitions ({@code $defs}) and the kinds they hold. */
    static final Map<String, QuantityKind> KINDS = Map.of("length", QuantityKind.LENGTH, "force", QuantityKind.FORCE,
            "mass", QuantityKind.MASS, "speed", QuantityKind.SPEED, "acceleration", QuantityKind.ACCELERATION,
            "angle", QuantityKind.ANGLE, "percentage", QuantityKind.FRACTION);
    private static final String DEFS = "#/$defs/";

    private final JsonNode root;

    SchemaIndex(JsonNode root) {
        this.root = root;
    }

    /** The schema of the value at an instance location (before following its $ref); missing when there is none. */
    JsonNode at(JsonNodePath path) {
        JsonNode n = root;
        for (int i = 0; i < path.getNameCount() && !n.isMissingNode(); i++) {
            Object e = path.getElement(i);
            n = e instanceof Integer ? find(n, "items", null) : find(n, "properties", (String) e);
        }
        return n;
    }

    /** The child schema under {@code keyword} (and {@code name}), looking through $ref and anyOf. */
    private JsonNode find(JsonNode n, String keyword, String name) {
        JsonNode r = resolve(n);
        JsonNode direct = name == null ? r.path(keyword) : r.path(keyword).path(name);
        if (!direct.isMissingNode()) {
            return direct;
        }
        for (JsonNode branch : r.path("anyOf")) {
            JsonNode found = find(branch, keyword, name);
            if (!found.isMissingNode()) {
                return found;
            }
        }
        return MissingNode.getInstance();
    }

    /** The definition a local $ref points to, or the node itself. */
    JsonNode resolve(JsonNode n) {
        String ref = n.path("$ref").asText("");
        return ref.startsWith(DEFS) ? root.path("$defs").path(ref.substring(DEFS.length())) : n;
    }

    /** The keys an object at this location may hold. */
    List<String> properties(JsonNodePath path) {
        List<String> keys = new ArrayList<>();
        JsonNode n = path.getNameCount() == 0 ? root : resolve(at(path));
        n.path("properties").fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    /** The words allowed at this location. */
    List<String> choices(JsonNodePath path) {
        return words(resolve(at(path)));
    }

    /** A bound of a number at this location, written plainly; "" when there is none. */
    String bound(JsonNodePath path, String keyword) {
        JsonNode n = at(path);
        JsonNode b = n.has(keyword) ? n.path(keyword) : resolve(n).path(keyword);
        return b.isNumber() ? Section.plain(b.asDouble()) : "";
    }

    /** The two keys of which exactly one must be given ({@code oneOf} of {@code required} lists). */
    List<String> oneOfRequired(JsonNodePath path) {
        List<String> keys = new ArrayList<>();
        for (JsonNode branch : resolve(at(path)).path("oneOf")) {
            branch.path("required").forEach(k -> keys.add(k.asText()));
        }
        return keys;
    }

    /** What the schema allows at this location, in words. */
    String expected(JsonNodePath path) {
        return path.getNameCount() == 0 ? "keys " + String.join(", ", properties(path)) : expected(at(path));
    }

    private String expected(JsonNode n) {
        if (n.isMissingNode() || n.isBoolean()) {
            return "nothing here";
        }
        if (n.has("anyOf")) { // "down, horizontal, up, or an angle such as '30 deg'"
            StringBuilder sb = new StringBuilder();
            for (JsonNode b : n.path("anyOf")) {
                boolean words = resolve(b).has("enum");
                String form = words ? String.join(", ", words(resolve(b))) : expected(b);
                sb.append(sb.length() == 0 ? "" : " or ").append(form);
                if (words) {
                    sb.append(',');
                }
            }
            String s = sb.toString();
            return s.endsWith(",") ? s.substring(0, s.length() - 1) : s;
        }
        String ref = n.path("$ref").asText("");
        if (ref.startsWith(DEFS)) {
            String def = ref.substring(DEFS.length());
            if (KINDS.containsKey(def)) {
                QuantityKind k = KINDS.get(def);
                return k.description() + " such as " + k.examples();
            }
            if (def.equals("number")) {
                String range = " from " + Section.plain(n.path("minimum").asDouble()) + " to "
                        + Section.plain(n.path("maximum").asDouble());
                return (n.has("multipleOf") ? "a whole number" : "a plain number") + range;
            }
        }
        JsonNode r = resolve(n);
        if (r.has("enum")) {
            return "one of " + String.join(", ", words(r));
        }
        String type = r.path("type").isArray() ? "text" : r.path("type").asText("");
        return switch (type) {
            case "boolean" -> "true or false";
            case "object" -> "keys " + fieldNames(r.path("properties"));
            case "array" -> r.path("minItems").asInt() == 2 && r.path("maxItems").asInt() == 2
                    ? "a list of two numbers [low, high] such as " + r.path("examples").path(0).toString().replace(",", ", ")
                    : "a list of " + expected(r.path("items"));
            default -> "text";
        };
    }

    private static List<String> words(JsonNode withEnum) {
        List<String> words = new ArrayList<>();
        withEnum.path("enum").forEach(w -> words.add(w.asText()));
        return words;
    }

    private static String fieldNames(JsonNode properties) {
        List<String> keys = new ArrayList<>();
        properties.fieldNames().forEachRemaining(keys::add);
        return keys.stream().collect(Collectors.joining(", "));
    }
}
