package dev.coilwise.catalog;

import dev.coilwise.requirement.Suggest;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Derives the {@link ColumnMapping} of our own catalogue format from its header: each column is a field key, followed
 * for dimensioned fields by a unit suffix ({@code free_length_mm}, {@code rate_lbf_per_in}, {@code max_load_n}).
 */
final class NativeHeader {
    private NativeHeader() {
    }

    /**
     * @param header column names in file order
     * @param file   file name for issues
     * @param line   header line number
     * @param issues receives an error per bad or missing column and a warning per unused column
     */
    static ColumnMapping mapping(List<String> header, String file, long line, List<CatalogIssue> issues) {
        Map<CatalogField, ColumnSource> fields = new EnumMap<>(CatalogField.class);
        for (String name : header) {
            String h = name.strip();
            CatalogField exact = CatalogField.byKey(h);
            if (exact != null && !exact.dimensioned()) {
                put(fields, exact, ColumnSource.column(name, null), file, line, issues);
                continue;
            }
            if (exact != null) {
                issues.add(new CatalogIssue(CatalogIssue.Severity.ERROR, file, line, name,
                        "a " + exact.kind().name().toLowerCase(java.util.Locale.ROOT)
                                + " column needs its unit in the header; write one of: " + exact.headerChoices()));
                continue;
            }
            boolean matched = false;
            for (CatalogField f : CatalogField.values()) {
                if (!f.dimensioned() || !h.startsWith(f.key() + "_")) {
                    continue;
                }
                String suffix = h.substring(f.key().length() + 1);
                for (CatalogUnit u : CatalogUnit.of(f.kind())) {
                    if (u.suffix().equals(suffix)) {
                        put(fields, f, ColumnSource.column(name, u), file, line, issues);
                        matched = true;
                    }
                }
                if (!matched) {
                    List<String> suffixes = CatalogUnit.of(f.kind()).stream().map(CatalogUnit::suffix).toList();
                    issues.add(new CatalogIssue(CatalogIssue.Severity.ERROR, file, line, name,
                            "unknown unit suffix '" + suffix + "'" + CatalogUnit.byName(suffix, f.kind())
                                    .map(u -> " (did you mean '" + u.suffix() + "'?)")
                                    .orElse(Suggest.hint(suffix, suffixes)) + "; write one of: "
                                    + f.headerChoices()));
                    matched = true;
                }
            }
            if (!matched) {
                issues.add(new CatalogIssue(CatalogIssue.Severity.WARNING, file, line, name,
                        "column is not part of the catalogue format and is ignored" + Suggest.hint(h, headerNames())
                                + "; known fields: " + CatalogField.keys()));
            }
        }
        for (String problem : ColumnMapping.missing(fields)) {
            issues.add(new CatalogIssue(CatalogIssue.Severity.ERROR, file, line, "", problem));
        }
        return new ColumnMapping(',', '.', fields, Map.of(), Map.of());
    }

    /** Every header name of our format: the plain keys and the keys with each unit suffix. */
    static List<String> headerNames() {
        return Arrays.stream(CatalogField.values()).flatMap(f -> Arrays.stream(f.headerChoices().split(", "))).toList();
    }

    private static void put(Map<CatalogField, ColumnSource> fields, CatalogField f, ColumnSource src, String file,
                            long line, List<CatalogIssue> issues) {
        ColumnSource old = fields.put(f, src);
        if (old != null) {
            issues.add(new CatalogIssue(CatalogIssue.Severity.ERROR, file, line, src.column(),
                    "field '" + f.key() + "' appears twice (also as '" + old.column() + "'); keep one column"));
        }
    }
}
