package dev.coilwise.report.html;

import static dev.coilwise.report.DisplayUnits.fmt;

import dev.coilwise.report.DisplayUnits;
import java.util.Map;

/**
 * Why nothing was feasible: the limits that removed the sampled candidates, and the nearest misses with what would
 * have to be relaxed for each to pass.
 */
final class DiagnosisSection {
    private DiagnosisSection() {
    }

    static void write(Html h, ReportData r) {
        h.open("section", "id=\"diagnosis\"");
        h.el("h2", "Why no design is feasible");
        if (r.diagnosis().isEmpty()) {
            h.el("p", "This shortlist holds no design and no diagnosis.");
            h.close("section");
            return;
        }
        ReportDiagnosis d = r.diagnosis().get();
        DisplayUnits u = r.display();
        if (!d.conflicts().isEmpty()) {
            h.el("p", "No spring can meet these limits, whatever its material, size or ends (work-energy balance):");
            h.open("ul", "class=\"conflicts\"");
            d.conflicts().forEach(c -> h.el("li", c.advice()));
            h.close("ul");
        }
        d.strength().ifPresent(s -> {
            h.el("p", s.strongEnough() ? "Work-energy balance:"
                    : "No spring in the design space is strong enough (work-energy balance and wire strength):");
            h.open("ul", "class=\"strength\"");
            h.el("li", s.advice());
            h.close("ul");
        });
        boolean byRanking = !d.removedBy().isEmpty() && LimitNames.RANKING_RULES.containsAll(d.removedBy().keySet());
        if (byRanking) {
            h.el("p", "The search found feasible designs, but the ranking rules below removed all " + d.sampled()
                    + " leading ones. Relax the rule, or widen the design space so that more designs reach it.");
        } else {
            h.el("p", "No spring on the searched grid meets every limit. To explain why, coilwise sampled "
                    + d.sampled() + " candidates across every family and counted the limits each one fails (a"
                    + " candidate may fail several)." + (r.search().evaluated() == 0 ? " The search's bounds had"
                    + " ruled out every candidate before evaluating one." : ""));
        }
        h.open("table", "class=\"sortable removed\"");
        h.el("caption", byRanking ? "Rules that removed the leading designs" : "Limits that removed the sampled candidates");
        h.raw("<thead><tr><th scope=\"col\">Limit</th><th scope=\"col\">Candidates failing it</th>"
                + "<th scope=\"col\">Share of those sampled<span class=\"unit\">%</span></th></tr></thead>\n");
        h.open("tbody");
        for (Map.Entry<String, Long> e : d.removedBy().entrySet()) {
            double share = d.sampled() == 0 ? 0 : 100.0 * e.getValue() / d.sampled();
            h.raw("<tr><td>").text(LimitNames.of(e.getKey(), r.arrest())).raw("</td>");
            h.raw("<td class=\"num\" data-v=\"" + e.getValue() + "\">").text(String.valueOf(e.getValue()))
                    .raw("</td>");
            h.raw("<td class=\"num\" data-v=\"" + share + "\">").text(share < 10 ? fmt("%.1f", share) : fmt("%.0f", share)).raw("</td></tr>\n");
        }
        h.close("tbody").close("table");
        java.util.List<String> left = r.warnings().stream().filter(w -> w.contains("left the shortlist")).toList();
        if (byRanking && !left.isEmpty()) {
            h.el("p", "Why they left the shortlist:");
            h.open("ul", "class=\"left\"");
            left.forEach(w -> h.el("li", w));
            h.close("ul");
        }
        h.el("h3", "Nearest misses");
        if (d.nearest().isEmpty()) {
            h.el("p", byRanking ? "None: the designs were removed by a ranking rule, not by a limit."
                    : "No sampled design fails a single limit only: several limits would have to be relaxed at once.");
        } else {
            h.el("p", "Designs that fail one limit only, smallest shortfall first, and what would let each pass.");
            String l = u.lengthUnit();
            h.open("table", "class=\"sortable misses\"");
            h.raw("<thead><tr><th scope=\"col\">Material</th><th scope=\"col\">Ends</th>"
                    + "<th scope=\"col\">Wire dia. d<span class=\"unit\">" + l + "</span></th>"
                    + "<th scope=\"col\">Outer dia. OD<span class=\"unit\">" + l + "</span></th>"
                    + "<th scope=\"col\">Active coils Na</th>"
                    + "<th scope=\"col\">Free length L0<span class=\"unit\">" + l + "</span></th>"
                    + "<th scope=\"col\">Fails</th><th scope=\"col\">Short by<span class=\"unit\">%</span></th>"
                    + "<th scope=\"col\">What would let it pass</th></tr></thead>\n");
            h.open("tbody");
            for (ReportDiagnosis.Miss m : d.nearest()) {
                h.raw("<tr><td>").text(m.material()).raw("</td><td>").text(m.ends()).raw("</td>");
                num(h, u.us() ? fmt("%.4f", u.length(m.wireDiameter())) : fmt("%.2f", u.length(m.wireDiameter())),
                        u.length(m.wireDiameter()));
                num(h, u.len(m.outerDiameter()), u.length(m.outerDiameter()));
                num(h, fmt("%.2f", m.activeCoils()), m.activeCoils());
                num(h, u.len(m.freeLength()), u.length(m.freeLength()));
                h.raw("<td>").text(LimitNames.of(m.fails(), r.arrest())).raw("</td>");
                num(h, fmt("%.1f", m.shortfall() * 100), m.shortfall() * 100);
                h.raw("<td>").text(m.wouldPassIf()).raw("</td></tr>\n");
            }
            h.close("tbody").close("table");
        }
        h.close("section");
    }

    private static void num(Html h, String text, double v) {
        h.raw("<td class=\"num\" data-v=\"" + v + "\">").text(text).raw("</td>");
    }
}
