package dev.coilwise.report.html;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class OneTwoFiveLogAxisTest {
    @Test
    void ticksAtOneTwoAndFiveTimesEachPowerOfTenWithinTheRange() {
        assertThat(OneTwoFiveLogAxis.values(80, 2300)).containsExactly(100.0, 200.0, 500.0, 1000.0, 2000.0);
        assertThat(OneTwoFiveLogAxis.values(0.15, 0.6)).containsExactly(0.2, 0.5);
        assertThat(OneTwoFiveLogAxis.values(100, 100)).containsExactly(100.0);
    }

    @Test
    void noTicksForARangeThatALogAxisCannotShow() {
        assertThat(OneTwoFiveLogAxis.values(0, 10)).isEmpty();
        assertThat(OneTwoFiveLogAxis.values(5, 1)).isEmpty();
    }
}
