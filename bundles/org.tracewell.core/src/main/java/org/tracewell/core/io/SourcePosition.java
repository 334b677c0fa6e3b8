package org.tracewell.core.io;

import java.nio.file.Path;

/**
 * Where something is in a model file: 1-based line and column; 0 when the parser could not tell.
 *
 * @param file   the file, as the user named it (relative paths stay relative)
 * @param line   1-based line, 0 when unknown
 * @param column 1-based column, 0 when unknown
 */
public record SourcePosition(Path file, int line, int column) {

    /** {@code file:line:column}, the form editors and terminals turn into links. */
    @Override
    public String toString() {
        StringBuilder s = new StringBuilder(String.valueOf(file));
        if (line > 0) {
            s.append(':').append(line);
            if (column > 0) {
                s.append(':').append(column);
            }
        }
        return s.toString();
    }
}
