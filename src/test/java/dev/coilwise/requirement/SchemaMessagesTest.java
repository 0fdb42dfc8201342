package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.materials.MaterialTable;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Schema errors are worded as the reader words its own problems: position, dotted key, what was found and what is
 * allowed, the nearest valid key or word. Checked here on the schema's own list, before it is merged with the
 * reader's.
 */
class SchemaMessagesTest {
    private static final String ARREST = """
            job: arrest
            load:
              mass: 6 kg
            motion:
              speed: 1.5 m/s
            limits:
              stroke: 30 mm
            """;

    static List<String> schemaProblems(String yaml) {
        Problems problems = new Problems("t.yaml");
        YamlNode.Mapping root = YamlTreeReader.read(yaml, problems, "").orElseThrow();
        RequirementSchema.check(root, problems);
        return problems.schemaList().stream()
                .map(p -> p.line() + ":" + p.column() + ": " + p.key() + ": " + p.message()).toList();
    }

    @Test
    void aValidFileHasNoSchemaProblem() {
        assertThat(schemaProblems(ARREST)).isEmpty();
    }

    @Test
    void aMisspeltKeyNamesTheNearestAndTheMissingOneIsReportedAtItsSection() {
        assertThat(schemaProblems(ARREST.replace("  stroke: 30 mm", "  strok: 30 mm"))).containsExactlyInAnyOrder(
                "7:3: limits.strok: unknown key 'strok' (did you mean 'stroke'?); allowed here: stroke, peak_force, deceleration",
                "6:1: limits.stroke: missing; give limits.stroke, a length such as '45 mm' or '1.8 in'");
    }

    @Test
    void aQuantityOfTheWrongFormSaysWhatWouldDo() {
        assertThat(schemaProblems(ARREST.replace("30 mm", "30 N"))).containsExactly(
                "7:11: limits.stroke: expected a length such as '45 mm' or '1.8 in', got '30 N'");
        assertThat(schemaProblems(ARREST.replace("6 kg", "6"))).containsExactly(
                "3:9: load.mass: expected a mass such as '18 kg' or '40 lb', got '6'");
    }

    @Test
    void aWordOutsideItsSetNamesTheNearestAndTheSet() {
        assertThat(schemaProblems(ARREST.replace("job: arrest", "job: arest"))).contains(
                "1:6: job: 'arest' is not allowed (did you mean 'arrest'?); allowed: arrest, launch");
        assertThat(schemaProblems(ARREST + "spring:\n  materials: [music-wir, chrome-silicon]\n")).containsExactly(
                "9:15: spring.materials: 'music-wir' is not allowed (did you mean 'music-wire'?); allowed: music-wire,"
                        + " oil-tempered, hard-drawn, chrome-vanadium, chrome-silicon, stainless-302, phosphor-bronze");
    }

    @Test
    void aKeyWithSeveralFormsIsReportedOnceNamingEveryForm() {
        assertThat(schemaProblems(ARREST.replace("  speed: 1.5 m/s", "  speed: 1.5 m/s\n  direction: sideways")))
                .containsExactly("6:14: motion.direction: expected down, horizontal, up, or an angle such as '30 deg',"
                        + " got 'sideways'");
        assertThat(schemaProblems(ARREST + "envelope:\n  clearance: 2 N\n")).containsExactly(
                "9:14: envelope.clearance: expected a percentage such as '5 %' or a length such as '45 mm' or '1.8 in',"
                        + " got '2 N'");
    }

    @Test
    void numbersOutOfRangeOrNotWholeSayTheRange() {
        assertThat(schemaProblems(ARREST + "ranking:\n  shortlist: 500\n")).containsExactly(
                "9:14: ranking.shortlist: must lie between 1 and 100, got '500'");
        assertThat(schemaProblems(ARREST + "ranking:\n  shortlist: 2.5\n")).containsExactly(
                "9:14: ranking.shortlist: expected a whole number from 1 to 100, got '2.5'");
        assertThat(schemaProblems(ARREST + "spring:\n  index: [1, 12]\n")).containsExactly(
                "9:11: spring.index: must lie between 2 and 30, got '1'");
        assertThat(schemaProblems(ARREST + "spring:\n  index: [4]\n")).containsExactly(
                "9:10: spring.index: expected a list of two numbers [low, high] such as [4, 12], got a list");
    }

    @Test
    void exactlyOneOfTwoKeys() {
        assertThat(schemaProblems(ARREST.replace("  mass: 6 kg", "  mass: 6 kg\n  weight: 60 N"))).containsExactly(
                "4:11: load.weight: give load.mass or load.weight, not both");
        assertThat(schemaProblems(ARREST.replace("  speed: 1.5 m/s", "  direction: down"))).containsExactly(
                "4:1: motion: missing; give motion.drop_height or motion.speed");
    }

    @Test
    void sectionsOfTheOtherJobAreNamed() {
        assertThat(schemaProblems(ARREST + "launch:\n  height: 1 m\n")).containsExactly(
                "8:1: launch: applies to job 'launch' only; remove it for job 'arrest'");
        String launch = "job: launch\nload:\n  mass: 1 kg\nlaunch:\n  height: 1 m\nlimits:\n  stroke: 30 mm\n"
                + "  deceleration: 10 gn\n";
        assertThat(schemaProblems(launch)).containsExactly(
                "8:3: limits.deceleration: applies to job 'arrest' only; remove it for job 'launch'");
    }

    @Test
    void wrongTypesSayWhatWasExpected() {
        assertThat(schemaProblems(ARREST.replace("  mass: 6 kg", "  - 6 kg").replace("load:\n", "load:\n")))
                .containsExactly("3:3: load: expected keys mass, weight, got a list");
        assertThat(schemaProblems(ARREST + "spring:\n  solid_safe: maybe\n")).containsExactly(
                "9:15: spring.solid_safe: expected true or false, got 'maybe'");
        assertThat(schemaProblems(ARREST.replace("title", "") + "title: [a, b]\n")).containsExactly(
                "8:8: title: expected text, got a list");
    }

    @Test
    void whenBothFindAMistakeItIsReportedOnceInTheReadersWords() {
        RequirementReader reader = new RequirementReader(MaterialTable.loadDefault());
        RequirementException e = org.assertj.core.api.Assertions.catchThrowableOfType(RequirementException.class,
                () -> reader.parse(ARREST.replace("30 mm", "30 kgf"), "t.yaml", null));
        assertThat(e.problems()).extracting(InputProblem::toString).containsExactly(
                "t.yaml:7:11: limits.stroke: '30 kgf' has an unknown unit 'kgf'; length units: mm, cm, m, km, in, ft");
    }
}
