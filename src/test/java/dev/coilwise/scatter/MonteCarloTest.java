package dev.coilwise.scatter;

import static dev.coilwise.scatter.ScatterFixtures.SPRING;
import static dev.coilwise.scatter.ScatterFixtures.TYPICAL;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.junit.jupiter.api.Test;

/** The Monte Carlo against closed forms (nominal collapse, linearised propagation) and its own contracts. */
class MonteCarloTest {
    private static final ScatterSettings SETTINGS = ScatterSettings.defaults();

    private static ScatterSamples run(Requirement req, HalfWidths h, ScatterSettings s) {
        return MonteCarlo.sample(SPRING, req, h, s, ScatterProgress.NONE);
    }

    @Test
    void withZeroToleranceAnArrestCollapsesToTheNominalFiguresExactly() {
        Requirement req = ScatterFixtures.arrest(OptionalDouble.empty());
        Evaluation e = DesignEvaluator.evaluate(SPRING, req);
        assertThat(e.feasible()).isTrue();
        ScatterSamples s = run(req, HalfWidths.NONE, SETTINGS.withSamples(500));
        assertThat(s.values(Figure.MAX_COMPRESSION)).containsOnly(e.workingDeflection()).hasSize(500);
        assertThat(s.values(Figure.PEAK_FORCE)).containsOnly(e.peakForce());
        assertThat(s.values(Figure.PEAK_DECELERATION)).containsOnly(e.peakDeceleration());
        assertThat(s.values(Figure.STRESS_AT_PEAK)).containsOnly(e.stressAtWorking());
        assertThat(s.values(Figure.RATE)).containsOnly(e.rate());
        assertThat(s.probabilityOk()).isEqualTo(1.0);
        ScatterSummary sum = s.summary();
        assertThat(sum.p01()).isEqualTo(sum.p99());
        assertThat(sum.p99().get("peak_force_N")).isEqualTo(e.peakForce());
    }

    @Test
    void withZeroToleranceALaunchCollapsesToTheNominalFiguresExactly() {
        Requirement req = ScatterFixtures.launch(false);
        Evaluation e = DesignEvaluator.evaluate(SPRING, req);
        assertThat(e.feasible()).isTrue();
        ScatterSamples s = run(req, HalfWidths.NONE, SETTINGS.withSamples(500));
        assertThat(s.values(Figure.COCKED_COMPRESSION)).containsOnly(e.workingDeflection());
        assertThat(s.values(Figure.PREDICTED_HEIGHT)).containsOnly(e.predictedHeight());
        assertThat(s.values(Figure.COCKING_FORCE)).containsOnly(e.peakForce());
        assertThat(s.values(Figure.STRESS_AT_COCKED)).containsOnly(e.stressAtWorking());
        assertThat(s.probabilityOk()).isEqualTo(1.0);
    }

    @Test
    void rateSpreadMatchesFirstOrderPropagationOfTheTolerances() {
        // k = G d⁴/(8 D³ Na): δk/k ≈ δG/G + 4 δd/d − 3 δD/D − δNa/Na (first order). Each deviation is normal with
        // σ = h/3 truncated at ±3σ, whose variance is σ²·(1 − 6φ(3)/(2Φ(3) − 1)) (truncated normal, closed form).
        NormalDistribution n = new NormalDistribution();
        double shrink = 1 - 2 * 3 * n.density(3) / (2 * n.cumulativeProbability(3) - 1);
        double sd = SPRING.wireDiameter();
        double sD = SPRING.meanDiameter();
        double na = SPRING.activeCoils();
        double[] rel = {TYPICAL.wireDiameter() / 3 / sd, TYPICAL.meanDiameter() / 3 / sD, TYPICAL.activeCoils() / 3 / na,
                TYPICAL.shearModulus() / 3};
        double[] first = {4, -3, -1, 1};
        double[] secondHalf = {6, 6, 1, 0}; // ½·f''/f of d⁴, D⁻³, Na⁻¹, G
        double var = 0;
        double bias = 0;
        for (int i = 0; i < rel.length; i++) {
            var += Math.pow(first[i] * rel[i], 2) * shrink;
            bias += secondHalf[i] * rel[i] * rel[i] * shrink;
        }
        double k = SPRING.rate();
        DescriptiveStatistics st = run(ScatterFixtures.arrest(OptionalDouble.empty()), TYPICAL, SETTINGS).statistics(Figure.RATE);
        double expectedSd = k * Math.sqrt(var);
        double standardError = expectedSd / Math.sqrt(st.getN());
        assertThat(st.getMean()).isCloseTo(k * (1 + bias), within(4 * standardError));
        // The standard error of a sample standard deviation is about σ/√(2N): 0.7 % at 10 000 samples.
        assertThat(st.getStandardDeviation()).isCloseTo(expectedSd, within(0.03 * expectedSd));
    }

    @Test
    void theSameSeedGivesTheSameResult() {
        Requirement req = ScatterFixtures.arrest(OptionalDouble.empty());
        ScatterSummary a = run(req, TYPICAL, SETTINGS.withSamples(2000)).summary();
        ScatterSummary b = run(req, TYPICAL, SETTINGS.withSamples(2000)).summary();
        assertThat(a).isEqualTo(b);
    }

    @Test
    void differentSeedsGiveDifferentSamples() {
        Requirement req = ScatterFixtures.arrest(OptionalDouble.empty());
        ScatterSummary a = run(req, TYPICAL, SETTINGS.withSamples(2000).withSeed(1)).summary();
        ScatterSummary b = run(req, TYPICAL, SETTINGS.withSamples(2000).withSeed(2)).summary();
        assertThat(a.seed()).isEqualTo(1);
        assertThat(b.seed()).isEqualTo(2);
        assertThat(a.p01()).isNotEqualTo(b.p01());
        assertThat(a.p99()).isNotEqualTo(b.p99());
    }

    @Test
    void aLimitAtTheNominalPeakForceFailsAboutHalfTheMadeSpringsAndExactlyThoseAbove() {
        double nominalPeak = DesignEvaluator.evaluate(SPRING, ScatterFixtures.arrest(OptionalDouble.empty())).peakForce();
        Requirement req = ScatterFixtures.arrest(OptionalDouble.of(nominalPeak));
        ScatterSamples s = run(req, TYPICAL, SETTINGS);
        double[] peaks = s.values(Figure.PEAK_FORCE);
        long within = Arrays.stream(peaks).filter(f -> (nominalPeak - f) / nominalPeak >= -1e-9).count();
        assertThat(s.probabilityOk()).isEqualTo((double) within / peaks.length);
        assertThat(s.probabilityOk()).isBetween(0.4, 0.6);
    }

    @Test
    void aLaunchMeetsItsRequirementWhenTheApexLandsInTheBand() {
        Requirement req = ScatterFixtures.launch(false);
        ScatterSettings narrow = new ScatterSettings(4000, 7, 0.01, 0.01);
        ScatterSamples s = run(req, TYPICAL, narrow);
        double target = ScatterFixtures.LAUNCH.height();
        long inBand = Arrays.stream(s.values(Figure.PREDICTED_HEIGHT))
                .filter(h -> h >= target * 0.99 && h <= target * 1.01).count();
        assertThat(s.probabilityOk()).isEqualTo((double) inBand / 4000);
        assertThat(s.probabilityOk()).isBetween(0.01, 0.99);
        ScatterSamples open = run(req, TYPICAL, new ScatterSettings(4000, 7, 1, Double.POSITIVE_INFINITY));
        assertThat(open.probabilityOk()).isEqualTo(1.0);
    }

    @Test
    void madeSpringsThatExceedTheSolidStressAreCountedAsFailing() {
        // This demo spring has 5.5 % to spare on the stress at solid; ±1 mm on a 60 mm free length is ±3 % of the
        // deflection to solid, so some made springs exceed the allowable once it is a hard limit.
        ScatterSettings open = new ScatterSettings(4000, 7, 1, Double.POSITIVE_INFINITY);
        double soft = run(ScatterFixtures.launch(false), TYPICAL, open).probabilityOk();
        double hard = run(ScatterFixtures.launch(true), TYPICAL, open).probabilityOk();
        assertThat(soft).isEqualTo(1.0);
        assertThat(hard).isLessThan(1.0).isGreaterThan(0.9);
    }

    @Test
    void summaryKeysNameTheFiguresAndTheirUnitsInAFixedOrder() {
        ScatterSummary arrest = run(ScatterFixtures.arrest(OptionalDouble.empty()), TYPICAL, SETTINGS.withSamples(500)).summary();
        assertThat(arrest.p01().keySet()).containsExactly("max_compression_mm", "peak_force_N", "peak_deceleration_gn",
                "stress_at_peak_MPa", "rate_N_per_mm", "solid_length_mm");
        ScatterSummary launch = run(ScatterFixtures.launch(false), TYPICAL, SETTINGS.withSamples(500)).summary();
        assertThat(launch.p99().keySet()).containsExactly("cocked_compression_mm", "predicted_height_mm",
                "cocking_force_N", "stress_at_cocked_MPa", "rate_N_per_mm", "solid_length_mm");
        arrest.p01().forEach((key, low) -> assertThat(low).as(key).isLessThan(arrest.p99().get(key)));
    }

    @Test
    void progressCountsOverTheWholeShortlistAndEndsAtTheTotal() {
        List<long[]> calls = new ArrayList<>();
        List<ScatterSummary> out = MonteCarlo.summarise(List.of(SPRING, SPRING.withActiveCoils(9), SPRING.withActiveCoils(11)),
                ScatterFixtures.arrest(OptionalDouble.empty()), ToleranceSource.fixed(TYPICAL),
                SETTINGS.withSamples(1200), (done, total) -> calls.add(new long[] {done, total}));
        assertThat(out).hasSize(3);
        assertThat(calls.get(calls.size() - 1)).containsExactly(3600, 3600);
        for (int i = 1; i < calls.size(); i++) {
            assertThat(calls.get(i)[0]).isGreaterThan(calls.get(i - 1)[0]);
        }
    }
}
