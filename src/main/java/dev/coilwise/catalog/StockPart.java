package dev.coilwise.catalog;

import dev.coilwise.error.Check;
import dev.coilwise.model.Spring;
import java.util.EnumSet;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * One catalogue part, its geometry recomputed with the mechanics core. SI throughout.
 *
 * @param partNumber        supplier's part number
 * @param supplier          supplier name
 * @param spring            the spring rebuilt from wire diameter, outer diameter, coils, free length and end type
 * @param unitPrice         price of one spring, in {@code currency}
 * @param currency          currency code as written in the catalogue, or empty when the catalogue gives none
 * @param packQuantity      springs per pack (≥ 1)
 * @param statedRate        rate printed in the catalogue, N/m (reference only: the evaluation uses {@code spring.rate()})
 * @param statedSolidLength solid length printed in the catalogue, m (reference only)
 * @param maxDeflection     supplier's maximum working deflection, m; a hard limit in {@link StockEvaluator}
 * @param maxLoad           supplier's maximum working load, N; a hard limit in {@link StockEvaluator}
 * @param flags             caveats found on import
 * @param source            {@code file:line} of the row
 */
public record StockPart(String partNumber, String supplier, Spring spring, double unitPrice, String currency,
                        int packQuantity, OptionalDouble statedRate, OptionalDouble statedSolidLength,
                        OptionalDouble maxDeflection, OptionalDouble maxLoad, Set<StockFlag> flags, String source) {
    public StockPart {
        Check.notNull("part number", partNumber);
        Check.notNull("spring", spring);
        Check.nonNegative("unit price", unitPrice, currency);
        if (packQuantity < 1) {
            throw new dev.coilwise.error.BadInputException("pack quantity must be at least 1, got " + packQuantity);
        }
        currency = currency == null ? "" : currency;
        flags = flags.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(flags));
    }

    /** Price of one pack, in {@code currency}. */
    public double packPrice() {
        return unitPrice * packQuantity;
    }

    public boolean has(StockFlag flag) {
        return flags.contains(flag);
    }

    /** Whether the part is evaluated with computed values that contradict a stated one. */
    public boolean usesComputedValues() {
        return has(StockFlag.STATED_RATE_DIFFERS) || has(StockFlag.STATED_SOLID_LENGTH_DIFFERS);
    }
}
