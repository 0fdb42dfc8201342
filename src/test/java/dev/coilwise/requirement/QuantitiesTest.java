package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.error.BadInputException;
import dev.coilwise.model.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class QuantitiesTest {

    private static double si(String text, QuantityKind kind) {
        return Quantities.parse(text, kind, "test");
    }

    // Exact definitions: international yard and pound agreement (1959): 1 yd = 0.9144 m, 1 lb = 0.45359237 kg;
    // so 1 in = 0.0254 m and 1 ft = 0.3048 m exactly. Standard gravity gn = 9.80665 m/s^2 exactly (3rd CGPM, 1901).
    // The same exact values are printed in bold in NIST SP 811 (2008 ed.), Appendix B.8 (from memory).
    @Test
    void exactInchPoundDefinitionsNistSp811() {
        assertThat(si("1 in", QuantityKind.LENGTH)).isCloseTo(0.0254, within(1e-18));
        assertThat(si("1.8 in", QuantityKind.LENGTH)).isCloseTo(1.8 * 0.0254, within(1e-17));
        assertThat(si("1 ft", QuantityKind.LENGTH)).isCloseTo(0.3048, within(1e-17));
        assertThat(si("1 lb", QuantityKind.MASS)).isCloseTo(0.45359237, within(1e-17));
        assertThat(si("1 gn", QuantityKind.ACCELERATION)).isCloseTo(9.80665, within(1e-15));
        assertThat(si("1 ft/s", QuantityKind.SPEED)).isCloseTo(0.3048, within(1e-17));
        // 1 lbf = 1 lb x gn = 0.45359237 kg x 9.80665 m/s^2 = 4.4482216152605 N exactly (decimal product).
        assertThat(si("1 lbf", QuantityKind.FORCE)).isCloseTo(4.4482216152605, within(1e-14));
    }

    // NIST SP 811 (2008 ed.), Appendix B.8, factors printed to 7 significant digits (from memory):
    // lbf -> N 4.448 222 E+00; psi -> Pa 6.894 757 E+03; ksi -> Pa 6.894 757 E+06; lbf/in -> N/m 1.751 268 E+02;
    // degree -> rad 1.745 329 E-02. Tolerance: half a unit in the 7th digit.
    @ParameterizedTest(name = "1 {0} = {1} (NIST SP 811 App. B.8)")
    @CsvSource({
        "lbf,    4.448222E+00, FORCE",
        "psi,    6.894757E+03, STRESS",
        "kpsi,   6.894757E+06, STRESS",
        "lbf/in, 1.751268E+02, RATE",
        "deg,    1.745329E-02, ANGLE",
    })
    void customaryFactorsNistSp811(String unit, double factor, QuantityKind kind) {
        assertThat(si("1 " + unit, kind)).isCloseTo(factor, within(Math.abs(factor) * 5e-7));
    }

    // SI prefixes and derived units (SI Brochure, 9th ed., 2019: prefixes k = 1e3, M = 1e6, G = 1e9, m = 1e-3).
    @Test
    void siPrefixesAndDerivedUnits() {
        assertThat(si("45 mm", QuantityKind.LENGTH)).isCloseTo(0.045, within(1e-15));
        assertThat(si("12 kN", QuantityKind.FORCE)).isCloseTo(12_000, within(1e-9));
        assertThat(si("250 g", QuantityKind.MASS)).isCloseTo(0.25, within(1e-15));
        assertThat(si("800 MPa", QuantityKind.STRESS)).isCloseTo(8e8, within(1e-4));
        assertThat(si("80 GPa", QuantityKind.STRESS)).isCloseTo(8e10, within(1e-3));
        assertThat(si("25 N/mm", QuantityKind.RATE)).isCloseTo(25_000, within(1e-9));
        assertThat(si("2.2 m/s", QuantityKind.SPEED)).isCloseTo(2.2, within(1e-15));
        assertThat(si("600 m/s^2", QuantityKind.ACCELERATION)).isCloseTo(600, within(1e-12));
        assertThat(si("5 %", QuantityKind.FRACTION)).isCloseTo(0.05, within(1e-17));
        assertThat(si("30 deg", QuantityKind.ANGLE)).isCloseTo(Math.PI / 6, within(1e-15));
        assertThat(si("30°", QuantityKind.ANGLE)).isCloseTo(Math.PI / 6, within(1e-15));
        assertThat(si("1.8in", QuantityKind.LENGTH)).isCloseTo(0.04572, within(1e-15));
    }

    @Test
    void unitSystemFollowsTheUnitWritten() {
        assertThat(Quantities.measure("1.8 in", QuantityKind.LENGTH).system()).isEqualTo(UnitSystem.US);
        assertThat(Quantities.measure("140 lbf/in", QuantityKind.RATE).system()).isEqualTo(UnitSystem.US);
        assertThat(Quantities.measure("45 mm", QuantityKind.LENGTH).system()).isEqualTo(UnitSystem.SI);
        assertThat(Quantities.measure("60 gn", QuantityKind.ACCELERATION).system()).isNull();
        assertThat(Quantities.measure("5 %", QuantityKind.FRACTION).system()).isNull();
    }

    @Test
    void bareNumberSaysWhichUnitsWouldDo() {
        assertThatThrownBy(() -> si("45", QuantityKind.LENGTH)).isInstanceOf(BadInputException.class)
                .hasMessage("test: '45' has no unit; give a length such as '45 mm' or '1.8 in'");
        assertThatThrownBy(() -> si("0.05", QuantityKind.FRACTION))
                .hasMessage("test: '0.05' has no unit; give a percentage such as '5 %'");
    }

    @Test
    void wrongDimensionNamesTheExpectedKind() {
        assertThatThrownBy(() -> si("45 N", QuantityKind.LENGTH)).hasMessage("test: expected a length, got '45 N'");
        assertThatThrownBy(() -> si("30 %", QuantityKind.ANGLE)).hasMessage("test: expected an angle, got '30 %'");
        assertThatThrownBy(() -> si("0.5 rad", QuantityKind.FRACTION))
                .hasMessage("test: expected a percentage, got '0.5 rad'");
    }

    @Test
    void unknownUnitSuggestsTheNearest() {
        assertThatThrownBy(() -> si("45 mmm", QuantityKind.LENGTH))
                .hasMessage("test: '45 mmm' has an unknown unit 'mmm' (did you mean 'mm'?); length units: mm, cm, m, km, in, ft");
        assertThatThrownBy(() -> si("3 furlong", QuantityKind.LENGTH))
                .hasMessage("test: '3 furlong' has an unknown unit 'furlong'; length units: mm, cm, m, km, in, ft");
    }

    @Test
    void aUnitWrittenInFullIsRefusedWithItsSymbolAsTheHint() {
        assertThatThrownBy(() -> si("1.2 inch", QuantityKind.LENGTH))
                .hasMessage("test: '1.2 inch' has an unknown unit 'inch' (did you mean 'in'?); length units: mm, cm, m, km, in, ft");
        assertThatThrownBy(() -> si("250 Newtons", QuantityKind.FORCE)).hasMessageContaining("(did you mean 'N'?)");
        assertThatThrownBy(() -> si("40 lbs", QuantityKind.MASS)).hasMessageContaining("(did you mean 'lb'?)");
        // A word for a unit of another kind gives no hint from the word: "inches" is no force.
        assertThatThrownBy(() -> si("3 inches", QuantityKind.FORCE)).message().doesNotContain("did you mean 'in'");
    }

    @Test
    void nanInfinityAndJunkAreRefused() {
        assertThatThrownBy(() -> si("NaN mm", QuantityKind.LENGTH)).hasMessage("test: 'NaN mm' is not a finite number; give a length such as '45 mm' or '1.8 in'");
        assertThatThrownBy(() -> si(".inf mm", QuantityKind.LENGTH)).hasMessage("test: '.inf mm' is not a finite number; give a length such as '45 mm' or '1.8 in'");
        assertThatThrownBy(() -> si("-Infinity N", QuantityKind.FORCE)).hasMessage("test: '-Infinity N' is not a finite number; give a force such as '12 kN' or '250 lbf'");
        assertThatThrownBy(() -> si("1e999 mm", QuantityKind.LENGTH)).hasMessage("test: '1e999 mm' is not a finite number; give a length such as '45 mm' or '1.8 in'");
        assertThatThrownBy(() -> si("about 5 mm", QuantityKind.LENGTH))
                .hasMessage("test: 'about 5 mm' does not start with a number; give a length such as '45 mm' or '1.8 in'");
        assertThatThrownBy(() -> si("", QuantityKind.LENGTH))
                .hasMessage("test: has no value; give a length such as '45 mm' or '1.8 in'");
    }

    @Test
    void unitsIndriyaKnowsButCoilwiseDoesNotListAreRefusedWithTheList() {
        assertThatThrownBy(() -> si("45 dm", QuantityKind.LENGTH))
                .hasMessage("test: '45 dm' has a unit coilwise does not read, 'dm'; length units: mm, cm, m, km, in, ft");
        assertThatThrownBy(() -> si("2 kg*m/s^2", QuantityKind.FORCE))
                .hasMessage("test: '2 kg*m/s^2' has a unit coilwise does not read, 'kg*m/s^2'; force units: N, daN, kN, MN, lbf");
        assertThatThrownBy(() -> si("45 MM", QuantityKind.LENGTH))
                .hasMessage("test: '45 MM' has an unknown unit 'MM' (did you mean 'mm'?); length units: mm, cm, m, km, in, ft");
    }

    // The tonne: 1 t = 1000 kg (SI Brochure, 9th ed., 2019, Table 8, non-SI units accepted for use with the SI).
    @Test
    void everyListedUnitIsReadAndTheTonneIsAThousandKilograms() {
        for (QuantityKind kind : QuantityKind.values()) {
            for (String unit : kind.units()) {
                assertThat(Quantities.measure("2 " + unit, kind).value()).as("2 %s", unit).isPositive().isFinite();
            }
        }
        assertThat(si("1.5 t", QuantityKind.MASS)).isCloseTo(1500, within(1e-12));
    }

    @Test
    void longAndControlCharacterValuesAreQuotedCutAndEscaped() {
        String junk = "7 " + "x".repeat(5000);
        assertThatThrownBy(() -> si(junk, QuantityKind.LENGTH)).message()
                .hasSizeLessThan(300).contains("'7 " + "x".repeat(55) + "...'");
        assertThatThrownBy(() -> si("7 \u001b[31mm", QuantityKind.LENGTH)).message().contains("\\u001b").doesNotContain("\u001b");
    }

    @Test
    void eitherKindIsAcceptedWhenTwoAreAllowed() {
        assertThat(Quantities.measure("5 %", QuantityKind.FRACTION, QuantityKind.LENGTH).kind()).isEqualTo(QuantityKind.FRACTION);
        assertThat(Quantities.measure("0.5 mm", QuantityKind.FRACTION, QuantityKind.LENGTH).value()).isCloseTo(5e-4, within(1e-18));
        assertThatThrownBy(() -> Quantities.measure("2 N", QuantityKind.FRACTION, QuantityKind.LENGTH))
                .hasMessage("expected a percentage or a length, got '2 N'");
    }
}
