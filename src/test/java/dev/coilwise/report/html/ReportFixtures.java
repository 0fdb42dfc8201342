package dev.coilwise.report.html;

import dev.coilwise.catalog.CatalogReader;
import dev.coilwise.catalog.StockPart;
import dev.coilwise.dynamics.SimulationOptions;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.scatter.ScatterProgress;
import dev.coilwise.scatter.ScatterSettings;
import dev.coilwise.search.PrunedSearch;
import dev.coilwise.search.Sizer;
import dev.coilwise.search.SizingOptions;
import dev.coilwise.search.SizingResult;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Sizes the demo requirements of the report tests once per test run (test scenarios, not check values), as
 * {@code coilwise size} does: Monte Carlo (fewer samples, for speed) and simulation with its time history kept.
 * A name ending in {@code +stock} also offers the parts of the demo metric stock catalogue.
 */
final class ReportFixtures {
    static final MaterialTable TABLE = MaterialTable.loadDefault();
    /** The demo stock catalogue shipped with coilwise (demo data), relative to the project folder. */
    static final Path DEMO_STOCK = Path.of("spring-catalogs", "demo-metric.csv");
    static final SizingOptions OPTIONS = new SizingOptions(Optional.of(ScatterSettings.defaults().withSamples(500)),
            ScatterProgress.NONE, Optional.of(SimulationOptions.defaults().withHistory(true)));
    private static final Map<String, SizingResult> SIZED = new ConcurrentHashMap<>();

    private ReportFixtures() {
    }

    static Path file(String name) {
        try {
            return Path.of(ReportFixtures.class.getResource(name + ".yaml").toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static Requirement requirement(String name) {
        return new RequirementReader(TABLE).read(file(name));
    }

    /** The sizing of {@code <name>.yaml} beside this class. */
    static SizingResult sized(String name) {
        return SIZED.computeIfAbsent(name, n -> {
            boolean stock = n.endsWith("+stock");
            List<StockPart> parts = stock ? new CatalogReader(TABLE).read(DEMO_STOCK).parts() : List.of();
            return new Sizer(TABLE, new PrunedSearch(), OPTIONS).size(requirement(n.replace("+stock", "")), parts);
        });
    }
}
