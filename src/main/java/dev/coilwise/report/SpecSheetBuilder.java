package dev.coilwise.report;

import dev.coilwise.error.InternalFaultException;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.tolerance.En15800;
import dev.coilwise.tolerance.SpringTolerances;
import dev.coilwise.tolerance.TestPoint;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/** Assembles a {@link SpecSheet}: pure, no I/O. */
final class SpecSheetBuilder {
    private static final String[] GRADE_NAMES = {"fine", "medium", "coarse"};

    private final Spring s;
    private final Evaluation e;
    private final Requirement req;
    private final Order order;
    private final SheetUnits u;
    private final SpringTolerances tol;
    private final List<TestPoint> points;

    SpecSheetBuilder(Spring s, Evaluation e, Requirement req, Order order) {
        if (!e.spring().equals(s)) {
            throw new InternalFaultException("the evaluation given for the specification sheet is of another spring");
        }
        this.s = s;
        this.e = e;
        this.req = req;
        this.order = order;
        this.u = new SheetUnits(req.units());
        this.tol = En15800.of(s, order.grade());
        this.points = TestLoads.of(e, order.grade());
    }

    SpecSheet build() {
        List<SpecSection> sections = List.of(
                new SpecSection("Material", List.of(
                        f("material", "Material", s.material().name() + " to " + s.material().standard()),
                        f("wire_diameter", "Wire diameter d", u.len(s.wireDiameter()) + " " + u.tol(tol.wireDiameter())
                                + " (wire standard)"))),
                new SpecSection("Geometry", geometry()),
                new SpecSection("Test loads (EN 15800 grade " + order.grade() + ")", loads()),
                new SpecSection("Duty and treatment", duty()),
                new SpecSection("Order", List.of(
                        f("quantity", "Quantity", String.format(Locale.ROOT, "%,d pieces", order.quantity())),
                        f("tolerance_grade", "Tolerances", "EN 15800 grade " + order.grade() + " ("
                                + GRADE_NAMES[order.grade() - 1] + ") unless stated otherwise"),
                        f("application", "Application", application()))));
        return new SpecSheet("Compression spring - purchasing specification", subtitle(), sections, points,
                ForceDiagram.of(s, points, u), notes(), Caution.TEXT);
    }

    private List<SpecField> geometry() {
        List<SpecField> g = new ArrayList<>();
        g.add(f("outer_diameter", "Outer diameter De", u.len(s.outerDiameter()) + " " + u.tol(tol.outerDiameter())));
        g.add(f("inner_diameter", "Inner diameter Di", u.len(s.innerDiameter()) + " " + u.tol(tol.innerDiameter())));
        g.add(f("guide", "Guide", guide()));
        g.add(f("free_length", "Free length L0", u.len(s.freeLength()) + " " + u.tol(tol.freeLength())
                + " (reference when F1 and F2 are specified)"));
        g.add(f("active_coils", "Active coils n", coils(s.activeCoils())));
        g.add(f("total_coils", "Total coils nt", coils(s.totalCoils()) + " (reference)"));
        g.add(f("ends", "Ends", ends(s.ends())));
        if (s.ends().ground()) {
            g.add(f("squareness", "Squareness e1 / parallelism e2", "e1 max " + u.len(tol.squareness())
                    + ", e2 max " + u.len(tol.parallelism())));
        }
        g.add(f("helix", "Direction of helix", order.helix().map(h -> h.label() + " (required)")
                .orElse("right-hand, optional (not specified)")));
        g.add(f("solid_length_max", "Solid length Lc", "max " + u.len(En15800.maxSolidLength(s))));
        g.add(f("index", "Spring index D/d", String.format(Locale.ROOT, "%.2f", s.index())));
        return g;
    }

    private List<SpecField> loads() {
        List<SpecField> l = new ArrayList<>();
        for (String name : List.of("F1", "F2")) {
            Optional<TestPoint> p = points.stream().filter(t -> t.name().equals(name)).findFirst();
            String label = "Force " + name + " at length L" + name.charAt(1);
            l.add(f(name, label, p.map(t -> u.force(t.force()) + " " + u.force(t.forceTolerance(), true) + " at L"
                    + name.charAt(1) + " = " + u.len(t.length()) + " (" + (name.equals("F1") ? l1Basis() : l2Basis())
                    + ")").orElse("not testable: the length lies at or below solid")));
        }
        String rate = u.rate(e.rate());
        if (points.size() == 2) {
            double ar = En15800.rateTolerance(s, points.get(0).length(), points.get(1).length(), order.grade());
            rate += " ± " + u.rate(ar) + " (reference; held by F1 and F2)";
        } else {
            rate += " (reference)";
        }
        l.add(f("rate", "Rate R", rate));
        return l;
    }

    private List<SpecField> duty() {
        SpringOptions opt = req.spring();
        List<SpecField> d = new ArrayList<>();
        d.add(f("stress_working", "Max. working stress", u.stress(e.stressAtWorking()) + " corrected, at L2 (allowable "
                + u.stress(e.allowableStress()) + ")"));
        d.add(f("stress_solid", "Stress at solid", u.stress(e.stressAtSolid()) + " corrected"));
        d.add(f("cycles", "Required cycles", opt.cycles().isPresent()
                ? String.format(Locale.ROOT, "%,.0f load cycles between L1 and L2", opt.cycles().getAsDouble())
                : "static duty (fewer than 10,000 cycles)"));
        d.add(f("set_removal", "Set removal", opt.setRemoved() ? "required (presetting to solid)" : "not required"));
        d.add(f("shot_peening", "Shot peening", opt.shotPeened() ? "required" : "not required"));
        d.add(f("surface", "Surface finish / protection", order.surface().isEmpty()
                ? "not specified: maker's standard (state a coating or oil if corrosion matters)" : order.surface()));
        return d;
    }

    private String guide() {
        Envelope env = req.envelope();
        List<String> parts = new ArrayList<>();
        env.bore().ifPresent(b -> parts.add("works in a bore of " + u.len(b)));
        env.rod().ifPresent(r -> parts.add("works over a rod of " + u.len(r)));
        if (parts.isEmpty()) {
            return "unguided (no bore or rod)";
        }
        return String.join("; ", parts) + "; outer diameter at solid " + u.len(e.outerDiameterAtSolid());
    }

    private String l1Basis() {
        return TestLoads.l1IsInstalledLength(e) ? "installed length" : "30 % of the working travel";
    }

    private String l2Basis() {
        return req.job() instanceof Arrest ? "working maximum: peak of the arrest" : "working maximum: cocked";
    }

    private String application() {
        if (req.job() instanceof Arrest a) {
            return "buffer: stops " + u.mass(a.mass()) + " arriving at " + u.speed(a.contactSpeed()) + " within "
                    + u.len(req.limits().stroke());
        }
        Launch l = (Launch) req.job();
        return "launcher: throws " + u.mass(l.mass()) + " " + u.distance(l.height()) + " high";
    }

    private String subtitle() {
        return (req.title().isBlank() ? "" : req.title() + " - ") + application();
    }

    private List<String> notes() {
        List<String> n = new ArrayList<>();
        n.add("F1 and F2 are the acceptance loads. The maker may adjust free length and coils to meet them; L0, nt and"
                + " R are then reference dimensions.");
        n.add("Tolerances by EN 15800 (successor of DIN 2095); computed values are indicative and the standard"
                + " governs. Wire diameter by the wire standard.");
        n.add("Stresses are Bergstrasser-corrected torsional stresses; working stress at L2.");
        if (!e.feasible()) {
            n.add("This design does not meet every limit of the requirement: " + e.violations().stream()
                    .map(Margin::key).collect(Collectors.joining(", ")) + ".");
        }
        n.addAll(tol.notes());
        return n;
    }

    private static String coils(double n) {
        return n == Math.rint(n) ? String.format(Locale.ROOT, "%.0f", n) : String.format(Locale.ROOT, "%.2f", n);
    }

    private static String ends(EndType t) {
        return switch (t) {
            case PLAIN -> "plain, not ground";
            case PLAIN_GROUND -> "plain and ground";
            case CLOSED -> "closed (squared), not ground";
            case CLOSED_GROUND -> "closed (squared) and ground";
        };
    }

    private static SpecField f(String key, String label, String value) {
        return new SpecField(key, label, value);
    }
}
