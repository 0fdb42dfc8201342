package dev.coilwise.materials;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dev.coilwise.error.BadInputException;
import dev.coilwise.error.InternalFaultException;
import dev.coilwise.error.Message;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** The set of materials the search may use, keyed by material key, in table order. Pass it in; never reach it statically. */
public final class MaterialTable {
    /** Classpath location of the bundled table. */
    public static final String DEFAULT_RESOURCE = "/dev/coilwise/materials/materials.yaml";

    private final Map<String, Material> byKey;
    private final String sources;

    public MaterialTable(List<Material> materials, String sources) {
        Map<String, Material> m = new LinkedHashMap<>();
        for (Material mat : materials) {
            if (m.put(mat.key(), mat) != null) {
                throw new BadInputException("material key '" + mat.key() + "' appears twice");
            }
        }
        this.byKey = Map.copyOf(m);
        this.order = List.copyOf(m.keySet());
        this.sources = sources;
    }

    private final List<String> order;

    /**
     * The table bundled with coilwise, read once per run (it is immutable). Threads that ask while another is reading
     * it wait for that read rather than repeat it, so a start-up thread may read it ahead of the command.
     */
    public static MaterialTable loadDefault() {
        return Bundled.TABLE;
    }

    /** Holder of the bundled table: the JVM reads it on first use, once, and makes other threads wait for it. */
    private static final class Bundled {
        static final MaterialTable TABLE = readBundled();
    }

    private static MaterialTable readBundled() {
        try (InputStream in = MaterialTable.class.getResourceAsStream(DEFAULT_RESOURCE)) {
            if (in == null) {
                throw new InternalFaultException("material table resource missing: " + DEFAULT_RESOURCE);
            }
            byte[] bytes = in.readAllBytes();
            return parse(new String(bytes, java.nio.charset.StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Parses a table in the bundled format (see the header comment of materials.yaml for units). */
    public static MaterialTable parse(String yaml) {
        try {
            JsonNode root;
            try (JsonParser p = new YAMLFactory().createParser(yaml)) {
                p.nextToken();
                root = tree(p);
            }
            List<Material> list = new ArrayList<>();
            for (JsonNode n : root.path("materials")) {
                List<StrengthBand> bands = new ArrayList<>();
                for (JsonNode b : n.path("strength")) {
                    bands.add(new StrengthBand(b.path("d_min").asDouble() * 1e-3, b.path("d_max").asDouble() * 1e-3,
                            b.path("m").asDouble(), b.path("A").asDouble()));
                }
                List<ModulusBand> moduli = new ArrayList<>();
                for (JsonNode b : n.path("moduli")) {
                    moduli.add(new ModulusBand(b.path("d_max").asDouble() * 1e-3, b.path("E").asDouble() * 1e9,
                            b.path("G").asDouble() * 1e9));
                }
                list.add(new Material(n.path("key").asText(), n.path("name").asText(), n.path("standard").asText(),
                        n.path("steel").asBoolean(), n.path("density").asDouble(), n.path("relative_cost").asDouble(),
                        n.path("allowable_static").asDouble(), n.path("allowable_set_removed").asDouble(), bands, moduli,
                        n.path("source").asText()));
            }
            return new MaterialTable(list, sourcesHeader(yaml));
        } catch (IOException e) {
            throw new InternalFaultException("material table is not valid YAML: " + e.getMessage(), e);
        }
    }

    /**
     * The value at the parser's current token as a tree, read with the streaming parser alone: building Jackson's
     * ObjectMapper would cost several hundred milliseconds at start-up for a table this small.
     */
    private static JsonNode tree(JsonParser p) throws IOException {
        JsonNodeFactory f = JsonNodeFactory.instance;
        JsonToken t = p.currentToken();
        if (t == JsonToken.START_OBJECT) {
            ObjectNode o = f.objectNode();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String key = p.currentName();
                p.nextToken();
                o.set(key, tree(p));
            }
            return o;
        }
        if (t == JsonToken.START_ARRAY) {
            ArrayNode a = f.arrayNode();
            while (p.nextToken() != JsonToken.END_ARRAY) {
                a.add(tree(p));
            }
            return a;
        }
        if (t == JsonToken.VALUE_NUMBER_INT || t == JsonToken.VALUE_NUMBER_FLOAT) {
            return f.numberNode(p.getDoubleValue());
        }
        if (t == JsonToken.VALUE_TRUE || t == JsonToken.VALUE_FALSE) {
            return f.booleanNode(t == JsonToken.VALUE_TRUE);
        }
        return t == JsonToken.VALUE_NULL || t == null ? f.nullNode() : f.textNode(p.getText());
    }

    private static String sourcesHeader(String yaml) {
        StringBuilder sb = new StringBuilder();
        for (String line : yaml.split("\n")) {
            if (!line.startsWith("#")) {
                break;
            }
            sb.append(line.substring(1).strip()).append('\n');
        }
        return sb.toString();
    }

    public Material get(String key) {
        Material m = byKey.get(key);
        if (m == null) {
            throw BadInputException.of(Message.UNKNOWN_MATERIAL, key, String.join(", ", order));
        }
        return m;
    }

    public boolean contains(String key) {
        return byKey.containsKey(key);
    }

    /** All materials in table order. */
    public List<Material> all() {
        return order.stream().map(byKey::get).toList();
    }

    /** The steels in table order (the default search set). */
    public List<Material> steels() {
        return all().stream().filter(Material::steel).toList();
    }

    public List<String> keys() {
        return order;
    }

    /** The table's header comment: the full citations behind the per-row source tags. */
    public String sources() {
        return sources;
    }
}
