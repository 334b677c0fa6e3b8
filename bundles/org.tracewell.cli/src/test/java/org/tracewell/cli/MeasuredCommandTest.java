package org.tracewell.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

import javax.imageio.ImageIO;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.Examples;
import org.tracewell.core.SafetyCaution;

/**
 * {@code tracewell measured} on the LM-3020 demo measurements in examples/measurements/ (invented data; the values
 * they were generated from are listed in that folder's README, and are the reference here).
 */
class MeasuredCommandTest {

    @TempDir
    Path tmp;

    private record Run(int code, String out, String err) {
    }

    private static Run measured(String... args) {
        return tracewell(prepend("measured", args));
    }

    private static Run tracewell(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = new TracewellCommand().run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private static String[] prepend(String first, String[] rest) {
        String[] all = new String[rest.length + 1];
        all[0] = first;
        System.arraycopy(rest, 0, all, 1, rest.length);
        return all;
    }

    private static String example(String name) {
        return Examples.file("measurements/" + name).toString();
    }

    private static JsonObject jsonFile(Path file) throws Exception {
        return JsonParser.parseString(Files.readString(file)).getAsJsonObject();
    }

    @Test
    void screwAxisResponseIsFittedAndOfferedAsTheUpdatedYPlant() throws Exception {
        Path dir = tmp.resolve("frf");
        Run run = measured("frf", example("lm3020-y-frf.csv"), "--fit", "two-mass", "--machine",
                Examples.file(Examples.LM_3020).toString(), "--out", dir.toString());
        assertEquals(ExitCode.OK, run.code(), run.err());
        assertTrue(run.out().contains("Updated plant offered for axis Y (two-mass ball-screw drive)"), run.out());
        assertTrue(run.out().contains("Caution: "), "a fitted axis carries the safety caution");
        JsonObject json = jsonFile(dir.resolve("lm3020-y-frf.json"));
        assertEquals("lm3020-y-frf.csv, 2026-03-12", json.get("evidence").getAsString());
        JsonObject fit = json.getAsJsonObject("fit");
        // The file was generated (README) with anti-resonance √(8.7e7/190)/2π = 107.7 Hz, resonance
        // 107.7·√(1 + J_L/J_M) = 128.3 Hz, ζ = 4.5 %, dead time 0.25 ms, and 0.8 % noise: the fit must land within
        // 1 % on the frequencies, 10 % on ζ and the dead time.
        assertEquals(107.7, fit.get("antiResonanceHz").getAsDouble(), 1.1);
        assertEquals(128.3, fit.get("resonanceHz").getAsDouble(), 1.3);
        assertEquals(4.5, fit.get("dampingRatioPercent").getAsDouble(), 0.45);
        assertEquals(0.25, fit.get("deadTimeMs").getAsDouble(), 0.025);
        assertEquals(1800, fit.get("currentLoopBandwidthHz").getAsDouble(), 1e-9, "taken from the Y axis model");
        assertTrue(fit.getAsJsonObject("againstMeasurement").get("magnitudeRmsDb").getAsDouble() < 0.2);
        // The model (180 kg, stiffer chain, no dead time) is visibly off; the fit is not.
        JsonObject model = json.getAsJsonObject("model");
        assertTrue(model.getAsJsonObject("againstMeasurement").get("magnitudeRmsDb").getAsDouble() > 1, model.toString());
        JsonObject load = change(json, "load mass");
        assertEquals(180, load.get("before").getAsDouble(), 1e-9);
        assertEquals(190, load.get("after").getAsDouble(), 190 * 0.02); // generated with 190 kg
        assertEquals("kg", load.get("unit").getAsString());
        assertEquals("N/µm", change(json, "nut stiffness").get("unit").getAsString());
        assertTrue(json.get("caution").getAsString().contains("reduced speed"));
        assertTrue(ImageIO.read(dir.resolve("lm3020-y-frf.png").toFile()).getWidth() > 0, "overlay chart written");
    }

    private static JsonObject change(JsonObject json, String parameter) {
        for (JsonElement e : json.getAsJsonObject("updatedPlant").getAsJsonArray("changes")) {
            if (e.getAsJsonObject().get("parameter").getAsString().equals(parameter)) {
                return e.getAsJsonObject();
            }
        }
        throw new AssertionError("no change of " + parameter + " in " + json);
    }

    @Test
    void rackAxisSweepGivesItsInertiaAsJsonOnStdout() {
        Run run = measured("frf", example("lm3020-x1-frf.csv"), "--fit", "rigid", "--current-loop-hz", "1500",
                "--json");
        assertEquals(ExitCode.OK, run.code(), run.err());
        JsonObject json = JsonParser.parseString(run.out()).getAsJsonObject();
        // Generated with J = 8e-4 + 6e-5 + 228·(0.03183/10)² kg·m² = 31.70 kg·cm² (README) and 1 % noise.
        assertEquals(31.70, json.getAsJsonObject("fit").get("totalInertiaKgCm2").getAsDouble(), 0.32);
        assertTrue(run.err().contains("Fit: rigid inertia"), "the summary goes to stderr with --json: " + run.err());
        assertTrue(json.get("updatedPlant").isJsonNull(), "no machine given: nothing to update");
    }

    @Test
    void circleTestIsEvaluatedOverlaidOnThePredictionAndOfferedAsBudgetLines() throws Exception {
        Path dir = tmp.resolve("circle");
        Run run = measured("circle", example("lm3020-xy-circle.csv"), "--machine",
                Examples.file(Examples.LM_3020).toString(), "--out", dir.toString());
        assertEquals(ExitCode.OK, run.code(), run.err());
        assertTrue(run.out().contains("Predicted (LM-3020.machine, contour 'circle R100 F3 CCW')"), run.out());
        JsonObject json = jsonFile(dir.resolve("lm3020-xy-circle.json"));
        JsonArray runs = json.getAsJsonArray("runs");
        assertEquals(2, runs.size());
        for (JsonElement r : runs) {
            // 720 samples a run over the full turn; G of a few µm, inside the LM-3020 target of 25 µm (DESIGN.md)
            assertEquals(720, r.getAsJsonObject().get("evaluatedSamples").getAsInt());
            double g = r.getAsJsonObject().get("circularDeviationGUm").getAsDouble();
            assertTrue(g > 1 && g < 25, "G = " + g);
        }
        double gb = json.get("bidirectionalDeviationGbUm").getAsDouble();
        JsonArray lines = json.getAsJsonArray("budgetLines");
        assertEquals(3, lines.size());
        JsonObject gbLine = lines.get(2).getAsJsonObject();
        assertEquals(gb, gbLine.get("valueUm").getAsDouble(), 1e-9);
        assertEquals("lm3020-xy-circle.csv, 2026-03-16", gbLine.get("evidence").getAsString());
        assertEquals("measured", gbLine.get("source").getAsString());
        assertEquals(2, json.getAsJsonObject("predicted").getAsJsonArray("runs").size());
        assertTrue(Files.size(dir.resolve("lm3020-xy-circle.png")) > 10_000);
    }

    @Test
    void positioningRunsGiveIso2302FiguresThatHoldTheStandardsOrder() {
        Run run = measured("positioning", example("lm3020-y-iso230-2.csv"), "--json");
        assertEquals(ExitCode.OK, run.code(), run.err());
        JsonObject json = JsonParser.parseString(run.out()).getAsJsonObject();
        assertEquals("Y", json.get("axis").getAsString());
        assertEquals(11, json.get("targetCount").getAsInt());
        assertEquals(5, json.get("approachesEachWay").getAsInt());
        assertEquals(0, json.getAsJsonArray("notes").size(), "11 targets × 5 runs meets the standard's minimum");
        JsonObject f = json.getAsJsonObject("figures");
        // Orderings that follow from the ISO 230-2 definitions (from memory): the accuracy band holds every mean,
        // E spans every unidirectional mean and M only their averages, R is at least either unidirectional value.
        double a = f.get("accuracyUm").getAsDouble();
        double e = f.get("systematicUm").getAsDouble();
        double m = f.get("meanRangeUm").getAsDouble();
        assertTrue(a >= e && e >= m, f.toString());
        assertTrue(f.get("repeatabilityUm").getAsDouble() >= f.get("repeatabilityUpUm").getAsDouble());
        assertTrue(f.get("repeatabilityUm").getAsDouble() >= f.get("repeatabilityDownUm").getAsDouble());
        // Generated with 3.4 µm + 0.3 µm/m lost motion (README): B between 3 and 5 µm.
        double b = f.get("reversalUm").getAsDouble();
        assertTrue(b > 3 && b < 5, "B = " + b);
        assertEquals(3, json.getAsJsonArray("budgetLines").size());
        assertTrue(run.err().contains("Axis figures (ISO 230-2 definitions"), run.err());
    }

    @Test
    void badCellExitsTwoWithFileLineAndColumn() throws Exception {
        Path source = Path.of(example("lm3020-y-frf.csv"));
        List<String> lines = Files.readAllLines(source);
        int target = 20; // 1-based line of a data row
        String row = lines.get(target - 1);
        lines.set(target - 1, row.replaceFirst(",([^,]*),", ",-12..5,"));
        Path bad = tmp.resolve("bad-frf.csv");
        Files.write(bad, lines);
        Run run = measured("frf", bad.toString(), "--out", tmp.resolve("never").toString());
        assertEquals(ExitCode.BAD_INPUT, run.code(), run.out());
        int column = row.indexOf(',') + 2;
        assertTrue(run.err().startsWith(bad + ":" + target + ":" + column + ": not a finite decimal number in"
                + " magnitude_dB: '-12..5'"), run.err());
        assertTrue(run.err().contains("valid: a magnitude in dB"), run.err());
        assertTrue(Files.notExists(tmp.resolve("never")), "nothing written for a bad file");
    }

    @Test
    void usageProblemsExitTwo() {
        assertEquals(ExitCode.BAD_INPUT, measured("spectrum", "x.csv").code());
        Run missing = measured("circle", tmp.resolve("none.csv").toString());
        assertEquals(ExitCode.BAD_INPUT, missing.code());
        assertTrue(missing.err().contains("none.csv: error: no such file"), missing.err());
        Run wrongOption = measured("circle", example("lm3020-xy-circle.csv"), "--fit", "rigid");
        assertEquals(ExitCode.BAD_INPUT, wrongOption.code());
        assertTrue(wrongOption.err().contains("--fit does not apply to a circle measurement"), wrongOption.err());
        Run noAxis = measured("frf", example("lm3020-y-frf.csv"), "--machine",
                Examples.file(Examples.LM_3020).toString(), "--axis", "W");
        assertEquals(ExitCode.BAD_INPUT, noAxis.code());
        assertTrue(noAxis.err().contains("no axis named 'W'; axes: X1, X2, Y, Z"), noAxis.err());
        Run help = measured("--help");
        assertEquals(ExitCode.OK, help.code());
        assertTrue(help.out().contains("tracewell measured frf|circle|positioning FILE"));
    }

    // ------------------------------------------------------------------------------------------- --write-updated

    @Test
    void fittedYIsWrittenAsAnUpdatedMachineThatValidatesAndDiffsByExactlyTheFittedAttributes() throws Exception {
        Path examples = Examples.copyTo(tmp.resolve("examples"));
        Path machine = examples.resolve(Examples.LM_3020);
        byte[] input = Files.readAllBytes(machine);
        Path updated = examples.resolve("LM-3020-y-fitted.machine");
        Path dir = tmp.resolve("frf");
        Run run = measured("frf", example("lm3020-y-frf.csv"), "--fit", "two-mass", "--machine", machine.toString(),
                "--write-updated", updated.toString(), "--out", dir.toString());
        assertEquals(ExitCode.OK, run.code(), run.err());
        assertTrue(run.out().contains("Updated machine written to " + updated + " (a copy of " + machine
                + ", which is unchanged): axis Y, plant lm3020-y-plant"), run.out());
        // Trade units of the model (ecore display units): kg·cm², kg, N/µm, %, N·s/m.
        assertTrue(run.out().contains("  motor inertia            4.600 → "), run.out());
        assertTrue(run.out().contains(" kg·cm²  ("), run.out());
        assertTrue(run.out().contains("  damping ratio            3.000 → "), run.out());
        assertTrue(run.out().contains("Caution: " + SafetyCaution.TEXT), "the full caution: the axis will be applied");
        assertArrayEquals(input, Files.readAllBytes(machine), "the input machine is never written");
        assertTrue(Files.notExists(examples.resolve(Examples.LM_3020 + ".bak")), "not even a backup of the input");

        JsonArray changes = jsonFile(dir.resolve("lm3020-y-frf.json")).getAsJsonObject("updatedModel")
                .getAsJsonArray("changes");
        Set<String> attributes = new TreeSet<>();
        for (JsonElement c : changes) {
            attributes.add(c.getAsJsonObject().get("attribute").getAsString().replaceAll("([a-z])([A-Z])", "$1 $2")
                    .toLowerCase(java.util.Locale.ROOT));
        }
        assertEquals(Set.of("motor inertia", "load mass", "nut stiffness", "damping ratio", "viscous friction"),
                attributes, "exactly what a two-mass fit determines");

        Run validate = tracewell("validate", updated.toString());
        assertEquals(ExitCode.OK, validate.code(), validate.out());
        Run diff = tracewell("diff", machine.toString(), updated.toString());
        assertEquals(DiffCommand.DIFFERENT, diff.code(), diff.out() + diff.err());
        Set<String> diffed = new TreeSet<>();
        for (String line : diff.out().lines().toList()) {
            if (line.startsWith("~ ")) {
                assertTrue(line.startsWith("~ plant (TwoMassDrive) [lm3020-y-plant] of Axis 'Y' [lm3020-y] › "), line);
                diffed.add(line.substring(line.indexOf("› ") + 2, line.indexOf(':', line.indexOf("› "))));
            } else {
                assertFalse(line.startsWith("+ ") || line.startsWith("- "), line);
            }
        }
        // Every fitted value moves by more than diff's 4 significant digits on this measurement (deterministic fit).
        assertEquals(attributes, diffed, diff.out());
        assertTrue(diff.out().contains("load mass: 180 kg → "), diff.out()); // old value in display units
    }

    @Test
    void aLibraryAxisIsWrittenAsANewAxisFileAndTheLibraryFileIsNeverOverwritten() throws Exception {
        Path examples = Examples.copyTo(tmp.resolve("examples"));
        Path machine = examples.resolve(Examples.LM_3020);
        Path library = examples.resolve(Examples.SHARED_Z);
        byte[] shared = Files.readAllBytes(library);
        // The Y response fitted as a rigid inertia onto the Z slide: a rigid screw drive, so the kinds agree.
        Run refused = measured("frf", example("lm3020-y-frf.csv"), "--fit", "rigid", "--machine", machine.toString(),
                "--axis", "Z", "--write-updated", library.toString());
        assertEquals(ExitCode.BAD_INPUT, refused.code(), refused.out());
        assertTrue(refused.err().contains("refusing to overwrite the library file axis 'Z' comes from " + library),
                refused.err());
        assertArrayEquals(shared, Files.readAllBytes(library));

        Path updated = examples.resolve("library/z-slide-25x5-fitted.axis");
        Run run = measured("frf", example("lm3020-y-frf.csv"), "--fit", "rigid", "--machine", machine.toString(),
                "--axis", "Z", "--write-updated", updated.toString());
        assertEquals(ExitCode.OK, run.code(), run.err());
        assertTrue(run.out().contains("Updated library axis written to " + updated), run.out());
        assertTrue(run.out().contains("note: LM-3020.machine still references " + library), run.out());
        assertArrayEquals(shared, Files.readAllBytes(library), "the shared library file is unchanged");
        assertEquals(ExitCode.OK, tracewell("validate", updated.toString()).code());
        Run diff = tracewell("diff", library.toString(), updated.toString());
        List<String> changed = diff.out().lines().filter(l -> l.startsWith("~ ")).toList();
        assertEquals(2, changed.size(), diff.out());
        assertTrue(changed.get(0).contains("[z-slide-25x5-plant] of Axis 'Z' [z-slide-25x5] › viscous friction: 900"
                + " N·s/m → "), diff.out());
        assertTrue(changed.get(1).contains("[z-slide-25x5-plant] of Axis 'Z' [z-slide-25x5] › load mass: 95 kg → "),
                diff.out());
    }

    @Test
    void writeUpdatedRefusesTheInputAnotherKindAndMissingOptionsWritingNothing() throws Exception {
        Path examples = Examples.copyTo(tmp.resolve("examples"));
        Path machine = examples.resolve(Examples.LM_3020);
        byte[] input = Files.readAllBytes(machine);
        Run self = measured("frf", example("lm3020-y-frf.csv"), "--fit", "two-mass", "--machine", machine.toString(),
                "--write-updated", examples.resolve("library/../" + Examples.LM_3020).toString());
        assertEquals(ExitCode.BAD_INPUT, self.code(), self.out());
        assertTrue(self.err().contains("refusing to overwrite the input file " + machine), self.err());
        assertArrayEquals(input, Files.readAllBytes(machine));

        Path out = tmp.resolve("never.machine");
        Run kind = measured("frf", example("lm3020-y-frf.csv"), "--fit", "rigid", "--machine", machine.toString(),
                "--axis", "Y", "--write-updated", out.toString());
        assertEquals(ExitCode.BAD_INPUT, kind.code(), kind.out());
        assertTrue(kind.err().contains("Axis 'Y' [lm3020-y]: the model's plant is a two-mass drive (TwoMassDrive)"
                + " but the fit is a rigid inertia fit"), kind.err());
        assertTrue(Files.notExists(out));

        Run noMachine = measured("frf", example("lm3020-y-frf.csv"), "--fit", "two-mass", "--write-updated",
                out.toString());
        assertEquals(ExitCode.BAD_INPUT, noMachine.code());
        assertTrue(noMachine.err().contains("--write-updated " + out + " needs --fit rigid|two-mass and --machine"),
                noMachine.err());
        assertTrue(Files.notExists(out));
    }
}
