package dev.coilwise.report.html;

/**
 * The best feasible design of one family (material, end type, wire diameter), as plotted on the trade-off chart.
 *
 * @param searchRank   place among all feasible family bests by the ranking criterion
 * @param shortlistRank rank in the shortlist, or 0 when the family's best was not shortlisted
 * @param material     material key
 * @param ends         end type key
 * @param wireDiameter d, m
 * @param outerDiameter OD, m
 * @param freeLength   L0, m
 * @param solidLength  Ls, m
 * @param mass         spring mass, kg
 * @param peakForce    arrest: peak force; launch: cocking force, N
 */
public record FamilyPoint(int searchRank, int shortlistRank, String material, String ends, double wireDiameter, double outerDiameter,
                          double freeLength, double solidLength, double mass, double peakForce) {
    static FamilyPoint from(JsonIn f, boolean arrest) {
        return new FamilyPoint(f.integer("search_rank"), f.has("shortlist_rank") ? f.integer("shortlist_rank") : 0,
                f.text("material"), f.text("ends"), f.mm("wire_diameter_mm"),
                f.mm("outer_diameter_mm"), f.mm("free_length_mm"), f.mm("solid_length_mm"), f.number("mass_g") * 1e-3,
                f.number(arrest ? "peak_force_N" : "cocking_force_N"));
    }
}
