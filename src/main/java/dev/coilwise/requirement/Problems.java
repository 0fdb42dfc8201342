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

    boolean isEmpty() {
        return list.isEmpty();
    }

    List<InputProblem> list() {
        return List.copyOf(list);
    }

    /** Throws every problem collected so far, if any, in file order (line, then column). */
    void throwIfAny() {
        if (!list.isEmpty()) {
            List<InputProblem> sorted = new ArrayList<>(list);
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
