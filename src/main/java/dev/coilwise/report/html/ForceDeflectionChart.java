package dev.coilwise.report.html;

import static dev.coilwise.report.DisplayUnits.sig;

import dev.coilwise.report.DisplayUnits;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Shape;
import java.awt.Stroke;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYPolygonAnnotation;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
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
 * The force–deflection line of one design from free length to solid, with its working point, the energy it takes up
 * (shaded), and the limits that bound it: stroke, force, coil-bind clearance, solid, and buckling when it could occur
 * within the plotted range. A second axis along the top gives the spring's length at each deflection.
 */
final class ForceDeflectionChart {
    static final int WIDTH = 760;
    static final int HEIGHT = 470;
    /** Share of the force axis above the larger of the solid and peak forces. */
    private static final double HEADROOM = 1.12;
    /** A force limit beyond this multiple of the chart's forces is named in the caption instead of drawn. */
    private static final double LIMIT_SHOWN_WITHIN = 1.6;

    private ForceDeflectionChart() {
    }

    /** Whether the force limit is drawn (otherwise it lies far above the chart and the caption names it). */
    static boolean forceLimitDrawn(ReportData r, ReportDesign d) {
        return !Double.isNaN(r.forceLimit()) && r.forceLimit() <= LIMIT_SHOWN_WITHIN * forceTop(d);
    }

    private static double forceTop(ReportDesign d) {
        return Math.max(d.working().rate() * d.geometry().deflectionToSolid(), d.working().peakForce());
    }

    static String svg(ReportData r, ReportDesign d, String id) {
        DisplayUnits u = r.display();
        ReportDesign.Working w = d.working();
        double xSolid = d.geometry().deflectionToSolid();
        double x0 = w.preloadDeflection();
        double x1 = w.totalDeflection();
        double strokeAt = x0 + r.stroke();

        XYSeriesCollection data = new XYSeriesCollection();
        XYSeries line = new XYSeries("spring", false);
        line.add(0, 0);
        line.add(u.length(xSolid), u.force(w.rate() * xSolid));
        XYSeries work = new XYSeries("working point", false);
        work.add(u.length(x1), u.force(w.peakForce()));
        data.addSeries(line);
        data.addSeries(work);
        if (x0 > 0) {
            XYSeries installed = new XYSeries("installed", false);
            installed.add(u.length(x0), u.force(w.preloadForce()));
            data.addSeries(installed);
        }

        String lu = u.lengthUnit();
        String fu = u.forceUnit();
        NumberAxis xAxis = new NumberAxis("deflection from free length x (" + lu + ")");
        NumberAxis yAxis = new NumberAxis("spring force F (" + fu + ")");
        double xMax = u.length(Math.max(xSolid, strokeAt)) * 1.06;
        double yTop = forceTop(d);
        if (forceLimitDrawn(r, d)) {
            yTop = Math.max(yTop, r.forceLimit());
        }
        xAxis.setRange(0, xMax);
        yAxis.setRange(0, u.force(yTop) * HEADROOM);

        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        renderer.setSeriesLinesVisible(0, true);
        renderer.setSeriesShapesVisible(0, false);
        renderer.setSeriesPaint(0, ChartStyle.DESIGN);
        renderer.setSeriesStroke(0, ChartStyle.SOLID);
        point(renderer, 1, ChartStyle.diamond(13), ChartStyle.ACCENT, true);
        point(renderer, 2, ChartStyle.circle(10), ChartStyle.LIMIT, false);

        XYPlot plot = new XYPlot(data, xAxis, yAxis, renderer);
        NumberAxis lengthAxis = new NumberAxis("spring length L = L0 - x (" + lu + ")");
        lengthAxis.setInverted(true);
        lengthAxis.setRange(u.length(d.geometry().freeLength()) - xMax, u.length(d.geometry().freeLength()));
        plot.setDomainAxis(1, lengthAxis);
        plot.setDomainAxisLocation(1, AxisLocation.TOP_OR_LEFT);

        renderer.addAnnotation(new XYPolygonAnnotation(new double[] {u.length(x0), 0, u.length(x1), 0, u.length(x1),
            u.force(w.peakForce()), u.length(x0), u.force(w.preloadForce())}, null, null, ChartStyle.ENERGY),
                Layer.BACKGROUND);

        LegendItemCollection legend = new LegendItemCollection();
        legend.add(ChartStyle.lineItem("spring line, rate " + sig(u.rate(w.rate())) + " " + u.rateUnit(),
                ChartStyle.SOLID, ChartStyle.DESIGN));
        legend.add(ChartStyle.shapeItem(r.arrest() ? "working point (peak)" : "working point (cocked)",
                ChartStyle.diamond(11), ChartStyle.ACCENT, true));
        if (x0 > 0) {
            legend.add(ChartStyle.shapeItem("installed (preload)", ChartStyle.circle(9), ChartStyle.LIMIT, false));
        }
        legend.add(ChartStyle.areaItem(r.arrest() ? "energy taken up" : "energy stored", ChartStyle.ENERGY));

        int row = 0;
        row = limit(plot, legend, strokeAt, u, r.arrest() ? "stroke limit" : "cocking stroke limit",
                ChartStyle.DASHED, ChartStyle.LIMIT, row);
        var coilBind = d.margin("coil_bind");
        if (coilBind.isPresent() && Double.isFinite(coilBind.get().allowed())) {
            row = limit(plot, legend, coilBind.get().allowed(), u, "coil-bind limit", ChartStyle.DASH_DOT,
                    ChartStyle.ACCENT, row);
        }
        row = limit(plot, legend, xSolid, u, "solid, Ls " + u.lenWithUnit(d.geometry().solidLength()),
                ChartStyle.THICK, ChartStyle.MUTED, row);
        double critical = w.criticalDeflection();
        if (Double.isFinite(critical) && u.length(critical) < xMax) {
            limit(plot, legend, critical, u, "buckling (unguided)", ChartStyle.DOTTED, ChartStyle.MUTED, row);
        }
        if (forceLimitDrawn(r, d)) {
            ValueMarker m = new ValueMarker(u.force(r.forceLimit()), ChartStyle.LIMIT, ChartStyle.DOTTED);
            m.setLabel((r.arrest() ? "peak force limit " : "cocking force limit ") + u.forceWithUnit(r.forceLimit()));
            m.setLabelFont(ChartStyle.font(Font.PLAIN, 11));
            m.setLabelBackgroundColor(ChartStyle.LABEL_BACKGROUND);
            m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            m.setLabelOffset(new RectangleInsets(2, 6, 2, 2));
            plot.addRangeMarker(m, Layer.FOREGROUND);
            legend.add(ChartStyle.lineItem("force limit", ChartStyle.DOTTED, ChartStyle.LIMIT));
        }
        XYTextAnnotation note = new XYTextAnnotation(u.lenWithUnit(x1) + ", " + u.forceWithUnit(w.peakForce()) + "  ",
                u.length(x1), u.force(w.peakForce()));
        note.setFont(ChartStyle.font(Font.BOLD, 12));
        note.setPaint(ChartStyle.LIMIT);
        note.setTextAnchor(TextAnchor.BOTTOM_RIGHT);
        plot.addAnnotation(note);
        plot.setFixedLegendItems(legend);
        plot.setDomainGridlinePaint(ChartStyle.GRID);
        plot.setRangeGridlinePaint(ChartStyle.GRID);

        JFreeChart chart = new JFreeChart(null, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        ChartStyle.apply(chart);
        return ChartStyle.svg(chart, WIDTH, HEIGHT, id);
    }

    private static void point(XYLineAndShapeRenderer r, int series, Shape shape, Paint paint, boolean filled) {
        r.setSeriesLinesVisible(series, false);
        r.setSeriesShapesVisible(series, true);
        r.setSeriesShape(series, shape);
        r.setSeriesPaint(series, paint);
        r.setSeriesShapesFilled(series, filled);
        r.setUseOutlinePaint(false);
    }

    /** A vertical limit line, labelled near the foot of the chart; labels of successive limits are stacked. */
    private static int limit(XYPlot plot, LegendItemCollection legend, double at, DisplayUnits u, String label,
                             Stroke stroke, Paint paint, int row) {
        ValueMarker m = new ValueMarker(u.length(at), paint, stroke);
        m.setLabel(label + " ");
        m.setLabelFont(ChartStyle.font(Font.PLAIN, 11));
        m.setLabelPaint(ChartStyle.LIMIT);
        m.setLabelBackgroundColor(ChartStyle.LABEL_BACKGROUND);
        m.setLabelAnchor(RectangleAnchor.BOTTOM_LEFT);
        m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
        m.setLabelOffset(new RectangleInsets(2, 2, 4 + 16 * row, 2));
        plot.addDomainMarker(m, Layer.FOREGROUND);
        legend.add(ChartStyle.lineItem(label.contains(",") ? label.substring(0, label.indexOf(',')) : label, stroke,
                paint));
        return row + 1;
    }

    /** Caption text for the figure. */
    static String caption(ReportData r, ReportDesign d) {
        DisplayUnits u = r.display();
        List<String> parts = new ArrayList<>();
        parts.add("Spring force (" + u.forceUnit() + ") against deflection from free length (" + u.lengthUnit()
                + ") for design " + d.rank() + "; the top axis gives the spring's length (" + u.lengthUnit() + ").");
        parts.add((r.arrest() ? "The shaded area is the energy the spring takes up while stopping the load, "
                : "The shaded area is the energy stored when cocked, ") + sig(d.workingEnergy()) + " J.");
        if (!Double.isNaN(r.forceLimit()) && !forceLimitDrawn(r, d)) {
            parts.add("The force limit, " + u.forceWithUnit(r.forceLimit()) + ", lies far above the chart.");
        }
        return String.join(" ", parts);
    }
}
