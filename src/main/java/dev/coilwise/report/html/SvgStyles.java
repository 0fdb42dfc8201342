package dev.coilwise.report.html;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Makes the report's inline charts smaller without changing a pixel of them.
 *
 * <p>JFreeSVG writes every element with its full style ({@code style='stroke-width:0.5;stroke:rgb(…);…'}) and a
 * clip path, and a report with ten designs draws some thirty charts of a few thousand elements that share a few
 * dozen styles: the repeated style text was about half of the page. This pass gives each distinct style one short
 * class, written once in the page's style sheet, and drops the references to a clip path that is the chart's whole
 * canvas (which clips nothing that the chart's own view box does not) from elements drawn without a transform.
 *
 * <p>It works on the page text and relies on two facts of how the page is made: only JFreeSVG writes attributes
 * in single quotes ({@link Html} writes double quotes and escapes {@code '} in text, JFreeSVG escapes it in its
 * text), and JFreeSVG puts a {@code transform} (rotated text) on a group or on the element itself, so that an element
 * drawn without one is in the canvas coordinates of the clip path. A rule {@code svg.chart
 * .sN} outranks no style the report sets on chart elements (report.css sets none), so each element looks as before.
 */
final class SvgStyles {
    private static final Pattern SVG = Pattern.compile("<svg [^>]*class=\"chart\"[^>]*>.*?</svg>", Pattern.DOTALL);
    private static final Pattern STYLE = Pattern.compile(" style='([^']*)'");
    private static final Pattern VIEW_BOX = Pattern.compile("viewBox='0 0 ([0-9.]+) ([0-9.]+)'");
    private static final Pattern CLIP = Pattern.compile("<clipPath id='([^']+)'><path d='([^']*)'/></clipPath>");
    private static final Pattern TAG = Pattern.compile("</?[a-zA-Z][^>]*>");

    private SvgStyles() {
    }

    /** The page with its charts' styles as classes and their whole-canvas clips dropped. */
    static String compact(String page) {
        Map<String, String> classes = new LinkedHashMap<>();
        StringBuilder out = new StringBuilder(page.length() / 2);
        Matcher m = SVG.matcher(page);
        int last = 0;
        while (m.find()) {
            out.append(page, last, m.start()).append(chart(withoutCanvasClip(m.group()), classes));
            last = m.end();
        }
        out.append(page, last, page.length());
        if (classes.isEmpty()) {
            return out.toString();
        }
        StringBuilder css = new StringBuilder("/* chart styles */\n");
        classes.forEach((style, name) -> css.append("svg.chart .").append(name).append('{').append(unescape(style))
                .append("}\n"));
        int end = out.indexOf("</style>");
        if (end < 0) {
            throw new IllegalStateException("the report page has no style sheet for its chart styles");
        }
        return out.insert(end, css).toString();
    }

    /** One chart with each style attribute replaced by the class of that style. */
    private static String chart(String svg, Map<String, String> classes) {
        Matcher s = STYLE.matcher(svg);
        StringBuilder out = new StringBuilder(svg.length() / 2);
        while (s.find()) {
            String name = classes.computeIfAbsent(s.group(1), k -> "s" + classes.size());
            s.appendReplacement(out, " class='" + name + "'");
        }
        s.appendTail(out);
        return out.toString();
    }

    /** The chart without references to a clip path that is exactly its whole canvas, on elements with no transform. */
    static String withoutCanvasClip(String svg) {
        Matcher vb = VIEW_BOX.matcher(svg);
        if (!vb.find()) {
            return svg;
        }
        String canvas = "M0,0L" + vb.group(1) + ",0L" + vb.group(1) + "," + vb.group(2) + "L0," + vb.group(2) + "L0,0Z";
        Matcher c = CLIP.matcher(svg);
        String id = null;
        while (c.find()) {
            if (c.group(2).equals(canvas)) {
                id = c.group(1);
                break;
            }
        }
        if (id == null) {
            return svg;
        }
        String ref = " clip-path='url(#" + id + ")'";
        Matcher t = TAG.matcher(svg);
        StringBuilder out = new StringBuilder(svg.length());
        Deque<Boolean> groups = new ArrayDeque<>(); // per open <g>: whether it or an outer group transforms
        while (t.find()) {
            String tag = t.group();
            boolean transformed = !groups.isEmpty() && groups.peek() || tag.contains(" transform=");
            if (tag.startsWith("</g")) {
                groups.pop();
            } else if (tag.startsWith("<g") && (tag.length() == 3 || tag.charAt(2) == ' ') && !tag.endsWith("/>")) {
                groups.push(transformed);
            }
            t.appendReplacement(out, Matcher.quoteReplacement(transformed ? tag : tag.replace(ref, "")));
        }
        t.appendTail(out);
        return out.toString();
    }

    /** XML character references of an attribute value, as plain CSS text. */
    private static String unescape(String v) {
        String s = v.replace("&quot;", "\"").replace("&apos;", "'").replace("&lt;", "<").replace("&gt;", ">")
                .replace("&amp;", "&");
        if (s.contains("<") || s.contains("}")) {
            throw new IllegalStateException("a chart style that cannot go into a style sheet: " + s);
        }
        return s;
    }
}
