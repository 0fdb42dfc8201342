package dev.coilwise.catalog;

import dev.coilwise.catalog.CatalogIssue.Severity;
import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import dev.coilwise.error.SafeText;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.requirement.InputFiles;
import dev.coilwise.requirement.Suggest;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads a stock catalogue CSV (our format, or a supplier export through a {@link ColumnMapping}) and recomputes every
 * part with the mechanics core. Lines starting with '#' are comments; the comment block before the header becomes
 * the catalogue's description, and a description that mentions "demo" marks every part as demo data.
 *
 * <p>Error policy: header problems (a missing required field, a column with no unit) always fail the file. Row
 * problems (unknown material or end key, a bad number, a ragged row, an impossible geometry) are collected for the
 * whole file; a strict reader (the default) then fails with every one of them listed, a lenient reader skips those
 * rows and returns them as error issues. Warnings never stop an import: a part outside its material's wire range is
 * skipped with a warning; a stated rate or solid length more than {@link #STATED_VALUE_TOLERANCE} off the computed one
 * keeps the part, evaluated with computed values and flagged.
 */
public final class CatalogReader {
    /** Largest relative difference between a stated and a computed rate or solid length accepted silently: 10 %. */
    public static final double STATED_VALUE_TOLERANCE = 0.10;
    /** How many issues a failure message lists before it summarises the rest. */
    static final int MAX_LISTED = 40;
    /**
     * Largest catalogue file read, bytes: 32 MiB, about 200 000 rows of our format; coilwise's own bound, so that a
     * wrong file (a disk image, a log) is refused at once instead of filling memory.
     */
    public static final int MAX_BYTES = 32 << 20;
    /** Most rows read from one catalogue. */
    public static final int MAX_ROWS = 500_000;
    private static final String EXAMPLE_HEADER = "part_number,supplier,material,ends,wire_diameter_mm,outer_diameter_mm,"
            + "free_length_mm,active_coils,unit_price,currency (see docs/catalog-format.md)";

    private final MaterialTable materials;
    private final boolean lenient;

    /** A strict reader. */
    public CatalogReader(MaterialTable materials) {
        this(materials, false);
    }

    /** @param lenient skip rows with errors instead of failing */
    public CatalogReader(MaterialTable materials, boolean lenient) {
        this.materials = materials;
        this.lenient = lenient;
    }

    /** File-name ending of the mapping that sits beside a supplier export: {@code export.csv} → {@code export.mapping.yaml}. */
    public static final String SIDECAR_SUFFIX = ".mapping.yaml";

    /**
     * Reads a catalogue file: through its sidecar mapping when one sits beside it (the file name with its extension
     * replaced by {@value #SIDECAR_SUFFIX}), otherwise in our own format.
     */
    public StockCatalog read(Path file) {
        Path sidecar = sidecar(file);
        return read(file, Files.isRegularFile(sidecar) ? ColumnMapping.load(sidecar) : null);
    }

    /** Where the sidecar mapping of {@code file} would be. */
    public static Path sidecar(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return file.resolveSibling((dot > 0 ? name.substring(0, dot) : name) + SIDECAR_SUFFIX);
    }

    /** Reads a file through {@code mapping}, or in our own format when {@code mapping} is null. */
    public StockCatalog read(Path file, ColumnMapping mapping) {
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        String text;
        try {
            text = InputFiles.readUtf8(file, MAX_BYTES);
        } catch (BadInputException e) {
            throw new BadInputException(SafeText.escape(name) + ": " + e.getMessage(), e);
        }
        return read(new StringReader(text), name, mapping);
    }

    /**
     * Reads a catalogue from {@code in}.
     *
     * @param name    file name used in issues
     * @param mapping column mapping, or null for our own format
     * @throws BadInputException on header problems, and on row errors unless lenient
     */
    public StockCatalog read(Reader in, String name, ColumnMapping mapping) {
        char delimiter = mapping == null ? ',' : mapping.delimiter();
        CSVFormat format;
        try {
            format = CSVFormat.DEFAULT.builder().setDelimiter(delimiter).setCommentMarker('#')
                    .setHeader().setSkipHeaderRecord(true).setIgnoreEmptyLines(true).setIgnoreSurroundingSpaces(true)
                    .setTrim(true).get();
        } catch (IllegalArgumentException e) {
            throw new BadInputException(name + ": the mapping's delimiter '" + SafeText.escape(String.valueOf(delimiter))
                    + "' cannot separate CSV fields (" + e.getMessage() + "); use ',', ';' or tab");
        }
        List<CatalogIssue> issues = new ArrayList<>();
        List<StockPart> parts = new ArrayList<>();
        try (CSVParser parser = CSVParser.builder().setReader(in).setFormat(format).get()) {
            String description = parser.hasHeaderComment() ? parser.getHeaderComment().strip() : "";
            boolean demo = description.toLowerCase(Locale.ROOT).contains("demo");
            List<String> header = parser.getHeaderNames();
            long headerLine = parser.getCurrentLineNumber();
            if (header.isEmpty()) {
                throw new BadInputException(name + ": no header line; the first line that is not a comment must name the"
                        + " columns, e.g. " + EXAMPLE_HEADER);
            }
            ColumnMapping m = mapping == null ? NativeHeader.mapping(header, name, headerLine, issues)
                    : checkMapping(mapping, header, name, headerLine, issues);
            failOnErrors(name, issues, true);
            RowReader rows = new RowReader(materials, m, name, demo);
            for (CSVRecord r : parser) {
                long line = parser.getCurrentLineNumber();
                if (parts.size() + issues.size() >= MAX_ROWS) {
                    throw new BadInputException(name + ": more than " + MAX_ROWS + " rows; split the catalogue");
                }
                if (r.size() != header.size()) {
                    String hint = r.size() > header.size() && delimiter == ','
                            ? "; a comma inside a cell (a decimal comma, a list) splits it: put such cells in double quotes,"
                                    + " or read the file through a mapping with its own delimiter and decimal_separator" : "";
                    issues.add(new CatalogIssue(Severity.ERROR, name, line, "",
                            Message.CATALOG_RAGGED_ROW.format(r.size(), header.size()) + hint));
                    continue;
                }
                rows.read(r, line, issues).ifPresent(parts::add);
            }
            failOnErrors(name, issues, !lenient);
            return new StockCatalog(name, description, demo, parts, issues);
        } catch (IOException | UncheckedIOException | IllegalArgumentException | IllegalStateException e) {
            throw new BadInputException(name + ": not a readable CSV catalogue: " + csvProblem(e), e);
        }
    }

    /** The parser's complaint in the reader's words, on one line. */
    private static String csvProblem(Exception e) {
        Throwable t = e instanceof UncheckedIOException u && u.getCause() != null ? u.getCause() : e;
        String m = String.valueOf(t.getMessage());
        java.util.regex.Matcher quote = java.util.regex.Pattern.compile("\\(startline (\\d+)\\) EOF reached before encapsulated"
                + " token finished").matcher(m);
        if (quote.find()) {
            return "the quoted cell that starts on line " + quote.group(1) + " is never closed; add the closing '\"'";
        }
        return SafeText.quote(m.replaceAll("\\s+", " "), 300);
    }

    /** Mapped columns must exist in the header; mapped material and end names must name our keys. */
    private ColumnMapping checkMapping(ColumnMapping m, List<String> header, String name, long line,
                                       List<CatalogIssue> issues) {
        for (Map.Entry<CatalogField, ColumnSource> e : m.fields().entrySet()) {
            ColumnSource src = e.getValue();
            if (!src.isConstant() && !header.contains(src.column())) {
                issues.add(new CatalogIssue(Severity.ERROR, name, line, src.column(), "the mapping reads "
                        + e.getKey().key() + " from this column but the header has no such column"
                        + Suggest.hint(src.column(), header) + "; header: " + String.join(", ", header)));
            }
        }
        for (Map.Entry<String, String> e : new TreeMap<>(m.materialNames()).entrySet()) {
            if (!materials.contains(e.getValue())) {
                issues.add(new CatalogIssue(Severity.ERROR, name, 0, "", "material_names." + e.getKey() + " maps to "
                        + Choices.unknownMaterial(e.getValue(), materials.keys())));
            }
        }
        for (Map.Entry<String, String> e : new TreeMap<>(m.endNames()).entrySet()) {
            if (!Choices.endKeys().contains(e.getValue())) {
                issues.add(new CatalogIssue(Severity.ERROR, name, 0, "", "end_names." + e.getKey() + " maps to "
                        + Choices.unknown("end type", e.getValue(), Choices.endKeys())));
            }
        }
        return m;
    }

    private static void failOnErrors(String name, List<CatalogIssue> issues, boolean fail) {
        List<CatalogIssue> errors = issues.stream().filter(CatalogIssue::isError).toList();
        if (!fail || errors.isEmpty()) {
            return;
        }
        String listed = errors.stream().limit(MAX_LISTED).map(i -> "  " + i).collect(Collectors.joining("\n"));
        if (errors.size() > MAX_LISTED) {
            listed += "\n  ... and " + (errors.size() - MAX_LISTED) + " more";
        }
        throw BadInputException.of(Message.CATALOG_INVALID, name, errors.size(), listed);
    }
}
