package dev.coilwise.tolerance;

/**
 * A test load for the purchasing specification: the force the spring must give at a stated length, with its EN 15800
 * tolerance.
 *
 * @param name           label, e.g. {@code F1} or {@code F2}
 * @param length         stated test length L, m
 * @param deflection     L0 − L, m
 * @param force          nominal force at that length, N
 * @param forceTolerance ±A_F, N
 * @param grade          EN 15800 grade the tolerance is for
 */
public record TestPoint(String name, double length, double deflection, double force, double forceTolerance,
                        int grade) {
}
