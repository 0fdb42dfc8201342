package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SpecVersion;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Seating;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The requirement schema and the reader agree: same keys, same closed sets, same quantity grammar, same files. */
class RequirementSchemaTest {
    private static final JsonNode SCHEMA = RequirementSchema.tree();

    static List<String> examplesAndTemplates() throws IOException {
        List<String> all = new ArrayList<>(ExampleRequirementsTest.examples().stream().map(Path::toString).toList());
        all.add("template:arrest");
        all.add("template:launch");
        return all;
    }

    private static String text(String name) throws IOException {
        return switch (name) {
            case "template:arrest" -> RequirementTemplates.arrest();
            case "template:launch" -> RequirementTemplates.launch();
            default -> Files.readString(Path.of(name));
        };
    }

    private static List<String> names(JsonNode object) {
        List<String> names = new ArrayList<>();
        object.fieldNames().forEachRemaining(names::add);
        return names;
    }

    private static JsonNode property(String... path) {
        JsonNode n = SCHEMA;
        for (String p : path) {
            n = n.path("properties").path(p);
        }
        return n;
    }

    private static List<String> words(JsonNode withEnum) {
        List<String> w = new ArrayList<>();
        withEnum.path("enum").forEach(v -> w.add(v.asText()));
        return w;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examplesAndTemplates")
    void everyExampleAndTemplateValidates(String name) throws IOException {
        Problems problems = new Problems(name);
        YamlNode.Mapping root = YamlTreeReader.read(text(name), problems, "").orElseThrow();
        assertThat(RequirementSchema.raw(RequirementSchema.json(root))).isEmpty();
    }

    @Test
    void theSchemaKeySetsAreTheReaderKeySets() {
        assertThat(names(SCHEMA.path("properties"))).containsExactlyElementsOf(RequirementReader.TOP_KEYS);
        assertThat(names(property("load").path("properties"))).containsExactlyElementsOf(JobReader.LOAD_KEYS);
        assertThat(names(property("motion").path("properties"))).containsExactlyElementsOf(JobReader.MOTION_KEYS);
        assertThat(names(property("launch").path("properties"))).containsExactlyElementsOf(JobReader.LAUNCH_KEYS);
        assertThat(names(property("limits").path("properties"))).containsExactlyElementsOf(LimitsReader.LIMIT_KEYS);
        assertThat(names(property("envelope").path("properties"))).containsExactlyElementsOf(LimitsReader.ENVELOPE_KEYS);
        assertThat(names(property("spring").path("properties"))).containsExactlyElementsOf(SpringOptionsReader.KEYS);
        assertThat(names(property("ranking").path("properties"))).containsExactlyElementsOf(RankingReader.KEYS);
    }

    @Test
    void closedSetsAreEnumsWithTheReadersWords() {
        assertThat(words(property("job"))).containsExactly(JobReader.ARREST, JobReader.LAUNCH);
        assertThat(words(SCHEMA.at("/$defs/material"))).containsExactlyElementsOf(MaterialTable.loadDefault().keys());
        assertThat(words(SCHEMA.at("/$defs/endType")))
                .containsExactlyInAnyOrderElementsOf(Arrays.stream(EndType.values()).map(EndType::key).toList());
        assertThat(words(property("spring", "seating")))
                .containsExactlyElementsOf(Arrays.stream(Seating.values()).map(Seating::key).toList());
        assertThat(words(property("ranking", "by")))
                .containsExactlyElementsOf(Arrays.stream(RankBy.values()).map(RankBy::key).toList());
        assertThat(words(property("spring", "wire_series"))).containsExactly("metric", "inch");
        assertThat(words(property("ranking", "prefer"))).containsExactly("stock", "custom", "none");
        assertThat(words(property("ranking", "dynamics"))).containsExactly("warn", "strict");
        assertThat(words(property("motion", "direction").path("anyOf").path(0))).containsExactly("down", "horizontal", "up");
        assertThat(words(property("launch", "direction").path("anyOf").path(0))).containsExactly("up");
    }

    @Test
    void quantityAndNumberPatternsAreTheReadersGrammar() {
        SchemaIndex.KINDS.forEach((def, kind) -> assertThat(SCHEMA.at("/$defs/" + def + "/pattern").asText())
                .as(def).isEqualTo(Grammar.quantityPattern(kind)));
        assertThat(SCHEMA.at("/$defs/number/pattern").asText()).isEqualTo(Grammar.numberPattern());
    }

    @Test
    void everyKeyHasADescriptionAndEveryBoundIsDocumented() {
        List<String> undocumented = new ArrayList<>();
        describeAll(SCHEMA, "", undocumented);
        assertThat(undocumented).isEmpty();
        Magnitudes.all().forEach((key, bound) -> {
            if (key.contains(".")) {
                JsonNode p = property(key.split("\\."));
                assertThat(p.path("description").asText()).as(key).contains("at most " + bound.maxText());
            }
        });
    }

    private static void describeAll(JsonNode node, String path, List<String> undocumented) {
        for (Iterator<Map.Entry<String, JsonNode>> it = node.path("properties").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            String key = path.isEmpty() ? e.getKey() : path + "." + e.getKey();
            if (e.getValue().path("description").asText().isBlank()) {
                undocumented.add(key);
            }
            describeAll(e.getValue(), key, undocumented);
        }
    }

    @Test
    void theDocsCopyIsTheBundledSchemaAndTheCommandPrintsIt() throws IOException {
        assertThat(Files.readString(Path.of("docs/requirement.schema.json"))).isEqualTo(RequirementSchema.text());
    }

    // The draft 2020-12 meta-schema (json-schema.org), which the validator library bundles.
    @Test
    void theSchemaIsAValidDraft202012Schema() throws IOException {
        JsonSchemaFactory factory = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012);
        JsonNode schema = new ObjectMapper().readTree(RequirementSchema.text());
        assertThat(factory.getSchema(SchemaLocation.of("https://json-schema.org/draft/2020-12/schema")).validate(schema))
                .isEmpty();
    }

    @Test
    void examplesPointEditorsAtTheSchema() throws IOException {
        for (Path example : ExampleRequirementsTest.examples()) {
            try (Stream<String> lines = Files.lines(example)) {
                assertThat(lines.limit(3)).as(example.toString())
                        .contains("# yaml-language-server: $schema=../docs/requirement.schema.json");
            }
        }
        assertThat(RequirementTemplates.arrest()).contains("# yaml-language-server: $schema=requirement.schema.json");
        assertThat(RequirementTemplates.launch()).contains("# yaml-language-server: $schema=requirement.schema.json");
    }
}
