package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Bad input that needs more than a file and its expected problems (the corpus of {@link BadRequirementCorpusTest}):
 * time limits on hostile files, files made at test time, devices and folders.
 */
class BadRequirementTest {
    private static final RequirementReader READER = new RequirementReader(MaterialTable.loadDefault());

    static Path badCase(String name) {
        try {
            return Path.of(BadRequirementTest.class.getResource("bad/" + name + "/requirement.yaml").toURI());
        } catch (URISyntaxException | NullPointerException e) {
            throw new IllegalStateException("missing bad-input case " + name, e);
        }
    }

    /** The problems as "line:column: key: message", the file name left out. */
    static List<String> problems(Path file) {
        RequirementException e = catchThrowableOfType(RequirementException.class, () -> READER.read(file));
        assertThat(e).as("reading %s should fail", file).isNotNull();
        assertThat(e).isInstanceOf(BadInputException.class);
        return e.problems().stream().map(p -> {
            assertThat(p.file()).isEqualTo(file.toString());
            return p.line() + ":" + p.column() + ": " + (p.key().isEmpty() ? "" : p.key() + ": ") + p.message();
        }).toList();
    }

    @Test
    void everyProblemOfAFileIsReportedTogetherUnderOneHeading() {
        Path file = badCase("many-problems");
        RequirementException e = catchThrowableOfType(RequirementException.class, () -> READER.read(file));
        assertThat(e.problems()).hasSize(8);
        assertThat(e.getMessage()).startsWith("8 problem(s) in " + file + ":")
            .contains(file + ":9:11: limits.stroke: expected a length, got '45 N'");
    }

    // "Billion laughs": nine levels of nine aliases would expand to 9^9 strings if a loader expanded them.
    // The timeout only guards against a hang (expansion); it is not a performance figure.
    @Test
    void billionLaughsIsRefusedWithoutExpanding() {
        Path file = badCase("billion-laughs");
        List<String> found = assertTimeoutPreemptively(Duration.ofSeconds(20), () -> problems(file));
        assertThat(found).containsExactly("2:8: YAML aliases (*a and " + YamlTreeReader.MAX_ALIASES_FOR_COLLECTIONS
            + " more) are not accepted; write the value out in full");
    }

    @Test
    void filesOverOneMebibyteAreRefusedBeforeParsing(@TempDir Path dir) throws Exception {
        Path big = dir.resolve("big.yaml");
        String line = "# padding padding padding padding padding padding padding padding padding padding\n";
        Files.writeString(big, "job: arrest\n" + line.repeat((1 << 20) / line.length() + 1));
        long size = Files.size(big);
        assertThat(problems(big)).containsExactly("0:0: the file has " + size + " bytes; coilwise reads files of at most"
            + " 1048576 bytes (1 MiB)");
        String text = Files.readString(big);
        assertThatThrownBy(() -> READER.parse(text, "big.yaml", dir)).isInstanceOf(RequirementException.class)
            .hasMessageContaining("big.yaml:0:0: the file has " + size + " bytes");
    }

    @Test
    void aMissingFileIsBadInput(@TempDir Path dir) {
        assertThat(problems(dir.resolve("nothing.yaml"))).containsExactly("0:0: cannot read the file: no such file");
    }

    @Test
    void aFolderIsNotReadAsAFile(@TempDir Path dir) {
        assertThat(problems(dir)).containsExactly("0:0: cannot read the file: it is a folder, not a file");
    }

    // A device that never ends: reading stops after the size limit instead of filling memory.
    @Test
    void anEndlessStreamIsRefusedAtTheSizeLimit() {
        Path zero = Path.of("/dev/zero");
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.isReadable(zero), "no /dev/zero on this system");
        List<String> found = assertTimeoutPreemptively(Duration.ofSeconds(20), () -> problems(zero));
        assertThat(found).containsExactly("0:0: the file has more than 1048576 bytes; coilwise reads files of at most"
            + " 1048576 bytes (1 MiB)");
    }

    @Test
    void aByteOrderMarkIsDroppedFromTextToo() {
        String yaml = "\uFEFFjob: arrest\nload:\n  mass: 6 kg\nmotion:\n  speed: 1 m/s\nlimits:\n  stroke: 30 mm\n";
        assertThat(READER.parse(yaml, "bom.yaml", null).isArrest()).isTrue();
    }
}
