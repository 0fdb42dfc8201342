package dev.coilwise.report;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.tolerance.TestPoint;
import java.util.List;
import java.util.Optional;

/**
 * The purchasing specification of one custom spring: everything a spring maker needs to quote, as labelled fields in
 * the trade's terms, the two test loads with EN 15800 tolerances, a force–deflection diagram, notes and the safety
 * caution. Writers ({@link SpecSheetPdfWriter}, {@link SpecSheetHtmlWriter}) only lay it out.
 *
 * @param title      heading, e.g. "Compression spring – purchasing specification"
 * @param subtitle   the requirement's title and the application in one line
 * @param sections   the fields, grouped
 * @param testPoints F1 at L1 and F2 at L2 (see {@link TestLoads})
 * @param diagram    the force–deflection diagram
 * @param notes      how the figures were obtained and what the maker may adjust
 * @param caution    the safety caution
 */
public record SpecSheet(String title, String subtitle, List<SpecSection> sections, List<TestPoint> testPoints,
                        ForceDiagram diagram, List<String> notes, String caution) {

    /** Field keys every sheet carries (tests and outputs rely on them). */
    public static final List<String> REQUIRED_KEYS = List.of("material", "wire_diameter", "outer_diameter",
            "inner_diameter", "guide", "free_length", "active_coils", "total_coils", "ends", "helix",
            "solid_length_max", "F1", "F2", "rate", "stress_working", "cycles", "set_removal", "shot_peening",
            "surface", "quantity", "tolerance_grade");

    public SpecSheet {
        sections = List.copyOf(sections);
        testPoints = List.copyOf(testPoints);
        notes = List.copyOf(notes);
    }

    /** Builds the sheet for a design with the helix and surface left to the maker. */
    public static SpecSheet build(Spring spring, Evaluation evaluation, Requirement requirement, int grade,
                                  int quantity) {
        return build(spring, evaluation, requirement, Order.of(quantity, grade));
    }

    /**
     * Builds the sheet.
     *
     * @param spring      the design (must be the evaluated spring)
     * @param evaluation  its evaluation against {@code requirement}
     * @param requirement the requirement (units, guide, duty)
     * @param order       quantity, tolerance grade, helix and surface
     */
    public static SpecSheet build(Spring spring, Evaluation evaluation, Requirement requirement, Order order) {
        return new SpecSheetBuilder(spring, evaluation, requirement, order).build();
    }

    /** The field with this key, if any. */
    public Optional<SpecField> field(String key) {
        return sections.stream().flatMap(s -> s.fields().stream()).filter(f -> f.key().equals(key)).findFirst();
    }

    /** Every field in sheet order. */
    public List<SpecField> fields() {
        return sections.stream().flatMap(s -> s.fields().stream()).toList();
    }
}
