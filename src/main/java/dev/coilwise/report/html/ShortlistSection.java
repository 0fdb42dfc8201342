package dev.coilwise.report.html;

import static dev.coilwise.report.DisplayUnits.fmt;
import static dev.coilwise.report.DisplayUnits.sig;

import dev.coilwise.model.Gravity;
import dev.coilwise.report.DisplayUnits;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * The shortlist as a table, one row per design, in the requirement's units. Every numeric cell carries its plain
 * value in {@code data-v}, which the page's script sorts by when a heading is clicked.
 */
final class ShortlistSection {
    private ShortlistSection() {
    }

    /** One column: heading, unit (may be empty) and the cell of each design. */
    record Column(String heading, String unit, Function<ReportDesign, Cell> cell) {
    }

    /** A cell: its text, and the number to sort by (NaN: sort by text). */
    record Cell(String text, double sortBy) {
        static Cell text(String t) {
            return new Cell(t, Double.NaN);
        }

        static Cell number(String t, double v) {
            return new Cell(t, v);
        }
    }

    static List<Column> columns(ReportData r) {
        DisplayUnits u = r.display();
        String l = u.lengthUnit();
        boolean arrest = r.arrest();
        List<Column> c = new ArrayList<>();
        c.add(new Column("Rank", "", d -> Cell.number(String.valueOf(d.rank()), d.rank())));
        if (r.designs().stream().anyMatch(d -> d.stock().isPresent())) {
            c.add(new Column("Source", "", d -> Cell.text(d.stock().map(s -> "stock " + s.partNumber())
                    .orElse("custom"))));
        }
        c.add(new Column("Material", "", d -> Cell.text(d.material())));
        c.add(new Column("Ends", "", d -> Cell.text(d.ends())));
        c.add(new Column("Wire dia. d", l, d -> len(u, d.geometry().wireDiameter(), true)));
        c.add(new Column("Outer dia. OD", l, d -> len(u, d.geometry().outerDiameter(), false)));
        c.add(new Column("Active coils Na", "", d -> Cell.number(fmt("%.2f", d.geometry().activeCoils()),
                d.geometry().activeCoils())));
        c.add(new Column("Free length L0", l, d -> len(u, d.geometry().freeLength(), false)));
        c.add(new Column("Solid length Ls", l, d -> len(u, d.geometry().solidLength(), false)));
        c.add(new Column("Rate k", u.rateUnit(), d -> num(u.rate(d.working().rate()))));
        c.add(new Column(arrest ? "Max. compression" : "Cocked compression", l,
                d -> len(u, d.working().workingDeflection(), false)));
        c.add(new Column(arrest ? "Peak force" : "Cocking force", u.forceUnit(),
                d -> num(u.force(d.working().peakForce()))));
        if (arrest) {
            c.add(new Column("Peak decel.", "gn", d -> num(d.working().peakDeceleration() / Gravity.STANDARD)));
        } else {
            c.add(new Column("Apex rise", l, d -> len(u, d.working().predictedHeight(), false)));
        }
        c.add(new Column("Spring mass", u.springMassUnit(), d -> num(u.springMass(d.working().mass()))));
        if (r.designs().stream().anyMatch(d -> !Double.isNaN(d.probabilityOk()))) {
            c.add(new Column("Made OK", "%", d -> Double.isNaN(d.probabilityOk()) ? Cell.text("")
                    : Cell.number(fmt("%.1f", d.probabilityOk() * 100), d.probabilityOk() * 100)));
        }
        c.add(new Column("Binding limit", "", d -> Cell.text(d.binding().map(b -> LimitNames.of(b.key(), arrest))
                .orElse(""))));
        c.add(new Column("Margin left", "%", d -> d.binding()
                .map(b -> Cell.number(fmt("%+.1f", b.value() * 100), b.value() * 100)).orElse(Cell.text(""))));
        return c;
    }

    private static Cell num(double v) {
        return Cell.number(sig(v), v);
    }

    private static Cell len(DisplayUnits u, double m, boolean wire) {
        String t = wire ? (u.us() ? fmt("%.4f", u.length(m)) : fmt("%.2f", u.length(m))) : u.len(m);
        return Cell.number(t, u.length(m));
    }

    static void write(Html h, ReportData r) {
        h.open("section", "id=\"shortlist\"");
        h.el("h2", "Shortlist");
        h.el("p", "class=\"hint noprint\"", "Click a column heading to sort the table by it; click again to reverse."
                + " The rank links to the design's own section.");
        List<Column> cols = columns(r);
        h.open("div", "class=\"shortlist-wrap\"");
        h.open("table", "class=\"sortable shortlist\"");
        h.open("thead").open("tr");
        for (Column c : cols) {
            h.raw("<th scope=\"col\">").text(c.heading());
            if (!c.unit().isEmpty()) {
                h.raw("<span class=\"unit\">").text(c.unit()).raw("</span>");
            }
            h.raw("</th>\n");
        }
        h.close("tr").close("thead").open("tbody");
        for (ReportDesign d : r.designs()) {
            h.open("tr", "id=\"row-" + d.rank() + "\"");
            for (int i = 0; i < cols.size(); i++) {
                Cell cell = cols.get(i).cell().apply(d);
                String attrs = Double.isNaN(cell.sortBy()) ? " class=\"text\""
                        : " class=\"num\" data-v=\"" + cell.sortBy() + "\"";
                h.raw("<td" + attrs + ">");
                if (i == 0) {
                    h.raw("<a href=\"#design-" + d.rank() + "\">").text(cell.text()).raw("</a>");
                } else {
                    h.text(cell.text());
                }
                h.raw("</td>\n");
            }
            h.close("tr");
        }
        h.close("tbody").close("table").close("div");
        if (!r.warnings().isEmpty()) {
            h.el("h3", "Notes");
            h.open("ul", "class=\"notes\"");
            r.warnings().forEach(w -> h.el("li", w));
            h.close("ul");
        }
        h.close("section");
    }
}
