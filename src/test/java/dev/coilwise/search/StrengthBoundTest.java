package dev.coilwise.search;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.requirement.RequirementReader;
import org.junit.jupiter.api.Test;

/**
 * The work-energy bound of a diagnosis without a force limit, against hand calculations.
 *
 * <p>Sources (all from memory): the energy balance of a load stopped by a linear spring, ½·F·x = E + Fc·x (Gere,
 * Mechanics of Materials, Sec. 2.8 "Impact loading"; Shigley's Mechanical Engineering Design, 9th ed., Sec. 10-7,
 * spring energy ½·k·x²); corrected stress τ = K_B·8FD/(πd³) with the Bergsträsser factor K_B = (4C + 2)/(4C − 3)
 * (Shigley 9th ed., Eqs. 10-5 and 10-7); music wire Sut = A/d^m with A = 2211 MPa·mm^m, m = 0.145 (Table 10-4); static
 * allowable 45 % of Sut before set removal (Table 10-6); standard gravity gn = 9.80665 m/s² (3rd CGPM, 1901).
 *
 * <p>The capacity of the case below, worked by hand. Music wire only, in a 20 mm bore with the default 5 % diametral
 * clearance: the outer diameter may reach 0.95 × 20 = 19 mm, and at the default lowest index C = 4 that is 5d, so the
 * thickest wire that fits is the largest metric series size (ISO 3 R40 series) at most 3.8 mm: d = 3.75 mm, D = 15 mm.
 * Sut = 2211/3.75^0.145 = 2211/1.211270 = 1825.38 MPa; τa = 0.45 × 1825.38 = 821.42 MPa; K_B(4) = 18/13 = 1.384615;
 * F = τa·π·d³/(8·K_B·D) = 821.42e6 × π × 52.7344e-9 / (8 × 1.384615 × 0.015) = 136.084/0.166154 = 819.03 N; with the
 * stress at solid kept within the allowable and the default 15 % clash allowance the peak force stays below
 * 819.03/1.15 = 712.20 N.
 */
class StrengthBoundTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    private static final String ARREST = """
            job: arrest
            load:
              mass: 2 kg
            motion:
              speed: 2 m/s
              direction: horizontal
            limits:
              stroke: 10 mm
            envelope:
              bore: 20 mm
            spring:
              materials: [music-wire]
              ends: [closed-ground]
            """;

    private static StrengthBound bound(String yaml) {
        Requirement req = new RequirementReader(TABLE).parse(yaml, "t.yaml", null);
        return StrengthBound.of(DesignSpace.of(req, TABLE)).orElseThrow();
    }

    // E = ½ × 2 × 2² = 4 J, no push (horizontal). Least peak force within 10 mm without preload: 2E/s = 800 N, above
    // the 712.20 N the strongest spring takes. Stroke at which 712.20 N does: 2E/F = 8/712.20 = 11.2328 mm; with
    // preload, E/F = 5.6164 mm. Bore: the next series wire, 4.00 mm, takes 712.20 × (4/3.75)^(2 − 0.145) = 802.78 N
    // ≥ 800 N at OD 5 × 4 = 20 mm, which needs a bore of 20/0.95 = 21.0526 mm.
    @Test
    void aStrokeTooShortForAnySpringInTheBoreGetsTheLeastStrokeAndBoreByTheEnergyBalance() {
        StrengthBound b = bound(ARREST);
        assertThat(b.leastForce()).isCloseTo(800, within(1e-9));
        assertThat(b.preloaded()).isFalse();
        assertThat(b.capacity()).isCloseTo(712.20, within(0.01));
        assertThat(b.beyondCapacity()).isTrue();
        assertThat(b.strongest().material().key()).isEqualTo("music-wire");
        assertThat(b.strongest().wireDiameter()).isCloseTo(3.75e-3, within(1e-12));
        assertThat(b.meanDiameter()).isCloseTo(15e-3, within(1e-12));
        assertThat(b.strokeNeeded()).isCloseTo(11.2328e-3, within(1e-7));
        assertThat(b.strokeWithPreload()).isCloseTo(5.6164e-3, within(1e-7));
        assertThat(b.boreNeeded()).isCloseTo(21.0526e-3, within(1e-7));
    }

    // With a pocket the least peak force is E/s + Fc = 4/0.010 = 400 N: below the capacity, nothing to change.
    @Test
    void aPocketHalvesTheLeastForceAndThenTheWireIsStrongEnough() {
        StrengthBound b = bound(ARREST.replace("  bore: 20 mm\n", "  bore: 20 mm\n  pocket_length: 60 mm\n"));
        assertThat(b.leastForce()).isCloseTo(400, within(1e-9));
        assertThat(b.preloaded()).isTrue();
        assertThat(b.beyondCapacity()).isFalse();
        assertThat(b.strokeNeeded()).isNaN();
        assertThat(b.boreNeeded()).isNaN();
        assertThat(b.strokeWithPreload()).isNaN();
    }

    // Falling 2 kg: Fc = 2 × 9.80665 = 19.6133 N; least 2E/s + 2Fc = 800 + 39.2266 = 839.2266 N; stroke for 712.20 N:
    // 2E/(F − 2Fc) = 8/(712.20 − 39.2266) = 11.8875 mm.
    @Test
    void theWeightOfAFallingLoadAddsTwiceItself() {
        StrengthBound b = bound(ARREST.replace("direction: horizontal", "direction: down"));
        assertThat(b.leastForce()).isCloseTo(839.2266, within(1e-4));
        assertThat(b.strokeNeeded()).isCloseTo(11.8875e-3, within(1e-7));
    }

    // Launch 0.1 kg straight up 1 m, no losses, cocked 2.5 mm: K = m·gn·H = 0.980665 J, lift b = 0.980665 N; least
    // cocking force 2(K + b·s)/s = 2 × 0.983117/0.0025 = 786.493 N > 712.20 N; stroke 2K/(F − 2b) = 1.96133/710.239
    // = 2.76151 mm.
    @Test
    void aLauncherTooShortGetsTheLeastCockedStroke() {
        StrengthBound b = bound("""
                job: launch
                load:
                  mass: 0.1 kg
                launch:
                  height: 1 m
                limits:
                  stroke: 2.5 mm
                envelope:
                  bore: 20 mm
                spring:
                  materials: [music-wire]
                  ends: [closed-ground]
                """);
        assertThat(b.leastForce()).isCloseTo(786.493, within(1e-3));
        assertThat(b.beyondCapacity()).isTrue();
        assertThat(b.strokeNeeded()).isCloseTo(2.76151e-3, within(1e-8));
        assertThat(b.strokeWithPreload()).as("a launcher is cocked from its free length").isNaN();
    }

    // The capacity is an upper bound: no spring of the design space that keeps its stresses within the allowable,
    // does not close its coils and fits the bore peaks above it (checked with the design evaluator on a grid of every
    // family, mean diameters across the index range, coil counts and free lengths); and it is close to what the
    // strongest such spring takes, so it is no empty bound.
    @Test
    void noSpringThatPassesTheStressCoilBindAndBoreLimitsPeaksAboveTheCapacity() {
        String roomy = ARREST.replace("stroke: 10 mm", "stroke: 60 mm");
        Requirement req = new RequirementReader(TABLE).parse(roomy, "t.yaml", null);
        DesignSpace space = DesignSpace.of(req, TABLE);
        StrengthBound b = StrengthBound.of(space).orElseThrow();
        double strongest = 0;
        int passing = 0;
        for (Family f : space.families()) {
            double d = f.wireDiameter();
            for (double c = 4; c <= 12; c += 0.25) {
                for (double na = 2; na <= 20; na += 1.5) {
                    Spring probe = new Spring(f.material(), f.ends(), d, c * d, na, 1);
                    double work = DesignEvaluator.evaluate(probe, req).workingDeflection();
                    for (double spare : new double[] {1.16, 1.5, 3}) {
                        Spring s = probe.withFreeLength(probe.solidLength() + spare * work);
                        Evaluation e = DesignEvaluator.evaluate(s, req);
                        if (holds(e, "stress_working") && holds(e, "stress_solid") && holds(e, "coil_bind")
                                && holds(e, "fit_bore")) {
                            passing++;
                            assertThat(e.peakForce()).isLessThanOrEqualTo(b.capacity());
                            strongest = Math.max(strongest, e.peakForce());
                        }
                    }
                }
            }
        }
        assertThat(passing).isGreaterThan(100);
        assertThat(strongest).isGreaterThan(0.8 * b.capacity());
    }

    private static boolean holds(Evaluation e, String key) {
        return e.margins().stream().filter(m -> m.key().equals(key)).allMatch(Margin::holds);
    }

    @Test
    void theSizerPutsTheBoundInTheDiagnosis() {
        Requirement req = new RequirementReader(TABLE).parse(ARREST, "t.yaml", null);
        SizingResult r = new Sizer(TABLE, new PrunedSearch(), SizingOptions.searchOnly()).size(req);
        assertThat(r.feasible()).isFalse();
        assertThat(r.diagnosis().orElseThrow().strength()).hasValueSatisfying(b -> assertThat(b.beyondCapacity()).isTrue());
    }
}
