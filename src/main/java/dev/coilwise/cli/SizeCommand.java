package dev.coilwise.cli;

import dev.coilwise.catalog.CatalogIssue;
import dev.coilwise.catalog.CatalogReader;
import dev.coilwise.catalog.StockCatalog;
import dev.coilwise.catalog.StockPart;
import dev.coilwise.dynamics.SimulationOptions;
import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.report.DisplayUnits;
import dev.coilwise.report.ShortlistCsv;
import dev.coilwise.report.ShortlistJson;
import dev.coilwise.report.ShortlistTable;
import dev.coilwise.report.SpecSheet;
import dev.coilwise.report.SpecSheetHtmlWriter;
import dev.coilwise.report.SpecSheetPdfWriter;
import dev.coilwise.report.html.HtmlReportWriter;
import dev.coilwise.report.html.ReportData;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.scatter.ScatterSettings;
import dev.coilwise.search.PrunedSearch;
import dev.coilwise.search.ShortlistEntry;
import dev.coilwise.search.Sizer;
import dev.coilwise.search.SizingOptions;
import dev.coilwise.search.SizingResult;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "size", header = "Search the design space of a requirement file and rank the feasible springs.",
        description = {"Reads FILE, searches materials, end types, wire and coil diameters, active coils and free"
            + " lengths, keeps the designs that meet every limit (beside feasible stock parts when the file lists"
            + " catalogues), checks the shortlist against manufacturing scatter and with a time-domain simulation,"
            + " and prints it.",
            "With --out DIR, writes shortlist.csv, shortlist.json, report.html (one self-contained page with charts)"
            + " and, for each custom design, a specification sheet (spec-N.pdf and spec-N.html) to DIR. Sheets an"
            + " earlier run left in DIR for designs not in this shortlist are removed, so that DIR holds this run"
            + " only; no other file in DIR is touched."})
final class SizeCommand extends BaseCommand {
    /** Names of the specification sheets, the outputs whose number varies from run to run. */
    static final Pattern SPEC_SHEET = Pattern.compile("spec-([1-9][0-9]{0,8})\\.(pdf|html)");

    enum Format { table, csv, json }

    enum Units { si, us }

    @Parameters(paramLabel = "FILE", description = "The requirement file (YAML).")
    Path file;

    @Option(names = "--out", paramLabel = "DIR", description = "Folder to write the shortlist, report and sheets into.")
    Path out;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "table",
            description = "What to print: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    Format format;

    @Option(names = "--units", paramLabel = "UNITS",
            description = "Units of the printed table: ${COMPLETION-CANDIDATES} (default: those of the file).")
    Units units;

    @Option(names = "--top", paramLabel = "N", description = "Keep N designs (overrides ranking.shortlist).")
    Integer top;

    @Option(names = "--samples", paramLabel = "N", defaultValue = "10000",
            description = "Monte Carlo samples per design for the manufacturing-scatter check; 0 turns it off"
                + " (default: ${DEFAULT-VALUE}).")
    int samples;

    @Option(names = "--seed", paramLabel = "SEED", defaultValue = "1",
            description = "Seed of the Monte Carlo (default: ${DEFAULT-VALUE}); the same seed gives the same result.")
    long seed;

    @Option(names = "--masses", paramLabel = "N", defaultValue = "20",
            description = "Lumped masses of the simulated spring (default: ${DEFAULT-VALUE}); 0 skips the simulation.")
    int masses;

    @Option(names = "--quantity", paramLabel = "N", defaultValue = "100",
            description = "Quantity printed on the specification sheets (default: ${DEFAULT-VALUE}).")
    int quantity;

    @Override
    int execute() throws IOException {
        MaterialTable table = MaterialTable.loadDefault();
        Requirement req = new RequirementReader(table).read(file);
        if (top != null) {
            if (top < 1 || top > 100) {
                throw new BadInputException("--top must be between 1 and 100, got " + top);
            }
            req = Requirements.withShortlist(req, top);
        }
        if (samples != 0 && (samples < 100 || samples > 10_000_000)) {
            throw new BadInputException("--samples must be 0 (off) or between 100 and 10000000, got " + samples);
        }
        if (masses != 0 && (masses < SimulationOptions.MIN_MASSES || masses > SimulationOptions.MAX_MASSES)) {
            throw new BadInputException("--masses must be 0 (no simulation) or between " + SimulationOptions.MIN_MASSES
                    + " and " + SimulationOptions.MAX_MASSES + ", got " + masses);
        }
        if (quantity < 1) {
            throw new BadInputException("--quantity must be at least 1, got " + quantity);
        }
        List<StockPart> stock = new ArrayList<>();
        List<String> catalogueNotes = new ArrayList<>();
        CatalogReader reader = new CatalogReader(table);
        for (Path p : req.stock()) {
            StockCatalog cat = reader.read(p);
            stock.addAll(cat.parts());
            List<CatalogIssue> w = cat.warnings();
            catalogueNotes.add("stock catalogue " + p.getFileName() + ": " + cat.parts().size() + " parts read"
                    + (cat.demo() ? " (demo data)" : "") + (w.isEmpty() ? "" : ", " + w.size() + " warnings (first: "
                    + w.get(0) + ")"));
        }
        Progress progress = new Progress(err(), "scatter", System.console() != null);
        SizingOptions options = new SizingOptions(
                samples == 0 ? Optional.empty() : Optional.of(ScatterSettings.defaults().withSamples(samples).withSeed(seed)),
                progress, masses == 0 ? Optional.empty()
                        : Optional.of(SimulationOptions.defaults().withMasses(masses).withHistory(true)));
        SizingResult result = new Sizer(table, new PrunedSearch(), options).size(req, stock)
                .withLeadingWarnings(catalogueNotes);
        progress.finish();
        DisplayUnits du = new DisplayUnits(units == null ? req.units() : units == Units.us ? UnitSystem.US : UnitSystem.SI);
        // Rendered only when asked for: the JSON writer's start-up alone is a large share of a short run.
        boolean files = out != null;
        String json = files || format == Format.json ? ShortlistJson.write(result) : null;
        String csv = files || format == Format.csv ? ShortlistCsv.write(result) : null;
        List<String> written = new ArrayList<>();
        List<String> removed = new ArrayList<>();
        if (files) {
            OutputFolder folder = new OutputFolder(out, inputs(req)).replacing(SPEC_SHEET);
            folder.add("shortlist.json", json);
            folder.add("shortlist.csv", csv);
            folder.add("report.html", HtmlReportWriter.write(ReportData.parse(json)));
            addSpecSheets(folder, result);
            folder.commit().forEach(p -> written.add(p.getFileName().toString()));
            removed.addAll(folder.removed());
            removed.sort(Comparator.comparingInt(SizeCommand::sheetRank).thenComparing(Comparator.naturalOrder()));
        }
        switch (format) {
            case csv -> out().print(csv);
            case json -> out().print(json);
            default -> {
                out().print(ShortlistTable.write(result, du));
                if (out != null) {
                    long sheets = written.stream().filter(w -> w.endsWith(".pdf")).count();
                    out().println("Wrote " + String.join(", ", written.stream().filter(w -> !w.startsWith("spec-")).toList())
                            + (sheets > 0 ? " and " + sheets + " specification sheets (spec-N.pdf, spec-N.html)" : "")
                            + " to " + out);
                }
            }
        }
        if (!removed.isEmpty()) {
            (format == Format.table ? out() : err()).println("Removed " + String.join(", ", removed) + " from " + out
                    + ": specification " + (removed.size() == 1 ? "sheet" : "sheets") + " of an earlier run, for"
                    + " designs not in this shortlist");
        }
        return result.feasible() ? ExitCode.OK : ExitCode.NOTHING_FEASIBLE;
    }

    /** The rank in a specification sheet's name. */
    private static int sheetRank(String name) {
        Matcher m = SPEC_SHEET.matcher(name);
        return m.matches() ? Integer.parseInt(m.group(1)) : Integer.MAX_VALUE;
    }

    private List<Path> inputs(Requirement req) {
        List<Path> in = new ArrayList<>(List.of(file));
        in.addAll(req.stock());
        return in;
    }

    private void addSpecSheets(OutputFolder folder, SizingResult result) throws IOException {
        for (ShortlistEntry e : result.shortlist()) {
            if (e.candidate().isStock()) {
                continue;
            }
            SpecSheet sheet = SpecSheet.build(e.evaluation().spring(), e.evaluation(), result.requirement(),
                    result.requirement().spring().toleranceGrade(), quantity);
            ByteArrayOutputStream pdf = new ByteArrayOutputStream();
            SpecSheetPdfWriter.write(sheet, pdf);
            folder.add("spec-" + e.rank() + ".pdf", pdf.toByteArray());
            StringWriter html = new StringWriter();
            SpecSheetHtmlWriter.write(sheet, html);
            folder.add("spec-" + e.rank() + ".html", html.toString());
        }
    }
}
