package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.testing.Generators;
import java.util.Comparator;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/** The design evaluation on random valid springs and requirements: no NaN, no negative length, consistent flags. */
class DesignEvaluatorPropertiesTest {

    @Provide
    Arbitrary<Spring> springs() {
        return Generators.springs();
    }

    @Provide
    Arbitrary<Requirement> requirements() {
        return Generators.requirements();
    }

    @Property(tries = 1500)
    void everyFigureIsAFiniteNonNegativeNumberOrADocumentedNaN(@ForAll("springs") Spring s,
                                                               @ForAll("requirements") Requirement req) {
        Evaluation e = DesignEvaluator.evaluate(s, req);
        double[] figures = {e.rate(), e.preloadForce(), e.preloadDeflection(), e.workingDeflection(),
            e.totalDeflection(), e.peakForce(), e.speed(), e.stressAtWorking(), e.stressAtSolid(), e.tensileStrength(),
            e.allowableStress(), e.outerDiameterAtSolid(), e.naturalFrequency(), e.surgeSpeedLimit(), e.mass(),
            e.cost()};
        for (double v : figures) {
            assertThat(v).isFinite().isGreaterThanOrEqualTo(0);
        }
        assertThat(e.criticalDeflection()).isPositive().isNotNaN();
        assertThat(e.totalDeflection()).isCloseTo(e.preloadDeflection() + e.workingDeflection(), within(1e-12));
        if (req.job() instanceof Launch l) {
            assertThat(e.peakDeceleration()).isNaN();
            assertThat(e.predictedHeight()).isCloseTo(l.height(), within(1e-9 * l.height()));
            assertThat(e.preloadDeflection()).isZero();
        } else {
            assertThat(e.peakDeceleration()).isFinite().isGreaterThanOrEqualTo(0);
            assertThat(e.predictedHeight()).isNaN();
        }
        for (Margin m : e.margins()) {
            assertThat(m.value()).as(m.key()).isNotNaN();
            assertThat(m.actual()).as(m.key()).isNotNaN();
        }
        assertThat(e.feasible()).isEqualTo(e.violations().isEmpty());
        assertThat(e.feasible()).isEqualTo(e.margins().stream().filter(Margin::hard).allMatch(Margin::holds));
        Margin worst = e.margins().stream().filter(Margin::hard).min(Comparator.comparingDouble(Margin::value))
                .orElseThrow();
        assertThat(e.binding()).get().extracting(Margin::value).isEqualTo(worst.value());
        assertThat(e.margin("stroke")).isPresent();
        assertThat(e.margin("coil_bind")).isPresent();
    }
}
