package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;

/** Collects every problem found while reading one scenario, so that all are reported together. */
final class ProblemLog {

    private final List<Problem> problems = new ArrayList<>();

    void error(SourceLocation at, String key, String message) {
        add(at, key, message, Problem.Severity.ERROR);
    }

    void warning(SourceLocation at, String key, String message) {
        add(at, key, message, Problem.Severity.WARNING);
    }

    private void add(SourceLocation at, String key, String message, Problem.Severity severity) {
        problems.add(new Problem(at.file(), at.line(), at.column(), key, message, severity));
    }

    boolean hasErrors() {
        return problems.stream().anyMatch(Problem::isError);
    }

    List<Problem> problems() {
        return problems.stream().sorted(Problem.BY_POSITION).toList();
    }

    List<Problem> warnings() {
        return problems().stream().filter(p -> !p.isError()).toList();
    }
}
