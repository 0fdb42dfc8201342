package dev.coilwise.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;

import dev.coilwise.error.BadInputException;
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
 * The corpus of bad stock catalogues: each folder under {@code bad/} is named after its case and holds a
 * {@code catalog.csv} (and, for mapping cases, its {@code catalog.mapping.yaml}) and an {@code expected.txt} with the
 * exact message the reader must refuse it with (bad input, exit 2), line for line. Running with
 * {@code -Dcorpus.write=true} writes a missing {@code expected.txt} from what the reader says, to be read and
 * corrected by hand; an existing one is never overwritten.
 */
class BadCatalogCorpusTest {
    private static final CatalogReader READER = new CatalogReader(MaterialTable.loadDefault());

    static Path corpus() {
        try {
            return Path.of(BadCatalogCorpusTest.class.getResource("bad").toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static Stream<String> cases() throws IOException {
        try (Stream<Path> dirs = Files.list(corpus())) {
            return dirs.filter(Files::isDirectory).map(p -> p.getFileName().toString()).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void theReaderRefusesTheCatalogueWithTheExpectedMessage(String name) throws IOException {
        Path dir = corpus().resolve(name);
        Throwable t = catchThrowable(() -> READER.read(dir.resolve("catalog.csv")));
        assertThat(t).as(name).isInstanceOf(BadInputException.class);
        List<String> found = t.getMessage().lines().toList();
        Path expectedFile = dir.resolve("expected.txt");
        if (!Files.exists(expectedFile) && Boolean.getBoolean("corpus.write")) {
            Files.write(Path.of("src/test/resources/dev/coilwise/catalog/bad", name, "expected.txt"), found,
                    StandardCharsets.UTF_8);
        }
        assertThat(expectedFile).as("%s has no expected.txt", name).exists();
        assertThat(found).containsExactlyElementsOf(Files.readAllLines(expectedFile, StandardCharsets.UTF_8));
    }
}
