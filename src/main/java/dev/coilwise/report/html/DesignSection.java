package dev.coilwise.report.html;

import static dev.coilwise.report.DisplayUnits.fmt;
import static dev.coilwise.report.DisplayUnits.sig;

import dev.coilwise.model.Gravity;
import dev.coilwise.report.DisplayUnits;
import java.util.ArrayList;
import java.util.List;

/**
 * One shortlisted design: what to order, its working figures, its force–deflection chart and its margins. Each design
 * starts a new page in print. Charts that only some designs have (a simulated time history) are added in
 * {@link #optionalFigures}.
 */
final class DesignSection {
    private DesignSection() {
    }

    /** A labelled figure of the facts tables. */
    record Fact(String label, String value) {
    }

    static String heading(ReportDesign d) {
        return "Design " + d.rank() + ": " + d.material() + (d.materialStandard().isEmpty() ? "" : " (" + d.materialStandard() + ")")
                + ", " + d.ends() + " ends";
    }

    static List<Fact> geometry(ReportData r, ReportDesign d) {
        DisplayUnits u = r.display();
        ReportDesign.Geometry g = d.geometry();
        String wire = u.us() ? fmt("%.4f in", u.length(g.wireDiameter())) : fmt("%.2f mm", u.length(g.wireDiameter()));
        List<Fact> f = new ArrayList<>();
        f.add(new Fact("wire diameter d", wire));
        f.add(new Fact("mean coil diameter D", u.lenWithUnit(g.meanDiameter())));
        f.add(new Fact("outer / inner diameter", u.len(g.outerDiameter()) + " / " + u.lenWithUnit(g.innerDiameter())));
        f.add(new Fact("spring index C = D/d", fmt("%.2f", g.index())));
        f.add(new Fact("active / total coils", fmt("%.2f / %.2f", g.activeCoils(), g.totalCoils())));
        f.add(new Fact("free length L0", u.lenWithUnit(g.freeLength())));
        f.add(new Fact("solid length Ls", u.lenWithUnit(g.solidLength())));
        f.add(new Fact("pitch p", u.lenWithUnit(g.pitch())));
        f.add(new Fact("rate k", sig(u.rate(d.working().rate())) + " " + u.rateUnit()));
        f.add(new Fact("spring mass", sig(u.springMass(d.working().mass())) + " " + u.springMassUnit()));
        return f;
    }

    static List<Fact> working(ReportData r, ReportDesign d) {
        DisplayUnits u = r.display();
        ReportDesign.Working w = d.working();
        List<Fact> f = new ArrayList<>();
        if (w.preloadForce() > 0) {
            f.add(new Fact("preload at installed length", u.forceWithUnit(w.preloadForce()) + " at "
                    + u.lenWithUnit(w.preloadDeflection()) + " deflection"));
        }
        if (r.arrest()) {
            f.add(new Fact("max. compression from contact", u.lenWithUnit(w.workingDeflection())));
            f.add(new Fact("peak force", u.forceWithUnit(w.peakForce())));
            f.add(new Fact("peak deceleration", sig(w.peakDeceleration() / Gravity.STANDARD) + " gn"));
            f.add(new Fact("stress at peak / allowable", fmt("%.0f", u.stress(w.stressAtWorking())) + " / "
                    + u.stressWithUnit(w.allowableStress())));
        } else {
            f.add(new Fact("cocked compression", u.lenWithUnit(w.workingDeflection())));
            f.add(new Fact("cocking force", u.forceWithUnit(w.peakForce())));
            f.add(new Fact("exit speed", sig(u.speed(w.speed())) + " " + u.speedUnit()));
            f.add(new Fact("apex rise above the muzzle", u.lenWithUnit(w.predictedHeight())));
            f.add(new Fact("stress when cocked / allowable", fmt("%.0f", u.stress(w.stressAtWorking())) + " / "
                    + u.stressWithUnit(w.allowableStress())));
        }
        f.add(new Fact("stress at solid", u.stressWithUnit(w.stressAtSolid())));
        f.add(new Fact("tensile strength Sut", u.stressWithUnit(w.tensileStrength())));
        f.add(new Fact("outer diameter at solid", u.lenWithUnit(w.outerDiameterAtSolid())));
        f.add(new Fact("buckling deflection", Double.isInfinite(w.criticalDeflection()) ? "none (stable)"
                : u.lenWithUnit(w.criticalDeflection())));
        f.add(new Fact("natural frequency (fixed ends)", sig(w.naturalFrequency()) + " Hz"));
        f.add(new Fact("surge speed limit", sig(u.speed(w.surgeSpeedLimit())) + " " + u.speedUnit()));
        return f;
    }

    static void write(Html h, ReportData r, ReportDesign d) {
        String id = "design-" + d.rank();
        h.open("section", "class=\"design\" id=\"" + id + "\"");
        h.el("h2", heading(d));
        h.open("div", "class=\"facts\"");
        facts(h, "What to order", geometry(r, d));
        facts(h, "Working figures (massless energy balance)", working(r, d));
        h.close("div");
        h.figure("force-deflection", ForceDeflectionChart.svg(r, d, id + "-fd"), ForceDeflectionChart.caption(r, d));
        h.figure("margins", MarginChart.svg(r, d, id + "-margins"), MarginChart.caption(r, d));
        optionalFigures(h, r, d, id);
        h.close("section");
    }

    /** The charts a design has only when their data was saved. */
    static void optionalFigures(Html h, ReportData r, ReportDesign d, String id) {
        // A simulated time history (designs[i].time_history) is drawn here once dev.coilwise.dynamics provides one.
    }

    private static void facts(Html h, String title, List<Fact> facts) {
        h.open("table", "class=\"facts-table\"");
        h.el("caption", title);
        h.open("tbody");
        for (Fact f : facts) {
            h.raw("<tr><th scope=\"row\">").text(f.label()).raw("</th><td>").text(f.value()).raw("</td></tr>\n");
        }
        h.close("tbody").close("table");
    }
}
