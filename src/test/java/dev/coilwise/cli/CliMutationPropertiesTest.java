package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.testing.TextMutations;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * The command line on random mutations of the shipped examples and of the templates: {@code coilwise size} never ends in an unhandled exception or an internal fault; it exits 0, 2 or 3,
 * always with something to read, and on bad input (2) it writes nothing. The same for {@code check} and
 * {@code simulate} on mutated spring files, and for {@code report} on mutated saved shortlists. The Monte Carlo and the simulation run with
 * their smallest settings to keep each try short; {@link CliMutationFuzzTest} runs many more tries.
 */
class CliMutationPropertiesTest {
    /** The example the spring-file and saved-shortlist checks start from. */
    static final String TOOL_CARRIER = "arrest-tool-carrier-drop.yaml";

    static List<String> bases() {
        try (Stream<Path> examples = Files.list(Path.of("requirements"))) {
            List<String> bases = new java.util.ArrayList<>();
            for (Path p : examples.filter(f -> f.toString().endsWith(".yaml")).sorted().toList()) {
                bases.add(Files.readString(p));
            }
            bases.add(CliRunner.run("new", "arrest").out());
            bases.add(CliRunner.run("new", "launch").out());
            return bases;
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    @Provide
    Arbitrary<String> mutants() {
        return TextMutations.yaml(bases());
    }

    @Property(tries = 40, edgeCases = EdgeCasesMode.NONE)
    void sizeExitsZeroTwoOrThreeWithAMessage(@ForAll("mutants") String yaml) throws IOException {
        check(yaml);
    }

    /** The lightest custom design coilwise finds for the tool-carrier example: it meets every limit (exit 0). */
    static final String SPRING = """
            material: chrome-silicon
            ends: closed-ground
            wire_diameter: 3.55 mm
            mean_diameter: 20.2 mm
            active_coils: 10.5
            free_length: 78.1 mm
            """;

    @Provide
    Arbitrary<String> springMutants() {
        return TextMutations.yaml(List.of(SPRING, SPRING.replace("mean_diameter: 20.2 mm", "outer_diameter: 0.935 in")
                .replace("active_coils: 10.5", "total_coils: 12.5")));
    }

    @Provide
    Arbitrary<String> shortlistMutants() {
        return TextMutations.yaml(SavedShortlists.texts());
    }

    @Property(tries = 30, edgeCases = EdgeCasesMode.NONE)
    void checkAndSimulateExitZeroTwoOrThreeWithAMessage(@ForAll("springMutants") String spring) throws IOException {
        checkSpring(spring);
    }

    @Property(tries = 30, edgeCases = EdgeCasesMode.NONE)
    void reportExitsZeroTwoOrThreeWithAMessage(@ForAll("shortlistMutants") String json) throws IOException {
        checkReport(json);
    }

    /** check and simulate on a spring file, against the tool-carrier example; returns check's exit code. */
    static int checkSpring(String spring) throws IOException {
        Path dir = Files.createTempDirectory("coilwise-spring");
        try {
            Path file = Files.writeString(dir.resolve("spring.yaml"), spring);
            Path req = Path.of("requirements", TOOL_CARRIER);
            CliRunner check = CliRunner.run("check", req.toString(), "--spring", file.toString());
            expectHandled(check);
            CliRunner sim = CliRunner.run("simulate", req.toString(), "--spring", file.toString(), "--masses", "2",
                    "--out", dir.resolve("out").toString());
            expectHandled(sim);
            return check.code();
        } finally {
            delete(dir);
        }
    }

    /** report on a saved shortlist; returns the exit code. */
    static int checkReport(String json) throws IOException {
        Path dir = Files.createTempDirectory("coilwise-report");
        try {
            Path file = Files.writeString(dir.resolve("shortlist.json"), json);
            CliRunner r = CliRunner.run("report", file.toString());
            expectHandled(r);
            if (r.code() == 2) {
                assertThat(dir.resolve("report.html")).doesNotExist();
            }
            return r.code();
        } finally {
            delete(dir);
        }
    }

    private static void expectHandled(CliRunner r) {
        assertThat(r.code()).as("exit code; stderr: %s", r.err()).isIn(0, 2, 3);
        assertThat(r.err()).doesNotContain("internal fault").doesNotContain("\tat ");
        assertThat(r.code() == 2 ? r.err() : r.out()).isNotBlank();
    }

    private static void delete(Path dir) throws IOException {
        try (Stream<Path> all = Files.walk(dir)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }

    /** Runs size on the text; returns the exit code after checking it and what was printed and written. */
    static int check(String yaml) throws IOException {
        Path dir = Files.createTempDirectory("coilwise-mutant");
        try {
            // the requirement sits in requirements/ of a copy so that relative stock paths still resolve
            Path reqDir = Files.createDirectories(dir.resolve("requirements"));
            Files.createDirectories(dir.resolve("spring-catalogs"));
            Files.copy(Path.of("spring-catalogs/demo-metric.csv"), dir.resolve("spring-catalogs/demo-metric.csv"));
            Path file = Files.writeString(reqDir.resolve("mutant.yaml"), yaml);
            Path out = dir.resolve("out");
            CliRunner r = CliRunner.run("size", file.toString(), "--samples", "100", "--masses", "2", "--out", out.toString());
            assertThat(r.code()).as("exit code; stderr: %s", r.err()).isIn(0, 2, 3);
            assertThat(r.err()).doesNotContain("internal fault").doesNotContain("\tat ");
            if (r.code() == 2) {
                assertThat(r.err()).startsWith("error: ");
                assertThat(out).as("nothing written on bad input").doesNotExist();
            } else {
                assertThat(r.out()).contains("CAUTION");
                assertThat(out.resolve("shortlist.json")).exists();
            }
            return r.code();
        } finally {
            delete(dir);
        }
    }
}
