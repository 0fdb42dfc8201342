package dev.coilwise.report;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Spring;
import dev.coilwise.search.Candidate;
import dev.coilwise.search.Objective;
import dev.coilwise.model.RankBy;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** Builds the CSV of {@code coilwise sweep}: one row per step with the best design and its figures, SI units in the headers. */
public final class SweepCsv {
    private SweepCsv() {
    }

    /**
     * One step of a sweep.
     *
     * @param value the varied key's value as written into the requirement
     * @param best  the best design at that value, or empty when nothing is feasible
     */
    public record Row(String value, Optional<Candidate> best) {
    }

    public static String write(String key, boolean arrest, RankBy by, List<Row> rows) {
        List<String> header = new ArrayList<>(List.of("step", key, "feasible", "material", "ends", "wire_diameter_mm",
                "mean_diameter_mm", "outer_diameter_mm", "active_coils", "free_length_mm", "solid_length_mm",
                "rate_N_per_mm", "mass_g", "preload_N", "working_deflection_mm", "peak_force_N"));
        header.addAll(arrest ? List.of("peak_deceleration_gn") : List.of("exit_speed_m_per_s", "predicted_height_mm"));
        header.addAll(List.of("stress_at_working_MPa", "binding_limit", "binding_margin_pct", "ranked_by",
                "criterion_value_SI"));
        StringWriter out = new StringWriter();
        CSVFormat fmt = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").setCommentMarker('#').get();
        try (CSVPrinter p = new CSVPrinter(out, fmt)) {
            p.printComment(Caution.TEXT);
            p.printRecord(header);
            for (int i = 0; i < rows.size(); i++) {
                p.printRecord(row(i + 1, rows.get(i), arrest, by, header.size()));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    private static List<Object> row(int step, Row r, boolean arrest, RankBy by, int columns) {
        List<Object> row = new ArrayList<>(List.of(step, CsvCells.safe(r.value())));
        if (r.best().isEmpty()) {
            row.add("no");
            while (row.size() < columns) {
                row.add("");
            }
            return row;
        }
        Evaluation e = r.best().get().evaluation();
        Spring s = e.spring();
        row.addAll(List.of("yes", s.material().key(), s.ends().key(), n(s.wireDiameter() * 1e3),
                n(s.meanDiameter() * 1e3), n(s.outerDiameter() * 1e3), n(s.activeCoils()), n(s.freeLength() * 1e3),
                n(s.solidLength() * 1e3), n(e.rate() * 1e-3), n(e.mass() * 1e3), n(e.preloadForce()),
                n(e.workingDeflection() * 1e3), n(e.peakForce())));
        if (arrest) {
            row.add(n(DisplayUnits.gn(e.peakDeceleration())));
        } else {
            row.add(n(e.speed()));
            row.add(n(e.predictedHeight() * 1e3));
        }
        row.add(n(e.stressAtWorking() * 1e-6));
        row.add(e.binding().map(b -> b.key()).orElse(""));
        row.add(e.binding().map(b -> n(b.value() * 100)).orElse(""));
        row.add(by.key());
        row.add(n(Objective.value(by, e)));
        return row;
    }

    private static String n(double v) {
        BigDecimal b = Json.num(v);
        return b == null ? "" : b.toPlainString();
    }
}
