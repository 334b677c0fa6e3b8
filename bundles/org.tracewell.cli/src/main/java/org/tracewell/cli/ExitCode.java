package org.tracewell.cli;

/** Exit codes shared by every subcommand. */
public final class ExitCode {

    /** Success; for analyses: every requirement met. */
    public static final int OK = 0;
    /** At least one requirement violated. */
    public static final int VIOLATED = 1;
    /** Bad input or usage; the message names file, element and problem. */
    public static final int BAD_INPUT = 2;
    /** A fault inside Tracewell. */
    public static final int INTERNAL_ERROR = 3;

    private ExitCode() {
    }
}
