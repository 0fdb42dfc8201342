package dev.coilwise.model;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;
import java.util.OptionalDouble;

/**
 * Where the spring must fit. All lengths in m; every part optional.
 *
 * @param bore          bore the spring works inside
 * @param rod           rod the spring works over
 * @param clearance     diametral clearance to bore and rod
 * @param maxFreeLength longest free length allowed
 * @param pocketLength  arrest only: installed length; a free length above it gives preload
 */
public record Envelope(OptionalDouble bore, OptionalDouble rod, Clearance clearance, OptionalDouble maxFreeLength,
                       OptionalDouble pocketLength) {
    public Envelope {
        bore.ifPresent(v -> Check.positive("envelope.bore", v, "m"));
        rod.ifPresent(v -> Check.positive("envelope.rod", v, "m"));
        maxFreeLength.ifPresent(v -> Check.positive("envelope.max_free_length", v, "m"));
        pocketLength.ifPresent(v -> Check.positive("envelope.pocket_length", v, "m"));
        if (clearance == null) {
            clearance = Clearance.DEFAULT;
        }
        if (bore.isPresent() && rod.isPresent() && rod.getAsDouble() >= bore.getAsDouble()) {
            throw new BadInputException(String.format(java.util.Locale.ROOT,
                    "envelope.rod (%.4g mm) must be smaller than envelope.bore (%.4g mm): a spring cannot fit between them",
                    rod.getAsDouble() * 1e3, bore.getAsDouble() * 1e3));
        }
        if (maxFreeLength.isPresent() && pocketLength.isPresent()
                && pocketLength.getAsDouble() > maxFreeLength.getAsDouble()) {
            throw new BadInputException(String.format(java.util.Locale.ROOT,
                    "envelope.pocket_length (%.4g mm) exceeds envelope.max_free_length (%.4g mm): the free length must be at least the pocket length",
                    pocketLength.getAsDouble() * 1e3, maxFreeLength.getAsDouble() * 1e3));
        }
    }

    /** An envelope with no constraint. */
    public static Envelope open() {
        return new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT, OptionalDouble.empty(),
                OptionalDouble.empty());
    }

    /** Whether a bore or rod guides the spring (buckling is then reported, not a hard limit). */
    public boolean guided() {
        return bore.isPresent() || rod.isPresent();
    }
}
