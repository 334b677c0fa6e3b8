package org.tracewell.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicLong;

import org.tracewell.core.SafetyCaution;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.core.variation.RequirementYield;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyFigures;
import org.tracewell.core.variation.StudyMetric;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.core.variation.StudyRunner;
import org.tracewell.core.variation.SweepRange;
import org.tracewell.core.variation.Tolerance;
import org.tracewell.engine.variation.MetricSummary;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.engine.variation.VariantEvaluationException;
import org.tracewell.model.Machine;
import org.tracewell.model.StudyKind;
import org.tracewell.model.ToleranceShape;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.paths.AttributePath;
import org.tracewell.model.units.TradeUnit;
import org.tracewell.model.units.UnitTable;

/**
 * {@code tracewell montecarlo} and {@code tracewell sweep}: a tolerance study of a machine (the bundled LM-3020
 * without FILE), from the model ({@code --study NAME}, or the machine's first study of the kind) or from the command
 * line ({@code --dist} / {@code --param}). Writes {@code NAME.json}, {@code NAME-summary.csv} and
 * {@code NAME-variants.csv} (Monte-Carlo) or {@code NAME-grid.csv} (sweep) into DIR, prints a summary in trade
 * units, progress on stderr. Exit 0 when the nominal machine meets every requirement collected (and every yield
 * reaches {@code --min-yield}), 1 otherwise, 2 bad input, 3 internal error.
 */
public final class StudyCommand {

    static final String DEFAULT_OUT = "tracewell-study";
    static final String MONTE_CARLO_USAGE = "usage: tracewell montecarlo [FILE] [--study NAME | --dist PATH=SPEC...]"
            + " [--metric NAME...] [-n N] [--seed S] [--threads T] [--worst K] [--min-yield P] [--out DIR] [--json]";
    static final String SWEEP_USAGE = "usage: tracewell sweep [FILE] [--study NAME | --param PATH=FROM:TO:STEPS"
            + " [--param ...]] [--metric NAME...] [--threads T] [--out DIR] [--json]";
    static final String SPEC_HELP = """
              SPEC    normal:SIGMA[,MIN,MAX] | uniform:A[,MIN,MAX] | triangular:A[,MIN,MAX]
                      (σ, or the half-width A about the nominal; MIN/MAX truncate to the physical range)
              values  in the attribute's SI unit, or with a unit: 0.05(m/min)/mm, 30kg, 2mm
              PATH    e.g. axis[X1].plant.loadMass, axis[Y].controller.positionGain, contour[NAME].feed
              NAME    requirement[ID], contour[NAME].G|F|maxContourError, axis[NAME].Kv|phaseMargin|gainMargin|
                      bandwidth|velocityPhaseMargin|velocityGainMargin|velocityBandwidth|followingError|settlingTime
                      (default: the study's metrics, else every requirement)""";

    private StudyCommand() {
    }

    public static int montecarlo(String[] args, PrintStream out, PrintStream err) {
        return run(StudyKind.MONTE_CARLO, args, out, err);
    }

    public static int sweep(String[] args, PrintStream out, PrintStream err) {
        return run(StudyKind.SWEEP, args, out, err);
    }

    private static String command(StudyKind kind) {
        return kind == StudyKind.SWEEP ? "sweep" : "montecarlo";
    }

    private record Options(Path file, String study, List<String> specs, List<String> metrics, Integer variants,
            Long seed, int threads, Integer worst, double minYield, Path out, boolean json) {
    }

    static int run(StudyKind kind, String[] args, PrintStream out, PrintStream err) {
        String name = "tracewell " + command(kind);
        String usage = kind == StudyKind.SWEEP ? SWEEP_USAGE : MONTE_CARLO_USAGE;
        Options options;
        try {
            options = parse(kind, args, out);
            if (options == null) {
                return ExitCode.OK;
            }
        } catch (IllegalArgumentException bad) {
            err.println(name + ": " + bad.getMessage());
            err.println(usage);
            return ExitCode.BAD_INPUT;
        }
        Path file = options.file();
        Optional<MachineInput> input = MachineInput.load(file, err);
        if (input.isEmpty()) {
            return ExitCode.BAD_INPUT;
        }
        Machine machine = input.get().machine();
        byte[] bytes = input.get().bytes();
        StudyDefinition definition;
        try {
            definition = definition(kind, options, machine);
        } catch (IllegalArgumentException bad) {
            err.println(file + ": error: " + bad.getMessage());
            return ExitCode.BAD_INPUT;
        }
        StudyResult result;
        ForkJoinPool pool = options.threads() > 1 ? new ForkJoinPool(options.threads()) : null;
        try {
            RunControl control = new RunControl(pool, progress(name, err), null);
            err.println(name + ": study '" + definition.name() + "' of " + machine.getName() + ", "
                    + (kind == StudyKind.SWEEP ? definition.ranges().stream().mapToInt(SweepRange::steps)
                            .reduce(1, (a, b) -> a * b) + " grid points" : definition.variantCount() + " variants")
                    + " on " + options.threads() + (options.threads() == 1 ? " thread" : " threads"));
            result = StudyRunner.run(machine, definition, control);
        } catch (MappingException e) {
            err.println(file + ": error: element " + e.getMessage());
            return ExitCode.BAD_INPUT;
        } catch (VariantEvaluationException e) {
            err.println(name + ": " + e.getMessage());
            return ExitCode.INTERNAL_ERROR;
        } catch (IllegalArgumentException e) {
            err.println(file + ": error: " + e.getMessage());
            return ExitCode.BAD_INPUT;
        } finally {
            if (pool != null) {
                pool.shutdown();
            }
        }
        try {
            StudyFiles.Written written = StudyFiles.write(result, options.out(), new StudyFiles.Provenance(
                    TracewellCommand.version(), file.toString(), AnalyzeCommand.sha256(bytes), Instant.now(),
                    command(kind)));
            if (options.json()) {
                out.println(Files.readString(written.json(), StandardCharsets.UTF_8));
            }
            printSummary(result, written, options.json() ? err : out);
        } catch (IOException e) {
            err.println(options.out() + ": error: cannot write the study results: " + e.getMessage());
            return ExitCode.BAD_INPUT;
        }
        return verdict(result, options.minYield(), options.json() ? err : out);
    }

    /** Exit code: 1 when the nominal machine violates a collected requirement or a yield is below the minimum. */
    private static int verdict(StudyResult result, double minYield, PrintStream out) {
        int code = ExitCode.OK;
        for (int m = 0; m < result.metrics().size(); m++) {
            if (result.metrics().get(m) instanceof org.tracewell.core.variation.RequirementValue r
                    && !r.met(result.nominalMetrics()[m])) {
                out.println("The nominal machine violates " + r.requirementId() + ".");
                code = ExitCode.VIOLATED;
            }
        }
        for (RequirementYield y : result.yields()) {
            if (y.estimate().fraction() < minYield) {
                out.printf(Locale.ROOT, "Yield of %s is %.1f %%, below the minimum %.1f %%.%n",
                        y.requirement().requirementId(), 100 * y.estimate().fraction(), 100 * minYield);
                code = ExitCode.VIOLATED;
            }
        }
        return code;
    }

    /** Progress lines on stderr, at most every two seconds and at the end. */
    private static org.tracewell.engine.variation.ProgressListener progress(String name, PrintStream err) {
        AtomicLong last = new AtomicLong(System.nanoTime());
        return (done, total) -> {
            long now = System.nanoTime();
            if (done == total || now - last.get() > 2_000_000_000L) {
                last.set(now);
                err.printf(Locale.ROOT, "%s: %d/%d (%d %%)%n", name, done, total, 100 * done / Math.max(total, 1));
            }
        };
    }

    // ------------------------------------------------------------------------------------------------ options

    private static Options parse(StudyKind kind, String[] args, PrintStream out) {
        Path file = null;
        String study = null;
        List<String> specs = new ArrayList<>();
        List<String> metrics = new ArrayList<>();
        Integer variants = null;
        Long seed = null;
        int threads = Runtime.getRuntime().availableProcessors();
        Integer worst = null;
        double minYield = 0;
        Path dir = Path.of(DEFAULT_OUT);
        boolean json = false;
        String specOption = kind == StudyKind.SWEEP ? "--param" : "--dist";
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            switch (a) {
                case "--help", "-h" -> {
                    out.println(kind == StudyKind.SWEEP ? SWEEP_USAGE : MONTE_CARLO_USAGE);
                    out.println(kind == StudyKind.SWEEP ? "  FROM:TO:STEPS  grid of one attribute, ends included;"
                            + " two --param give a family of curves" : "");
                    out.println(SPEC_HELP);
                    out.println("Exit codes: 0 nominal meets every collected requirement (and every yield reaches"
                            + " --min-yield), 1 otherwise, 2 bad input, 3 internal error.");
                    return null;
                }
                case "--json" -> json = true;
                case "--study" -> study = value(args, ++i, a);
                case "--metric" -> metrics.add(value(args, ++i, a));
                case "--out" -> dir = Path.of(value(args, ++i, a));
                case "--seed" -> seed = parseLong(value(args, ++i, a), a);
                case "-n" -> {
                    requireKind(kind, StudyKind.MONTE_CARLO, a);
                    variants = parseInt(value(args, ++i, a), a, 1, StudyDefinition.MAX_VARIANTS);
                }
                case "--threads" -> threads = parseInt(value(args, ++i, a), a, 1, 256);
                case "--worst" -> worst = parseInt(value(args, ++i, a), a, 0, StudyDefinition.MAX_WORST);
                case "--min-yield" -> {
                    requireKind(kind, StudyKind.MONTE_CARLO, a);
                    minYield = parseDouble(value(args, ++i, a), a);
                    if (!(minYield >= 0 && minYield <= 1)) {
                        throw new IllegalArgumentException("--min-yield takes a fraction 0..1, got " + minYield);
                    }
                }
                default -> {
                    if (a.equals(specOption)) {
                        specs.add(value(args, ++i, a));
                    } else if (a.equals("--dist") || a.equals("--param")) {
                        throw new IllegalArgumentException(a + " belongs to tracewell "
                                + (a.equals("--dist") ? "montecarlo" : "sweep") + "; this command takes " + specOption);
                    } else if (a.startsWith("-")) {
                        throw new IllegalArgumentException("unknown option '" + a + "'");
                    } else if (file != null) {
                        throw new IllegalArgumentException("only one FILE may be given, got '" + file + "' and '" + a
                                + "'");
                    } else {
                        file = Path.of(a);
                    }
                }
            }
        }
        if (study != null && !specs.isEmpty()) {
            throw new IllegalArgumentException("give either --study or " + specOption + ", not both");
        }
        return new Options(file == null ? AnalyzeCommand.examplesFolder().resolve(AnalyzeCommand.EXAMPLE) : file,
                study, specs, metrics, variants, seed, threads, worst, minYield, dir, json);
    }

    private static void requireKind(StudyKind kind, StudyKind needed, String option) {
        if (kind != needed) {
            throw new IllegalArgumentException(option + " belongs to tracewell " + command(needed));
        }
    }

    private static String value(String[] args, int i, String option) {
        if (i >= args.length || args[i].startsWith("--")) {
            throw new IllegalArgumentException(option + " needs a value");
        }
        return args[i];
    }

    private static int parseInt(String text, String option, int min, int max) {
        try {
            int v = Integer.parseInt(text.strip());
            if (v < min || v > max) {
                throw new IllegalArgumentException(option + " must lie in " + min + ".." + max + ", got " + v);
            }
            return v;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(option + " needs a whole number, got '" + text + "'");
        }
    }

    private static long parseLong(String text, String option) {
        try {
            return Long.parseLong(text.strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(option + " needs a whole number, got '" + text + "'");
        }
    }

    private static double parseDouble(String text, String option) {
        try {
            return Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(option + " needs a number, got '" + text + "'");
        }
    }

    // ------------------------------------------------------------------------------------------------ definition

    /** The study: the model's (named, or its first of this kind) with the options applied, or one from the specs. */
    static StudyDefinition definition(StudyKind kind, Options options, Machine machine) {
        StudyDefinition base;
        if (!options.specs().isEmpty()) {
            List<Tolerance> tolerances = new ArrayList<>();
            List<SweepRange> ranges = new ArrayList<>();
            for (String spec : options.specs()) {
                if (kind == StudyKind.SWEEP) {
                    ranges.add(range(spec, machine));
                } else {
                    tolerances.add(tolerance(spec, machine));
                }
            }
            base = new StudyDefinition(command(kind), kind, tolerances, ranges, List.of(), 1000, 1, 5);
        } else {
            VariationStudy study = options.study() != null ? StudyRunner.study(machine, options.study())
                    : machine.getStudies().stream().filter(s -> s.getKind() == kind).findFirst()
                            .orElseThrow(() -> new IllegalArgumentException("machine " + machine.getName()
                                    + " asks for no " + (kind == StudyKind.SWEEP ? "sweep" : "Monte-Carlo study")
                                    + "; give " + (kind == StudyKind.SWEEP ? "--param PATH=FROM:TO:STEPS"
                                            : "--dist PATH=SPEC") + " or --study NAME"));
            if (study.getKind() != kind) {
                throw new IllegalArgumentException("study '" + study.getName() + "' is a "
                        + (study.getKind() == StudyKind.SWEEP ? "sweep; run it with tracewell sweep"
                                : "Monte-Carlo study; run it with tracewell montecarlo"));
            }
            base = StudyDefinition.of(study);
        }
        return new StudyDefinition(base.name(), kind, base.tolerances(), base.ranges(),
                options.metrics().isEmpty() ? base.metrics() : options.metrics(),
                options.variants() != null ? options.variants() : base.variantCount(),
                options.seed() != null ? options.seed() : base.seed(),
                options.worst() != null ? options.worst() : base.worstKept());
    }

    /** {@code PATH=normal:SIGMA[,MIN,MAX]}, {@code PATH=uniform:A[,MIN,MAX]}, {@code PATH=triangular:A[,MIN,MAX]}. */
    static Tolerance tolerance(String spec, Machine machine) {
        int eq = spec.lastIndexOf('=');
        if (eq <= 0) {
            throw new IllegalArgumentException("--dist '" + spec + "' is not PATH=SPEC, e.g."
                    + " axis[Y].controller.positionGain=normal:0.04");
        }
        String path = spec.substring(0, eq).strip();
        String siUnit = AttributePath.parse(path).resolve(machine).siUnit();
        String body = spec.substring(eq + 1).strip();
        int colon = body.indexOf(':');
        if (colon < 0) {
            throw new IllegalArgumentException("--dist '" + spec + "': expected SHAPE:WIDTH, e.g. normal:0.04");
        }
        String shapeText = body.substring(0, colon).strip().toLowerCase(Locale.ROOT);
        ToleranceShape shape = ToleranceShape.get(shapeText);
        if (shape == null) {
            throw new IllegalArgumentException("--dist '" + spec + "': unknown shape '" + shapeText
                    + "'; valid: normal, uniform, triangular");
        }
        String[] parts = body.substring(colon + 1).split(",", -1);
        if (parts.length != 1 && parts.length != 3) {
            throw new IllegalArgumentException("--dist '" + spec + "': expected WIDTH or WIDTH,MIN,MAX after "
                    + shapeText + ":");
        }
        double width = quantity(parts[0], siUnit, spec, "width", true);
        double min = parts.length == 3 && !parts[1].isBlank() ? quantity(parts[1], siUnit, spec, "MIN", false)
                : Double.NaN;
        double max = parts.length == 3 && !parts[2].isBlank() ? quantity(parts[2], siUnit, spec, "MAX", false)
                : Double.NaN;
        return new Tolerance(path, shape, width, min, max);
    }

    /** {@code PATH=FROM:TO:STEPS}. */
    static SweepRange range(String spec, Machine machine) {
        int eq = spec.lastIndexOf('=');
        String[] parts = eq > 0 ? spec.substring(eq + 1).split(":", -1) : new String[0];
        if (parts.length != 3) {
            throw new IllegalArgumentException("--param '" + spec + "' is not PATH=FROM:TO:STEPS, e.g."
                    + " axis[Y].controller.positionGain=36:44:9");
        }
        String path = spec.substring(0, eq).strip();
        String siUnit = AttributePath.parse(path).resolve(machine).siUnit();
        int steps;
        try {
            steps = Integer.parseInt(parts[2].strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("--param '" + spec + "': STEPS must be a whole number, got '" + parts[2]
                    + "'");
        }
        return new SweepRange(path, quantity(parts[0], siUnit, spec, "FROM", false),
                quantity(parts[1], siUnit, spec, "TO", false), steps);
    }

    /**
     * A number in the attribute's SI unit, or followed by a unit of the same quantity ({@code 30kg},
     * {@code 0.05(m/min)/mm}); a spread cannot be given in dB (not linear).
     */
    static double quantity(String text, String siUnit, String spec, String what, boolean spread) {
        String t = text.strip();
        int end = 0;
        while (end < t.length() && "0123456789+-.eE".indexOf(t.charAt(end)) >= 0) {
            end++;
        }
        // "1e" followed by a unit letter: the e belongs to the unit
        while (end > 0 && (t.charAt(end - 1) == 'e' || t.charAt(end - 1) == 'E')) {
            end--;
        }
        double number;
        try {
            number = Double.parseDouble(t.substring(0, end));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + spec + "': " + what + " '" + text + "' is not a number");
        }
        String unit = t.substring(end).strip();
        if (unit.isEmpty()) {
            return number;
        }
        TradeUnit u = UnitTable.find(unit).orElseThrow(() -> new IllegalArgumentException("'" + spec + "': unknown unit '"
                + unit + "'; give the " + what + " in " + siUnit + " or one of " + compatible(siUnit)));
        if (!u.siSymbol().equals(siUnit)) {
            throw new IllegalArgumentException("'" + spec + "': " + unit + " does not measure this attribute (stored in "
                    + siUnit + "); valid: " + compatible(siUnit));
        }
        if (spread && u.decibel()) {
            throw new IllegalArgumentException("'" + spec + "': a spread cannot be given in " + unit + "; give it in "
                    + siUnit);
        }
        return u.toSi(number);
    }

    private static List<String> compatible(String siUnit) {
        return UnitTable.symbols().stream().filter(s -> UnitTable.get(s).siSymbol().equals(siUnit)).toList();
    }

    // ------------------------------------------------------------------------------------------------ summary

    private static void printSummary(StudyResult r, StudyFiles.Written written, PrintStream out) {
        StudyDefinition d = r.definition();
        out.printf(Locale.ROOT, "Study '%s' of %s — %s, %d of %d %s in %.1f s on %d %s%s%n", d.name(), r.machineName(),
                d.kind() == StudyKind.SWEEP ? "sweep" : "Monte-Carlo, seed " + d.seed(), r.completedCount(),
                r.plannedCount(), d.kind() == StudyKind.SWEEP ? "grid points" : "variants", r.seconds(), r.threads(),
                r.threads() == 1 ? "thread" : "threads", r.cancelled() ? " (cancelled)" : "");
        if (r.monteCarlo().isPresent()) {
            out.printf(Locale.ROOT, "%-38s %-12s %12s %12s %12s %12s%n", "metric", "unit", "nominal", "p5", "p50",
                    "p95");
            for (int m = 0; m < r.metrics().size(); m++) {
                StudyMetric metric = r.metrics().get(m);
                MetricSummary s = r.summary(m);
                String unit = metric.displayUnit();
                out.printf(Locale.ROOT, "%-38s %-12s %12s %12s %12s %12s%n", metric.name(), unit,
                        StudyFigures.number(r.nominalMetrics()[m], unit), StudyFigures.number(s.p05(), unit), StudyFigures.number(s.p50(), unit),
                        StudyFigures.number(s.p95(), unit));
            }
            for (RequirementYield y : r.yields()) {
                out.printf(Locale.ROOT, "yield %-32s %6.1f %% ± %.1f %% (%d of %d variants meet %s %s)%n",
                        y.requirement().requirementId(), 100 * y.estimate().fraction(),
                        100 * y.estimate().standardError(), y.estimate().passCount(), y.estimate().sampleCount(),
                        y.requirement().bound().symbol(), UnitTable.format(y.requirement().limit(),
                                y.requirement().displayUnit()));
            }
        } else {
            for (int m = 0; m < r.metrics().size(); m++) {
                StudyMetric metric = r.metrics().get(m);
                double[] v = r.sweep().orElseThrow().metricValues(m);
                double lo = java.util.Arrays.stream(v).filter(Double::isFinite).min().orElse(Double.NaN);
                double hi = java.util.Arrays.stream(v).filter(Double::isFinite).max().orElse(Double.NaN);
                out.printf(Locale.ROOT, "%-38s nominal %s, over the grid %s … %s%n", metric.name(),
                        UnitTable.format(r.nominalMetrics()[m], metric.displayUnit()),
                        UnitTable.format(lo, metric.displayUnit()), UnitTable.format(hi, metric.displayUnit()));
            }
        }
        out.println("Results: " + written.json() + ", " + written.data());
        out.println("Caution: " + SafetyCaution.SHORT);
    }
}
