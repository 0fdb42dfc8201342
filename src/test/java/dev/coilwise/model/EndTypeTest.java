package dev.coilwise.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * End relations against Budynas &amp; Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Table 10-1
 * "Formulas for the Dimensional Characteristics of Compression-Springs" (from memory):
 * <pre>
 *                  Plain         Plain and ground  Squared or closed  Squared and ground
 *  total coils Nt  Na            Na + 1            Na + 2             Na + 2
 *  free length L0  p·Na + d      p(Na + 1)         p·Na + 3d          p·Na + 2d
 *  solid length Ls d(Nt + 1)     d·Nt              d(Nt + 1)          d·Nt
 *  pitch p         (L0 − d)/Na   L0/(Na + 1)       (L0 − 3d)/Na       (L0 − 2d)/Na
 * </pre>
 */
class EndTypeTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    // Columns: end type, Nt − Na, solid length in wire diameters for Na = 7.5 (Table 10-1), free length in
    // wire diameters beyond p·Na (Table 10-1: L0 = p·Na + this·d; plain-ground has p(Na + 1), i.e. p/d more).
    @ParameterizedTest(name = "{0}")
    @CsvSource({"PLAIN, 0, 8.5, 1", "PLAIN_GROUND, 1, 8.5, -1", "CLOSED, 2, 10.5, 3", "CLOSED_GROUND, 2, 9.5, 2"})
    void shigley9eTable10_1(EndType ends, int inactive, double solidInWires, double freeBeyondPitch) {
        double d = 2.5e-3;
        double na = 7.5;
        assertThat(ends.totalCoils(na)).isEqualTo(na + inactive);
        assertThat(ends.solidLength(d, ends.totalCoils(na))).isCloseTo(solidInWires * d, within(1e-15));

        Spring s = new Spring(TABLE.get("hard-drawn"), ends, d, 20e-3, na, 60e-3);
        assertThat(s.totalCoils()).isEqualTo(na + inactive);
        assertThat(s.solidLength()).isCloseTo(solidInWires * d, within(1e-15));
        double p = s.pitch();
        double l0 = ends == EndType.PLAIN_GROUND ? p * (na + 1) : p * na + freeBeyondPitch * d;
        assertThat(l0).as("L0 from the pitch, Table 10-1").isCloseTo(s.freeLength(), within(1e-15));
        // Closed up to solid, the pitch of every form is one wire diameter.
        Spring nearSolid = s.withFreeLength(s.solidLength() * (1 + 1e-12));
        assertThat(nearSolid.pitch()).isCloseTo(d, within(1e-12));
    }

    @Test
    void groundEndsAndKeys() {
        assertThat(EndType.PLAIN_GROUND.ground()).isTrue();
        assertThat(EndType.CLOSED_GROUND.ground()).isTrue();
        assertThat(EndType.PLAIN.ground()).isFalse();
        assertThat(EndType.CLOSED.ground()).isFalse();
        for (EndType e : EndType.values()) {
            assertThat(EndType.fromKey(e.key())).isSameAs(e);
        }
        assertThatThrownBy(() -> EndType.fromKey("squared")).isInstanceOf(BadInputException.class)
                .hasMessageContaining("'squared'").hasMessageContaining("plain, plain-ground, closed, closed-ground");
    }

    @Test
    void freeLengthMustExceedSolidLength() {
        // closed ends, 10 active coils of 2 mm wire: Ls = 2 mm · (12 + 1) = 26 mm.
        assertThatThrownBy(() -> new Spring(TABLE.get("music-wire"), EndType.CLOSED, 2e-3, 16e-3, 10, 26e-3))
                .isInstanceOf(BadInputException.class).hasMessageContaining("free length 26.000 mm")
                .hasMessageContaining("solid length 26.000 mm");
    }
}
