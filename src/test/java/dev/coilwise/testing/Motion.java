package dev.coilwise.testing;

import java.util.function.DoubleBinaryOperator;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * Straight-line motion x'' = a(x, v) integrated with Commons Math's Dormand-Prince 8(5,3) integrator, as an
 * independent reference for the closed-form energy balances.
 */
public final class Motion {
    private Motion() {
    }

    /**
     * Integrates from (x0, v0) until {@code stop(x, v)} falls through zero, and returns {x, v} there.
     *
     * @param timeScale a time typical of the motion, s: events are looked for every timeScale/50, and the
     *                  integration gives up after 10·timeScale
     */
    public static double[] until(DoubleBinaryOperator accel, DoubleBinaryOperator stop, double x0, double v0,
                                 double timeScale) {
        FirstOrderDifferentialEquations eq = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] yDot) {
                yDot[0] = y[1];
                yDot[1] = accel.applyAsDouble(y[0], y[1]);
            }
        };
        DormandPrince853Integrator ode = new DormandPrince853Integrator(1e-12, timeScale, 1e-14, 1e-13);
        boolean[] stopped = {false};
        ode.addEventHandler(new EventHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public double g(double t, double[] y) {
                return stop.applyAsDouble(y[0], y[1]);
            }

            @Override
            public Action eventOccurred(double t, double[] y, boolean increasing) {
                stopped[0] = !increasing;
                return increasing ? Action.CONTINUE : Action.STOP;
            }

            @Override
            public void resetState(double t, double[] y) {
            }
        }, timeScale / 50, 1e-14, 1000);
        double[] y = {x0, v0};
        ode.integrate(eq, 0, y, 10 * timeScale, y);
        if (!stopped[0]) {
            throw new AssertionError("the motion never reached its stop condition");
        }
        return y;
    }
}
