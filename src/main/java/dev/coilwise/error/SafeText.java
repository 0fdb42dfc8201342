package dev.coilwise.error;

import java.util.Locale;

/**
 * Text from an input file made safe to print in a message: control characters (which could move a terminal's cursor
 * or change its colours), line and paragraph separators, bidirectional overrides and lone surrogates are written as
 * {@code \\uXXXX}, and long values are cut, so that a hostile or broken file can neither garble the terminal nor
 * flood it, and every message stays on its line.
 */
public final class SafeText {
    private SafeText() {
    }

    /** The text with every unsafe character escaped; nothing cut. */
    public static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean unsafe = unsafe(text, i);
            if (unsafe && sb == null) {
                sb = new StringBuilder(text.substring(0, i));
            }
            if (sb != null) {
                sb.append(unsafe ? String.format(Locale.ROOT, "\\u%04x", (int) c) : String.valueOf(c));
            }
        }
        return sb == null ? text : sb.toString();
    }

    /** The text escaped, and cut to {@code max} characters (the last three "...") when longer. */
    public static String quote(String text, int max) {
        if (text == null) {
            return "";
        }
        if (text.length() <= max) {
            return escape(text);
        }
        int at = max - 3;
        if (at > 0 && Character.isLowSurrogate(text.charAt(at)) && Character.isHighSurrogate(text.charAt(at - 1))) {
            at--;
        }
        return escape(text.substring(0, at)) + "...";
    }

    private static boolean unsafe(String s, int i) {
        char c = s.charAt(i);
        if (Character.isISOControl(c) || c == '\u2028' || c == '\u2029' || c == '\u200e' || c == '\u200f'
                || c >= '\u202a' && c <= '\u202e' || c >= '\u2066' && c <= '\u2069') {
            return true;
        }
        if (Character.isHighSurrogate(c)) {
            return i + 1 >= s.length() || !Character.isLowSurrogate(s.charAt(i + 1));
        }
        return Character.isLowSurrogate(c) && (i == 0 || !Character.isHighSurrogate(s.charAt(i - 1)));
    }
}
