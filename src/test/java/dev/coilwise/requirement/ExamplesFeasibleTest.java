package dev.coilwise.requirement;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Demo data must be usable: each shipped example admits at least one feasible steel spring. A coarse brute-force
 * grid (wire 1-7 mm by 0.2 mm, index 5-11, 4-20 active coils, free length by 5 mm) is evaluated with
 * {@link DesignEvaluator} until a feasible design turns up. This checks our own invented scenarios, not the
 * engineering; the header of each example file holds its hand energy balance.
 */
class ExamplesFeasibleTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();
    private static final double MM = 1e-3;

    static List<Path> examples() throws Exception {
        return ExampleRequirementsTest.examples();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void someSteelSpringMeetsTheExample(Path file) {
        Requirement r = new RequirementReader(TABLE).read(file);
        assertThat(firstFeasible(r)).as("a feasible design for %s", file).isPresent();
    }

    static Optional<Spring> firstFeasible(Requirement r) {
        List<Material> materials = r.spring().materials().isEmpty() ? TABLE.steels()
                : r.spring().materials().stream().map(TABLE::get).toList();
        double longest = r.envelope().maxFreeLength().orElse(300 * MM);
        for (Material m : materials) {
            for (EndType ends : r.spring().ends()) {
                for (int di = 0; di <= 30; di++) {
                    double d = (1.0 + 0.2 * di) * MM;
                    if (!m.covers(d)) {
                        continue;
                    }
                    for (int c = 5; c <= 11; c++) {
                        for (int na = 4; na <= 20; na += 2) {
                            double solid = ends.solidLength(d, ends.totalCoils(na));
                            for (double l0 = solid + 5 * MM; l0 <= longest; l0 += 5 * MM) {
                                Spring s = new Spring(m, ends, d, c * d, na, l0);
                                if (feasible(s, r)) {
                                    return Optional.of(s);
                                }
                            }
                        }
                    }
                }
            }
        }
        return Optional.empty();
    }

    private static boolean feasible(Spring s, Requirement r) {
        try {
            return DesignEvaluator.evaluate(s, r).feasible();
        } catch (BadInputException e) { // e.g. a launch the spring cannot lift: not a candidate
            return false;
        }
    }
}
