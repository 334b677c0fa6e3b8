package org.tracewell.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.Examples;

class AnalyzeCommandTest {

    @TempDir
    Path tmp;

    private record Run(int code, String out, String err) {
    }

    private Run analyze(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = AnalyzeCommand.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void bundledExampleMeetsItsRequirementsAndWritesJsonAndCsv() throws Exception {
        Path dir = tmp.resolve("report");
        Run run = analyze("--out", dir.toString()); // no FILE: the LM-3020 from tracewell.examples
        assertEquals(ExitCode.OK, run.code(), run.err());
        assertTrue(run.out().contains("lm3020-r1"), run.out());
        JsonObject json = JsonParser.parseString(Files.readString(dir.resolve("results.json"))).getAsJsonObject();
        for (String key : new String[] {"machine", "axes", "contours", "budget", "requirements", "toolVersion",
                "inputSha256", "date"}) {
            assertTrue(json.has(key), key);
        }
        JsonObject circle = json.getAsJsonArray("contours").get(0).getAsJsonObject();
        for (String key : new String[] {"contour", "direction", "maxContourErrorUm", "circularDeviationGUm",
                "radialDeviationFUm"}) {
            assertTrue(circle.has(key), key);
        }
        JsonObject requirement = json.getAsJsonArray("requirements").get(0).getAsJsonObject();
        for (String key : new String[] {"id", "statement", "kind", "value", "limit", "unit", "margin", "status",
                "parent", "children", "allocatedAxis", "axis", "verifiedBy"}) {
            assertTrue(requirement.has(key), key);
        }
        // Both directions of both circle contours, and the line.
        for (String csv : new String[] {"lm3020-circle-r100-ccw-CCW.csv", "lm3020-circle-r100-ccw-CW.csv",
                "lm3020-circle-r100-cw-CW.csv", "lm3020-line-45-programmed.csv"}) {
            assertTrue(Files.size(dir.resolve(csv)) > 1000, csv);
        }
        assertTrue(Files.readAllLines(dir.resolve("lm3020-line-45-programmed.csv")).get(0).startsWith("t_s,X1_ref_m"));
    }

    @Test
    void secondExampleRunsWithJsonOnStdoutAndTheReportNamesItsAuthor() throws Exception {
        Run run = analyze(Examples.file(Examples.LM_T5).toString(), "--out", tmp.resolve("t5").toString(), "--json",
                "--author", "T. Reyes");
        assertTrue(run.code() == ExitCode.OK || run.code() == ExitCode.VIOLATED, run.err());
        assertTrue(run.out().trim().startsWith("{") && run.out().contains("\"requirements\""));
        assertTrue(Files.readString(tmp.resolve("t5/index.html")).contains("· prepared by T. Reyes"));
    }

    @Test
    void authorWithoutANameIsBadInput() {
        Run run = analyze("--out", tmp.resolve("a").toString(), "--author");
        assertEquals(ExitCode.BAD_INPUT, run.code());
        assertTrue(run.err().contains("--author needs a name"), run.err());
    }

    @Test
    void tightenedRequirementExitsOne() throws Exception {
        Path copy = Examples.copyTo(tmp);
        Path machine = copy.resolve(Examples.LM_3020);
        // G ≤ 25 µm becomes G ≤ 0.1 µm: the simulated G (about 0.3 µm) violates it.
        String text = Files.readString(machine).replace("limit=\"2.5E-5\"", "limit=\"1.0E-7\"");
        Files.writeString(machine, text);
        Run run = analyze(machine.toString(), "--out", tmp.resolve("v").toString());
        assertEquals(ExitCode.VIOLATED, run.code(), run.out() + run.err());
        assertTrue(run.out().contains("violated"));
    }

    @Test
    void missingFileExitsTwo() {
        Run run = analyze(tmp.resolve("nothing.machine").toString(), "--out", tmp.resolve("m").toString());
        assertEquals(ExitCode.BAD_INPUT, run.code());
        assertTrue(run.err().contains("nothing.machine"), run.err());
    }

    @Test
    void garbledFileExitsTwoNamingTheLine() throws Exception {
        Path bad = tmp.resolve("bad.machine");
        Files.writeString(bad, "<?xml version=\"1.0\"?>\n<tw:Machine xmlns:tw=\"http://tracewell.org/model/1.0\"\n"
                + "  id=\"m\" name=\"broken\">\n  <axes id=\"a\" name=\"X\"\n</tw:Machine>\n");
        Run run = analyze(bad.toString(), "--out", tmp.resolve("g").toString());
        assertEquals(ExitCode.BAD_INPUT, run.code());
        assertTrue(run.err().matches("(?s).*bad\\.machine:\\d+.*"), run.err());
    }

    @Test
    void unknownContourIsBadInput() {
        Run run = analyze("--out", tmp.resolve("c").toString(), "--contour", "no such contour");
        assertEquals(ExitCode.BAD_INPUT, run.code());
        assertTrue(run.err().contains("no such contour"), run.err());
    }
}
