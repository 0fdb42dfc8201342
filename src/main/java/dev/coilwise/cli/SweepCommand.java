package dev.coilwise.cli;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.report.SweepCsv;
import dev.coilwise.requirement.QuantityKind;
import dev.coilwise.requirement.Quantities;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.search.DesignSpace;
import dev.coilwise.search.PrunedSearch;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "sweep", header = "Size a family of requirements: one key of FILE varied in steps, one CSV row per step.",
        description = {"Sets KEY of FILE to STEPS values evenly spaced from FROM to TO (both included), sizes each"
            + " requirement and writes one CSV row per step with the best design and its figures, to standard output"
            + " or to --out. FROM and TO carry units as in the file (100mm, 1.5 in, 20 %); plain numbers for"
            + " spring.cycles and spring.fatigue_margin. Each value is checked as if written in the file.",
            "Keys: " + "load.mass, load.weight, motion.drop_height, motion.speed, motion.direction, motion.drive_force,"
            + " launch.height, launch.direction, launch.losses, limits.stroke, limits.peak_force, limits.deceleration,"
            + " envelope.bore, envelope.rod, envelope.clearance, envelope.max_free_length, envelope.pocket_length,"
            + " spring.clash_allowance, spring.cycles, spring.fatigue_margin.",
            "Exit code 0 when some step has a feasible design, 3 when none has."})
final class SweepCommand extends BaseCommand {
    @Parameters(paramLabel = "FILE", description = "The requirement file (YAML).")
    Path file;

    @Option(names = "--vary", paramLabel = "KEY=FROM..TO:STEPS", required = true,
            description = "The key to vary and its range, e.g. motion.drop_height=100mm..600mm:50.")
    String vary;

    @Option(names = "--out", paramLabel = "FILE", description = "Write the CSV to FILE (atomically) instead of standard output.")
    Path out;

    /** Whether standard error is a terminal; tests set it. */
    boolean terminal = System.console() != null;

    @Override
    int execute() throws IOException {
        Variation v = Variation.parse(vary, SweepCommand::convert);
        MaterialTable table = MaterialTable.loadDefault();
        VariedRequirement base = VariedRequirement.of(file, v.key(), new RequirementReader(table));
        List<String> values = v.texts();
        Requirement first = step(base, v, values, 0);
        // Steps are independent: each is read (every value checked as if written in the file) and sized on whichever
        // core is free; the rows, and the step named when several are bad (the first in step order), do not depend on
        // thread timing.
        Progress progress = new Progress(err(), terminal);
        AtomicInteger done = new AtomicInteger();
        PrunedSearch search = new PrunedSearch();
        List<Outcome> outcomes = IntStream.range(0, values.size()).parallel().mapToObj(i -> {
            Outcome outcome;
            try {
                Requirement req = i == 0 ? first : step(base, v, values, i);
                outcome = new Outcome(new SweepCsv.Row(values.get(i), search.best(DesignSpace.of(req, table))), null);
            } catch (BadInputException e) {
                outcome = new Outcome(null, e);
            }
            progress.update(done.incrementAndGet(), values.size());
            return outcome;
        }).toList();
        progress.finish();
        List<SweepCsv.Row> rows = new ArrayList<>();
        for (Outcome o : outcomes) {
            if (o.error() != null) {
                throw o.error(); // the first bad step in step order
            }
            rows.add(o.row());
        }
        String csv = SweepCsv.write(v.key(), first.isArrest(), first.ranking().by(), rows);
        if (out == null) {
            out().print(csv);
        } else {
            write(out, csv);
            err().println("Wrote " + rows.size() + " rows to " + out);
        }
        return rows.stream().anyMatch(r -> r.best().isPresent()) ? ExitCode.OK : ExitCode.NOTHING_FEASIBLE;
    }

    /** One step: its row, or the bad input that stopped it. */
    private record Outcome(SweepCsv.Row row, BadInputException error) {
    }

    /** The requirement of step {@code i} (0-based); a bad value is reported with its step number. */
    private static Requirement step(VariedRequirement base, Variation v, List<String> values, int i) {
        try {
            return base.with(values.get(i));
        } catch (BadInputException e) {
            throw new BadInputException("--vary step " + (i + 1) + " (" + v.key() + " = " + values.get(i) + "): "
                    + e.getMessage(), e);
        }
    }

    /** Writes through {@link OutputFolder}: a temporary file in the same folder moved over the name, never over the input. */
    private void write(Path target, String text) {
        Path t = target.toAbsolutePath().normalize();
        if (Files.isDirectory(t)) {
            throw new BadInputException("--out " + target + " is a folder; give a file name");
        }
        OutputFolder folder = new OutputFolder(t.getParent(), List.of(file));
        folder.add(t.getFileName().toString(), text);
        folder.commit();
    }

    /** Converts {@code value} from {@code fromUnit} to {@code toUnit}, both read by the requirement reader's unit parser. */
    private static double convert(double value, String fromUnit, String toUnit, String key) {
        if (!fromUnit.isEmpty() && !toUnit.isEmpty()) {
            for (QuantityKind kind : QuantityKind.values()) {
                try {
                    double a = Quantities.parse("1 " + fromUnit, kind, key);
                    double b = Quantities.parse("1 " + toUnit, kind, key);
                    return value * a / b;
                } catch (BadInputException e) {
                    // not this kind; try the next
                }
            }
        }
        throw new BadInputException("--vary " + key + ": FROM is in '" + toUnit + "' and TO in '" + fromUnit
                + "'; give both in units of the same kind");
    }
}
