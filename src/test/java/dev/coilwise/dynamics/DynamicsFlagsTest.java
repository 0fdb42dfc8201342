package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The wording logic of the flags, on summaries set relative to the balance of a real design. */
class DynamicsFlagsTest {
    private static final Spring SPRING = Fixtures.spring();
    private static final Requirement DROP = Fixtures.drop(2, 0.02);
    private static final Evaluation E = DesignEvaluator.evaluate(SPRING, DROP);

    private static SimulationSummary arrest(double compression, double force, double stress, double rebound) {
        return new SimulationSummary(20, compression, force, stress, false, Double.NaN, 0, Double.NaN, 0.03, rebound,
                Double.NaN, Double.NaN, List.of(), List.of());
    }

    @Test
    void summaryThatMatchesTheBalanceRaisesNoWarning() {
        SimulationSummary s = DynamicsFlags.complete(arrest(E.workingDeflection(), E.peakForce(),
                E.stressAtWorking(), 0.6), E, DROP.job());
        assertThat(s.deviationPct()).isCloseTo(0, within(1e-12));
        assertThat(s.flags()).isEmpty();
        assertThat(s.notes()).singleElement().asString().contains("a spring returns what it stores");
    }

    @Test
    void deviationIsTheWorseOfCompressionAndForce() {
        SimulationSummary s = DynamicsFlags.complete(arrest(1.02 * E.workingDeflection(), 1.07 * E.peakForce(),
                E.stressAtWorking(), 0.6), E, DROP.job());
        assertThat(s.deviationPct()).isCloseTo(7, within(1e-9));
        assertThat(s.flags()).singleElement().asString().startsWith("simulated peak force")
                .contains("by 7.0 %");
    }

    @Test
    void stressOverTheAllowableIsFlagged() {
        SimulationSummary s = DynamicsFlags.complete(arrest(E.workingDeflection(), E.peakForce(),
                1.1 * E.allowableStress(), 0.6), E, DROP.job());
        assertThat(s.flags()).singleElement().asString().contains("exceeds the allowable");
    }

    @Test
    void unfinishedEventIsFlagged() {
        SimulationSummary s = DynamicsFlags.complete(arrest(E.workingDeflection(), E.peakForce(),
                E.stressAtWorking(), Double.NaN), E, DROP.job());
        assertThat(s.flags()).anyMatch(f -> f.contains("did not end"));
        assertThat(s.deviationPct()).isCloseTo(0, within(1e-12));
    }

    @Test
    void loadLighterThanTheCoilsIsFlagged() {
        Arrest light = new Arrest(SPRING.activeMass() / 2, 1, Math.PI / 2, 0, Double.NaN);
        List<String> w = DynamicsFlags.warnings(arrest(E.workingDeflection(), E.peakForce(), E.stressAtWorking(),
                0.6), E, light);
        assertThat(w).singleElement().asString().contains("lighter than the spring's active coils");
    }
}
