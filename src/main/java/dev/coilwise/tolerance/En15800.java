package dev.coilwise.tolerance;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;
import dev.coilwise.error.Message;
import dev.coilwise.model.Spring;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Permissible deviations of cold-coiled compression springs by EN 15800:2008 (successor of DIN 2095:1973), grades 1
 * (fine), 2 (medium, the default when none is agreed) and 3 (coarse). Pure and thread-safe; SI in and out.
 *
 * <p>The equations of the standard are written in mm and N; they are evaluated here in those units and converted at
 * the method boundary. Provenance of each figure is on its method. In short: the coil-diameter table is read from
 * published reproductions; the free-length and force equations (factors φ_F, k_F, Q) and the e1/e2 angles are from
 * memory and should be confirmed against the standard before a drawing relies on their exact value.
 */
public final class En15800 {
    /** Scope of EN 15800 (DIN EN 15800:2008 foreword as published by DIN): wire 0.07 to 16 mm. */
    public static final double MIN_WIRE = 0.07e-3;
    public static final double MAX_WIRE = 16e-3;
    /** Scope: mean coil diameter 0.63 to 200 mm. */
    public static final double MIN_COIL = 0.63e-3;
    public static final double MAX_COIL = 200e-3;
    /** Scope: free length up to 630 mm. */
    public static final double MAX_FREE_LENGTH = 0.630;
    /** Scope: at least 2 active coils. */
    public static final double MIN_ACTIVE_COILS = 2;
    /** Scope: spring index w = D/d from 4 to 20. */
    public static final double MIN_INDEX = 4;
    public static final double MAX_INDEX = 20;

    /** Grade factor Q of grades 1, 2, 3 (EN 15800 / DIN 2095, from memory): 0.63, 1.0, 1.6. */
    private static final double[] Q = {0.63, 1.0, 1.6};
    /** Share of the test force added to the force tolerance, 1.5 % (EN 15800 force equation, from memory). */
    public static final double FORCE_SHARE = 0.015;
    /** e1 as a share of L0 for grades 1, 2, 3: tan 1.5°, tan 3°, tan 5° (EN 15800 / DIN 2095, from memory). */
    private static final double[] SQUARENESS = {0.026, 0.052, 0.087};
    /** e2 as a share of De for grades 1, 2, 3 (EN 15800 / DIN 2095, from memory). */
    private static final double[] PARALLELISM = {0.015, 0.030, 0.050};
    /** Active-coil tolerance, ±¼ coil (common practice; not a clause of EN 15800). */
    public static final double ACTIVE_COILS_TOLERANCE = 0.25;

    private En15800() {
    }

    /** Checks the grade and returns it. */
    public static int checkGrade(int grade) {
        if (grade < 1 || grade > 3) {
            throw BadInputException.of(Message.UNKNOWN_KEY, "EN 15800 tolerance grade", String.valueOf(grade),
                    "1 (fine), 2 (medium), 3 (coarse)");
        }
        return grade;
    }

    /** Grade factor Q: 0.63, 1.0 or 1.6 for grades 1, 2, 3 (from memory). */
    public static double gradeFactor(int grade) {
        return Q[checkGrade(grade) - 1];
    }

    /** Every permissible deviation of {@code s} at {@code grade}. */
    public static SpringTolerances of(Spring s, int grade) {
        checkGrade(grade);
        List<String> notes = new ArrayList<>();
        scopeNotes(s, notes);
        double ad = WireTolerance.halfWidth(s.wireDiameter());
        double aD = coilDiameterTolerance(s, grade, notes);
        double aL0 = freeLengthTolerance(s, grade);
        double an = ACTIVE_COILS_TOLERANCE;
        double rel = 4 * ad / s.wireDiameter() + 3 * aD / s.meanDiameter() + an / s.activeCoils();
        double e1 = s.ends().ground() ? squareness(s, grade) : Double.NaN;
        double e2 = s.ends().ground() ? parallelism(s, grade) : Double.NaN;
        return new SpringTolerances(grade, ad, aD, aL0, an, rel * s.rate(), e1, e2, notes);
    }

    /**
     * ±A_D of the coil diameter, m, from EN 15800 Table 1 (see {@link CoilDiameterTable} for provenance). Outside
     * the table the nearest row or column is used.
     */
    public static double coilDiameterTolerance(Spring s, int grade) {
        return coilDiameterTolerance(s, checkGrade(grade), new ArrayList<>());
    }

    /**
     * Coil-diameter tolerance ± half-width, m, for mean diameter {@code meanDiameter} (m) and index w = D/d: the table
     * look-up alone, which depends on no material.
     */
    public static double coilDiameterTolerance(double meanDiameter, double index, int grade) {
        return CoilDiameterTable.halfWidth(meanDiameter * 1e3, index, checkGrade(grade)).halfWidthMm() * 1e-3;
    }

    private static double coilDiameterTolerance(Spring s, int grade, List<String> notes) {
        CoilDiameterTable.Entry e = CoilDiameterTable.halfWidth(s.meanDiameter() * 1e3, s.index(), grade);
        if (e.extrapolated()) {
            notes.add(String.format(Locale.ROOT, "coil diameter tolerance: grade %d above D = 63 mm extrapolated as %s"
                    + " grade 2 (not printed in the table we read)", grade, grade == 1 ? "half of" : "twice"));
        }
        return e.halfWidthMm() * 1e-3;
    }

    /**
     * Factor k_F of the spring index w = D/d: k_F = 1/(3w²) + 0.54/w + 0.803 (EN 15800 equation replacing the DIN 2095
     * diagram; from memory).
     */
    public static double kF(double index) {
        Check.positive("spring index", index, "");
        return 1 / (3 * index * index) + 0.54 / index + 0.803;
    }

    /**
     * Factor φ_F, N, with d and D in mm: φ_F = 65.92·d^3.3/D^1.6 · [−0.84(w/10)³ + 3.781(w/10)² − 4.244(w/10) + 2.274]
     * (EN 15800 equation replacing the DIN 2095 family of curves; from memory).
     *
     * @param wireDiameterMm d, mm
     * @param meanDiameterMm D, mm
     */
    public static double phiF(double wireDiameterMm, double meanDiameterMm) {
        Check.positive("wire diameter", wireDiameterMm, "mm");
        Check.positive("mean coil diameter", meanDiameterMm, "mm");
        double x = meanDiameterMm / wireDiameterMm / 10;
        double poly = ((-0.84 * x + 3.781) * x - 4.244) * x + 2.274;
        return 65.92 * Math.pow(wireDiameterMm, 3.3) / Math.pow(meanDiameterMm, 1.6) * poly;
    }

    /** The length-related part of the force tolerance at grade 2, φ_F·k_F, N. */
    private static double baseForce(Spring s) {
        return phiF(s.wireDiameter() * 1e3, s.meanDiameter() * 1e3) * kF(s.index());
    }

    /**
     * ±A_L0 of the free length, m, for a spring with no specified force: A_L0 = φ_F·k_F·Q / R (R in N/mm; EN 15800,
     * from memory).
     */
    public static double freeLengthTolerance(Spring s, int grade) {
        double rateNPerMm = s.rate() * 1e-3;
        return baseForce(s) * gradeFactor(grade) / rateNPerMm * 1e-3;
    }

    /**
     * ±A_F of the spring force at a stated test length: A_F = (φ_F·k_F + 1.5·F/100)·Q, N (EN 15800, from memory). The
     * first term is the free-length scatter seen as force (A_L0·R at grade 2), the second the rate scatter.
     *
     * @param s          the spring
     * @param force      nominal force at the test length, N (&gt; 0)
     * @param deflection deflection from free length at the test length, m; must lie inside the travel to solid
     * @param grade      1, 2 or 3
     */
    public static double forceTolerance(Spring s, double force, double deflection, int grade) {
        Check.positive("test force", force, "N");
        Check.inRange("test deflection", deflection, 0, s.deflectionToSolid(), "m");
        return (baseForce(s) + FORCE_SHARE * force) * gradeFactor(grade);
    }

    /** The test point at stated length {@code length} (m): nominal force R·(L0 − L) and its tolerance. */
    public static TestPoint testPoint(Spring s, String name, double length, int grade) {
        double x = s.freeLength() - length;
        double f = s.forceAt(x);
        return new TestPoint(name, length, x, f, forceTolerance(s, f, x, grade), grade);
    }

    /**
     * ± rate, N/m, when the maker is held to the forces at lengths {@code l1} &gt; {@code l2} (m): worst case of the two
     * force tolerances over the test travel, (A_F1 + A_F2)/(L1 − L2) (our derivation from the force tolerances).
     */
    public static double rateTolerance(Spring s, double l1, double l2, int grade) {
        if (!(l1 > l2)) {
            throw new BadInputException(String.format(Locale.ROOT,
                    "test length L1 (%.3f mm) must exceed test length L2 (%.3f mm)", l1 * 1e3, l2 * 1e3));
        }
        TestPoint p1 = testPoint(s, "F1", l1, grade);
        TestPoint p2 = testPoint(s, "F2", l2, grade);
        return (p1.forceTolerance() + p2.forceTolerance()) / (l1 - l2);
    }

    /** e1, squareness of the outside line over L0, m: 0.026, 0.052, 0.087 × L0 for grades 1, 2, 3 (from memory). */
    public static double squareness(Spring s, int grade) {
        return SQUARENESS[checkGrade(grade) - 1] * s.freeLength();
    }

    /** e2, parallelism of the ground end faces, m: 0.015, 0.03, 0.05 × De for grades 1, 2, 3 (from memory). */
    public static double parallelism(Spring s, int grade) {
        return PARALLELISM[checkGrade(grade) - 1] * s.outerDiameter();
    }

    /**
     * Largest solid length to state on the drawing, m: the solid length of the end type with the wire at its largest
     * permitted diameter, Ls(d + A_d) (common practice; EN 13906-1 states Ls ≤ nt·d_max for ground ends, from memory).
     */
    public static double maxSolidLength(Spring s) {
        double dMax = s.wireDiameter() + WireTolerance.halfWidth(s.wireDiameter());
        return s.ends().solidLength(dMax, s.totalCoils());
    }

    private static void scopeNotes(Spring s, List<String> notes) {
        outside(notes, "wire diameter", s.wireDiameter() * 1e3, MIN_WIRE * 1e3, MAX_WIRE * 1e3, "mm");
        outside(notes, "mean coil diameter", s.meanDiameter() * 1e3, MIN_COIL * 1e3, MAX_COIL * 1e3, "mm");
        outside(notes, "free length", s.freeLength() * 1e3, 0, MAX_FREE_LENGTH * 1e3, "mm");
        if (s.activeCoils() < MIN_ACTIVE_COILS) {
            notes.add(String.format(Locale.ROOT, "active coils %.3g below the EN 15800 minimum of %.0f; tolerances by"
                    + " agreement", s.activeCoils(), MIN_ACTIVE_COILS));
        }
        outside(notes, "spring index", s.index(), MIN_INDEX, MAX_INDEX, "");
        if (!WireTolerance.covers(s.wireDiameter())) {
            notes.add("wire diameter outside the wire tolerance table; nearest band used");
        }
    }

    private static void outside(List<String> notes, String what, double v, double lo, double hi, String unit) {
        if (v < lo * (1 - 1e-12) || v > hi * (1 + 1e-12)) {
            String u = unit.isEmpty() ? "" : " " + unit;
            notes.add(String.format(Locale.ROOT, "%s %.4g%s lies outside the EN 15800 scope (%.4g to %.4g%s);"
                    + " nearest table entry used, tolerances by agreement", what, v, u, lo, hi, u));
        }
    }
}
