package org.cellwright.io;

import java.util.List;
import java.util.stream.Collectors;

/**
 * A measured run log that cannot be used, with every problem found in it (errors and warnings), in file
 * order. The message lists them one per line as {@code file:line:col: column: message}.
 */
public final class RunLogException extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient List<Problem> problems;

    /** @param problems every problem found, at least one of them an error */
    public RunLogException(List<Problem> problems) {
        super(problems.stream().sorted(Problem.BY_POSITION).map(Problem::format)
                .collect(Collectors.joining(System.lineSeparator())));
        this.problems = problems.stream().sorted(Problem.BY_POSITION).toList();
    }

    /** @return every problem, errors and warnings, in file order */
    public List<Problem> problems() {
        return problems;
    }
}
