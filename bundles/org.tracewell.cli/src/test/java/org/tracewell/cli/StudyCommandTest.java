package org.tracewell.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.Examples;
import org.tracewell.core.io.LoadedModel;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.SafetyCaution;

class StudyCommandTest {

    @TempDir
    Path tmp;

    private record Run(int code, String out, String err) {
    }

    private static Run command(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = new TracewellCommand().run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private static JsonObject json(Path file) throws Exception {
        return JsonParser.parseString(Files.readString(file)).getAsJsonObject();
    }

    @Test
    void sweepRunsTheModelsStudyAndWritesJsonAndCsv() throws Exception {
        Path dir = tmp.resolve("sweep");
        Run run = command("sweep", "--out", dir.toString()); // no FILE: the LM-3020, its first sweep ("Kv match")
        assertEquals(ExitCode.OK, run.code(), run.err());
        assertTrue(run.out().contains("Study 'Kv match' of LM-3020") && run.out().contains("Caution: "), run.out());
        assertTrue(run.err().contains("27/27 (100 %)"), "progress on stderr: " + run.err());
        JsonObject json = json(dir.resolve("Kv_match.json"));
        for (String key : new String[] {"toolVersion", "inputSha256", "study", "parameters", "metrics", "grid",
                "sensitivities", "safetyCaution"}) {
            assertTrue(json.has(key), key);
        }
        assertEquals(SafetyCaution.TEXT, json.get("safetyCaution").getAsString());
        assertEquals(27, json.getAsJsonObject("study").get("gridPoints").getAsInt());
        List<String> grid = Files.readAllLines(dir.resolve("Kv_match-grid.csv"));
        assertEquals(28, grid.size(), "header and 9 × 3 grid points");
        assertTrue(grid.get(0).startsWith("point,axis[Y].controller.positionGain [1/s],"
                + "axis[X1].controller.positionGain [1/s],contour[circle R100 F3 CCW].G [m]"), grid.get(0));
        assertEquals(3, Files.readAllLines(dir.resolve("Kv_match-summary.csv")).size());
    }

    @Test
    void monteCarloFromTheCommandLineIsReproducibleOnAnyThreadCount() throws Exception {
        String[] study = {"montecarlo", "--dist", "axis[Y].controller.positionGain=normal:0.03(m/min)/mm",
                "--metric", "axis[Y].Kv", "--metric", "lm3020-r1-y-kv", "-n", "300", "--seed", "11"};
        Run one = command(concat(study, "--threads", "1", "--out", tmp.resolve("one").toString()));
        Run two = command(concat(study, "--threads", "2", "--out", tmp.resolve("two").toString()));
        assertEquals(ExitCode.OK, one.code(), one.err());
        assertEquals(ExitCode.OK, two.code(), two.err());
        assertEquals(Files.readString(tmp.resolve("one/montecarlo-variants.csv")),
                Files.readString(tmp.resolve("two/montecarlo-variants.csv")), "same seed, same variants, bit for bit");
        JsonObject json = json(tmp.resolve("two/montecarlo.json"));
        JsonObject parameter = json.getAsJsonArray("parameters").get(0).getAsJsonObject();
        // 0.03 (m/min)/mm = 0.03·1000/60 1/s = 0.5 1/s (DOMAIN.md §4, common practice)
        assertEquals(0.5, parameter.get("sigmaSi").getAsDouble(), 1e-12);
        assertEquals(0.0, parameter.get("minimumSi").getAsDouble(), 0, "a positive nominal stays positive");
        JsonArray yields = json.getAsJsonArray("yields");
        assertEquals(1, yields.size());
        JsonObject yield = yields.get(0).getAsJsonObject();
        assertEquals("lm3020-r1-y-kv", yield.get("requirement").getAsString());
        assertEquals(300, yield.get("sampleCount").getAsInt());
        // Kv = the position gain (DOMAIN.md §1, derived); the floor sits at the nominal 40 1/s: P(Kv ≥ 40) = 1/2,
        // within 3 binomial standard errors of 300 variants
        assertEquals(0.5, yield.get("fraction").getAsDouble(), 3 * Math.sqrt(0.25 / 300));
        JsonObject kv = json.getAsJsonArray("metrics").get(0).getAsJsonObject();
        assertEquals("(m/min)/mm", kv.get("displayUnit").getAsString());
        assertEquals(2.4, kv.getAsJsonObject("summary").get("p50").getAsDouble(), 0.01);
        assertEquals(5, kv.getAsJsonArray("worstVariants").size());
        assertEquals(301, Files.readAllLines(tmp.resolve("two/montecarlo-variants.csv")).size());
        // the yield gate
        Run gated = command(concat(study, "--min-yield", "0.9", "--out", tmp.resolve("gated").toString()));
        assertEquals(ExitCode.VIOLATED, gated.code(), gated.out());
        assertTrue(gated.out().contains("below the minimum 90.0 %"), gated.out());
    }

    @Test
    void theModelsMonteCarloStudyPrintsYieldsAgainstItsRequirements() throws Exception {
        Run run = command("montecarlo", "-n", "16", "--threads", "2", "--out", tmp.resolve("mc").toString());
        assertEquals(ExitCode.OK, run.code(), run.err());
        assertTrue(run.out().contains("Study 'XY tolerances' of LM-3020 — Monte-Carlo, seed 3020, 16 of 16 variants"),
                run.out());
        assertTrue(run.out().contains("yield lm3020-r1") && run.out().contains("yield lm3020-r1-y-gm"), run.out());
        assertTrue(Files.exists(tmp.resolve("mc/XY_tolerances-variants.csv")));
    }

    @Test
    void badInputNamesWhatIsWrongAndExitsTwo() {
        Run path = command("montecarlo", "--dist", "axis[Y].plant.mass=normal:3", "--out", tmp.toString());
        assertEquals(ExitCode.BAD_INPUT, path.code());
        assertTrue(path.err().contains("LM-3020.machine: error: path 'axis[Y].plant.mass'")
                && path.err().contains("loadMass"), path.err());
        Run shape = command("montecarlo", "--dist", "axis[Y].plant.loadMass=gauss:3", "--out", tmp.toString());
        assertEquals(ExitCode.BAD_INPUT, shape.code());
        assertTrue(shape.err().contains("unknown shape 'gauss'; valid: normal, uniform, triangular"), shape.err());
        Run unit = command("montecarlo", "--dist", "axis[Y].plant.loadMass=uniform:3mm", "--out", tmp.toString());
        assertEquals(ExitCode.BAD_INPUT, unit.code());
        assertTrue(unit.err().contains("mm does not measure this attribute (stored in kg)"), unit.err());
        Run both = command("montecarlo", "--study", "XY tolerances", "--dist", "axis[Y].plant.loadMass=uniform:3");
        assertEquals(ExitCode.BAD_INPUT, both.code());
        assertTrue(both.err().contains("either --study or --dist"), both.err());
        Run count = command("montecarlo", "-n", "0");
        assertEquals(ExitCode.BAD_INPUT, count.code());
        assertTrue(count.err().contains("-n must lie in 1..100000, got 0"), count.err());
        Run kind = command("sweep", "--study", "XY tolerances", "--out", tmp.toString());
        assertEquals(ExitCode.BAD_INPUT, kind.code());
        assertTrue(kind.err().contains("is a Monte-Carlo study; run it with tracewell montecarlo"), kind.err());
        Run grid = command("sweep", "--param", "axis[Y].controller.positionGain=30:50", "--out", tmp.toString());
        assertEquals(ExitCode.BAD_INPUT, grid.code());
        assertTrue(grid.err().contains("is not PATH=FROM:TO:STEPS"), grid.err());
        Run metric = command("sweep", "--metric", "contour[line 45° F10].G", "--out", tmp.toString());
        assertEquals(ExitCode.BAD_INPUT, metric.code());
        assertTrue(metric.err().contains("G is defined on full circles"), metric.err());
    }

    @Test
    void analyzeRunsTheStudiesOnlyWhenAskedAndPutsThemInTheReport() throws Exception {
        Path examples = Examples.copyTo(tmp.resolve("examples"));
        Path machine = examples.resolve(Examples.LM_3020);
        ModelFiles files = new ModelFiles();
        LoadedModel model = files.load(machine);
        model.machine().getStudies().get(0).setVariantCount(12); // a short run for the test
        files.save(model.resource());
        Run plain = command("analyze", machine.toString(), "--out", tmp.resolve("plain").toString());
        assertEquals(ExitCode.OK, plain.code(), plain.err());
        String page = Files.readString(tmp.resolve("plain/index.html"));
        assertTrue(page.contains("Tolerance studies") && page.contains("Not run for this report"), "asked, not run");
        assertTrue(!Files.exists(tmp.resolve("plain/studies")), "a plain analysis runs no study");
        Run studies = command("analyze", machine.toString(), "--studies", "--out", tmp.resolve("full").toString());
        assertEquals(ExitCode.OK, studies.code(), studies.err());
        String full = Files.readString(tmp.resolve("full/index.html"));
        assertTrue(full.contains("Yield against each requirement") && full.contains("Worst variants on"), "run");
        assertTrue(full.contains("Every grid point"), "the sweep's table");
        assertTrue(Files.exists(tmp.resolve("full/studies/XY_tolerances.json")));
        assertTrue(Files.exists(tmp.resolve("full/studies/Kv_match-grid.csv")));
        // results.json says which studies ran and where their files are
        JsonArray notRun = JsonParser.parseString(Files.readString(
                tmp.resolve("plain/results.json"))).getAsJsonObject().getAsJsonArray("studies");
        assertEquals(2, notRun.size());
        assertFalse(notRun.get(0).getAsJsonObject().get("run").getAsBoolean());
        assertTrue(notRun.get(0).getAsJsonObject().get("note").getAsString().contains("--studies"));
        JsonObject first = JsonParser.parseString(Files.readString(
                tmp.resolve("full/results.json"))).getAsJsonObject().getAsJsonArray("studies").get(0)
                .getAsJsonObject();
        assertTrue(first.get("run").getAsBoolean());
        assertEquals(12, first.get("completed").getAsInt());
        assertEquals("studies/XY_tolerances.json", first.getAsJsonObject("files").get("json").getAsString());
        assertTrue(Files.exists(tmp.resolve("full").resolve(first.getAsJsonObject("files").get("dataCsv")
                .getAsString())));
    }

    @Test
    void helpListsTheStudyCommands() {
        Run help = command("--help");
        assertTrue(help.out().contains("montecarlo") && help.out().contains("sweep"), help.out());
        Run usage = command("montecarlo", "--help");
        assertEquals(ExitCode.OK, usage.code());
        assertTrue(usage.out().contains("normal:SIGMA[,MIN,MAX]"), usage.out());
    }

    private static String[] concat(String[] head, String... tail) {
        String[] out = java.util.Arrays.copyOf(head, head.length + tail.length);
        System.arraycopy(tail, 0, out, head.length, tail.length);
        return out;
    }
}
