package dev.coilwise.cli;

import dev.coilwise.dynamics.ApexBand;
import dev.coilwise.dynamics.DynamicsFlags;
import dev.coilwise.dynamics.LimitBreach;
import dev.coilwise.dynamics.SimulatedLimits;
import dev.coilwise.dynamics.SimulationOptions;
import dev.coilwise.dynamics.SimulationResult;
import dev.coilwise.dynamics.SimulationSummary;
import dev.coilwise.dynamics.Simulator;
import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.report.Caution;
import dev.coilwise.report.DisplayUnits;
import dev.coilwise.report.TimeHistoryChart;
import dev.coilwise.report.TimeHistoryCsvWriter;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.requirement.SpringFileReader;
import dev.coilwise.scatter.ScatterSettings;
import dev.coilwise.search.PrunedSearch;
import dev.coilwise.search.Sizer;
import dev.coilwise.search.SizingOptions;
import dev.coilwise.search.SizingResult;
import java.nio.file.Path;
import java.util.List;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "simulate", header = "Simulate one design in time, with a spring that has mass.",
        description = {"Takes the design of the given rank from sizing FILE (default rank 1), or the spring in"
            + " --spring, and integrates the impact or launch with the active coils as a chain of lumped masses.",
            "Prints the simulated figures beside the energy balance; with --out DIR writes time-history.csv and"
            + " time-history.svg (displacement and force against time)."})
final class SimulateCommand extends BaseCommand {
    @Parameters(paramLabel = "FILE", description = "The requirement file (YAML).")
    Path file;

    static final class Which {
        @Option(names = "--design", paramLabel = "RANK", description = "Rank of the design in the shortlist of FILE.")
        Integer rank;

        @Option(names = "--spring", paramLabel = "SPRING", description = "A spring file to simulate instead.")
        Path spring;
    }

    @ArgGroup(exclusive = true)
    Which which;

    @Option(names = "--masses", paramLabel = "N", defaultValue = "20",
            description = "Lumped masses of the active coils (default: ${DEFAULT-VALUE}).")
    int masses;

    @Option(names = "--damping", paramLabel = "ZETA", defaultValue = "0",
            description = "Material damping ratio of the first mode (default: ${DEFAULT-VALUE}).")
    double damping;

    @Option(names = "--out", paramLabel = "DIR", description = "Folder to write time-history.csv and .svg into.")
    Path out;

    @Override
    int execute() throws java.io.IOException {
        if (masses < SimulationOptions.MIN_MASSES || masses > SimulationOptions.MAX_MASSES) {
            throw new BadInputException("--masses must be between " + SimulationOptions.MIN_MASSES + " and "
                    + SimulationOptions.MAX_MASSES + ", got " + masses);
        }
        if (!(damping >= 0 && damping <= SimulationOptions.MAX_DAMPING_RATIO)) {
            throw new BadInputException("--damping must be between 0 and " + SimulationOptions.MAX_DAMPING_RATIO
                    + ", got " + damping);
        }
        MaterialTable table = MaterialTable.loadDefault();
        Requirement req = new RequirementReader(table).read(file);
        Spring spring;
        String label;
        if (which != null && which.spring != null) {
            spring = new SpringFileReader().read(which.spring, table);
            label = which.spring.getFileName().toString();
        } else {
            int rank = which == null || which.rank == null ? 1 : which.rank;
            SizingResult sized = new Sizer(table, new PrunedSearch(), SizingOptions.searchOnly()).size(req);
            if (rank < 1 || rank > sized.shortlist().size()) {
                if (sized.shortlist().isEmpty()) {
                    out().println("No feasible design to simulate; run `coilwise size " + file + "` for the diagnosis.");
                    return ExitCode.NOTHING_FEASIBLE;
                }
                throw new BadInputException("--design must be between 1 and " + sized.shortlist().size() + ", got " + rank);
            }
            spring = sized.shortlist().get(rank - 1).evaluation().spring();
            label = "design " + rank;
        }
        Evaluation balance = DesignEvaluator.evaluate(spring, req);
        SimulationOptions opt = SimulationOptions.defaults().withMasses(masses).withDampingRatio(damping)
                .withHistory(out != null);
        SimulationResult r = Simulator.simulate(spring, req, balance, opt);
        DisplayUnits u = new DisplayUnits(req.units());
        out().print(describe(label, spring, balance, r.summary(), req, u));
        if (out != null) {
            OutputFolder folder = new OutputFolder(out, which != null && which.spring != null
                    ? List.of(file, which.spring) : List.of(file));
            folder.add("time-history.csv", TimeHistoryCsvWriter.toCsv(r.history()));
            folder.add("time-history.svg", TimeHistoryChart.svg(r.history(), req.title() + " - " + label, req.units()));
            folder.commit();
            out().println("Wrote time-history.csv and time-history.svg to " + out);
        }
        return ExitCode.OK;
    }

    static String describe(String label, Spring s, Evaluation e, SimulationSummary sim, Requirement req,
                           DisplayUnits u) {
        StringBuilder sb = new StringBuilder();
        boolean arrest = "arrest".equals(e.job());
        sb.append(label).append(": ").append(s.material().key()).append(' ').append(s.ends().key()).append(", d ")
                .append(u.wireWithUnit(s.wireDiameter())).append(", OD ").append(u.lenWithUnit(s.outerDiameter()))
                .append(DisplayUnits.fmt(", Na %.2f, L0 ", s.activeCoils())).append(u.lenWithUnit(s.freeLength()))
                .append('\n');
        sb.append(DisplayUnits.fmt("simulated with %d lumped masses (active coils only; the end coils are not"
                + " modelled)%n%n", sim.masses()));
        sb.append(DisplayUnits.fmt("  %-30s %16s %16s%n", "", "energy balance", "simulation"));
        if (arrest) {
            row(sb, "max compression from contact", u.lenWithUnit(e.workingDeflection()), u.lenWithUnit(sim.maxCompression()));
            row(sb, "peak force", u.forceWithUnit(e.peakForce()), u.forceWithUnit(sim.peakForce()));
            row(sb, "stop time", "-", DisplayUnits.fmt("%.2f ms", sim.stopTime() * 1e3));
            row(sb, "rebound speed", "-", DisplayUnits.sig(u.speed(sim.reboundSpeed())) + " " + u.speedUnit());
        } else {
            row(sb, "exit speed", DisplayUnits.sig(u.speed(e.speed())) + " " + u.speedUnit(),
                    DisplayUnits.sig(u.speed(sim.exitSpeed())) + " " + u.speedUnit());
            row(sb, "apex above muzzle", u.lenWithUnit(e.predictedHeight()), u.lenWithUnit(sim.apex()));
        }
        row(sb, "peak stress", u.stressWithUnit(e.stressAtWorking()), u.stressWithUnit(sim.peakStress()));
        row(sb, "allowable stress", u.stressWithUnit(e.allowableStress()), "");
        row(sb, "coils clashed", "-", sim.coilClash() ? DisplayUnits.fmt("yes, %.2f ms, element %d",
                sim.firstClashTime() * 1e3, sim.firstClashElement()) : "no");
        sb.append(DisplayUnits.fmt("%n  largest deviation from the balance: %.1f %%%n", sim.deviationPct()));
        DynamicsFlags.warnings(sim, e, req.job(), u.system()).forEach(f -> sb.append("  WARNING: ").append(f)
                .append('\n'));
        DynamicsFlags.notes(sim, req.job(), u.system()).forEach(n -> sb.append("  note: ").append(n).append('\n'));
        ScatterSettings band = ScatterSettings.defaults();
        List<LimitBreach> breaches = SimulatedLimits.breaches(sim, e, req,
                new ApexBand(band.heightShortfall(), band.heightOvershoot()));
        if (breaches.isEmpty()) {
            sb.append("\n  With the simulated figures the design meets every limit that ranking.dynamics: strict checks.\n");
        } else {
            sb.append("\n  With the simulated figures the design breaks ").append(breaches.size() == 1 ? "a limit"
                    : breaches.size() + " limits").append(" (ranking.dynamics: strict would drop it):\n");
            breaches.forEach(b -> sb.append("  LIMIT: ").append(b.words()).append('\n'));
        }
        sb.append('\n').append(Caution.TEXT).append('\n');
        return sb.toString();
    }

    private static void row(StringBuilder sb, String label, String balance, String sim) {
        sb.append(DisplayUnits.fmt("  %-30s %16s %16s%n", label, balance, sim));
    }
}
