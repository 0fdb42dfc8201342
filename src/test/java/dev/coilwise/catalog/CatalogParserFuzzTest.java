package dev.coilwise.catalog;

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
 * The fuzz run of the catalogue reader: the checks of {@link CatalogParserPropertiesTest} on many more mutants. Tagged
 * {@code fuzz}; run it with {@code mvn test -Dtest.excludedGroups=benchmark -Dtest=CatalogParserFuzzTest}
 * (docs/reliability.md). Prints how many inputs it tried and what became of them.
 */
@Tag("fuzz")
class CatalogParserFuzzTest {
    static final int TRIES = 20_000;
    private static final Map<CatalogParserPropertiesTest.Outcome, AtomicLong> NATIVE = counts();
    private static final Map<CatalogParserPropertiesTest.Outcome, AtomicLong> EXPORT = counts();

    private static Map<CatalogParserPropertiesTest.Outcome, AtomicLong> counts() {
        Map<CatalogParserPropertiesTest.Outcome, AtomicLong> m = new EnumMap<>(CatalogParserPropertiesTest.Outcome.class);
        for (CatalogParserPropertiesTest.Outcome o : CatalogParserPropertiesTest.Outcome.values()) {
            m.put(o, new AtomicLong());
        }
        return m;
    }

    @Provide
    Arbitrary<String> nativeMutants() {
        return TextMutations.csv(CatalogParserPropertiesTest.nativeBases());
    }

    @Provide
    Arbitrary<String> exportMutants() {
        return TextMutations.csv(CatalogParserPropertiesTest.exportBases());
    }

    @Property(tries = TRIES, edgeCases = EdgeCasesMode.NONE)
    void ourFormatIsReadOrRefusedWithAMessage(@ForAll("nativeMutants") String csv) {
        NATIVE.get(CatalogParserPropertiesTest.readsOrRefuses(csv, null)).incrementAndGet();
    }

    @Property(tries = TRIES, edgeCases = EdgeCasesMode.NONE)
    void aMappedExportIsReadOrRefusedWithAMessage(@ForAll("exportMutants") String csv) {
        EXPORT.get(CatalogParserPropertiesTest.readsOrRefuses(csv, CatalogParserPropertiesTest.EXPORT_MAPPING)).incrementAndGet();
    }

    @AfterContainer
    static void report() {
        System.out.println("catalogue fuzz: our format " + NATIVE + "; mapped export " + EXPORT);
    }
}
