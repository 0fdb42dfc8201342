/**
 * Manufacturing tolerances of cold-coiled helical compression springs, for the purchasing specification and for
 * tolerance (Monte Carlo) studies.
 *
 * <p>{@link dev.coilwise.tolerance.En15800} gives the permissible deviations of EN 15800:2008 "Cylindrical helical
 * springs made from round wire — Quality specifications for cold coiled compression springs" (the European successor
 * of DIN 2095:1973, same three grades 1 fine, 2 medium, 3 coarse; grade 2 applies when none is agreed). The standard
 * covers 0.07 mm ≤ d ≤ 16 mm, 0.63 mm ≤ D ≤ 200 mm, L0 ≤ 630 mm, n ≥ 2 and 4 ≤ w = D/d ≤ 20; outside that scope the
 * nearest table entry is used and {@link dev.coilwise.tolerance.SpringTolerances#notes()} says so.
 * {@link dev.coilwise.tolerance.WireTolerance} gives the wire diameter deviation of the wire standard.
 *
 * <p>Provenance, stated per figure in the javadoc and summed up here:
 * <ul>
 *   <li>coil diameter A_D: EN 15800 Table 1 (identical to DIN 2095 Table 1 and DIN 2097), read from two public
 *       reproductions of the table; grade 2 complete to D = 200 mm, grades 1 and 3 to D = 63 mm. Above 63 mm grades 1
 *       and 3 are our extrapolation (half and twice grade 2, the ratio the table itself holds from 31.5 to 63 mm);</li>
 *   <li>free length A_L0 and test force A_F: the equations of EN 15800 (factors k_F, φ_F and grade factor Q), from
 *       memory — confirm against the standard before relying on the exact figures;</li>
 *   <li>squareness e1 and parallelism e2: EN 15800 / DIN 2095 grade angles, from memory;</li>
 *   <li>wire diameter: EN 10270-1 diameter tolerance table, from memory;</li>
 *   <li>active coils ±¼ coil and the geometric rate scatter: common practice and our derivation, not clauses of the
 *       standard.</li>
 * </ul>
 * Everything here is pure computation in SI (m, N, N/m); millimetres appear only inside the table look-ups because
 * the standard's equations are written in mm and N.
 */
package dev.coilwise.tolerance;
