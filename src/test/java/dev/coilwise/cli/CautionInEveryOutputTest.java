package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.report.Caution;
import dev.coilwise.requirement.RequirementReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.jsoup.Jsoup;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Every user-facing output carries the one caution text, word for word (rules: safety). */
class CautionInEveryOutputTest {
    static final Path EXAMPLE = Path.of("requirements/arrest-tool-carrier-drop.yaml");

    /** Whitespace and line breaks folded to single spaces, so that wrapped text compares with the one-line text. */
    private static String flat(String s) {
        return s.replaceAll("\\s+", " ");
    }

    @Test
    void sizeCarriesTheCautionInTheTableAndEveryFileItWrites(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("out");
        CliRunner r = CliRunner.run("size", EXAMPLE.toString(), "--out", out.toString(), "--samples", "0",
                "--masses", "0", "--top", "2");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains(Caution.TEXT).contains("CAUTION");
        assertThat(Files.readString(out.resolve("shortlist.csv"))).contains("# " + Caution.TEXT);
        assertThat(Files.readString(out.resolve("shortlist.json"))).contains("\"caution\" : \"" + Caution.TEXT + "\"");
        assertThat(Jsoup.parse(Files.readString(out.resolve("report.html"))).getElementById("caution").text())
                .isEqualTo(Caution.TEXT);
        assertThat(Jsoup.parse(Files.readString(out.resolve("spec-2.html"))).selectFirst("p.caution").text())
                .isEqualTo(Caution.TEXT);
        try (PDDocument pdf = Loader.loadPDF(out.resolve("spec-2.pdf").toFile())) {
            assertThat(flat(new PDFTextStripper().getText(pdf))).contains(Caution.TEXT);
        }
    }

    @Test
    void printedCsvAndJsonCarryTheCaution() {
        for (String format : new String[] {"csv", "json"}) {
            CliRunner r = CliRunner.run("size", EXAMPLE.toString(), "--format", format, "--samples", "0",
                    "--masses", "0", "--top", "1");
            assertThat(r.code()).as(r.err()).isZero();
            assertThat(r.out()).as(format).contains(Caution.TEXT);
        }
    }

    @Test
    void checkAndSimulateCarryTheCautionAndSoDoTheTimeHistoryFiles(@TempDir Path dir) throws IOException {
        Path spring = Files.writeString(dir.resolve("spring.yaml"), String.join("\n",
                "material: chrome-silicon", "ends: closed-ground", "wire_diameter: 3.55 mm", "outer_diameter: 23.8 mm",
                "active_coils: 10.5", "free_length: 78.1 mm", ""));
        CliRunner check = CliRunner.run("check", EXAMPLE.toString(), "--spring", spring.toString());
        assertThat(check.code()).as(check.err()).isIn(0, 3);
        assertThat(check.out()).contains(Caution.TEXT);
        Path out = dir.resolve("sim");
        CliRunner sim = CliRunner.run("simulate", EXAMPLE.toString(), "--spring", spring.toString(), "--masses", "4",
                "--out", out.toString());
        assertThat(sim.code()).as(sim.err()).isZero();
        assertThat(sim.out()).contains(Caution.TEXT);
        assertThat(Files.readString(out.resolve("time-history.csv"))).contains("# " + Caution.TEXT);
        String svgText = Jsoup.parse(Files.readString(out.resolve("time-history.svg"))).text();
        assertThat(flat(svgText)).contains(Caution.TEXT);
    }

    @Test
    void templatesCarryTheCautionAsCommentsAndStillParse(@TempDir Path dir) throws IOException {
        for (String job : new String[] {"arrest", "launch"}) {
            CliRunner r = CliRunner.run("new", job);
            assertThat(r.code()).isZero();
            String comments = String.join(" ", r.out().lines().filter(l -> l.startsWith("# "))
                    .map(l -> l.substring(2)).toList());
            assertThat(comments).as(job).contains(Caution.TEXT);
            assertThat(r.out().lines()).as("comment lines no wider than the template's own")
                    .allMatch(l -> !l.startsWith("#") || l.length() <= NewCommand.COMMENT_WIDTH);
            Path f = Files.writeString(dir.resolve(job + ".yaml"), r.out());
            assertThat(new RequirementReader(MaterialTable.loadDefault()).read(f).job().key()).isEqualTo(job);
        }
    }

    @Test
    void theMaterialsListEndsWithTheCaution() {
        CliRunner r = CliRunner.run("materials");
        assertThat(r.code()).isZero();
        assertThat(r.out().strip()).endsWith(Caution.TEXT);
    }

    @Test
    void theHelpOfTheTopCommandCarriesTheCaution() {
        CliRunner r = CliRunner.run("--help");
        assertThat(r.code()).isZero();
        assertThat(flat(r.out())).contains(Caution.TEXT);
    }

    @Test
    void theReadmeQuotesTheCautionWordForWord() throws IOException {
        String readme = Files.readString(Path.of("README.md")).replace("**", "").replace("\n> ", " ");
        assertThat(flat(readme)).contains(Caution.TEXT);
    }
}
