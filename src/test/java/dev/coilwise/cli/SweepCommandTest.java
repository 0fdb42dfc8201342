package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.offset;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.search.Sizer;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SweepCommandTest {
    private static final Path DROP = Path.of("src/test/resources/dev/coilwise/cli/sweep/drop.yaml");

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), args);
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private static List<CSVRecord> rows(String csv) throws Exception {
        return CSVFormat.DEFAULT.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(csv)).getRecords();
    }

    @Test
    void writesOneRowPerStepWithTheBestDesignThatSizeFindsForThatValue() throws Exception {
        Run r = run("sweep", DROP.toString(), "--vary", "motion.drop_height=40mm..80mm:3");

        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).startsWith("# CAUTION");
        List<CSVRecord> rows = rows(r.out());
        assertThat(rows).extracting(x -> x.get("motion.drop_height")).containsExactly("40 mm", "60 mm", "80 mm");
        MaterialTable table = MaterialTable.loadDefault();
        String text = Files.readString(DROP);
        for (CSVRecord row : rows) {
            Requirement req = new RequirementReader(table).parse(
                    text.replace("drop_height: 60 mm", "drop_height: " + row.get("motion.drop_height")), "drop.yaml", null);
            Evaluation best = new Sizer(table).size(req).shortlist().get(0).evaluation();
            assertThat(row.get("feasible")).isEqualTo("yes");
            assertThat(row.get("material")).isEqualTo(best.spring().material().key());
            assertThat(Double.parseDouble(row.get("wire_diameter_mm"))).isEqualTo(best.spring().wireDiameter() * 1e3, offset(1e-9));
            assertThat(Double.parseDouble(row.get("free_length_mm"))).isEqualTo(best.spring().freeLength() * 1e3, offset(1e-9));
            assertThat(Double.parseDouble(row.get("active_coils"))).isEqualTo(best.spring().activeCoils());
        }
    }

    @Test
    void anUnknownKeyIsRefusedWithTheAllowedKeys() {
        Run r = run("sweep", DROP.toString(), "--vary", "motion.drop_hieght=40mm..80mm:3");

        assertThat(r.code()).isEqualTo(ExitCode.BAD_INPUT);
        assertThat(r.err()).contains("'motion.drop_hieght'").contains("allowed:").contains("motion.drop_height")
                .contains("limits.stroke").contains("envelope.pocket_length");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void aRangeWithoutStepsIsRefusedWithTheExpectedForm() {
        Run r = run("sweep", DROP.toString(), "--vary", "motion.drop_height=40mm-80mm");

        assertThat(r.code()).isEqualTo(ExitCode.BAD_INPUT);
        assertThat(r.err()).contains("KEY=FROM..TO:STEPS").contains("'motion.drop_height=40mm-80mm'");
    }

    @Test
    void zeroStepsAndValuesWithoutNumbersAreRefused() {
        assertThat(run("sweep", DROP.toString(), "--vary", "motion.drop_height=40mm..80mm:0").err())
                .contains("STEPS must be a whole number from 1 to 100000, got 0");
        assertThat(run("sweep", DROP.toString(), "--vary", "motion.drop_height=high..80mm:3").err())
                .contains("FROM and TO must be numbers with their unit").contains("'high'");
    }

    @Test
    void aValueTheRequirementRefusesNamesTheStep() {
        Run r = run("sweep", DROP.toString(), "--vary", "motion.drop_height=20mm..-20mm:3");

        assertThat(r.code()).isEqualTo(ExitCode.BAD_INPUT);
        assertThat(r.err()).contains("--vary step 2 (motion.drop_height = 0 mm)").contains("must be greater than zero");
    }

    @Test
    void toInAnotherUnitOfTheSameKindIsWrittenInTheUnitOfFrom() {
        Run r = run("sweep", DROP.toString(), "--vary", "motion.drop_height=40mm..0.08m:2");

        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("\n2,80 mm,");
    }

    @Test
    void outWritesTheFileAtomicallyAndNeverOverTheInput(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("sweep.csv");
        Run r = run("sweep", DROP.toString(), "--vary", "limits.stroke=25mm..35mm:2", "--out", csv.toString());

        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).isEmpty();
        assertThat(rows(Files.readString(csv))).hasSize(2);
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files).containsExactly(csv);
        }
        Path copy = dir.resolve("drop.yaml");
        Files.copy(DROP, copy);
        Run over = run("sweep", copy.toString(), "--vary", "limits.stroke=25mm..35mm:2", "--out", copy.toString());
        assertThat(over.code()).isEqualTo(ExitCode.BAD_INPUT);
        assertThat(Files.readString(copy)).isEqualTo(Files.readString(DROP));
    }

    @Test
    void progressIsDrawnOnlyForATerminalAndEndsItsLine() {
        StringWriter shown = new StringWriter();
        Progress bar = new Progress(new PrintWriter(shown), true, 0);
        bar.update(5, 10);
        bar.finish();
        assertThat(shown.toString()).contains("\rsweep [" + "#".repeat(15)).contains("5/10")
                .endsWith(System.lineSeparator());

        StringWriter silent = new StringWriter();
        Progress none = new Progress(new PrintWriter(silent), false, 0);
        none.update(5, 10);
        none.finish();
        assertThat(silent.toString()).isEmpty();
    }
}
