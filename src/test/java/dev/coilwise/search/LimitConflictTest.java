package dev.coilwise.search;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.requirement.RequirementReader;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The work-energy bounds on force limits. Hand calculations with the spring energy ½·k·x² of a linear spring
 * (Shigley's Mechanical Engineering Design, 9th ed., Sec. 10-7; from memory) and standard gravity gn = 9.80665 m/s²
 * (3rd CGPM, 1901); every figure below is worked out in the comment above it.
 */
class LimitConflictTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    static Requirement read(String yaml) {
        return new RequirementReader(TABLE).parse(yaml, "t.yaml", null);
    }

    private static final String ARREST = """
            job: arrest
            load:
              mass: 6 kg
            motion:
              speed: 2 m/s
            limits:
              stroke: 30 mm
              peak_force: 300 N
            """;

    // E = 1/2 x 6 x 2^2 = 12 J; Fc = 6 x 9.80665 = 58.8399 N (falling straight down); s = 0.030 m.
    // No preload: F >= 2E/s + 2Fc = 800 + 117.680 = 917.680 N; stroke for 300 N: 2E/(300 - 2Fc) = 24/182.320 = 0.131637 m.
    // With preload: F >= E/s + Fc = 400 + 58.840 = 458.840 N.
    @Test
    void aPeakForceBelowTwiceTheEnergyOverTheStrokeIsImpossibleWithoutPreload() {
        List<LimitConflict> c = LimitConflict.of(read(ARREST));
        assertThat(c).hasSize(1);
        assertThat(c.get(0).limit()).isEqualTo("peak_force");
        assertThat(c.get(0).leastNeeded()).isCloseTo(917.680, within(1e-3));
        assertThat(c.get(0).strokeNeeded()).isCloseTo(0.131637, within(1e-6));
        assertThat(c.get(0).withPreload()).isCloseTo(458.840, within(1e-3));
        assertThat(c.get(0).preloaded()).isFalse();
    }

    // With a pocket: F >= E/s + Fc = 458.840 N; stroke for 300 N: E/(300 - Fc) = 12/241.160 = 0.0497595 m.
    @Test
    void aPocketAllowsPreloadAndHalvesTheEnergyTerm() {
        List<LimitConflict> c = LimitConflict.of(read(ARREST + "envelope:\n  pocket_length: 80 mm\n"));
        assertThat(c).singleElement().satisfies(x -> {
            assertThat(x.leastNeeded()).isCloseTo(458.840, within(1e-3));
            assertThat(x.strokeNeeded()).isCloseTo(0.0497595, within(1e-7));
            assertThat(x.preloaded()).isTrue();
            assertThat(x.withPreload()).isNaN();
        });
    }

    // Deceleration a = (F - Fc)/m: least (917.680 - 58.840)/6 = 143.140 m/s^2 = 14.5962 gn, above a 10 gn limit.
    // The force at 10 gn is 6 x 98.0665 + 58.840 = 647.239 N; stroke 24/(647.239 - 117.680) = 0.0453208 m.
    @Test
    void aDecelerationLimitIsTheForceLimitSeenFromTheLoad() {
        List<LimitConflict> c = LimitConflict.of(read(ARREST.replace("  peak_force: 300 N\n", "  deceleration: 10 gn\n")));
        assertThat(c).singleElement().satisfies(x -> {
            assertThat(x.limit()).isEqualTo("deceleration");
            assertThat(x.leastNeeded()).isCloseTo(143.140, within(1e-3));
            assertThat(x.strokeNeeded()).isCloseTo(0.0453208, within(1e-7));
        });
    }

    // Launch 1 kg straight up 3 m: v^2 = 2 gn H = 58.8399, K = 29.4200 J; lift m gn = 9.80665 N; s = 0.040 m, no losses.
    // F >= 2 (K + lift s)/s = 2 x 29.8122 / 0.040 = 1490.61 N; stroke for 500 N: K/(250 - 9.80665) = 0.122485 m.
    @Test
    void aLauncherNeedsTwiceTheStoredEnergyOverTheStroke() {
        Requirement req = read("job: launch\nload:\n  mass: 1 kg\nlaunch:\n  height: 3 m\nlimits:\n  stroke: 40 mm\n"
                + "  peak_force: 500 N\n");
        assertThat(LimitConflict.of(req)).singleElement().satisfies(x -> {
            assertThat(x.leastNeeded()).isCloseTo(1490.61, within(1e-2));
            assertThat(x.strokeNeeded()).isCloseTo(0.122485, within(1e-6));
        });
    }

    @Test
    void limitsWithRoomGiveNoConflict() {
        assertThat(LimitConflict.of(read(ARREST.replace("300 N", "1 kN")))).isEmpty();
    }

    // The bound is sound: where it says no spring can, the search finds none (and one just above it is not refused).
    @Test
    void theSearchAgreesThatNoSpringCan() {
        Sizer sizer = new Sizer(TABLE, new PrunedSearch(), SizingOptions.searchOnly());
        SizingResult r = sizer.size(read(ARREST.replace("300 N", "900 N")));
        assertThat(r.feasible()).isFalse();
        assertThat(r.diagnosis().orElseThrow().conflicts()).extracting(LimitConflict::limit).containsExactly("peak_force");
    }
}
