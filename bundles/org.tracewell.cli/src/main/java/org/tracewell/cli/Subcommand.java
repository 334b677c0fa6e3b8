package org.tracewell.cli;

import java.io.PrintStream;

/** One `tracewell NAME …` command: parses its own arguments, returns the process exit code. */
@FunctionalInterface
interface Subcommand {

    int run(String[] args, PrintStream out, PrintStream err);
}
