package dev.coilwise.testing;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;

/**
 * Compares a computed figure with one printed in a source, to the digits printed: the check passes when the figure
 * rounds to the printed value, i.e. |actual − printed| ≤ half a unit of the last printed digit.
 */
public final class Printed {
    private Printed() {
    }

    /**
     * @param what    name of the figure, for the failure message
     * @param actual  computed value, in the unit the source prints
     * @param printed the printed value, as printed (e.g. "4.13"), so its digits set the tolerance
     */
    public static void matches(String what, double actual, String printed) {
        BigDecimal p = new BigDecimal(printed);
        double halfUnit = 0.5 * Math.pow(10, -p.scale());
        double tol = halfUnit * (1 + 1e-9);
        assertThat(actual).as("%s: computed %s, printed %s (tolerance ±%s)", what, actual, printed, halfUnit)
                .isBetween(p.doubleValue() - tol, p.doubleValue() + tol);
    }

    /** As {@link #matches} but with an explicit relative tolerance, for figures the source rounded along the way. */
    public static void within(String what, double actual, double printed, double relative) {
        assertThat(actual).as("%s: computed %s, printed %s (tolerance ±%s %%)", what, actual, printed, relative * 100)
                .isBetween(printed - Math.abs(printed) * relative, printed + Math.abs(printed) * relative);
    }
}
