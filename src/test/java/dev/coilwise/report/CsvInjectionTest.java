package dev.coilwise.report;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.catalog.CatalogReader;
import dev.coilwise.catalog.StockPart;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.search.PrunedSearch;
import dev.coilwise.search.ShortlistEntry;
import dev.coilwise.search.Sizer;
import dev.coilwise.search.SizingOptions;
import dev.coilwise.search.SizingResult;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Text from input that a spreadsheet would run as a formula is neutralised in every CSV coilwise writes. */
class CsvInjectionTest {

    // OWASP, "CSV Injection": cells beginning with =, +, -, @, tab (0x09) or carriage return (0x0D).
    @ParameterizedTest
    @ValueSource(strings = {"=1+1", "+1+1", "-1+1", "@SUM(A1)", "\t=1", "\r=1", "  =1+1", "\uff1d1+1"})
    void formulaStartsGetAnApostrophe(String cell) {
        assertThat(CsvCells.safe(cell)).isEqualTo("'" + cell);
    }

    @ParameterizedTest
    @ValueSource(strings = {"DM-10001", "Demo Supplier North", "a=b", "1-2", ""})
    void ordinaryTextIsLeftAlone(String cell) {
        assertThat(CsvCells.safe(cell)).isEqualTo(cell);
    }

    @Test
    void aStockPartNumberAndSupplierThatLookLikeFormulasAreNeutralisedInTheShortlistCsv() throws IOException {
        MaterialTable table = MaterialTable.loadDefault();
        Requirement req = new RequirementReader(table).read(Path.of("requirements/arrest-tool-carrier-drop.yaml"));
        List<StockPart> demo = new CatalogReader(table).read(Path.of("spring-catalogs/demo-metric.csv")).parts();
        Sizer sizer = new Sizer(table, new PrunedSearch(), SizingOptions.searchOnly());
        StockPart feasible = sizer.size(req, demo).shortlist().stream().filter(e -> e.candidate().isStock())
                .findFirst().orElseThrow().candidate().stock().orElseThrow();
        StockPart evil = new StockPart("=HYPERLINK(\"http://example.invalid\",\"click\")", "@SUM(1+1)*cmd|' /C calc'!A0",
                feasible.spring(), feasible.unitPrice(), feasible.currency(), feasible.packQuantity(),
                feasible.statedRate(), feasible.statedSolidLength(), feasible.maxDeflection(), feasible.maxLoad(),
                feasible.flags(), feasible.source());
        SizingResult r = sizer.size(req, List.of(evil));
        ShortlistEntry stock = r.shortlist().stream().filter(e -> e.candidate().isStock()).findFirst().orElseThrow();
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(ShortlistCsv.write(r))).getRecords();
        CSVRecord row = rows.get(stock.rank() - 1);
        assertThat(row.get("part_number")).isEqualTo("'=HYPERLINK(\"http://example.invalid\",\"click\")");
        assertThat(row.get("supplier")).isEqualTo("'@SUM(1+1)*cmd|' /C calc'!A0");
        assertThat(rows).allSatisfy(x -> assertThat(x.get("part_number")).doesNotStartWith("="));
    }
}
