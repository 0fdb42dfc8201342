package dev.coilwise.requirement;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Every problem found in one requirement or spring file, reported together so the user can fix them in one pass.
 * It is bad input (exit code 2); the message lists each problem on its own line as {@code file:line:col: key: message}.
 */
public final class RequirementException extends BadInputException {
    private static final long serialVersionUID = 1L;

    private final transient List<InputProblem> problems;

    public RequirementException(String file, List<InputProblem> problems) {
        super(Message.PROBLEMS_IN_FILE.format(problems.size(), file) + problems.stream()
                .map(p -> System.lineSeparator() + "  " + p).collect(Collectors.joining()));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("a RequirementException needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    /** The problems in file order of discovery (top to bottom within each section). */
    public List<InputProblem> problems() {
        return problems;
    }
}
