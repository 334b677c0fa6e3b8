package org.tracewell.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

class LoopCommandTest {

    private record Result(int code, String out, String err) {
    }

    private static Result run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = LoopCommand.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Result(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private static JsonObject json(String... args) {
        Result r = run(args);
        assertEquals(0, r.code(), r.err());
        assertEquals("", r.err());
        // Exactly one JSON object on stdout.
        assertEquals(1, r.out().strip().lines().count());
        JsonElement e = JsonParser.parseString(r.out());
        assertTrue(e.isJsonObject());
        return e.getAsJsonObject();
    }

    @Test
    void nise73TypeOneLoopAsJson() {
        // Nise, Control Systems Engineering, Ex. 7.3 (from memory): G = 100(s+2)(s+6)/(s(s+3)(s+4)), Kv = 100,
        // ramp 5t -> 0.05, i.e. 0.01 for the unit ramp.
        JsonObject o = json("--num", "100 800 1200", "--den", "1, 7, 12, 0", "--json");
        assertEquals(1, o.get("systemType").getAsInt());
        assertEquals("inf", o.get("Kp").getAsString());
        assertEquals(100.0, o.get("Kv").getAsDouble(), 1e-12); // Nise Ex. 7.3: Kv = 100
        assertEquals(0.0, o.get("Ka").getAsDouble(), 0.0);
        assertTrue(o.get("stable").getAsBoolean());
        JsonObject e = o.getAsJsonObject("steadyStateError");
        assertEquals(0.0, e.get("step").getAsDouble(), 0.0);
        assertEquals(0.05, 5 * e.get("ramp").getAsDouble(), 1e-14); // Nise Ex. 7.3: 5t -> 0.05
        assertEquals("inf", e.get("parabola").getAsString());
        assertEquals(3, o.getAsJsonArray("closedLoopPoles").size());
        assertEquals(2, o.getAsJsonArray("closedLoopPoles").get(0).getAsJsonArray().size());
        // Phase never reaches −180°: infinite gain margin, no phase crossover.
        assertEquals("inf", o.get("gainMarginDb").getAsString());
        assertTrue(o.get("phaseCrossoverRadPerSec").isJsonNull());
        assertTrue(o.get("phaseMarginDeg").getAsDouble() > 0);
        assertTrue(o.get("gainCrossoverRadPerSec").getAsDouble() > 0);
        assertTrue(o.get("bandwidthRadPerSec").getAsDouble() > 0);
        JsonObject step = o.getAsJsonObject("step");
        for (String key : new String[] {"finalValue", "overshootPercent", "peakTime", "riseTime",
            "settlingTime2Percent"}) {
            assertTrue(step.has(key), key);
        }
        assertEquals(1.0, step.get("finalValue").getAsDouble(), 1e-15);
        assertTrue(o.get("parabolaConvention").getAsString().contains("a·t²/2"));
    }

    @Test
    void nise72TypeZeroLoopAsJson() {
        // Nise Ex. 7.2 (from memory): G = 120(s+2)/((s+3)(s+4)), Kp = 20, 5u(t) -> 5/21.
        JsonObject o = json("--num", "120 240", "--den", "1 7 12", "--json");
        assertEquals(0, o.get("systemType").getAsInt());
        assertEquals(20.0, o.get("Kp").getAsDouble(), 1e-12);
        assertEquals(0.0, o.get("Kv").getAsDouble(), 0.0);
        assertEquals(5.0 / 21.0, 5 * o.getAsJsonObject("steadyStateError").get("step").getAsDouble(), 1e-14);
        assertEquals("inf", o.getAsJsonObject("steadyStateError").get("ramp").getAsString());
    }

    @Test
    void ogataMarginsAsJson() {
        // Ogata, Modern Control Engineering (from memory): 10/(s(s+1)(s+5)): GM 9.542 dB at √5 rad/s, PM 25.39°.
        JsonObject o = json("--num", "10", "--den", "1 6 5 0", "--json");
        assertEquals(9.542, o.get("gainMarginDb").getAsDouble(), 5e-4);
        assertEquals(Math.sqrt(5), o.get("phaseCrossoverRadPerSec").getAsDouble(), 1e-10);
        assertEquals(25.39, o.get("phaseMarginDeg").getAsDouble(), 5e-3);
    }

    @Test
    void unstableLoopHasNullErrorsAndStep() {
        // K = 40 exceeds Routh's limit K < 30 for s³ + 6s² + 5s + K [der].
        JsonObject o = json("--num", "40", "--den", "1 6 5 0", "--json");
        assertFalse(o.get("stable").getAsBoolean());
        assertTrue(o.get("steadyStateError").isJsonNull());
        assertTrue(o.get("step").isJsonNull());
        assertTrue(o.get("bandwidthRadPerSec").isJsonNull());
        assertEquals(8.0, o.get("Kv").getAsDouble(), 1e-12);
        Result table = run("--num", "40", "--den", "1 6 5 0");
        assertTrue(table.out().contains("UNSTABLE"));
        assertFalse(table.out().contains("error, unit ramp"));
    }

    @Test
    void nonUnityFeedbackAndDelay() {
        // Nise Ex. 7.6 (from memory): G = 100/(s(s+10)), H = 1/(s+5): unit-step error −4 (T(0) = 5 [der]).
        JsonObject o = json("--num", "100", "--den", "1 10 0", "--fb-num", "1", "--fb-den", "1 5", "--json");
        assertEquals(0, o.get("systemType").getAsInt());
        assertEquals(-4.0, o.getAsJsonObject("steadyStateError").get("step").getAsDouble(), 1e-12);
        // A dead time lowers the phase margin by ωc·T (exact delay in margins) [der].
        JsonObject plain = json("--num", "10", "--den", "1 6 5 0", "--json");
        JsonObject delayed = json("--num", "10", "--den", "1 6 5 0", "--delay", "0.05", "--json");
        double wc = plain.get("gainCrossoverRadPerSec").getAsDouble();
        assertEquals(plain.get("phaseMarginDeg").getAsDouble() - Math.toDegrees(wc * 0.05),
                delayed.get("phaseMarginDeg").getAsDouble(), 1e-9);
        assertEquals(6, delayed.get("padeOrder").getAsInt());
    }

    @Test
    void tableStatesConventionAndCaution() {
        Result r = run("--num", "100", "--den", "1 15 0");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("a·t²/2"), r.out());
        assertTrue(r.out().contains("Caution: ") && r.out().contains("reduced speed")
                && r.out().contains("safety functions active"), r.out());
        assertTrue(r.out().contains("settling time 2 %"));
    }

    @Test
    void badInputExitsTwoAndNamesTheProblem() {
        assertBad("--num", new String[] {"--num", "", "--den", "1 1"}, "empty");
        assertBad("'x'", new String[] {"--num", "1 x 2", "--den", "1 1"}, "not a number");
        assertBad("NaN", new String[] {"--num", "NaN", "--den", "1 1"}, "not a number");
        assertBad("--den", new String[] {"--num", "1", "--den", "0 0"}, "all zero");
        assertBad("improper", new String[] {"--num", "1 2 3", "--den", "1 1"}, "degree");
        assertBad("--den", new String[] {"--num", "1"}, "required");
        assertBad("--fb-den", new String[] {"--num", "1", "--den", "1 1", "--fb-num", "1"}, "together");
        assertBad("--delay", new String[] {"--num", "1", "--den", "1 1", "--delay", "-1"}, ">= 0");
        assertBad("--bogus", new String[] {"--bogus"}, "unknown option");
        assertBad("--num", new String[] {"--den", "1 1", "--num"}, "needs a value");
    }

    private static void assertBad(String named, String[] args, String problem) {
        Result r = run(args);
        assertEquals(2, r.code(), String.join(" ", args));
        assertEquals("", r.out());
        assertTrue(r.err().contains(named) && r.err().contains(problem), r.err());
    }

    @Test
    void helpPrintsUsage() {
        Result r = run("--help");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("Usage: tracewell loop"));
    }
}
