package dev.coilwise.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.catalog.CatalogGenerator.Row;
import dev.coilwise.catalog.CatalogGenerator.Units;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Requirement;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Generate a small seeded catalogue, write it, import it, evaluate it; and the committed demo catalogues. */
class CatalogRoundTripTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    @ParameterizedTest
    @EnumSource(Units.class)
    void aGeneratedCatalogueSurvivesWriteImportAndEvaluation(Units units, @TempDir Path dir) throws IOException {
        List<Row> rows = CatalogGenerator.generate(TABLE, units, 300, 7);
        Path file = dir.resolve("small.csv");
        try (var w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            CatalogGenerator.write(rows, units, "demo data for a test", w);
        }
        StockCatalog c = new CatalogReader(TABLE).read(file);
        assertThat(c.issues()).isEmpty();
        assertThat(c.demo()).isTrue();
        assertThat(c.description()).isEqualTo("demo data for a test");
        assertThat(c.parts()).hasSize(rows.size());
        // the generator rounds the geometry to the printed digits before computing, so it survives the round trip
        double eps = 1e-12;
        for (int i = 0; i < rows.size(); i++) {
            StockPart p = c.parts().get(i);
            Row r = rows.get(i);
            assertThat(p.partNumber()).isEqualTo(r.partNumber());
            assertThat(p.spring().material()).isEqualTo(r.spring().material());
            assertThat(p.spring().ends()).isEqualTo(r.spring().ends());
            assertThat(p.spring().wireDiameter()).isCloseTo(r.spring().wireDiameter(), within(eps));
            assertThat(p.spring().outerDiameter()).isCloseTo(r.spring().outerDiameter(), within(eps));
            assertThat(p.spring().freeLength()).isCloseTo(r.spring().freeLength(), within(eps));
            assertThat(p.spring().activeCoils()).isEqualTo(r.spring().activeCoils());
            // the stated rate was printed to 3 significant digits from the same geometry
            assertThat(p.statedRate().getAsDouble()).isCloseTo(p.spring().rate(), within(0.005 * p.spring().rate()));
            assertThat(p.spring().rate()).isCloseTo(r.spring().rate(), within(1e-9 * r.spring().rate()));
            assertThat(p.unitPrice()).isEqualTo(r.unitPrice());
        }

        Requirement req = Requirements.arrest(2.0, 1.5, 0.040, OptionalDouble.empty());
        List<StockEvaluation> evals = StockEvaluator.evaluate(c.parts(), req);
        assertThat(evals).hasSize(rows.size());
        for (StockEvaluation e : evals) {
            Margin m = e.stockMargins().get(0);
            assertThat(m.key()).isEqualTo("stock_max_deflection");
            assertThat(m.actual()).isEqualTo(e.evaluation().totalDeflection());
            assertThat(e.feasible()).isEqualTo(e.evaluation().feasible() && e.stockMargins().stream().allMatch(Margin::holds));
        }
        assertThat(evals).anyMatch(StockEvaluation::feasible).anyMatch(e -> !e.feasible());
    }

    /** The committed demo catalogues are reproducible from their seed and import without an issue. */
    @ParameterizedTest
    @EnumSource(Units.class)
    void theCommittedDemoCatalogueIsReproducibleAndClean(Units units) throws IOException {
        Path file = Path.of("spring-catalogs", units == Units.METRIC ? "demo-metric.csv" : "demo-inch.csv");
        StringWriter regenerated = new StringWriter();
        CatalogGenerator.write(CatalogGenerator.generate(TABLE, units, CatalogGenerator.DEMO_PARTS,
                CatalogGenerator.DEMO_SEED + units.ordinal()), units, CatalogGenerator.DEMO_COMMENT, regenerated);
        assertThat(Files.readString(file, StandardCharsets.UTF_8)).isEqualTo(regenerated.toString());

        StockCatalog c = new CatalogReader(TABLE).read(file);
        assertThat(c.issues()).isEmpty();
        assertThat(c.parts()).hasSizeGreaterThanOrEqualTo(2000);
        assertThat(c.demo()).isTrue();
        assertThat(c.parts()).allSatisfy(p -> assertThat(p.has(StockFlag.DEMO_DATA)).isTrue());
        assertThat(c.parts().stream().map(StockPart::partNumber).distinct().count()).isEqualTo(c.parts().size());
    }

    @Test
    void aCatalogueWithoutADemoCommentIsNotDemoData() {
        String csv = "part_number,supplier,material,ends,wire_diameter_mm,outer_diameter_mm,free_length_mm,"
                + "active_coils,unit_price\nP,S,music-wire,closed,1,10,30,6,1\n";
        StockCatalog c = new CatalogReader(TABLE).read(new java.io.StringReader(csv), "plain.csv", null);
        assertThat(c.demo()).isFalse();
        assertThat(c.description()).isEmpty();
        assertThat(c.parts().get(0).flags()).isEmpty();
    }
}
