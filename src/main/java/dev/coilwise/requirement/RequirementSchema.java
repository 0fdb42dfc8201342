package dev.coilwise.requirement;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SchemaValidatorsConfig;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import dev.coilwise.error.InternalFaultException;
import java.io.IOException;
import java.io.InputStream;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * The JSON Schema of requirement files ({@code docs/requirement.schema.json}, draft 2020-12, bundled in the jar), and
 * the check of a file against it. Editors that read a schema comment validate and complete a file as it is typed; the
 * reader checks every file against the same schema before its own checks, and reports each schema error as it
 * reports its own ({@link SchemaMessages}).
 *
 * <p>The file's YAML tree is handed to the validator as an editor sees it: quoted and unquoted text as strings,
 * plain numbers as numbers, {@code true}/{@code false} as booleans. A plain number the reader would not read as a
 * number (such as {@code 0x1F}) is handed over as text, so that the schema and the reader judge the same value.
 */
public final class RequirementSchema {
    static final String RESOURCE = "/dev/coilwise/requirement/requirement.schema.json";
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private RequirementSchema() {
    }

    /** Loaded once, on first use. */
    private static final class Loaded {
        static final String TEXT = load();
        static final JsonNode TREE = parse(TEXT);
        static final JsonSchema SCHEMA = compile(TREE);
    }

    /**
     * Reads and compiles the schema now rather than on first use; a thread that checks a file meanwhile waits for
     * this one. Called by a start-up thread so that the compilation overlaps the command's other work.
     */
    public static void prepare() {
        if (Loaded.SCHEMA == null) {
            throw new InternalFaultException("requirement schema did not compile");
        }
    }

    /** The schema as bundled, for {@code coilwise schema}. */
    public static String text() {
        return Loaded.TEXT;
    }

    /** The schema as a JSON tree. */
    static JsonNode tree() {
        return Loaded.TREE;
    }

    /** Checks a file's tree against the schema; every error goes to {@code problems} with its position. */
    static void check(YamlNode.Mapping root, Problems problems) {
        JsonNode instance = json(root);
        new SchemaMessages(Loaded.TREE, root, instance).report(validate(instance), problems);
    }

    /** The validator's raw errors, for the translation and its tests. */
    static Set<ValidationMessage> validate(JsonNode instance) {
        return Loaded.SCHEMA.validate(instance);
    }

    /** The tree as the validator (and an editor) sees it. */
    static JsonNode json(YamlNode node) {
        if (node instanceof YamlNode.Mapping m) {
            ObjectNode o = NODES.objectNode();
            m.entries().forEach((k, e) -> o.set(k, json(e.value())));
            return o;
        }
        if (node instanceof YamlNode.Sequence s) {
            ArrayNode a = NODES.arrayNode();
            s.items().forEach(i -> a.add(json(i)));
            return a;
        }
        YamlNode.Scalar s = (YamlNode.Scalar) node;
        return switch (s.type()) {
            case NULL -> NODES.nullNode();
            case BOOLEAN -> NODES.booleanNode(s.bool());
            case NUMBER -> number(s.text());
            case STRING -> NODES.textNode(s.text());
        };
    }

    private static JsonNode number(String text) {
        String t = Grammar.trim(text);
        if (Grammar.NUMBER.matcher(t).matches()) {
            try {
                return NODES.numberNode(new BigDecimal(t.replace("_", "").replace("+", "")));
            } catch (NumberFormatException | ArithmeticException e) {
                return NODES.textNode(text); // an exponent beyond BigDecimal's range: the reader refuses it too
            }
        }
        return NODES.textNode(text);
    }

    private static String load() {
        try (InputStream in = RequirementSchema.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new InternalFaultException("requirement schema missing from the jar: " + RESOURCE);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new InternalFaultException("cannot read the bundled requirement schema: " + e.getMessage(), e);
        }
    }

    private static JsonNode parse(String text) {
        try {
            return MAPPER.readTree(text);
        } catch (IOException e) {
            throw new InternalFaultException("the bundled requirement schema is not valid JSON: " + e.getMessage(), e);
        }
    }

    private static JsonSchema compile(JsonNode tree) {
        SchemaValidatorsConfig config = SchemaValidatorsConfig.builder().build();
        return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(tree, config);
    }

    /** Every problem of a list of validator errors, in the validator's order; for tests. */
    static List<String> raw(JsonNode instance) {
        List<String> out = new ArrayList<>();
        for (ValidationMessage m : validate(instance)) {
            out.add(m.getType() + " | " + m.getInstanceLocation() + " | " + m.getEvaluationPath() + " | " + m.getProperty()
                    + " | " + m.getMessage());
        }
        return out;
    }
}
