package dev.coilwise.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import java.net.URISyntaxException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** A supplier export with its own column names, units, separators and value names, read through a mapping file. */
class ColumnMappingTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    private static Path resource(String name) throws URISyntaxException {
        return Path.of(ColumnMappingTest.class.getResource(name).toURI());
    }

    @Test
    void aDifferentlyNamedTabSeparatedExportWithDecimalCommasMapsOntoOurFields() throws Exception {
        ColumnMapping m = ColumnMapping.load(resource("mapped/mapping.yaml"));
        StockCatalog c = new CatalogReader(TABLE).read(resource("mapped/export.tsv"), m);
        assertThat(c.issues()).isEmpty();
        assertThat(c.demo()).isFalse();
        assertThat(c.parts()).hasSize(2);
        StockPart t1 = c.parts().get(0);
        assertThat(t1.partNumber()).isEqualTo("T-1");
        assertThat(t1.supplier()).isEqualTo("Demo Vendor");
        assertThat(t1.spring().material().key()).isEqualTo("music-wire");
        assertThat(t1.spring().ends()).isEqualTo(EndType.CLOSED_GROUND);
        assertThat(t1.spring().wireDiameter()).isCloseTo(2.5e-3, within(1e-15));
        assertThat(t1.spring().meanDiameter()).isCloseTo(22.5e-3, within(1e-15));
        assertThat(t1.spring().activeCoils()).isEqualTo(6.5);
        assertThat(t1.spring().freeLength()).isCloseTo(0.080, within(1e-15));
        // 1.5 in = 38.1 mm exactly (international inch)
        assertThat(t1.maxDeflection().getAsDouble()).isCloseTo(0.0381, within(1e-15));
        assertThat(t1.statedSolidLength().getAsDouble()).isCloseTo(21.25e-3, within(1e-15));
        assertThat(t1.unitPrice()).isEqualTo(3.10);
        assertThat(t1.packQuantity()).isEqualTo(4);
        assertThat(t1.currency()).isEqualTo("EUR");
        StockPart t2 = c.parts().get(1);
        assertThat(t2.spring().material().key()).isEqualTo("stainless-302");
        assertThat(t2.spring().ends()).isEqualTo(EndType.CLOSED);
        assertThat(t2.statedSolidLength()).isEmpty();
        assertThat(t2.packQuantity()).isEqualTo(1);
    }

    @Test
    void theShippedExampleExportImportsCleanly() {
        Path dir = Path.of("spring-catalogs");
        // the mapping is found beside the export by its name: example-export.mapping.yaml
        assertThat(CatalogReader.sidecar(dir.resolve("example-export.csv")))
                .isEqualTo(dir.resolve("example-export.mapping.yaml"));
        StockCatalog c = new CatalogReader(TABLE).read(dir.resolve("example-export.csv"));
        assertThat(c.issues()).isEmpty();
        assertThat(c.demo()).isTrue();
        assertThat(c.parts()).hasSize(4).allSatisfy(p -> assertThat(p.has(StockFlag.DEMO_DATA)).isTrue());
        StockPart w100 = c.parts().get(0);
        assertThat(w100.supplier()).isEqualTo("Demo Supplier West");
        assertThat(w100.spring().activeCoils()).isEqualTo(10); // 12 total, closed-ground: Na = Nt − 2
        // 12.9 lbf/in = 12.9 × 4.4482216 N / 0.0254 m = 2259.1 N/m (1 lbf = 0.45359237 kg × 9.80665 m/s², exact)
        assertThat(w100.statedRate().getAsDouble()).isCloseTo(2259.1, within(0.1));
        assertThat(w100.maxLoad().getAsDouble()).isCloseTo(5.2 * 4.4482216, within(1e-6));
    }

    @Test
    void aMappedColumnMissingFromTheExportIsAHeaderError() throws Exception {
        ColumnMapping m = ColumnMapping.parse("""
                columns: {part_number: Item, supplier: Maker, material: Grade, ends: Ends, wire_diameter: Wire,
                          outer_diameter: OD, free_length: Length, active_coils: Coils, unit_price: Price}
                units: {length: mm}
                """, "m.yaml");
        String csv = "Item,Maker,Grade,Ends,Wire,OD,Length,Coils,Cost\nA,B,music-wire,closed,1,10,30,6,1\n";
        assertThatThrownBy(() -> new CatalogReader(TABLE).read(new java.io.StringReader(csv), "x.csv", m))
                .isInstanceOf(BadInputException.class)
                .hasMessageContaining("x.csv:1: error: column 'Price': the mapping reads unit_price from this column"
                        + " but the header has no such column");
    }

    @Test
    void everyMappingProblemIsListedTogether() {
        String yaml = """
                columns:
                  part_number: Item
                  wire_dia: Wire
                  free_length: Length
                  outer_diameter: OD
                  supplier: Maker
                units:
                  outer_diameter: furlong
                constants:
                  supplier: Demo
                """;
        assertThatThrownBy(() -> ColumnMapping.parse(yaml, "bad.yaml")).isInstanceOf(BadInputException.class)
                .hasMessageContaining("bad.yaml: the column mapping has")
                .hasMessageContaining("unknown field in columns 'wire_dia'")
                .hasMessageContaining("field 'free_length' needs a unit")
                .hasMessageContaining("unknown unit of outer_diameter 'furlong'; allowed: mm, in, m")
                .hasMessageContaining("field 'supplier' is given both as a column and as a constant")
                .hasMessageContaining("no column for material");
    }

    @Test
    void aMaterialNameMappedToAnUnknownKeyIsRejected() {
        ColumnMapping m = ColumnMapping.parse("""
                columns: {part_number: Item, supplier: Maker, material: Grade, ends: Ends, wire_diameter: Wire,
                          outer_diameter: OD, free_length: Length, active_coils: Coils, unit_price: Price}
                units: {length: mm}
                material_names: {MW: music-wyre}
                """, "m.yaml");
        String csv = "Item,Maker,Grade,Ends,Wire,OD,Length,Coils,Price\nA,B,MW,closed,1,10,30,6,1\n";
        assertThatThrownBy(() -> new CatalogReader(TABLE).read(new java.io.StringReader(csv), "x.csv", m))
                .hasMessageContaining("material_names.MW maps to unknown material 'music-wyre' (did you mean 'music-wire'?);"
                        + " known materials: music-wire,");
    }

    // A mapping is written in our field keys, so a missing field is named by its key and where it goes, not by the
    // header names of our own CSV format (free_length_mm, ...), which a mapping never uses.
    @Test
    void aMissingFieldIsNamedByItsMappingKeyWithWhereToPutItAndItsUnitWhenNoneIsGiven() {
        String yaml = """
                columns: {part_number: Item, supplier: Maker, material: Grade, ends: Ends, wire_diameter: Wire,
                          outer_diameter: OD, unit_price: Price}
                units: {wire_diameter: mm, outer_diameter: mm}
                """;
        assertThatThrownBy(() -> ColumnMapping.parse(yaml, "m.yaml")).isInstanceOf(BadInputException.class)
                .hasMessageContaining("no column for free_length (free length); map it under columns as 'free_length:"
                        + " <the export's column header>' and its unit under units as 'length: mm' (or 'free_length:"
                        + " mm'; units: mm, in, m), or give it under constants")
                .hasMessageContaining("no column for active_coils or total_coils (coil count); map it under columns as"
                        + " 'active_coils: <the export's column header>' or 'total_coils: <...>', or give it under"
                        + " constants")
                .hasMessageNotContaining("free_length_mm");
        assertThatThrownBy(() -> ColumnMapping.parse(yaml.replace("outer_diameter: mm}", "outer_diameter: mm, length:"
                + " in}"), "m.yaml")).hasMessageContaining("map it under columns as 'free_length: <the export's column"
                + " header>', or give it under constants");
    }

    // Requirement files take unit symbols only ('1.2 inch' is refused there too), so a mapping does not accept unit
    // names either; a name written in full points to its symbol, which edit distance alone would not find.
    @Test
    void aUnitWrittenInFullIsRefusedWithItsSymbolAsTheHint() {
        String yaml = """
                columns: {part_number: Item, supplier: Maker, material: Grade, ends: Ends, wire_diameter: Wire,
                          outer_diameter: OD, free_length: Length, active_coils: Coils, unit_price: Price}
                units: {length: %s}
                """;
        assertThatThrownBy(() -> ColumnMapping.parse(yaml.formatted("inches"), "m.yaml"))
                .hasMessageContaining("unknown unit of wire_diameter 'inches' (did you mean 'in'?); allowed: mm, in, m");
        assertThatThrownBy(() -> ColumnMapping.parse(yaml.formatted("Inch"), "m.yaml"))
                .hasMessageContaining("unknown unit of free_length 'Inch' (did you mean 'in'?)");
        assertThatThrownBy(() -> ColumnMapping.parse(yaml.formatted("millimetres"), "m.yaml"))
                .hasMessageContaining("'millimetres' (did you mean 'mm'?)");
        assertThatThrownBy(() -> ColumnMapping.parse(yaml.formatted("newtons"), "m.yaml"))
                .hasMessageContaining("unknown unit of wire_diameter 'newtons'; allowed: mm, in, m");
    }
}
