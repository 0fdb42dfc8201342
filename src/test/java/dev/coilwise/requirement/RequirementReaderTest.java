package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Prefer;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Seating;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.model.WireSeries;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RequirementReaderTest {
    private static final RequirementReader READER = new RequirementReader(MaterialTable.loadDefault());

    private static final String ARREST = """
            job: arrest
            load:
              mass: 6 kg
            motion:
              speed: 1.5 m/s
            limits:
              stroke: 30 mm
            """;

    static Requirement parse(String yaml) {
        return READER.parse(yaml, "test.yaml", null);
    }

    @Test
    void omittedSectionsTakeTheModelDefaults() {
        Requirement r = parse(ARREST);
        assertThat(r.title()).isEqualTo("test");
        assertThat(r.spring()).isEqualTo(SpringOptions.defaults());
        assertThat(r.spring().materials()).as("empty means every steel of the table").isEmpty();
        assertThat(r.ranking().by()).isEqualTo(RankBy.MASS);
        assertThat(r.envelope().bore()).isEmpty();
        assertThat(r.stock()).isEmpty();
        Arrest a = (Arrest) r.job();
        assertThat(a.angle()).as("direction defaults to down").isEqualTo(Math.PI / 2);
        assertThat(a.driveForce()).isZero();
    }

    // Weight to mass by standard gravity: m = W/gn, gn = 9.80665 m/s^2 exactly (3rd CGPM, 1901).
    @Test
    void weightIsConvertedToMassByStandardGravity() {
        Arrest a = (Arrest) parse(ARREST.replace("mass: 6 kg", "weight: 98.0665 N")).job();
        assertThat(a.mass()).isCloseTo(10.0, within(1e-12));
    }

    @Test
    void directionsAreWordsOrAnglesBelowTheHorizontal() {
        assertThat(((Arrest) parse(ARREST + "  ").job()).angle()).isEqualTo(Math.PI / 2);
        String m = ARREST.replace("  speed: 1.5 m/s\n", "  speed: 1.5 m/s\n  direction: %s\n");
        assertThat(((Arrest) parse(m.formatted("horizontal")).job()).angle()).isZero();
        assertThat(((Arrest) parse(m.formatted("up")).job()).angle()).isEqualTo(-Math.PI / 2);
        assertThat(((Arrest) parse(m.formatted("30 deg")).job()).angle()).isCloseTo(Math.PI / 6, within(1e-15));
        assertThat(((Arrest) parse(m.formatted("90 deg")).job()).angle()).isEqualTo(Math.PI / 2);
        assertThatThrownBy(() -> parse(m.formatted("120 deg")))
                .hasMessageContaining("test.yaml:6:14: motion.direction: must lie between -90 deg and 90 deg, got '120 deg'");
        assertThatThrownBy(() -> parse(m.formatted("dwn")))
                .hasMessageContaining("motion.direction: 'dwn' is not allowed (did you mean 'down'?)");
    }

    @Test
    void dropHeightWithAnExplicitStraightDownDirectionIsAccepted() {
        String yaml = ARREST.replace("  speed: 1.5 m/s\n", "  drop_height: 50 mm\n  direction: 90 deg\n");
        assertThat(((Arrest) parse(yaml).job()).contactSpeed()).isCloseTo(Math.sqrt(2 * 9.80665 * 0.05), within(1e-12));
    }

    @Test
    void launchDirectionMustPointAboveTheHorizontal() {
        String launch = """
                job: launch
                load: {mass: 0.5 kg}
                launch: {height: 1 m, direction: %s}
                limits: {stroke: 40 mm}
                """;
        assertThat(((Launch) parse(launch.formatted("45 deg")).job()).angle()).isCloseTo(Math.PI / 4, within(1e-15));
        assertThatThrownBy(() -> parse(launch.formatted("0 deg")))
                .hasMessageContaining("launch.direction: must lie between 0 deg (exclusive) and 90 deg, got '0 deg'");
        assertThatThrownBy(() -> parse(launch.formatted("-10 deg")))
                .hasMessageContaining("launch.direction: must lie between 0 deg and 90 deg, got '-10 deg'");
    }

    @Test
    void unitSystemFollowsTheMajorityOfDimensionalQuantities() {
        String us = """
                job: arrest
                load: {weight: 30 lbf}
                motion: {speed: 2 ft/s, direction: 30 deg}
                limits: {stroke: 25 mm, deceleration: 20 gn}
                """;
        assertThat(parse(us).units()).as("lbf, ft/s against mm; deg and gn count for neither").isEqualTo(UnitSystem.US);
        String tie = us.replace("2 ft/s", "0.6 m/s");
        assertThat(parse(tie).units()).as("a tie is SI").isEqualTo(UnitSystem.SI);
        assertThat(parse(us + "spring: {wire_series: metric}\n").wireSeries()).isEqualTo(WireSeries.METRIC);
    }

    @Test
    void everySpringAndRankingKeyIsRead() {
        Requirement r = parse(ARREST + """
                spring:
                  materials: [music-wire, chrome-silicon]
                  ends: [closed]
                  index: [5, 10]
                  active_coils: [4, 15.5]
                  clash_allowance: 20 %
                  solid_safe: false
                  set_removed: true
                  seating: flat-pivot
                  wire_series: inch
                  cycles: 1e6
                  shot_peened: true
                  fatigue_margin: 1.2
                  tolerance_grade: 1
                ranking:
                  by: robustness
                  shortlist: 5
                  prefer: stock
                  dynamics: strict
                  min_probability: 99 %
                """);
        SpringOptions s = r.spring();
        assertThat(s.materials()).containsExactly("music-wire", "chrome-silicon");
        assertThat(s.ends()).containsExactly(EndType.CLOSED);
        assertThat(new double[] {s.indexMin(), s.indexMax(), s.coilsMin(), s.coilsMax()}).containsExactly(5, 10, 4, 15.5);
        assertThat(s.clashAllowance()).isCloseTo(0.20, within(1e-15));
        assertThat(s.solidSafe()).isFalse();
        assertThat(s.setRemoved()).isTrue();
        assertThat(s.seating()).isEqualTo(Seating.FLAT_PIVOT);
        assertThat(s.wireSeries()).contains(WireSeries.INCH);
        assertThat(s.cycles().getAsDouble()).isEqualTo(1e6);
        assertThat(s.shotPeened()).isTrue();
        assertThat(s.fatigueMargin()).isEqualTo(1.2);
        assertThat(s.toleranceGrade()).isEqualTo(1);
        assertThat(r.ranking().by()).isEqualTo(RankBy.ROBUSTNESS);
        assertThat(r.ranking().shortlist()).isEqualTo(5);
        assertThat(r.ranking().prefer()).isEqualTo(Prefer.STOCK);
        assertThat(r.ranking().dynamicsStrict()).isTrue();
        assertThat(r.ranking().minProbability().getAsDouble()).isCloseTo(0.99, within(1e-15));
    }

    @Test
    void rangeAndWholeNumberChecksOnSpringOptions() {
        assertThatThrownBy(() -> parse(ARREST + "spring: {tolerance_grade: 2.5, index: [1, 12], clash_allowance: 0.15}\n"))
                .isInstanceOf(RequirementException.class)
                .hasMessageContaining("test.yaml:8:27: spring.tolerance_grade: expected a whole number from 1 to 3, got '2.5'")
                .hasMessageContaining("test.yaml:8:40: spring.index: must lie between 2 and 30, got '1'")
                .hasMessageContaining("spring.clash_allowance: '0.15' has no unit; give a percentage such as '5 %'");
    }

    @Test
    void clearanceIsAPercentageOrALength() {
        Requirement pct = parse(ARREST + "envelope: {bore: 40 mm, clearance: 10 %}\n");
        assertThat(pct.envelope().clearance().of(0.040)).isCloseTo(0.004, within(1e-15));
        Requirement len = parse(ARREST + "envelope: {bore: 40 mm, clearance: 0.5 mm}\n");
        assertThat(len.envelope().clearance().of(0.040)).isCloseTo(0.0005, within(1e-15));
        assertThatThrownBy(() -> parse(ARREST + "envelope: {bore: 40 mm, clearance: 2 N}\n"))
                .hasMessageContaining("envelope.clearance: expected a percentage or a length, got '2 N'");
    }

    @Test
    void stockPathsAreResolvedAgainstTheGivenFolder(@TempDir Path dir) throws Exception {
        Files.createDirectories(dir.resolve("catalogs"));
        Path csv = Files.writeString(dir.resolve("catalogs/stock.csv"), "demo\n");
        Path reqDir = Files.createDirectories(dir.resolve("requirements"));
        Path file = Files.writeString(reqDir.resolve("r.yaml"), ARREST + "stock: [../catalogs/stock.csv]\n");
        assertThat(READER.read(file).stock()).containsExactly(csv.toAbsolutePath().normalize());
        assertThat(READER.parse(Files.readString(file), "r.yaml", reqDir).stock()).containsExactly(csv.normalize());
    }

    @Test
    void problemPrintsLikeACompilerMessage() {
        assertThat(new InputProblem("r.yaml", 7, 11, "limits.stroke", "expected a length, got '45 N'"))
                .hasToString("r.yaml:7:11: limits.stroke: expected a length, got '45 N'");
        assertThat(new InputProblem("r.yaml", 1, 1, "", "the file is empty")).hasToString("r.yaml:1:1: the file is empty");
    }

    @Test
    void templatesParseAsTheyStand() {
        Requirement arrest = READER.parse(RequirementTemplates.arrest(), "arrest-template.yaml", null);
        Requirement launch = READER.parse(RequirementTemplates.launch(), "launch-template.yaml", null);
        assertThat(arrest.isArrest()).isTrue();
        assertThat(launch.job()).isInstanceOf(Launch.class);
        assertThat(arrest.spring()).isEqualTo(SpringOptions.defaults());
        assertThat(launch.spring()).isEqualTo(SpringOptions.defaults());
        for (String t : new String[] {RequirementTemplates.arrest(), RequirementTemplates.launch()}) {
            assertThat(t).doesNotContain("\t");
        }
    }
}
