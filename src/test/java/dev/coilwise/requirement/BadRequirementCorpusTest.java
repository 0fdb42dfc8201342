package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import dev.coilwise.materials.MaterialTable;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The corpus of bad requirement files: each folder under {@code bad/} is named after its case and holds one
 * {@code requirement.yaml} and an {@code expected.txt} with every problem the reader must report, one per line, as
 * {@code line:column: key: message} (the file name left out; {@code ${corpus}} stands for the folder of all cases).
 *
 * <p>A new case is added by writing its folder and its {@code requirement.yaml}; running this test with
 * {@code -Dcorpus.write=true} writes a missing {@code expected.txt} from what the reader says, to be read and
 * corrected by hand before it is committed. An existing {@code expected.txt} is never overwritten.
 */
class BadRequirementCorpusTest {
    private static final RequirementReader READER = new RequirementReader(MaterialTable.loadDefault());
    static final String EXPECTED = "expected.txt";

    static Path corpus() {
        try {
            return Path.of(BadRequirementCorpusTest.class.getResource("bad").toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static Stream<String> cases() throws IOException {
        try (Stream<Path> dirs = Files.list(corpus())) {
            return dirs.filter(Files::isDirectory).map(p -> p.getFileName().toString()).sorted().toList().stream();
        }
    }

    /** The problems as "line:column: key: message", the file name left out. */
    static List<String> problems(Path file) {
        RequirementException e = catchThrowableOfType(RequirementException.class, () -> READER.read(file));
        assertThat(e).as("reading %s should fail", file).isNotNull();
        return e.problems().stream().map(p -> {
            assertThat(p.file()).isEqualTo(file.toString());
            return p.line() + ":" + p.column() + ": " + (p.key().isEmpty() ? "" : p.key() + ": ") + p.message();
        }).toList();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void theReaderReportsExactlyTheExpectedProblems(String name) throws IOException {
        Path dir = corpus().resolve(name);
        List<String> found = problems(dir.resolve("requirement.yaml"));
        Path expectedFile = dir.resolve(EXPECTED);
        if (!Files.exists(expectedFile) && Boolean.getBoolean("corpus.write")) {
            Path source = Path.of("src/test/resources/dev/coilwise/requirement/bad", name, EXPECTED);
            Files.write(source, found.stream().map(l -> l.replace(corpus().toString(), "${corpus}")).toList(),
                    StandardCharsets.UTF_8);
        }
        assertThat(expectedFile).as("%s has no %s", name, EXPECTED).exists();
        List<String> expected = Files.readAllLines(expectedFile, StandardCharsets.UTF_8).stream()
                .filter(l -> !l.isBlank()).map(l -> l.replace("${corpus}", corpus().toString())).toList();
        assertThat(found).containsExactlyElementsOf(expected);
    }
}
