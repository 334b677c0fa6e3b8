package org.tracewell.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.tracewell.core.io.LoadProblem;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.io.ModelLoadException;
import org.tracewell.model.Machine;

/**
 * A machine file as the analysing commands read it: the model with its library files, and the bytes (for the
 * provenance hash). A file that cannot be read is reported as {@code FILE:LINE:COLUMN: error: problem} lines.
 *
 * @param machine the loaded machine
 * @param bytes   the file's content
 */
record MachineInput(Machine machine, byte[] bytes) {

    /** The machine in {@code file}; empty after the problems were printed to {@code err}. */
    static Optional<MachineInput> load(Path file, PrintStream err) {
        try {
            if (!Files.isRegularFile(file)) {
                err.println(file + ": error: no such file; give a .machine file");
                return Optional.empty();
            }
            byte[] bytes = Files.readAllBytes(file);
            return Optional.of(new MachineInput(new ModelFiles().loadMachine(file), bytes));
        } catch (ModelLoadException e) {
            for (LoadProblem problem : e.problems()) {
                err.println(problem.position() + ": error: " + problem.message());
            }
        } catch (IOException e) {
            err.println(file + ": error: cannot read: " + e.getMessage());
        }
        return Optional.empty();
    }
}
