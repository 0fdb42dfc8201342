/**
 * Manufacturing scatter: a seeded Monte Carlo over the tolerances of a design (wire and coil diameter, free length,
 * active coils, and shear modulus where a source gives its scatter) that re-runs the energy balance on each made
 * spring in the machine built for the nominal design, and reports the share of made springs that still meet the
 * requirement and the 1st/99th percentiles of the working figures.
 *
 * <p>Entry points: {@link dev.coilwise.scatter.MonteCarlo#summarise} for a shortlist (one
 * {@link dev.coilwise.scatter.ScatterSummary} per design) and {@link dev.coilwise.scatter.MonteCarlo#sample} for the
 * raw samples. Tolerances come through {@link dev.coilwise.scatter.ToleranceSource}. Method, sources and assumptions:
 * {@code docs/fatigue-and-scatter.md}. The results are a design aid, to be confirmed by test.
 */
package dev.coilwise.scatter;
