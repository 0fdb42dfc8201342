package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.testing.TextMutations;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Random mutations of the shipped examples and templates: the reader never fails with anything but a list of
 * problems, every problem prints on one line, and the schema never refuses what the reader accepts (nor reports a
 * mistake at a key where the reader finds none). A modest number of tries here; {@link RequirementParserFuzzTest} runs
 * the same checks with many more.
 */
class RequirementParserPropertiesTest {
    static final MaterialTable TABLE = MaterialTable.loadDefault();
    private static final RequirementReader WITH_SCHEMA = new RequirementReader(TABLE);
    private static final RequirementReader WITHOUT_SCHEMA = new RequirementReader(TABLE, false);

    /** What a check found, for the fuzz run's counts. */
    enum Outcome { ACCEPTED, REFUSED, UNREADABLE_YAML }

    static List<String> bases() {
        List<String> bases = new ArrayList<>();
        try (Stream<Path> files = Files.list(Path.of("requirements"))) {
            for (Path p : files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList()) {
                bases.add(Files.readString(p));
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        bases.add(RequirementTemplates.arrest());
        bases.add(RequirementTemplates.launch());
        return bases;
    }

    @Provide
    Arbitrary<String> mutants() {
        return TextMutations.yaml(bases());
    }

    @Property(tries = 300, edgeCases = EdgeCasesMode.NONE)
    void theReaderOnlyEverReportsProblems(@ForAll("mutants") String yaml) {
        readsOrReports(yaml);
    }

    @Property(tries = 300, edgeCases = EdgeCasesMode.NONE)
    void theSchemaNeverRefusesWhatTheReaderAccepts(@ForAll("mutants") String yaml) {
        schemaAgreesWithReader(yaml);
    }

    /** Parses; returns whether the file was accepted. Anything thrown but a RequirementException fails the check. */
    static Outcome readsOrReports(String yaml) {
        try {
            WITH_SCHEMA.parse(yaml, "m.yaml", null);
            return Outcome.ACCEPTED;
        } catch (RequirementException e) {
            assertThat(e.problems()).isNotEmpty();
            assertThat(e.getMessage().lines()).hasSize(e.problems().size() + 1);
            for (InputProblem p : e.problems()) {
                assertThat(p.message()).isNotBlank().doesNotContainPattern("\\p{Cntrl}");
                assertThat(p.key()).doesNotContainPattern("\\p{Cntrl}");
                assertThat(p.line()).isNotNegative();
                assertThat(p.toString().length()).as("problem length").isLessThan(1200);
            }
            return Outcome.REFUSED;
        }
    }

    /**
     * The schema and the reader agree: a file the reader (without the schema) accepts has no schema error, and every
     * schema error sits at a key where the reader, too, reports a problem (or at a key below one).
     */
    static Outcome schemaAgreesWithReader(String yaml) {
        Problems tree = new Problems("m.yaml");
        Optional<YamlNode.Mapping> root = YamlTreeReader.read(yaml, tree, RequirementReader.NEEDED);
        if (root.isEmpty() || !tree.isEmpty()) {
            return Outcome.UNREADABLE_YAML;
        }
        Problems schema = new Problems("m.yaml");
        RequirementSchema.check(root.get(), schema);
        List<String> readerKeys;
        try {
            WITHOUT_SCHEMA.parse(yaml, "m.yaml", null);
            readerKeys = List.of();
        } catch (RequirementException e) {
            readerKeys = e.problems().stream().map(InputProblem::key).toList();
        }
        List<String> keys = readerKeys;
        if (keys.isEmpty()) {
            assertThat(schema.schemaList()).as("schema errors on a file the reader accepts").isEmpty();
            return Outcome.ACCEPTED;
        }
        for (InputProblem p : schema.schemaList()) {
            assertThat(keys).as("the reader also reports something at or above %s", p)
                    .anyMatch(k -> k.equals(p.key()) || p.key().startsWith(k + "."));
        }
        return Outcome.REFUSED;
    }
}
