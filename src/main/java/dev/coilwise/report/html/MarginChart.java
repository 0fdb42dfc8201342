package dev.coilwise.report.html;

import static dev.coilwise.report.DisplayUnits.fmt;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.LineAndShapeRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.ui.Layer;
import org.jfree.data.category.DefaultCategoryDataset;

/**
 * Every margin of one design as a horizontal bar: the share of each limit still to spare, in percent of the limit.
 * The binding limit (the hard limit with least to spare) is filled in the accent colour, outlined heavily and named
 * in its label; limits that are reported only are drawn hollow with a dashed outline. Bars beyond the axis end are cut
 * there, and the label gives the true value.
 */
final class MarginChart {
    static final int WIDTH = 760;
    /** Axis end, %: margins above it are drawn to the end and labelled with their value. */
    static final double AXIS_END = 100;
    private static final Stroke BINDING_OUTLINE = new BasicStroke(2.4f);
    private static final Stroke SOFT_OUTLINE = new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER,
            10f, new float[] {4, 3}, 0f);

    private MarginChart() {
    }

    static int height(ReportDesign d) {
        return 120 + 27 * d.margins().size();
    }

    /** The label of one bar: the limit in words, its margin, and whether it binds or is reported only. */
    static String label(ReportMargin m, boolean binding, boolean arrest) {
        String v = m.unbounded() ? ("buckling".equals(m.key()) ? "stable" : "never reached")
                : fmt("%+.1f %%", m.value() * 100);
        return LimitNames.of(m.key(), arrest) + "  " + v + (binding ? "  (binding)" : m.hard() ? "" : "  (reported)");
    }

    static String svg(ReportData r, ReportDesign d, String id) {
        Optional<ReportMargin> binding = d.binding();
        DefaultCategoryDataset data = new DefaultCategoryDataset();
        DefaultCategoryDataset bindingPoint = new DefaultCategoryDataset();
        String bindingLabel = null;
        List<ReportMargin> shown = d.margins();
        double low = 0;
        List<Paint> fills = new ArrayList<>();
        List<Paint> outlines = new ArrayList<>();
        List<Stroke> strokes = new ArrayList<>();
        for (ReportMargin m : shown) {
            boolean binds = binding.isPresent() && binding.get().key().equals(m.key());
            double pct = m.unbounded() ? AXIS_END : Math.min(AXIS_END, m.value() * 100);
            low = Math.min(low, pct);
            data.addValue(pct, "margin", label(m, binds, r.arrest()));
            bindingPoint.addValue(binds ? Double.valueOf(pct) : null, "binding", label(m, binds, r.arrest()));
            if (binds) {
                bindingLabel = label(m, true, r.arrest());
                fills.add(ChartStyle.ACCENT);
                outlines.add(Color.BLACK);
                strokes.add(BINDING_OUTLINE);
            } else if (!m.hard()) {
                fills.add(Color.WHITE);
                outlines.add(ChartStyle.LIMIT);
                strokes.add(SOFT_OUTLINE);
            } else {
                fills.add(ChartStyle.DESIGN);
                outlines.add(ChartStyle.DESIGN);
                strokes.add(ChartStyle.THIN);
            }
        }
        BarRenderer renderer = new BarRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Paint getItemPaint(int row, int column) {
                return fills.get(column);
            }

            @Override
            public Paint getItemOutlinePaint(int row, int column) {
                return outlines.get(column);
            }

            @Override
            public Stroke getItemOutlineStroke(int row, int column) {
                return strokes.get(column);
            }
        };
        renderer.setBarPainter(new StandardBarPainter());
        renderer.setShadowVisible(false);
        renderer.setDrawBarOutline(true);
        renderer.setMaximumBarWidth(0.7);
        renderer.setItemMargin(0);

        CategoryAxis cats = new CategoryAxis(null);
        cats.setMaximumCategoryLabelWidthRatio(0.42f);
        cats.setCategoryMargin(0.25);
        NumberAxis values = new NumberAxis("margin to the limit (% of the limit; below 0: exceeded)");
        values.setRange(Math.min(-10, Math.floor(low / 10) * 10 - 5), AXIS_END);
        CategoryPlot plot = new CategoryPlot(data, cats, values, renderer);
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        LineAndShapeRenderer marker = new LineAndShapeRenderer(false, true);
        marker.setSeriesShape(0, ChartStyle.diamond(15));
        marker.setSeriesPaint(0, ChartStyle.ACCENT);
        marker.setSeriesOutlinePaint(0, Color.BLACK);
        marker.setSeriesOutlineStroke(0, ChartStyle.THIN);
        marker.setUseOutlinePaint(true);
        marker.setDrawOutlines(true);
        plot.setDataset(1, bindingPoint);
        plot.setRenderer(1, marker);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        plot.addRangeMarker(new ValueMarker(0, Color.BLACK, new BasicStroke(1.5f)), Layer.FOREGROUND);
        LegendItemCollection legend = new LegendItemCollection();
        legend.add(ChartStyle.shapeItem("binding limit (least to spare)", ChartStyle.diamond(13), ChartStyle.ACCENT,
                true));
        legend.add(ChartStyle.areaItem("other limits", ChartStyle.DESIGN));
        if (shown.stream().anyMatch(m -> !m.hard())) {
            legend.add(ChartStyle.shapeItem("reported only, not a hard limit", ChartStyle.square(11), ChartStyle.LIMIT,
                    false));
        }
        plot.setFixedLegendItems(legend);
        JFreeChart chart = new JFreeChart(null, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        ChartStyle.apply(chart);
        cats.setTickLabelFont(ChartStyle.font(Font.PLAIN, 12));
        if (bindingLabel != null) {
            cats.setTickLabelFont(bindingLabel, ChartStyle.font(Font.BOLD, 12));
        }
        return ChartStyle.svg(chart, WIDTH, height(d), id);
    }

    static String caption(ReportData r, ReportDesign d) {
        String binding = d.binding().map(b -> " The binding limit is " + LimitNames.of(b.key(), r.arrest()) + ".")
                .orElse("");
        return "Margins of design " + d.rank() + ": how much of each limit is left to spare, in % of the limit (0 % "
                + "means the design sits exactly on the limit; bars reaching " + fmt("%.0f", AXIS_END)
                + " % may go further, as their labels say)." + binding;
    }
}
