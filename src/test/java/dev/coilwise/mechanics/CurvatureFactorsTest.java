package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.error.BadInputException;
import dev.coilwise.testing.Printed;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Bergsträsser and Wahl factors against printed values. */
class CurvatureFactorsTest {

    // Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed. (from memory): Example 10-1 (C = 10.8),
    // Example 10-2 (C = 10), Example 10-4 (C = 5.11); the book prints K_B to three decimals.
    @ParameterizedTest(name = "Shigley 9e: K_B({0}) = {1}")
    @CsvSource({"10.8, 1.124", "10, 1.135", "5.11, 1.287"})
    void bergstrasserShigley9eExamples(double index, String printed) {
        Printed.matches("K_B", CurvatureFactors.bergstrasser(index), printed);
    }

    // A. M. Wahl, Mechanical Springs, 2nd ed., McGraw-Hill, 1963: the stress factor K = (4C − 1)/(4C − 4) + 0.615/C
    // as tabulated to two decimals in machine-design texts (values from memory).
    @ParameterizedTest(name = "Wahl: K_W({0}) = {1}")
    @CsvSource({"3, 1.58", "4, 1.40", "5, 1.31", "6, 1.25", "8, 1.18", "10, 1.14", "12, 1.12"})
    void wahlTabulatedValues(double index, String printed) {
        Printed.matches("K_W", CurvatureFactors.wahl(index), printed);
    }

    @ParameterizedTest
    @ValueSource(doubles = {2, 4, 7.5, 12, 20})
    void bergstrasserIsTheEn13906Factor(double c) {
        // EN 13906-1:2013, stress correction factor k = (w + 0.5)/(w − 0.75), w = D/d (from memory): the same factor.
        assertThat(CurvatureFactors.bergstrasser(c)).isCloseTo((c + 0.5) / (c - 0.75), within(1e-14));
    }

    @Test
    void indexBelowTheDomainIsRejected() {
        assertThatThrownBy(() -> CurvatureFactors.bergstrasser(0.7)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("spring index").hasMessageContaining("0.75").hasMessageContaining("0.7");
        assertThatThrownBy(() -> CurvatureFactors.bergstrasser(Double.NaN)).isInstanceOf(BadInputException.class);
        assertThatThrownBy(() -> CurvatureFactors.wahl(1.0)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("exceed 1");
        assertThatThrownBy(() -> CurvatureFactors.wahl(Double.POSITIVE_INFINITY))
                .isInstanceOf(BadInputException.class);
    }
}
