package dev.coilwise.model;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.Material;
import dev.coilwise.mechanics.ArrestBalance;
import dev.coilwise.mechanics.LaunchBalance;
import dev.coilwise.testing.Generators;
import java.util.Locale;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;

/**
 * Invalid input is rejected with a {@link BadInputException} whose message names the quantity and what is
 * allowed: negative, zero, NaN and infinite lengths, masses and coils, directions out of their range, and wire
 * diameters outside a material's fit.
 */
class InvalidInputPropertiesTest {

    @Provide
    Arbitrary<Double> notPositive() {
        return Arbitraries.oneOf(Arbitraries.of(0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY,
                Double.NEGATIVE_INFINITY, -Double.MIN_VALUE, -Double.MAX_VALUE), Arbitraries.doubles().lessOrEqual(0).ofScale(12));
    }

    @Provide
    Arbitrary<Double> negativeOrNotFinite() {
        return Arbitraries.oneOf(Arbitraries.of(Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                -Double.MIN_VALUE), Arbitraries.doubles().lessThan(0).ofScale(12));
    }

    @Provide
    Arbitrary<Material> materials() {
        return Generators.materials();
    }

    private static final String[] SPRING_QUANTITIES = {"wire diameter", "mean coil diameter", "active coils",
        "free length"};

    @Property(tries = 400)
    void springGeometryMustBePositiveAndFinite(@ForAll("materials") Material m, @ForAll("notPositive") double bad,
                                               @ForAll @IntRange(min = 0, max = 3) int which) {
        double[] v = {m.minDiameter() * 2, m.minDiameter() * 20, 8, m.minDiameter() * 100};
        v[which] = bad;
        assertThatThrownBy(() -> new Spring(m, EndType.CLOSED_GROUND, v[0], v[1], v[2], v[3]))
                .isInstanceOf(BadInputException.class)
                .hasMessageContaining(SPRING_QUANTITIES[which])
                .hasMessageContaining("must be a finite number greater than zero");
    }

    @Property(tries = 400)
    void wireOutsideTheMaterialRangeIsRejectedWithTheRange(@ForAll("materials") Material m,
                                                           @ForAll boolean below) {
        double d = below ? m.minDiameter() * 0.95 : m.maxDiameter() * 1.05;
        String range = String.format(Locale.ROOT, "(%.3f to %.3f mm)", m.minDiameter() * 1e3, m.maxDiameter() * 1e3);
        assertThatThrownBy(() -> new Spring(m, EndType.CLOSED, d, 8 * d, 6, 30 * d))
                .isInstanceOf(BadInputException.class).hasMessageContaining("wire diameter")
                .hasMessageContaining(m.key()).hasMessageContaining(range);
    }

    @Property(tries = 300)
    void jobQuantitiesAreChecked(@ForAll("notPositive") double bad, @ForAll("negativeOrNotFinite") double negative) {
        assertThatThrownBy(() -> new Arrest(bad, 1, 0, 0, Double.NaN)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("load mass").hasMessageContaining("greater than zero");
        assertThatThrownBy(() -> new Arrest(1, negative, 0, 0, Double.NaN)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("contact speed").hasMessageContaining("zero or more");
        assertThatThrownBy(() -> new Arrest(1, 1, 0, negative, Double.NaN)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("drive force").hasMessageContaining("zero or more");
        assertThatThrownBy(() -> new Launch(bad, 1, 1, 0)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("payload mass");
        assertThatThrownBy(() -> new Launch(1, bad, 1, 0)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("launch height");
        assertThatThrownBy(() -> ArrestBalance.maxCompression(bad, 1, 1, 0, 0)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("rate");
        assertThatThrownBy(() -> ArrestBalance.maxCompression(100, 1, 1, 0, negative))
                .isInstanceOf(BadInputException.class).hasMessageContaining("preload");
        assertThatThrownBy(() -> LaunchBalance.cockedCompression(100, bad, 1, 0, 1, 1))
                .isInstanceOf(BadInputException.class).hasMessageContaining("launch height");
    }

    @Property(tries = 300)
    void directionsOutOfRangeAreRejectedWithTheRange(@ForAll double angle) {
        if (!(angle >= -Math.PI / 2 && angle <= Math.PI / 2)) {
            assertThatThrownBy(() -> new Arrest(1, 1, angle, 0, Double.NaN)).isInstanceOf(BadInputException.class)
                    .hasMessageContaining("direction of motion").hasMessageContaining("between -1.5708 and 1.5708 rad");
        }
        if (!(angle >= 1e-6 && angle <= Math.PI / 2)) {
            assertThatThrownBy(() -> new Launch(1, 1, angle, 0)).isInstanceOf(BadInputException.class)
                    .hasMessageContaining("launch direction").hasMessageContaining("between 0.000001 and 1.5708 rad");
        }
    }
}
