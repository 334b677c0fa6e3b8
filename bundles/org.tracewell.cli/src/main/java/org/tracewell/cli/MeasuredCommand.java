package org.tracewell.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;

import org.jfree.chart.JFreeChart;
import org.tracewell.charts.BodeChart;
import org.tracewell.charts.ChartExport;
import org.tracewell.charts.CircleRun;
import org.tracewell.charts.CircleTestChart;
import org.tracewell.charts.FrequencySeries;
import org.tracewell.charts.Margins;
import org.tracewell.charts.ReversalPoint;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.analysis.AnalysisCancelledException;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineAnalyzer;
import org.tracewell.core.io.LoadProblem;
import org.tracewell.core.io.LoadedModel;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.io.ModelLoadException;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.mapping.MachineInputs;
import org.tracewell.core.mapping.MappedAxis;
import org.tracewell.core.mapping.MappedContour;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.core.mapping.PlantAttributeChange;
import org.tracewell.core.mapping.PlantParameterUpdate;
import org.tracewell.core.mapping.UpdatedAxisModel;
import org.tracewell.core.validation.ModelValidation;
import org.tracewell.core.validation.ValidationProblem;
import org.tracewell.engine.axis.AxisPlant;
import org.tracewell.engine.axis.Resonance;
import org.tracewell.engine.budget.BudgetLine;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.measured.CircleFigure;
import org.tracewell.engine.measured.Iso230Positioning;
import org.tracewell.engine.measured.MeasuredBudgetLines;
import org.tracewell.engine.measured.MeasuredCircleEvaluation;
import org.tracewell.engine.measured.MeasuredCircleRun;
import org.tracewell.engine.measured.MeasuredCircleTest;
import org.tracewell.engine.measured.MeasuredDataException;
import org.tracewell.engine.measured.MeasuredFrequencyResponse;
import org.tracewell.engine.measured.MeasurementSource;
import org.tracewell.engine.measured.ParameterChange;
import org.tracewell.engine.measured.PlantFit;
import org.tracewell.engine.measured.PlantFitModel;
import org.tracewell.engine.measured.PlantFitOptions;
import org.tracewell.engine.measured.PlantFitResult;
import org.tracewell.engine.measured.PlantUpdate;
import org.tracewell.engine.measured.PositioningEvaluation;
import org.tracewell.engine.measured.PositioningFigure;
import org.tracewell.engine.measured.PositioningFigures;
import org.tracewell.engine.measured.PositioningMeasurement;
import org.tracewell.engine.measured.ResponseComparison;
import org.tracewell.engine.measured.TargetStatistics;
import org.tracewell.engine.measured.TwoMassParameters;
import org.tracewell.engine.path.ArcSegment;
import org.tracewell.engine.tf.FrequencyResponse;
import org.tracewell.engine.tf.TransferFunction;
import org.tracewell.engine.units.TradeUnits;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;
import org.tracewell.model.units.TradeUnit;
import org.tracewell.model.units.UnitTable;
import org.tracewell.report.PredictedCircleRuns;

/**
 * {@code tracewell measured frf|circle|positioning FILE …}: imports a measurement CSV taken on the prototype,
 * evaluates it with the same engine code as the predictions, prints a summary in trade units and writes JSON (and,
 * for frequency responses and circles, an overlay chart). A bad CSV exits 2 with {@code FILE:LINE:COLUMN: problem}.
 */
public final class MeasuredCommand {

    static final String USAGE = String.join(System.lineSeparator(),
            "usage: tracewell measured frf|circle|positioning FILE [--json] [--out DIR] [options]",
            "",
            "  frf FILE          torque command -> motor velocity response (frequency_Hz,magnitude_dB,phase_deg",
            "                    or frequency_Hz,real,imag; optional coherence)",
            "    --fit rigid|two-mass   fit a plant with Levenberg-Marquardt",
            "    --machine FILE --axis NAME   compare with that axis's model and offer the fit as its updated plant",
            "                    (--axis defaults to the file's '# axis:' line)",
            "    --current-loop-hz F    current-loop bandwidth for the fit without --machine (default: ideal)",
            "    --band-hz LO,HI        fit only this frequency band",
            "    --write-updated OUT    with --fit and --machine: write the machine (or the library .axis file the",
            "                    axis comes from) with the fitted plant to the new file OUT; the input stays as it is",
            "  circle FILE       circular test (angle_deg,radial_deviation_um or x_mm,y_mm, optional direction;",
            "                    '# radius_mm:' and '# feed_m_min:' lines): ISO 230-4 G, F, G(b)",
            "    --machine FILE [--contour NAME]   overlay the simulated circle of the same radius and feed",
            "  positioning FILE  ISO 230-2 runs (target_mm,run,direction,deviation_um): A, R, B, E, M",
            "    --axis NAME     axis the budget lines belong to (default: the file's '# axis:' line)",
            "",
            "  --json            print the JSON document on stdout (the summary goes to stderr)",
            "  --out DIR         write DIR/NAME.json (and DIR/NAME.png for frf and circle)",
            "",
            "Exit codes: 0 evaluated, 2 bad input (FILE:LINE:COLUMN: problem), 3 internal error.");

    /** Chart sizes, px: a wide Bode chart; a tall polar plot, room for the legend below a round plot. */
    private static final int BODE_WIDTH = 900;
    private static final int BODE_HEIGHT = 620;
    private static final int POLAR_WIDTH = 760;
    private static final int POLAR_HEIGHT = 840;

    private MeasuredCommand() {
    }

    private enum Kind {
        FRF, CIRCLE, POSITIONING
    }

    private record Options(Kind kind, Path file, boolean json, Optional<Path> out, Optional<PlantFitModel> fit,
            Optional<Path> machine, Optional<String> axis, Optional<String> contour, Optional<Double> currentLoopHz,
            double bandLowHz, double bandHighHz, Optional<Path> writeUpdated) {
    }

    /** A machine as loaded (for writing an updated copy) and as mapped to engine inputs. */
    private record LoadedMachine(Path file, LoadedModel model, MachineInputs inputs) {
    }

    /** The axis a frequency response belongs to: its model element and its engine inputs. */
    private record FittedAxis(LoadedMachine machine, Axis element, MappedAxis mapped) {
    }

    /** A user-input problem; the message is printed as it is (it names file, option or element). */
    private static final class BadInput extends Exception {
        private static final long serialVersionUID = 1L;

        BadInput(String message) {
            super(message);
        }
    }

    /** A chart and the size it is written at. */
    private record Chart(JFreeChart chart, int width, int height) {
    }

    /** What a run produced: the JSON document, the summary lines and an optional chart. */
    private record Outcome(JsonObject json, List<String> summary, Optional<Chart> chart) {
    }

    public static int run(String[] args, PrintStream out, PrintStream err) {
        Options options;
        try {
            options = parse(args, out);
            if (options == null) {
                return ExitCode.OK;
            }
        } catch (IllegalArgumentException bad) {
            err.println("tracewell measured: " + bad.getMessage());
            err.println(USAGE.lines().findFirst().orElseThrow());
            return ExitCode.BAD_INPUT;
        }
        Outcome outcome;
        try {
            outcome = switch (options.kind()) {
                case FRF -> frf(options);
                case CIRCLE -> circle(options);
                case POSITIONING -> positioning(options);
            };
        } catch (MeasuredDataException e) {
            err.println(e.describe(options.file().toString()));
            return ExitCode.BAD_INPUT;
        } catch (NoSuchFileException e) {
            err.println(e.getFile() + ": error: no such file");
            return ExitCode.BAD_INPUT;
        } catch (IOException e) {
            err.println(options.file() + ": error: cannot read: " + e.getMessage());
            return ExitCode.BAD_INPUT;
        } catch (BadInput e) {
            err.println(e.getMessage());
            return ExitCode.BAD_INPUT;
        }
        String json = new GsonBuilder().setPrettyPrinting().serializeNulls().disableHtmlEscaping().create()
                .toJson(outcome.json());
        if (options.out().isPresent()) {
            Path dir = options.out().get();
            String stem = stem(options.file());
            try {
                Files.createDirectories(dir);
                Files.writeString(dir.resolve(stem + ".json"), json + "\n", StandardCharsets.UTF_8);
                if (outcome.chart().isPresent()) {
                    Chart chart = outcome.chart().get();
                    ChartExport.writePng(chart.chart(), dir.resolve(stem + ".png"), chart.width(), chart.height());
                }
            } catch (IOException e) {
                err.println(dir + ": error: cannot write: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
        }
        PrintStream summary = options.json() ? err : out;
        outcome.summary().forEach(summary::println);
        if (options.out().isPresent()) {
            summary.println("Results: " + options.out().get().resolve(stem(options.file()) + ".json"));
        }
        if (options.json()) {
            out.println(json);
        }
        return ExitCode.OK;
    }

    // ------------------------------------------------------------------------------------------- arguments

    private static Options parse(String[] args, PrintStream out) {
        if (args.length > 0 && (args[0].equals("--help") || args[0].equals("-h"))) {
            out.println(USAGE);
            return null;
        }
        if (args.length == 0) {
            throw new IllegalArgumentException("give what was measured: frf, circle or positioning, and the FILE");
        }
        Kind kind = switch (args[0]) {
            case "frf" -> Kind.FRF;
            case "circle" -> Kind.CIRCLE;
            case "positioning" -> Kind.POSITIONING;
            default -> throw new IllegalArgumentException("unknown measurement '" + args[0]
                    + "'; valid: frf, circle, positioning");
        };
        Path file = null;
        boolean json = false;
        Path dir = null;
        PlantFitModel fit = null;
        Path machine = null;
        String axis = null;
        String contour = null;
        Double currentLoopHz = null;
        double bandLow = 0;
        double bandHigh = Double.POSITIVE_INFINITY;
        Path writeUpdated = null;
        for (int i = 1; i < args.length; i++) {
            String a = args[i];
            switch (a) {
                case "--help", "-h" -> {
                    out.println(USAGE);
                    return null;
                }
                case "--json" -> json = true;
                case "--out" -> dir = Path.of(value(args, ++i, a));
                case "--machine" -> machine = Path.of(value(args, ++i, a));
                case "--axis" -> axis = only(kind, a, value(args, ++i, a), Kind.FRF, Kind.POSITIONING);
                case "--contour" -> contour = only(kind, a, value(args, ++i, a), Kind.CIRCLE);
                case "--write-updated" -> writeUpdated = Path.of(only(kind, a, value(args, ++i, a), Kind.FRF));
                case "--fit" -> {
                    String model = only(kind, a, value(args, ++i, a), Kind.FRF);
                    fit = switch (model) {
                        case "rigid" -> PlantFitModel.RIGID;
                        case "two-mass" -> PlantFitModel.TWO_MASS;
                        default -> throw new IllegalArgumentException("--fit " + model + ": valid: rigid, two-mass");
                    };
                }
                case "--current-loop-hz" -> {
                    String text = only(kind, a, value(args, ++i, a), Kind.FRF);
                    currentLoopHz = positive(a, text);
                }
                case "--band-hz" -> {
                    String text = only(kind, a, value(args, ++i, a), Kind.FRF);
                    String[] parts = text.split(",");
                    if (parts.length != 2) {
                        throw new IllegalArgumentException("--band-hz " + text + ": give LO,HI in Hz, e.g. 5,300");
                    }
                    bandLow = positive(a, parts[0].trim());
                    bandHigh = positive(a, parts[1].trim());
                    if (!(bandHigh > bandLow)) {
                        throw new IllegalArgumentException("--band-hz " + text + ": HI must be above LO");
                    }
                }
                default -> {
                    if (a.startsWith("-")) {
                        throw new IllegalArgumentException("unknown option '" + a + "'; see 'tracewell measured --help'");
                    }
                    if (file != null) {
                        throw new IllegalArgumentException("only one FILE may be given, got '" + file + "' and '" + a
                                + "'");
                    }
                    file = Path.of(a);
                }
            }
        }
        if (file == null) {
            throw new IllegalArgumentException("no FILE given; tracewell measured " + args[0] + " FILE");
        }
        if (machine != null && kind == Kind.POSITIONING) {
            throw new IllegalArgumentException("--machine is for frf and circle");
        }
        if (machine != null && currentLoopHz != null) {
            throw new IllegalArgumentException("--current-loop-hz is taken from the axis when --machine is given;"
                    + " give one of them");
        }
        if (kind == Kind.FRF && axis != null && machine == null) {
            throw new IllegalArgumentException("--axis " + axis + " needs --machine FILE for a frequency response");
        }
        if (writeUpdated != null && (fit == null || machine == null)) {
            throw new IllegalArgumentException("--write-updated " + writeUpdated + " needs --fit rigid|two-mass and"
                    + " --machine FILE: it writes the fit into that machine's axis");
        }
        return new Options(kind, file, json, Optional.ofNullable(dir), Optional.ofNullable(fit),
                Optional.ofNullable(machine), Optional.ofNullable(axis), Optional.ofNullable(contour),
                Optional.ofNullable(currentLoopHz), bandLow, bandHigh, Optional.ofNullable(writeUpdated));
    }

    private static String value(String[] args, int i, String option) {
        if (i >= args.length || args[i].startsWith("--")) {
            throw new IllegalArgumentException(option + " needs a value");
        }
        return args[i];
    }

    private static String only(Kind kind, String option, String value, Kind... allowed) {
        for (Kind k : allowed) {
            if (k == kind) {
                return value;
            }
        }
        throw new IllegalArgumentException(option + " does not apply to a " + kind.name().toLowerCase(Locale.ROOT)
                + " measurement");
    }

    private static double positive(String option, String text) {
        try {
            double v = Double.parseDouble(text);
            if (v > 0 && Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below with the valid range
        }
        throw new IllegalArgumentException(option + " " + text + ": give a number of Hz > 0");
    }

    private static String stem(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return (dot > 0 ? name.substring(0, dot) : name).replaceAll("[^A-Za-z0-9._-]", "_");
    }

    // ------------------------------------------------------------------------------------------- frequency response

    private static Outcome frf(Options o) throws MeasuredDataException, IOException, BadInput {
        MeasuredFrequencyResponse measured = MeasuredFrequencyResponse.read(o.file());
        Optional<FittedAxis> fitted = Optional.empty();
        if (o.machine().isPresent()) {
            String name = o.axis().or(() -> measured.source().metadata("axis")).orElseThrow(() -> new BadInput(
                    "tracewell measured: --machine needs --axis NAME (the file has no '# axis:' line)"));
            LoadedMachine machine = loadMachine(o.machine().get());
            MappedAxis mapped = axis(machine.inputs(), name, machine.file());
            fitted = Optional.of(new FittedAxis(machine, modelAxis(machine.model().machine(), mapped.id()), mapped));
        }
        return frf(o, measured, fitted);
    }

    private static Outcome frf(Options o, MeasuredFrequencyResponse measured, Optional<FittedAxis> fittedAxis)
            throws BadInput {
        Optional<MappedAxis> axis = fittedAxis.map(FittedAxis::mapped);
        double currentLoop = axis.map(a -> a.model().plant().currentLoopBandwidth())
                .orElse(o.currentLoopHz().map(hz -> 2 * Math.PI * hz).orElse(Double.POSITIVE_INFINITY));
        PlantFitOptions fitOptions = PlantFitOptions.defaults().withCurrentLoopBandwidth(currentLoop)
                .withBand(2 * Math.PI * o.bandLowHz(), 2 * Math.PI * o.bandHighHz());
        Optional<PlantFitResult> fit = Optional.empty();
        if (o.fit().isPresent()) {
            try {
                fit = Optional.of(PlantFit.fit(measured, o.fit().get(), fitOptions));
            } catch (IllegalArgumentException e) {
                throw new BadInput(o.file() + ": error: " + e.getMessage());
            }
        }
        Optional<AxisPlant> plant = axis.map(a -> a.model().plant());
        Optional<PlantUpdate> update = Optional.empty();
        if (fit.isPresent() && plant.isPresent()) {
            update = Optional.of(PlantUpdate.of(plant.get(), fit.get()));
        }
        Optional<UpdatedAxisModel> written = Optional.empty();
        if (o.writeUpdated().isPresent() && update.isPresent()) {
            written = Optional.of(writeUpdated(o, fittedAxis.orElseThrow(), update.get()));
        }
        Optional<ResponseComparison> modelVsMeasured = plant.map(p -> ResponseComparison.of(measured,
                p.torqueCommandToMotorVelocity()));

        List<String> lines = new ArrayList<>();
        MeasurementSource source = measured.source();
        lines.add(String.format(Locale.ROOT, "Measured frequency response %s: %d points, %s … %s Hz%s",
                source.evidence(), measured.size(), fmt(hz(measured.omega(0))),
                fmt(hz(measured.omega(measured.size() - 1))), measured.hasCoherence()
                        ? ", coherence ≥ " + fmt(minCoherence(measured)) : ""));
        if (axis.isPresent()) {
            MappedAxis a = axis.get();
            lines.add("Model of axis " + a.name() + " (" + o.machine().get().getFileName() + "): "
                    + kind(a.model().plant()) + ", differs from the measurement by "
                    + comparison(modelVsMeasured.get()) + resonanceText(a.model().plant().resonance()));
        }
        if (fit.isPresent()) {
            PlantFitResult f = fit.get();
            lines.add("Fit: " + f.model().displayName() + ", " + f.iterations() + " iterations, " + f.quality().points()
                    + " points, " + comparison(f.quality()) + (Double.isInfinite(f.currentLoopBandwidth())
                            ? " (ideal current loop assumed)"
                            : " (current loop " + fmt(hz(f.currentLoopBandwidth())) + " Hz)"));
            row(lines, "total inertia", fmt(f.totalInertia() * 1e4) + " kg·cm²");
            f.twoMass().ifPresent(t -> {
                row(lines, "motor side / load side", fmt(t.motorInertia() * 1e4) + " / " + fmt(t.loadInertia() * 1e4)
                        + " kg·cm²");
                row(lines, "anti-resonance", fmt(t.resonance().antiResonanceHz()) + " Hz");
                row(lines, "resonance", fmt(t.resonance().resonanceHz()) + " Hz");
                row(lines, "damping ratio", fmt(t.dampingRatio() * 100) + " %");
                row(lines, "stiffness at the motor", fmt(t.stiffness()) + " N·m/rad");
            });
            row(lines, "viscous damping", fmt(f.viscousDamping()) + " N·m·s/rad");
            row(lines, "dead time", fmt(f.deadTime() * 1e3) + " ms");
        }
        if (update.isPresent()) {
            lines.add("Updated plant offered for axis " + axis.get().name() + " (" + kind(update.get().updated())
                    + "):");
            for (ParameterChange c : update.get().changes()) {
                Shown s = shown(c.unit());
                row(lines, c.parameter(), fmt(c.before() * s.factor()) + " → " + fmt(c.after() * s.factor()) + " "
                        + s.unit() + (Double.isFinite(c.relativeChange())
                                ? String.format(Locale.ROOT, "  (%+.1f %%)", c.relativeChange() * 100) : ""));
            }
            update.get().notes().forEach(n -> lines.add("  note: " + n));
        }
        written.ifPresent(w -> writtenSummary(lines, o, w));
        if (fit.isPresent()) {
            // A written axis is about to be applied: the whole caution, not the one-line form.
            lines.add("Caution: " + (written.isPresent() ? SafetyCaution.TEXT : SafetyCaution.SHORT));
        }

        JsonObject json = header("frf", o.file(), source);
        json.addProperty("points", measured.size());
        json.addProperty("lowestFrequencyHz", hz(measured.omega(0)));
        json.addProperty("highestFrequencyHz", hz(measured.omega(measured.size() - 1)));
        json.add("minCoherence", measured.hasCoherence() ? number(minCoherence(measured)) : JsonNull.INSTANCE);
        json.addProperty("quantity", "torque command (N·m) to motor velocity (rad/s)");
        if (axis.isPresent()) {
            JsonObject model = new JsonObject();
            model.addProperty("machine", o.machine().get().toString());
            model.addProperty("axis", axis.get().name());
            model.addProperty("plant", kind(plant.get()));
            plant.get().resonance().ifPresent(r -> {
                model.add("resonanceHz", number(r.resonanceHz()));
                model.add("antiResonanceHz", number(r.antiResonanceHz()));
            });
            model.add("againstMeasurement", comparisonJson(modelVsMeasured.get()));
            json.add("model", model);
        }
        json.add("fit", fit.<JsonElement>map(MeasuredCommand::fitJson).orElse(JsonNull.INSTANCE));
        json.add("updatedPlant", update.<JsonElement>map(MeasuredCommand::updateJson).orElse(JsonNull.INSTANCE));
        json.add("updatedModel", written.<JsonElement>map(w -> writtenJson(o, w)).orElse(JsonNull.INSTANCE));
        if (fit.isPresent()) {
            json.addProperty("caution", SafetyCaution.TEXT);
        }

        List<FrequencySeries> predicted = new ArrayList<>();
        double[] grid = grid(measured);
        plant.ifPresent(p -> predicted.add(series("model, axis " + axis.get().name(), p.torqueCommandToMotorVelocity(),
                grid)));
        fit.ifPresent(f -> predicted.add(series("fit, " + f.model().displayName(), f.torqueCommandToMotorVelocity(),
                grid)));
        FrequencySeries points = new FrequencySeries("measured (" + source.fileName() + ")", measured.omegas(),
                measured.magnitudes(), measured.unwrappedPhase());
        JFreeChart chart = BodeChart.create("Torque command → motor velocity" + axis.map(a -> ", axis " + a.name())
                .orElse(""), predicted, List.of(points), Margins.NONE);
        return new Outcome(json, lines, Optional.of(new Chart(chart, BODE_WIDTH, BODE_HEIGHT)));
    }

    /** 400 log-spaced frequencies over the measured band, so predicted lines are smooth between measured points. */
    private static double[] grid(MeasuredFrequencyResponse m) {
        int n = 400;
        double lo = Math.log(m.omega(0));
        double hi = Math.log(m.omega(m.size() - 1));
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = Math.exp(lo + (hi - lo) * i / (n - 1));
        }
        return w;
    }

    private static FrequencySeries series(String name, TransferFunction g, double[] omega) {
        FrequencyResponse r = g.frequencyResponse(omega);
        double[] magnitude = new double[r.size()];
        double[] phase = r.unwrappedPhaseDeg();
        for (int i = 0; i < magnitude.length; i++) {
            magnitude[i] = r.magnitude(i);
            phase[i] = Math.toRadians(phase[i]);
        }
        return new FrequencySeries(name, r.omegas(), magnitude, phase);
    }

    private static double minCoherence(MeasuredFrequencyResponse m) {
        double min = 1;
        for (int i = 0; i < m.size(); i++) {
            min = Math.min(min, m.coherence(i));
        }
        return min;
    }

    private static String comparison(ResponseComparison c) {
        return fmt(c.magnitudeRmsDb()) + " dB / " + fmt(c.phaseRmsDeg()) + "° rms";
    }

    private static String resonanceText(Optional<Resonance> r) {
        return r.map(m -> "; its first mode: anti-resonance " + fmt(m.antiResonanceHz()) + " Hz, resonance "
                + fmt(m.resonanceHz()) + " Hz").orElse("");
    }

    private static JsonObject comparisonJson(ResponseComparison c) {
        JsonObject o = new JsonObject();
        o.addProperty("points", c.points());
        o.add("logErrorRms", number(c.logErrorRms()));
        o.add("magnitudeRmsDb", number(c.magnitudeRmsDb()));
        o.add("phaseRmsDeg", number(c.phaseRmsDeg()));
        return o;
    }

    private static JsonObject fitJson(PlantFitResult f) {
        JsonObject o = new JsonObject();
        o.addProperty("model", f.model().name().toLowerCase(Locale.ROOT).replace('_', '-'));
        o.addProperty("formula", "ω_M/T = " + f.model().formula());
        o.add("totalInertiaKgCm2", number(f.totalInertia() * 1e4));
        o.add("viscousDampingNmsPerRad", number(f.viscousDamping()));
        f.twoMass().ifPresent(t -> {
            o.add("motorSideInertiaKgCm2", number(t.motorInertia() * 1e4));
            o.add("loadSideInertiaKgCm2", number(t.loadInertia() * 1e4));
            o.add("stiffnessAtMotorNmPerRad", number(t.stiffness()));
            o.add("dampingAtMotorNmsPerRad", number(t.damping()));
            o.add("dampingRatioPercent", number(t.dampingRatio() * 100));
            o.add("antiResonanceHz", number(t.resonance().antiResonanceHz()));
            o.add("resonanceHz", number(t.resonance().resonanceHz()));
        });
        o.add("deadTimeMs", number(f.deadTime() * 1e3));
        o.add("currentLoopBandwidthHz", Double.isInfinite(f.currentLoopBandwidth()) ? JsonNull.INSTANCE
                : number(hz(f.currentLoopBandwidth())));
        o.add("againstMeasurement", comparisonJson(f.quality()));
        o.addProperty("iterations", f.iterations());
        o.addProperty("evaluations", f.evaluations());
        return o;
    }

    private static JsonObject updateJson(PlantUpdate u) {
        JsonObject o = new JsonObject();
        o.addProperty("from", kind(u.previous()));
        o.addProperty("to", kind(u.updated()));
        JsonArray changes = new JsonArray();
        for (ParameterChange c : u.changes()) {
            Shown s = shown(c.unit());
            JsonObject j = new JsonObject();
            j.addProperty("parameter", c.parameter());
            j.add("before", number(c.before() * s.factor()));
            j.add("after", number(c.after() * s.factor()));
            j.addProperty("unit", s.unit());
            changes.add(j);
        }
        o.add("changes", changes);
        JsonArray notes = new JsonArray();
        u.notes().forEach(notes::add);
        o.add("notes", notes);
        return o;
    }

    /** The model element behind a mapped axis (inline or from a library file), by its id. */
    private static Axis modelAxis(Machine machine, String id) {
        List<Axis> all = new ArrayList<>(machine.getAxes());
        all.addAll(machine.getLibraryAxes());
        return all.stream().filter(a -> id.equals(a.getId())).findFirst()
                .orElseThrow(() -> new IllegalStateException("mapped axis " + id + " is not in the machine it came from"));
    }

    /**
     * Writes the fit into a copy of the machine (or of the library axis file) at --write-updated OUT: refused, with
     * nothing written, when the kinds differ, the copy does not validate, or OUT is a file the model is read from.
     */
    private static UpdatedAxisModel writeUpdated(Options o, FittedAxis axis, PlantUpdate update) throws BadInput {
        Path machineFile = axis.machine().file();
        Path out = o.writeUpdated().orElseThrow();
        UpdatedAxisModel updated;
        try {
            updated = PlantParameterUpdate.apply(axis.element(), o.fit().orElseThrow(), update.updated());
        } catch (MappingException e) {
            String notes = update.notes().isEmpty() ? "" : " (" + String.join("; ", update.notes()) + ")";
            throw new BadInput(machineFile + ": error: cannot write the fit: " + e.getMessage() + notes);
        }
        List<String> errors = new ArrayList<>();
        for (ValidationProblem p : new ModelValidation().validate(updated.copy())) {
            if (p.severity() == ValidationProblem.Severity.ERROR) {
                errors.add(out + ": error: the updated " + p.element().eClass().getName() + " would be invalid: "
                        + p.message());
            }
        }
        if (!errors.isEmpty()) {
            throw new BadInput(String.join(System.lineSeparator(), errors) + System.lineSeparator() + out
                    + ": nothing written");
        }
        try {
            updated.write(out, new ModelFiles());
        } catch (IllegalArgumentException e) {
            throw new BadInput("tracewell measured: --write-updated " + e.getMessage());
        } catch (IOException e) {
            throw new BadInput(out + ": error: cannot write: " + e.getMessage());
        }
        return updated;
    }

    private static void writtenSummary(List<String> lines, Options o, UpdatedAxisModel w) {
        String source = w.originalFile().map(Path::toString).orElse(o.machine().orElseThrow().toString());
        lines.add("Updated " + (w.fromLibrary() ? "library axis" : "machine") + " written to "
                + o.writeUpdated().orElseThrow() + " (a copy of " + source + ", which is unchanged): axis "
                + w.axis().getName() + ", plant " + w.axis().getPlant().getId());
        for (PlantAttributeChange c : w.changes()) {
            TradeUnit unit = tradeUnit(c);
            String shownUnit = "1".equals(unit.symbol()) ? "" : " " + unit.symbol();
            row(lines, c.label(), fmt(unit.fromSi(c.oldValue())) + " → " + fmt(unit.fromSi(c.newValue())) + shownUnit
                    + (Double.isFinite(c.relativeChange())
                            ? String.format(Locale.ROOT, "  (%+.1f %%)", c.relativeChange() * 100) : ""));
        }
        if (w.fromLibrary()) {
            lines.add("  note: " + o.machine().orElseThrow().getFileName() + " still references " + source
                    + "; point it at the new file once the axis is reviewed");
        }
    }

    /** The trade unit the model shows an attribute in (its ecore display unit), or the SI unit it is stored in. */
    private static TradeUnit tradeUnit(PlantAttributeChange c) {
        return UnitTable.find(c.displayUnit()).or(() -> UnitTable.find(c.unit()))
                .orElse(new TradeUnit(c.unit(), c.unit(), 1.0, false, 0));
    }

    private static JsonObject writtenJson(Options o, UpdatedAxisModel w) {
        JsonObject j = new JsonObject();
        j.addProperty("file", o.writeUpdated().orElseThrow().toString());
        j.addProperty("copyOf", w.originalFile().map(Path::toString).orElse(""));
        j.addProperty("libraryAxis", w.fromLibrary());
        j.addProperty("axis", w.axis().getName());
        JsonArray changes = new JsonArray();
        for (PlantAttributeChange c : w.changes()) {
            TradeUnit unit = tradeUnit(c);
            JsonObject change = new JsonObject();
            change.addProperty("element", c.elementId());
            change.addProperty("attribute", c.attribute());
            change.add("before", number(unit.fromSi(c.oldValue())));
            change.add("after", number(unit.fromSi(c.newValue())));
            change.addProperty("unit", unit.symbol());
            change.add("beforeSi", number(c.oldValue()));
            change.add("afterSi", number(c.newValue()));
            change.addProperty("siUnit", c.unit());
            changes.add(change);
        }
        j.add("changes", changes);
        return j;
    }

    // ------------------------------------------------------------------------------------------- circle

    private static Outcome circle(Options o) throws MeasuredDataException, IOException, BadInput {
        MeasuredCircleTest test = MeasuredCircleTest.read(o.file());
        MeasuredCircleEvaluation evaluation = MeasuredCircleEvaluation.of(test);
        Optional<ContourResult> predicted = Optional.empty();
        if (o.machine().isPresent()) {
            predicted = Optional.of(predictedCircle(o, test));
        }
        MeasurementSource source = test.source();
        List<String> lines = new ArrayList<>();
        lines.add("Measured circle test " + source.evidence() + ": " + test.firstAxisName() + "/"
                + test.secondAxisName() + ", R " + fmt(test.radius() * 1e3) + " mm, F "
                + fmt(TradeUnits.mPerMinFromMPerS(test.feed())) + " m/min");
        lines.add(String.format(Locale.ROOT, "  %-5s %8s %9s %9s %22s  %s", "run", "samples", "G (µm)", "F (µm)",
                "ρ − R range (µm)", "ellipse"));
        for (CircleTestResult r : evaluation.runs()) {
            lines.add(String.format(Locale.ROOT, "  %-5s %8d %9s %9s %22s  %s µm at %s°", r.direction(),
                    r.evaluatedSamples(), fmt(um(r.circularDeviation())), fmt(um(r.radialDeviation())),
                    fmt(um(r.radialDeviationMin())) + " … " + fmt(um(r.radialDeviationMax())),
                    fmt(um(r.ellipsePeakToPeak())), fmt(Math.toDegrees(r.ellipseOrientation()))));
        }
        evaluation.bidirectional().ifPresent(b -> lines.add("  G(b) " + fmt(um(b.bidirectionalDeviation())) + " µm"));
        predicted.ifPresent(c -> {
            StringBuilder b = new StringBuilder("Predicted (" + o.machine().get().getFileName() + ", contour '"
                    + c.contourName() + "'):");
            for (var run : c.runs()) {
                run.circleTest().ifPresent(t -> b.append(' ').append(t.direction()).append(" G ")
                        .append(fmt(um(t.circularDeviation()))).append(" µm, F ").append(fmt(um(t.radialDeviation())))
                        .append(" µm;"));
            }
            c.bidirectional().ifPresent(g -> b.append(" G(b) ").append(fmt(um(g.bidirectionalDeviation())))
                    .append(" µm"));
            lines.add(b.toString());
        });
        List<BudgetLine> budget = new ArrayList<>();
        String id = "measured-" + stem(o.file());
        budget.add(MeasuredBudgetLines.circle(id + "-g", null, evaluation, CircleFigure.CIRCULAR_DEVIATION));
        budget.add(MeasuredBudgetLines.circle(id + "-f", null, evaluation, CircleFigure.RADIAL_DEVIATION));
        if (evaluation.bidirectional().isPresent()) {
            budget.add(MeasuredBudgetLines.circle(id + "-gb", null, evaluation, CircleFigure.BIDIRECTIONAL_DEVIATION));
        }
        budgetSummary(lines, budget);

        JsonObject json = header("circle", o.file(), source);
        json.addProperty("axes", test.firstAxisName() + "/" + test.secondAxisName());
        json.addProperty("radiusMm", test.radius() * 1e3);
        json.addProperty("feedMPerMin", TradeUnits.mPerMinFromMPerS(test.feed()));
        JsonArray runs = new JsonArray();
        for (CircleTestResult r : evaluation.runs()) {
            runs.add(circleRunJson(r));
        }
        json.add("runs", runs);
        json.add("bidirectionalDeviationGbUm", evaluation.bidirectional()
                .map(b -> number(um(b.bidirectionalDeviation()))).orElse(JsonNull.INSTANCE));
        json.add("predicted", predicted.<JsonElement>map(MeasuredCommand::predictedJson).orElse(JsonNull.INSTANCE));
        json.add("budgetLines", budgetJson(budget));

        List<CircleRun> measuredRuns = new ArrayList<>();
        for (int i = 0; i < test.runs().size(); i++) {
            MeasuredCircleRun run = test.runs().get(i);
            CircleTestResult r = evaluation.runs().get(i);
            measuredRuns.add(new CircleRun("measured " + run.direction(),
                    run.angles(test.centre().u(), test.centre().v()),
                    run.radialDeviations(test.centre().u(), test.centre().v(), test.radius()), r.circularDeviation(),
                    r.radialDeviation()));
        }
        List<CircleRun> predictedRuns = predicted.map(PredictedCircleRuns::of).orElse(List.of());
        double predictedGb = predicted.flatMap(ContourResult::bidirectional).map(b -> b.bidirectionalDeviation())
                .orElse(Double.NaN);
        double measuredGb = evaluation.bidirectional().map(b -> b.bidirectionalDeviation()).orElse(Double.NaN);
        JFreeChart chart = CircleTestChart.create("Circle test " + test.firstAxisName() + "/" + test.secondAxisName()
                + ", R " + fmt(test.radius() * 1e3) + " mm", test.radius(), predictedRuns, predictedGb, measuredRuns,
                measuredGb, ReversalPoint.quadrants(test.firstAxisName(), test.secondAxisName()),
                test.firstAxisName(), test.secondAxisName());
        return new Outcome(json, lines, Optional.of(new Chart(chart, POLAR_WIDTH, POLAR_HEIGHT)));
    }

    /**
     * The machine's full-circle contour named by --contour, or else the first of the measured radius and feed,
     * simulated in both directions (only that contour is simulated).
     */
    private static ContourResult predictedCircle(Options o, MeasuredCircleTest test) throws BadInput {
        Path file = o.machine().get();
        MachineInputs inputs = loadMachine(file).inputs();
        List<String> circles = new ArrayList<>();
        String chosen = o.contour().orElse(null);
        for (MappedContour c : inputs.contours()) {
            if (c.path().segmentCount() != 1 || !(c.path().segment(0) instanceof ArcSegment arc) || !arc.isFullCircle()) {
                continue;
            }
            circles.add("'" + c.name() + "' (R " + fmt(arc.radius() * 1e3) + " mm, F "
                    + fmt(TradeUnits.mPerMinFromMPerS(c.limits().feed())) + " m/min)");
            boolean sameTest = Math.abs(arc.radius() - test.radius()) <= 1e-6
                    && Math.abs(c.limits().feed() - test.feed()) <= 1e-3 * test.feed();
            boolean named = chosen != null && (c.name().equals(chosen) || c.id().equals(chosen));
            if (named || (chosen == null && sameTest)) {
                return simulate(inputs, c.id(), file);
            }
        }
        throw new BadInput(file + ": error: no full-circle contour " + (chosen != null ? "named '" + chosen + "'"
                : "of R " + fmt(test.radius() * 1e3) + " mm at " + fmt(TradeUnits.mPerMinFromMPerS(test.feed()))
                        + " m/min") + "; full circles: " + (circles.isEmpty() ? "none" : String.join(", ", circles)));
    }

    private static ContourResult simulate(MachineInputs inputs, String contourId, Path file) throws BadInput {
        try {
            MachineAnalysis analysis = MachineAnalyzer.analyze(inputs, List.of(contourId), (task, done, total) -> { },
                    CancellationFlag.create());
            return analysis.contour(contourId).orElseThrow();
        } catch (IllegalArgumentException e) {
            throw new BadInput(file + ": error: " + e.getMessage());
        } catch (AnalysisCancelledException e) {
            throw new IllegalStateException("analysis cancelled without a cancel request", e);
        }
    }

    private static JsonObject circleRunJson(CircleTestResult r) {
        JsonObject o = new JsonObject();
        o.addProperty("direction", r.direction().name());
        o.addProperty("evaluatedSamples", r.evaluatedSamples());
        o.add("circularDeviationGUm", number(um(r.circularDeviation())));
        o.add("radialDeviationFUm", number(um(r.radialDeviation())));
        o.add("radialDeviationMaxUm", number(um(r.radialDeviationMax())));
        o.add("radialDeviationMinUm", number(um(r.radialDeviationMin())));
        o.add("leastSquaresCentreUUm", number(um(r.leastSquaresCircle().centreU())));
        o.add("leastSquaresCentreVUm", number(um(r.leastSquaresCircle().centreV())));
        o.add("leastSquaresRadiusMm", number(r.leastSquaresCircle().radius() * 1e3));
        o.add("ellipseOrientationDeg", number(Math.toDegrees(r.ellipseOrientation())));
        o.add("ellipsePeakToPeakUm", number(um(r.ellipsePeakToPeak())));
        return o;
    }

    private static JsonObject predictedJson(ContourResult c) {
        JsonObject o = new JsonObject();
        o.addProperty("contour", c.contourName());
        JsonArray runs = new JsonArray();
        for (var run : c.runs()) {
            run.circleTest().ifPresent(t -> runs.add(circleRunJson(t)));
        }
        o.add("runs", runs);
        o.add("bidirectionalDeviationGbUm", c.bidirectional().map(b -> number(um(b.bidirectionalDeviation())))
                .orElse(JsonNull.INSTANCE));
        return o;
    }

    // ------------------------------------------------------------------------------------------- positioning

    private static Outcome positioning(Options o) throws MeasuredDataException, IOException {
        PositioningMeasurement runs = PositioningMeasurement.read(o.file());
        PositioningEvaluation evaluation = Iso230Positioning.evaluate(runs);
        MeasurementSource source = runs.source();
        String axis = o.axis().or(() -> source.metadata("axis")).orElse(null);
        List<String> lines = new ArrayList<>();
        lines.add("ISO 230-2 positioning " + source.evidence() + ": " + (axis == null ? "" : "axis " + axis + ", ")
                + runs.targetCount() + " targets × " + runs.approachCount() + " approaches each way");
        lines.add(String.format(Locale.ROOT, "  %11s %9s %9s %9s %9s %9s %9s", "target (mm)", "x̄↑ (µm)", "x̄↓ (µm)",
                "B (µm)", "s↑ (µm)", "s↓ (µm)", "R (µm)"));
        for (TargetStatistics t : evaluation.targets()) {
            lines.add(String.format(Locale.ROOT, "  %11s %9.2f %9.2f %9.2f %9.2f %9.2f %9.2f", fmt(t.target() * 1e3),
                    um(t.meanUp()), um(t.meanDown()), um(t.reversal()), um(t.standardUncertaintyUp()),
                    um(t.standardUncertaintyDown()), um(t.repeatability())));
        }
        PositioningFigures f = evaluation.figures();
        lines.add("Axis figures (ISO 230-2 definitions, coverage factor 2):");
        lines.add(figure("A", f.accuracy(), "A↑", f.accuracyUp(), "A↓", f.accuracyDown()));
        lines.add(figure("R", f.repeatability(), "R↑", f.repeatabilityUp(), "R↓", f.repeatabilityDown()));
        lines.add(figure("E", f.systematic(), "E↑", f.systematicUp(), "E↓", f.systematicDown()));
        lines.add(String.format(Locale.ROOT, "  B %8s µm   (mean reversal %s µm)", fmt(um(f.reversal())),
                fmt(um(f.meanReversal()))));
        lines.add(String.format(Locale.ROOT, "  M %8s µm", fmt(um(f.meanRange()))));
        evaluation.notes().forEach(n -> lines.add("  note: " + n));
        List<BudgetLine> budget = new ArrayList<>();
        String id = "measured-" + stem(o.file());
        budget.add(MeasuredBudgetLines.positioning(id + "-e", axis, evaluation, PositioningFigure.SYSTEMATIC));
        budget.add(MeasuredBudgetLines.positioning(id + "-b", axis, evaluation, PositioningFigure.REVERSAL));
        budget.add(MeasuredBudgetLines.positioning(id + "-r", axis, evaluation, PositioningFigure.REPEATABILITY));
        budgetSummary(lines, budget);

        JsonObject json = header("positioning", o.file(), source);
        json.add("axis", axis == null ? JsonNull.INSTANCE : new JsonPrimitive(axis));
        json.addProperty("targetCount", runs.targetCount());
        json.addProperty("approachesEachWay", runs.approachCount());
        JsonArray targets = new JsonArray();
        for (TargetStatistics t : evaluation.targets()) {
            JsonObject j = new JsonObject();
            j.add("targetMm", number(t.target() * 1e3));
            j.add("meanUpUm", number(um(t.meanUp())));
            j.add("meanDownUm", number(um(t.meanDown())));
            j.add("meanBidirectionalUm", number(um(t.meanBidirectional())));
            j.add("reversalUm", number(um(t.reversal())));
            j.add("standardUncertaintyUpUm", number(um(t.standardUncertaintyUp())));
            j.add("standardUncertaintyDownUm", number(um(t.standardUncertaintyDown())));
            j.add("repeatabilityUpUm", number(um(t.repeatabilityUp())));
            j.add("repeatabilityDownUm", number(um(t.repeatabilityDown())));
            j.add("repeatabilityUm", number(um(t.repeatability())));
            targets.add(j);
        }
        json.add("targets", targets);
        JsonObject figures = new JsonObject();
        for (PositioningFigure figure : PositioningFigure.values()) {
            figures.add(figureKey(figure), number(um(figure.of(f))));
        }
        json.add("figures", figures);
        JsonArray notes = new JsonArray();
        evaluation.notes().forEach(notes::add);
        json.add("notes", notes);
        json.add("budgetLines", budgetJson(budget));
        return new Outcome(json, lines, Optional.empty());
    }

    private static String figure(String symbol, double value, String upSymbol, double up, String downSymbol,
            double down) {
        return String.format(Locale.ROOT, "  %s %8s µm   (%s %s µm, %s %s µm)", symbol, fmt(um(value)), upSymbol,
                fmt(um(up)), downSymbol, fmt(um(down)));
    }

    /** "accuracyUpUm" for A↑: the enum name in camel case with the unit. */
    private static String figureKey(PositioningFigure figure) {
        StringBuilder b = new StringBuilder();
        boolean upper = false;
        for (char ch : figure.name().toLowerCase(Locale.ROOT).toCharArray()) {
            if (ch == '_') {
                upper = true;
            } else {
                b.append(upper ? Character.toUpperCase(ch) : ch);
                upper = false;
            }
        }
        return b.append("Um").toString();
    }

    // ------------------------------------------------------------------------------------------- shared

    private static LoadedMachine loadMachine(Path file) throws BadInput {
        if (!Files.isRegularFile(file)) {
            throw new BadInput(file + ": error: no such file; give a .machine file");
        }
        try {
            LoadedModel model = new ModelFiles().load(file);
            return new LoadedMachine(file, model, EngineMapping.map(model.machine()));
        } catch (ModelLoadException e) {
            List<String> problems = new ArrayList<>();
            for (LoadProblem problem : e.problems()) {
                problems.add(problem.position() + ": error: " + problem.message());
            }
            throw new BadInput(String.join(System.lineSeparator(), problems));
        } catch (MappingException e) {
            throw new BadInput(file + ": error: element " + e.getMessage());
        }
    }

    private static MappedAxis axis(MachineInputs inputs, String name, Path file) throws BadInput {
        List<String> names = new ArrayList<>();
        for (MappedAxis a : inputs.axes()) {
            if (a.name().equals(name)) {
                return a;
            }
            names.add(a.name());
        }
        throw new BadInput(file + ": error: no axis named '" + name + "'; axes: " + String.join(", ", names));
    }

    private static JsonObject header(String kind, Path file, MeasurementSource source) {
        JsonObject o = new JsonObject();
        o.addProperty("tool", "tracewell");
        o.addProperty("toolVersion", TracewellCommand.version());
        o.addProperty("measurement", kind);
        o.addProperty("file", file.toString());
        o.add("date", source.date().map(d -> (JsonElement) new JsonPrimitive(d.toString())).orElse(JsonNull.INSTANCE));
        o.addProperty("dateStated", source.dateStated());
        o.addProperty("evidence", source.evidence());
        JsonObject metadata = new JsonObject();
        source.metadata().forEach(metadata::addProperty);
        o.add("metadata", metadata);
        return o;
    }

    private static void budgetSummary(List<String> lines, List<BudgetLine> budget) {
        lines.add("As budget lines (source measured, evidence " + budget.get(0).evidence() + "):");
        for (BudgetLine b : budget) {
            lines.add(String.format(Locale.ROOT, "  %-34s %-11s %8s µm  %s", b.id(), b.errorClass().displayName(),
                    fmt(um(b.value())), b.name()));
        }
    }

    private static JsonArray budgetJson(List<BudgetLine> budget) {
        JsonArray array = new JsonArray();
        for (BudgetLine b : budget) {
            JsonObject j = new JsonObject();
            j.addProperty("id", b.id());
            j.addProperty("name", b.name());
            j.add("axis", b.axis() == null ? JsonNull.INSTANCE : new JsonPrimitive(b.axis()));
            j.addProperty("source", b.source().displayName());
            j.addProperty("origin", b.origin().displayName());
            j.addProperty("class", b.errorClass().displayName());
            j.addProperty("distribution", b.distribution().displayName());
            j.addProperty("statedCoverageFactor", b.statedCoverageFactor());
            j.add("valueUm", number(um(b.value())));
            j.add("standardUncertaintyUm", number(um(b.standardUncertainty())));
            j.addProperty("evidence", b.evidence());
            array.add(j);
        }
        return array;
    }

    /** A display unit for an SI unit of a plant parameter (the model's display units). */
    private record Shown(double factor, String unit) {
    }

    private static Shown shown(String siUnit) {
        return switch (siUnit) {
            case "kg·m²" -> new Shown(1e4, "kg·cm²");
            case "N/m" -> new Shown(1e-6, "N/µm");
            default -> new Shown(1, siUnit);
        };
    }

    private static String kind(AxisPlant plant) {
        return switch (plant) {
            case org.tracewell.engine.axis.RigidScrewDrive p -> "rigid ball-screw drive";
            case org.tracewell.engine.axis.TwoMassScrewDrive p -> "two-mass ball-screw drive";
            case org.tracewell.engine.axis.RackAndPinionDrive p -> "rack-and-pinion drive";
            case org.tracewell.engine.axis.DirectLinearDrive p -> "direct linear drive";
            case org.tracewell.engine.axis.RotaryTable p -> "rotary table";
            case org.tracewell.engine.axis.TransferFunctionPlant p -> "explicit transfer-function plant";
        };
    }

    private static void row(List<String> lines, String label, String value) {
        lines.add(String.format(Locale.ROOT, "  %-24s %s", label, value));
    }

    private static double hz(double radPerSec) {
        return TradeUnits.hertz(radPerSec);
    }

    private static double um(double metres) {
        return TradeUnits.micrometres(metres);
    }

    private static String fmt(double v) {
        return TradeUnits.format(v, 4);
    }

    /** Finite number, or null (JSON has no NaN or infinity). */
    private static JsonElement number(double v) {
        return Double.isFinite(v) ? new JsonPrimitive(v == 0.0 ? 0.0 : v) : JsonNull.INSTANCE;
    }
}
