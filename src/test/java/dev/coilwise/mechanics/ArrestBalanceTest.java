package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.model.Arrest;
import dev.coilwise.model.Gravity;
import dev.coilwise.testing.Motion;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The arrest energy balance against a direct integration of m·x'' = Fc − F0 − k·x with Commons Math's
 * Dormand-Prince 8(5,3) integrator, stopped where the load comes to rest: the balance must give the same largest
 * compression, peak force and peak deceleration.
 */
class ArrestBalanceTest {

    /** Largest compression found by integrating the motion from first contact until the speed is zero, m. */
    static double integrateToRest(double k, double m, double v0, double push, double preload) {
        return Motion.until((x, v) -> (push - preload - k * x) / m, (x, v) -> v, 0, v0, Math.sqrt(m / k))[0];
    }

    // Cases: rate N/m, mass kg, contact speed m/s, direction below horizontal deg, drive force N, preload N.
    @ParameterizedTest(name = "k={0} m={1} v0={2} angle={3} drive={4} F0={5}")
    @CsvSource({
        "20000, 10, 2.0, 90, 0, 0",        // falling straight down, no preload
        "20000, 10, 2.0, 90, 0, 150",      // falling, with preload from a pocket
        "5000, 3, 1.5, 0, 40, 0",          // horizontal, pushed by a drive force
        "8000, 25, 0.8, 30, 0, 60",        // inclined 30° downward, with preload
        "8000, 25, 3.0, -45, 0, 20",       // moving upward 45°: gravity helps stop the load
        "150000, 400, 0.5, 90, 2000, 0"})  // heavy load, falling and driven
    void balanceAgreesWithIntegratedMotion(double k, double m, double v0, double angleDeg, double drive,
                                           double preload) {
        Arrest job = new Arrest(m, v0, Math.toRadians(angleDeg), drive, Double.NaN);
        double push = job.pushForce();
        assertThat(push).isCloseTo(m * Gravity.STANDARD * Math.sin(Math.toRadians(angleDeg)) + drive, within(1e-9));

        double x = ArrestBalance.maxCompression(k, m, v0, push, preload);
        double xOde = integrateToRest(k, m, v0, push, preload);
        assertThat(x).isCloseTo(xOde, within(1e-9 * Math.max(x, 1e-6)));

        // The root satisfies the balance ½mv0² + Fc·x = F0·x + ½kx².
        double energy = 0.5 * m * v0 * v0 + Math.abs(push) * x + preload * x;
        assertThat(0.5 * m * v0 * v0 + push * x - preload * x - 0.5 * k * x * x).isCloseTo(0, within(1e-12 * energy));

        double peak = ArrestBalance.peakForce(k, preload, x);
        assertThat(peak).isCloseTo(preload + k * xOde, within(1e-8 * peak));
        assertThat(ArrestBalance.peakDeceleration(peak, push, m)).isCloseTo((peak - push) / m, within(1e-12))
                .isGreaterThanOrEqualTo(0);
    }

    @Test
    void preloadAbovePushHoldsALoadThatArrivesAtRest() {
        assertThat(ArrestBalance.maxCompression(1000, 2, 0, 15, 30)).isZero();
        assertThat(ArrestBalance.maxCompression(1000, 2, 0, -15, 0)).isZero();
    }

    @Test
    void dropSpeedIsFreeFall() {
        // v = √(2gh) with standard gravity 9.80665 m/s² (ISO 80000-3): 1 m → 4.42869 m/s.
        assertThat(ArrestBalance.dropSpeed(1.0)).isCloseTo(Math.sqrt(2 * 9.80665), within(1e-15));
        assertThat(ArrestBalance.dropSpeed(0)).isZero();
    }
}
