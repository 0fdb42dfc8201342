package dev.coilwise.report.html;

/** A small HTML text builder: escapes every piece of text it is given, nothing else. */
final class Html {
    private final StringBuilder sb = new StringBuilder();

    static String esc(String s) {
        StringBuilder out = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(c);
            }
        }
        return out.toString();
    }

    /** Appends markup as it is (tags written by this package, or SVG made by JFreeSVG). */
    Html raw(String markup) {
        sb.append(markup);
        return this;
    }

    /** Appends escaped text. */
    Html text(String s) {
        sb.append(esc(s));
        return this;
    }

    /** Appends {@code <tag attrs>escaped text</tag>}; {@code attrs} is markup (may be empty). */
    Html el(String tag, String attrs, String text) {
        sb.append('<').append(tag).append(attrs.isEmpty() ? "" : " " + attrs).append('>').append(esc(text))
                .append("</").append(tag).append(">\n");
        return this;
    }

    Html el(String tag, String text) {
        return el(tag, "", text);
    }

    Html open(String tag, String attrs) {
        sb.append('<').append(tag).append(attrs.isEmpty() ? "" : " " + attrs).append(">\n");
        return this;
    }

    Html open(String tag) {
        return open(tag, "");
    }

    Html close(String tag) {
        sb.append("</").append(tag).append(">\n");
        return this;
    }

    /** A figure holding an inline SVG chart and its caption. */
    Html figure(String cls, String svg, String caption) {
        open("figure", "class=\"" + cls + "\"");
        raw(svg).raw("\n");
        el("figcaption", caption);
        return close("figure");
    }

    @Override
    public String toString() {
        return sb.toString();
    }
}
