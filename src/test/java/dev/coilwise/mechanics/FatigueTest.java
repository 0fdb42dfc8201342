package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import org.junit.jupiter.api.Test;

/** Validation of the fatigue check against published values; the reference is named above each set of numbers. */
class FatigueTest {
    private static final double INCH = 0.0254;
    private static final double LBF = 4.4482216152605;
    private static final double KPSI = 6.894757293168e6;
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    // Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Example 10-4 (from memory): unpeened
    // music wire, d = 0.092 in, OD = 9/16 in, 21 active coils, squared and ground, L0 = 4 3/8 in, cycling between a
    // 5 lbf preload and 35 lbf. Sut = 284.1 kpsi (Table 10-4 inch constants). Printed results: τa = 29.7 kpsi,
    // τm = 39.6 kpsi; (a) Gerber with Zimmerli data: Sse = 38.2 kpsi, Ssa = 35.8 kpsi, nf = 1.21;
    // (c) Goodman with Zimmerli data: Sse = 49.2 kpsi, Ssa = 36.6 kpsi, nf = 1.23.
    private static final double D_WIRE = 0.092 * INCH;
    private static final double D_MEAN = (9.0 / 16 - 0.092) * INCH;
    private static final double SUT = 284.1 * KPSI;

    private static double tau(double lbf) {
        return Stress.corrected(lbf * LBF, D_MEAN, D_WIRE);
    }

    private static final double TAU_A = (tau(35) - tau(5)) / 2;
    private static final double TAU_M = (tau(35) + tau(5)) / 2;
    private static final double SSU = FatigueCriterion.ULTIMATE_SHEAR_RATIO * SUT;

    private static void assertExample10_4(FatigueCriterion c, double sse, double ssa, double nf) {
        double endurance = c.enduranceStrength(FatigueStrength.ZIMMERLI_UNPEENED, SSU);
        double amplitude = c.amplitudeStrength(endurance, SSU, LoadLine.PROPORTIONAL, TAU_A, TAU_M);
        assertThat(endurance / KPSI).as("Sse").isCloseTo(sse, within(0.05));
        assertThat(amplitude / KPSI).as("Ssa").isCloseTo(ssa, within(0.05));
        assertThat(amplitude / TAU_A).as("nf").isCloseTo(nf, within(0.005));
    }

    @Test
    void shigley9thExample10_4WorkingStresses() {
        assertThat(TAU_A / KPSI).isCloseTo(29.7, within(0.05));
        assertThat(TAU_M / KPSI).isCloseTo(39.6, within(0.05));
    }

    @Test
    void shigley9thExample10_4GerberWithZimmerliData() {
        assertExample10_4(FatigueCriterion.GERBER, 38.2, 35.8, 1.21);
    }

    @Test
    void shigley9thExample10_4GoodmanWithZimmerliData() {
        assertExample10_4(FatigueCriterion.GOODMAN, 49.2, 36.6, 1.23);
    }

    @Test
    void shigley9thExample10_4WholeCheckOnTheSpringGovernedByGerber() {
        // Same example through the spring and the SI material table (music wire A = 2211 MPa·mm^m, Shigley's
        // Table 10-4, from memory): Sut is 0.2 % below the example's 284.1 kpsi, so nf is compared to 2 digits.
        Material music = TABLE.get("music-wire");
        Spring s = new Spring(music, EndType.CLOSED_GROUND, D_WIRE, D_MEAN, 21, 4.375 * INCH);
        FatigueCheck f = Fatigue.check(s, 5 * LBF, 35 * LBF, 1e8, false, s.material().allowableStress(D_WIRE, false));
        assertThat(f.criterion()).isEqualTo("gerber_zimmerli");
        assertThat(f.safetyFactor()).isCloseTo(1.21, within(0.01));
        assertThat(f.stressAmplitude() / KPSI).isCloseTo(29.7, within(0.05));
        assertThat(f.stressMean() / KPSI).isCloseTo(39.6, within(0.05));
    }

    @Test
    void zimmerliDataMatchTheSiFiguresPrintedBesideThem() {
        // Shigley's MED 9th ed., Sec. 10-9 (from memory): 241/379 MPa unpeened, 398/534 MPa peened.
        assertThat(FatigueStrength.ZIMMERLI_UNPEENED.amplitude() / 1e6).isCloseTo(241, within(0.5));
        assertThat(FatigueStrength.ZIMMERLI_UNPEENED.mean() / 1e6).isCloseTo(379, within(0.5));
        // The printed 398 MPa is 0.4 % above 57.5 kpsi = 396.4 MPa; coilwise keeps the kpsi figure.
        assertThat(FatigueStrength.ZIMMERLI_PEENED.amplitude() / 1e6).isCloseTo(398, within(2.0));
        assertThat(FatigueStrength.ZIMMERLI_PEENED.mean() / 1e6).isCloseTo(534, within(0.5));
    }

    @Test
    void gerberAndGoodmanAgreeOnALoadLineThroughTheZimmerliPoint() {
        // Both curves pass through the strength point they were built from (Shigley's MED 9th ed., Sec. 10-9).
        FatigueStrength z = FatigueStrength.ZIMMERLI_UNPEENED;
        double tauA = z.amplitude() / 1.5;
        double tauM = z.mean() / 1.5;
        for (FatigueCriterion c : FatigueCriterion.values()) {
            assertThat(c.safetyFactor(z, 2000e6, LoadLine.PROPORTIONAL, tauA, tauM)).as(c.key()).isCloseTo(1.5, within(1e-12));
        }
    }

    @Test
    void goodmanIsTheMoreCautiousBeyondTheStrengthPointsMeanStressAndGerberBelowIt() {
        FatigueStrength z = FatigueStrength.ZIMMERLI_UNPEENED;
        double sut = 2000e6;
        // Zero-to-max cycle (launch): the load line meets the curves at a mean stress below 379 MPa.
        double gerberLow = FatigueCriterion.GERBER.safetyFactor(z, sut, LoadLine.PROPORTIONAL, 100e6, 100e6);
        double goodmanLow = FatigueCriterion.GOODMAN.safetyFactor(z, sut, LoadLine.PROPORTIONAL, 100e6, 100e6);
        assertThat(gerberLow).isLessThan(goodmanLow);
        // Heavy preload: the line meets the curves far beyond 379 MPa mean stress.
        double gerberHigh = FatigueCriterion.GERBER.safetyFactor(z, sut, LoadLine.PROPORTIONAL, 60e6, 600e6);
        double goodmanHigh = FatigueCriterion.GOODMAN.safetyFactor(z, sut, LoadLine.PROPORTIONAL, 60e6, 600e6);
        assertThat(goodmanHigh).isLessThan(gerberHigh);
    }

    @Test
    void theTwoLoadLinesCoincideWithoutPreloadAndTheProportionalOneIsMoreCautiousWithIt() {
        FatigueStrength z = FatigueStrength.ZIMMERLI_UNPEENED;
        for (FatigueCriterion c : FatigueCriterion.values()) {
            double prop0 = c.safetyFactor(z, 1800e6, LoadLine.PROPORTIONAL, 150e6, 150e6);
            double cmin0 = c.safetyFactor(z, 1800e6, LoadLine.CONSTANT_MINIMUM, 150e6, 150e6);
            assertThat(cmin0).as(c.key()).isCloseTo(prop0, within(1e-12));
            double prop = c.safetyFactor(z, 1800e6, LoadLine.PROPORTIONAL, 120e6, 300e6);
            double cmin = c.safetyFactor(z, 1800e6, LoadLine.CONSTANT_MINIMUM, 120e6, 300e6);
            assertThat(prop).as(c.key()).isLessThan(cmin);
        }
    }

    @Test
    void constantMinimumLineEndsOnTheFailureCurve() {
        // The returned S_sa must satisfy each criterion's own equation at S_sm = S_sa + τmin (closed-form check).
        double ssu = 1200e6;
        double sse = 300e6;
        double tauMin = 250e6;
        double g = FatigueCriterion.GERBER.amplitudeStrength(sse, ssu, LoadLine.CONSTANT_MINIMUM, 100e6, 350e6);
        assertThat(g / sse + Math.pow((g + tauMin) / ssu, 2)).isCloseTo(1, within(1e-12));
        double j = FatigueCriterion.GOODMAN.amplitudeStrength(sse, ssu, LoadLine.CONSTANT_MINIMUM, 100e6, 350e6);
        assertThat(j / sse + (j + tauMin) / ssu).isCloseTo(1, within(1e-12));
    }

    @Test
    void shigley9thTable10_8FractionsAtThePrintedLives() {
        // Shigley's MED 9th ed., Table 10-8 (from memory), percent of Sut, R = 0.
        CyclicStressTable a228 = CyclicStressTable.A228_AND_302;
        assertThat(a228.fraction(1e5, false)).isEqualTo(0.36);
        assertThat(a228.fraction(1e6, false)).isEqualTo(0.33);
        assertThat(a228.fraction(1e7, false)).isEqualTo(0.30);
        assertThat(a228.fraction(1e5, true)).isEqualTo(0.42);
        assertThat(a228.fraction(1e6, true)).isEqualTo(0.39);
        assertThat(a228.fraction(1e7, true)).isEqualTo(0.36);
        CyclicStressTable a232 = CyclicStressTable.A230_AND_A232;
        assertThat(a232.fraction(1e5, false)).isEqualTo(0.42);
        assertThat(a232.fraction(1e7, true)).isEqualTo(0.46);
        // Between rows: linear in log N; outside: the end rows are held.
        assertThat(a228.fraction(Math.pow(10, 5.5), false)).isCloseTo(0.345, within(1e-12));
        assertThat(a228.fraction(2e4, false)).isEqualTo(0.36);
        assertThat(a228.fraction(1e9, false)).isEqualTo(0.30);
        assertThat(CyclicStressTable.forMaterial(TABLE.get("chrome-vanadium"))).isEqualTo(a232);
        assertThat(CyclicStressTable.forMaterial(TABLE.get("music-wire"))).isEqualTo(a228);
    }

    @Test
    void belowTenThousandCyclesTheCheckIsStatic() {
        Spring s = exampleSpring();
        double allow = s.material().allowableStress(D_WIRE, false);
        FatigueCheck f = Fatigue.check(s, 5 * LBF, 35 * LBF, 5_000, false, allow);
        assertThat(f.criterion()).isEqualTo("static");
        assertThat(f.safetyFactor()).isCloseTo(allow / tau(35), within(1e-12));
        assertThat(Fatigue.check(s, 5 * LBF, 35 * LBF, 1e4, false, allow).criterion()).isNotEqualTo("static");
    }

    @Test
    void finiteLivesUseTheCyclicTableAndInfiniteLifeMayBeGovernedByZimmerli() {
        Spring s = exampleSpring();
        double allow = s.material().allowableStress(D_WIRE, false);
        assertThat(Fatigue.check(s, 5 * LBF, 35 * LBF, 3e5, false, allow).criterion()).endsWith("_cyclic_table");
        assertThat(Fatigue.check(s, 5 * LBF, 35 * LBF, 1e7, false, allow).criterion()).isEqualTo("gerber_zimmerli");
    }

    @Test
    void peenedWireOutlivesUnpeenedWire() {
        Spring s = exampleSpring();
        double allow = s.material().allowableStress(D_WIRE, false);
        for (double n : new double[] {1e4, 1e5, 3e5, 1e6, 1e7, 1e9}) {
            double plain = Fatigue.check(s, 5 * LBF, 35 * LBF, n, false, allow).safetyFactor();
            double peened = Fatigue.check(s, 5 * LBF, 35 * LBF, n, true, allow).safetyFactor();
            assertThat(peened).as("%g cycles", n).isGreaterThan(plain);
        }
    }

    @Test
    void safetyFactorNeverRisesWithMoreCycles() {
        Spring s = exampleSpring();
        double allow = s.material().allowableStress(D_WIRE, false);
        for (boolean peened : new boolean[] {false, true}) {
            double previous = Double.POSITIVE_INFINITY;
            for (double x = 4; x <= 9; x += 0.125) {
                double n = Fatigue.check(s, 0, 35 * LBF, Math.pow(10, x), peened, allow).safetyFactor();
                assertThat(n).as("10^%s cycles", x).isLessThanOrEqualTo(previous);
                previous = n;
            }
        }
    }

    @Test
    void materialsWithoutFatigueDataFailTheCheck() {
        Spring s = new Spring(TABLE.get("phosphor-bronze"), EndType.CLOSED_GROUND, 2e-3, 16e-3, 10, 50e-3);
        FatigueCheck f = Fatigue.check(s, 0, 20, 1e6, false, 1e8);
        assertThat(f.criterion()).isEqualTo("no_data");
        assertThat(f.safetyFactor()).isZero();
    }

    private static Spring exampleSpring() {
        return new Spring(TABLE.get("music-wire"), EndType.CLOSED_GROUND, D_WIRE, D_MEAN, 21, 4.375 * INCH);
    }
}
