package dev.coilwise.cli;

import java.io.IOException;
import java.util.Map;
import java.util.TreeMap;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tag;
import net.jqwik.api.lifecycle.AfterContainer;

/**
 * The fuzz run of the command line: {@link CliMutationPropertiesTest}'s check on many more mutants. Tagged {@code fuzz};
 * run it with {@code mvn test -Dtest.excludedGroups=benchmark -Dtest=CliMutationFuzzTest} (docs/reliability.md). Prints
 * how many inputs it tried and their exit codes.
 */
@Tag("fuzz")
class CliMutationFuzzTest {
    private static final Map<Integer, Integer> CODES = new TreeMap<>();

    @Provide
    Arbitrary<String> mutants() {
        return dev.coilwise.testing.TextMutations.yaml(CliMutationPropertiesTest.bases());
    }

    @Property(tries = 1500, edgeCases = EdgeCasesMode.NONE)
    void sizeExitsZeroTwoOrThreeWithAMessage(@ForAll("mutants") String yaml) throws IOException {
        CODES.merge(CliMutationPropertiesTest.check(yaml), 1, Integer::sum);
    }

    private static final Map<Integer, Integer> CHECK = new TreeMap<>();
    private static final Map<Integer, Integer> REPORT = new TreeMap<>();

    @Provide
    Arbitrary<String> springMutants() {
        return new CliMutationPropertiesTest().springMutants();
    }

    @Provide
    Arbitrary<String> shortlistMutants() {
        return new CliMutationPropertiesTest().shortlistMutants();
    }

    @Property(tries = 1000, edgeCases = EdgeCasesMode.NONE)
    void checkAndSimulateExitZeroTwoOrThreeWithAMessage(@ForAll("springMutants") String spring) throws IOException {
        CHECK.merge(CliMutationPropertiesTest.checkSpring(spring), 1, Integer::sum);
    }

    @Property(tries = 2000, edgeCases = EdgeCasesMode.NONE)
    void reportExitsZeroTwoOrThreeWithAMessage(@ForAll("shortlistMutants") String json) throws IOException {
        REPORT.merge(CliMutationPropertiesTest.checkReport(json), 1, Integer::sum);
    }

    @AfterContainer
    static void report() {
        System.out.println("command-line fuzz: size exit codes " + CODES + "; check (and simulate) " + CHECK
                + "; report " + REPORT);
    }
}
