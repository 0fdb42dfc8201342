package dev.coilwise.requirement;

import dev.coilwise.error.SafeText;

/** Text from a requirement or spring file as quoted in a problem: escaped and cut ({@link SafeText}). */
final class Shown {
    /** Longest value quoted in a message, characters; longer values are cut and end in "...". */
    static final int MAX_CHARS = 60;

    private Shown() {
    }

    /** The value, escaped and cut to {@link #MAX_CHARS}. */
    static String value(String text) {
        return SafeText.quote(text, MAX_CHARS);
    }

    /** Control characters and lone surrogates written as {@code \\uXXXX}; everything else unchanged. */
    static String escape(String text) {
        return SafeText.escape(text);
    }
}
