package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.InternalFaultException;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import org.junit.jupiter.api.Test;

/** The public surface: options, results, history. */
class SimulatorApiTest {
    private static final Spring SPRING = Fixtures.spring();

    @Test
    void defaultsAreTwentyUndampedMassesWithoutHistory() {
        SimulationOptions o = SimulationOptions.defaults();
        assertThat(o.masses()).isEqualTo(20);
        assertThat(o.dampingRatio()).isZero();
        assertThat(o.keepHistory()).isFalse();
    }

    @Test
    void tooFewMassesIsBadInputNamingTheQuantity() {
        assertThatThrownBy(() -> SimulationOptions.defaults().withMasses(1))
                .isInstanceOf(BadInputException.class).hasMessageContaining("simulation masses")
                .hasMessageContaining("got 1");
    }

    @Test
    void negativeDampingIsBadInputNamingTheQuantity() {
        assertThatThrownBy(() -> SimulationOptions.defaults().withDampingRatio(-0.1))
                .isInstanceOf(BadInputException.class).hasMessageContaining("simulation damping ratio");
    }

    @Test
    void balanceOfAnotherSpringIsRefused() {
        Requirement r = Fixtures.drop(2, 0.02);
        Evaluation other = DesignEvaluator.evaluate(SPRING.withActiveCoils(8), r);
        assertThatThrownBy(() -> Simulator.simulate(SPRING, r, other, SimulationOptions.defaults()))
                .isInstanceOf(InternalFaultException.class);
    }

    @Test
    void historyIsKeptOnlyWhenAskedAndStartsAtContact() {
        Requirement r = Fixtures.drop(2, 0.02);
        assertThat(Simulator.simulate(SPRING, r, SimulationOptions.defaults()).history().isEmpty()).isTrue();
        SimulationResult res = Simulator.simulate(SPRING, r, SimulationOptions.defaults().withHistory(true));
        TimeHistory h = res.history();
        assertThat(h.size()).isGreaterThan(100);
        double[] t = h.time();
        assertThat(t[0]).isZero();
        for (int i = 1; i < t.length; i++) {
            assertThat(t[i]).isGreaterThan(t[i - 1]);
        }
        assertThat(h.loadSpeed()[0]).isCloseTo(Math.sqrt(2 * 9.80665 * 0.02), within(1e-12));
        double maxPosition = java.util.Arrays.stream(h.loadPosition()).max().orElseThrow();
        assertThat(maxPosition - h.loadPosition()[0]).isLessThanOrEqualTo(res.summary().maxCompression() * (1 + 1e-9));
        double maxForce = java.util.Arrays.stream(h.topForce()).max().orElseThrow();
        assertThat(maxForce).isLessThanOrEqualTo(res.summary().peakForce() * (1 + 1e-9));
    }

    @Test
    void timeHistoryCopiesItsArrays() {
        double[] t = {0, 1};
        TimeHistory h = new TimeHistory(t, new double[2], new double[2], new double[2], new double[2]);
        t[1] = 5;
        h.time()[0] = 7;
        assertThat(h.time()).containsExactly(0, 1);
    }

    @Test
    void timeHistoryRefusesColumnsOfDifferentLength() {
        assertThatThrownBy(() -> new TimeHistory(new double[2], new double[1], new double[2], new double[2],
                new double[2])).isInstanceOf(IllegalArgumentException.class);
    }
}
