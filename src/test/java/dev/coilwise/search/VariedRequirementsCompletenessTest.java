package dev.coilwise.search;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.model.Requirement;
import java.util.List;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Over generated requirements of every kind (both jobs and unit systems, pockets, guides, limits, cycle counts, every
 * ranking; see {@link RequirementGenerator}), the pruned search returns exactly the brute-force top ten on a reduced
 * space cut around the full-grid winner ({@link ReducedSpace#TEST}): same families, same designs, same figures.
 */
class VariedRequirementsCompletenessTest {
    private static final long SEED = 4_2025L;
    private static final int COUNT = 12;
    private static final List<Requirement> CASES = RequirementGenerator.generate(SEED, COUNT);

    static Stream<Arguments> cases() {
        return IntStream.range(0, COUNT).mapToObj(i -> Arguments.of(CASES.get(i).title(), CASES.get(i)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void prunedTopTenIsTheBruteForceTopTen(String name, Requirement req) {
        SearchResult fullGrid = new PrunedSearch().run(DesignSpace.of(req, SearchFixtures.TABLE));
        Candidate anchor = fullGrid.best().isEmpty() ? null : fullGrid.best().get(0);
        DesignSpace space = ReducedSpace.TEST.of(req, SearchFixtures.TABLE, anchor);
        SearchResult brute = new BruteForceSearch().run(space);
        SearchResult pruned = new PrunedSearch().run(space);

        assertThat(pruned.top(10)).as("top ten").isEqualTo(brute.top(10));
        assertThat(pruned.best()).as("best of every family").isEqualTo(brute.best());
        assertThat(pruned.evaluated()).isLessThanOrEqualTo(brute.evaluated());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void bestAloneIsTheFirstOfTheFullSearch(String name, Requirement req) {
        DesignSpace space = DesignSpace.of(req, SearchFixtures.TABLE);
        SearchResult all = new PrunedSearch().run(space);
        assertThat(new PrunedSearch().best(space)).isEqualTo(all.best().stream().findFirst());
    }

    @Test
    void mostGeneratedCasesHaveFeasibleDesignsSoTheComparisonsBite() {
        long feasible = CASES.stream()
                .filter(r -> !new PrunedSearch().run(DesignSpace.of(r, SearchFixtures.TABLE)).best().isEmpty()).count();
        assertThat(feasible).isGreaterThanOrEqualTo(COUNT * 2 / 3);
    }
}
