package dev.coilwise.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.coilwise.dynamics.DynamicsFlags;
import dev.coilwise.dynamics.SimulationSummary;
import dev.coilwise.dynamics.TimeHistory;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.search.Candidate;
import dev.coilwise.search.Diagnosis;
import dev.coilwise.search.LimitConflict;
import dev.coilwise.search.NearMiss;
import dev.coilwise.search.SearchResult;
import dev.coilwise.search.ShortlistEntry;
import dev.coilwise.search.SizingResult;
import dev.coilwise.tolerance.TestPoint;
import java.io.IOException;
import java.io.UncheckedIOException;

/** Builds {@code shortlist.json}: SI figures with the unit in each key (see docs/formats.md). */
public final class ShortlistJson {
    /** Format version of shortlist.json. */
    public static final int FORMAT = 1;
    /** Most rows of a time history kept in shortlist.json (enough for a chart; the full one is simulate's CSV). */
    public static final int HISTORY_ROWS = 240;

    private ShortlistJson() {
    }

    public static String write(SizingResult r) {
        try {
            return Json.MAPPER.writeValueAsString(tree(r)) + "\n";
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static ObjectNode tree(SizingResult r) {
        ObjectNode root = Json.MAPPER.createObjectNode();
        root.put("format", "coilwise-shortlist");
        root.put("format_version", FORMAT);
        root.put("caution", Caution.TEXT);
        root.set("requirement", requirement(r.requirement()));
        root.set("search", search(r.search()));
        ArrayNode designs = root.putArray("designs");
        for (ShortlistEntry e : r.shortlist()) {
            designs.add(design(e, r.requirement()));
        }
        root.set("feasible_families", families(r));
        if (r.diagnosis().isPresent()) {
            root.set("diagnosis", diagnosis(r.diagnosis().get(), r.requirement()));
        }
        ArrayNode w = root.putArray("warnings");
        r.warnings().forEach(w::add);
        return root;
    }

    static ObjectNode requirement(Requirement req) {
        ObjectNode n = Json.MAPPER.createObjectNode();
        n.put("title", req.title());
        n.put("job", req.job().key());
        n.put("units", req.units().name().toLowerCase(java.util.Locale.ROOT));
        ObjectNode load = n.putObject("load");
        Json.put(load, "mass_kg", req.job().mass());
        if (req.job() instanceof Arrest a) {
            ObjectNode m = n.putObject("motion");
            Json.put(m, "contact_speed_m_per_s", a.contactSpeed());
            Json.put(m, "drop_height_mm", a.dropHeight() * 1e3);
            Json.put(m, "direction_deg_below_horizontal", Math.toDegrees(a.angle()));
            Json.put(m, "drive_force_N", a.driveForce());
        } else {
            Launch l = (Launch) req.job();
            ObjectNode m = n.putObject("launch");
            Json.put(m, "height_mm", l.height() * 1e3);
            Json.put(m, "direction_deg_above_horizontal", Math.toDegrees(l.angle()));
            Json.put(m, "losses_pct", l.losses() * 100);
            Json.put(m, "exit_speed_needed_m_per_s", l.requiredExitSpeed());
        }
        Limits lim = req.limits();
        ObjectNode li = n.putObject("limits");
        Json.put(li, "stroke_mm", lim.stroke() * 1e3);
        Json.put(li, "peak_force_N", lim.peakForce().orElse(Double.NaN));
        Json.put(li, "deceleration_gn", DisplayUnits.gn(lim.deceleration().orElse(Double.NaN)));
        Envelope env = req.envelope();
        ObjectNode en = n.putObject("envelope");
        Json.put(en, "bore_mm", env.bore().orElse(Double.NaN) * 1e3);
        Json.put(en, "rod_mm", env.rod().orElse(Double.NaN) * 1e3);
        if (Double.isNaN(env.clearance().length())) {
            Json.put(en, "clearance_pct", env.clearance().fraction() * 100);
        } else {
            Json.put(en, "clearance_mm", env.clearance().length() * 1e3);
        }
        Json.put(en, "max_free_length_mm", env.maxFreeLength().orElse(Double.NaN) * 1e3);
        Json.put(en, "pocket_length_mm", env.pocketLength().orElse(Double.NaN) * 1e3);
        SpringOptions o = req.spring();
        ObjectNode sp = n.putObject("spring");
        ArrayNode mats = sp.putArray("materials");
        o.materials().forEach(mats::add);
        ArrayNode ends = sp.putArray("ends");
        o.ends().forEach(e -> ends.add(e.key()));
        ArrayNode idx = sp.putArray("index");
        idx.add(Json.num(o.indexMin())).add(Json.num(o.indexMax()));
        ArrayNode coils = sp.putArray("active_coils");
        coils.add(Json.num(o.coilsMin())).add(Json.num(o.coilsMax()));
        Json.put(sp, "clash_allowance_pct", o.clashAllowance() * 100);
        sp.put("solid_safe", o.solidSafe());
        sp.put("set_removed", o.setRemoved());
        sp.put("seating", o.seating().key());
        sp.put("wire_series", req.wireSeries().name().toLowerCase(java.util.Locale.ROOT));
        Json.put(sp, "cycles", o.cycles().orElse(Double.NaN));
        Json.put(sp, "fatigue_margin", o.fatigueMargin());
        sp.put("shot_peened", o.shotPeened());
        sp.put("tolerance_grade", o.toleranceGrade());
        ObjectNode rk = n.putObject("ranking");
        rk.put("by", req.ranking().by().key());
        rk.put("shortlist", req.ranking().shortlist());
        rk.put("prefer", req.ranking().prefer().name().toLowerCase(java.util.Locale.ROOT));
        rk.put("dynamics", req.ranking().dynamicsStrict() ? "strict" : "warn");
        Json.put(rk, "min_probability", req.ranking().minProbability().orElse(Double.NaN));
        return n;
    }

    static ObjectNode search(SearchResult s) {
        ObjectNode n = Json.MAPPER.createObjectNode();
        ArrayNode wires = n.putArray("wire_diameters_mm");
        s.space().wireDiameters().forEach(d -> wires.add(Json.num(d * 1e3)));
        ArrayNode mats = n.putArray("materials");
        s.space().materials().forEach(m -> mats.add(m.key()));
        ArrayNode ends = n.putArray("ends");
        s.space().ends().forEach(e -> ends.add(e.key()));
        n.put("families", s.space().families().size());
        n.put("candidates_evaluated", s.evaluated());
        n.put("feasible", s.feasibleSeen());
        n.put("feasible_families", s.best().size());
        return n;
    }

    /**
     * The best custom design of every family that has a feasible one, in the order of the ranking criterion, with
     * {@code shortlist_rank} on those that made the shortlist: a few figures each, enough to draw the trade-off
     * between families without searching again.
     */
    static ArrayNode families(SizingResult r) {
        java.util.Map<Integer, Integer> shortlisted = new java.util.HashMap<>();
        for (ShortlistEntry e : r.shortlist()) {
            if (!e.candidate().isStock()) {
                shortlisted.put(e.candidate().family().order(), e.rank());
            }
        }
        ArrayNode arr = Json.MAPPER.createArrayNode();
        for (int i = 0; i < r.search().best().size(); i++) {
            Candidate c = r.search().best().get(i);
            Evaluation e = c.evaluation();
            Spring sp = e.spring();
            ObjectNode o = arr.addObject();
            o.put("search_rank", i + 1);
            Integer rank = shortlisted.get(c.family().order());
            if (rank != null) {
                o.put("shortlist_rank", rank);
            }
            o.put("material", sp.material().key());
            o.put("ends", sp.ends().key());
            Json.put(o, "wire_diameter_mm", sp.wireDiameter() * 1e3);
            Json.put(o, "outer_diameter_mm", sp.outerDiameter() * 1e3);
            Json.put(o, "free_length_mm", sp.freeLength() * 1e3);
            Json.put(o, "solid_length_mm", sp.solidLength() * 1e3);
            Json.put(o, "mass_g", e.mass() * 1e3);
            Json.put(o, "arrest".equals(e.job()) ? "peak_force_N" : "cocking_force_N", e.peakForce());
        }
        return arr;
    }

    static ObjectNode design(ShortlistEntry entry, Requirement req) {
        int grade = req.spring().toleranceGrade();
        Evaluation e = entry.evaluation();
        Spring s = e.spring();
        ObjectNode n = Json.MAPPER.createObjectNode();
        n.put("rank", entry.rank());
        n.put("source", entry.candidate().isStock() ? "stock" : "custom");
        entry.candidate().stock().ifPresent(p -> {
            n.put("part_number", p.partNumber());
            n.put("supplier", p.supplier());
            Json.put(n, "unit_price", p.unitPrice());
            n.put("currency", p.currency());
            n.put("pack_quantity", p.packQuantity());
            n.put("catalogue_row", p.source());
            ArrayNode flags = n.putArray("catalogue_flags");
            p.flags().forEach(f -> flags.add(f.toString()));
        });
        n.put("material", s.material().key());
        n.put("material_standard", s.material().standard());
        n.put("ends", s.ends().key());
        Json.put(n, "wire_diameter_mm", s.wireDiameter() * 1e3);
        Json.put(n, "mean_diameter_mm", s.meanDiameter() * 1e3);
        Json.put(n, "outer_diameter_mm", s.outerDiameter() * 1e3);
        Json.put(n, "inner_diameter_mm", s.innerDiameter() * 1e3);
        Json.put(n, "index", s.index());
        Json.put(n, "active_coils", s.activeCoils());
        Json.put(n, "total_coils", s.totalCoils());
        Json.put(n, "free_length_mm", s.freeLength() * 1e3);
        Json.put(n, "solid_length_mm", s.solidLength() * 1e3);
        Json.put(n, "pitch_mm", s.pitch() * 1e3);
        Json.put(n, "rate_N_per_mm", e.rate() * 1e-3);
        Json.put(n, "mass_g", e.mass() * 1e3);
        Json.put(n, "relative_cost", e.cost());
        Json.put(n, "tensile_strength_MPa", e.tensileStrength() * 1e-6);
        Json.put(n, "allowable_stress_MPa", e.allowableStress() * 1e-6);
        Json.put(n, "stress_at_solid_MPa", e.stressAtSolid() * 1e-6);
        Json.put(n, "outer_diameter_at_solid_mm", e.outerDiameterAtSolid() * 1e3);
        Json.put(n, "preload_N", e.preloadForce());
        Json.put(n, "preload_deflection_mm", e.preloadDeflection() * 1e3);
        if ("arrest".equals(e.job())) {
            Json.put(n, "max_compression_mm", e.workingDeflection() * 1e3);
            Json.put(n, "total_deflection_mm", e.totalDeflection() * 1e3);
            Json.put(n, "peak_force_N", e.peakForce());
            Json.put(n, "peak_deceleration_gn", DisplayUnits.gn(e.peakDeceleration()));
            Json.put(n, "stress_at_peak_MPa", e.stressAtWorking() * 1e-6);
            Json.put(n, "contact_speed_m_per_s", e.speed());
        } else {
            Json.put(n, "cocked_compression_mm", e.workingDeflection() * 1e3);
            Json.put(n, "cocking_force_N", e.peakForce());
            Json.put(n, "exit_speed_m_per_s", e.speed());
            Json.put(n, "predicted_height_mm", e.predictedHeight() * 1e3);
            Json.put(n, "stress_at_cocked_MPa", e.stressAtWorking() * 1e-6);
        }
        Json.put(n, "critical_deflection_mm", e.criticalDeflection() * 1e3);
        Json.put(n, "natural_frequency_Hz", e.naturalFrequency());
        Json.put(n, "surge_speed_limit_m_per_s", e.surgeSpeedLimit());
        e.binding().ifPresent(b -> {
            n.put("binding_limit", b.key());
            Json.put(n, "binding_margin_pct", b.value() * 100);
        });
        e.fatigue().ifPresent(f -> {
            ObjectNode fn = n.putObject("fatigue");
            Json.put(fn, "safety_factor", f.safetyFactor());
            fn.put("criterion", f.criterion());
            Json.put(fn, "stress_amplitude_MPa", f.stressAmplitude() * 1e-6);
            Json.put(fn, "stress_mean_MPa", f.stressMean() * 1e-6);
        });
        entry.scatter().ifPresent(sc -> {
            ObjectNode sn = n.putObject("scatter");
            sn.put("samples", sc.samples());
            sn.put("seed", sc.seed());
            Json.put(sn, "probability_ok", sc.probabilityOk());
            ObjectNode p01 = sn.putObject("p01");
            sc.p01().forEach((k, v) -> Json.put(p01, k, v));
            ObjectNode p99 = sn.putObject("p99");
            sc.p99().forEach((k, v) -> Json.put(p99, k, v));
        });
        ArrayNode loads = n.putArray("test_loads");
        for (TestPoint tp : TestLoads.of(e, grade)) {
            ObjectNode t = loads.addObject();
            t.put("name", tp.name());
            Json.put(t, "length_mm", tp.length() * 1e3);
            Json.put(t, "force_N", tp.force());
            Json.put(t, "force_tolerance_N", tp.forceTolerance());
            t.put("grade", tp.grade());
        }
        entry.simulation().ifPresent(sim -> {
            ObjectNode sn = simulation(sim, e, req);
            if (!entry.history().isEmpty()) {
                sn.set("history", history(entry.history()));
            }
            n.set("simulation", sn);
        });
        n.set("margins", margins(e));
        return n;
    }

    /** The simulated figures (SI) and the flags and notes in words, with figures in the requirement's units. */
    static ObjectNode simulation(SimulationSummary sim, Evaluation balance, Requirement req) {
        boolean arrest = "arrest".equals(balance.job());
        ObjectNode s = Json.MAPPER.createObjectNode();
        s.put("masses", sim.masses());
        Json.put(s, "max_compression_mm", sim.maxCompression() * 1e3);
        Json.put(s, "peak_force_N", sim.peakForce());
        Json.put(s, "peak_stress_MPa", sim.peakStress() * 1e-6);
        s.put("coil_clash", sim.coilClash());
        if (sim.coilClash()) {
            Json.put(s, "first_clash_ms", sim.firstClashTime() * 1e3);
            s.put("first_clash_element", sim.firstClashElement());
        }
        Json.put(s, "deviation_pct", sim.deviationPct());
        if (arrest) {
            Json.put(s, "stop_time_ms", sim.stopTime() * 1e3);
            Json.put(s, "rebound_speed_m_per_s", sim.reboundSpeed());
        } else {
            Json.put(s, "exit_speed_m_per_s", sim.exitSpeed());
            Json.put(s, "apex_mm", sim.apex() * 1e3);
        }
        ArrayNode flags = s.putArray("flags");
        DynamicsFlags.warnings(sim, balance, req.job(), req.units()).forEach(flags::add);
        ArrayNode notes = s.putArray("notes");
        DynamicsFlags.notes(sim, req.job(), req.units()).forEach(notes::add);
        return s;
    }

    /**
     * The time history, thinned to at most {@link #HISTORY_ROWS} rows for charts: evenly spaced rows, plus the first
     * and last and the rows of the largest travel and the largest force, so the peaks survive the thinning.
     */
    static ObjectNode history(TimeHistory h) {
        double[] t = h.time();
        double[] x = h.loadPosition();
        double[] f = h.topForce();
        java.util.TreeSet<Integer> rows = new java.util.TreeSet<>();
        int stride = Math.max(1, (int) Math.ceil(t.length / (double) (HISTORY_ROWS - 3)));
        for (int i = 0; i < t.length; i += stride) {
            rows.add(i);
        }
        rows.add(t.length - 1);
        rows.add(argMax(x));
        rows.add(argMax(f));
        ObjectNode n = Json.MAPPER.createObjectNode();
        ArrayNode time = n.putArray("time_ms");
        ArrayNode travel = n.putArray("load_position_mm");
        ArrayNode force = n.putArray("top_force_N");
        for (int i : rows) {
            time.add(Json.num(t[i] * 1e3));
            travel.add(Json.num(x[i] * 1e3));
            force.add(Json.num(f[i]));
        }
        return n;
    }

    private static int argMax(double[] v) {
        int best = 0;
        for (int i = 1; i < v.length; i++) {
            if (v[i] > v[best]) {
                best = i;
            }
        }
        return best;
    }

    static ArrayNode margins(Evaluation e) {
        ArrayNode arr = Json.MAPPER.createArrayNode();
        for (Margin m : e.margins()) {
            ObjectNode mn = arr.addObject();
            mn.put("limit", m.key());
            Json.put(mn, "margin_pct", m.value() * 100);
            mn.put("hard", m.hard());
            mn.put("holds", m.holds());
            Json.put(mn, "actual", m.actual());
            Json.put(mn, "allowed", m.allowed());
            mn.put("unit", m.unit());
        }
        return arr;
    }

    static ObjectNode diagnosis(Diagnosis d, Requirement req) {
        DisplayUnits u = new DisplayUnits(req.units());
        ObjectNode n = Json.MAPPER.createObjectNode();
        n.put("sampled", d.sampled());
        ObjectNode rb = n.putObject("removed_by");
        d.removedBy().forEach(rb::put);
        ArrayNode conflicts = n.putArray("no_spring_can");
        for (LimitConflict c : d.conflicts()) {
            ObjectNode o = conflicts.addObject();
            boolean decel = c.limit().equals("deceleration");
            o.put("limit", c.limit());
            o.put("unit", decel ? "gn" : "N");
            Json.put(o, "allowed", decel ? DisplayUnits.gn(c.allowed()) : c.allowed());
            Json.put(o, "least_needed", decel ? DisplayUnits.gn(c.leastNeeded()) : c.leastNeeded());
            Json.put(o, "least_with_preload", decel ? DisplayUnits.gn(c.withPreload()) : c.withPreload());
            Json.put(o, "stroke_needed_mm", c.strokeNeeded() * 1e3);
            o.put("advice", LimitConflictWords.describe(c, req, u));
        }
        StrengthBoundWords.shown(d, req).ifPresent(b -> {
            ObjectNode o = n.putObject("strength");
            Json.put(o, "least_force_N", b.leastForce());
            o.put("preloaded", b.preloaded());
            Json.put(o, "capacity_N", b.capacity());
            o.put("strong_enough", !b.beyondCapacity());
            o.put("strongest_material", b.strongest().material().key());
            o.put("strongest_ends", b.strongest().ends().key());
            Json.put(o, "strongest_wire_diameter_mm", b.strongest().wireDiameter() * 1e3);
            Json.put(o, "strongest_outer_diameter_mm", (b.meanDiameter() + b.strongest().wireDiameter()) * 1e3);
            Json.put(o, "stroke_needed_mm", b.strokeNeeded() * 1e3);
            Json.put(o, "bore_needed_mm", b.boreNeeded() * 1e3);
            Json.put(o, "stroke_with_preload_mm", b.strokeWithPreload() * 1e3);
            o.put("advice", StrengthBoundWords.describe(b, req, u));
        });
        ArrayNode near = n.putArray("nearest_misses");
        for (NearMiss m : d.nearest()) {
            ObjectNode o = near.addObject();
            Spring s = m.evaluation().spring();
            o.put("material", s.material().key());
            o.put("ends", s.ends().key());
            Json.put(o, "wire_diameter_mm", s.wireDiameter() * 1e3);
            Json.put(o, "outer_diameter_mm", s.outerDiameter() * 1e3);
            Json.put(o, "active_coils", s.activeCoils());
            Json.put(o, "free_length_mm", s.freeLength() * 1e3);
            o.put("fails", m.violated().key());
            Json.put(o, "shortfall_pct", -m.violated().value() * 100);
            o.put("would_pass_if", Relaxation.describe(m.violated(), req, u));
        }
        return n;
    }
}
