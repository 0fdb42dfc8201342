package dev.coilwise.report.html;

import dev.coilwise.report.DisplayUnits;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
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
 * Spring mass against peak (arrest) or cocking (launch) force across every feasible design family: one hollow circle
 * per family that was not shortlisted (its best design by the ranking criterion), the shortlist as numbered filled
 * squares (stock parts as filled triangles), and the Pareto front of the two figures as a dashed staircase.
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

    /**
     * One plotted design.
     *
     * @param force arrest: peak force; launch: cocking force, N
     * @param mass  spring mass, kg
     * @param rank  shortlist rank, 0 when not shortlisted
     * @param stock whether it is a catalogue part
     */
    record Point(double force, double mass, int rank, boolean stock) {
        boolean finite() {
            return Double.isFinite(force) && Double.isFinite(mass) && force > 0 && mass > 0;
        }
    }

    /** The shortlist (from the designs) and every other feasible family (from the saved family bests). */
    static List<Point> points(ReportData r) {
        List<Point> out = new ArrayList<>();
        for (ReportDesign d : r.designs()) {
            out.add(new Point(d.working().peakForce(), d.working().mass(), d.rank(), d.stock().isPresent()));
        }
        for (FamilyPoint f : r.families()) {
            if (f.shortlistRank() == 0) {
                out.add(new Point(f.peakForce(), f.mass(), 0, false));
            }
        }
        return out.stream().filter(Point::finite).toList();
    }

    static List<Point> front(ReportData r) {
        return ParetoFront.of(points(r), Point::force, Point::mass);
    }

    /** Whether there is something to compare: the saved families besides the shortlist. */
    static boolean drawable(ReportData r) {
        return !r.families().isEmpty() && !points(r).isEmpty();
    }

    static boolean logMass(ReportData r) {
        return ratio(points(r), Point::mass) > LOG_ABOVE;
    }

    static boolean logForce(ReportData r) {
        return ratio(points(r), Point::force) > LOG_ABOVE;
    }

    private static double ratio(List<Point> points, ToDoubleFunction<Point> f) {
        double lo = points.stream().mapToDouble(f).min().orElse(1);
        double hi = points.stream().mapToDouble(f).max().orElse(1);
        return lo > 0 ? hi / lo : 1;
    }

    private static double span(List<Point> points, ToDoubleFunction<Point> f) {
        double lo = points.stream().mapToDouble(f).min().orElse(0);
        double hi = points.stream().mapToDouble(f).max().orElse(1);
        return hi > lo ? hi - lo : Math.max(Math.abs(hi), 1e-9);
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
        List<Point> all = points(r);
        XYSeries others = new XYSeries("others", false);
        XYSeries custom = new XYSeries("shortlist", false);
        XYSeries stock = new XYSeries("stock", false);
        List<String> customLabels = new ArrayList<>();
        List<String> stockLabels = new ArrayList<>();
        ToDoubleFunction<Point> fx = logForce(r) ? p -> Math.log(p.force()) : Point::force;
        ToDoubleFunction<Point> fy = logMass(r) ? p -> Math.log(p.mass()) : Point::mass;
        double spanF = span(all, fx);
        double spanM = span(all, fy);
        List<Point> byRank = new ArrayList<>(all);
        byRank.sort(java.util.Comparator.comparingInt(p -> p.rank() == 0 ? Integer.MAX_VALUE : p.rank()));
        java.util.Set<Point> labelled = new java.util.LinkedHashSet<>();
        for (Point p : byRank) {
            if (p.rank() > 0 && labelled.stream().noneMatch(q -> Math.abs(fx.applyAsDouble(q) - fx.applyAsDouble(p))
                    < CROWDED * spanF && Math.abs(fy.applyAsDouble(q) - fy.applyAsDouble(p)) < CROWDED * spanM)) {
                labelled.add(p);
            }
        }
        // drawn from the last rank to the first, so that the best designs and their labels lie on top
        java.util.Collections.reverse(byRank);
        for (Point p : byRank) {
            double x = u.force(p.force());
            double y = u.springMass(p.mass());
            if (p.rank() == 0) {
                others.add(x, y);
                continue;
            }
            (p.stock() ? stock : custom).add(x, y);
            (p.stock() ? stockLabels : customLabels).add(labelled.contains(p) ? String.valueOf(p.rank()) : "");
        }
        XYSeries stairs = new XYSeries("front", false);
        front(r).forEach(p -> stairs.add(u.force(p.force()), u.springMass(p.mass())));

        XYSeriesCollection points = new XYSeriesCollection();
        points.addSeries(others);
        points.addSeries(custom);
        points.addSeries(stock);
        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        dots.setSeriesShape(0, ChartStyle.circle(8));
        dots.setSeriesPaint(0, ChartStyle.MUTED);
        dots.setSeriesShapesFilled(0, false);
        dots.setSeriesShape(1, ChartStyle.square(10));
        dots.setSeriesPaint(1, ChartStyle.DESIGN);
        dots.setSeriesShape(2, ChartStyle.triangle(12));
        dots.setSeriesPaint(2, ChartStyle.DESIGN);
        dots.setUseOutlinePaint(false);
        dots.setItemLabelAnchorOffset(5);
        for (int s = 1; s <= 2; s++) {
            List<String> labels = s == 1 ? customLabels : stockLabels;
            dots.setSeriesShapesFilled(s, true);
            dots.setSeriesItemLabelsVisible(s, true);
            dots.setSeriesItemLabelGenerator(s, (dataset, series, item) -> labels.get(item));
            dots.setSeriesItemLabelFont(s, ChartStyle.font(Font.BOLD, 11));
            dots.setSeriesItemLabelPaint(s, ChartStyle.LIMIT);
            dots.setSeriesPositiveItemLabelPosition(s, new ItemLabelPosition(ItemLabelAnchor.OUTSIDE3,
                    TextAnchor.CENTER_LEFT));
        }

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
        if (!stock.isEmpty()) {
            legend.add(ChartStyle.shapeItem("shortlisted stock part", ChartStyle.triangle(11), ChartStyle.DESIGN, true));
        }
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
        long others = points(r).stream().filter(p -> p.rank() == 0).count();
        return "Trade-off between spring mass (" + u.springMassUnit() + ") and " + forceName(r) + " ("
                + u.forceUnit() + ")" + scales + ": the " + r.designs().size() + " shortlisted designs, numbered by rank"
                + " where there is room, and " + others + " other feasible families, each shown by its best design"
                + " (one material, end type and wire diameter; best by " + r.rankedBy().replace('_', ' ') + "). On the"
                + " dashed Pareto front no other design is both lighter and lower in force; " + front(r).size()
                + " designs lie on it.";
    }
}
