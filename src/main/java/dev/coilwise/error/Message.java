package dev.coilwise.error;

import java.util.Locale;

/**
 * Every message template of the library in one place. Each names the quantity, the value found and what is allowed.
 * Placeholders are {@link String#format} specifiers; {@code MessageTest} checks their count against {@link #arity()}.
 * A unit placeholder follows its number directly: callers pass the unit with its leading blank (see {@code Check}).
 */
public enum Message {
    NOT_FINITE("%s must be a finite number, got %s", 2),
    NOT_POSITIVE("%s must be a finite number greater than zero, got %s%s", 3),
    NEGATIVE("%s must be a finite number of zero or more, got %s%s", 3),
    OUT_OF_RANGE("%s must lie between %s and %s%s, got %s%s", 6),
    MISSING("%s is required", 1),
    WIRE_OUT_OF_MATERIAL_RANGE("wire diameter %.3f mm is outside the range of %s (%.3f to %.3f mm); coilwise does not extrapolate a material fit", 4),
    UNKNOWN_MATERIAL("unknown material '%s'; known materials: %s", 2),
    UNKNOWN_KEY("unknown %s '%s'; allowed: %s", 3),
    /** As {@link #UNKNOWN_KEY}, with a "did you mean" hint (or an empty string) after the value. */
    UNKNOWN_CHOICE("unknown %s '%s'%s; allowed: %s", 4),
    INDEX_TOO_LOW("spring index C = D/d must exceed 0.75 for the curvature factor to be defined, got %s", 1),
    SPRING_INDEX_TOO_LOW("spring index C = D/d must exceed 1 (the inner diameter D - d must be positive), got %s", 1),
    WAHL_INDEX_TOO_LOW("spring index C = D/d must exceed 1 for the Wahl factor to be defined, got %s", 1),
    SOLID_EXCEEDS_FREE("free length %.3f mm must exceed the solid length %.3f mm", 2),
    NO_SEPARATION("the spring cannot throw the payload: stored energy %.4g J does not exceed the work against gravity over the stroke", 1),

    // Requirement and spring files (dev.coilwise.requirement). InputProblem adds the file, line, column and key.
    PROBLEMS_IN_FILE("%d problem(s) in %s:", 2),
    TOO_MANY_PROBLEMS("more than %d problems; the rest are not listed", 1),
    FILE_TOO_LARGE("the file %s bytes; coilwise reads files of at most %d bytes (%d MiB)", 3),
    FILE_UNREADABLE("cannot read the file: %s", 1),
    YAML_SYNTAX("not valid YAML: %s", 1),
    YAML_EMPTY("the file is empty; give at least %s", 1),
    YAML_MORE_DOCUMENTS("the file holds more than one YAML document; put one in each file", 0),
    YAML_TOO_DEEP("nesting deeper than %d levels", 1),
    YAML_ALIAS("YAML aliases (*%s) are not accepted; write the value out in full", 1),
    YAML_TAG("YAML type tags (%s) are not accepted; write plain values", 1),
    DUPLICATE_KEY("appears twice; the first is at line %d", 1),
    UNKNOWN_FIELD("unknown key '%s'%s; allowed here: %s", 3),
    MISSING_FIELD("missing; give %s", 1),
    ONE_OF_TWO_MISSING("missing; give %s or %s", 2),
    BOTH_GIVEN("give %s or %s, not both", 2),
    EXPECTED("expected %s, got %s", 2),
    CONTROL_CHARACTER("'%s' holds a control character (a tab, a line break, an escape); write plain text on one line", 1),
    UNDER_OTHER_KEY("'%s' is %s: give it as %s, or give %s", 4),
    NO_VALUE("has no value; give %s such as %s", 2),
    NO_UNIT("'%s' has no unit; give %s such as %s", 3),
    NOT_A_NUMBER("'%s' does not start with a number; give %s such as %s", 3),
    NOT_A_FINITE_NUMBER("'%s' is not a finite number; give %s", 2),
    TOO_LARGE("'%s' is more than %s, the largest %s coilwise accepts; check the number and its unit", 3),
    TOO_SMALL("'%s' is less than %s, the smallest %s coilwise accepts; check the number and its unit", 3),
    UNIT_NOT_LISTED("'%s' has a unit coilwise does not read, '%s'; %s units: %s", 4),
    UNKNOWN_UNIT("'%s' has an unknown unit '%s'%s; %s units: %s", 5),
    MUST_BE_POSITIVE("must be greater than zero, got '%s'", 1),
    MUST_NOT_BE_NEGATIVE("must not be negative, got '%s'", 1),
    NOT_IN_RANGE("must lie between %s and %s, got '%s'", 3),
    NOT_A_CHOICE("'%s' is not allowed%s; allowed: %s", 3),
    NOT_FOR_JOB("applies to job '%s' only; remove it for job '%s'%s", 3),
    DROP_NEEDS_FALL("a drop height means a fall straight down, but motion.direction is '%s'; give motion.speed, the speed at first contact, instead", 1),
    ROD_NOT_BELOW_BORE("'%s' must be smaller than envelope.bore '%s': a spring cannot fit between them", 2),
    NO_ROOM_IN_BORE("after the clearance (%s) nothing fits in envelope.bore '%s': the diametral clearance must be smaller than the bore", 2),
    NO_ROOM_FOR_WIRE("after the clearance (%s) no wire fits between envelope.rod '%s' and envelope.bore '%s'", 3),
    TOO_LONG_FOR("'%s' must be shorter than %s '%s': %s", 4),
    MUST_NOT_EXCEED("'%s' must not exceed %s '%s': %s", 4),
    MATERIAL_NOT_IN_TABLE("unknown material '%s'%s; known materials: %s", 3),
    LIST_EMPTY("must list at least one %s", 1),
    LOW_ABOVE_HIGH("the low end %s exceeds the high end %s", 2),
    STOCK_NOT_FOUND("file not found: %s", 1),
    NOT_A_PATH("'%s' is not a file path this system can open", 1),
    SPRING_TOO_HEAVY("the spring described would weigh %s kg; coilwise checks springs of at most %s kg: check the diameters, the coil count and their units", 2),
    NO_ACTIVE_COILS("'%s' total coils leave no active coils with %s ends (%d inactive coils)", 3),

    // Stock catalogues (dev.coilwise.catalog).
    CATALOG_MAPPING_INVALID("%s: the column mapping has %d problem(s):%n%s", 3),
    CATALOG_MISSING_FIELD("no column for %s (%s); expected one of: %s", 3),
    CATALOG_MAPPING_MISSING_FIELD("no column for %s (%s); map it under columns as %s%s, or give it under constants", 4),
    CATALOG_EMPTY_VALUE("%s is required but the cell is empty", 1),
    CATALOG_BAD_NUMBER("%s must be a number in %s, got '%s'", 3),
    CATALOG_RAGGED_ROW("row has %d fields but the header has %d", 2),
    CATALOG_STATED_DIFFERS("stated %s %.4g %s differs from the computed %.4g %s by %.0f %% (more than %.0f %%); the part is evaluated with the computed value", 7),
    CATALOG_INVALID("%s: %d error(s); nothing was imported (fix the rows, or read the catalogue leniently to skip them):%n%s", 3),

    // Saved shortlists read back by `coilwise report` (dev.coilwise.report.html).
    JSON_SYNTAX("not valid JSON: %s", 1),
    NOT_A_SHORTLIST("not a coilwise shortlist (format is %s); give the shortlist.json that 'coilwise size --out' writes", 1),
    SHORTLIST_VERSION("shortlist format version %s is not supported; this coilwise reads version %d", 2),
    SAVED_FIELD("%s is %s; expected %s", 3);

    private final String template;
    private final int arity;

    Message(String template, int arity) {
        this.template = template;
        this.arity = arity;
    }

    public String template() {
        return template;
    }

    public int arity() {
        return arity;
    }

    /** The filled-in message. */
    public String format(Object... args) {
        if (args.length != arity) {
            throw new InternalFaultException("message " + name() + " takes " + arity + " arguments, got " + args.length);
        }
        return String.format(Locale.ROOT, template, args);
    }
}
