package dev.coilwise.report;

/**
 * One labelled line of a specification sheet.
 *
 * @param key   stable identifier, e.g. {@code wire_diameter}, {@code F1}
 * @param label what a spring maker reads, e.g. "Wire diameter d"
 * @param value the value with units and tolerance, ready to print
 */
public record SpecField(String key, String label, String value) {
}
