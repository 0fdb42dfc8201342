package dev.coilwise.requirement;

import dev.coilwise.testing.TextMutations;
import java.util.EnumMap;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tag;
import net.jqwik.api.lifecycle.AfterContainer;

/**
 * The fuzz run of the requirement reader and schema: the checks of {@link RequirementParserProperties} on many more
 * mutants. Tagged {@code fuzz}, so left out of the normal build; run it with
 * {@code mvn test -Dtest.excludedGroups=benchmark -Dtest=RequirementParserFuzz} (docs/reliability.md). Prints how many
 * inputs it tried and what became of them.
 */
@Tag("fuzz")
class RequirementParserFuzz {
    /** Tries per property. */
    static final int TRIES = 25_000;
    private static final Map<RequirementParserProperties.Outcome, AtomicLong> READ = counts();
    private static final Map<RequirementParserProperties.Outcome, AtomicLong> AGREED = counts();

    private static Map<RequirementParserProperties.Outcome, AtomicLong> counts() {
        Map<RequirementParserProperties.Outcome, AtomicLong> m = new EnumMap<>(RequirementParserProperties.Outcome.class);
        for (RequirementParserProperties.Outcome o : RequirementParserProperties.Outcome.values()) {
            m.put(o, new AtomicLong());
        }
        return m;
    }

    @Provide
    Arbitrary<String> mutants() {
        return TextMutations.yaml(RequirementParserProperties.bases());
    }

    @Property(tries = TRIES, edgeCases = EdgeCasesMode.NONE)
    void theReaderOnlyEverReportsProblems(@ForAll("mutants") String yaml) {
        READ.get(RequirementParserProperties.readsOrReports(yaml)).incrementAndGet();
    }

    @Property(tries = TRIES, edgeCases = EdgeCasesMode.NONE)
    void theSchemaNeverRefusesWhatTheReaderAccepts(@ForAll("mutants") String yaml) {
        AGREED.get(RequirementParserProperties.schemaAgreesWithReader(yaml)).incrementAndGet();
    }

    @AfterContainer
    static void report() {
        System.out.println("requirement fuzz: reader " + READ + "; schema agreement " + AGREED);
    }
}
