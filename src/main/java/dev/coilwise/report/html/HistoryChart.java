package dev.coilwise.report.html;

import static dev.coilwise.report.DisplayUnits.fmt;

import dev.coilwise.report.DisplayUnits;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The simulated event of one design on a shared time axis: the load's position (upper panel) and the force between
 * spring and load (lower panel), each with the peak the massless energy balance predicts (dashed) and its limit
 * (dotted), so the effect of the spring's own mass shows at a glance.
 */
final class HistoryChart {
    static final int WIDTH = 760;
    static final int HEIGHT = 560;

    private HistoryChart() {
    }

    static String svg(ReportData r, ReportDesign d, TimeSeries h, String id) {
        DisplayUnits u = r.display();
        double[] t = h.time();
        double[] x = h.travel();
        double[] f = h.force();
        XYSeries position = new XYSeries("position", false, true);
        XYSeries force = new XYSeries("force", false, true);
        for (int i = 0; i < t.length; i++) {
            position.add(t[i] * 1e3, u.length(x[i]));
            force.add(t[i] * 1e3, u.force(f[i]));
        }
        NumberAxis time = new NumberAxis((r.arrest() ? "time from first contact" : "time from release") + " t (ms)");
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(time);
        plot.setGap(16);

        ReportDesign.Working w = d.working();
        double balanceTravel = u.length(w.totalDeflection());
        double strokeAt = u.length(w.preloadDeflection() + r.stroke());
        XYPlot top = panel(position, "load position x (" + u.lengthUnit() + ")", ChartStyle.DESIGN,
                r.arrest() ? new double[] {balanceTravel, strokeAt} : new double[] {balanceTravel});
        line(top, balanceTravel, r.arrest() ? "energy balance: largest compression" : "cocked compression",
                ChartStyle.DASHED);
        if (r.arrest()) {
            line(top, strokeAt, "stroke limit", ChartStyle.DOTTED);
        }
        plot.add(top, 1);

        double balanceForce = u.force(w.peakForce());
        boolean limitShown = !Double.isNaN(r.forceLimit()) && r.forceLimit() < 1.6 * Math.max(w.peakForce(), max(f));
        XYPlot bottom = panel(force, "force on the load F (" + u.forceUnit() + ")", ChartStyle.ACCENT,
                limitShown ? new double[] {balanceForce, u.force(r.forceLimit())} : new double[] {balanceForce});
        line(bottom, balanceForce, r.arrest() ? "energy balance: peak force" : "cocking force", ChartStyle.DASHED);
        if (limitShown) {
            line(bottom, u.force(r.forceLimit()), "force limit", ChartStyle.DOTTED);
        }
        plot.add(bottom, 1);

        LegendItemCollection legend = new LegendItemCollection();
        legend.add(ChartStyle.lineItem("simulated position", ChartStyle.SOLID, ChartStyle.DESIGN));
        legend.add(ChartStyle.lineItem("simulated force", ChartStyle.SOLID_THIN, ChartStyle.ACCENT));
        legend.add(ChartStyle.lineItem("massless energy balance", ChartStyle.DASHED, ChartStyle.LIMIT));
        legend.add(ChartStyle.lineItem("limit", ChartStyle.DOTTED, ChartStyle.LIMIT));
        plot.setFixedLegendItems(legend);
        JFreeChart chart = new JFreeChart(null, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        ChartStyle.apply(chart);
        return ChartStyle.svg(chart, WIDTH, HEIGHT, id);
    }

    private static double max(double[] v) {
        double m = 0;
        for (double e : v) {
            m = Math.max(m, e);
        }
        return m;
    }

    /** A panel whose value axis spans zero, the data and the reference lines, with room above for labels. */
    private static XYPlot panel(XYSeries series, String label, Paint paint, double[] references) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setDrawSeriesLineAsPath(true);
        r.setSeriesPaint(0, paint);
        r.setSeriesStroke(0, paint == ChartStyle.DESIGN ? ChartStyle.SOLID : ChartStyle.SOLID_THIN);
        NumberAxis axis = new NumberAxis(label);
        double lo = Math.min(0, series.getMinY());
        double hi = Math.max(0, series.getMaxY());
        for (double v : references) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        double pad = (hi - lo) * 0.06;
        axis.setRange(lo - (lo < 0 ? pad : 0), hi + 2 * pad);
        XYPlot p = new XYPlot(new XYSeriesCollection(series), null, axis, r);
        p.setDomainGridlinePaint(ChartStyle.GRID);
        p.setRangeGridlinePaint(ChartStyle.GRID);
        return p;
    }

    /** A horizontal reference line: the energy balance labelled at the right end, a limit (dotted) at the left. */
    private static void line(XYPlot p, double at, String label, Stroke stroke) {
        boolean limit = stroke == ChartStyle.DOTTED;
        ValueMarker m = new ValueMarker(at, ChartStyle.LIMIT, stroke);
        m.setLabel(label);
        m.setLabelFont(ChartStyle.font(Font.PLAIN, 11));
        m.setLabelPaint(ChartStyle.LIMIT);
        m.setLabelBackgroundColor(ChartStyle.LABEL_BACKGROUND);
        m.setLabelAnchor(limit ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
        m.setLabelTextAnchor(limit ? TextAnchor.BOTTOM_LEFT : TextAnchor.BOTTOM_RIGHT);
        m.setLabelOffset(new RectangleInsets(2, 6, 2, 6));
        p.addRangeMarker(m, Layer.FOREGROUND);
    }

    static String caption(ReportData r, ReportDesign d, SimulationView s) {
        DisplayUnits u = r.display();
        String peak = DisplayUnits.sig(u.force(s.peakForce())) + " " + u.forceUnit();
        String balance = DisplayUnits.sig(u.force(d.working().peakForce())) + " " + u.forceUnit();
        return "Simulated " + (r.arrest() ? "arrest" : "launch") + " of design " + d.rank() + " with the spring split"
                + " into " + s.masses() + " lumped masses: load position (" + u.lengthUnit() + ", upper panel) and"
                + " force between spring and load (" + u.forceUnit() + ", lower panel) against time (ms). Simulated"
                + " peak force " + peak + " against " + balance + " from the massless energy balance (largest"
                + " difference " + fmt("%.1f", s.deviationPct()) + " %)" + (s.coilClash() ? "; coils clash" : "")
                + ". The history is thinned to at most 240 samples for the chart.";
    }
}
