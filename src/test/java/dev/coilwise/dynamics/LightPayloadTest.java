package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import org.junit.jupiter.api.Test;

/**
 * A payload weighing a fifth of the spring's active coils. The corrected balance charges the coils with m_a/3 of
 * kinetic energy, which assumes a load much heavier than the coils; a light payload instead leaves with the surge
 * wave (Wahl, Mechanical Springs, 2nd ed., surge chapter, from memory: the free end of a released spring moves at
 * τ/√(2ρG)), well below what the balance predicts.
 */
class LightPayloadTest {
    @Test
    void exitSpeedFallsClearlyBelowTheCorrectedBalanceAndIsFlagged() {
        Spring s = Fixtures.spring();
        Requirement r = Fixtures.launch(s.activeMass() / 5, 0.5, Math.PI / 2, 0);
        Evaluation e = DesignEvaluator.evaluate(s, r);
        SimulationSummary sum = Simulator.simulate(s, r, e, SimulationOptions.defaults()).summary();
        assertThat(sum.exitSpeed()).isPositive().isLessThan(0.9 * e.speed());
        assertThat(sum.deviationPct()).isGreaterThan(DynamicsFlags.DEVIATION_LIMIT_PCT);
        assertThat(sum.flags()).anyMatch(f -> f.contains("exit speed") && f.contains("differs from the energy balance"));
        assertThat(sum.flags()).anyMatch(f -> f.contains("lighter than the spring's active coils"));
    }

    // Counter-check: a payload five times the active coil mass is where the corrected balance is meant to hold.
    @Test
    void heavyPayloadStaysWithinTheDeviationLimit() {
        Spring s = Fixtures.spring();
        Requirement r = Fixtures.launch(5 * s.activeMass(), 0.5, Math.PI / 2, 0);
        Evaluation e = DesignEvaluator.evaluate(s, r);
        SimulationSummary sum = Simulator.simulate(s, r, e, SimulationOptions.defaults()).summary();
        assertThat(sum.deviationPct()).isLessThan(DynamicsFlags.DEVIATION_LIMIT_PCT);
        assertThat(sum.flags()).isEmpty();
    }
}
