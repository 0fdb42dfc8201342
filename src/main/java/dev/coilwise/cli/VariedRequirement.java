package dev.coilwise.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import dev.coilwise.error.BadInputException;
import dev.coilwise.model.Requirement;
import dev.coilwise.requirement.RequirementReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * A requirement file with one key to be given other values: the file's YAML tree is copied, the key set (its section
 * made when absent) and the text read again by {@link RequirementReader}, so every value gets the same checks as a
 * file written by hand.
 */
final class VariedRequirement {
    private static final YAMLMapper YAML = new YAMLMapper();

    private final Path file;
    private final ObjectNode tree;
    private final String[] path;
    private final RequirementReader reader;

    private VariedRequirement(Path file, ObjectNode tree, String key, RequirementReader reader) {
        this.file = file;
        this.tree = tree;
        this.path = key.split("\\.");
        this.reader = reader;
    }

    /** Reads {@code file} (checked in full first, so a bad file is reported as it stands) for varying {@code key}. */
    static VariedRequirement of(Path file, String key, RequirementReader reader) throws IOException {
        reader.read(file);
        JsonNode root = YAML.readTree(Files.readString(file, StandardCharsets.UTF_8));
        if (!(root instanceof ObjectNode o)) {
            throw new BadInputException(file + ": expected keys at the top of the file");
        }
        return new VariedRequirement(file, o, key, reader);
    }

    /** The requirement with the key set to {@code valueText} (e.g. "250 mm"). */
    Requirement with(String valueText) {
        ObjectNode copy = tree.deepCopy();
        ObjectNode at = copy;
        for (int i = 0; i < path.length - 1; i++) {
            JsonNode child = at.get(path[i]);
            if (child == null || child.isNull()) {
                at = at.putObject(path[i]);
            } else if (child instanceof ObjectNode o) {
                at = o;
            } else {
                throw new BadInputException(file + ": '" + path[i] + "' must hold keys for --vary "
                        + String.join(".", path) + ", but holds a single value");
            }
        }
        String leaf = path[path.length - 1];
        if (valueText.matches("[+-]?[0-9.eE+-]+")) {
            at.put(leaf, Double.parseDouble(valueText));
        } else {
            at.put(leaf, valueText);
        }
        String text;
        try {
            text = YAML.writeValueAsString(copy);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        Path folder = file.toAbsolutePath().getParent();
        // Positions in messages then refer to the rewritten text, so name it as such.
        return reader.parse(text, file + " with " + String.join(".", path) + " = " + valueText, folder);
    }
}
