package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.model.Gravity;
import dev.coilwise.model.Launch;
import dev.coilwise.testing.Motion;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The launch energy balance: against a direct integration of the payload on a massless spring (Commons Math
 * Dormand-Prince 8(5,3)), and its two directions (height from cocked compression, cocked compression from
 * height) against each other.
 */
class LaunchBalanceTest {

    /** Exit speed of a payload pushed along a line at angle θ by a massless spring released from x_c, m/s. */
    static double integrateToFreeLength(double k, double cocked, double m, double angle) {
        double weight = m * Gravity.STANDARD * Math.sin(angle);
        return Motion.until((x, v) -> (k * (cocked - x) - weight) / m, (x, v) -> cocked - x, 0, 0,
                Math.sqrt(m / k))[1];
    }

    // Cases: rate N/m, cocked compression m, payload kg, angle above horizontal deg.
    @ParameterizedTest(name = "k={0} xc={1} m={2} angle={3}")
    @CsvSource({"2000, 0.05, 0.1, 90", "2000, 0.05, 0.1, 45", "35000, 0.12, 2.5, 70", "600, 0.2, 0.05, 15"})
    void masslessSpringExitSpeedAgreesWithIntegratedMotion(double k, double cocked, double m, double angleDeg) {
        double angle = Math.toRadians(angleDeg);
        double v = LaunchBalance.exitSpeed(k, cocked, m, 0, angle, 1);
        assertThat(v).isCloseTo(integrateToFreeLength(k, cocked, m, angle), within(1e-9 * v));
        // Apex rise of the vertical component, (v·sin θ)²/(2g).
        assertThat(LaunchBalance.height(k, cocked, m, 0, angle, 1))
                .isCloseTo(Math.pow(v * Math.sin(angle), 2) / (2 * Gravity.STANDARD), within(1e-12));
    }

    // Cases: payload kg, height m, angle deg, active spring mass kg, efficiency, rate N/m.
    @ParameterizedTest(name = "m={0} H={1} angle={2} ma={3} eta={4} k={5}")
    @CsvSource({"0.1, 2, 90, 0.02, 1, 3000", "0.1, 2, 60, 0.02, 0.85, 3000", "5, 0.5, 80, 0.4, 0.9, 80000",
                "0.02, 10, 30, 0.001, 0.7, 500"})
    void cockedCompressionAndHeightAreInverse(double m, double h, double angleDeg, double ma, double eta, double k) {
        double angle = Math.toRadians(angleDeg);
        double xc = LaunchBalance.cockedCompression(k, h, m, ma, angle, eta);
        assertThat(LaunchBalance.height(k, xc, m, ma, angle, eta)).isCloseTo(h, within(1e-12 * h));
        // The root satisfies η·½·k·xc² = (m + ma/2)·g·sin θ·xc + ½·(m + ma/3)·v² with v = √(2gH)/sin θ.
        double v = new Launch(m, h, angle, 1 - eta).requiredExitSpeed();
        double stored = eta * 0.5 * k * xc * xc;
        double spent = (m + ma / 2) * Gravity.STANDARD * Math.sin(angle) * xc + 0.5 * (m + ma / 3) * v * v;
        assertThat(stored).isCloseTo(spent, within(1e-12 * stored));
    }

    @Test
    void aSpringTooWeakToLiftThePayloadGivesNoExitSpeed() {
        // Stored ½kx² = 0.5·100·0.01² = 5 mJ; lifting 1 kg by 10 mm takes 98 mJ.
        assertThat(LaunchBalance.exitSpeed(100, 0.01, 1, 0, Math.PI / 2, 1)).isZero();
        assertThat(LaunchBalance.height(100, 0.01, 1, 0, Math.PI / 2, 1)).isZero();
    }
}
