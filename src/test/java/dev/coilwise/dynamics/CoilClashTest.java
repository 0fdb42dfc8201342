package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import org.junit.jupiter.api.Test;

/** Consistency checks of coil clash against the energy balance of the same design. */
class CoilClashTest {
    private static final Spring SPRING = Fixtures.spring();

    // A drop whose energy balance needs more travel than the spring has to solid (L0 − Ls = 44 mm): the coils
    // must clash before the load stops, and the force then rises above the force at solid, k·(L0 − Ls).
    @Test
    void dropPastSolidClashesBeforeTheLoadStops() {
        Requirement r = Fixtures.drop(2, 0.30);
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        assertThat(e.workingDeflection()).isGreaterThan(SPRING.deflectionToSolid());
        SimulationSummary s = Simulator.simulate(SPRING, r, e, SimulationOptions.defaults()).summary();
        assertThat(s.coilClash()).isTrue();
        assertThat(s.firstClashElement()).isBetween(1, s.masses() + 1);
        assertThat(s.firstClashTime()).isPositive().isLessThan(s.stopTime());
        assertThat(s.maxCompression()).isLessThan(e.workingDeflection());
        assertThat(s.peakForce()).isGreaterThan(SPRING.rate() * SPRING.deflectionToSolid());
        assertThat(s.flags()).anyMatch(f -> f.startsWith("coils clash: element " + s.firstClashElement() + " of 21"));
    }

    // Far from solid (15 mm of 44 mm) nothing clashes.
    @Test
    void gentleDropDoesNotClash() {
        SimulationSummary s = Simulator.simulate(SPRING, Fixtures.drop(2, 0.02), SimulationOptions.defaults())
                .summary();
        assertThat(s.coilClash()).isFalse();
        assertThat(s.firstClashElement()).isZero();
        assertThat(s.firstClashTime()).isNaN();
        assertThat(s.flags()).noneMatch(f -> f.contains("clash"));
    }
}
