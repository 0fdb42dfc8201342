package dev.coilwise.report;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Spring;
import dev.coilwise.search.ShortlistEntry;
import dev.coilwise.search.SizingResult;
import dev.coilwise.tolerance.TestPoint;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** Builds {@code shortlist.csv}: one row per design, purchasing fields first, SI with the unit in each header. */
public final class ShortlistCsv {
    private ShortlistCsv() {
    }

    public static String write(SizingResult r) {
        boolean arrest = r.requirement().isArrest();
        List<String> header = new ArrayList<>(List.of("rank", "source", "part_number", "supplier", "unit_price",
                "material", "material_standard", "ends", "wire_diameter_mm", "outer_diameter_mm", "inner_diameter_mm",
                "free_length_mm", "active_coils", "total_coils", "solid_length_mm", "rate_N_per_mm", "mass_g",
                "preload_N"));
        header.addAll(arrest
                ? List.of("max_compression_mm", "peak_force_N", "peak_deceleration_gn", "stress_at_peak_MPa")
                : List.of("cocked_compression_mm", "cocking_force_N", "exit_speed_m_per_s", "predicted_height_mm",
                        "stress_at_cocked_MPa"));
        header.addAll(List.of("allowable_stress_MPa", "stress_at_solid_MPa", "outer_diameter_at_solid_mm",
                "binding_limit", "binding_margin_pct", "fatigue_safety_factor", "probability_ok",
                "F1_N", "L1_mm", "F1_tolerance_N", "F2_N", "L2_mm", "F2_tolerance_N", "tolerance_grade",
                "sim_peak_force_N", "sim_deviation_pct", "sim_coil_clash"));
        StringWriter out = new StringWriter();
        CSVFormat fmt = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").setCommentMarker('#').get();
        try (CSVPrinter p = new CSVPrinter(out, fmt)) {
            p.printComment(Caution.TEXT);
            p.printRecord(header);
            for (ShortlistEntry e : r.shortlist()) {
                p.printRecord(row(e, arrest, r.requirement().spring().toleranceGrade()));
            }
        } catch (IOException ex) {
            throw new UncheckedIOException(ex);
        }
        return out.toString();
    }

    private static List<Object> row(ShortlistEntry entry, boolean arrest, int grade) {
        Evaluation e = entry.evaluation();
        Spring s = e.spring();
        var stock = entry.candidate().stock();
        List<Object> row = new ArrayList<>(List.of(entry.rank(), stock.isPresent() ? "stock" : "custom",
                CsvCells.safe(stock.map(p -> p.partNumber()).orElse("custom")),
                CsvCells.safe(stock.map(p -> p.supplier()).orElse("")),
                stock.map(p -> n(p.unitPrice())).orElse(""), s.material().key(), s.material().standard(),
                s.ends().key()));
        row.add(n(s.wireDiameter() * 1e3));
        row.add(n(s.outerDiameter() * 1e3));
        row.add(n(s.innerDiameter() * 1e3));
        row.add(n(s.freeLength() * 1e3));
        row.add(n(s.activeCoils()));
        row.add(n(s.totalCoils()));
        row.add(n(s.solidLength() * 1e3));
        row.add(n(e.rate() * 1e-3));
        row.add(n(e.mass() * 1e3));
        row.add(n(e.preloadForce()));
        row.add(n(e.workingDeflection() * 1e3));
        row.add(n(e.peakForce()));
        if (arrest) {
            row.add(n(DisplayUnits.gn(e.peakDeceleration())));
        } else {
            row.add(n(e.speed()));
            row.add(n(e.predictedHeight() * 1e3));
        }
        row.add(n(e.stressAtWorking() * 1e-6));
        row.add(n(e.allowableStress() * 1e-6));
        row.add(n(e.stressAtSolid() * 1e-6));
        row.add(n(e.outerDiameterAtSolid() * 1e3));
        row.add(e.binding().map(b -> b.key()).orElse(""));
        row.add(e.binding().map(b -> n(b.value() * 100)).orElse(""));
        row.add(e.fatigue().map(f -> n(f.safetyFactor())).orElse(""));
        row.add(entry.scatter().map(sc -> n(sc.probabilityOk())).orElse(""));
        List<TestPoint> points = TestLoads.of(e, grade);
        for (String name : List.of("F1", "F2")) {
            TestPoint tp = points.stream().filter(p -> p.name().equals(name)).findFirst().orElse(null);
            row.add(tp == null ? "" : n(tp.force()));
            row.add(tp == null ? "" : n(tp.length() * 1e3));
            row.add(tp == null ? "" : n(tp.forceTolerance()));
        }
        row.add(grade);
        row.add(entry.simulation().map(sim -> n(sim.peakForce())).orElse(""));
        row.add(entry.simulation().map(sim -> n(sim.deviationPct())).orElse(""));
        row.add(entry.simulation().map(sim -> String.valueOf(sim.coilClash())).orElse(""));
        return row;
    }

    private static String n(double v) {
        BigDecimal b = Json.num(v);
        return b == null ? "" : b.toPlainString();
    }
}
