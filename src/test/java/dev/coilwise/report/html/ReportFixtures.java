package dev.coilwise.report.html;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.search.Sizer;
import dev.coilwise.search.SizingResult;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/** Sizes the demo requirements of the report tests once per test run (test scenarios, not check values). */
final class ReportFixtures {
    static final MaterialTable TABLE = MaterialTable.loadDefault();
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
        return SIZED.computeIfAbsent(name, n -> new Sizer(TABLE).size(requirement(n)));
    }
}
