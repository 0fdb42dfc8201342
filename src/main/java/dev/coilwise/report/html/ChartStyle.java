package dev.coilwise.report.html;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.StandardChartTheme;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.AbstractRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.svg.MeetOrSlice;
import org.jfree.svg.PreserveAspectRatio;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * The look of every report chart: one palette, line patterns and marker shapes, so that each series differs in shape
 * or dash as well as in colour and stays readable in grey print and to colour-blind readers.
 *
 * <p>Colours are from the colour-universal-design palette of Okabe and Ito (2008), from memory; their grey values
 * differ, and no meaning rests on hue alone (common practice for accessible charts).
 */
final class ChartStyle {
    /** The design itself: spring line, shortlisted designs. Dark in grey print. */
    static final Color DESIGN = new Color(0x00, 0x72, 0xB2);
    /** What governs: working point, binding limit, coil-bind limit, Pareto front. */
    static final Color ACCENT = new Color(0xD5, 0x5E, 0x00);
    /** Energy area fill. Light in grey print. */
    static final Color ENERGY = new Color(0x56, 0xB4, 0xE9, 110);
    /** Other limits and reference lines. */
    static final Color LIMIT = new Color(0x22, 0x22, 0x22);
    /** Background data: the families not shortlisted, reported-only margins. */
    static final Color MUTED = new Color(0x8C, 0x8C, 0x8C);
    static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    /** Behind labels drawn over lines: mostly white, so the lines still show through faintly. */
    static final Color LABEL_BACKGROUND = new Color(255, 255, 255, 215);

    static final String FONT = "SansSerif";

    static final Stroke SOLID = new BasicStroke(2.5f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke SOLID_THIN = new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke THICK = new BasicStroke(3.5f);
    static final Stroke THIN = new BasicStroke(1.2f);
    static final Stroke DASHED = dash(1.6f, 7, 4);
    static final Stroke DOTTED = dash(1.8f, 1.5f, 3.5f);
    static final Stroke DASH_DOT = dash(1.8f, 9, 3, 2, 3);

    static {
        // Rotated labels (the vertical axis titles) as SVG text rather than glyph outlines: smaller, selectable, and
        // searchable. The workaround this turns off is for old Java 2D bugs that SVG output does not have.
        org.jfree.chart.text.TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private ChartStyle() {
    }

    private static Stroke dash(float width, float... pattern) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, pattern, 0f);
    }

    static Shape circle(double size) {
        return new Ellipse2D.Double(-size / 2, -size / 2, size, size);
    }

    static Shape square(double size) {
        return new Rectangle2D.Double(-size / 2, -size / 2, size, size);
    }

    static Shape triangle(double size) {
        Path2D.Double p = new Path2D.Double();
        double h = size / 2;
        p.moveTo(0, -h);
        p.lineTo(h, h);
        p.lineTo(-h, h);
        p.closePath();
        return p;
    }

    static Shape diamond(double size) {
        Path2D.Double p = new Path2D.Double();
        double h = size / 2;
        p.moveTo(0, -h);
        p.lineTo(h, 0);
        p.lineTo(0, h);
        p.lineTo(-h, 0);
        p.closePath();
        return p;
    }

    static Font font(int style, float size) {
        return new Font(FONT, style, Math.round(size));
    }

    /**
     * Fonts and colours of the chart frame, applied to a new chart. The series' own paints, strokes and shapes are
     * kept (a chart theme would otherwise replace them with its defaults).
     */
    static void apply(JFreeChart chart) {
        if (chart.getPlot() instanceof CombinedDomainXYPlot combined) {
            for (XYPlot sub : combined.getSubplots()) {
                for (int i = 0; i < sub.getRendererCount(); i++) {
                    keepSeriesLook(sub.getRenderer(i));
                }
            }
        } else if (chart.getPlot() instanceof XYPlot xy) {
            for (int i = 0; i < xy.getRendererCount(); i++) {
                keepSeriesLook(xy.getRenderer(i));
            }
        } else if (chart.getPlot() instanceof CategoryPlot cp) {
            for (int i = 0; i < cp.getRendererCount(); i++) {
                keepSeriesLook(cp.getRenderer(i));
            }
        }
        StandardChartTheme t = new StandardChartTheme("coilwise");
        t.setExtraLargeFont(font(Font.BOLD, 15));
        t.setLargeFont(font(Font.BOLD, 13));
        t.setRegularFont(font(Font.PLAIN, 12));
        t.setSmallFont(font(Font.PLAIN, 11));
        t.setChartBackgroundPaint(Color.WHITE);
        t.setPlotBackgroundPaint(Color.WHITE);
        t.setPlotOutlinePaint(MUTED);
        t.setDomainGridlinePaint(GRID);
        t.setRangeGridlinePaint(GRID);
        t.setLegendBackgroundPaint(Color.WHITE);
        t.setAxisOffset(RectangleInsets.ZERO_INSETS);
        t.apply(chart);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setPosition(RectangleEdge.BOTTOM);
            legend.setFrame(org.jfree.chart.block.BlockBorder.NONE);
            legend.setItemFont(font(Font.PLAIN, 12));
        }
    }

    private static void keepSeriesLook(Object renderer) {
        if (renderer instanceof AbstractRenderer a) {
            a.setAutoPopulateSeriesPaint(false);
            a.setAutoPopulateSeriesStroke(false);
            a.setAutoPopulateSeriesShape(false);
            a.setAutoPopulateSeriesFillPaint(false);
            a.setAutoPopulateSeriesOutlinePaint(false);
        }
    }

    /** A legend entry drawn as a line in the given stroke. */
    static LegendItem lineItem(String label, Stroke stroke, Paint paint) {
        return new LegendItem(label, null, null, null, new Line2D.Double(-14, 0, 14, 0), stroke, paint);
    }

    /** A legend entry drawn as a marker shape. */
    static LegendItem shapeItem(String label, Shape shape, Paint fill, boolean filled) {
        LegendItem item = new LegendItem(label, null, null, null, true, shape, filled, fill, !filled, fill, THIN,
                false, new Line2D.Double(), THIN, fill);
        return item;
    }

    /** A legend entry drawn as a filled box. */
    static LegendItem areaItem(String label, Paint fill) {
        return new LegendItem(label, null, null, null, new Rectangle2D.Double(-8, -6, 16, 12), fill);
    }

    /**
     * Renders a chart as an inline {@code <svg>} element that scales to its container (a view box, no fixed size).
     *
     * @param id a document-unique id; it also prefixes the chart's clip-path ids so that several charts can share
     *           one HTML page
     */
    static String svg(JFreeChart chart, int width, int height, String id) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(id + "-");
        g.setGeomDoubleConverter(ChartStyle::coordinate);
        g.setTransformDoubleConverter(ChartStyle::coordinate);
        chart.draw(g, new Rectangle(0, 0, width, height));
        String svg = g.getSVGElement(id, false, new ViewBox(0, 0, width, height), PreserveAspectRatio.XMID_YMID,
                MeetOrSlice.MEET);
        return svg.replaceFirst("<svg ", "<svg role=\"img\" class=\"chart\" ")
                .replace(" xmlns:jfreesvg='http://www.jfree.org/jfreesvg/svg'", "");
    }

    /**
     * A coordinate with at most two decimals (a hundredth of a pixel is far below what a screen or printer shows),
     * trailing zeros dropped; locale-independent.
     */
    static String coordinate(double v) {
        if (!Double.isFinite(v)) {
            return "0";
        }
        java.math.BigDecimal b = java.math.BigDecimal.valueOf(v).setScale(2, java.math.RoundingMode.HALF_EVEN)
                .stripTrailingZeros();
        return b.scale() < 0 ? b.setScale(0).toPlainString() : b.toPlainString();
    }
}
