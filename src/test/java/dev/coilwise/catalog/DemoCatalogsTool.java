package dev.coilwise.catalog;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Test-scope tool that rewrites the demo catalogues; skipped unless asked for:
 * {@code mvn -q -B test -Dtest=DemoCatalogsTool -Dcoilwise.demoCatalogs=spring-catalogs}.
 */
class DemoCatalogsTool {
    @Test
    @EnabledIfSystemProperty(named = "coilwise.demoCatalogs", matches = ".+")
    void writeDemoCatalogs() throws Exception {
        CatalogGenerator.main(new String[] {System.getProperty("coilwise.demoCatalogs")});
    }
}
