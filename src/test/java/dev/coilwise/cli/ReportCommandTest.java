package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `size --out` writes report.html; `report` renders the same page again from the saved shortlist.json. */
class ReportCommandTest {
    @TempDir
    Path tmp;

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(String... args) {
        out.reset();
        err.reset();
        return Main.run(new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true,
                StandardCharsets.UTF_8), args);
    }

    private String err() {
        return err.toString(StandardCharsets.UTF_8);
    }

    private static String demo(String name) throws URISyntaxException {
        return Path.of(ReportCommandTest.class.getResource("/dev/coilwise/report/html/" + name + ".yaml").toURI())
                .toString();
    }

    @Test
    void reportRendersTheSamePageFromTheSavedShortlistAsSizeWrote() throws Exception {
        Path sized = tmp.resolve("sized");
        assertThat(run("size", demo("arrest-small"), "--samples", "500", "--out", sized.toString()))
                .isEqualTo(ExitCode.OK);
        assertThat(sized.resolve("report.html")).isRegularFile();

        Path again = tmp.resolve("again");
        assertThat(run("report", sized.resolve("shortlist.json").toString(), "--out", again.toString()))
                .as(err()).isEqualTo(ExitCode.OK);
        assertThat(out.toString(StandardCharsets.UTF_8)).contains("Wrote report.html to " + again);
        assertThat(Files.readString(again.resolve("report.html")))
                .isEqualTo(Files.readString(sized.resolve("report.html")));
    }

    @Test
    void withoutOutTheReportIsWrittenBesideTheShortlist() throws Exception {
        Path sized = tmp.resolve("sized");
        assertThat(run("size", demo("launch-small"), "--samples", "500", "--out", sized.toString()))
                .isEqualTo(ExitCode.OK);
        Path saved = Files.createDirectories(tmp.resolve("saved")).resolve("shortlist.json");
        Files.copy(sized.resolve("shortlist.json"), saved);

        assertThat(run("report", saved.toString())).as(err()).isEqualTo(ExitCode.OK);
        assertThat(Files.readString(saved.resolveSibling("report.html")))
                .isEqualTo(Files.readString(sized.resolve("report.html")));
    }

    @Test
    void aSavedShortlistWithNoDesignRendersItsDiagnosisAndExitsWith3() throws Exception {
        Path sized = tmp.resolve("sized");
        assertThat(run("size", demo("arrest-infeasible"), "--samples", "500", "--out", sized.toString()))
                .isEqualTo(ExitCode.NOTHING_FEASIBLE);
        Path again = tmp.resolve("again");
        assertThat(run("report", sized.resolve("shortlist.json").toString(), "--out", again.toString()))
                .isEqualTo(ExitCode.NOTHING_FEASIBLE);
        assertThat(Files.readString(again.resolve("report.html"))).contains("id=\"diagnosis\"")
                .isEqualTo(Files.readString(sized.resolve("report.html")));
    }

    @Test
    void aJsonFileThatIsNoShortlistIsBadInputAndNothingIsWritten() throws Exception {
        Path file = Files.writeString(tmp.resolve("other.json"), "{\"format\": \"other\", \"rows\": []}");
        assertThat(run("report", file.toString())).isEqualTo(ExitCode.BAD_INPUT);
        assertThat(err()).contains("not a coilwise shortlist (format is 'other')");
        assertThat(tmp.resolve("report.html")).doesNotExist();
    }

    @Test
    void aFileThatIsNotJsonIsBadInput() throws Exception {
        Path file = Files.writeString(tmp.resolve("shortlist.json"), "rank,material\n1,music-wire\n");
        assertThat(run("report", file.toString())).isEqualTo(ExitCode.BAD_INPUT);
        assertThat(err()).contains("error: not valid JSON");
    }

    @Test
    void aMissingFileIsBadInput() {
        assertThat(run("report", tmp.resolve("none.json").toString())).isEqualTo(ExitCode.BAD_INPUT);
        assertThat(err()).contains("cannot read the file").contains("none.json");
    }
}
