package org.tracewell.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.BiFunction;

import org.tracewell.core.Examples;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ValidateAndDiffCommandTest {

    @TempDir
    Path temp;

    private record Result(int code, String out, String err) {
    }

    private static Result run(Command command, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = command.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Result(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @FunctionalInterface
    private interface Command {
        int run(String[] args, PrintStream out, PrintStream err);
    }

    private static Path examples() {
        return Examples.folder();
    }

    /** A copy of the examples with one text replacement in one file. */
    private Path variant(String file, String find, String replace) throws Exception {
        Path root = temp.resolve("v" + System.nanoTime());
        Files.createDirectories(root.resolve("library"));
        try (var paths = Files.walk(examples())) {
            for (Path p : paths.filter(Files::isRegularFile).toList()) {
                Path copy = root.resolve(examples().relativize(p).toString());
                Files.createDirectories(copy.getParent()); // library/, measurements/
                Files.copy(p, copy);
            }
        }
        Path target = root.resolve(file);
        String text = Files.readString(target);
        assertTrue(text.contains(find), find);
        Files.writeString(target, text.replace(find, replace));
        return target;
    }

    @Test
    void validateCleanExamplesExitsZero() {
        Result r = run(ValidateCommand::run, examples().resolve("LM-3020.machine").toString(),
                examples().resolve("LM-T5.machine").toString());
        assertEquals(0, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("0 errors, 0 warnings in 2 files"), r.out());
    }

    @Test
    void validateReportsErrorsWithPositionAndExitsOne() throws Exception {
        Path file = variant("LM-3020.machine", "loadMass=\"180.0\"", "loadMass=\"-180.0\"");
        Result r = run(ValidateCommand::run, file.toString());
        assertEquals(1, r.code(), r.out());
        assertTrue(r.out().contains(file + ":") && r.out().contains(": error: ")
                && r.out().contains("load mass = -180 kg; valid range: > 0 kg"), r.out());
    }

    @Test
    void validateUnreadableFileExitsTwo() throws Exception {
        Path file = variant("LM-3020.machine", "<axes", "<axes <");
        Result r = run(ValidateCommand::run, file.toString());
        assertEquals(2, r.code(), r.out());
        assertTrue(r.out().contains(file + ":") && r.out().contains("XML is not well-formed"), r.out());
        assertEquals(2, run(ValidateCommand::run).code());
    }

    @Test
    void diffShowsOldAndNewValuesInDisplayUnits() throws Exception {
        Path changed = variant("LM-3020.machine", "positionGain=\"40.0\"\n        velocityGain=\"200000.0\"",
                "positionGain=\"50.0\"\n        velocityGain=\"200000.0\"");
        Result r = run(DiffCommand::run, examples().resolve("LM-3020.machine").toString(), changed.toString());
        assertEquals(1, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("~ controller (CascadeController) [lm3020-y-controller] of Axis 'Y' [lm3020-y]"
                + " › position gain: 2.4 (m/min)/mm → 3.0 (m/min)/mm"), r.out());
        assertTrue(r.out().contains("1 change"), r.out());
    }

    @Test
    void diffOfEqualFilesExitsZeroAndOfBrokenFilesTwo() throws Exception {
        String a = examples().resolve("LM-T5.machine").toString();
        assertEquals(0, run(DiffCommand::run, a, a).code());
        Path broken = variant("LM-T5.machine", "<axes", "<axes <");
        Result r = run(DiffCommand::run, a, broken.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains(broken + ":"), r.err());
        assertEquals(2, run(DiffCommand::run, a).code());
    }
}
