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
 * {@link #optionalFigures}. Stock parts, fatigue, scatter and simulation figures are shown when saved.
 */
final class DesignSection {
    private DesignSection() {
    }

    /** A labelled figure of the facts tables. */
    record Fact(String label, String value) {
    }

    static String heading(ReportDesign d) {
        String what = d.material() + (d.materialStandard().isEmpty() ? "" : " (" + d.materialStandard() + ")") + ", "
                + d.ends() + " ends";
        return "Design " + d.rank() + ": " + d.stock().map(s -> "stock part " + s.partNumber()
                + (s.supplier().isEmpty() ? "" : " from " + s.supplier()) + ", " + what).orElse(what);
    }

    /** Figures from the checks beyond the massless balance: fatigue, manufacturing scatter, simulation. */
    static List<Fact> checks(ReportData r, ReportDesign d) {
        DisplayUnits u = r.display();
        List<Fact> f = new ArrayList<>();
        d.stock().filter(s -> Double.isFinite(s.unitPrice())).ifPresent(s -> f.add(new Fact("unit price",
                fmt("%.2f", s.unitPrice()) + " " + s.currency())));
        if (!Double.isNaN(d.fatigueFactor())) {
            f.add(new Fact("fatigue safety factor", fmt("%.2f", d.fatigueFactor())));
        }
        if (!Double.isNaN(d.probabilityOk())) {
            f.add(new Fact("made to tolerance, share meeting every limit", fmt("%.1f %%", d.probabilityOk() * 100)));
        }
        d.simulation().ifPresent(s -> {
            f.add(new Fact("simulated peak force", u.forceWithUnit(s.peakForce())));
            f.add(new Fact(r.arrest() ? "simulated largest compression" : "simulated cocked compression",
                    u.lenWithUnit(s.maxCompression())));
            f.add(new Fact("simulated peak stress", u.stressWithUnit(s.peakStress())));
            f.add(new Fact("largest difference from the balance", fmt("%.1f %%", s.deviationPct())));
            f.add(new Fact("coil clash", s.coilClash() ? fmt("yes, first at %.2f ms", s.firstClashTime() * 1e3) : "no"));
            if (r.arrest()) {
                f.add(new Fact("time to stop the load", fmt("%.2f ms", s.stopTime() * 1e3)));
                f.add(new Fact("rebound speed", sig(u.speed(s.reboundSpeed())) + " " + u.speedUnit()));
            } else {
                f.add(new Fact("simulated exit speed", sig(u.speed(s.exitSpeed())) + " " + u.speedUnit()));
                f.add(new Fact("simulated apex rise", u.lenWithUnit(s.apex())));
            }
        });
        return f;
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
        List<Fact> checks = checks(r, d);
        if (!checks.isEmpty()) {
            facts(h, d.simulation().map(s -> "Checks: fatigue, scatter, simulation with " + s.masses() + " masses")
                    .orElse("Checks: fatigue and manufacturing scatter"), checks);
        }
        if (!d.testLoads().isEmpty()) {
            facts(h, "Test loads for the spring maker (EN 15800 grade " + d.testLoads().get(0).grade() + ")",
                    d.testLoads().stream().map(t -> new Fact(t.name() + " at length " + r.display().lenWithUnit(t.length()),
                            r.display().forceWithUnit(t.force()) + " \u00b1 " + r.display().forceWithUnit(t.tolerance())))
                            .toList());
        }
        h.close("div");
        d.simulation().ifPresent(s -> {
            if (!s.flags().isEmpty() || !s.notes().isEmpty()) {
                h.open("ul", "class=\"notes\"");
                s.flags().forEach(x -> h.el("li", "Simulation warning: " + x));
                s.notes().forEach(x -> h.el("li", "Simulation note: " + x));
                h.close("ul");
            }
        });
        h.figure("force-deflection", ForceDeflectionChart.svg(r, d, id + "-fd"), ForceDeflectionChart.caption(r, d));
        h.figure("margins", MarginChart.svg(r, d, id + "-margins"), MarginChart.caption(r, d));
        optionalFigures(h, r, d, id);
        h.close("section");
    }

    /** The charts a design has only when their data was saved: the simulated time history. */
    static void optionalFigures(Html h, ReportData r, ReportDesign d, String id) {
        d.simulation().ifPresent(s -> s.history().filter(t -> t.size() > 1).ifPresent(t -> h.figure("history",
                HistoryChart.svg(r, d, t, id + "-history"), HistoryChart.caption(r, d, s))));
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
