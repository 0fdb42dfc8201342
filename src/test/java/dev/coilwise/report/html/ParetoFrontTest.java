package dev.coilwise.report.html;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Size;
import org.junit.jupiter.api.Test;

/**
 * The front is checked against the definition of Pareto optimality itself (a point is kept when no other point is at
 * least as small in both coordinates and smaller in one), evaluated by brute force over every pair.
 */
class ParetoFrontTest {
    record P(double x, double y) {
    }

    private static boolean dominated(P p, List<P> all) {
        return all.stream().anyMatch(q -> q.x() <= p.x() && q.y() <= p.y() && (q.x() < p.x() || q.y() < p.y()));
    }

    @Test
    void aSmallHandMadeSet() {
        List<P> pts = List.of(new P(1, 9), new P(2, 5), new P(3, 6), new P(4, 2), new P(5, 2), new P(6, 1));
        assertThat(ParetoFront.of(pts, P::x, P::y)).containsExactly(new P(1, 9), new P(2, 5), new P(4, 2),
                new P(6, 1));
    }

    @Property(tries = 300)
    void theFrontIsExactlyTheNonDominatedPointsByIncreasingX(
            @ForAll @Size(max = 40) List<@DoubleRange(min = 0, max = 20) Double> xs,
            @ForAll @Size(max = 40) List<@DoubleRange(min = 0, max = 20) Double> ys) {
        List<P> pts = new ArrayList<>();
        for (int i = 0; i < Math.min(xs.size(), ys.size()); i++) {
            // rounded, so that ties in x, in y and whole duplicates occur often
            pts.add(new P(Math.rint(xs.get(i)), Math.rint(ys.get(i))));
        }
        List<P> front = ParetoFront.of(pts, P::x, P::y);
        List<P> expected = pts.stream().filter(p -> !dominated(p, pts)).distinct()
                .sorted(java.util.Comparator.comparingDouble(P::x)).toList();
        assertThat(front).containsExactlyElementsOf(expected);
    }
}
