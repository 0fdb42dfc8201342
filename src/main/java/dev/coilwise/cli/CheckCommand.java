package dev.coilwise.cli;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.report.DisplayUnits;
import dev.coilwise.report.EvaluationReport;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.requirement.SpringFileReader;
import java.nio.file.Path;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "check", header = "Check one given spring against a requirement: every figure and every margin.",
        description = "Exit code 0 when the spring meets every limit, 3 when it fails one.")
final class CheckCommand extends BaseCommand {
    @Parameters(paramLabel = "FILE", description = "The requirement file (YAML).")
    Path file;

    @Option(names = "--spring", paramLabel = "SPRING", required = true,
            description = "The spring to check (YAML: material, ends, wire_diameter, mean_diameter or"
                + " outer_diameter, active_coils or total_coils, free_length).")
    Path springFile;

    @Option(names = "--units", paramLabel = "UNITS", description = "si or us (default: those of the requirement).")
    SizeCommand.Units units;

    @Override
    int execute() {
        MaterialTable table = MaterialTable.loadDefault();
        Requirement req = new RequirementReader(table).read(file);
        Spring spring = new SpringFileReader().read(springFile, table);
        Evaluation e = DesignEvaluator.evaluate(spring, req);
        DisplayUnits du = new DisplayUnits(units == null ? req.units()
                : units == SizeCommand.Units.us ? UnitSystem.US : UnitSystem.SI);
        out().print(EvaluationReport.write(req, e, du));
        return e.feasible() ? ExitCode.OK : ExitCode.NOTHING_FEASIBLE;
    }
}
