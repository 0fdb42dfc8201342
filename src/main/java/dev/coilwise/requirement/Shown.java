package dev.coilwise.requirement;

/**
 * Text from an input file made safe to quote in a message: control characters (which could move a terminal's
 * cursor or change its colours) are written as {@code \\uXXXX}, and very long values are cut, so that a hostile or
 * broken file can neither garble the terminal nor flood it.
 */
final class Shown {
    /** Longest value quoted in a message, characters; longer values are cut and end in "...". */
    static final int MAX_CHARS = 60;

    private Shown() {
    }

    /** The value, escaped and cut to {@link #MAX_CHARS}. */
    static String value(String text) {
        if (text == null) {
            return "";
        }
        String cut = text.length() > MAX_CHARS ? text.substring(0, cut(text, MAX_CHARS - 3)) + "..." : text;
        return escape(cut);
    }

    /** Control characters and lone surrogates written as {@code \\uXXXX}; everything else unchanged. */
    static String escape(String text) {
        StringBuilder sb = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean loneSurrogate = Character.isHighSurrogate(c) && (i + 1 >= text.length()
                    || !Character.isLowSurrogate(text.charAt(i + 1)))
                    || Character.isLowSurrogate(c) && (i == 0 || !Character.isHighSurrogate(text.charAt(i - 1)));
            boolean unsafe = Character.isISOControl(c) || c == '\u2028' || c == '\u2029' || c == '\u200e' || c == '\u200f'
                    || c >= '\u202a' && c <= '\u202e' || c >= '\u2066' && c <= '\u2069' || loneSurrogate;
            if (unsafe && sb == null) {
                sb = new StringBuilder(text.substring(0, i));
            }
            if (sb != null) {
                if (unsafe) {
                    sb.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) c));
                } else {
                    sb.append(c);
                }
            }
        }
        return sb == null ? text : sb.toString();
    }

    /** An index at or before {@code at} that does not split a surrogate pair. */
    private static int cut(String text, int at) {
        return at > 0 && Character.isLowSurrogate(text.charAt(at)) && Character.isHighSurrogate(text.charAt(at - 1))
                ? at - 1 : at;
    }
}
