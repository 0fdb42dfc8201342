package dev.coilwise.catalog;

import java.util.List;

/**
 * A catalogue as imported.
 *
 * @param source      file name
 * @param description the comment lines before the header ('#' removed), empty if none
 * @param demo        whether the description says the file is demo data
 * @param parts       the parts that were imported
 * @param issues      every error and warning, in file order
 */
public record StockCatalog(String source, String description, boolean demo, List<StockPart> parts,
                           List<CatalogIssue> issues) {
    public StockCatalog {
        parts = List.copyOf(parts);
        issues = List.copyOf(issues);
    }

    public List<CatalogIssue> warnings() {
        return issues.stream().filter(i -> !i.isError()).toList();
    }

    public List<CatalogIssue> errors() {
        return issues.stream().filter(CatalogIssue::isError).toList();
    }
}
