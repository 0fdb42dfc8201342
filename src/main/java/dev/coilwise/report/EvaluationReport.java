package dev.coilwise.report;

import dev.coilwise.mechanics.CurvatureFactors;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;

/** The terminal view of one checked spring: geometry, working figures, then every margin with its verdict. */
public final class EvaluationReport {
    private EvaluationReport() {
    }

    public static String write(Requirement req, Evaluation e, DisplayUnits u) {
        Spring s = e.spring();
        boolean arrest = "arrest".equals(e.job());
        StringBuilder sb = new StringBuilder();
        sb.append(ShortlistTable.summary(req, u)).append("\n\n");
        sb.append("Spring: ").append(s.material().name()).append(" (").append(s.material().standard()).append("), ")
                .append(s.ends().key()).append(" ends\n");
        line(sb, "wire diameter d", u.us() ? DisplayUnits.fmt("%.4f in", u.length(s.wireDiameter())) : DisplayUnits.fmt("%.2f mm", u.length(s.wireDiameter())));
        line(sb, "mean / outer / inner diameter", u.len(s.meanDiameter()) + " / " + u.len(s.outerDiameter()) + " / "
                + u.lenWithUnit(s.innerDiameter()));
        line(sb, "index C", DisplayUnits.fmt("%.2f", s.index()));
        line(sb, "Bergstraesser / Wahl factor", DisplayUnits.fmt("%.3f / %.3f", CurvatureFactors.bergstrasser(s.index()),
                CurvatureFactors.wahl(s.index())));
        line(sb, "active / total coils", DisplayUnits.fmt("%.2f / %.2f", s.activeCoils(), s.totalCoils()));
        line(sb, "free / solid length", u.len(s.freeLength()) + " / " + u.lenWithUnit(s.solidLength()));
        line(sb, "pitch", u.lenWithUnit(s.pitch()));
        line(sb, "rate", DisplayUnits.sig(u.rate(e.rate())) + " " + u.rateUnit());
        line(sb, "spring mass", DisplayUnits.sig(u.springMass(e.mass())) + " " + u.springMassUnit());
        line(sb, "tensile strength Sut", u.stressWithUnit(e.tensileStrength()));
        line(sb, "allowable stress", u.stressWithUnit(e.allowableStress()));
        sb.append("\nWorking figures (massless energy balance):\n");
        if (e.preloadForce() > 0) {
            line(sb, "preload", u.forceWithUnit(e.preloadForce()) + " at " + u.lenWithUnit(e.preloadDeflection()));
        }
        if (arrest) {
            line(sb, "max compression from contact", u.lenWithUnit(e.workingDeflection()));
            line(sb, "total deflection", u.lenWithUnit(e.totalDeflection()));
            line(sb, "peak force", u.forceWithUnit(e.peakForce()));
            line(sb, "peak deceleration", DisplayUnits.sig(DisplayUnits.gn(e.peakDeceleration())) + " gn");
            line(sb, "stress at peak", u.stressWithUnit(e.stressAtWorking()));
        } else {
            line(sb, "cocked compression", u.lenWithUnit(e.workingDeflection()));
            line(sb, "cocking force", u.forceWithUnit(e.peakForce()));
            line(sb, "exit speed", DisplayUnits.sig(u.speed(e.speed())) + " " + u.speedUnit());
            line(sb, "apex above muzzle", u.lenWithUnit(e.predictedHeight()));
            line(sb, "stress when cocked", u.stressWithUnit(e.stressAtWorking()));
        }
        line(sb, "stress at solid", u.stressWithUnit(e.stressAtSolid()));
        line(sb, "outer diameter at solid", u.lenWithUnit(e.outerDiameterAtSolid()));
        line(sb, "critical (buckling) deflection", Double.isInfinite(e.criticalDeflection()) ? "none (stable)"
                : u.lenWithUnit(e.criticalDeflection()));
        line(sb, "natural frequency (fixed-fixed)", DisplayUnits.sig(e.naturalFrequency()) + " Hz");
        line(sb, "surge speed limit", DisplayUnits.sig(u.speed(e.surgeSpeedLimit())) + " " + u.speedUnit());
        sb.append("\nMargins (share of each limit to spare; negative = exceeded):\n");
        String binding = e.binding().map(Margin::key).orElse("");
        for (Margin m : e.margins()) {
            String value = Double.isInfinite(m.value()) ? "unbounded" : DisplayUnits.fmt("%+.1f %%", m.value() * 100);
            String verdict = m.holds() ? "ok" : m.hard() ? "FAILS" : "exceeded (reported only)";
            sb.append(DisplayUnits.fmt("  %-16s %12s  %-24s%s", m.key(), value, verdict,
                    m.key().equals(binding) ? "  <- binding" : "").stripTrailing()).append('\n');
            if (!m.holds()) {
                sb.append("      ").append(Relaxation.describe(m, req, u)).append('\n');
            }
        }
        sb.append('\n').append(e.feasible() ? "The spring meets every limit." : "The spring FAILS at least one limit.")
                .append('\n');
        sb.append('\n').append(Caution.TEXT).append('\n');
        return sb.toString();
    }

    private static void line(StringBuilder sb, String label, String value) {
        sb.append(DisplayUnits.fmt("  %-32s %s%n", label, value));
    }
}
