package dev.coilwise.scatter;

import static dev.coilwise.scatter.ScatterFixtures.SPRING;
import static dev.coilwise.scatter.ScatterFixtures.TYPICAL;
import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.ForkJoinPool;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;
import net.jqwik.api.statistics.StatisticsReport;
import org.junit.jupiter.api.Test;

/**
 * The Monte Carlo's record-free per-sample path ({@link SampleEvaluator}) against the reference path that builds each
 * made spring and evaluates it in full ({@link SpringMaker}, {@link Installation}, {@code DesignEvaluator}): the same
 * verdict and every figure bit for bit, sample by sample over generated cases ({@link MadeSpringCases}), and whole
 * runs equal to the reference run, whatever the threads.
 */
class SampleEvaluatorTest {
    private static final String[] OUTCOMES = {"meets", "fails", "invalid"};

    @Property(tries = 5000)
    @StatisticsReport(StatisticsReport.StatisticsReportMode.OFF)
    void aMadeSpringGetsTheVerdictAndFiguresOfTheFullEvaluation(@ForAll("cases") MadeSpringCases.Case c) {
        Installation installation = Installation.of(c.nominal(), c.requirement(), c.settings());
        double[] expected = new double[installation.figures().size()];
        int reference = MonteCarlo.byRecords(installation, new SpringMaker(c.nominal(), c.halfWidths()), c.z(), expected);

        SampleEvaluator lean = SampleEvaluator.of(c.nominal(), c.halfWidths(), c.requirement(), c.settings());
        double[] actual = new double[lean.figures().size()];
        int outcome = lean.outcome(c.z(), actual);

        Statistics.label("outcome").collect(OUTCOMES[reference]);
        Statistics.label("job").collect(c.requirement().job().key());
        Statistics.label("outcome").coverage(cov -> {
            cov.check("meets").percentage(p -> p > 5);
            cov.check("fails").percentage(p -> p > 5);
            cov.check("invalid").percentage(p -> p > 1);
        });
        assertThat(lean.figures()).isEqualTo(installation.figures());
        assertThat(OUTCOMES[outcome]).as("verdict on %s", c).isEqualTo(OUTCOMES[reference]);
        // Arrays.equals on doubles compares bit patterns (NaN equal to NaN, 0.0 unequal to −0.0).
        assertThat(actual).as("figures of %s", c).isEqualTo(expected);
    }

    @Provide
    Arbitrary<MadeSpringCases.Case> cases() {
        return Arbitraries.randomValue(MadeSpringCases::random);
    }

    @Property(tries = 60)
    void aWholeRunEqualsTheReferenceRun(@ForAll("cases") MadeSpringCases.Case c) {
        ScatterSettings settings = c.settings().withSamples(400);
        ScatterSamples lean = MonteCarlo.sample(c.nominal(), c.requirement(), c.halfWidths(), settings,
                ScatterProgress.NONE);
        ScatterSamples reference = MonteCarlo.sampleByRecords(c.nominal(), c.requirement(), c.halfWidths(), settings);
        assertSame(lean, reference);
    }

    @Test
    void madeSpringsThatCannotExistAreInvalidOnBothPathsWithNaNFigures() {
        // The demo spring (d 2 mm, D 16 mm, 10 coils, L0 60 mm) with deviations far beyond any tolerance, one check of
        // the Spring record each: wire outside the pinned wire's range (d/2 .. 2d), index D/d at 0.9 (at or below 1,
        // yet above the 0.75 where the curvature factor itself refuses), no active coils, free length below solid.
        HalfWidths[] widths = {new HalfWidths(1.9e-3, 0, 0, 0, 0), new HalfWidths(0, 14.2e-3, 0, 0, 0),
            new HalfWidths(0, 0, 0, 12, 0), new HalfWidths(0, 0, 59e-3, 0, 0)};
        double[][] deviations = {{-3, 0, 0, 0, 0}, {0, -3, 0, 0, 0}, {0, 0, 0, -3, 0}, {0, 0, -3, 0, 0}};
        for (Requirement req : List.of(ScatterFixtures.arrest(OptionalDouble.empty()), ScatterFixtures.launch(true))) {
            for (int i = 0; i < widths.length; i++) {
                Installation installation = Installation.of(SPRING, req, ScatterSettings.defaults());
                double[] expected = new double[6];
                double[] actual = new double[6];
                assertThat(MonteCarlo.byRecords(installation, new SpringMaker(SPRING, widths[i]), deviations[i],
                        expected)).as("reference, case %d", i).isEqualTo(SampleEvaluator.INVALID);
                assertThat(SampleEvaluator.of(SPRING, widths[i], req, ScatterSettings.defaults())
                        .outcome(deviations[i], actual)).as("case %d", i).isEqualTo(SampleEvaluator.INVALID);
                assertThat(actual).containsOnly(Double.NaN).isEqualTo(expected);
            }
        }
    }

    @Test
    void aShortlistRunAcrossSeveralBlocksEqualsTheReferenceRunOfEachDesign() {
        // 20 000 samples: two blocks of shared deviations, 40 tasks per design, on the common pool's threads.
        List<Spring> designs = List.of(SPRING, SPRING.withActiveCoils(9), SPRING.withActiveCoils(11.5));
        double nominalPeak = DesignEvaluator.evaluate(SPRING, ScatterFixtures.arrest(OptionalDouble.empty())).peakForce();
        Requirement req = ScatterFixtures.arrest(OptionalDouble.of(nominalPeak)); // about half the made springs fail
        ScatterSettings settings = ScatterSettings.defaults().withSamples(20_000).withSeed(11);
        List<ScatterSamples> lean = MonteCarlo.sample(designs, List.of(TYPICAL, TYPICAL, TYPICAL), req, settings,
                ScatterProgress.NONE);
        for (int i = 0; i < designs.size(); i++) {
            assertSame(lean.get(i), MonteCarlo.sampleByRecords(designs.get(i), req, TYPICAL, settings));
        }
        assertThat(lean.get(0).probabilityOk()).isBetween(0.2, 0.8);
    }

    @Test
    void theResultDoesNotDependOnTheThreads() throws Exception {
        List<Spring> designs = new ArrayList<>();
        for (int i = 0; i < 10; i++) {
            designs.add(SPRING.withActiveCoils(8 + 0.5 * i));
        }
        Requirement req = ScatterFixtures.launch(true);
        ToleranceSource tol = ToleranceSource.fixed(TYPICAL);
        ScatterSettings settings = ScatterSettings.defaults().withSamples(3000);
        List<ScatterSummary> common = MonteCarlo.summarise(designs, req, tol, settings, ScatterProgress.NONE);
        ForkJoinPool one = new ForkJoinPool(1);
        ForkJoinPool four = new ForkJoinPool(4);
        try {
            assertThat(one.submit(() -> MonteCarlo.summarise(designs, req, tol, settings, ScatterProgress.NONE)).get())
                    .isEqualTo(common);
            assertThat(four.submit(() -> MonteCarlo.summarise(designs, req, tol, settings, ScatterProgress.NONE)).get())
                    .isEqualTo(common);
        } finally {
            one.shutdown();
            four.shutdown();
        }
        for (int i = 0; i < designs.size(); i++) {
            assertThat(common.get(i)).isEqualTo(
                    MonteCarlo.sampleByRecords(designs.get(i), req, TYPICAL, settings).summary());
        }
    }

    private static void assertSame(ScatterSamples lean, ScatterSamples reference) {
        assertThat(lean.probabilityOk()).isEqualTo(reference.probabilityOk());
        assertThat(lean.invalid()).isEqualTo(reference.invalid());
        assertThat(lean.figures()).isEqualTo(reference.figures());
        for (Figure f : reference.figures()) {
            assertThat(lean.values(f)).as(f.key()).isEqualTo(reference.values(f));
        }
        assertThat(lean.summary()).isEqualTo(reference.summary());
    }
}
