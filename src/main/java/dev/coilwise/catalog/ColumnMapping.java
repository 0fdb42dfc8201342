package dev.coilwise.catalog;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import dev.coilwise.error.SafeText;
import dev.coilwise.requirement.InputFiles;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * How the columns of a supplier's export map onto our {@link CatalogField}s: column names, units, constants, and the
 * supplier's names for materials and end types. Our own format needs no mapping file: {@link NativeHeader} derives
 * the mapping from the header. The YAML form is documented in docs/catalog-format.md.
 *
 * @param delimiter        field separator of the file
 * @param decimalSeparator decimal mark of numbers in the file ('.' or ',')
 * @param fields           source of each mapped field
 * @param materialNames    the file's material names → our material keys (names not listed are used as keys)
 * @param endNames         the file's end-type names → our end-type keys (names not listed are used as keys)
 */
public record ColumnMapping(char delimiter, char decimalSeparator, Map<CatalogField, ColumnSource> fields,
                            Map<String, String> materialNames, Map<String, String> endNames) {

    private static final Set<String> TOP_KEYS = Set.of("delimiter", "decimal_separator", "columns", "units",
            "constants", "material_names", "end_names");

    public ColumnMapping {
        fields = Map.copyOf(fields);
        materialNames = Map.copyOf(materialNames);
        endNames = Map.copyOf(endNames);
    }

    /** Reads a mapping file. */
    public static ColumnMapping load(Path file) {
        String text;
        try {
            text = InputFiles.readUtf8(file, MAX_BYTES);
        } catch (BadInputException e) {
            throw new BadInputException(SafeText.escape(String.valueOf(file.getFileName())) + ": " + e.getMessage(), e);
        }
        return parse(text, file.getFileName().toString());
    }

    /** Largest mapping file read, bytes: 1 MiB (a mapping is a few hundred bytes). */
    static final int MAX_BYTES = 1 << 20;

    /**
     * Parses a mapping; every problem is collected and reported together.
     *
     * @param yaml   the mapping text
     * @param source file name for messages
     * @throws BadInputException listing every problem found
     */
    public static ColumnMapping parse(String yaml, String source) {
        JsonNode root;
        try {
            root = new ObjectMapper(new YAMLFactory()).readTree(yaml);
        } catch (IOException e) {
            String where = "";
            String why = e.getMessage();
            if (e.getCause() instanceof org.yaml.snakeyaml.error.MarkedYAMLException m && m.getProblemMark() != null) {
                where = ":" + (m.getProblemMark().getLine() + 1) + ":" + (m.getProblemMark().getColumn() + 1);
                why = (m.getContext() == null ? "" : m.getContext() + ": ") + m.getProblem();
            } else if (e instanceof com.fasterxml.jackson.core.JsonProcessingException j && j.getLocation() != null) {
                where = ":" + j.getLocation().getLineNr() + ":" + j.getLocation().getColumnNr();
                why = j.getOriginalMessage();
            }
            throw new BadInputException(source + where + ": not valid YAML: "
                    + SafeText.quote(String.valueOf(why).replaceAll("\\s+", " ").strip(), 200), e);
        }
        List<String> problems = new ArrayList<>();
        if (root == null || !root.isObject()) {
            throw new BadInputException(source + ": a column mapping must be a YAML mapping with a 'columns' section");
        }
        for (Iterator<String> it = root.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!TOP_KEYS.contains(k)) {
                problems.add(Choices.unknown("mapping key", k, TOP_KEYS.stream().sorted().toList()));
            }
        }
        char delimiter = oneChar(root, "delimiter", ',', problems);
        char decimal = oneChar(root, "decimal_separator", '.', problems);
        if (decimal != '.' && decimal != ',') {
            problems.add(Message.UNKNOWN_KEY.format("decimal_separator", String.valueOf(decimal), "'.' or ','"));
        }
        if (decimal == delimiter) {
            problems.add("decimal_separator and delimiter must differ, both are '" + delimiter + "'");
        }
        Map<String, String> columns = strings(root.path("columns"), "columns", problems);
        Map<String, String> constants = strings(root.path("constants"), "constants", problems);
        Map<String, String> units = strings(root.path("units"), "units", problems);
        Map<CatalogField, ColumnSource> fields = new EnumMap<>(CatalogField.class);
        for (Map.Entry<String, String> e : columns.entrySet()) {
            CatalogField f = field(e.getKey(), "columns", problems);
            if (f != null) {
                fields.put(f, ColumnSource.column(e.getValue(), unitFor(f, units, problems)));
            }
        }
        for (Map.Entry<String, String> e : constants.entrySet()) {
            CatalogField f = field(e.getKey(), "constants", problems);
            if (f != null && fields.containsKey(f)) {
                problems.add("field '" + f.key() + "' is given both as a column and as a constant; keep one");
            } else if (f != null) {
                fields.put(f, ColumnSource.constant(e.getValue(), unitFor(f, units, problems)));
            }
        }
        for (String k : units.keySet()) {
            if (CatalogField.byKey(k) == null && !isKind(k)) {
                List<String> allowed = Choices.both(KINDS, Arrays.stream(CatalogField.values())
                        .filter(CatalogField::dimensioned).map(CatalogField::key).toList());
                problems.add(Choices.unknown("units entry", k, allowed, String.join(", ", KINDS)
                        + " or a field with a unit: " + String.join(", ", allowed.subList(KINDS.size(), allowed.size()))));
            }
        }
        problems.addAll(missingInMapping(fields, units));
        if (!problems.isEmpty()) {
            throw BadInputException.of(Message.CATALOG_MAPPING_INVALID, source, problems.size(),
                    "  " + String.join("\n  ", problems));
        }
        return new ColumnMapping(delimiter, decimal, fields, strings(root.path("material_names"), "material_names", problems),
                strings(root.path("end_names"), "end_names", problems));
    }

    /** Problems with the required fields: each must be mapped, and one of active or total coils. */
    static List<String> missing(Map<CatalogField, ColumnSource> fields) {
        List<String> problems = new ArrayList<>();
        for (CatalogField f : CatalogField.values()) {
            if (f.required() && !fields.containsKey(f)) {
                problems.add(Message.CATALOG_MISSING_FIELD.format(f.key(), f.description(), f.headerChoices()));
            }
        }
        if (!fields.containsKey(CatalogField.ACTIVE_COILS) && !fields.containsKey(CatalogField.TOTAL_COILS)) {
            problems.add(Message.CATALOG_MISSING_FIELD.format("active_coils or total_coils", "coil count",
                    "active_coils, total_coils"));
        }
        return problems;
    }

    /**
     * Problems with the required fields of a mapping, worded in the mapping's own keys: where to map each missing
     * field (under {@code columns}, with a unit under {@code units} when the mapping has none for it, or under
     * {@code constants}).
     */
    static List<String> missingInMapping(Map<CatalogField, ColumnSource> fields, Map<String, String> units) {
        List<String> problems = new ArrayList<>();
        for (CatalogField f : CatalogField.values()) {
            if (f.required() && !fields.containsKey(f)) {
                String kind = f.dimensioned() ? f.kind().name().toLowerCase(java.util.Locale.ROOT) : "";
                List<String> symbols = f.dimensioned()
                        ? CatalogUnit.of(f.kind()).stream().map(CatalogUnit::symbol).toList() : List.of();
                String unit = f.dimensioned() && !units.containsKey(f.key()) && !units.containsKey(kind)
                        ? " and its unit under units as '" + kind + ": " + symbols.get(0) + "' (or '" + f.key() + ": "
                                + symbols.get(0) + "'; units: " + String.join(", ", symbols) + ")"
                        : "";
                problems.add(Message.CATALOG_MAPPING_MISSING_FIELD.format(f.key(), f.description(),
                        "'" + f.key() + ": <the export's column header>'", unit));
            }
        }
        if (!fields.containsKey(CatalogField.ACTIVE_COILS) && !fields.containsKey(CatalogField.TOTAL_COILS)) {
            problems.add(Message.CATALOG_MAPPING_MISSING_FIELD.format("active_coils or total_coils", "coil count",
                    "'active_coils: <the export's column header>' or 'total_coils: <...>'", ""));
        }
        return problems;
    }

    /** The kinds of quantity a {@code units} entry may name instead of a field. */
    private static final List<String> KINDS = List.of("length", "rate", "force");

    private static boolean isKind(String k) {
        return KINDS.contains(k);
    }

    private static CatalogUnit unitFor(CatalogField f, Map<String, String> units, List<String> problems) {
        if (!f.dimensioned()) {
            return null;
        }
        String symbol = units.getOrDefault(f.key(), units.get(f.kind().name().toLowerCase(java.util.Locale.ROOT)));
        List<String> allowed = CatalogUnit.of(f.kind()).stream().map(CatalogUnit::symbol).toList();
        if (symbol == null) {
            problems.add("field '" + f.key() + "' needs a unit: add units: {" + f.key() + ": ...} or units: {"
                    + f.kind().name().toLowerCase(java.util.Locale.ROOT) + ": ...}; allowed: " + String.join(", ", allowed));
            return null;
        }
        CatalogUnit u = CatalogUnit.bySymbol(symbol, f.kind());
        if (u == null) {
            problems.add(Choices.unknownUnit("unit of " + f.key(), symbol, f.kind(), allowed));
        }
        return u;
    }

    private static CatalogField field(String key, String section, List<String> problems) {
        CatalogField f = CatalogField.byKey(key);
        if (f == null) {
            problems.add(Choices.unknown("field in " + section, key,
                    Arrays.stream(CatalogField.values()).map(CatalogField::key).toList()));
        }
        return f;
    }

    private static char oneChar(JsonNode root, String key, char dflt, List<String> problems) {
        JsonNode n = root.get(key);
        if (n == null || n.isNull()) {
            return dflt;
        }
        String s = n.asText();
        if (s.equals("\\t") || s.equals("tab")) {
            return '\t';
        }
        if (s.length() != 1) {
            problems.add(key + " must be a single character, got '" + s + "'");
            return dflt;
        }
        return s.charAt(0);
    }

    private static Map<String, String> strings(JsonNode node, String section, List<String> problems) {
        Map<String, String> out = new LinkedHashMap<>();
        if (node.isMissingNode() || node.isNull()) {
            return out;
        }
        if (!node.isObject()) {
            problems.add("'" + section + "' must be a mapping of names to values");
            return out;
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            if (!e.getValue().isValueNode() || e.getValue().isNull()) {
                problems.add("'" + section + "." + e.getKey() + "' must be a single value");
            } else {
                out.put(e.getKey(), e.getValue().asText());
            }
        }
        return out;
    }
}
