package dev.coilwise.search;

import static dev.coilwise.search.SearchFixtures.*;
import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.model.EndType;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Requirement;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The pruned search must return exactly what evaluating every candidate of the same grid returns: the same best
 * design for every family, in the same order. Grids are narrowed (few wires, short index and coil ranges) so the
 * brute force stays quick.
 */
class PrunedSearchCompletenessTest {

    static Stream<Arguments> cases() {
        var steels = List.of("music-wire", "chrome-silicon");
        var ends = List.of(EndType.CLOSED_GROUND, EndType.PLAIN);
        var opt = options(steels, ends, 5.5, 7, 4, 9);
        return Stream.of(
                Arguments.of("vertical drop, by mass",
                        requirement(drop(2, 0.06), limits(0.030, null, null), envelope(null, null, null, null), opt, RankBy.MASS)),
                Arguments.of("drop with force and deceleration limits, by peak force",
                        requirement(drop(2, 0.06), limits(0.030, 250.0, 14 * 9.80665), envelope(null, null, null, null), opt, RankBy.PEAK_FORCE)),
                Arguments.of("drop in a bore over a rod, by outer diameter",
                        requirement(drop(3, 0.08), limits(0.025, null, null), envelope(0.034, 0.012, 0.120, null), opt, RankBy.OUTER_DIAMETER)),
                Arguments.of("drop into a pocket (preload), by mass",
                        requirement(drop(3, 0.08), limits(0.025, null, null), envelope(null, null, null, 0.060), opt, RankBy.MASS)),
                Arguments.of("drop into a pocket, by peak force",
                        requirement(drop(3, 0.08), limits(0.025, null, null), envelope(null, null, 0.075, 0.060), opt, RankBy.PEAK_FORCE)),
                Arguments.of("vertical launch, by solid length",
                        requirement(launch(0.2, 1.0, 90, 0.05), limits(0.040, null, null), envelope(null, null, null, null), opt, RankBy.SOLID_LENGTH)),
                Arguments.of("inclined launch with losses, by free length",
                        requirement(launch(0.3, 0.6, 50, 0.10), limits(0.040, 400.0, null), envelope(0.030, null, null, null), opt, RankBy.FREE_LENGTH)),
                Arguments.of("inclined launch, by cost",
                        requirement(launch(0.3, 0.6, 50, 0.10), limits(0.040, null, null), envelope(null, null, 0.110, null), opt, RankBy.COST)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void prunedSearchFindsExactlyTheBruteForceBestOfEveryFamily(String name, Requirement req) {
        DesignSpace space = narrowed(req, 2.2e-3, 2.85e-3, 0.4e-3);
        SearchResult brute = new BruteForceSearch().run(space);
        SearchResult pruned = new PrunedSearch().run(space);

        assertThat(brute.best()).as("the case must have feasible designs to compare").isNotEmpty();
        assertThat(pruned.best()).hasSameSizeAs(brute.best());
        for (int i = 0; i < brute.best().size(); i++) {
            Candidate b = brute.best().get(i);
            Candidate p = pruned.best().get(i);
            assertThat(p.family()).as("family at rank %d", i + 1).isEqualTo(b.family());
            assertThat(p.evaluation().spring()).as("design at rank %d", i + 1).isEqualTo(b.evaluation().spring());
            assertThat(p.evaluation()).as("figures at rank %d", i + 1).isEqualTo(b.evaluation());
        }
        assertThat(pruned.evaluated()).isLessThan(brute.evaluated());
        System.out.printf("%s: brute %d evaluations, pruned %d (%.0fx fewer)%n", name, brute.evaluated(),
                pruned.evaluated(), (double) brute.evaluated() / pruned.evaluated());
    }
}
