package dev.coilwise.report.html;

import static dev.coilwise.report.DisplayUnits.sig;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogarithmicAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;

/**
 * A logarithmic axis ticked at 1, 2 and 5 times each power of ten and labelled in plain numbers (100, 200, 500,
 * 1000), as engineering graph paper is.
 */
final class OneTwoFiveLogAxis extends LogarithmicAxis {
    private static final long serialVersionUID = 1L;
    private static final double[] STEPS = {1, 2, 5};

    OneTwoFiveLogAxis(String label) {
        super(label);
        setStrictValuesFlag(false);
        setAutoRangeNextLogFlag(false);
    }

    /** The 1-2-5 values within [lo, hi]. */
    static List<Double> values(double lo, double hi) {
        List<Double> out = new ArrayList<>();
        if (!(lo > 0) || !(hi >= lo)) {
            return out;
        }
        for (int e = (int) Math.floor(Math.log10(lo)); e <= (int) Math.ceil(Math.log10(hi)); e++) {
            for (double s : STEPS) {
                double v = s * Math.pow(10, e);
                if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) {
                    out.add(v);
                }
            }
        }
        return out;
    }

    @Override
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        boolean vertical = RectangleEdge.isLeftOrRight(edge);
        TextAnchor anchor = vertical ? (edge == RectangleEdge.LEFT ? TextAnchor.CENTER_RIGHT : TextAnchor.CENTER_LEFT)
                : (edge == RectangleEdge.TOP ? TextAnchor.BOTTOM_CENTER : TextAnchor.TOP_CENTER);
        List<NumberTick> ticks = new ArrayList<>();
        for (double v : values(getLowerBound(), getUpperBound())) {
            ticks.add(new NumberTick(TickType.MAJOR, v, sig(v).replaceAll("\\.0+$", ""), anchor, anchor, 0.0));
        }
        return ticks;
    }
}
