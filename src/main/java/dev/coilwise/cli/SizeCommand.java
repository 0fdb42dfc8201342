package dev.coilwise.cli;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.report.DisplayUnits;
import dev.coilwise.report.ShortlistCsv;
import dev.coilwise.report.ShortlistJson;
import dev.coilwise.report.ShortlistTable;
import dev.coilwise.report.html.HtmlReportWriter;
import dev.coilwise.report.html.ReportData;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.search.Sizer;
import dev.coilwise.search.SizingResult;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "size", header = "Search the design space of a requirement file and rank the feasible springs.",
        description = "Reads FILE, searches materials, end types, wire and coil diameters, active coils and free"
            + " lengths, keeps the designs that meet every limit and prints the shortlist. With --out, writes"
            + " shortlist.csv, shortlist.json and report.html (a self-contained page with charts) to DIR.")
final class SizeCommand extends BaseCommand {
    enum Format { table, csv, json }

    enum Units { si, us }

    @Parameters(paramLabel = "FILE", description = "The requirement file (YAML).")
    Path file;

    @Option(names = "--out", paramLabel = "DIR", description = "Folder to write shortlist.csv, shortlist.json and report.html into.")
    Path out;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "table",
            description = "What to print: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    Format format;

    @Option(names = "--units", paramLabel = "UNITS",
            description = "Units of the printed table: ${COMPLETION-CANDIDATES} (default: those of the file).")
    Units units;

    @Option(names = "--top", paramLabel = "N", description = "Keep N designs (overrides ranking.shortlist).")
    Integer top;

    @Override
    int execute() throws IOException {
        MaterialTable table = MaterialTable.loadDefault();
        Requirement req = new RequirementReader(table).read(file);
        if (top != null) {
            if (top < 1 || top > 100) {
                throw new dev.coilwise.error.BadInputException("--top must be between 1 and 100, got " + top);
            }
            req = Requirements.withShortlist(req, top);
        }
        SizingResult result = new Sizer(table).size(req);
        DisplayUnits du = new DisplayUnits(units == null ? req.units() : units == Units.us ? UnitSystem.US : UnitSystem.SI);
        String json = ShortlistJson.write(result);
        String csv = ShortlistCsv.write(result);
        if (out != null) {
            OutputFolder folder = new OutputFolder(out, List.of(file));
            folder.add("shortlist.json", json);
            folder.add("shortlist.csv", csv);
            folder.add("report.html", HtmlReportWriter.write(ReportData.parse(json)));
            folder.commit();
        }
        switch (format) {
            case csv -> out().print(csv);
            case json -> out().print(json);
            default -> {
                out().print(ShortlistTable.write(result, du));
                if (out != null) {
                    out().println("Wrote shortlist.csv, shortlist.json and report.html to " + out);
                }
            }
        }
        return result.feasible() ? ExitCode.OK : ExitCode.NOTHING_FEASIBLE;
    }
}
