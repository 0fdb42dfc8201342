package dev.coilwise.report;

import dev.coilwise.model.Spring;
import dev.coilwise.tolerance.TestPoint;
import java.util.ArrayList;
import java.util.List;

/**
 * The force–deflection diagram of a specification sheet, in display units: the spring's line from free length to
 * solid, and the test points with their tolerance bars.
 *
 * @param xLabel          axis title, e.g. "Deflection (mm)"
 * @param yLabel          axis title, e.g. "Force (N)"
 * @param xMax            end of the deflection axis
 * @param yMax            end of the force axis
 * @param xTicks          tick values of the deflection axis
 * @param yTicks          tick values of the force axis
 * @param solidDeflection deflection to solid
 * @param solidForce      force at solid
 * @param markers         test points
 */
public record ForceDiagram(String xLabel, String yLabel, double xMax, double yMax, List<Double> xTicks,
                           List<Double> yTicks, double solidDeflection, double solidForce, List<Marker> markers) {

    /** A marked point with a ± force tolerance bar. */
    public record Marker(String label, double x, double y, double yTolerance) {
    }

    public ForceDiagram {
        xTicks = List.copyOf(xTicks);
        yTicks = List.copyOf(yTicks);
        markers = List.copyOf(markers);
    }

    static ForceDiagram of(Spring s, List<TestPoint> points, SheetUnits u) {
        double xs = u.lengthValue(s.deflectionToSolid());
        double fs = u.forceValue(s.forceAt(s.deflectionToSolid()));
        double xTick = niceStep(xs * 1.05 / 5);
        double yTick = niceStep(fs * 1.05 / 5);
        double xMax = Math.ceil(xs * 1.05 / xTick) * xTick;
        double yMax = Math.ceil(fs * 1.05 / yTick) * yTick;
        List<Marker> markers = new ArrayList<>();
        for (TestPoint p : points) {
            markers.add(new Marker(p.name(), u.lengthValue(p.deflection()), u.forceValue(p.force()), u.forceValue(p.forceTolerance())));
        }
        return new ForceDiagram("Deflection (" + u.lengthUnit() + ")", "Force (" + u.forceUnit() + ")", xMax, yMax,
                ticks(xMax, xTick), ticks(yMax, yTick), xs, fs, markers);
    }

    /** 1, 2 or 5 times a power of ten, at least {@code raw}. */
    static double niceStep(double raw) {
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * p >= raw * (1 - 1e-9)) {
                return m * p;
            }
        }
        return 10 * p;
    }

    private static List<Double> ticks(double max, double step) {
        List<Double> t = new ArrayList<>();
        for (int i = 0; i * step <= max * (1 + 1e-9); i++) {
            t.add(i * step);
        }
        return t;
    }
}
