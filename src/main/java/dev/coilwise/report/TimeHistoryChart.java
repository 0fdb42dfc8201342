package dev.coilwise.report;

import dev.coilwise.dynamics.TimeHistory;
import dev.coilwise.model.UnitSystem;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;
import java.awt.Stroke;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * Draws a simulated time history as an SVG chart with JFreeChart and JFreeSVG: the load's position (the compression
 * of the spring's top) above the force between spring and load, on a shared time axis. Axis titles carry units;
 * colours and dashes from {@link ChartPalette}; the caution as a footer.
 */
public final class TimeHistoryChart {
    /** Width of the drawing, px. */
    public static final int WIDTH = 800;
    /** Height of the drawing, px. */
    public static final int HEIGHT = 620;

    /** 1 in = 0.0254 m exactly; 1 lbf = 4.4482216152605 N exactly (NIST SP 811, Appendix B). */
    private record DisplayUnits(String length, double metresPer, String force, double newtonsPer) {
        static DisplayUnits of(UnitSystem units) {
            return units == UnitSystem.US ? new DisplayUnits("in", 0.0254, "lbf", 4.4482216152605)
                    : new DisplayUnits("mm", 1e-3, "N", 1.0);
        }
    }

    static {
        // JFreeChart draws rotated text (the vertical axis titles) through a TextLayout by default, which
        // JFreeSVG can only emit as glyph outlines; plain drawString under a rotation gives real SVG text that
        // readers can search, copy and have read aloud.
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private TimeHistoryChart() {
    }

    /** The chart in metric display units (ms, mm, N). */
    public static String svg(TimeHistory history, String title) {
        return svg(history, title, UnitSystem.SI);
    }

    /** The chart in the display units of {@code units} (ms with mm and N, or ms with in and lbf). */
    public static String svg(TimeHistory history, String title, UnitSystem units) {
        if (history.isEmpty()) {
            throw new IllegalArgumentException("a time-history chart needs at least one sample; run the simulation "
                    + "with its history kept");
        }
        DisplayUnits u = DisplayUnits.of(units);
        double[] t = history.time();
        double[] x = history.loadPosition();
        double[] f = history.topForce();
        XYSeries position = new XYSeries("Load position", false, true);
        XYSeries force = new XYSeries("Force between spring and load", false, true);
        for (int i = 0; i < t.length; i++) {
            position.add(t[i] * 1e3, x[i] / u.metresPer());
            force.add(t[i] * 1e3, f[i] / u.newtonsPer());
        }
        NumberAxis time = axis("Time (ms)");
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(time);
        plot.setGap(14);
        plot.add(subplot(position, "Load position, spring compressed (" + u.length() + ")", ChartPalette.PRIMARY,
                ChartPalette.PRIMARY_STROKE), 1);
        plot.add(subplot(force, "Force between spring and load (" + u.force() + ")", ChartPalette.SECONDARY,
                ChartPalette.SECONDARY_STROKE), 1);
        JFreeChart chart = new JFreeChart(title, new Font(Font.SANS_SERIF, Font.BOLD, 16), plot, false);
        chart.addLegend(new org.jfree.chart.title.LegendTitle(plot));
        chart.setBackgroundPaint(ChartPalette.PAPER);
        chart.getTitle().setPaint(ChartPalette.INK);
        chart.getLegend().setItemPaint(ChartPalette.INK);
        chart.getLegend().setBackgroundPaint(ChartPalette.PAPER);
        TextTitle caution = new TextTitle(Caution.TEXT, new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        caution.setPaint(ChartPalette.INK);
        caution.setPosition(RectangleEdge.BOTTOM);
        caution.setHorizontalAlignment(HorizontalAlignment.LEFT);
        chart.addSubtitle(0, caution);
        SVGGraphics2D g2 = new SVGGraphics2D(WIDTH, HEIGHT);
        chart.draw(g2, new Rectangle(0, 0, WIDTH, HEIGHT));
        return g2.getSVGDocument();
    }

    private static NumberAxis axis(String label) {
        NumberAxis a = new NumberAxis(label);
        a.setLabelPaint(ChartPalette.INK);
        a.setTickLabelPaint(ChartPalette.INK);
        a.setAxisLinePaint(ChartPalette.INK);
        a.setTickMarkPaint(ChartPalette.INK);
        a.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        a.setAutoRangeIncludesZero(true);
        return a;
    }

    private static XYPlot subplot(XYSeries series, String label, Color colour, Stroke stroke) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setSeriesPaint(0, colour);
        r.setSeriesStroke(0, stroke);
        XYPlot p = new XYPlot(new XYSeriesCollection(series), null, axis(label), r);
        p.setBackgroundPaint(ChartPalette.PAPER);
        p.setDomainGridlinePaint(ChartPalette.GRID);
        p.setRangeGridlinePaint(ChartPalette.GRID);
        p.setOutlinePaint(ChartPalette.INK);
        return p;
    }
}
