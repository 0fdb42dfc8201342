package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A saved shortlist edited by hand is bad input for `report`, never an internal fault of the charts. */
class SavedShortlistSafetyTest {

    // Found by the command-line fuzz run: a free length of 1e308 mm made the chart axis throw.
    @Test
    void aFigureTooLargeForTheChartsIsBadInputNamingIt(@TempDir Path dir) throws IOException {
        String saved = SavedShortlists.texts().get(0);
        int at = saved.indexOf("\"free_length_mm\"");
        String edited = saved.substring(0, at) + "\"free_length_mm\" : 1e308" + saved.substring(saved.indexOf(',', at));
        Path file = Files.writeString(dir.resolve("shortlist.json"), edited);
        CliRunner r = CliRunner.run("report", file.toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).isEqualTo("error: designs[0].free_length_mm is 1.0E308; expected a number no larger than 1e12"
                + " in size, as coilwise writes it\n");
        assertThat(dir.resolve("report.html")).doesNotExist();
    }

    @Test
    void controlCharactersFromTheFileAreEscapedInTheMessage(@TempDir Path dir) throws IOException {
        String saved = SavedShortlists.texts().get(0);
        String edited = saved.replaceFirst("\"format_version\" : 1", "\"format_version\" : \"\\\\u001b[2J\"");
        Path file = Files.writeString(dir.resolve("shortlist.json"), edited);
        CliRunner r = CliRunner.run("report", file.toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).doesNotContain("\u001b").contains("\\u001b");
    }
}
