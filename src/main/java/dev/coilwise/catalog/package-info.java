/**
 * Stock catalogues: reading a supplier's parts list, recomputing every part with the mechanics core, and judging the
 * parts against a requirement.
 *
 * <p>{@link dev.coilwise.catalog.CatalogReader} reads our CSV format (docs/catalog-format.md: one field per column,
 * the unit in the header) or a supplier export through a {@link dev.coilwise.catalog.ColumnMapping} YAML file. Every
 * part is rebuilt as a {@link dev.coilwise.model.Spring} from wire diameter, outer diameter, coils, free length, end
 * type and material; a stated rate or solid length is only checked against the recomputed one (10 %).
 * {@link dev.coilwise.catalog.StockEvaluator} applies {@link dev.coilwise.mechanics.DesignEvaluator} to each part plus
 * the supplier's own maximum deflection and load. Reading is the only I/O here; nothing is written.
 */
package dev.coilwise.catalog;
