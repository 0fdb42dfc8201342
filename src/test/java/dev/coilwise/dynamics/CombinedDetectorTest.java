package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

/**
 * The combined switching function on the harmonic oscillator x'' = −x, x(0) = 0, x'(0) = 1, whose solution
 * x = sin t, v = cos t has its roots in closed form: x at kπ, v at π/2 + kπ.
 */
class CombinedDetectorTest {
    /** x'' = −x as y = (x, v): the layout of a chain of no masses carrying a load. */
    private static final FirstOrderDifferentialEquations OSCILLATOR = new FirstOrderDifferentialEquations() {
        @Override
        public int getDimension() {
            return 2;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            yDot[0] = y[1];
            yDot[1] = -y[0];
        }
    };

    /** Records its crossings as signed times: +t rising, −t falling. */
    private static final class Recorder implements EventHandler {
        private final int component;
        final List<Double> crossings = new ArrayList<>();

        Recorder(int component) {
            this.component = component;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            return y[component];
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            crossings.add(increasing ? t : -t);
            return Action.CONTINUE;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    private static void integrate(List<EventHandler> parts, double end) {
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-9, 0.5, 1e-10, 1e-10);
        integrator.addEventHandler(new CombinedDetector(parts, OSCILLATOR, 0, 1), 0.25, 1e-12, 100);
        integrator.integrate(OSCILLATOR, 0, new double[]{0, 1}, end, new double[2]);
    }

    @Test
    void everyCrossingOfEveryPartIsReportedWithItsDirection() {
        Recorder x = new Recorder(0);
        Recorder v = new Recorder(1);
        integrate(List.of(x, v), 7);
        // x starts at zero and rises: its first root is the fall at π, then the rise at 2π.
        assertThat(x.crossings).hasSize(2);
        assertThat(x.crossings.get(0)).isCloseTo(-Math.PI, within(1e-9));
        assertThat(x.crossings.get(1)).isCloseTo(2 * Math.PI, within(1e-9));
        assertThat(v.crossings).hasSize(2);
        assertThat(v.crossings.get(0)).isCloseTo(-Math.PI / 2, within(1e-9));
        assertThat(v.crossings.get(1)).isCloseTo(3 * Math.PI / 2, within(1e-9));
    }

    @Test
    void partsCrossingTogetherAreBothToldInOneEvent() {
        Recorder a = new Recorder(1);
        Recorder b = new Recorder(1);
        integrate(List.of(a, b), 2);
        assertThat(a.crossings).singleElement().satisfies(t -> assertThat(t).isCloseTo(-Math.PI / 2, within(1e-9)));
        assertThat(b.crossings).isEqualTo(a.crossings);
    }
}
