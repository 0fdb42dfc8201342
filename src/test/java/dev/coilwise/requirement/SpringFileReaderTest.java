package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SpringFileReaderTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();
    private static final SpringFileReader READER = new SpringFileReader();

    private static List<String> problems(String yaml) {
        RequirementException e = catchThrowableOfType(RequirementException.class, () -> READER.parse(yaml, "s.yaml", TABLE));
        assertThat(e).as("should fail").isNotNull();
        return e.problems().stream().map(InputProblem::toString).toList();
    }

    @Test
    void meanDiameterAndActiveCoilsAreTakenAsGiven(@TempDir Path dir) throws Exception {
        Path file = Files.writeString(dir.resolve("spring.yaml"), """
                material: music-wire
                ends: closed-ground
                wire_diameter: 3.2 mm
                mean_diameter: 24 mm
                active_coils: 8.5
                free_length: 80 mm
                """);
        Spring s = READER.read(file, TABLE);
        assertThat(s.material().key()).isEqualTo("music-wire");
        assertThat(s.ends()).isEqualTo(EndType.CLOSED_GROUND);
        assertThat(s.wireDiameter()).isCloseTo(0.0032, within(1e-15));
        assertThat(s.meanDiameter()).isCloseTo(0.024, within(1e-15));
        assertThat(s.activeCoils()).isEqualTo(8.5);
        assertThat(s.freeLength()).isCloseTo(0.080, within(1e-15));
    }

    // D = OD - d and, for closed ends, Na = Nt - 2 (Shigley's MED 9th ed., Table 10-1, from memory).
    @Test
    void outerDiameterAndTotalCoilsAreConvertedInInches() {
        Spring s = READER.parse("""
                material: oil-tempered
                ends: closed
                wire_diameter: 0.125 in
                outer_diameter: 1 in
                total_coils: 12
                free_length: 3 in
                """, "s.yaml", TABLE);
        assertThat(s.meanDiameter()).isCloseTo(0.875 * 0.0254, within(1e-15));
        assertThat(s.activeCoils()).isEqualTo(10.0);
        assertThat(s.freeLength()).isCloseTo(3 * 0.0254, within(1e-15));
    }

    @Test
    void exactlyOneOfEachAlternativeMustBeGiven() {
        assertThat(problems("""
                material: music-wire
                ends: closed
                wire_diameter: 2 mm
                mean_diameter: 16 mm
                outer_diameter: 18 mm
                free_length: 50 mm
                """)).containsExactly(
                "s.yaml:1:1: active_coils: missing; give active_coils or total_coils",
                "s.yaml:5:17: outer_diameter: give mean_diameter or outer_diameter, not both");
    }

    @Test
    void everyProblemIsNamedWithItsPosition() {
        assertThat(problems("""
                material: music-wir
                ends: closed-grnd
                wire_diameter: 2
                mean_diameter: 16 N
                active_coils: 0
                free_length: 50 mm
                colour: blue
                """)).containsExactly(
                "s.yaml:1:11: material: unknown material 'music-wir' (did you mean 'music-wire'?); known materials:"
                        + " music-wire, oil-tempered, hard-drawn, chrome-vanadium, chrome-silicon, stainless-302, phosphor-bronze",
                "s.yaml:2:7: ends: 'closed-grnd' is not allowed (did you mean 'closed-ground'?); allowed: plain,"
                        + " plain-ground, closed, closed-ground",
                "s.yaml:3:16: wire_diameter: '2' has no unit; give a length such as '45 mm' or '1.8 in'",
                "s.yaml:4:16: mean_diameter: expected a length, got '16 N'",
                "s.yaml:5:15: active_coils: must be greater than zero, got '0'",
                "s.yaml:7:1: colour: unknown key 'colour'; allowed here: material, ends, wire_diameter, mean_diameter,"
                        + " outer_diameter, active_coils, total_coils, free_length");
    }

    @Test
    void geometryThatCannotBeASpringIsRefused() {
        String base = """
                material: music-wire
                ends: closed
                wire_diameter: 2 mm
                mean_diameter: %s
                total_coils: %s
                free_length: %s
                """;
        assertThat(problems(base.formatted("1.4 mm", "10", "50 mm"))).containsExactly("s.yaml:4:16: mean_diameter:"
                + " spring index C = D/d must exceed 0.75 for the curvature factor to be defined, got 0.7");
        // closed ends: Ls = d (Nt + 1) = 2 mm x 11 = 22 mm (Shigley's MED 9th ed., Table 10-1, from memory)
        assertThat(problems(base.formatted("16 mm", "10", "20 mm")))
                .containsExactly("s.yaml:6:14: free_length: free length 20.000 mm must exceed the solid length 22.000 mm");
        assertThat(problems(base.formatted("16 mm", "2", "20 mm")))
                .containsExactly("s.yaml:5:14: total_coils: '2' total coils leave no active coils with closed ends (2 inactive coils)");
        assertThat(problems(base.formatted("64 mm", "10", "150 mm").replace("2 mm", "8 mm")))
                .containsExactly("s.yaml:3:16: wire_diameter: wire diameter 8.000 mm is outside the range of music-wire"
                        + " (0.100 to 6.500 mm); coilwise does not extrapolate a material fit");
    }

    // Mass of a helical spring m = (pi d^2/4) pi D Nt rho (wire volume times density; Shigley's MED 9th ed., Sec. 10-8,
    // from memory). 6.5 mm music wire (rho = 7850 kg/m^3) on a 900 mm mean diameter with 200 total coils:
    // 3.318e-5 m^2 x 2.827 m x 200 x 7850 = 147 kg, over the 100 kg bound.
    @Test
    void absurdSpringsAreRefusedWithTheBound() {
        String base = """
                material: music-wire
                ends: plain
                wire_diameter: 6.5 mm
                mean_diameter: %s
                total_coils: 200
                free_length: %s
                """;
        assertThat(problems(base.formatted("900 mm", "2000 mm"))).containsExactly("s.yaml:1:1: the spring described would"
                + " weigh 147 kg; coilwise checks springs of at most 100 kg: check the diameters, the coil count and their units");
        assertThat(problems(base.formatted("3 m", "2000 mm"))).containsExactly("s.yaml:4:16: mean_diameter: '3 m' is more than"
                + " 1 m (39.4 in), the largest mean coil diameter coilwise accepts; check the number and its unit");
        assertThat(problems(base.formatted("60 mm", "20 m"))).containsExactly("s.yaml:6:14: free_length: '20 m' is more than"
                + " 5 m (16.4 ft), the largest free length coilwise accepts; check the number and its unit");
    }
}
