package org.tracewell.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;

import org.tracewell.core.diff.ModelChange;
import org.tracewell.core.diff.ModelDiff;
import org.tracewell.core.io.LoadProblem;
import org.tracewell.core.io.LoadedModel;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.io.ModelLoadException;

/**
 * {@code tracewell diff A B}: semantic difference of two versions of a machine or axis file, for design reviews.
 * <p>
 * Elements are matched by id; one line per change: {@code + element} added, {@code - element} removed,
 * {@code ~ element › feature: old → new} changed, values in display units. Exit 0 when the models are equal, 1 when
 * they differ (as diff(1) does), 2 when a file cannot be read or on bad usage.
 */
public final class DiffCommand {

    /** Exit code when the two models differ (as diff(1) does). */
    static final int DIFFERENT = 1;

    static final String USAGE = "usage: tracewell diff OLD NEW   (two versions of a *.machine or *.axis file)";

    private DiffCommand() {
    }

    public static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 1 && (args[0].equals("--help") || args[0].equals("-h"))) {
            out.println(USAGE);
            out.println("Exit codes: 0 no differences, 1 differences, 2 a file cannot be read.");
            return ExitCode.OK;
        }
        if (args.length != 2) {
            err.println("tracewell diff: expected two files, got " + args.length + ". " + USAGE);
            return ExitCode.BAD_INPUT;
        }
        ModelFiles files = new ModelFiles();
        LoadedModel before;
        LoadedModel after;
        try {
            before = files.load(Path.of(args[0]));
            after = files.load(Path.of(args[1]));
        } catch (ModelLoadException e) {
            for (LoadProblem problem : e.problems()) {
                err.println(problem.position() + ": error: " + problem.message());
            }
            return ExitCode.BAD_INPUT;
        }
        List<ModelChange> changes = ModelDiff.compare(before.root(), after.root());
        out.println("--- " + args[0]);
        out.println("+++ " + args[1]);
        changes.forEach(change -> out.println(change));
        out.println(changes.isEmpty() ? "no differences" : changes.size() + (changes.size() == 1 ? " change" : " changes"));
        return changes.isEmpty() ? ExitCode.OK : DIFFERENT;
    }
}
