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
 * The fuzz run of the requirement reader and schema: the checks of {@link RequirementParserPropertiesTest} on many more
 * mutants. Tagged {@code fuzz}, so left out of the normal build; run it with
 * {@code mvn test -Dtest.excludedGroups=benchmark -Dtest=RequirementParserFuzzTest} (docs/reliability.md). Prints how many
 * inputs it tried and what became of them.
 */
@Tag("fuzz")
class RequirementParserFuzzTest {
    /** Tries per property. */
    static final int TRIES = 25_000;
    private static final Map<RequirementParserPropertiesTest.Outcome, AtomicLong> READ = counts();
    private static final Map<RequirementParserPropertiesTest.Outcome, AtomicLong> AGREED = counts();

    private static Map<RequirementParserPropertiesTest.Outcome, AtomicLong> counts() {
        Map<RequirementParserPropertiesTest.Outcome, AtomicLong> m = new EnumMap<>(RequirementParserPropertiesTest.Outcome.class);
        for (RequirementParserPropertiesTest.Outcome o : RequirementParserPropertiesTest.Outcome.values()) {
            m.put(o, new AtomicLong());
        }
        return m;
    }

    @Provide
    Arbitrary<String> mutants() {
        return TextMutations.yaml(RequirementParserPropertiesTest.bases());
    }

    @Property(tries = TRIES, edgeCases = EdgeCasesMode.NONE)
    void theReaderOnlyEverReportsProblems(@ForAll("mutants") String yaml) {
        READ.get(RequirementParserPropertiesTest.readsOrReports(yaml)).incrementAndGet();
    }

    @Property(tries = TRIES, edgeCases = EdgeCasesMode.NONE)
    void theSchemaNeverRefusesWhatTheReaderAccepts(@ForAll("mutants") String yaml) {
        AGREED.get(RequirementParserPropertiesTest.schemaAgreesWithReader(yaml)).incrementAndGet();
    }

    @AfterContainer
    static void report() {
        System.out.println("requirement fuzz: reader " + READ + "; schema agreement " + AGREED);
    }
}
