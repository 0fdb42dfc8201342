package dev.coilwise.catalog;

/**
 * Where one {@link CatalogField} comes from: a column of the file in a unit, or one constant for every row.
 *
 * @param column   column name in the file, or null for a constant
 * @param unit     unit of the column's numbers, or null for fields without a dimension
 * @param constant value used for every row, or null when read from a column
 */
public record ColumnSource(String column, CatalogUnit unit, String constant) {
    public static ColumnSource column(String name, CatalogUnit unit) {
        return new ColumnSource(name, unit, null);
    }

    public static ColumnSource constant(String value, CatalogUnit unit) {
        return new ColumnSource(null, unit, value);
    }

    public boolean isConstant() {
        return column == null;
    }

    /** Name used in messages: the column name, or {@code (constant)}. */
    public String label() {
        return column == null ? "(constant " + constant + ")" : column;
    }
}
