package dev.coilwise.requirement;

import java.util.Objects;

/**
 * One problem found in an input file, with its position, in the form compilers use so editors can jump to it.
 * Control characters in the key and message (quoted from a file) are escaped, so a problem prints on one line.
 *
 * @param file    file name as given by the user (or a label such as {@code <template>})
 * @param line    1-based line, or 0 when the problem concerns the whole file
 * @param column  1-based column, or 0 when the problem concerns the whole file
 * @param key     dotted key path, e.g. {@code limits.stroke}, or empty for a file-level problem
 * @param message what is wrong, the value found and what is allowed
 */
public record InputProblem(String file, int line, int column, String key, String message) {
    public InputProblem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(message, "message");
        key = key == null ? "" : Shown.escape(key);
        message = Shown.escape(message);
    }

    /** {@code file:line:column: key: message}; the key part is left out when there is no key. */
    @Override
    public String toString() {
        return file + ":" + line + ":" + column + ": " + (key.isEmpty() ? "" : key + ": ") + message;
    }
}
