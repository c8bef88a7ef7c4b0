package org.tjmargin.design;

import java.util.List;
import java.util.stream.Collectors;

/**
 * Invalid input: every problem found in the files of one load, in file order and, within a file, by line and
 * column. The message is the problems' {@link InputProblem#format() formatted} lines.
 */
public final class InputException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final transient List<InputProblem> problems;

    /**
     * @param problems the problems, at least one
     */
    public InputException(List<InputProblem> problems) {
        super(problems.stream().map(InputProblem::format).collect(Collectors.joining("\n")));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("an input exception needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    /** The problems, never empty. */
    public List<InputProblem> problems() {
        return problems;
    }
}
