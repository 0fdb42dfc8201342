package dev.coilwise.requirement;

import dev.coilwise.error.InternalFaultException;
import dev.coilwise.error.Message;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Job;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Ranking;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.SpringOptions;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Reads a requirement file (YAML, format in {@code docs/requirement-format.md}) into a validated {@link Requirement}
 * in SI. The file is first checked against the requirement schema ({@link RequirementSchema}), then by the reader's
 * own checks (units, dimensions, ranges, keys that contradict each other). Every problem of the file is collected,
 * with its line and column, and thrown together in one {@link RequirementException}; a mistake both checks find is
 * reported once, in the reader's words.
 *
 * <p>The unit system of the requirement is decided by majority: US when more of the file's lengths, forces, masses,
 * speeds, rates and stresses are written in inch-pound units (in, ft, lb, lbf, psi, kpsi) than in metric units; SI
 * otherwise, ties included. Angles, percentages and gn count for neither.
 */
public final class RequirementReader {
    static final List<String> TOP_KEYS = List.of("title", "job", "load", "motion", "launch", "limits", "envelope", "spring",
            "stock", "ranking");
    static final String NEEDED = "job, load, limits and motion (arrest) or launch (launch)";

    private final MaterialTable materials;
    private final boolean schemaCheck;

    public RequirementReader(MaterialTable materials) {
        this(materials, true);
    }

    /** A reader that may leave out the schema check: for the tests that compare the schema with the reader. */
    RequirementReader(MaterialTable materials, boolean schemaCheck) {
        this.materials = Objects.requireNonNull(materials, "materials");
        this.schemaCheck = schemaCheck;
    }

    /** Reads and validates a file; stock paths are resolved against the file's folder. */
    public Requirement read(Path file) {
        Problems problems = new Problems(file.toString());
        Optional<String> text = FileText.read(file, problems);
        problems.throwIfAny();
        return parse(text.orElseThrow(), problems, FileText.folderOf(file), titleOf(file.toString()));
    }

    /**
     * Parses requirement text.
     *
     * @param fileNameForMessages  the name problems are reported under
     * @param baseDirForStockPaths the folder relative stock paths are resolved against (null: the working directory)
     */
    public Requirement parse(String yamlText, String fileNameForMessages, Path baseDirForStockPaths) {
        Path base = baseDirForStockPaths == null ? Path.of("").toAbsolutePath() : baseDirForStockPaths;
        return parse(yamlText, new Problems(fileNameForMessages), base, titleOf(fileNameForMessages));
    }

    private Requirement parse(String text, Problems problems, Path base, String defaultTitle) {
        Optional<YamlNode.Mapping> root = YamlTreeReader.read(text, problems, NEEDED);
        problems.throwIfAny();
        Section top = new Section("", root.orElseThrow(), new YamlNode.Position(1, 1), problems, TOP_KEYS);
        String title = top.has("title") ? top.text("title").orElse(defaultTitle) : defaultTitle;
        if (title.chars().anyMatch(Character::isISOControl)) {
            top.problem("title", Message.CONTROL_CHARACTER.format(Shown.value(title)));
        }
        Optional<String> job = top.has("job") ? top.choice("job", List.of(JobReader.ARREST, JobReader.LAUNCH)) : Optional.empty();
        if (!top.has("job")) {
            top.missing("job", "what the spring must do: arrest or launch");
        }
        Optional<Job> event = JobReader.read(top, job);
        Optional<Limits> limits = LimitsReader.limits(top, job);
        Optional<Envelope> envelope = LimitsReader.envelope(top, job);
        if (limits.isPresent() && envelope.isPresent()) {
            LimitsReader.crossCheck(top, limits.get(), envelope.get());
        }
        Optional<SpringOptions> spring = SpringOptionsReader.read(top, materials);
        Optional<Ranking> ranking = RankingReader.read(top);
        List<Path> stock = RankingReader.stock(top, base);
        // The schema's problems are kept apart from the reader's and merged when thrown, so checking the schema
        // after the reader's own checks reports exactly the same; it lets a start-up thread compile the schema
        // (cli.Warmup) while this thread reads the file.
        if (schemaCheck) {
            RequirementSchema.check(root.orElseThrow(), problems);
        }
        problems.throwIfAny();
        Optional<Requirement> requirement = top.build("", () -> new Requirement(title, got(event, "job"),
                got(limits, "limits"), got(envelope, "envelope"), got(spring, "spring"), got(ranking, "ranking"),
                problems.unitSystem(), stock));
        problems.throwIfAny();
        return requirement.orElseThrow();
    }

    /** A part every problem-free file has; its absence without a reported problem is a reader bug. */
    private static <T> T got(Optional<T> part, String name) {
        return part.orElseThrow(() -> new InternalFaultException("requirement reader: no " + name + " and no problem reported"));
    }

    /** The file name without folders and extension; works on labels such as {@code <stdin>} that are no path. */
    private static String titleOf(String fileName) {
        String n = fileName.substring(Math.max(fileName.lastIndexOf('/'), fileName.lastIndexOf('\\')) + 1);
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }
}
