package org.tracewell.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;

import org.tracewell.core.io.LoadProblem;
import org.tracewell.core.io.LoadedModel;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.io.ModelLoadException;
import org.tracewell.core.validation.ModelValidation;
import org.tracewell.core.validation.ValidationProblem;

/**
 * {@code tracewell validate FILE…}: checks machine and axis files against the model rules.
 * <p>
 * Prints one line per finding, {@code FILE:LINE:COLUMN: error|warning: message}, then a summary. Exit 0 when every
 * file is clean (warnings allowed), 1 when a file has errors, 2 when a file cannot be read or on bad usage.
 */
public final class ValidateCommand {

    /** Exit code when at least one file has an error. */
    static final int ERRORS_FOUND = 1;

    static final String USAGE = "usage: tracewell validate FILE...   (*.machine or *.axis)";

    private ValidateCommand() {
    }

    public static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 0) {
            err.println(USAGE);
            return ExitCode.BAD_INPUT;
        }
        if (args[0].equals("--help") || args[0].equals("-h")) {
            out.println(USAGE);
            out.println("Exit codes: 0 clean, 1 errors found, 2 a file cannot be read.");
            return ExitCode.OK;
        }
        ModelFiles files = new ModelFiles();
        ModelValidation validation = new ModelValidation();
        boolean unreadable = false;
        int errors = 0;
        int warnings = 0;
        for (String arg : args) {
            if (arg.startsWith("-")) {
                err.println("tracewell validate: unknown option '" + arg + "'. " + USAGE);
                return ExitCode.BAD_INPUT;
            }
            Path file = Path.of(arg);
            LoadedModel model;
            try {
                model = files.load(file);
            } catch (ModelLoadException e) {
                for (LoadProblem problem : e.problems()) {
                    out.println(problem.position() + ": error: " + problem.message());
                }
                unreadable = true;
                continue;
            }
            List<ValidationProblem> problems = validation.validate(model.root());
            for (ValidationProblem problem : problems) {
                out.println(problem.position().map(Object::toString).orElse(file.toString()) + ": "
                        + problem.severity().name().toLowerCase(java.util.Locale.ROOT) + ": " + problem.message());
                if (problem.severity() == ValidationProblem.Severity.ERROR) {
                    errors++;
                } else {
                    warnings++;
                }
            }
        }
        out.println(summary(args.length, errors, warnings, unreadable));
        return unreadable ? ExitCode.BAD_INPUT : errors > 0 ? ERRORS_FOUND : ExitCode.OK;
    }

    private static String summary(int fileCount, int errors, int warnings, boolean unreadable) {
        return (unreadable ? "not every file could be read; " : "") + errors + (errors == 1 ? " error, " : " errors, ")
                + warnings + (warnings == 1 ? " warning" : " warnings") + " in " + fileCount
                + (fileCount == 1 ? " file" : " files");
    }
}
