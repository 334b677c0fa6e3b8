package org.tracewell.engine.measured;

/**
 * A measurement file that cannot be imported. Carries where (file, line, column), what was found and what
 * would be valid, so a user can fix the file without guessing. Thrown before any result is built: an import
 * either succeeds completely or returns nothing.
 */
public final class MeasuredDataException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String fileName;
    private final int line;
    private final int column;
    private final String badText;
    private final String problem;
    private final String valid;

    /**
     * @param fileName file name as the user gave it
     * @param line     1-based line, 0 when the problem concerns the whole file
     * @param column   1-based character column, 0 when the problem concerns the whole line
     * @param badText  the offending text as found (may be empty)
     * @param problem  what is wrong, e.g. "not a number"
     * @param valid    what would be valid, e.g. "a decimal number of degrees, e.g. -92.5"
     */
    public MeasuredDataException(String fileName, int line, int column, String badText, String problem, String valid) {
        super(compose(fileName, line, column, badText, problem, valid));
        this.fileName = fileName;
        this.line = line;
        this.column = column;
        this.badText = badText;
        this.problem = problem;
        this.valid = valid;
    }

    private static String compose(String fileName, int line, int column, String badText, String problem,
            String valid) {
        StringBuilder b = new StringBuilder(fileName);
        if (line > 0) {
            b.append(':').append(line);
            if (column > 0) {
                b.append(':').append(column);
            }
        }
        b.append(": ").append(problem);
        if (badText != null && !badText.isEmpty()) {
            b.append(": '").append(badText.length() > 60 ? badText.substring(0, 57) + "..." : badText).append('\'');
        }
        if (valid != null && !valid.isEmpty()) {
            b.append("; valid: ").append(valid);
        }
        return b.toString();
    }

    /** The message with the file shown as {@code shownName} (e.g. the path a user typed) instead of its name. */
    public String describe(String shownName) {
        return compose(shownName, line, column, badText, problem, valid);
    }

    public String fileName() {
        return fileName;
    }

    /** 1-based line; 0 when the problem concerns the whole file. */
    public int line() {
        return line;
    }

    /** 1-based character column; 0 when the problem concerns the whole line. */
    public int column() {
        return column;
    }

    public String badText() {
        return badText;
    }

    public String problem() {
        return problem;
    }

    public String valid() {
        return valid;
    }
}
