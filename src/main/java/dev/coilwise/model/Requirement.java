package dev.coilwise.model;

import java.nio.file.Path;
import java.util.List;

/**
 * A complete, validated requirement in SI.
 *
 * @param title    free text
 * @param job      arrest or launch
 * @param limits   limits on the event
 * @param envelope where the spring must fit
 * @param spring   design space and rules
 * @param ranking  ordering of the shortlist
 * @param units    unit system the file was written in (display and grid)
 * @param stock    stock catalogue files to search beside custom designs (resolved paths)
 */
public record Requirement(String title, Job job, Limits limits, Envelope envelope, SpringOptions spring,
                          Ranking ranking, UnitSystem units, List<Path> stock) {
    public Requirement {
        title = title == null ? "" : title;
        stock = List.copyOf(stock);
    }

    public boolean isArrest() {
        return job instanceof Arrest;
    }

    public WireSeries wireSeries() {
        return spring.wireSeries().orElse(units == UnitSystem.US ? WireSeries.INCH : WireSeries.METRIC);
    }
}
