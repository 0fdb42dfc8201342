/**
 * Time-domain check of a spring design: the active coils as a chain of lumped masses, driven through the job's
 * arrest or launch and compared with the energy balance of {@link dev.coilwise.mechanics}.
 *
 * <p>Entry point: {@link dev.coilwise.dynamics.Simulator#simulate}, which returns a
 * {@link dev.coilwise.dynamics.SimulationSummary} (the figures and, through
 * {@link dev.coilwise.dynamics.DynamicsFlags}, warnings in words) and, on request, a
 * {@link dev.coilwise.dynamics.TimeHistory} for the report writers. {@link dev.coilwise.dynamics.SimulatedLimits}
 * checks the simulated figures against the requirement's hard limits for {@code ranking.dynamics: strict}.
 *
 * <p>Inside: {@link dev.coilwise.dynamics.LumpedChain} holds the chain's parameters and its modes; one small class
 * per force term (elements, coil clash, gravity, damping, drive force, guide friction) adds its forces and declares
 * the switching functions of its own discontinuities; the massless top face is held by the load, the end stop of a
 * preloaded pocket or nothing, switched only at event roots. The equations are integrated with Commons Math's
 * Dormand–Prince 8(5,3) integrator, all switching functions folded into one event handler; peaks are found between
 * steps on a quintic Hermite polynomial of each element's closure. Every modelling choice, its reason and the
 * validation behind it are in docs/dynamics.md.
 *
 * <p>Units: SI throughout (m, N, Pa, kg, s). Positions are measured towards the base from the spring's free length.
 */
package dev.coilwise.dynamics;
