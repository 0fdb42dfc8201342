package dev.coilwise.report;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.search.NearMiss;
import dev.coilwise.search.ShortlistEntry;
import dev.coilwise.search.SizingResult;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** The terminal view of a sizing: what was asked, the shortlist as an aligned table, notes and the caution. */
public final class ShortlistTable {
    private ShortlistTable() {
    }

    /** What failing each limit means, for the diagnosis. */
    static final Map<String, String> LIMIT_WORDS = Map.ofEntries(
            Map.entry("stroke", "compress further than limits.stroke"),
            Map.entry("peak_force", "exceed limits.peak_force"),
            Map.entry("deceleration", "exceed limits.deceleration"),
            Map.entry("coil_bind", "close solid before the end of the stroke (with the clash allowance)"),
            Map.entry("stress_working", "are over-stressed at the working deflection"),
            Map.entry("stress_solid", "are over-stressed when compressed solid (spring.solid_safe)"),
            Map.entry("fit_bore", "grow too wide for envelope.bore at solid"),
            Map.entry("fit_rod", "are too tight on envelope.rod"),
            Map.entry("free_length", "are longer than envelope.max_free_length"),
            Map.entry("pocket", "are shorter than envelope.pocket_length"),
            Map.entry("buckling", "buckle unguided"),
            Map.entry("surge", "meet the load faster than a wave can travel along the coils (surge)"),
            Map.entry("index", "fall outside spring.index"),
            Map.entry("active_coils", "fall outside spring.active_coils"),
            Map.entry("fatigue", "fall short of spring.fatigue_margin"),
            Map.entry("min_probability", "fall short of ranking.min_probability under manufacturing scatter"),
            Map.entry("dynamics", "break a limit in the time-domain simulation (ranking.dynamics: strict)"));

    /** Keys of the ranking rules that can empty a shortlist after the search found feasible designs. */
    private static final java.util.Set<String> RANKING_RULES = java.util.Set.of("min_probability", "dynamics");

    public static String write(SizingResult r, DisplayUnits u) {
        StringBuilder sb = new StringBuilder();
        sb.append(summary(r.requirement(), u)).append('\n');
        int mats = r.search().space().materials().size();
        int ends = r.search().space().ends().size();
        sb.append(DisplayUnits.fmt("searched %d families (%d material%s, %d end type%s, %d wire sizes); %d candidates"
                        + " evaluated; %d families have a feasible design%n",
                r.search().space().families().size(), mats, mats == 1 ? "" : "s", ends, ends == 1 ? "" : "s",
                r.search().space().wireDiameters().size(), r.search().evaluated(), r.search().best().size()));
        if (r.feasible()) {
            sb.append('\n').append(table(r, u));
        } else {
            boolean byRanking = r.diagnosis().map(d -> !d.removedBy().isEmpty()
                    && RANKING_RULES.containsAll(d.removedBy().keySet())).orElse(false);
            sb.append('\n').append(byRanking ? "NO FEASIBLE DESIGN: the search found designs that meet every limit,"
                    + " but the ranking rules removed all the leading ones.\n"
                    : "NO FEASIBLE DESIGN: no spring on the grid meets every limit.\n");
            r.diagnosis().ifPresent(d -> {
                if (!d.conflicts().isEmpty()) {
                    sb.append("No spring can meet these limits, whatever its material, size or ends (work-energy balance):\n");
                    d.conflicts().forEach(c -> sb.append("  ").append(LimitConflictWords.describe(c, r.requirement(), u))
                            .append('\n'));
                }
                StrengthBoundWords.shown(d, r.requirement()).ifPresent(b -> sb.append(b.beyondCapacity()
                        ? "No spring in the design space is strong enough (work-energy balance and wire strength):\n"
                        : "Work-energy balance:\n").append("  ").append(StrengthBoundWords.describe(b, r.requirement(), u))
                        .append('\n'));
                if (r.search().evaluated() == 0) {
                    sb.append("The search's bounds ruled out every candidate before evaluating one; the diagnosis samples"
                            + " the design space instead.\n");
                }
                if (byRanking) {
                    sb.append("Rules that removed the ").append(d.sampled()).append(" leading designs (the notes below"
                            + " say why each left):\n");
                } else {
                    sb.append("Limits that removed the sampled candidates (").append(d.sampled())
                            .append(" sampled; a candidate may fail several):\n");
                }
                for (Map.Entry<String, Long> en : d.removedBy().entrySet()) {
                    sb.append(DisplayUnits.fmt("  %-16s %7d  %s%n", en.getKey(), en.getValue(), LIMIT_WORDS.getOrDefault(
                            en.getKey(), "")));
                }
                if (d.nearest().isEmpty() && d.removedBy().size() > 1) {
                    List<String> leading = d.removedBy().keySet().stream().limit(2).toList();
                    sb.append("No sampled design fails only one limit: relax the leading ones together (")
                            .append(String.join(" and ", leading)).append(").\n");
                }
                if (!d.nearest().isEmpty()) {
                    sb.append("Nearest misses (each fails one limit):\n");
                    for (NearMiss m : d.nearest()) {
                        Spring s = m.evaluation().spring();
                        sb.append("  ").append(s.material().key()).append(' ').append(s.ends().key())
                                .append(" d ").append(u.wireWithUnit(s.wireDiameter())).append(", OD ")
                                .append(u.lenWithUnit(s.outerDiameter())).append(": ")
                                .append(Relaxation.describe(m.violated(), r.requirement(), u)).append('\n');
                    }
                }
            });
        }
        r.shortlist().stream().filter(en -> en.candidate().isStock()).forEach(en -> {
            var p = en.candidate().stock().get();
            sb.append(en.rank()).append("S = stock part ").append(p.partNumber()).append(" from ").append(p.supplier())
                    .append(DisplayUnits.fmt(", %.2f %s each", p.unitPrice(), p.currency())).append('\n');
        });
        if (r.shortlist().stream().anyMatch(en -> en.simulation().isPresent())) {
            sb.append("sim dev: largest difference of the time-domain simulation (a spring with mass) from the energy"
                    + " balance; 'clash' = coils touched during the event.\n");
        }
        r.shortlist().stream().filter(en -> en.scatter().isPresent()).findFirst().ifPresent(en -> sb.append(
                DisplayUnits.fmt("P ok: share of %d springs made to EN 15800 grade %d tolerances (seeded Monte Carlo)"
                        + " that still meet every limit.%n", en.scatter().get().samples(),
                        r.requirement().spring().toleranceGrade())));
        if (r.shortlist().stream().anyMatch(en -> en.scatter().map(sc -> sc.probabilityOk() < 0.5).orElse(false))
                && r.requirement().ranking().minProbability().isEmpty()) {
            sb.append("Designs ranked first sit on their binding limit, so many springs made to tolerance miss it: for"
                    + " margin, rank by robustness (ranking.by: robustness) or set ranking.min_probability.\n");
        }
        if (!r.warnings().isEmpty()) {
            sb.append("\nNotes:\n");
            r.warnings().forEach(w -> sb.append("  - ").append(w).append('\n'));
        }
        sb.append('\n').append(Caution.TEXT).append('\n');
        return sb.toString();
    }

    /** One paragraph restating the requirement in plain words. */
    public static String summary(Requirement req, DisplayUnits u) {
        StringBuilder sb = new StringBuilder();
        sb.append(req.title().isBlank() ? "(untitled requirement)" : req.title()).append('\n');
        if (req.job() instanceof Arrest a) {
            sb.append("Arrest ").append(DisplayUnits.sig(u.loadMass(a.mass()))).append(' ').append(u.loadMassUnit())
                    .append(" meeting the spring at ").append(DisplayUnits.sig(u.speed(a.contactSpeed()))).append(' ')
                    .append(u.speedUnit());
            if (!Double.isNaN(a.dropHeight())) {
                sb.append(" (a ").append(u.lenWithUnit(a.dropHeight())).append(" drop)");
            }
            sb.append(", moving ").append(DisplayUnits.fmt("%.0f", Math.toDegrees(a.angle())))
                    .append(" deg below horizontal");
            if (a.driveForce() > 0) {
                sb.append(", pushed by ").append(u.forceWithUnit(a.driveForce()));
            }
            sb.append(", within ").append(u.lenWithUnit(req.limits().stroke())).append(" of stroke");
        } else {
            Launch l = (Launch) req.job();
            sb.append("Launch ").append(DisplayUnits.sig(u.loadMass(l.mass()))).append(' ').append(u.loadMassUnit())
                    .append(" to rise ").append(u.lenWithUnit(l.height())).append(" above the muzzle at ")
                    .append(DisplayUnits.fmt("%.0f", Math.toDegrees(l.angle()))).append(" deg, losing ")
                    .append(DisplayUnits.fmt("%.0f", l.losses() * 100)).append(" % of the stored energy, cocked within ")
                    .append(u.lenWithUnit(req.limits().stroke()));
        }
        req.limits().peakForce().ifPresent(f -> sb.append("; force at most ").append(u.forceWithUnit(f)));
        req.limits().deceleration().ifPresent(a -> sb.append("; deceleration at most ")
                .append(DisplayUnits.sig(DisplayUnits.gn(a))).append(" gn"));
        req.envelope().bore().ifPresent(b -> sb.append("; in a ").append(u.lenWithUnit(b)).append(" bore"));
        req.envelope().rod().ifPresent(b -> sb.append("; over a ").append(u.lenWithUnit(b)).append(" rod"));
        req.envelope().pocketLength().ifPresent(b -> sb.append("; installed in a ").append(u.lenWithUnit(b))
                .append(" pocket"));
        req.envelope().maxFreeLength().ifPresent(b -> sb.append("; free length at most ").append(u.lenWithUnit(b)));
        sb.append(". Ranked by ").append(req.ranking().by().key().replace('_', ' ')).append('.');
        return sb.toString();
    }

    static String table(SizingResult r, DisplayUnits u) {
        boolean arrest = r.requirement().isArrest();
        String l = u.lengthUnit();
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"#", "material", "ends", "d " + l, "OD " + l, "Na", "L0 " + l, "Ls " + l,
            "rate " + u.rateUnit(), (arrest ? "x_max " : "x_cock ") + l, (arrest ? "F_peak " : "F_cock ") + u.forceUnit(),
            arrest ? "decel gn" : "H " + l, "mass " + u.springMassUnit(), "P ok", "sim dev", "binding limit"});
        for (ShortlistEntry en : r.shortlist()) {
            Evaluation e = en.evaluation();
            Spring s = e.spring();
            rows.add(new String[] {en.rank() + (en.candidate().isStock() ? "S" : ""), s.material().key(), s.ends().key(),
                u.us() ? DisplayUnits.fmt("%.4f", u.length(s.wireDiameter())) : DisplayUnits.fmt("%.2f", u.length(s.wireDiameter())),
                u.len(s.outerDiameter()), DisplayUnits.fmt("%.2f", s.activeCoils()), u.len(s.freeLength()),
                u.len(s.solidLength()), DisplayUnits.sig(u.rate(e.rate())), u.len(e.workingDeflection()),
                DisplayUnits.sig(u.force(e.peakForce())),
                arrest ? DisplayUnits.sig(DisplayUnits.gn(e.peakDeceleration())) : u.len(e.predictedHeight()),
                DisplayUnits.sig(u.springMass(e.mass())),
                en.scatter().map(sc -> DisplayUnits.fmt("%.1f%%", sc.probabilityOk() * 100)).orElse("-"),
                en.simulation().map(sim -> DisplayUnits.fmt("%+.1f%%", sim.deviationPct())
                        + (sim.coilClash() ? " clash" : "")).orElse("-"),
                e.binding().map(b -> b.key() + " " + DisplayUnits.fmt("%+.1f%%", b.value() * 100)).orElse("")});
        }
        int[] w = new int[rows.get(0).length];
        for (String[] row : rows) {
            for (int i = 0; i < row.length; i++) {
                w[i] = Math.max(w[i], row[i].length());
            }
        }
        StringBuilder sb = new StringBuilder();
        for (String[] row : rows) {
            StringBuilder line = new StringBuilder();
            for (int i = 0; i < row.length; i++) {
                boolean left = i == 1 || i == 2 || i == row.length - 1;
                String cell = left ? String.format("%-" + w[i] + "s", row[i]) : String.format("%" + w[i] + "s", row[i]);
                line.append(cell).append(i < row.length - 1 ? "  " : "");
            }
            sb.append(line.toString().stripTrailing()).append('\n');
        }
        return sb.toString();
    }
}
