package dev.coilwise.scatter;

import static dev.coilwise.scatter.ScatterFixtures.SPRING;
import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.tolerance.En15800;
import dev.coilwise.tolerance.SpringTolerances;
import java.util.Arrays;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** The EN 15800 source as the Monte Carlo sees it. */
class En15800TolerancesTest {
    private static final ToleranceSource SOURCE = ToleranceSource.en15800();

    @Test
    void halfWidthsAreTheStandardsPermissibleDeviationsWithNoModulusScatter() {
        SpringTolerances t = En15800.of(SPRING, 2);
        HalfWidths h = SOURCE.halfWidths(SPRING, 2);
        assertThat(h).isEqualTo(new HalfWidths(t.wireDiameter(), t.meanDiameter(), t.freeLength(), t.activeCoils(), 0));
    }

    @Test
    void everySampledRateLiesWithinTheFirstOrderRateToleranceOfTheStandard() {
        // SpringTolerances.rate() is the first-order worst case 4Δd/d + 3ΔD/D + ΔNa/Na of k = G d⁴/(8 D³ Na); the
        // truncated draws never exceed any half-width, so no made spring may exceed it beyond second-order terms.
        double k = SPRING.rate();
        double tol = En15800.of(SPRING, 2).rate();
        ScatterSamples s = MonteCarlo.sample(SPRING, ScatterFixtures.arrest(OptionalDouble.empty()),
                SOURCE.halfWidths(SPRING, 2), ScatterSettings.defaults(), ScatterProgress.NONE);
        double worst = Arrays.stream(s.values(Figure.RATE)).map(r -> Math.abs(r - k)).max().orElseThrow();
        assertThat(worst).isLessThanOrEqualTo(tol * 1.05).isGreaterThan(tol * 0.3);
    }

    @Test
    void aCoarserGradeSpreadsTheFreeLengthWider() {
        double[] spread = new double[3];
        for (int grade = 1; grade <= 3; grade++) {
            ScatterSamples s = MonteCarlo.sample(SPRING, ScatterFixtures.launch(false), SOURCE.halfWidths(SPRING, grade),
                    ScatterSettings.defaults().withSamples(2000), ScatterProgress.NONE);
            spread[grade - 1] = s.statistics(Figure.COCKED_COMPRESSION).getStandardDeviation();
        }
        assertThat(spread[0]).isLessThan(spread[1]);
        assertThat(spread[1]).isLessThan(spread[2]);
    }
}
