package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.model.Gravity;
import dev.coilwise.testing.Generators;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/** Identities of the two energy balances and the impact factor over wide random inputs. */
class EnergyBalancePropertiesTest {

    @Provide
    Arbitrary<Double> rates() {
        return Generators.logUniform(1e-2, 1e8);
    }

    @Provide
    Arbitrary<Double> masses() {
        return Generators.logUniform(1e-3, 1e4);
    }

    @Provide
    Arbitrary<Double> speeds() {
        return Generators.uniform(0, 50);
    }

    @Provide
    Arbitrary<Double> pushes() {
        return Generators.uniform(-1e5, 1e5);
    }

    @Provide
    Arbitrary<Double> preloads() {
        return Generators.uniform(0, 1e5);
    }

    @Provide
    Arbitrary<Double> dropHeights() {
        return Generators.uniform(0, 50);
    }

    @Provide
    Arbitrary<Double> heightSteps() {
        return Generators.logUniform(1e-6, 10);
    }

    @Provide
    Arbitrary<Double> spring() {
        return Generators.uniform(0, 2);
    }

    @Provide
    Arbitrary<Double> launchHeights() {
        return Generators.logUniform(0.01, 100);
    }

    @Provide
    Arbitrary<Double> launchAngles() {
        return Generators.uniform(0.01, Math.PI / 2);
    }

    @Provide
    Arbitrary<Double> efficiencies() {
        return Generators.uniform(0.05, 1);
    }

    @Property(tries = 1000)
    void arrestRootSatisfiesTheBalance(@ForAll("rates") double k, @ForAll("masses") double m,
                                       @ForAll("speeds") double v,
                                       @ForAll("pushes") double push,
                                       @ForAll("preloads") double preload) {
        double x = ArrestBalance.maxCompression(k, m, v, push, preload);
        assertThat(x).isFinite().isGreaterThanOrEqualTo(0);
        double residual = 0.5 * m * v * v + push * x - preload * x - 0.5 * k * x * x;
        double scale = 0.5 * m * v * v + (Math.abs(push) + preload) * x + 0.5 * k * x * x;
        assertThat(residual).isCloseTo(0, within(1e-12 * Math.max(scale, Double.MIN_NORMAL)));
        // It is the first rest point: the load still moves inward at every smaller compression.
        if (x > 0) {
            double y = 0.5 * x;
            assertThat(0.5 * m * v * v + push * y - preload * y - 0.5 * k * y * y).isGreaterThan(-1e-12 * scale);
        }
    }

    @Property(tries = 1000)
    void compressionGrowsWithDropHeight(@ForAll("rates") double k, @ForAll("masses") double m,
                                        @ForAll("dropHeights") double h,
                                        @ForAll("heightSteps") double dh,
                                        @ForAll("preloads") double preload) {
        double w = m * Gravity.STANDARD;
        double x1 = ArrestBalance.maxCompression(k, m, ArrestBalance.dropSpeed(h), w, preload);
        double x2 = ArrestBalance.maxCompression(k, m, ArrestBalance.dropSpeed(h + dh), w, preload);
        assertThat(x2).isGreaterThan(x1);
    }

    @Property(tries = 1000)
    void impactFactorIsTheArrestOfADroppedWeight(@ForAll("rates") double k, @ForAll("masses") double m,
                                                 @ForAll("dropHeights") double h) {
        double w = m * Gravity.STANDARD;
        double x = ArrestBalance.maxCompression(k, m, ArrestBalance.dropSpeed(h), w, 0);
        double expected = ImpactFactor.of(h, w / k) * w / k;
        assertThat(x).isCloseTo(expected, within(1e-12 * expected));
    }

    @Property(tries = 1000)
    void launchHeightOfTheCockedCompressionIsTheRequestedHeight(
            @ForAll("rates") double k, @ForAll("masses") double m, @ForAll("spring") double share,
            @ForAll("launchHeights") double h, @ForAll("launchAngles") double angle,
            @ForAll("efficiencies") double eta) {
        double ma = share * m;
        double xc = LaunchBalance.cockedCompression(k, h, m, ma, angle, eta);
        assertThat(xc).isFinite().isPositive();
        // The height comes back through stored − lift; when the two nearly cancel, rounding grows by their ratio.
        double stored = eta * 0.5 * k * xc * xc;
        double kinetic = stored - (m + ma / 2) * Gravity.STANDARD * Math.sin(angle) * xc;
        assertThat(LaunchBalance.height(k, xc, m, ma, angle, eta)).isCloseTo(h, within(1e-13 * h * stored / kinetic));
        // More compression throws higher.
        assertThat(LaunchBalance.height(k, xc * 1.01, m, ma, angle, eta)).isGreaterThan(h);
    }
}
