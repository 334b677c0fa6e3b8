package org.tracewell.core.io;

/**
 * One reason a model file could not be read.
 *
 * @param position where in which file
 * @param message  what is wrong and what was expected
 */
public record LoadProblem(SourcePosition position, String message) {

    @Override
    public String toString() {
        return position + ": " + message;
    }
}
