package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.Stress;
import dev.coilwise.model.Spring;
import java.util.List;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.junit.jupiter.api.Test;

/**
 * A spring compressed uniformly and released with nothing on its free end. A. M. Wahl, Mechanical Springs,
 * 2nd ed., chapter on spring surge (from memory): the end moves at the particle speed of the relaxation wave,
 * v = τ/√(2ρG) with τ = 8FD/(πd³) the nominal stress of the compressed spring, until the wave has run to the fixed
 * end and back. The chain's free end must move at that speed on average over the wave's first run along the coils.
 */
class ReleaseWaveTest {
    private static final Spring SPRING = Fixtures.spring();
    private static final double COMPRESSION = 0.020;

    /** Mean speed of the free end between release and the wave's arrival at the base, m/s. */
    private static double meanEndSpeed(int n) {
        LumpedChain chain = LumpedChain.of(SPRING, n, 0, 0);
        TopFace face = new TopFace(n, Double.NEGATIVE_INFINITY, false);
        EventRun run = new EventRun(SPRING, chain, face, 0, 0, List.of());
        double[] y = new double[2 * n + 2];
        double[] u = chain.staticPositionsHeld(COMPRESSION);
        System.arraycopy(u, 0, y, 0, n);
        // The wave crosses the N elements below the top mass in N·√(m/k_e).
        double travel = n * Math.sqrt(chain.nodeMass() / chain.elementRate());
        double[] end = {Double.NaN};
        run.observe(new StepHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public void handleStep(StepInterpolator i, boolean last) {
                if (travel > i.getPreviousTime() && travel <= i.getCurrentTime()) {
                    i.setInterpolatedTime(travel);
                    end[0] = i.getInterpolatedState()[n - 1];
                }
            }
        });
        run.run(y, false, List.of(), new ChainRun.Scales(COMPRESSION, 10, travel), 1.01 * travel, false);
        return (u[n - 1] - end[0]) / travel;
    }

    private static double wahlSpeed() {
        double tau = Stress.nominal(SPRING.rate() * COMPRESSION, SPRING.meanDiameter(), SPRING.wireDiameter());
        return tau / Math.sqrt(2 * SPRING.material().density() * SPRING.shearModulus());
    }

    @Test
    void freeEndMovesAtWahlSurgeSpeedAtTwoHundredMasses() {
        double v = wahlSpeed();
        assertThat(meanEndSpeed(200)).isCloseTo(v, within(0.02 * v));
    }

    @Test
    void chainApproachesWahlSurgeSpeedAsMassesGrow() {
        double v = wahlSpeed();
        double previous = Double.POSITIVE_INFINITY;
        for (int n : new int[]{5, 10, 20, 50}) {
            double error = Math.abs(meanEndSpeed(n) - v) / v;
            assertThat(error).as("N = %d", n).isLessThan(previous);
            previous = error;
        }
        assertThat(previous).isLessThan(0.02);
    }
}
