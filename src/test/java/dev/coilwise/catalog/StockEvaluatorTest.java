package dev.coilwise.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.OptionalDouble;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Stock parts have a fixed geometry: what follows from it, and the supplier's own ratings. */
class StockEvaluatorTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    private static StockPart part(String material, EndType ends, OptionalDouble maxDefl, OptionalDouble maxLoad) {
        // d = 2 mm, D = 20 mm, 8 active coils, L0 = 60 mm
        Spring s = new Spring(TABLE.get(material), ends, 2e-3, 20e-3, 8, 0.060);
        return new StockPart("P", "Demo", s, 1.0, "EUR", 1, OptionalDouble.empty(), OptionalDouble.empty(), maxDefl,
                maxLoad, Set.of(), "t.csv:2");
    }

    /**
     * Arrest with a pocket: the preload follows from the fixed free length. Music wire, R = 2531.25 N/m (Shigley's
     * MED 9th ed., Eq. 10-9 with G = 81.0 GPa); pocket 55 mm → preload deflection 5 mm, F0 = 12.656 N. The energy
     * balance ½mv² + Fc·x = F0·x + ½k·x² must close at the reported compression (conservation of energy).
     */
    @Test
    void anArrestWithAPocketTakesItsPreloadFromTheFreeLength() {
        Requirement req = Requirements.arrest(0.5, 1.0, 0.030, OptionalDouble.of(0.055));
        Evaluation e = StockEvaluator.evaluate(part("music-wire", EndType.CLOSED_GROUND, OptionalDouble.empty(),
                OptionalDouble.empty()), req).evaluation();
        assertThat(e.rate()).isCloseTo(2531.25, within(1e-6));
        assertThat(e.preloadDeflection()).isCloseTo(0.005, within(1e-12));
        assertThat(e.preloadForce()).isCloseTo(12.656, within(0.001));
        Arrest a = (Arrest) req.job();
        double x = e.workingDeflection();
        double in = a.kineticEnergy() + a.pushForce() * x;
        double stored = e.preloadForce() * x + 0.5 * e.rate() * x * x;
        assertThat(stored).isCloseTo(in, within(1e-9 * in));
    }

    /** A launch from a stock part: the cocked compression follows from the balance, so the apex is the one asked for. */
    @Test
    void aLaunchTakesItsCockedCompressionFromTheBalance() {
        Requirement req = Requirements.launch(0.010, 0.5, 0.040);
        Evaluation e = StockEvaluator.evaluate(part("music-wire", EndType.CLOSED_GROUND, OptionalDouble.empty(),
                OptionalDouble.empty()), req).evaluation();
        assertThat(e.predictedHeight()).isCloseTo(0.5, within(1e-9));
        assertThat(e.peakForce()).isCloseTo(e.rate() * e.workingDeflection(), within(1e-9));
    }

    @Test
    void theSuppliersMaximumDeflectionIsAHardLimit() {
        Requirement req = Requirements.arrest(0.5, 1.0, 0.030, OptionalDouble.empty());
        StockEvaluation free = StockEvaluator.evaluate(part("music-wire", EndType.CLOSED_GROUND,
                OptionalDouble.empty(), OptionalDouble.empty()), req);
        assertThat(free.feasible()).isTrue();
        double x = free.evaluation().totalDeflection();
        StockEvaluation rated = StockEvaluator.evaluate(part("music-wire", EndType.CLOSED_GROUND,
                OptionalDouble.of(0.5 * x), OptionalDouble.of(1e6)), req);
        assertThat(rated.evaluation().feasible()).isTrue();
        assertThat(rated.feasible()).isFalse();
        assertThat(rated.stockMargins()).extracting(m -> m.key()).containsExactly("stock_max_deflection", "stock_max_load");
        assertThat(rated.stockMargins().get(0).value()).isCloseTo(-1.0, within(1e-9));
        assertThat(rated.allMargins()).hasSize(free.evaluation().margins().size() + 2);
    }

    @Test
    void partsOutsideTheRequirementsMaterialsOrEndsAreMarked() {
        Requirement req = Requirements.arrest(0.5, 1.0, 0.030, OptionalDouble.empty());
        // default design space: all steels, closed-ground and closed ends
        assertThat(StockEvaluator.evaluate(part("music-wire", EndType.CLOSED, OptionalDouble.empty(),
                OptionalDouble.empty()), req).inDesignSpace()).isTrue();
        assertThat(StockEvaluator.evaluate(part("music-wire", EndType.PLAIN, OptionalDouble.empty(),
                OptionalDouble.empty()), req).inDesignSpace()).isFalse();
        assertThat(StockEvaluator.evaluate(part("phosphor-bronze", EndType.CLOSED, OptionalDouble.empty(),
                OptionalDouble.empty()), req).inDesignSpace()).isFalse();
    }
}
