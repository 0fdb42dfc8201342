package dev.coilwise.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import java.io.StringReader;
import org.junit.jupiter.api.Test;

/** Import rules: recomputation, stated-value checks, error collection and positions. */
class CatalogReaderTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();
    private static final String HEADER = "part_number,supplier,material,ends,wire_diameter_mm,outer_diameter_mm,"
            + "free_length_mm,active_coils,rate_n_per_mm,solid_length_mm,unit_price\n";

    private static StockCatalog read(String csv, boolean lenient) {
        return new CatalogReader(TABLE, lenient).read(new StringReader(csv), "test.csv", null);
    }

    /**
     * Music wire d = 2 mm, OD 22 mm (D = 20 mm), 8 active coils, closed and ground: G = 81.0 GPa (material table,
     * band 1.6..3.0 mm), R = G d⁴/(8 D³ Na) = 81000 · 16 / (8 · 8000 · 8) = 2.5313 N/mm (Shigley's MED 9th ed.,
     * Eq. 10-9); Ls = d·Nt = 2 · 10 = 20 mm (Table 10-1). A stated 3.30 N/mm is 30 % off: a warning at line 3,
     * column rate_n_per_mm, and the part keeps the computed rate.
     */
    @Test
    void aWrongStatedRateIsCaughtAndTheComputedRateIsUsed() {
        StockCatalog c = read("# a comment\n" + HEADER
                + "P-1,Demo,music-wire,closed-ground,2,22,60,8,3.30,20,1.00\n"
                + "P-2,Demo,music-wire,closed-ground,2,22,60,8,2.60,20,1.00\n", false);
        assertThat(c.parts()).hasSize(2);
        StockPart wrong = c.parts().get(0);
        assertThat(wrong.spring().rate() * 1e-3).isCloseTo(2.5313, within(0.0001));
        assertThat(wrong.spring().solidLength() * 1e3).isCloseTo(20, within(1e-9));
        assertThat(wrong.statedRate().getAsDouble() * 1e-3).isCloseTo(3.30, within(1e-12));
        assertThat(wrong.has(StockFlag.STATED_RATE_DIFFERS)).isTrue();
        assertThat(wrong.usesComputedValues()).isTrue();
        assertThat(c.parts().get(1).flags()).isEmpty();
        assertThat(c.warnings()).singleElement().satisfies(w -> {
            assertThat(w.line()).isEqualTo(3);
            assertThat(w.column()).isEqualTo("rate_n_per_mm");
            assertThat(w.toString()).startsWith("test.csv:3: warning: column 'rate_n_per_mm': stated rate 3.300 N/mm")
                    .contains("computed 2.531 N/mm").contains("30 %");
        });
    }

    @Test
    void aWrongStatedSolidLengthIsFlagged() {
        StockCatalog c = read(HEADER + "P-1,Demo,music-wire,closed-ground,2,22,60,8,,25,1.00\n", false);
        assertThat(c.parts().get(0).has(StockFlag.STATED_SOLID_LENGTH_DIFFERS)).isTrue();
        assertThat(c.warnings()).singleElement().satisfies(w -> assertThat(w.column()).isEqualTo("solid_length_mm"));
    }

    @Test
    void aMisspeltColumnIsIgnoredWithAWarningThatNamesTheNearestHeader() {
        StockCatalog c = read(HEADER.replace("\n", ",wire_diamter_mm,Remarks\n")
                + "P-1,Demo,music-wire,closed-ground,2,22,60,8,,,1.00,2,note\n", false);
        assertThat(c.parts()).hasSize(1);
        assertThat(c.warnings()).extracting(CatalogIssue::toString).containsExactly(
                "test.csv:1: warning: column 'wire_diamter_mm': column is not part of the catalogue format and is"
                        + " ignored (did you mean 'wire_diameter_mm'?); known fields: " + CatalogField.keys(),
                "test.csv:1: warning: column 'Remarks': column is not part of the catalogue format and is ignored;"
                        + " known fields: " + CatalogField.keys());
    }

    @Test
    void everyRowErrorIsCollectedWithFileLineAndColumnBeforeFailing() {
        String csv = HEADER
                + "P-1,Demo,unobtainium,closed-ground,2,22,60,8,,,1.00\n"     // line 2: unknown material
                + "P-2,Demo,music-wire,squashed,2,22,60,8,,,1.00\n"           // line 3: unknown end type
                + "P-3,Demo,music-wire,closed-ground,two,22,60,8,,,1.00\n"    // line 4: bad number
                + "P-4,Demo,music-wire,closed-ground,2,22,60\n"               // line 5: ragged
                + "P-5,Demo,music-wire,closed-ground,2,22,,8,,,1.00\n"        // line 6: empty required cell
                + "P-6,Demo,music-wire,closed-ground,2,22,60,8,,,1.00\n";     // line 7: good
        assertThatThrownBy(() -> read(csv, false)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("test.csv: 5 error(s)")
                .hasMessageContaining("test.csv:2: error: column 'material': unknown material 'unobtainium'")
                .hasMessageContaining("test.csv:3: error: column 'ends': unknown end type 'squashed'")
                .hasMessageContaining("test.csv:4: error: column 'wire_diameter_mm': wire diameter must be a number in mm, got 'two'")
                .hasMessageContaining("test.csv:5: error: row has 7 fields but the header has 11")
                .hasMessageContaining("test.csv:6: error: column 'free_length_mm': free length is required");
    }

    @Test
    void aLenientReaderSkipsBadRowsAndKeepsTheirErrors() {
        StockCatalog c = read(HEADER
                + "P-1,Demo,unobtainium,closed-ground,2,22,60,8,,,1.00\n"
                + "P-2,Demo,music-wire,closed-ground,2,22,60,8,,,1.00\n", true);
        assertThat(c.parts()).extracting(StockPart::partNumber).containsExactly("P-2");
        assertThat(c.errors()).singleElement().satisfies(e -> assertThat(e.line()).isEqualTo(2));
    }

    @Test
    void aWireOutsideTheMaterialRangeIsSkippedWithAWarning() {
        // chrome-silicon covers 1.6..9.5 mm (material table, Shigley's Table 10-4); 1.0 mm is outside
        StockCatalog c = read(HEADER + "P-1,Demo,chrome-silicon,closed-ground,1.0,11,40,8,,,1.00\n", false);
        assertThat(c.parts()).isEmpty();
        assertThat(c.warnings()).singleElement().satisfies(w -> assertThat(w.message())
                .contains("part skipped").contains("1.000 mm is outside the range of chrome-silicon"));
    }

    @Test
    void anImpossibleGeometryIsAnErrorOnItsRow() {
        // 8 active coils of 2 mm wire, closed-ground: solid 20 mm, longer than the 15 mm free length
        assertThatThrownBy(() -> read(HEADER + "P-1,Demo,music-wire,closed-ground,2,22,15,8,,,1.00\n", false))
                .hasMessageContaining("test.csv:2: error: the geometry is not a valid spring: free length 15.000 mm"
                        + " must exceed the solid length 20.000 mm");
    }

    @Test
    void aLengthColumnWithoutUnitFailsTheHeaderEvenWhenLenient() {
        String csv = "part_number,supplier,material,ends,wire_diameter,outer_diameter_mm,free_length_mm,"
                + "active_coils,unit_price\nP-1,Demo,music-wire,closed-ground,2,22,60,8,1\n";
        assertThatThrownBy(() -> read(csv, true)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("test.csv:1: error: column 'wire_diameter': a length column needs its unit"
                        + " in the header; write one of: wire_diameter_mm, wire_diameter_in, wire_diameter_m");
    }

    @Test
    void aUnitSuffixWrittenInFullIsRefusedWithItsSuffixAsTheHint() {
        String csv = "part_number,supplier,material,ends,wire_diameter_mm,outer_diameter_mm,free_length_inches,"
                + "active_coils,unit_price\nP-1,Demo,music-wire,closed-ground,2,22,60,8,1\n";
        assertThatThrownBy(() -> read(csv, false)).hasMessageContaining("column 'free_length_inches': unknown unit"
                + " suffix 'inches' (did you mean 'in'?); write one of: free_length_mm, free_length_in, free_length_m");
    }

    @Test
    void aMissingRequiredColumnNamesTheAcceptedHeaders() {
        String csv = "part_number,supplier,material,ends,wire_diameter_mm,free_length_mm,active_coils,unit_price\n";
        assertThatThrownBy(() -> read(csv, false))
                .hasMessageContaining("no column for outer_diameter (outer coil diameter); expected one of:"
                        + " outer_diameter_mm, outer_diameter_in, outer_diameter_m");
    }

    @Test
    void totalCoilsAloneGiveActiveCoilsByTheEndType() {
        String csv = "part_number,supplier,material,ends,wire_diameter_in,outer_diameter_in,free_length_in,"
                + "total_coils,unit_price,currency,pack_quantity\nI-1,Demo,music-wire,closed,0.05,0.55,2.0,12,0.80,USD,10\n";
        StockPart p = read(csv, false).parts().get(0);
        // closed ends: Na = Nt − 2 (Shigley's MED 9th ed., Table 10-1); 1 in = 25.4 mm exactly
        assertThat(p.spring().activeCoils()).isEqualTo(10);
        assertThat(p.spring().wireDiameter()).isCloseTo(1.27e-3, within(1e-15));
        assertThat(p.spring().meanDiameter()).isCloseTo(0.5 * 0.0254, within(1e-15));
        assertThat(p.packQuantity()).isEqualTo(10);
        assertThat(p.packPrice()).isCloseTo(8.0, within(1e-12));
        assertThat(p.currency()).isEqualTo("USD");
        assertThat(p.has(StockFlag.DEMO_DATA)).isFalse();
    }
}
