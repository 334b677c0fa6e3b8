package org.tracewell.cli;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.commons.math3.complex.Complex;
import org.tracewell.core.SafetyCaution;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.LoopAnalyzer;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.StableGainRange;
import org.tracewell.engine.loop.StepMetrics;
import org.tracewell.engine.loop.StepResponse;
import org.tracewell.engine.loop.SteadyState;
import org.tracewell.engine.loop.SteadyStateErrors;
import org.tracewell.engine.poly.CoefficientText;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;
import org.tracewell.engine.units.TradeUnits;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

/**
 * {@code tracewell loop}: analyses one loop given as transfer-function coefficients.
 * <pre>
 * tracewell loop --num "c_n … c_0" --den "d_m … d_0" [--fb-num … --fb-den …] [--delay SECONDS] [--json]
 * </pre>
 * Coefficients in descending powers of s, separated by spaces or commas. The forward path
 * G = num/den (with the dead time) is closed through H = fb-num/fb-den, unity when absent.
 * Exit 0 on success, 2 on bad input with a message on stderr naming the problem.
 */
public final class LoopCommand {

    /** Printed under every table: the figures come from a model, the machine must confirm them. */
    public static final String CAUTION = "Caution: " + SafetyCaution.SHORT;



    private static final String USAGE = String.join(System.lineSeparator(),
            "Usage: tracewell loop --num \"c_n ... c_0\" --den \"d_m ... d_0\""
                    + " [--fb-num \"...\" --fb-den \"...\"] [--delay SECONDS] [--json]",
            "",
            "Analyses the loop Y = G·(R − H·Y), G = num/den·e^(−s·delay), H = fb-num/fb-den (unity if omitted).",
            "Coefficients are in descending powers of s, separated by spaces or commas, e.g. --den \"1 15 0\".",
            "",
            "  --num, --den        forward path G(s) (proper: degree of num <= degree of den)",
            "  --fb-num, --fb-den  feedback path H(s); give both or neither",
            "  --delay SECONDS     dead time in the forward path (exact in margins; Padé order "
                    + LoopAnalyzer.PADE_ORDER + " for poles and step response)",
            "  --json              print exactly one JSON object instead of the table",
            "  --help              print this help",
            "",
            "Exit codes: 0 analysed, 2 bad input.");

    private LoopCommand() {
    }

    /** Runs the command; returns the exit code. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        Map<String, String> options = new LinkedHashMap<>();
        boolean json = false;
        for (int i = 0; i < args.length; i++) {
            String arg = args[i];
            if (arg.equals("--help") || arg.equals("-h")) {
                out.println(USAGE);
                return ExitCode.OK;
            }
            if (arg.equals("--json")) {
                json = true;
                continue;
            }
            String name = arg;
            String value = null;
            int eq = arg.indexOf('=');
            if (arg.startsWith("--") && eq > 0) {
                name = arg.substring(0, eq);
                value = arg.substring(eq + 1);
            }
            if (!List.of("--num", "--den", "--fb-num", "--fb-den", "--delay").contains(name)) {
                return bad(err, "unknown option '" + arg + "'; valid: --num, --den, --fb-num, --fb-den, --delay,"
                        + " --json, --help");
            }
            if (value == null) {
                if (i + 1 >= args.length) {
                    return bad(err, name + " needs a value");
                }
                value = args[++i];
            }
            if (options.put(name, value) != null) {
                return bad(err, name + " given twice");
            }
        }
        try {
            if (!options.containsKey("--num") || !options.containsKey("--den")) {
                throw new BadInput("both --num and --den are required (coefficients in descending powers of s)");
            }
            if (options.containsKey("--fb-num") != options.containsKey("--fb-den")) {
                throw new BadInput("--fb-num and --fb-den must be given together");
            }
            double delay = 0.0;
            if (options.containsKey("--delay")) {
                delay = number("--delay", options.get("--delay").trim());
                if (delay < 0) {
                    throw new BadInput("--delay must be >= 0 seconds, got " + options.get("--delay"));
                }
            }
            TransferFunction g = transferFunction("--num", options.get("--num"), "--den", options.get("--den"), delay);
            TransferFunction h = null;
            if (options.containsKey("--fb-num")) {
                h = transferFunction("--fb-num", options.get("--fb-num"), "--fb-den", options.get("--fb-den"), 0.0);
            }
            if (!g.isProper()) {
                throw new BadInput("improper forward path: --num has degree " + g.numerator().degree()
                        + " > --den degree " + g.denominator().degree() + "; only proper transfer functions are supported");
            }
            LoopAnalysis analysis;
            try {
                analysis = LoopAnalyzer.analyze(g, h);
            } catch (IllegalArgumentException e) {
                throw new BadInput(e.getMessage());
            }
            if (json) {
                out.println(new GsonBuilder().serializeNulls().disableHtmlEscaping().create().toJson(toJson(analysis)));
            } else {
                printTable(analysis, out);
            }
            return ExitCode.OK;
        } catch (BadInput e) {
            return bad(err, e.getMessage());
        }
    }

    private static int bad(PrintStream err, String message) {
        err.println("tracewell loop: " + message);
        err.println("Try 'tracewell loop --help'.");
        return ExitCode.BAD_INPUT;
    }

    /** A user-input problem; the message names the option and value. */
    private static final class BadInput extends Exception {
        private static final long serialVersionUID = 1L;

        BadInput(String message) {
            super(message);
        }
    }

    private static TransferFunction transferFunction(String numOption, String numText, String denOption,
            String denText, double delay) throws BadInput {
        Polynomial num = polynomial(numOption, numText);
        Polynomial den = polynomial(denOption, denText);
        return TransferFunction.of(num, den, delay);
    }

    private static double number(String option, String token) throws BadInput {
        try {
            return CoefficientText.parseNumber(option, token);
        } catch (IllegalArgumentException e) {
            throw new BadInput(e.getMessage());
        }
    }

    static Polynomial polynomial(String option, String text) throws BadInput {
        try {
            return CoefficientText.parse(option, text);
        } catch (IllegalArgumentException e) {
            throw new BadInput(e.getMessage());
        }
    }

    // ---------------------------------------------------------------- JSON

    static JsonObject toJson(LoopAnalysis a) {
        JsonObject o = new JsonObject();
        SteadyState ss = a.steadyState();
        o.addProperty("systemType", ss.systemType());
        o.addProperty("loopType", a.loopType());
        o.add("Kp", number(ss.kp()));
        o.add("Kv", number(ss.kv()));
        o.add("Ka", number(ss.ka()));
        o.addProperty("stable", a.stable());
        o.add("closedLoopPoles", complexArray(a.closedLoopPoles()));
        o.add("closedLoopZeros", complexArray(a.closedLoopZeros()));
        Optional<SteadyStateErrors> errors = a.steadyStateErrors();
        if (errors.isPresent()) {
            JsonObject e = new JsonObject();
            e.add("step", number(errors.get().unitStep()));
            e.add("ramp", number(errors.get().unitRamp()));
            e.add("parabola", number(errors.get().unitParabola()));
            o.add("steadyStateError", e);
        } else {
            o.add("steadyStateError", JsonNull.INSTANCE);
        }
        o.addProperty("parabolaConvention", SteadyStateErrors.PARABOLA_CONVENTION);
        Margins m = a.margins();
        o.add("gainMarginDb", number(m.gainMarginDb()));
        o.add("phaseCrossoverRadPerSec", optional(m.phaseCrossoverRadPerSec()));
        o.add("phaseMarginDeg", number(m.phaseMarginDeg()));
        o.add("gainCrossoverRadPerSec", optional(m.gainCrossoverRadPerSec()));
        o.add("delayMarginSec", optional(a.delayMarginSeconds()));
        o.add("sensitivityPeak", a.sensitivityPeak().map(p -> number(p.peak())).orElse(JsonNull.INSTANCE));
        o.add("bandwidthRadPerSec", optional(a.bandwidthRadPerSec()));
        Optional<StepResponse> step = a.step();
        if (step.isPresent()) {
            StepMetrics s = step.get().metrics();
            JsonObject j = new JsonObject();
            j.add("finalValue", number(s.finalValue()));
            j.add("overshootPercent", optional(s.overshootPercent()));
            j.add("peakTime", optional(s.peakTimeSeconds()));
            j.add("riseTime", optional(s.riseTimeSeconds()));
            j.add("settlingTime2Percent", optional(s.settlingTimeSeconds()));
            o.add("step", j);
        } else {
            o.add("step", JsonNull.INSTANCE);
        }
        JsonArray range = new JsonArray();
        for (StableGainRange.Interval i : a.gainRange().intervals()) {
            JsonArray pair = new JsonArray();
            pair.add(number(i.lower()));
            pair.add(number(i.upper()));
            range.add(pair);
        }
        o.add("stableGainMultiplierRanges", range);
        o.addProperty("padeOrder", a.padeOrder());
        o.addProperty("caution", CAUTION);
        return o;
    }

    /** Finite number, "inf"/"-inf", or null for NaN (undefined). */
    private static JsonElement number(double v) {
        if (Double.isNaN(v)) {
            return JsonNull.INSTANCE;
        }
        if (Double.isInfinite(v)) {
            return new JsonPrimitive(v > 0 ? "inf" : "-inf");
        }
        return new JsonPrimitive(v == 0.0 ? 0.0 : v); // no "-0.0"
    }

    private static JsonElement optional(OptionalDouble v) {
        return v.isPresent() ? number(v.getAsDouble()) : JsonNull.INSTANCE;
    }

    private static JsonArray complexArray(List<Complex> values) {
        JsonArray arr = new JsonArray();
        for (Complex c : values) {
            JsonArray pair = new JsonArray();
            pair.add(number(c.getReal()));
            pair.add(number(c.getImaginary()));
            arr.add(pair);
        }
        return arr;
    }

    // ---------------------------------------------------------------- table

    private static void printTable(LoopAnalysis a, PrintStream out) {
        SteadyState ss = a.steadyState();
        out.println("Tracewell loop analysis");
        out.println("  G(s)                  " + a.forward().numerator() + "  /  " + a.forward().denominator());
        out.println("  H(s)                  " + (a.unityFeedback() ? "1 (unity feedback)"
                : a.feedback().numerator() + "  /  " + a.feedback().denominator()));
        if (a.forward().hasDelay()) {
            out.println("  dead time             " + fmt(a.forward().delaySeconds()) + " s (Padé order " + a.padeOrder()
                    + " for poles, stability and step response; exact in margins)");
        }
        out.println();
        out.println("Steady state (error E = R - Y)");
        row(out, "system type", ss.systemType() + (a.unityFeedback() ? ""
                : "  (equivalent unity-feedback system; poles of G·H at s = 0: " + a.loopType() + ")"));
        row(out, "Kp", fmt(ss.kp()));
        String kvTrade = ss.systemType() == 1 && Double.isFinite(ss.kv())
                ? "  (" + fmt(TradeUnits.kvToMPerMinPerMm(ss.kv())) + " (m/min)/mm)" : "";
        row(out, "Kv", fmt(ss.kv()) + " 1/s" + kvTrade);
        row(out, "Ka", fmt(ss.ka()) + " 1/s^2");
        Optional<SteadyStateErrors> errors = a.steadyStateErrors();
        if (errors.isPresent()) {
            row(out, "error, unit step", fmt(errors.get().unitStep()));
            row(out, "error, unit ramp", fmt(errors.get().unitRamp()));
            row(out, "error, unit parabola", fmt(errors.get().unitParabola()));
        } else {
            row(out, "steady-state error", "none: the closed loop is unstable, the final-value theorem does not apply");
        }
        out.println("  Convention: " + SteadyStateErrors.PARABOLA_CONVENTION);
        out.println();
        out.println("Stability");
        row(out, "closed loop", a.stable() ? "stable" : "UNSTABLE (" + a.routh().rightHalfPlaneRoots()
                + " right-half-plane, " + a.routh().imaginaryAxisRoots() + " jω-axis roots by Routh)");
        row(out, "closed-loop poles", complexList(a.closedLoopPoles()));
        row(out, "closed-loop zeros", a.closedLoopZeros().isEmpty() ? "none" : complexList(a.closedLoopZeros()));
        List<String> ranges = new ArrayList<>();
        for (StableGainRange.Interval i : a.gainRange().intervals()) {
            ranges.add(fmt(i.lower()) + " < k < " + fmt(i.upper()));
        }
        row(out, "stable gain range", ranges.isEmpty() ? "no k > 0 is stable"
                : String.join(", ", ranges) + "  (k multiplies G·H; k = 1 as given)");
        out.println();
        out.println("Margins (every crossing searched; minimum reported)");
        Margins m = a.margins();
        row(out, "gain margin", fmt(m.gainMarginDb()) + " dB" + at(m.phaseCrossoverRadPerSec()));
        row(out, "phase margin", fmt(m.phaseMarginDeg()) + " deg" + at(m.gainCrossoverRadPerSec()));
        row(out, "crossings", m.gainCrossovers().size() + " gain, " + m.phaseCrossovers().size() + " phase");
        row(out, "delay margin", a.delayMarginSeconds().isPresent() ? fmt(a.delayMarginSeconds().getAsDouble()) + " s"
                : "n/a (unstable)");
        row(out, "sensitivity peak Ms", a.sensitivityPeak().map(p -> fmt(p.peak())).orElse("n/a (unstable)"));
        row(out, "bandwidth (-3 dB)", a.bandwidthRadPerSec().isPresent()
                ? fmt(a.bandwidthRadPerSec().getAsDouble()) + " rad/s" : "n/a");
        out.println();
        out.println("Unit-step response (" + StepResponse.METHOD + ")");
        if (a.step().isPresent()) {
            StepMetrics s = a.step().get().metrics();
            row(out, "final value", fmt(s.finalValue()));
            row(out, "overshoot", opt(s.overshootPercent(), " %"));
            row(out, "peak time", s.peakTimeSeconds().isPresent() ? fmt(s.peakTimeSeconds().getAsDouble()) + " s"
                    : "n/a (no overshoot)");
            row(out, "rise time 10-90 %", opt(s.riseTimeSeconds(), " s"));
            row(out, "settling time 2 %", opt(s.settlingTimeSeconds(), " s") + "  (measured from the response)");
        } else {
            row(out, "step response", "n/a (unstable closed loop)");
        }
        out.println();
        out.println(CAUTION);
    }

    private static void row(PrintStream out, String label, String value) {
        out.printf(Locale.ROOT, "  %-22s%s%n", label, value);
    }

    private static String at(OptionalDouble w) {
        return w.isPresent() ? " at " + fmt(w.getAsDouble()) + " rad/s" : "";
    }

    private static String opt(OptionalDouble v, String unit) {
        return v.isPresent() ? fmt(v.getAsDouble()) + unit : "n/a";
    }

    private static String complexList(List<Complex> values) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < values.size(); i++) {
            Complex c = values.get(i);
            if (c.getImaginary() > 0 && i + 1 < values.size()
                    && values.get(i + 1).getImaginary() == -c.getImaginary()) {
                parts.add(fmt(c.getReal()) + " ± " + fmt(c.getImaginary()) + "j");
                i++;
            } else if (c.getImaginary() == 0) {
                parts.add(fmt(c.getReal()));
            } else {
                parts.add(fmt(c.getReal()) + (c.getImaginary() < 0 ? " - " : " + ") + fmt(Math.abs(c.getImaginary()))
                        + "j");
            }
        }
        return String.join(", ", parts);
    }

    private static String fmt(double v) {
        if (Double.isNaN(v)) {
            return "undefined";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        if (v == 0) {
            return "0";
        }
        return String.format(Locale.ROOT, "%.6g", v).replaceFirst("(\\.\\d*?)0+(e|$)", "$1$2")
                .replaceFirst("\\.(e|$)", "$1");
    }
}
