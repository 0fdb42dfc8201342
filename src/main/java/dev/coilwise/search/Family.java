package dev.coilwise.search;

import dev.coilwise.materials.Material;
import dev.coilwise.model.EndType;

/**
 * One family of the design space: a material, an end type and a wire diameter. The shortlist holds at most one design
 * per family (its best), so that it offers distinct wire and material choices rather than near copies.
 *
 * @param order        position of the family in the search order (material, ends, wire ascending); tie-break
 * @param material     wire material
 * @param ends         end type
 * @param wireDiameter d, m
 */
public record Family(int order, Material material, EndType ends, double wireDiameter) {
}
