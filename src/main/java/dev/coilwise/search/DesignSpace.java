package dev.coilwise.search;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Requirement;
import java.util.ArrayList;
import java.util.List;

/**
 * The declared design space of a requirement: its families (material × ends × preferred wire within the material's
 * range), the grid, and the free-length cap of each cell. Every search (pruned or brute force) covers exactly this.
 *
 * <p>Free-length cap of a cell: {@code envelope.max_free_length} when given; otherwise, for an arrest into a pocket,
 * the pocket length plus the deflection at which the preload alone reaches the allowable stress (no longer free
 * length can pass the stress limit); otherwise Ls + (1 + ξ)·stroke + 2 grid steps (the longest free length the
 * coil-bind rule can ask for, since no other limit improves with length).
 */
public record DesignSpace(Requirement requirement, Grid grid, List<Material> materials, List<EndType> ends,
                          List<Double> wireDiameters, List<Family> families) {

    public DesignSpace {
        materials = List.copyOf(materials);
        ends = List.copyOf(ends);
        wireDiameters = List.copyOf(wireDiameters);
        families = List.copyOf(families);
    }

    public static DesignSpace of(Requirement req, MaterialTable table) {
        List<Material> mats = req.spring().materials().isEmpty() ? table.steels()
                : req.spring().materials().stream().map(table::get).toList();
        List<Double> wires = WireSizes.of(req.wireSeries());
        List<Family> fams = new ArrayList<>();
        List<Double> used = new ArrayList<>();
        int order = 0;
        for (Material m : mats) {
            for (EndType e : req.spring().ends()) {
                for (double d : wires) {
                    if (m.covers(d)) {
                        fams.add(new Family(order++, m, e, d));
                        if (!used.contains(d)) {
                            used.add(d);
                        }
                    }
                }
            }
        }
        used.sort(Double::compare);
        return new DesignSpace(req, Grid.of(req), mats, req.spring().ends(), used, fams);
    }

    /** Longest free length of the grid for a cell with solid length {@code ls} and rate {@code k}, m. */
    public double freeLengthCap(Family f, double meanDiameter, double ls, double k) {
        double allow = f.material().allowableStress(f.wireDiameter(), requirement.spring().setRemoved());
        return freeLengthCap(Stress.forceFor(allow, meanDiameter, f.wireDiameter()), ls, k);
    }

    /**
     * The same cap from the force at which the corrected stress reaches the allowable ({@code allowableForce}, N) at
     * this cell's diameter, for callers that already have it.
     */
    double freeLengthCap(double allowableForce, double ls, double k) {
        Requirement req = requirement;
        if (req.envelope().maxFreeLength().isPresent()) {
            return req.envelope().maxFreeLength().getAsDouble();
        }
        if (req.job() instanceof Arrest && req.envelope().pocketLength().isPresent()) {
            return req.envelope().pocketLength().getAsDouble() + allowableForce / k + grid.step();
        }
        return ls + (1 + req.spring().clashAllowance()) * req.limits().stroke() + 2 * grid.step();
    }

    /** Index of the first grid length strictly above the solid length {@code ls}. */
    public long firstFreeLengthIndex(double ls) {
        long j = grid.lengthIndexAtLeast(ls);
        while (grid.length(j) <= ls) {
            j++;
        }
        return j;
    }
}
