package dev.coilwise.requirement;

import dev.coilwise.error.Message;
import dev.coilwise.model.UnitSystem;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Collects the problems of one file while it is read, and tallies the unit system of its dimensional quantities.
 * Not thread-safe; one instance per read.
 */
final class Problems {
    /** Problems kept per file; past this the reader stops listing (a file this wrong needs rewriting, not a list). */
    static final int MAX_PROBLEMS = 100;

    private final String file;
    private final List<InputProblem> list = new ArrayList<>();
    private final List<InputProblem> schema = new ArrayList<>();
    private int siQuantities;
    private int usQuantities;

    Problems(String file) {
        this.file = file;
    }

    String file() {
        return file;
    }

    void add(YamlNode.Position at, String key, String message) {
        if (list.size() < MAX_PROBLEMS) {
            list.add(new InputProblem(file, at.line(), at.column(), key, message));
        } else if (list.size() == MAX_PROBLEMS) {
            list.add(new InputProblem(file, at.line(), at.column(), "", Message.TOO_MANY_PROBLEMS.format(MAX_PROBLEMS)));
        }
    }

    /**
     * Adds a problem found by the schema check. It is reported only when the reader's own checks find nothing at
     * the same key or at a key above it: the reader's message for the same mistake is the more precise (it knows the
     * units, the dimension, the other keys), and one mistake should be reported once.
     */
    void addSchema(YamlNode.Position at, String key, String message) {
        schema.add(new InputProblem(file, at.line(), at.column(), key, message));
    }

    boolean isEmpty() {
        return all().isEmpty();
    }

    /** The reader's own problems so far (without the schema's). */
    List<InputProblem> list() {
        return List.copyOf(list);
    }

    /** The problems the schema check found, before they are merged with the reader's. */
    List<InputProblem> schemaList() {
        return List.copyOf(schema);
    }

    /** The reader's problems and the schema's that the reader did not report at the same or a higher key. */
    List<InputProblem> all() {
        List<InputProblem> merged = new ArrayList<>(list);
        for (InputProblem p : schema) {
            boolean covered = list.stream().anyMatch(r -> r.key().equals(p.key()) || p.key().startsWith(r.key() + ".")
                    || r.key().isEmpty() && r.line() == p.line() && r.column() == p.column());
            if (!covered) {
                merged.add(p);
            }
        }
        if (merged.size() > MAX_PROBLEMS) {
            InputProblem first = merged.get(MAX_PROBLEMS);
            merged = new ArrayList<>(merged.subList(0, MAX_PROBLEMS));
            merged.add(new InputProblem(file, first.line(), first.column(), "", Message.TOO_MANY_PROBLEMS.format(MAX_PROBLEMS)));
        }
        return merged;
    }

    /** Throws every problem collected so far, if any, in file order (line, then column). */
    void throwIfAny() {
        List<InputProblem> all = all();
        if (!all.isEmpty()) {
            List<InputProblem> sorted = new ArrayList<>(all);
            sorted.sort(Comparator.comparingInt(InputProblem::line).thenComparingInt(InputProblem::column));
            throw new RequirementException(file, sorted);
        }
    }

    /** Counts one dimensional quantity written in {@code system}; {@code null} (angles, percentages, gn) counts for neither. */
    void tally(UnitSystem system) {
        if (system == UnitSystem.SI) {
            siQuantities++;
        } else if (system == UnitSystem.US) {
            usQuantities++;
        }
    }

    /**
     * The file's unit system: US when more of its lengths, forces, masses, speeds, rates and stresses are written in
     * inch-pound units than in metric ones; SI otherwise (including a tie).
     */
    UnitSystem unitSystem() {
        return usQuantities > siQuantities ? UnitSystem.US : UnitSystem.SI;
    }
}
