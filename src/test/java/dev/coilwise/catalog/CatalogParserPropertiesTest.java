package dev.coilwise.catalog;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.testing.TextMutations;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Random mutations of catalogues in our format and of a supplier export read through its mapping: the reader either
 * returns parts or refuses the file with bad input whose every line is printable, strict and lenient alike; a lenient
 * read never fails on a row. {@link CatalogParserFuzzTest} runs the same checks with many more tries.
 */
class CatalogParserPropertiesTest {
    static final MaterialTable TABLE = MaterialTable.loadDefault();
    private static final CatalogReader STRICT = new CatalogReader(TABLE);
    private static final CatalogReader LENIENT = new CatalogReader(TABLE, true);

    /** What a check found, for the fuzz run's counts. */
    enum Outcome { READ, REFUSED }

    static final ColumnMapping EXPORT_MAPPING = load("spring-catalogs/example-export.mapping.yaml");

    private static ColumnMapping load(String path) {
        return ColumnMapping.load(Path.of(path));
    }

    /** The demo catalogue's comment, header and first 40 parts, and the supplier export. */
    static List<String> nativeBases() {
        try {
            List<String> lines = Files.readAllLines(Path.of("spring-catalogs/demo-metric.csv"));
            return List.of(String.join("\n", lines.subList(0, 42)) + "\n");
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    static List<String> exportBases() {
        try {
            return List.of(Files.readString(Path.of("spring-catalogs/example-export.csv")));
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    @Provide
    Arbitrary<String> nativeMutants() {
        return TextMutations.csv(nativeBases());
    }

    @Provide
    Arbitrary<String> exportMutants() {
        return TextMutations.csv(exportBases());
    }

    @Property(tries = 300, edgeCases = EdgeCasesMode.NONE)
    void ourFormatIsReadOrRefusedWithAMessage(@ForAll("nativeMutants") String csv) {
        readsOrRefuses(csv, null);
    }

    @Property(tries = 200, edgeCases = EdgeCasesMode.NONE)
    void aMappedExportIsReadOrRefusedWithAMessage(@ForAll("exportMutants") String csv) {
        readsOrRefuses(csv, EXPORT_MAPPING);
    }

    static Outcome readsOrRefuses(String csv, ColumnMapping mapping) {
        Outcome strict = outcome(STRICT, csv, mapping);
        Outcome lenient = outcome(LENIENT, csv, mapping);
        if (strict == Outcome.READ) {
            assertThat(lenient).as("lenient reads what strict reads").isEqualTo(Outcome.READ);
        }
        return strict;
    }

    private static Outcome outcome(CatalogReader reader, String csv, ColumnMapping mapping) {
        try {
            StockCatalog c = reader.read(new StringReader(csv), "m.csv", mapping);
            for (CatalogIssue i : c.issues()) {
                assertThat(i.message()).doesNotContainPattern("\\p{Cntrl}");
            }
            for (StockPart p : c.parts()) {
                assertThat(p.partNumber() + p.supplier() + p.currency()).doesNotContainPattern("\\p{Cntrl}");
                assertThat(p.spring().rate()).isPositive().isFinite();
            }
            return Outcome.READ;
        } catch (BadInputException e) {
            for (String line : e.getMessage().lines().toList()) {
                assertThat(line).doesNotContainPattern("\\p{Cntrl}");
            }
            return Outcome.REFUSED;
        }
    }
}
