package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.UnitSystem;
import java.util.List;
import java.util.Locale;
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

    /**
     * The same flags worded in US customary units: exact factors 1 lbf = 4.4482216152605 N, 1 in = 0.0254 m,
     * 1 lb = 0.45359237 kg, 1 ft = 0.3048 m, 1 kpsi = 1000 lbf/in² (NIST SP 811, 2008 ed., Appendix B; from memory).
     */
    @Test
    void usCustomaryUnitsWordTheSameFlagsInPoundsInchesAndFeet() {
        Arrest light = new Arrest(SPRING.activeMass() / 2, 1, Math.PI / 2, 0, Double.NaN);
        SimulationSummary s = arrest(1.02 * E.workingDeflection(), 1.07 * E.peakForce(), 1.1 * E.allowableStress(), 0.6);
        List<String> si = DynamicsFlags.warnings(s, E, light);
        List<String> us = DynamicsFlags.warnings(s, E, light, UnitSystem.US);
        assertThat(us).hasSameSizeAs(si).hasSize(3);
        double lbf = 4.4482216152605;
        double kpsi = 1e3 * lbf / (0.0254 * 0.0254);
        assertThat(us.get(0)).isEqualTo(String.format(Locale.ROOT, "simulated peak stress %.0f kpsi exceeds the allowable"
                + " %.0f kpsi (the energy balance gives %.0f kpsi): the coils' own inertia raises the stress",
                1.1 * E.allowableStress() / kpsi, E.allowableStress() / kpsi, E.stressAtWorking() / kpsi));
        assertThat(us.get(1)).isEqualTo(String.format(Locale.ROOT, "simulated peak force %.4g lbf differs from the"
                + " energy balance (%.4g lbf) by 7.0 %%", 1.07 * E.peakForce() / lbf, E.peakForce() / lbf));
        assertThat(us.get(2)).contains(String.format(Locale.ROOT, "(%.4g lb) is lighter than the spring's active coils"
                + " (%.4g lb)", light.mass() / 0.45359237, SPRING.activeMass() / 0.45359237));
        assertThat(DynamicsFlags.notes(s, DROP.job(), UnitSystem.US)).singleElement().asString()
                .startsWith(String.format(Locale.ROOT, "the load leaves the spring at %.3g ft/s", 0.6 / 0.3048));
        assertThat(String.join(" ", us)).doesNotContain(" mm", " N ", "MPa", " kg", "m/s");
        assertThat(DynamicsFlags.warnings(s, E, light, UnitSystem.SI)).isEqualTo(si);
    }

    // The payload that stays in the guide: 0.5 mm below the muzzle on a vertical launcher is 0.5/25.4 = 0.020 in.
    @Test
    void aPayloadThatStaysInTheGuideIsPlacedInInches() {
        Requirement up = Fixtures.launch(0.1, 0.5, Math.PI / 2, 0);
        Evaluation balance = DesignEvaluator.evaluate(SPRING, up);
        SimulationSummary stuck = new SimulationSummary(20, 0.01, 10, balance.stressAtWorking(), false, Double.NaN, 0,
                Double.NaN, Double.NaN, Double.NaN, 0, -0.0005, List.of(), List.of());
        assertThat(DynamicsFlags.warnings(stuck, balance, up.job(), UnitSystem.US)).anyMatch(f -> f.equals(
                "the payload does not leave the guide: it comes to rest 0.020 in below the muzzle"));
        assertThat(DynamicsFlags.warnings(stuck, balance, up.job())).anyMatch(f -> f.equals(
                "the payload does not leave the guide: it comes to rest 0.5 mm below the muzzle"));
    }
}
