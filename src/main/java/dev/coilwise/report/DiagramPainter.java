package dev.coilwise.report;

import java.util.Locale;

/** Draws a {@link ForceDiagram} on any {@link DiagramCanvas}, so the PDF and the HTML page show the same figure. */
final class DiagramPainter {
    private static final double LEFT = 44;
    private static final double BOTTOM = 30;
    private static final double TOP = 16;
    private static final double RIGHT = 12;
    private static final double FONT = 7;

    private DiagramPainter() {
    }

    /** Paints the diagram into the box with lower-left corner (x, y), width w and height h. */
    static void paint(ForceDiagram d, DiagramCanvas c, double x, double y, double w, double h) {
        double px = x + LEFT;
        double py = y + BOTTOM;
        double pw = w - LEFT - RIGHT;
        double ph = h - BOTTOM - TOP;
        Mapper m = new Mapper(px, py, pw / d.xMax(), ph / d.yMax());
        String xf = format(d.xTicks());
        String yf = format(d.yTicks());
        for (double t : d.xTicks()) {
            c.line(m.x(t), py, m.x(t), py + ph, 0.25, true);
            c.text(m.x(t), py - 10, FONT, DiagramCanvas.Anchor.MIDDLE, String.format(Locale.ROOT, xf, t));
        }
        for (double t : d.yTicks()) {
            c.line(px, m.y(t), px + pw, m.y(t), 0.25, true);
            c.text(px - 4, m.y(t) - 2.5, FONT, DiagramCanvas.Anchor.END, String.format(Locale.ROOT, yf, t));
        }
        c.line(px, py, px + pw, py, 0.8, false);
        c.line(px, py, px, py + ph, 0.8, false);
        c.text(px + pw / 2, y + 2, FONT + 1, DiagramCanvas.Anchor.MIDDLE, d.xLabel());
        c.text(px, py + ph + 5, FONT + 1, DiagramCanvas.Anchor.START, d.yLabel());

        c.line(m.x(0), m.y(0), m.x(d.solidDeflection()), m.y(d.solidForce()), 1.4, false);
        c.line(m.x(d.solidDeflection()), py, m.x(d.solidDeflection()), m.y(d.solidForce()), 0.6, true);
        c.text(m.x(d.solidDeflection()) - 3, m.y(d.solidForce()) + 3, FONT, DiagramCanvas.Anchor.END, "solid");
        for (ForceDiagram.Marker k : d.markers()) {
            double lo = m.y(k.y() - k.yTolerance());
            double hi = m.y(k.y() + k.yTolerance());
            c.line(m.x(k.x()), lo, m.x(k.x()), hi, 0.8, false);
            c.line(m.x(k.x()) - 3, lo, m.x(k.x()) + 3, lo, 0.8, false);
            c.line(m.x(k.x()) - 3, hi, m.x(k.x()) + 3, hi, 0.8, false);
            c.dot(m.x(k.x()), m.y(k.y()), 2);
            c.text(m.x(k.x()) + 5, m.y(k.y()) - 9, FONT + 1, DiagramCanvas.Anchor.START, k.label());
        }
    }

    /** A format with as many decimals as the tick step needs. */
    private static String format(java.util.List<Double> ticks) {
        double step = ticks.size() > 1 ? ticks.get(1) - ticks.get(0) : 1;
        int decimals = Math.max(0, (int) Math.ceil(-Math.log10(step) - 1e-9));
        return "%." + decimals + "f";
    }

    private record Mapper(double x0, double y0, double sx, double sy) {
        double x(double v) {
            return x0 + v * sx;
        }

        double y(double v) {
            return y0 + v * sy;
        }
    }
}
