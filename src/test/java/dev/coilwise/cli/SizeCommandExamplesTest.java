package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.requirement.RequirementReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** `coilwise size` end to end on every shipped example. */
class SizeCommandExamplesTest {
    static final MaterialTable TABLE = MaterialTable.loadDefault();

    static Stream<Path> examples() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("requirements"))) {
            return s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void sizeWritesAShortlistWhoseDesignsTheMechanicsCoreConfirms(Path example, @TempDir Path out) throws IOException {
        CliRunner r = CliRunner.run("size", example.toString(), "--out", out.toString());

        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("CAUTION").contains("binding limit");
        assertThat(out.resolve("shortlist.csv")).exists();
        assertThat(out.resolve("shortlist.json")).exists();
        try (Stream<Path> files = Files.list(out)) {
            assertThat(files.filter(p -> p.getFileName().toString().endsWith(".tmp"))).as("no temporary file left").isEmpty();
        }
        JsonNode json = new ObjectMapper().readTree(out.resolve("shortlist.json").toFile());
        Requirement req = new RequirementReader(TABLE).read(example);
        assertThat(json.path("designs").size()).isBetween(1, req.ranking().shortlist());
        for (JsonNode d : json.path("designs")) {
            Spring s = new Spring(TABLE.get(d.path("material").asText()), EndType.fromKey(d.path("ends").asText()),
                    d.path("wire_diameter_mm").asDouble() / 1e3, d.path("mean_diameter_mm").asDouble() / 1e3,
                    d.path("active_coils").asDouble(), d.path("free_length_mm").asDouble() / 1e3);
            Evaluation e = DesignEvaluator.evaluate(s, req);
            assertThat(e.violations()).as("design %d re-checked", d.path("rank").asInt()).isEmpty();
            assertThat(e.rate() * 1e-3).isCloseTo(d.path("rate_N_per_mm").asDouble(), org.assertj.core.data.Percentage.withPercentage(1e-3));
        }
        long csvRows = Files.readAllLines(out.resolve("shortlist.csv")).stream().filter(l -> !l.startsWith("#")).count();
        assertThat(csvRows).isEqualTo(json.path("designs").size() + 1L);
    }
}
