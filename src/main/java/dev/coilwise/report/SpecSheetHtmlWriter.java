package dev.coilwise.report;

import java.io.IOException;
import java.io.Writer;
import java.util.Locale;

/**
 * Writes a {@link SpecSheet} as one self-contained, printable HTML page: inline CSS (A4 print layout), the fields as
 * tables whose rows carry {@code data-key} attributes, the force–deflection diagram as inline SVG, notes and the
 * caution. No scripts, no external resources.
 */
public final class SpecSheetHtmlWriter {
    private static final double SVG_W = 640;
    private static final double SVG_H = 250;
    private static final String CSS = """
            @page { size: A4; margin: 14mm; }
            body { font-family: Helvetica, Arial, sans-serif; font-size: 10pt; color: #111; max-width: 190mm; margin: auto; }
            h1 { font-size: 15pt; margin: 0 0 2pt 0; }
            p.subtitle { margin: 0 0 8pt 0; }
            .columns { display: grid; grid-template-columns: 1fr 1fr; column-gap: 8mm; }
            h2 { font-size: 10.5pt; border-bottom: 0.6pt solid #111; margin: 8pt 0 3pt 0; }
            table.fields { border-collapse: collapse; width: 100%; }
            table.fields th { text-align: left; vertical-align: top; width: 38%; font-weight: bold; font-size: 9pt; padding: 1pt 4pt 1pt 0; }
            table.fields td { vertical-align: top; padding: 1pt 0; }
            figure { margin: 8pt 0; }
            svg { width: 100%; height: auto; }
            ul.notes { font-size: 8pt; padding-left: 12pt; }
            p.caution { border: 0.8pt solid #111; padding: 4pt 6pt; font-weight: bold; font-size: 9pt; }
            @media print { .columns { break-inside: avoid; } }
            """;

    private SpecSheetHtmlWriter() {
    }

    /** Writes the page to {@code out} (not closed). */
    public static void write(SpecSheet sheet, Writer out) throws IOException {
        StringBuilder h = new StringBuilder(16_000);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(esc(sheet.title())).append("</title>\n<style>\n").append(CSS).append("</style>\n</head>\n<body>\n");
        h.append("<h1>").append(esc(sheet.title())).append("</h1>\n<p class=\"subtitle\">").append(esc(sheet.subtitle()))
                .append("</p>\n<div class=\"columns\">\n");
        int split = 2;
        for (int col = 0; col < 2; col++) {
            h.append("<div class=\"column\">\n");
            for (int i = 0; i < sheet.sections().size(); i++) {
                if ((i < split) == (col == 0)) {
                    section(h, sheet.sections().get(i));
                }
            }
            h.append("</div>\n");
        }
        h.append("</div>\n<figure>\n").append(svg(sheet.diagram()))
                .append("<figcaption>Force against deflection from free length; bars: EN 15800 force tolerance"
                        + "</figcaption>\n</figure>\n<ul class=\"notes\">\n");
        for (String n : sheet.notes()) {
            h.append("<li>").append(esc(n)).append("</li>\n");
        }
        h.append("</ul>\n<p class=\"caution\">").append(esc(sheet.caution())).append("</p>\n</body>\n</html>\n");
        out.write(h.toString());
    }

    private static void section(StringBuilder h, SpecSection s) {
        h.append("<h2>").append(esc(s.heading())).append("</h2>\n<table class=\"fields\">\n");
        for (SpecField f : s.fields()) {
            h.append("<tr data-key=\"").append(esc(f.key())).append("\"><th>").append(esc(f.label()))
                    .append("</th><td>").append(esc(f.value())).append("</td></tr>\n");
        }
        h.append("</table>\n");
    }

    private static String svg(ForceDiagram d) {
        SvgCanvas c = new SvgCanvas(SVG_H);
        DiagramPainter.paint(d, c, 0, 0, SVG_W, SVG_H);
        return String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 %.0f %.0f\" "
                + "role=\"img\" aria-label=\"force-deflection diagram\">\n", SVG_W, SVG_H) + c.body + "</svg>\n";
    }

    static String esc(String s) {
        StringBuilder sb = new StringBuilder(s.length() + 16);
        for (char ch : s.toCharArray()) {
            switch (ch) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> sb.append(ch);
            }
        }
        return sb.toString();
    }

    /** Diagram drawing as SVG elements; flips y so the painter can work upward. */
    private static final class SvgCanvas implements DiagramCanvas {
        private final double height;
        private final StringBuilder body = new StringBuilder();

        SvgCanvas(double height) {
            this.height = height;
        }

        @Override
        public void line(double x1, double y1, double x2, double y2, double width, boolean dashed) {
            body.append(String.format(Locale.ROOT, "<line x1=\"%.2f\" y1=\"%.2f\" x2=\"%.2f\" y2=\"%.2f\" "
                    + "stroke=\"#111\" stroke-width=\"%.2f\"%s/>\n", x1, height - y1, x2, height - y2, width,
                    dashed ? " stroke-dasharray=\"2 2\"" : ""));
        }

        @Override
        public void dot(double x, double y, double r) {
            body.append(String.format(Locale.ROOT, "<circle cx=\"%.2f\" cy=\"%.2f\" r=\"%.2f\" fill=\"#111\"/>\n",
                    x, height - y, r));
        }

        @Override
        public void text(double x, double y, double size, Anchor anchor, String s) {
            String a = switch (anchor) {
                case START -> "start";
                case MIDDLE -> "middle";
                case END -> "end";
            };
            body.append(String.format(Locale.ROOT, "<text x=\"%.2f\" y=\"%.2f\" font-size=\"%.1f\" "
                    + "text-anchor=\"%s\" font-family=\"Helvetica, Arial, sans-serif\">", x, height - y, size, a))
                    .append(esc(s)).append("</text>\n");
        }
    }
}
