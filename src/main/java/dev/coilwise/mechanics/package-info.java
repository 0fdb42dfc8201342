/**
 * Pure formulas of the helical compression spring and the two energy balances of its jobs. Every method takes SI
 * doubles and returns SI doubles; nothing here reads or writes files or streams, and nothing holds state.
 *
 * <p>{@link dev.coilwise.mechanics.CurvatureFactors} and {@link dev.coilwise.mechanics.Stress} give the corrected
 * torsional stress; {@link dev.coilwise.mechanics.Buckling}, {@link dev.coilwise.mechanics.Surge} and
 * {@link dev.coilwise.mechanics.SolidGrowth} the stability, natural frequency, surge-wave stress and diameter at
 * solid; {@link dev.coilwise.mechanics.ArrestBalance}, {@link dev.coilwise.mechanics.LaunchBalance} and
 * {@link dev.coilwise.mechanics.ImpactFactor} the energy balances. {@link dev.coilwise.mechanics.DesignEvaluator}
 * puts them together: one spring against one requirement gives an {@link dev.coilwise.mechanics.Evaluation}, every
 * working figure and every limit as a signed {@link dev.coilwise.mechanics.Margin}.
 *
 * <p>Each equation, its assumptions and its source are listed in docs/method.md; the checks against published
 * values in docs/validation.md. Results are a design aid, to be confirmed by test; local codes, standards and
 * licensed engineering practice govern.
 */
package dev.coilwise.mechanics;
