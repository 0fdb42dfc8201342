package dev.coilwise.catalog;

/** Caveats attached to a stock part on import. */
public enum StockFlag {
    /** The stated rate differs from the computed one by more than 10 %; the computed rate is used. */
    STATED_RATE_DIFFERS("computed rate used: stated rate differs by more than 10 %"),
    /** The stated solid length differs from the computed one by more than 10 %; the computed one is used. */
    STATED_SOLID_LENGTH_DIFFERS("computed solid length used: stated solid length differs by more than 10 %"),
    /** Active and total coils were both given and disagree with the end type; active coils are used. */
    COILS_INCONSISTENT("active coils used: stated total coils disagree with the end type"),
    /** The catalogue file says it is demo data. */
    DEMO_DATA("demo data: invented part, not a real supplier's product");

    private final String label;

    StockFlag(String label) {
        this.label = label;
    }

    /** A short sentence for outputs. */
    public String label() {
        return label;
    }
}
