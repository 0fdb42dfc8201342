package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.model.WireSeries;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The shipped example requirement files (requirements/ in the project root) parse and mean what they say. */
class ExampleRequirementsTest {
    static final Path FOLDER = Path.of("requirements");
    static final String DEMO_MARK = "# Demo data: an invented scenario for trying coilwise; not a real product";
    private static final RequirementReader READER = new RequirementReader(MaterialTable.loadDefault());

    static List<Path> examples() throws IOException {
        try (Stream<Path> files = Files.list(FOLDER)) {
            return files.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
        }
    }

    static Requirement read(String name) {
        return READER.read(FOLDER.resolve(name));
    }

    @Test
    void atLeastFiveExamplesCoverBothJobsAndBothUnitSystems() throws IOException {
        List<Requirement> all = examples().stream().map(READER::read).toList();
        assertThat(all).hasSizeGreaterThanOrEqualTo(5);
        assertThat(all.stream().filter(Requirement::isArrest)).hasSizeGreaterThanOrEqualTo(2);
        assertThat(all.stream().filter(r -> !r.isArrest())).hasSizeGreaterThanOrEqualTo(2);
        assertThat(all).anyMatch(r -> r.units() == UnitSystem.US);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void everyExampleIsMarkedAsDemoDataAndParses(Path file) throws IOException {
        assertThat(Files.readAllLines(file).get(0)).isEqualTo(DEMO_MARK);
        Requirement r = READER.read(file);
        assertThat(r.title()).isNotBlank();
        assertThat(r.limits().stroke()).isPositive();
    }

    // Free fall from rest: v = sqrt(2 g h) (any mechanics text; e.g. Halliday, Resnick & Walker, Fundamentals of
    // Physics, ch. 2, free-fall equations; from memory), with g = gn = 9.80665 m/s^2.
    @Test
    void verticalDropGivesTheFreeFallContactSpeed() {
        Requirement r = read("arrest-tool-carrier-drop.yaml");
        Arrest a = (Arrest) r.job();
        assertThat(a.mass()).isEqualTo(6.0);
        assertThat(a.dropHeight()).isCloseTo(0.100, within(1e-15));
        assertThat(a.contactSpeed()).isCloseTo(Math.sqrt(2 * 9.80665 * 0.100), within(1e-12));
        assertThat(a.angle()).isEqualTo(Math.PI / 2);
        assertThat(r.limits().deceleration().getAsDouble()).isCloseTo(40 * 9.80665, within(1e-9));
        assertThat(r.envelope().bore().getAsDouble()).isCloseTo(0.040, within(1e-15));
        assertThat(r.units()).isEqualTo(UnitSystem.SI);
        assertThat(r.wireSeries()).isEqualTo(WireSeries.METRIC);
    }

    @Test
    void horizontalCarriageHasAPocketAClearanceLengthAndADriveForce() {
        Requirement r = read("arrest-carriage-pocket.yaml");
        Arrest a = (Arrest) r.job();
        assertThat(a.angle()).isZero();
        assertThat(a.contactSpeed()).isEqualTo(1.0);
        assertThat(a.dropHeight()).isNaN();
        assertThat(a.driveForce()).isEqualTo(30.0);
        assertThat(r.envelope().pocketLength().getAsDouble()).isCloseTo(0.080, within(1e-15));
        assertThat(r.envelope().clearance().of(0.012)).isCloseTo(0.001, within(1e-15));
        assertThat(r.spring().materials()).containsExactly("music-wire", "oil-tempered", "chrome-silicon");
    }

    @Test
    void angledLaunchKeepsItsAngleAndLosses() {
        Launch l = (Launch) read("launch-angled-target.yaml").job();
        assertThat(l.angle()).isCloseTo(Math.PI / 3, within(1e-15));
        assertThat(l.losses()).isCloseTo(0.08, within(1e-15));
        assertThat(l.height()).isCloseTo(1.2, within(1e-15));
        Launch up = (Launch) read("launch-vertical-ball.yaml").job();
        assertThat(up.angle()).isEqualTo(Math.PI / 2);
        assertThat(up.mass()).isCloseTo(0.2, within(1e-15));
    }

    // Exact definitions (international yard and pound agreement, 1959; NIST SP 811, 2008 ed., App. B, from memory):
    // 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lb = 0.45359237 kg; 1 lbf = 1 lb x gn, so a weight of W lbf is W lb of mass.
    @Test
    void usCustomaryFileIsReadInSiAndMarkedUs() {
        Requirement r = read("arrest-us-gate-stop.yaml");
        Arrest a = (Arrest) r.job();
        assertThat(r.units()).isEqualTo(UnitSystem.US);
        assertThat(r.wireSeries()).isEqualTo(WireSeries.INCH);
        assertThat(a.mass()).isCloseTo(30 * 0.45359237, within(1e-12));
        assertThat(a.mass() * Gravity.STANDARD).isCloseTo(30 * 4.4482216152605, within(1e-11));
        assertThat(a.contactSpeed()).isCloseTo(2.5 * 0.3048, within(1e-15));
        assertThat(r.limits().stroke()).isCloseTo(1.25 * 0.0254, within(1e-15));
        assertThat(r.limits().peakForce().getAsDouble()).isCloseTo(300 * 4.4482216152605, within(1e-9));
        assertThat(r.envelope().rod().getAsDouble()).isCloseTo(0.5 * 0.0254, within(1e-15));
    }
}
