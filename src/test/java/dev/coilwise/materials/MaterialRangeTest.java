package dev.coilwise.materials;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dev.coilwise.error.BadInputException;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A wire diameter outside a material's fit is an error, never an extrapolation (issue 2), for every figure that
 * depends on the diameter; the ends of the range themselves are accepted.
 */
class MaterialRangeTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    static Stream<Arguments> everyMaterialAndFigure() {
        return TABLE.all().stream().flatMap(m -> Stream.of(
                Arguments.of(m, "Sut", (DoubleUnaryOperator) m::tensileStrength),
                Arguments.of(m, "G", (DoubleUnaryOperator) m::shearModulus),
                Arguments.of(m, "E", (DoubleUnaryOperator) m::youngsModulus),
                Arguments.of(m, "allowable", (DoubleUnaryOperator) d -> m.allowableStress(d, true))));
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("everyMaterialAndFigure")
    void diameterOutsideTheFitIsRejectedWithTheRange(Material m, String figure, DoubleUnaryOperator f) {
        String range = String.format(java.util.Locale.ROOT, "(%.3f to %.3f mm)", m.minDiameter() * 1e3,
                m.maxDiameter() * 1e3);
        for (double d : new double[] {m.minDiameter() * 0.99, m.maxDiameter() * 1.01}) {
            assertThatThrownBy(() -> f.applyAsDouble(d)).isInstanceOf(BadInputException.class)
                    .hasMessageContaining("wire diameter").hasMessageContaining(m.key()).hasMessageContaining(range);
        }
        assertThat(f.applyAsDouble(m.minDiameter())).isPositive().isFinite();
        assertThat(f.applyAsDouble(m.maxDiameter())).isPositive().isFinite();
    }
}
