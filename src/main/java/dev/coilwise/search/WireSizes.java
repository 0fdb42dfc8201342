package dev.coilwise.search;

import dev.coilwise.model.WireSeries;
import java.util.ArrayList;
import java.util.List;

/** Preferred wire diameters the search draws from, in m, ascending. */
public final class WireSizes {

    /**
     * ISO 3 R40 series of preferred numbers, one decade (1.00 to 9.50); the metric series is this decade scaled to
     * 0.1–0.95 mm, 1.0–9.5 mm and 10–12.5 mm. Source: ISO 3:1973 "Preferred numbers — Series of preferred numbers",
     * R40 basic series (from memory; the same values are printed in most handbooks' preferred-size tables).
     */
    static final double[] R40_DECADE = {1.00, 1.06, 1.12, 1.18, 1.25, 1.32, 1.40, 1.50, 1.60, 1.70, 1.80, 1.90, 2.00,
        2.12, 2.24, 2.36, 2.50, 2.65, 2.80, 3.00, 3.15, 3.35, 3.55, 3.75, 4.00, 4.25, 4.50, 4.75, 5.00, 5.30, 5.60, 6.00,
        6.30, 6.70, 7.10, 7.50, 8.00, 8.50, 9.00, 9.50};

    /**
     * Washburn &amp; Moen (US Steel Wire) gauge diameters, in, gauge 30 up to gauge 7/0. Source: the gauge table as
     * printed in Budynas &amp; Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Table A-28 (from memory).
     */
    static final double[] WASHBURN_MOEN_IN = {0.0140, 0.0150, 0.0162, 0.0173, 0.0181, 0.0204, 0.0230, 0.0258, 0.0286,
        0.0317, 0.0348, 0.0410, 0.0475, 0.0540, 0.0625, 0.0720, 0.0800, 0.0915, 0.1055, 0.1205, 0.1350, 0.1483, 0.1620,
        0.1770, 0.1920, 0.2070, 0.2253, 0.2437, 0.2625, 0.2830, 0.3065, 0.3310, 0.3625, 0.3938, 0.4305, 0.4615, 0.4900};

    private static final List<Double> METRIC = metric();
    private static final List<Double> INCH = inch();

    private WireSizes() {
    }

    /** The preferred diameters of a series, m, ascending. */
    public static List<Double> of(WireSeries series) {
        return series == WireSeries.INCH ? INCH : METRIC;
    }

    private static List<Double> metric() {
        List<Double> out = new ArrayList<>();
        for (double scale : new double[] {0.1, 1.0, 10.0}) {
            for (double r : R40_DECADE) {
                double mm = Math.round(r * scale * 1000) / 1000.0;
                if (mm <= 12.5 + 1e-9) {
                    out.add(mm * 1e-3);
                }
            }
        }
        return List.copyOf(out);
    }

    private static List<Double> inch() {
        List<Double> out = new ArrayList<>();
        for (double in : WASHBURN_MOEN_IN) {
            out.add(in * 0.0254);
        }
        return List.copyOf(out);
    }
}
