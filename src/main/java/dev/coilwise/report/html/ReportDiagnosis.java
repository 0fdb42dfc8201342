package dev.coilwise.report.html;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Why nothing was feasible, as saved: how many sampled candidates each limit removed, and the nearest misses.
 *
 * @param sampled   candidates sampled for the diagnosis
 * @param removedBy per limit key, how many sampled candidates fail it, highest first
 * @param nearest   designs failing one limit by the least, with what to relax
 * @param conflicts force or deceleration limits that no spring can meet within the stroke (work-energy bound)
 * @param strength  the force the job needs within the stroke against the strongest spring, when saved
 */
public record ReportDiagnosis(long sampled, Map<String, Long> removedBy, List<Miss> nearest,
                              List<Conflict> conflicts, Optional<Strength> strength) {
    public ReportDiagnosis {
        removedBy = Collections.unmodifiableMap(new LinkedHashMap<>(removedBy));
        nearest = List.copyOf(nearest);
        conflicts = List.copyOf(conflicts);
        Objects.requireNonNull(strength);
    }

    /**
     * The work-energy balance against the strength of the wire.
     *
     * @param strongEnough whether the strongest spring of the design space takes the least force the job needs
     * @param advice       the figures and what to change, in words (written by coilwise size in the requirement's units)
     */
    public record Strength(boolean strongEnough, String advice) {
    }

    /**
     * A limit no spring can meet, whatever its material, size or ends.
     *
     * @param limit  limit key
     * @param advice what to change, in words (written by coilwise size in the requirement's units)
     */
    public record Conflict(String limit, String advice) {
    }

    /**
     * A design that fails a single limit.
     *
     * @param material      material key
     * @param ends          end type key
     * @param wireDiameter  d, m
     * @param outerDiameter OD, m
     * @param activeCoils   Na
     * @param freeLength    L0, m
     * @param fails         the limit it fails
     * @param shortfall     by how much, fraction of the limit
     * @param wouldPassIf   what to relax, in words (written by coilwise size in the requirement's units)
     */
    public record Miss(String material, String ends, double wireDiameter, double outerDiameter, double activeCoils,
                       double freeLength, String fails, double shortfall, String wouldPassIf) {
    }

    static ReportDiagnosis from(JsonIn d) {
        Map<String, Long> removed = new LinkedHashMap<>();
        JsonIn rb = d.object("removed_by");
        for (String key : rb.keys()) {
            removed.put(key, (long) rb.number(key));
        }
        List<Miss> misses = new ArrayList<>();
        for (JsonIn m : d.objects("nearest_misses")) {
            misses.add(new Miss(m.text("material"), m.text("ends"), m.mm("wire_diameter_mm"),
                    m.mm("outer_diameter_mm"), m.number("active_coils"), m.mm("free_length_mm"), m.text("fails"),
                    m.number("shortfall_pct") / 100, m.text("would_pass_if")));
        }
        List<Conflict> conflicts = new ArrayList<>();
        if (d.has("no_spring_can")) {
            d.objects("no_spring_can").forEach(c -> conflicts.add(new Conflict(c.text("limit"), c.text("advice"))));
        }
        Optional<Strength> strength = Optional.empty();
        if (d.has("strength")) {
            JsonIn s = d.object("strength");
            strength = Optional.of(new Strength(s.flag("strong_enough"), s.text("advice")));
        }
        return new ReportDiagnosis((long) d.number("sampled"), removed, misses, conflicts, strength);
    }
}
