package dev.coilwise.report;

import java.util.List;

/** A headed group of fields on a specification sheet. */
public record SpecSection(String heading, List<SpecField> fields) {
    public SpecSection {
        fields = List.copyOf(fields);
    }
}
