package dev.coilwise.search;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.dynamics.SimulationOptions;
import dev.coilwise.dynamics.SimulationSummary;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.requirement.RequirementReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * {@code ranking.dynamics: strict} in a full sizing: a design stays when its simulated figures meet the limits, even
 * far from the energy balance, and leaves when a simulated figure breaks one. The tool carrier example (a 6 kg load
 * dropped 100 mm) is an impact, so every design's simulated peak force lies above the balance: the stress wave along
 * the coils (docs/dynamics.md, section 4).
 */
class SizerStrictDynamicsTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();
    private static final Path EXAMPLE = Path.of("requirements/arrest-tool-carrier-drop.yaml");
    private static final SizingOptions SIMULATE = new SizingOptions(Optional.empty(),
            dev.coilwise.scatter.ScatterProgress.NONE, Optional.of(SimulationOptions.defaults()));

    private static Requirement example(String dynamics, String peakForce) throws Exception {
        String text = Files.readString(EXAMPLE).replace("shortlist: 10", "shortlist: 3\n  dynamics: " + dynamics)
                .replace("peak_force: 2 kN", "peak_force: " + peakForce)
                .replace("stock: [../spring-catalogs/demo-metric.csv]", "");
        return new RequirementReader(TABLE).parse(text, EXAMPLE.toString(), EXAMPLE.getParent());
    }

    private static List<String> dropped(SizingResult r) {
        return r.warnings().stream().filter(w -> w.startsWith("left the shortlist under ranking.dynamics")).toList();
    }

    @Test
    void aBufferMoreThanFivePercentOffTheBalanceButWithinItsLimitsStays() throws Exception {
        SizingResult r = new Sizer(TABLE, new PrunedSearch(), SIMULATE).size(example("strict", "2 kN"));
        assertThat(r.shortlist()).hasSize(3);
        assertThat(dropped(r)).isEmpty();
        for (ShortlistEntry e : r.shortlist()) {
            SimulationSummary s = e.simulation().orElseThrow();
            assertThat(s.deviationPct()).as("design %d", e.rank()).isGreaterThan(5);
            assertThat(s.flagged()).isTrue();
            assertThat(s.peakForce()).isLessThanOrEqualTo(2000);
            assertThat(s.maxCompression()).isLessThanOrEqualTo(0.030);
        }
        assertThat(r.warnings()).anyMatch(w -> w.startsWith("simulation: every design differs from the energy"
                + " balance"));
    }

    // The leading design without strict has a balance peak force below its simulated one; a force limit between the
    // two keeps it feasible by the balance, and strict drops it for its simulated force.
    @Test
    void aSimulatedPeakForceAboveTheLimitDropsTheDesignAndTheWarningNamesTheLimitAndBothFigures() throws Exception {
        SizingResult warn = new Sizer(TABLE, new PrunedSearch(), SIMULATE).size(example("warn", "2 kN"));
        ShortlistEntry first = warn.shortlist().get(0);
        double balance = first.evaluation().peakForce();
        double simulated = first.simulation().orElseThrow().peakForce();
        assertThat(simulated).isGreaterThan(1.05 * balance);
        long limit = Math.round((balance + simulated) / 2);
        SizingResult strict = new Sizer(TABLE, new PrunedSearch(), SIMULATE).size(example("strict", limit + " N"));
        Spring leading = first.evaluation().spring();
        assertThat(strict.shortlist()).noneMatch(e -> e.evaluation().spring().equals(leading));
        assertThat(strict.shortlist()).allMatch(e -> e.simulation().orElseThrow().peakForce() <= limit);
        String expected = String.format(Locale.ROOT, "left the shortlist under ranking.dynamics: strict: %s %s d %.2f mm"
                        + " D %.1f mm Na %.2f: simulated peak force", leading.material().key(), leading.ends().key(),
                leading.wireDiameter() * 1e3, leading.meanDiameter() * 1e3, leading.activeCoils());
        assertThat(dropped(strict)).anyMatch(w -> w.startsWith(expected) && w.contains(" N exceeds limits.peak_force "
                + limit + " N by "));
        if (strict.shortlist().isEmpty()) {
            assertThat(strict.diagnosis().orElseThrow().removedBy()).containsKey("dynamics");
        }
    }

    // 1 in = 0.0254 m exactly (NIST SP 811, 2008 ed., Appendix B; from memory): wire 0.1055 in = 2.6797 mm, mean coil 0.8 in = 20.32 mm.
    @Test
    void aDesignIsNamedInTheRequirementsUnits() throws Exception {
        Spring s = new Spring(TABLE.get("music-wire"), EndType.CLOSED, 0.1055 * 0.0254, 0.8 * 0.0254, 14.25,
                3.245 * 0.0254);
        Candidate c = new Candidate(new Family(0, s.material(), s.ends(), s.wireDiameter()),
                dev.coilwise.mechanics.DesignEvaluator.evaluate(s, example("warn", "2 kN")));
        assertThat(Sizer.describe(c, UnitSystem.US)).isEqualTo("music-wire closed d 0.1055 in D 0.800 in Na 14.25");
        assertThat(Sizer.describe(c, UnitSystem.SI)).isEqualTo("music-wire closed d 2.68 mm D 20.3 mm Na 14.25");
    }
}
