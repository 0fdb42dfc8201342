package dev.coilwise.report.html;

import dev.coilwise.report.DisplayUnits;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.labels.ItemLabelAnchor;
import org.jfree.chart.labels.ItemLabelPosition;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Spring mass against peak (arrest) or cocking (launch) force across every feasible family: one point per family
 * (its best design by the ranking criterion), the shortlist as numbered filled squares, the others as hollow circles,
 * and the Pareto front of the two figures as a dashed staircase.
 */
final class TradeOffChart {
    static final int WIDTH = 760;
    static final int HEIGHT = 500;

    /** Share of each axis span within which a second rank label would overlap the first and is left out. */
    private static final double CROWDED = 0.035;
    /** Spread (largest over smallest) above which an axis is drawn on a logarithmic scale. */
    private static final double LOG_ABOVE = 6;

    private TradeOffChart() {
    }

    private static double span(List<FamilyPoint> points, java.util.function.ToDoubleFunction<FamilyPoint> f) {
        double lo = points.stream().mapToDouble(f).min().orElse(0);
        double hi = points.stream().mapToDouble(f).max().orElse(1);
        return hi > lo ? hi - lo : Math.max(Math.abs(hi), 1e-9);
    }

    static List<FamilyPoint> plotted(ReportData r) {
        return r.families().stream().filter(p -> Double.isFinite(p.mass()) && Double.isFinite(p.peakForce())).toList();
    }

    static List<FamilyPoint> front(ReportData r) {
        return ParetoFront.of(plotted(r), FamilyPoint::peakForce, FamilyPoint::mass);
    }

    /** Whether the masses span so wide a range that a logarithmic axis shows the crowded end better. */
    static boolean logMass(ReportData r) {
        return ratio(plotted(r), FamilyPoint::mass) > LOG_ABOVE;
    }

    static boolean logForce(ReportData r) {
        return ratio(plotted(r), FamilyPoint::peakForce) > LOG_ABOVE;
    }

    private static double ratio(List<FamilyPoint> points, java.util.function.ToDoubleFunction<FamilyPoint> f) {
        double lo = points.stream().mapToDouble(f).min().orElse(1);
        double hi = points.stream().mapToDouble(f).max().orElse(1);
        return lo > 0 ? hi / lo : 1;
    }

    private static ValueAxis axis(String label, boolean log) {
        if (log) {
            return new OneTwoFiveLogAxis(label + ", log scale");
        }
        NumberAxis a = new NumberAxis(label);
        a.setAutoRangeIncludesZero(false);
        return a;
    }

    static String forceName(ReportData r) {
        return r.arrest() ? "peak force" : "cocking force";
    }

    static String svg(ReportData r, String id) {
        DisplayUnits u = r.display();
        int shortlisted = r.designs().size();
        XYSeries others = new XYSeries("others", false);
        XYSeries top = new XYSeries("shortlist", false);
        List<String> labels = new ArrayList<>();
        List<FamilyPoint> labelled = new ArrayList<>();
        double spanF = span(plotted(r), FamilyPoint::peakForce);
        double spanM = span(plotted(r), FamilyPoint::mass);
        for (FamilyPoint p : plotted(r)) {
            if (p.rank() <= shortlisted) {
                top.add(u.force(p.peakForce()), u.springMass(p.mass()));
                boolean room = labelled.stream().noneMatch(q -> Math.abs(q.peakForce() - p.peakForce()) < CROWDED * spanF
                        && Math.abs(q.mass() - p.mass()) < CROWDED * spanM);
                labels.add(room ? String.valueOf(p.rank()) : "");
                if (room) {
                    labelled.add(p);
                }
            } else {
                others.add(u.force(p.peakForce()), u.springMass(p.mass()));
            }
        }
        XYSeries stairs = new XYSeries("front", false);
        front(r).forEach(p -> stairs.add(u.force(p.peakForce()), u.springMass(p.mass())));

        XYSeriesCollection points = new XYSeriesCollection();
        points.addSeries(others);
        points.addSeries(top);
        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        dots.setSeriesShape(0, ChartStyle.circle(8));
        dots.setSeriesPaint(0, ChartStyle.MUTED);
        dots.setSeriesShapesFilled(0, false);
        dots.setSeriesShape(1, ChartStyle.square(10));
        dots.setSeriesPaint(1, ChartStyle.DESIGN);
        dots.setSeriesShapesFilled(1, true);
        dots.setUseOutlinePaint(false);
        dots.setSeriesItemLabelsVisible(1, true);
        dots.setSeriesItemLabelGenerator(1, (dataset, series, item) -> labels.get(item));
        dots.setSeriesItemLabelFont(1, ChartStyle.font(Font.BOLD, 11));
        dots.setSeriesItemLabelPaint(1, ChartStyle.LIMIT);
        dots.setSeriesPositiveItemLabelPosition(1, new ItemLabelPosition(ItemLabelAnchor.OUTSIDE3,
                TextAnchor.CENTER_LEFT));

        XYStepRenderer step = new XYStepRenderer();
        step.setSeriesPaint(0, ChartStyle.ACCENT);
        step.setSeriesStroke(0, ChartStyle.DASHED);
        step.setDefaultShapesVisible(false);

        ValueAxis x = axis(forceName(r) + " F (" + u.forceUnit() + ")", logForce(r));
        ValueAxis y = axis("spring mass (" + u.springMassUnit() + ")", logMass(r));
        XYPlot plot = new XYPlot(new XYSeriesCollection(stairs), x, y, step);
        plot.setDataset(1, points);
        plot.setRenderer(1, dots);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);

        LegendItemCollection legend = new LegendItemCollection();
        legend.add(ChartStyle.shapeItem("shortlist (rank)", ChartStyle.square(10), ChartStyle.DESIGN, true));
        legend.add(ChartStyle.shapeItem("other feasible families", ChartStyle.circle(8), ChartStyle.MUTED, false));
        legend.add(ChartStyle.lineItem("Pareto front (none lighter at a lower force)", ChartStyle.DASHED,
                ChartStyle.ACCENT));
        plot.setFixedLegendItems(legend);
        JFreeChart chart = new JFreeChart(null, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        ChartStyle.apply(chart);
        return ChartStyle.svg(chart, WIDTH, HEIGHT, id);
    }

    static String caption(ReportData r) {
        DisplayUnits u = r.display();
        String scales = logMass(r) && logForce(r) ? " (both axes logarithmic)" : logMass(r) ? " (mass axis logarithmic)"
                : logForce(r) ? " (force axis logarithmic)" : "";
        return "Trade-off across the " + plotted(r).size() + " feasible families: spring mass in "
                + u.springMassUnit() + " against " + forceName(r) + " in " + u.forceUnit() + scales + ". Each point is the best"
                + " design of one material, end type and wire diameter by " + r.rankedBy().replace('_', ' ')
                + "; the shortlist is drawn as filled squares, numbered by rank where there is room. On the dashed"
                + " Pareto front no other family is both lighter and lower in force; " + front(r).size() + " families lie on it.";
    }
}
