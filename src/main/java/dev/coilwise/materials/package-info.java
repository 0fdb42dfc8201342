/**
 * Spring wire materials: the minimum tensile strength fit Sut = A/d^m by diameter band, E and G by diameter band,
 * density, relative cost and the static allowable stress as a fraction of Sut before and after set removal. The
 * bundled table, materials.yaml, cites Shigley's Mechanical Engineering Design (9th ed.) Tables 10-4, 10-5 and 10-6
 * row by row. A {@link dev.coilwise.materials.MaterialTable} is passed in to whoever needs it; a wire diameter
 * outside a material's range is an error, never an extrapolation.
 */
package dev.coilwise.materials;
