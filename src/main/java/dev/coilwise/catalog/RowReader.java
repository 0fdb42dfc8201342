package dev.coilwise.catalog;

import dev.coilwise.catalog.CatalogIssue.Severity;
import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;
import org.apache.commons.csv.CSVRecord;

/** Turns one catalogue row into a {@link StockPart}, recomputing the spring; every problem becomes an issue. */
final class RowReader {
    private final MaterialTable materials;
    private final ColumnMapping mapping;
    private final String file;
    private final boolean demo;

    /** Per-row state: the record, its line and the issues found so far. */
    private final class Row {
        final CSVRecord record;
        final long line;
        final List<CatalogIssue> issues;
        boolean failed;

        Row(CSVRecord record, long line, List<CatalogIssue> issues) {
            this.record = record;
            this.line = line;
            this.issues = issues;
        }

        void issue(Severity sev, CatalogField f, String message) {
            ColumnSource src = f == null ? null : mapping.fields().get(f);
            issues.add(new CatalogIssue(sev, file, line, src == null ? "" : src.label(), message));
            failed |= sev == Severity.ERROR;
        }

        ColumnSource source(CatalogField f) {
            return mapping.fields().get(f);
        }

        /** Cell text, stripped; null when the field is unmapped or the cell is empty. */
        String text(CatalogField f) {
            ColumnSource src = mapping.fields().get(f);
            if (src == null) {
                return null;
            }
            String v = src.isConstant() ? src.constant() : record.get(src.column());
            v = v == null ? "" : v.strip();
            if (v.chars().anyMatch(Character::isISOControl)) {
                issue(Severity.ERROR, f, f.description() + " '" + v + "' holds a control character; write plain text");
                return null;
            }
            if (v.isEmpty()) {
                if (f.required()) {
                    issue(Severity.ERROR, f, Message.CATALOG_EMPTY_VALUE.format(f.description()));
                }
                return null;
            }
            return v;
        }

        /** Cell as a finite number in SI (dimensioned fields) or as written; empty when blank or bad. */
        OptionalDouble number(CatalogField f) {
            String v = text(f);
            if (v == null) {
                return OptionalDouble.empty();
            }
            ColumnSource src = mapping.fields().get(f);
            String unit = src.unit() == null ? "plain figures" : src.unit().symbol();
            String s = mapping.decimalSeparator() == ',' ? v.replace(',', '.') : v;
            double x;
            try {
                x = Double.parseDouble(s);
            } catch (NumberFormatException e) {
                x = Double.NaN;
            }
            if (!Double.isFinite(x)) {
                issue(Severity.ERROR, f, Message.CATALOG_BAD_NUMBER.format(f.description(), unit, v));
                return OptionalDouble.empty();
            }
            if ((x <= 0 && f != CatalogField.UNIT_PRICE) || x < 0) {
                issue(Severity.ERROR, f, (f == CatalogField.UNIT_PRICE ? Message.NEGATIVE : Message.NOT_POSITIVE)
                        .format(f.description(), v, src.unit() == null ? "" : unit));
                return OptionalDouble.empty();
            }
            return OptionalDouble.of(src.unit() == null ? x : src.unit().toSi(x));
        }

        /**
         * A key cell: one of the file's own names that the mapping translates ({@code names}), or one of our
         * {@code keys}; anything else is a row error naming the nearest allowed word.
         */
        <T> T key(CatalogField f, Map<String, String> names, List<String> keys, Function<String, T> lookup) {
            String v = text(f);
            if (v == null) {
                return null;
            }
            String key = names.getOrDefault(v, v);
            if (!keys.contains(key)) {
                List<String> allowed = Choices.both(new java.util.TreeSet<>(names.keySet()), keys);
                String section = f == CatalogField.MATERIAL ? "material_names" : "end_names";
                issue(Severity.ERROR, f, f == CatalogField.MATERIAL && names.isEmpty()
                        ? Choices.unknownMaterial(v, keys)
                        : Choices.unknown(f == CatalogField.MATERIAL ? "material" : "end type", v, allowed,
                                Choices.namesOrKeys(section, names.keySet(), keys)));
                return null;
            }
            return lookup.apply(key);
        }
    }

    /**
     * Bounds on a part, coilwise's own (the same as for spring files, docs/requirement-format.md): outer diameter
     * 1 m, free length 5 m, active coils 200 (the model's bound), pack quantity a million springs. A value past one
     * is a slip of the number or of the column's unit.
     */
    static final double MAX_DIAMETER = 1, MAX_LENGTH = 5, MAX_COILS = 200, MAX_PACK = 1e6;

    RowReader(MaterialTable materials, ColumnMapping mapping, String file, boolean demo) {
        this.materials = materials;
        this.mapping = mapping;
        this.file = file;
        this.demo = demo;
    }

    Optional<StockPart> read(CSVRecord record, long line, List<CatalogIssue> issues) {
        Row row = new Row(record, line, issues);
        String part = row.text(CatalogField.PART_NUMBER);
        String supplier = row.text(CatalogField.SUPPLIER);
        Material mat = row.key(CatalogField.MATERIAL, mapping.materialNames(), materials.keys(), materials::get);
        EndType ends = row.key(CatalogField.ENDS, mapping.endNames(), Choices.endKeys(), EndType::fromKey);
        OptionalDouble d = row.number(CatalogField.WIRE_DIAMETER);
        OptionalDouble od = row.number(CatalogField.OUTER_DIAMETER);
        OptionalDouble l0 = row.number(CatalogField.FREE_LENGTH);
        OptionalDouble na = row.number(CatalogField.ACTIVE_COILS);
        OptionalDouble nt = row.number(CatalogField.TOTAL_COILS);
        OptionalDouble rate = row.number(CatalogField.RATE);
        OptionalDouble ls = row.number(CatalogField.SOLID_LENGTH);
        OptionalDouble maxDefl = row.number(CatalogField.MAX_DEFLECTION);
        OptionalDouble maxLoad = row.number(CatalogField.MAX_LOAD);
        OptionalDouble price = row.number(CatalogField.UNIT_PRICE);
        String currency = row.text(CatalogField.CURRENCY);
        OptionalDouble pack = row.number(CatalogField.PACK_QUANTITY);
        if (pack.isPresent() && pack.getAsDouble() != Math.rint(pack.getAsDouble())) {
            row.issue(Severity.ERROR, CatalogField.PACK_QUANTITY,
                    "pack quantity must be a whole number of springs, got " + fmt(pack.getAsDouble()));
        } else if (pack.isPresent() && pack.getAsDouble() > MAX_PACK) {
            row.issue(Severity.ERROR, CatalogField.PACK_QUANTITY, "pack quantity must be at most " + (long) MAX_PACK
                    + " springs, got " + fmt(pack.getAsDouble()));
        }
        bound(row, CatalogField.OUTER_DIAMETER, od, MAX_DIAMETER, "1 m");
        bound(row, CatalogField.FREE_LENGTH, l0, MAX_LENGTH, "5 m");
        bound(row, CatalogField.ACTIVE_COILS, na, MAX_COILS, "200");
        bound(row, CatalogField.TOTAL_COILS, nt, MAX_COILS + 2, "202");
        if (na.isEmpty() && nt.isEmpty() && !row.failed) {
            row.issue(Severity.ERROR, null, "the row gives neither active nor total coils");
        }
        if (row.failed) {
            return Optional.empty();
        }
        Set<StockFlag> flags = EnumSet.noneOf(StockFlag.class);
        double active = na.isPresent() ? na.getAsDouble() : nt.getAsDouble() - ends.inactiveCoils();
        if (na.isPresent() && nt.isPresent() && Math.abs(nt.getAsDouble() - ends.totalCoils(active)) > 0.05) {
            row.issue(Severity.WARNING, CatalogField.TOTAL_COILS, String.format(Locale.ROOT,
                    "total coils %s disagree with %s active coils and %s ends (expected %s); active coils are used",
                    fmt(nt.getAsDouble()), fmt(active), ends.key(), fmt(ends.totalCoils(active))));
            flags.add(StockFlag.COILS_INCONSISTENT);
        }
        double wire = d.getAsDouble();
        if (!mat.covers(wire)) {
            row.issue(Severity.WARNING, CatalogField.WIRE_DIAMETER, "part skipped: " + Message.WIRE_OUT_OF_MATERIAL_RANGE
                    .format(wire * 1e3, mat.key(), mat.minDiameter() * 1e3, mat.maxDiameter() * 1e3));
            return Optional.empty();
        }
        Spring spring;
        try {
            spring = new Spring(mat, ends, wire, od.getAsDouble() - wire, active, l0.getAsDouble());
        } catch (BadInputException e) {
            row.issue(Severity.ERROR, null, "the geometry is not a valid spring: " + e.getMessage());
            return Optional.empty();
        }
        if (rate.isPresent() && differs(row, CatalogField.RATE, rate.getAsDouble(), spring.rate())) {
            flags.add(StockFlag.STATED_RATE_DIFFERS);
        }
        if (ls.isPresent() && differs(row, CatalogField.SOLID_LENGTH, ls.getAsDouble(), spring.solidLength())) {
            flags.add(StockFlag.STATED_SOLID_LENGTH_DIFFERS);
        }
        if (demo) {
            flags.add(StockFlag.DEMO_DATA);
        }
        return Optional.of(new StockPart(part, supplier, spring, price.getAsDouble(), currency,
                pack.isPresent() ? (int) pack.getAsDouble() : 1, rate, ls, maxDefl, maxLoad, flags, file + ":" + line));
    }

    /** A value past coilwise's bound for the field is a row error naming the bound. */
    private static void bound(Row row, CatalogField f, OptionalDouble v, double max, String maxText) {
        if (v.isPresent() && v.getAsDouble() > max) {
            ColumnSource src = row.source(f);
            String written = src.isConstant() ? src.constant() : row.record.get(src.column());
            row.issue(Severity.ERROR, f, f.description() + " '" + written.strip() + "'"
                    + (src.unit() == null ? "" : " " + src.unit().symbol()) + " is more than " + maxText
                    + ", the largest coilwise accepts; check the number and the column's unit");
        }
    }

    private boolean differs(Row row, CatalogField f, double stated, double computed) {
        double rel = Math.abs(stated - computed) / computed;
        if (rel <= CatalogReader.STATED_VALUE_TOLERANCE) {
            return false;
        }
        CatalogUnit u = mapping.fields().get(f).unit();
        row.issue(Severity.WARNING, f, Message.CATALOG_STATED_DIFFERS.format(f == CatalogField.RATE ? "rate" : "solid length",
                u.fromSi(stated), u.symbol(), u.fromSi(computed), u.symbol(), rel * 100,
                CatalogReader.STATED_VALUE_TOLERANCE * 100));
        return true;
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
