package dev.coilwise.catalog;

import dev.coilwise.requirement.UnitWords;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * Units a catalogue column may be written in. A column of our own format carries its unit as the suffix of its header
 * ({@code wire_diameter_mm}, {@code rate_lbf_per_in}); a mapping file names it by symbol ({@code mm}, {@code lbf/in}).
 * Factors are exact: 1 in = 25.4 mm (international inch, 1959); 1 lbf = 0.45359237 kg × 9.80665 m/s².
 */
public enum CatalogUnit {
    MM(Kind.LENGTH, "mm", "mm", 1e-3),
    IN(Kind.LENGTH, "in", "in", 0.0254),
    M(Kind.LENGTH, "m", "m", 1),
    N_PER_MM(Kind.RATE, "N/mm", "n_per_mm", 1e3),
    N_PER_M(Kind.RATE, "N/m", "n_per_m", 1),
    LBF_PER_IN(Kind.RATE, "lbf/in", "lbf_per_in", CatalogUnit.LBF_IN_N / 0.0254),
    N(Kind.FORCE, "N", "n", 1),
    LBF(Kind.FORCE, "lbf", "lbf", CatalogUnit.LBF_IN_N);

    /** One pound-force in newtons, exact by definition. */
    public static final double LBF_IN_N = 0.45359237 * 9.80665;

    /** The dimension a unit measures; {@link CatalogField}s of the same kind accept it. */
    public enum Kind {
        LENGTH, RATE, FORCE, NONE
    }

    private final Kind kind;
    private final String symbol;
    private final String suffix;
    private final double toSi;

    CatalogUnit(Kind kind, String symbol, String suffix, double toSi) {
        this.kind = kind;
        this.symbol = symbol;
        this.suffix = suffix;
        this.toSi = toSi;
    }

    public Kind kind() {
        return kind;
    }

    /** Symbol used in mapping files and messages, e.g. {@code lbf/in}. */
    public String symbol() {
        return symbol;
    }

    /** Header suffix of our own format, e.g. {@code lbf_per_in}. */
    public String suffix() {
        return suffix;
    }

    /** Converts a value in this unit to SI (m, N/m, N). */
    public double toSi(double value) {
        return value * toSi;
    }

    /** Converts an SI value to this unit. */
    public double fromSi(double value) {
        return value / toSi;
    }

    /** The units of one kind. */
    public static List<CatalogUnit> of(Kind kind) {
        return Arrays.stream(values()).filter(u -> u.kind == kind).toList();
    }

    /**
     * The unit of this kind that {@code word} names in full or abbreviated with a full stop (e.g. "inches" for in), if
     * any ({@link UnitWords}, shared with requirement files). Such words are not accepted; they only give the "did you
     * mean" hint.
     */
    public static Optional<CatalogUnit> byName(String word, Kind kind) {
        return UnitWords.symbolFor(word).map(symbol -> bySymbol(symbol, kind));
    }

    /** The unit with this symbol (case-insensitive) and kind, or null. */
    public static CatalogUnit bySymbol(String symbol, Kind kind) {
        for (CatalogUnit u : values()) {
            if (u.kind == kind && u.symbol.equalsIgnoreCase(symbol.strip())) {
                return u;
            }
        }
        return null;
    }
}
