package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * With the wire's density scaled down a hundredfold (active coils 0.42 g against loads of 0.2 to 2 kg) the chain
 * must behave as the massless linear spring of the closed forms. Tolerance 0.5 % of the closed-form value.
 * Peak forces of impacts are not compared: the surge force v0·√(k·m_a) of the struck end vanishes only with the
 * square root of the coil mass (1.6 N of 143 N here), as it should.
 */
class MasslessLimitTest {
    private static final double G = 9.80665;
    private static final double TOL = 0.005;
    private static final Spring SPRING = Fixtures.spring(Fixtures.withDensityScaled(Fixtures.musicWire(), 1e-2));
    private static final double K = SPRING.rate();

    private static SimulationSummary run(Requirement r) {
        return Simulator.simulate(SPRING, r, SimulationOptions.defaults()).summary();
    }

    // Gere & Goodno, Mechanics of Materials, Sec. 2.8 "Impact loading" (from memory): a weight W dropped from
    // height h onto a linear spring deflects it δ_max = δ_st·(1 + √(1 + 2h/δ_st)), δ_st = W/k.
    @Test
    void dropMatchesGereImpactFormula() {
        double m = 2;
        double h = 0.02;
        double dst = m * G / K;
        SimulationSummary s = run(Fixtures.drop(m, h));
        double expected = dst * (1 + Math.sqrt(1 + 2 * h / dst));
        assertThat(s.maxCompression()).isCloseTo(expected, within(TOL * expected));
    }

    // Work–energy principle for a mass and a linear spring (Meriam & Kraige, Engineering Mechanics: Dynamics,
    // Art. 3/6, from memory): ½k x² = ½ m v0² + Fc·x, Fc = m g sin φ + Fd the constant push along the ramp.
    @Test
    void rampWithDriveForceMatchesWorkEnergy() {
        double m = 2;
        double v0 = 1.0;
        double angle = Math.toRadians(30);
        double drive = 20;
        double fc = m * G * Math.sin(angle) + drive;
        SimulationSummary s = run(Fixtures.arrest(m, v0, angle, drive));
        double expected = (fc + Math.sqrt(fc * fc + K * m * v0 * v0)) / K;
        assertThat(s.maxCompression()).isCloseTo(expected, within(TOL * expected));
    }

    // Same principle with preload F0 = k·x_p at the installed length (free length 80 mm in a 70 mm pocket):
    // ½k((x_p + x)² − x_p²) = ½ m v0² + Fc·x. A conservative system returns the load at its contact speed.
    @Test
    void preloadedPocketMatchesWorkEnergyAndReturnsTheLoad() {
        double m = 2;
        double v0 = 1.0;
        double angle = Math.toRadians(30);
        double drive = 20;
        double fc = m * G * Math.sin(angle) + drive;
        double f0 = K * 0.010;
        SimulationSummary s = run(Fixtures.requirement(new Arrest(m, v0, angle, drive, Double.NaN),
                OptionalDouble.of(0.070)));
        double b = fc - f0;
        double expected = (b + Math.sqrt(b * b + K * m * v0 * v0)) / K;
        assertThat(s.maxCompression()).isCloseTo(expected, within(TOL * expected));
        assertThat(s.reboundSpeed()).isCloseTo(v0, within(TOL * v0));
    }

    // Work–energy for a vertical throw from cocked compression x_c with a massless spring:
    // ½k x_c² = m g (x_c + H), so H = k x_c²/(2 m g) − x_c above the free-length top.
    @Test
    void verticalLaunchMatchesWorkEnergy() {
        double m = 0.2;
        Requirement r = Fixtures.launch(m, 0.5, Math.PI / 2, 0);
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        double xc = e.workingDeflection();
        SimulationSummary s = Simulator.simulate(SPRING, r, e, SimulationOptions.defaults()).summary();
        double expected = K * xc * xc / (2 * m * G) - xc;
        assertThat(s.apex()).isCloseTo(expected, within(TOL * expected));
    }

    // Inclined throw with losses: η·½k x_c² = m g sin θ·x_c + ½ m v² at the muzzle, then the ballistic rise
    // H = (v sin θ)²/(2g) (Meriam & Kraige, projectile motion, from memory).
    @Test
    void inclinedLaunchWithLossesMatchesWorkEnergyAndBallistics() {
        double m = 0.2;
        double angle = Math.PI / 4;
        double losses = 0.2;
        Requirement r = Fixtures.launch(m, 0.5, angle, losses);
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        double xc = e.workingDeflection();
        SimulationSummary s = Simulator.simulate(SPRING, r, e, SimulationOptions.defaults()).summary();
        double v2 = (2 / m) * ((1 - losses) * 0.5 * K * xc * xc - m * G * Math.sin(angle) * xc);
        double expectedSpeed = Math.sqrt(v2);
        double expectedApex = v2 * Math.pow(Math.sin(angle), 2) / (2 * G);
        assertThat(s.exitSpeed()).isCloseTo(expectedSpeed, within(TOL * expectedSpeed));
        assertThat(s.apex()).isCloseTo(expectedApex, within(TOL * expectedApex));
    }

    // A spring cocked for a 1 cm throw without losses, fired against 90 % losses, cannot clear the guide. While the
    // spring still presses on it, work–energy gives the payload's rest point u* below the muzzle:
    // ½k(x_c² − u*²) = (m g + f)(x_c − u*), f = 0.9·k·x_c/2, so u* = 2(m g + f)/k − x_c.
    @Test
    void launchTooWeakForItsLossesStallsWhereWorkEnergySaysAndIsFlagged() {
        double m = 0.2;
        Evaluation cocked = DesignEvaluator.evaluate(SPRING, Fixtures.launch(m, 0.01, Math.PI / 2, 0));
        double xc = cocked.workingDeflection();
        SimulationSummary s = Simulator.simulate(SPRING, Fixtures.launch(m, 0.01, Math.PI / 2, 0.9), cocked,
                SimulationOptions.defaults()).summary();
        double rest = 2 * (m * G + 0.9 * K * xc / 2) / K - xc;
        assertThat(rest).isPositive();
        assertThat(s.exitSpeed()).isZero();
        assertThat(-s.apex()).isCloseTo(rest, within(TOL * rest));
        assertThat(s.flags()).anyMatch(f -> f.startsWith("the payload does not leave the guide"));
    }
}
