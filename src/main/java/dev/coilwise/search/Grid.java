package dev.coilwise.search;

import dev.coilwise.model.Requirement;
import dev.coilwise.model.SpringOptions;

/**
 * The declared design grid: mean diameter and free length on multiples of {@code step}, active coils in quarter
 * coils. Values are always built as {@code index × step} so that every search visits bit-identical geometry.
 *
 * @param step length step, m (0.1 mm for SI requirements, 0.001 in for US ones)
 */
public record Grid(double step) {
    /** Active coils are ordered in quarter coils (common practice). */
    public static final double COIL_STEP = 0.25;

    public static Grid of(Requirement req) {
        return new Grid(req.units().lengthStep());
    }

    public double length(long index) {
        return index * step;
    }

    public double coils(long index) {
        return index * COIL_STEP;
    }

    /** Smallest index whose length is ≥ {@code value} (with a guard against round-off just above an index). */
    public long lengthIndexAtLeast(double value) {
        long i = (long) Math.ceil(value / step - 1e-9);
        return Math.max(i, 0);
    }

    /** Largest index whose length is ≤ {@code value}. */
    public long lengthIndexAtMost(double value) {
        return (long) Math.floor(value / step + 1e-9);
    }

    /** Mean-diameter index range allowed by the index limits for wire diameter {@code d}, inclusive. */
    public long[] meanDiameterRange(double d, SpringOptions opt) {
        return new long[] {lengthIndexAtLeast(opt.indexMin() * d), lengthIndexAtMost(opt.indexMax() * d)};
    }

    /** Active-coil index range allowed by the coil limits, inclusive. */
    public long[] coilRange(SpringOptions opt) {
        return new long[] {(long) Math.ceil(opt.coilsMin() / COIL_STEP - 1e-9),
            (long) Math.floor(opt.coilsMax() / COIL_STEP + 1e-9)};
    }
}
