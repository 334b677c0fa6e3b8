package org.tracewell.core.io;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

/**
 * A model file (or a file it references) could not be read. Carries every problem found, each with file, line and
 * column; {@link #file()}, {@link #line()} and {@link #column()} give the first one.
 */
public final class ModelLoadException extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient List<LoadProblem> problems;

    public ModelLoadException(List<LoadProblem> problems) {
        super(describe(problems));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("a ModelLoadException needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    public ModelLoadException(LoadProblem problem) {
        this(List.of(problem));
    }

    private static String describe(List<LoadProblem> problems) {
        return problems.stream().map(LoadProblem::toString).collect(Collectors.joining(System.lineSeparator()));
    }

    /** All problems, in file order. */
    public List<LoadProblem> problems() {
        return problems;
    }

    /** The file of the first problem. */
    public Path file() {
        return problems.get(0).position().file();
    }

    /** The 1-based line of the first problem, 0 when unknown. */
    public int line() {
        return problems.get(0).position().line();
    }

    /** The 1-based column of the first problem, 0 when unknown. */
    public int column() {
        return problems.get(0).position().column();
    }
}
