package dev.coilwise.scatter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.junit.jupiter.api.Test;

/**
 * {@link Percentiles#r7} against the general-purpose reference, Commons Math 3.6.1 {@code Percentile} with
 * {@code EstimationType.R_7} used as the summary used it before (set the data, then evaluate): the same value, bit
 * for bit, over generated data sets (ties, zeros of either sign, infinities, sorted and reversed orders, one to a few
 * thousand values) and one to three percentiles asked at once (the summary's 1 and 99, the ends, any in between).
 */
class PercentilesTest {
    /** Data and the percentiles asked of it at once. */
    record Case(double[] data, double[] percentiles) {
        @Override
        public String toString() {
            return "p" + Arrays.toString(percentiles) + " of "
                    + (data.length <= 40 ? Arrays.toString(data) : data.length + " values");
        }
    }

    @Property(tries = 3000)
    void givesExactlyTheValuesOfCommonsMath(@ForAll("cases") Case c) {
        double[] copy = c.data().clone();
        double[] actual = Percentiles.r7(c.data(), c.percentiles());
        Percentile reference = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        reference.setData(c.data());
        for (int i = 0; i < actual.length; i++) {
            // Boxed: Double.equals compares bit patterns (NaN, from ∞ − ∞, equals NaN; −0.0 differs from 0.0).
            Double expected = reference.evaluate(c.percentiles()[i]);
            assertThat(Double.valueOf(actual[i])).as("%s, p%s", c, c.percentiles()[i]).isEqualTo(expected);
        }
        assertThat(c.data()).as("data left as given").isEqualTo(copy);
    }

    @Test
    void theTailsOfTenThousandValuesComeFromTheirOrderStatistics() {
        // R-7 (Hyndman & Fan 1996, definition 7): h = 1 + (n − 1)p. With 1..10000: p = 0.01 gives h = 100.99, so
        // 100 + 0.99·(101 − 100) = 100.99; p = 0.99 gives h = 9900.01, so 9900.01.
        double[] v = new double[10_000];
        for (int i = 0; i < v.length; i++) {
            v[i] = v.length - i;
        }
        double[] p = Percentiles.r7(v, 1, 99);
        assertThat(p[0]).isCloseTo(100.99, within(1e-9));
        assertThat(p[1]).isCloseTo(9900.01, within(1e-9));
    }

    @Provide
    Arbitrary<Case> cases() {
        return Arbitraries.randomValue(PercentilesTest::randomCase);
    }

    private static Case randomCase(Random r) {
        int n = switch (r.nextInt(4)) {
            case 0 -> 1 + r.nextInt(5);
            case 1 -> 1 + r.nextInt(200);
            default -> 1 + r.nextInt(3000);
        };
        double[] v = new double[n];
        int kind = r.nextInt(4);
        for (int i = 0; i < n; i++) {
            v[i] = switch (kind) {
                case 0 -> r.nextGaussian() * Math.pow(10, r.nextInt(20) - 10);
                case 1 -> r.nextInt(7) - 3; // many ties
                default -> r.nextDouble() + 1;
            };
            int special = r.nextInt(50);
            if (special == 0) {
                v[i] = r.nextBoolean() ? 0.0 : -0.0;
            } else if (special == 1) {
                v[i] = r.nextBoolean() ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
            }
        }
        if (r.nextInt(4) == 0) {
            Arrays.sort(v);
            if (r.nextBoolean()) {
                for (int i = 0; i < n / 2; i++) {
                    double t = v[i];
                    v[i] = v[n - 1 - i];
                    v[n - 1 - i] = t;
                }
            }
        }
        double[] p = new double[1 + r.nextInt(3)];
        for (int i = 0; i < p.length; i++) {
            p[i] = switch (r.nextInt(6)) {
                case 0 -> ScatterSamples.LOW_PERCENTILE;
                case 1 -> ScatterSamples.HIGH_PERCENTILE;
                case 2 -> 100;
                case 3 -> 1e-9;
                default -> 100 * (1 - r.nextDouble()); // (0, 100]
            };
        }
        return new Case(v, p);
    }
}
