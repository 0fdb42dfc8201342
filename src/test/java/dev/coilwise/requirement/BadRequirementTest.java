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
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Each folder under {@code bad/} holds one requirement file with one kind of mistake; the reader must report it with
 * the key, its line and column, and a message that says what was found and what would do.
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

    static Stream<Arguments> singleProblemCases() {
        return Stream.of(
            Arguments.of("bare-number", "7:11: limits.stroke: '45' has no unit; give a length such as '45 mm' or '1.8 in'"),
            Arguments.of("wrong-dimension", "7:11: limits.stroke: expected a length, got '45 N'"),
            Arguments.of("unknown-unit", "8:15: limits.peak_force: '2 kgf' has an unknown unit 'kgf'; force units: N, kN, lbf"),
            Arguments.of("not-a-number", "7:11: limits.stroke: 'NaN mm' is not a finite number"),
            Arguments.of("infinite", "7:11: limits.stroke: '.inf' is not a finite number"),
            Arguments.of("zero-mass", "3:9: load.mass: must be greater than zero, got '0 kg'"),
            Arguments.of("negative-drive-force", "6:16: motion.drive_force: must not be negative, got '-5 N'"),
            Arguments.of("rod-not-below-bore",
                "10:8: envelope.rod: '40 mm' must be smaller than envelope.bore '40 mm': a spring cannot fit between them"),
            Arguments.of("no-room-for-wire", "11:14: envelope.clearance: after the clearance (2 mm) no wire fits between"
                + " envelope.rod '18 mm' and envelope.bore '20 mm'"),
            Arguments.of("pocket-over-free-length", "10:18: envelope.pocket_length: '120 mm' must not exceed"
                + " envelope.max_free_length '100 mm': the free length must be at least the pocket length"),
            Arguments.of("stroke-over-free-length", "7:11: limits.stroke: '130 mm' must be shorter than"
                + " envelope.max_free_length '120 mm': a spring cannot compress by its whole free length"),
            Arguments.of("stroke-over-pocket", "7:11: limits.stroke: '90 mm' must be shorter than envelope.pocket_length"
                + " '80 mm': the spring is installed at the pocket length and cannot compress by all of it"),
            Arguments.of("motion-for-launch", "8:1: motion: applies to job 'arrest' only; remove it for job 'launch';"
                + " a launch is described under 'launch'"),
            Arguments.of("launch-for-arrest", "8:1: launch: applies to job 'launch' only; remove it for job 'arrest';"
                + " an arrest is described under 'motion'"),
            Arguments.of("deceleration-for-launch",
                "8:3: limits.deceleration: applies to job 'arrest' only; remove it for job 'launch'"),
            Arguments.of("pocket-for-launch", "9:3: envelope.pocket_length: applies to job 'arrest' only; remove it for"
                + " job 'launch'; a launcher is cocked from its free length"),
            Arguments.of("drop-height-sideways", "5:16: motion.drop_height: a drop height means a fall straight down, but"
                + " motion.direction is 'horizontal'; give motion.speed, the speed at first contact, instead"),
            Arguments.of("drop-height-and-speed", "6:10: motion.speed: give motion.drop_height or motion.speed, not both"),
            Arguments.of("mass-and-weight", "4:11: load.weight: give load.mass or load.weight, not both"),
            Arguments.of("launch-downwards", "6:14: launch.direction: 'down' is not allowed; allowed: up, or an angle above"
                + " the horizontal such as '60 deg'"),
            Arguments.of("unknown-job", "1:6: job: 'arest' is not allowed (did you mean 'arrest'?); allowed: arrest, launch"),
            Arguments.of("duplicate-key", "8:3: limits.stroke: appears twice; the first is at line 7"),
            Arguments.of("type-tag",
                "3:9: YAML type tags (!!javax.script.ScriptEngineManager) are not accepted; write plain values"),
            Arguments.of("alias", "8:15: YAML aliases (*s) are not accepted; write the value out in full"),
            Arguments.of("syntax-error", "8:9: not valid YAML: while parsing a flow sequence: expected ',' or ']', but got :"),
            Arguments.of("two-documents", "9:1: the file holds more than one YAML document; put one in each file"),
            Arguments.of("empty", "1:1: the file is empty; give at least job, load, limits and motion (arrest) or launch (launch)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("singleProblemCases")
    void reportsTheProblemWithItsPosition(String name, String expected) {
        assertThat(problems(badCase(name))).containsExactly(expected);
    }

    @Test
    void unknownKeySuggestsTheNearestAndTheRequiredKeyIsStillMissing() {
        assertThat(problems(badCase("unknown-key"))).containsExactly(
            "6:1: limits.stroke: missing; give the most compression allowed, a length such as '45 mm'",
            "7:3: limits.strok: unknown key 'strok' (did you mean 'stroke'?); allowed here: stroke, peak_force, deceleration");
    }

    @Test
    void missingRequiredSectionsAreEachNamed() {
        assertThat(problems(badCase("missing-keys"))).containsExactly(
            "1:1: load: missing; give load.mass (e.g. '18 kg') or load.weight (e.g. '40 lbf')",
            "1:1: motion: missing; give the motion to arrest: motion.drop_height or motion.speed, and motion.direction",
            "1:1: limits: missing; give limits.stroke, the most compression allowed, e.g. '45 mm'");
    }

    @Test
    void wrongTypesSayWhatWasExpected() {
        assertThat(problems(badCase("wrong-types"))).containsExactly(
            "2:7: load: expected keys mass, weight, got '18 kg'",
            "8:15: spring.solid_safe: expected true or false, got 'maybe'",
            "9:10: spring.index: expected a list of two numbers [low, high] such as [4, 12], got '4'");
    }

    @Test
    void unknownMaterialsListTheTableAndTheNearestKey() {
        String known = "known materials: music-wire, oil-tempered, hard-drawn, chrome-vanadium, chrome-silicon, stainless-302,"
            + " phosphor-bronze";
        assertThat(problems(badCase("unknown-material"))).containsExactly(
            "9:15: spring.materials: unknown material 'music-wir' (did you mean 'music-wire'?); " + known,
            "9:26: spring.materials: unknown material 'unobtainium'; " + known);
    }

    @Test
    void stockPathIsResolvedAgainstTheRequirementFolder() {
        Path file = badCase("stock-not-found");
        Path expected = file.getParent().resolve("../no-such-catalog.csv").normalize();
        assertThat(problems(file)).containsExactly("8:9: stock: file not found: " + expected);
    }

    @Test
    void everyProblemOfAFileIsReportedTogetherInFileOrder() {
        Path file = badCase("many-problems");
        assertThat(problems(file)).containsExactly(
            "4:9: load.mass: '6' has no unit; give a mass such as '18 kg' or '40 lb'",
            "6:16: motion.drop_height: a drop height means a fall straight down, but motion.direction is 'horizontal';"
                + " give motion.speed, the speed at first contact, instead",
            "9:11: limits.stroke: expected a length, got '45 N'",
            "13:8: envelope.rod: '40 mm' must be smaller than envelope.bore '40 mm': a spring cannot fit between them",
            "15:15: spring.materials: unknown material 'music-wir' (did you mean 'music-wire'?); known materials:"
                + " music-wire, oil-tempered, hard-drawn, chrome-vanadium, chrome-silicon, stainless-302, phosphor-bronze",
            "16:12: spring.seating: 'flat' is not allowed; allowed: flat-flat, flat-pivot, pivot-pivot, free",
            "18:14: ranking.shortlist: must lie between 1 and 100, got '0'",
            "19:3: ranking.colour: unknown key 'colour'; allowed here: by, shortlist, prefer, dynamics, min_probability");
        RequirementException e = catchThrowableOfType(RequirementException.class, () -> READER.read(file));
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
    void deepNestingIsRefused() {
        String deep = "title: x\nspring: " + "[".repeat(40) + "]".repeat(40) + "\n";
        assertThatThrownBy(() -> READER.parse(deep, "deep.yaml", null)).isInstanceOf(RequirementException.class)
            .hasMessageContaining("deep.yaml:2:").hasMessageContaining("nesting deeper than 20 levels");
    }
}
