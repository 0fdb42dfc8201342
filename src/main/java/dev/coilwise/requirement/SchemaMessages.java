package dev.coilwise.requirement;

import com.fasterxml.jackson.databind.JsonNode;
import com.networknt.schema.JsonNodePath;
import com.networknt.schema.ValidationMessage;
import dev.coilwise.error.Message;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Turns the schema validator's errors into problems worded as the reader words its own: the dotted key, the position
 * of the value (or of the key, for an unknown or misplaced key), what was found and what is allowed, and for a
 * misspelt key or word the nearest valid one. Where a key may take one of several forms ({@code anyOf}), the
 * validator's errors for every form are folded into one problem, unless the value has the form of one of them, in
 * which case that form's errors are reported.
 */
final class SchemaMessages {
    private final SchemaIndex index;
    private final YamlNode.Mapping root;
    private final JsonNode instance;

    SchemaMessages(JsonNode schema, YamlNode.Mapping root, JsonNode instance) {
        this.index = new SchemaIndex(schema);
        this.root = root;
        this.instance = instance;
    }

    void report(Set<ValidationMessage> errors, Problems problems) {
        Map<String, List<ValidationMessage>> anyOf = new LinkedHashMap<>();
        for (ValidationMessage m : errors) {
            String path = m.getEvaluationPath().toString();
            int at = path.indexOf("/anyOf/");
            if (path.contains("/oneOf/")) {
                continue; // a branch of "exactly one of two keys": the oneOf error itself says it
            }
            if (at >= 0) {
                anyOf.computeIfAbsent(path.substring(0, at), k -> new ArrayList<>()).add(m);
            } else {
                one(m, problems);
            }
        }
        anyOf.values().forEach(group -> folded(group, problems));
    }

    /** The errors of one {@code anyOf}: those of the form the value has, or one problem naming every form. */
    private void folded(List<ValidationMessage> group, Problems problems) {
        JsonNodePath owner = group.get(0).getInstanceLocation();
        for (ValidationMessage m : group) {
            if (m.getInstanceLocation().getNameCount() < owner.getNameCount()) {
                owner = m.getInstanceLocation();
            }
        }
        JsonNodePath own = owner;
        List<ValidationMessage> inner = group.stream()
                .filter(m -> m.getInstanceLocation().getNameCount() > own.getNameCount()).toList();
        if (!inner.isEmpty()) {
            inner.forEach(m -> one(m, problems));
            return;
        }
        YamlNode node = node(owner);
        problems.addSchema(node.position(), key(owner),
                Message.EXPECTED.format(index.expected(owner), node.describe()));
    }

    private void one(ValidationMessage m, Problems problems) {
        JsonNodePath at = m.getInstanceLocation();
        YamlNode node = node(at);
        String type = m.getType();
        switch (type) {
            case "additionalProperties" -> {
                String name = m.getProperty();
                List<String> allowed = index.properties(at);
                problems.addSchema(keyPosition(at, name), child(at, Shown.value(name)),
                        Message.UNKNOWN_FIELD.format(Shown.value(name), Suggest.hint(name, allowed), String.join(", ", allowed)));
            }
            case "required" -> {
                String name = m.getProperty();
                String what = index.expected(at.append(name));
                problems.addSchema(sectionPosition(at), child(at, name), Message.MISSING_FIELD.format(
                        child(at, name) + (what.startsWith("keys ") ? " with " : ", ") + what));
            }
            case "false" -> {
                String job = instance.path("job").asText();
                String other = job.equals(JobReader.ARREST) ? JobReader.LAUNCH : JobReader.ARREST;
                problems.addSchema(keyPosition(at.getParent(), last(at)), key(at), Message.NOT_FOR_JOB.format(other, job, ""));
            }
            case "oneOf" -> oneOf(at, problems);
            case "enum" -> {
                String value = node instanceof YamlNode.Scalar s ? s.text() : node.describe();
                List<String> allowed = index.choices(at);
                problems.addSchema(node.position(), key(at), Message.NOT_A_CHOICE.format(Shown.value(value),
                        Suggest.hint(value, allowed), String.join(", ", allowed)));
            }
            case "minimum", "maximum" -> problems.addSchema(node.position(), key(at),
                    Message.NOT_IN_RANGE.format(index.bound(at, "minimum"), index.bound(at, "maximum"), text(node)));
            default -> problems.addSchema(node.position(), key(at), Message.EXPECTED.format(index.expected(at), node.describe()));
        }
    }

    /** Exactly one of two keys: both given, or neither (an object only; a value of another type is a type error). */
    private void oneOf(JsonNodePath at, Problems problems) {
        JsonNode value = value(at);
        if (!value.isObject()) {
            return;
        }
        List<String> either = index.oneOfRequired(at);
        List<String> given = either.stream().filter(value::has).toList();
        YamlNode.Mapping m = (YamlNode.Mapping) node(at);
        if (given.size() > 1) {
            problems.addSchema(m.entries().get(given.get(1)).value().position(), child(at, given.get(1)),
                    Message.BOTH_GIVEN.format(child(at, given.get(0)), child(at, given.get(1))));
        } else if (given.isEmpty() && either.size() == 2) {
            problems.addSchema(sectionPosition(at), key(at),
                    Message.ONE_OF_TWO_MISSING.format(child(at, either.get(0)), child(at, either.get(1))));
        }
    }

    private static String text(YamlNode node) {
        return node instanceof YamlNode.Scalar s ? Shown.value(s.text()) : node.describe();
    }

    /** The dotted key of an instance location: property names joined by '.', list indexes left out. */
    static String key(JsonNodePath at) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < at.getNameCount(); i++) {
            if (at.getElement(i) instanceof String name) {
                sb.append(sb.length() == 0 ? "" : ".").append(Shown.value(name));
            }
        }
        return sb.toString();
    }

    private static String child(JsonNodePath at, String name) {
        String k = key(at);
        return k.isEmpty() ? name : k + "." + name;
    }

    private static String last(JsonNodePath at) {
        return String.valueOf(at.getElement(at.getNameCount() - 1));
    }

    private JsonNode value(JsonNodePath at) {
        JsonNode n = instance;
        for (int i = 0; i < at.getNameCount(); i++) {
            Object e = at.getElement(i);
            n = e instanceof Integer idx ? n.path(idx) : n.path((String) e);
        }
        return n;
    }

    /** The file's node at an instance location (the validator only reports locations that exist). */
    private YamlNode node(JsonNodePath at) {
        YamlNode n = root;
        for (int i = 0; i < at.getNameCount(); i++) {
            Object e = at.getElement(i);
            if (n instanceof YamlNode.Mapping m && e instanceof String name && m.entries().containsKey(name)) {
                n = m.entries().get(name).value();
            } else if (n instanceof YamlNode.Sequence s && e instanceof Integer idx && idx < s.items().size()) {
                n = s.items().get(idx);
            } else {
                return n;
            }
        }
        return n;
    }

    private YamlNode.Position keyPosition(JsonNodePath parent, String name) {
        YamlNode p = node(parent);
        if (p instanceof YamlNode.Mapping m && m.entries().containsKey(name)) {
            return m.entries().get(name).keyPosition();
        }
        return p.position();
    }

    /** Where a section's key is written (the reader reports missing keys there); the top of the file for the top. */
    private YamlNode.Position sectionPosition(JsonNodePath at) {
        return at.getNameCount() == 0 ? new YamlNode.Position(1, 1) : keyPosition(at.getParent(), last(at));
    }
}
