package dev.coilwise.catalog;

import java.util.Arrays;
import java.util.stream.Collectors;

/**
 * The fields of a stock catalogue row. In our own CSV format the header of a field is its {@link #key()} followed, for
 * quantities with a dimension, by a unit suffix (see {@link CatalogUnit}). Exactly one of {@code active_coils} and
 * {@code total_coils} is needed; when both are given, active coils are used.
 */
public enum CatalogField {
    PART_NUMBER("part_number", CatalogUnit.Kind.NONE, true, "supplier's part number"),
    SUPPLIER("supplier", CatalogUnit.Kind.NONE, true, "supplier name"),
    MATERIAL("material", CatalogUnit.Kind.NONE, true, "material key of the material table"),
    ENDS("ends", CatalogUnit.Kind.NONE, true, "end type key: plain, plain-ground, closed, closed-ground"),
    WIRE_DIAMETER("wire_diameter", CatalogUnit.Kind.LENGTH, true, "wire diameter"),
    OUTER_DIAMETER("outer_diameter", CatalogUnit.Kind.LENGTH, true, "outer coil diameter"),
    FREE_LENGTH("free_length", CatalogUnit.Kind.LENGTH, true, "free length"),
    ACTIVE_COILS("active_coils", CatalogUnit.Kind.NONE, false, "active coils"),
    TOTAL_COILS("total_coils", CatalogUnit.Kind.NONE, false, "total coils"),
    RATE("rate", CatalogUnit.Kind.RATE, false, "stated rate"),
    SOLID_LENGTH("solid_length", CatalogUnit.Kind.LENGTH, false, "stated solid length"),
    MAX_DEFLECTION("max_deflection", CatalogUnit.Kind.LENGTH, false, "stated maximum working deflection"),
    MAX_LOAD("max_load", CatalogUnit.Kind.FORCE, false, "stated maximum working load"),
    UNIT_PRICE("unit_price", CatalogUnit.Kind.NONE, true, "price of one spring"),
    CURRENCY("currency", CatalogUnit.Kind.NONE, false, "currency code of the price"),
    PACK_QUANTITY("pack_quantity", CatalogUnit.Kind.NONE, false, "springs per pack (default 1)");

    private final String key;
    private final CatalogUnit.Kind kind;
    private final boolean required;
    private final String description;

    CatalogField(String key, CatalogUnit.Kind kind, boolean required, String description) {
        this.key = key;
        this.kind = kind;
        this.required = required;
        this.description = description;
    }

    public String key() {
        return key;
    }

    public CatalogUnit.Kind kind() {
        return kind;
    }

    public boolean required() {
        return required;
    }

    public String description() {
        return description;
    }

    /** Whether the field carries a unit. */
    public boolean dimensioned() {
        return kind != CatalogUnit.Kind.NONE;
    }

    /** The header names our own format accepts for this field, e.g. {@code wire_diameter_mm, wire_diameter_in}. */
    public String headerChoices() {
        if (!dimensioned()) {
            return key;
        }
        return CatalogUnit.of(kind).stream().map(u -> key + "_" + u.suffix()).collect(Collectors.joining(", "));
    }

    /** The field with this key, or null. */
    public static CatalogField byKey(String key) {
        return Arrays.stream(values()).filter(f -> f.key.equals(key)).findFirst().orElse(null);
    }

    /** Every key, comma separated, for messages. */
    public static String keys() {
        return Arrays.stream(values()).map(CatalogField::key).collect(Collectors.joining(", "));
    }
}
