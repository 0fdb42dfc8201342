package dev.coilwise.catalog;

import dev.coilwise.error.SafeText;

/**
 * One problem found while reading a catalogue, with its position.
 *
 * @param severity {@code ERROR}: the row (or, for a header problem, the file) cannot be used; {@code WARNING}: the
 *                 row was used with a stated caveat, or skipped for a reason the user may accept
 * @param file     file name as given to the reader
 * @param line     1-based line of the file (the header line for header problems, 0 when the whole file is meant)
 * @param column   column name as written in the file, or empty when the row or file is meant
 * @param message  what is wrong, with the value found and what is allowed
 */
public record CatalogIssue(Severity severity, String file, long line, String column, String message) {
    /** Longest column name and message kept, characters (a cell of junk is cut, not repeated in full). */
    static final int MAX_COLUMN_CHARS = 60, MAX_MESSAGE_CHARS = 400;

    /** Control characters from the file are escaped and long texts cut, so each issue prints on one short line. */
    public CatalogIssue {
        file = SafeText.escape(file);
        column = SafeText.quote(column, MAX_COLUMN_CHARS);
        message = SafeText.quote(message, MAX_MESSAGE_CHARS);
    }

    /** How serious an issue is. */
    public enum Severity {
        ERROR, WARNING
    }

    public boolean isError() {
        return severity == Severity.ERROR;
    }

    /** {@code file:line: column 'c': message}, the form printed to users. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(file);
        if (line > 0) {
            sb.append(':').append(line);
        }
        sb.append(": ").append(severity == Severity.ERROR ? "error" : "warning").append(": ");
        if (!column.isEmpty()) {
            sb.append("column '").append(column).append("': ");
        }
        return sb.append(message).toString();
    }
}
