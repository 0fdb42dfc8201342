package dev.coilwise.report;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Spring;
import dev.coilwise.tolerance.En15800;
import dev.coilwise.tolerance.TestPoint;
import java.util.ArrayList;
import java.util.List;

/**
 * Chooses the two test loads a spring maker checks, F1 at L1 and F2 at L2, with their EN 15800 tolerances.
 *
 * <ul>
 *   <li>L2 is the working maximum: the shortest length the job reaches (arrest: at the peak force, preload
 *       included; launch: cocked).</li>
 *   <li>L1 is the working start: the installed length when the spring is preloaded (arrest with a pocket).
 *       A spring working from its free length has zero force there, which cannot be tested, so L1 is then set at
 *       {@value #UNPRELOADED_F1_SHARE} of the way from free length to L2 (common practice: test away from free
 *       length and solid).</li>
 * </ul>
 * A test length at or below solid cannot be tested; such a point is left out.
 */
public final class TestLoads {
    /** Where F1 sits on the working travel when there is no preload: 30 % (common practice). */
    public static final double UNPRELOADED_F1_SHARE = 0.3;

    private TestLoads() {
    }

    /** F1 and F2 for the evaluated spring at {@code grade}, in that order (F2 left out when not testable). */
    public static List<TestPoint> of(Evaluation e, int grade) {
        Spring s = e.spring();
        double l0 = s.freeLength();
        List<TestPoint> out = new ArrayList<>(2);
        double l1 = l0 - l1Deflection(e);
        double l2 = l0 - e.totalDeflection();
        if (l1 > s.solidLength()) {
            out.add(En15800.testPoint(s, "F1", l1, grade));
        }
        if (l2 > s.solidLength() && l2 < l1) {
            out.add(En15800.testPoint(s, "F2", l2, grade));
        }
        return out;
    }

    /** Whether L1 is the installed length (true) or the 30 % point of an unpreloaded travel (false). */
    public static boolean l1IsInstalledLength(Evaluation e) {
        return e.preloadDeflection() > 0;
    }

    private static double l1Deflection(Evaluation e) {
        return l1IsInstalledLength(e) ? e.preloadDeflection() : UNPRELOADED_F1_SHARE * e.totalDeflection();
    }
}
