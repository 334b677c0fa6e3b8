package org.tracewell.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ForkJoinPool;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import org.tracewell.core.Examples;
import org.tracewell.charts.ChartExport;
import org.tracewell.report.ReportInput;
import org.tracewell.report.ReportWriter;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.analysis.AnalysisCancelledException;
import org.tracewell.core.analysis.AxisResult;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.ContourTimeSeries;
import org.tracewell.core.analysis.EstimateCheck;
import org.tracewell.core.analysis.FeedFollowingError;
import org.tracewell.core.analysis.MachineBudget;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.core.analysis.RequirementBudget;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.engine.budget.LineContribution;
import org.tracewell.engine.units.TradeUnits;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.core.variation.StudyRunner;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.model.Machine;
import org.tracewell.model.StudyKind;
import org.tracewell.model.VariationStudy;
import org.tracewell.requirements.DerivedRequirement;
import org.tracewell.requirements.DesignReview;
import org.tracewell.requirements.DisplayUnits;
import org.tracewell.requirements.RequirementResult;
import org.tracewell.requirements.ReviewProvenance;
import org.tracewell.requirements.ReviewResults;
import org.tracewell.requirements.Verification;

/**
 * {@code tracewell analyze [FILE] [--out DIR] [--json] [--contour NAME…]}: analyses a machine (the bundled LM-3020
 * when no FILE is given), writes results.json and one CSV per contour run into DIR (default ./tracewell-report/),
 * prints the requirement summary in trade units and the safety caution. Exit 0 all met, 1 any violated, 2 bad input,
 * 3 internal error. Progress goes to stderr.
 */
public final class AnalyzeCommand {

    static final String USAGE = "usage: tracewell analyze [FILE] [--out DIR] [--json] [--contour NAME...] [--studies]"
            + " [--author NAME]";
    static final String DEFAULT_OUT = "tracewell-report";
    static final String EXAMPLE = Examples.LM_3020;

    private AnalyzeCommand() {
    }

    private record Options(Path file, Path out, boolean json, List<String> contours, boolean studies,
            String author) {
    }

    public static int run(String[] args, PrintStream out, PrintStream err) {
        Options options;
        try {
            options = parse(args, out);
            if (options == null) {
                return ExitCode.OK;
            }
        } catch (IllegalArgumentException bad) {
            err.println("tracewell analyze: " + bad.getMessage());
            err.println(USAGE);
            return ExitCode.BAD_INPUT;
        }
        // The model load and the analysis leave a core idle: load the chart machinery there meanwhile.
        Thread warmUp = new Thread(() -> {
            try {
                ChartExport.warmUp();
            } catch (RuntimeException ignored) {
                // only a head start: the report's own drawing reports any real problem
            }
        }, "chart warm-up");
        warmUp.setDaemon(true);
        warmUp.start();
        Path file = options.file();
        Optional<MachineInput> input = MachineInput.load(file, err);
        if (input.isEmpty()) {
            return ExitCode.BAD_INPUT;
        }
        Machine machine = input.get().machine();
        byte[] bytes = input.get().bytes();
        ReviewResults review;
        try {
            List<String> settings = List.of(
                    "combination: " + MachineBudgets.DEFAULT_METHOD.printable(),
                    "reserve held back from each contour requirement: "
                            + Math.round(MachineBudget.RESERVE_FRACTION * 100) + " %",
                    "coverage factor of random lines: k = 2",
                    "contours simulated with each axis's linear closed loop at the contour's sample period");
            ReviewProvenance provenance = new ReviewProvenance(TracewellCommand.version(), file.toString(),
                    sha256(bytes), Instant.now(), options.contours(), settings);
            review = DesignReview.run(machine, provenance,
                    (task, done, total) -> err.println("[" + done + "/" + total + "] " + task),
                    CancellationFlag.create());
        } catch (MappingException e) {
            err.println(file + ": error: element " + e.getMessage());
            return ExitCode.BAD_INPUT;
        } catch (IllegalArgumentException e) {
            err.println(file + ": error: " + e.getMessage());
            return ExitCode.BAD_INPUT;
        } catch (AnalysisCancelledException e) {
            err.println("tracewell analyze: " + e.getMessage());
            return ExitCode.INTERNAL_ERROR;
        } catch (RuntimeException e) {
            err.println("tracewell analyze: internal error: " + e);
            return ExitCode.INTERNAL_ERROR;
        }
        ReportInput reportInput = ReportInput.of(review, machine).withAuthor(options.author());
        List<RanStudy> ran = List.of();
        if (options.studies() && !machine.getStudies().isEmpty()) {
            try {
                ran = runStudies(machine, options.out(), bytes, file, err);
                reportInput = reportInput.withStudyResults(ran.stream().map(RanStudy::result).toList());
            } catch (IOException e) {
                err.println(options.out() + ": error: cannot write the study results: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            } catch (IllegalArgumentException | MappingException e) {
                err.println(file + ": error: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
        }
        ReportInput finalInput = reportInput;
        try {
            Files.createDirectories(options.out());
            // The report (charts, mostly) is the slowest part: draw it while the JSON and CSV files are written.
            err.println("writing the design-review report");
            CompletableFuture<List<Path>> report = CompletableFuture.supplyAsync(() -> {
                try {
                    return ReportWriter.write(finalInput, options.out());
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
            String json = new GsonBuilder().setPrettyPrinting().serializeNulls().serializeSpecialFloatingPointValues()
                    .disableHtmlEscaping().create().toJson(ResultsJson.of(review, machine, ran, options.out()));
            Files.writeString(options.out().resolve("results.json"), json + "\n", StandardCharsets.UTF_8);
            for (ContourResult contour : review.analysis().contours()) {
                for (ContourRun run : contour.runs()) {
                    writeCsv(options.out().resolve(csvName(contour, run)), contour, run);
                }
            }
            try {
                report.join();
            } catch (CompletionException e) {
                if (e.getCause() instanceof UncheckedIOException io) {
                    throw io.getCause();
                }
                throw e;
            }
            if (options.json()) {
                out.println(json);
            }
        } catch (IOException e) {
            err.println(options.out() + ": error: cannot write the report: " + e.getMessage());
            return ExitCode.BAD_INPUT;
        }
        printSummary(review, options.out(), options.json() ? err : out);
        return review.requirements().anyViolated() ? ExitCode.VIOLATED : ExitCode.OK;
    }

    private static Options parse(String[] args, PrintStream out) {
        Path file = null;
        Path dir = Path.of(DEFAULT_OUT);
        boolean json = false;
        boolean studies = false;
        String author = "";
        List<String> contours = new ArrayList<>();
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            switch (a) {
                case "--help", "-h" -> {
                    out.println(USAGE);
                    out.println("--studies also runs every tolerance study the model asks for (they can take minutes)"
                            + " and puts them into the report and DIR/studies/.");
                    out.println("Exit codes: 0 all requirements met, 1 a requirement violated, 2 bad input,"
                            + " 3 internal error.");
                    return null;
                }
                case "--json" -> json = true;
                case "--studies" -> studies = true;
                case "--author" -> {
                    if (i + 1 >= args.length || args[i + 1].isBlank() || args[i + 1].startsWith("--")) {
                        throw new IllegalArgumentException("--author needs a name, e.g. --author \"R. Okafor\"");
                    }
                    author = args[++i];
                }
                case "--out" -> {
                    if (i + 1 >= args.length) {
                        throw new IllegalArgumentException("--out needs a directory");
                    }
                    dir = Path.of(args[++i]);
                }
                case "--contour" -> {
                    int before = contours.size();
                    while (i + 1 < args.length && !args[i + 1].startsWith("--")) {
                        contours.add(args[++i]);
                    }
                    if (contours.size() == before) {
                        throw new IllegalArgumentException("--contour needs at least one contour name");
                    }
                }
                default -> {
                    if (a.startsWith("-")) {
                        throw new IllegalArgumentException("unknown option '" + a + "'");
                    }
                    if (file != null) {
                        throw new IllegalArgumentException("only one FILE may be given, got '" + file + "' and '"
                                + a + "'");
                    }
                    file = Path.of(a);
                }
            }
        }
        return new Options(file == null ? examplesFolder().resolve(EXAMPLE) : file, dir, json, contours, studies,
                author);
    }

    /** A study run by {@code --studies} and the files it was written to. */
    record RanStudy(StudyResult result, StudyFiles.Written files) {
    }

    /** Every study the model asks for, on all cores, each written to DIR/studies/ as tracewell montecarlo/sweep do. */
    private static List<RanStudy> runStudies(Machine machine, Path out, byte[] bytes, Path file, PrintStream err)
            throws IOException, MappingException {
        List<RanStudy> results = new ArrayList<>();
        ForkJoinPool pool = new ForkJoinPool(Runtime.getRuntime().availableProcessors());
        try {
            for (VariationStudy study : machine.getStudies()) {
                StudyDefinition definition = StudyDefinition.of(study);
                err.println("study '" + definition.name() + "' (" + (definition.kind() == StudyKind.SWEEP ? "sweep"
                        : definition.variantCount() + " variants") + ")");
                StudyResult result = StudyRunner.run(machine, definition, new RunControl(pool, (done, total) -> {
                    if (done == total) {
                        err.println("study '" + definition.name() + "': " + done + "/" + total);
                    }
                }, null));
                StudyFiles.Written written = StudyFiles.write(result, out.resolve("studies"), new StudyFiles.Provenance(
                        TracewellCommand.version(), file.toString(), sha256(bytes), Instant.now(), "analyze --studies"));
                results.add(new RanStudy(result, written));
            }
        } finally {
            pool.shutdown();
        }
        return results;
    }

    /** The bundled examples (see {@link Examples#folder()}); a usage error when they cannot be found. */
    static Path examplesFolder() {
        try {
            return Examples.folder();
        } catch (IllegalStateException e) {
            throw new IllegalArgumentException("no FILE given and " + e.getMessage() + "; give a .machine file instead");
        }
    }

    static String csvName(ContourResult contour, ContourRun run) {
        return contour.contourId().replaceAll("[^A-Za-z0-9._-]", "_") + "-" + run.direction().label() + ".csv";
    }

    /** Every sample, SI units named in the header (s, m). */
    private static void writeCsv(Path target, ContourResult contour, ContourRun run) throws IOException {
        ContourTimeSeries series = run.timeSeries();
        String u = contour.firstAxisName().replaceAll("[^A-Za-z0-9]", "_");
        String v = contour.secondAxisName().replaceAll("[^A-Za-z0-9]", "_");
        try (BufferedWriter w = Files.newBufferedWriter(target, StandardCharsets.UTF_8)) {
            w.write("t_s," + u + "_ref_m," + v + "_ref_m," + u + "_m," + v + "_m," + u + "_following_error_m," + v
                    + "_following_error_m,contour_error_m\n");
            StringBuilder line = new StringBuilder(160);
            for (int k = 0; k < series.sampleCount(); k++) {
                line.setLength(0);
                line.append(series.time(k)).append(',').append(series.reference(0, k)).append(',')
                        .append(series.reference(1, k)).append(',').append(series.actual(0, k)).append(',')
                        .append(series.actual(1, k)).append(',').append(series.followingError(0, k)).append(',')
                        .append(series.followingError(1, k)).append(',').append(series.contourError(k)).append('\n');
                w.append(line);
            }
        }
    }

    private static void printSummary(ReviewResults review, Path dir, PrintStream out) {
        out.println("Machine " + review.analysis().machineName() + " — requirements");
        out.printf(Locale.ROOT, "%-22s %12s %12s %12s  %-12s %s%n", "requirement", "value", "limit", "margin",
                "unit", "status");
        for (RequirementResult r : review.requirements().results()) {
            String unit = DisplayUnits.shown(r.siUnit(), r.displayUnit());
            out.printf(Locale.ROOT, "%-22s %12s %12s %12s  %-12s %s%n", r.id(), fmt(r.displayValue()),
                    (r.bound().equals("atLeast") ? "≥ " : "≤ ") + TradeUnits.format(r.displayLimit(), 3),
                    fmt(r.displayMargin()), unit, r.status().label()
                            + r.notEvaluatedReason().map(reason -> " (" + reason + ")").orElse(""));
        }
        long violated = review.requirements().results().stream()
                .filter(r -> r.status() == org.tracewell.requirements.RequirementStatus.VIOLATED).count();
        out.println(violated == 0 ? "All evaluated requirements met." : violated + " requirement(s) violated.");
        out.println("Results: " + dir.resolve("results.json"));
        out.println("Caution: " + SafetyCaution.SHORT);
    }

    private static String fmt(OptionalDouble value) {
        return value.isPresent() ? TradeUnits.format(value.getAsDouble(), 3) : "—";
    }

    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required by every Java platform", e);
        }
    }

    /** results.json: trade-unit fields carry the unit in their name (…Um, …Hz, …Deg, …Db, …MPerMinPerMm). */
    static final class ResultsJson {

        private ResultsJson() {
        }

        static JsonObject of(ReviewResults review) {
            return of(review, null, List.of(), null);
        }

        /**
         * With a "studies" entry per study of {@code machine}: run (its files, relative to {@code out}, and how many
         * variants or grid points completed) or not run (and how to run it). No entry when {@code machine} is null.
         */
        static JsonObject of(ReviewResults review, Machine machine, List<RanStudy> ran, Path out) {
            JsonObject root = ofReview(review);
            if (machine != null) {
                JsonArray studies = new JsonArray();
                for (VariationStudy study : machine.getStudies()) {
                    JsonObject o = new JsonObject();
                    o.addProperty("name", study.getName());
                    o.addProperty("kind", study.getKind().getLiteral());
                    RanStudy done = ran.stream().filter(r -> r.result().definition().name().equals(study.getName()))
                            .findFirst().orElse(null);
                    o.addProperty("run", done != null);
                    if (done == null) {
                        o.addProperty("note", "not run; tracewell analyze --studies runs it (or tracewell "
                                + (study.getKind() == StudyKind.SWEEP ? "sweep" : "montecarlo") + " --study NAME)");
                    } else {
                        o.addProperty("completed", done.result().completedCount());
                        o.addProperty("planned", done.result().plannedCount());
                        JsonObject files = new JsonObject();
                        files.addProperty("json", relative(out, done.files().json()));
                        files.addProperty("summaryCsv", relative(out, done.files().summary()));
                        files.addProperty("dataCsv", relative(out, done.files().data()));
                        o.add("files", files);
                    }
                    studies.add(o);
                }
                root.add("studies", studies);
            }
            return root;
        }

        /** {@code file} relative to {@code dir}, '/'-separated, so results.json reads the same on every system. */
        private static String relative(Path dir, Path file) {
            return dir.toAbsolutePath().relativize(file.toAbsolutePath()).toString().replace('\\', '/');
        }

        private static JsonObject ofReview(ReviewResults review) {
            JsonObject root = new JsonObject();
            root.addProperty("tool", "tracewell");
            root.addProperty("toolVersion", review.provenance().toolVersion());
            root.addProperty("inputFile", review.provenance().inputFile());
            root.addProperty("inputSha256", review.provenance().inputSha256());
            root.addProperty("date", review.provenance().analysedAt().toString());
            JsonObject machine = new JsonObject();
            machine.addProperty("id", review.analysis().machineId());
            machine.addProperty("name", review.analysis().machineName());
            machine.addProperty("interpolationPeriodMs", review.analysis().interpolationPeriod() * 1e3);
            root.add("machine", machine);
            JsonArray axes = new JsonArray();
            for (AxisResult a : review.analysis().axes()) {
                axes.add(axis(a));
            }
            root.add("axes", axes);
            JsonArray contours = new JsonArray();
            for (ContourResult c : review.analysis().contours()) {
                for (ContourRun run : c.runs()) {
                    contours.add(contourRun(c, run));
                }
            }
            root.add("contours", contours);
            root.add("budget", budget(review.budget()));
            JsonArray requirements = new JsonArray();
            for (RequirementResult r : review.requirements().results()) {
                requirements.add(requirement(r));
            }
            root.add("requirements", requirements);
            JsonArray derived = new JsonArray();
            for (DerivedRequirement d : review.requirements().derived()) {
                JsonObject o = new JsonObject();
                o.addProperty("id", d.id());
                o.addProperty("parent", d.parentId());
                o.addProperty("axes", d.axisName());
                o.addProperty("statement", d.statement());
                o.addProperty("quantity", d.limit().quantity());
                o.addProperty("bound", d.limit().bound().name());
                o.addProperty("valueSi", d.limit().value());
                o.addProperty("siUnit", d.limit().siUnit());
                o.addProperty("formula", d.limit().formula());
                o.addProperty("currentlySatisfied", d.currentlySatisfied());
                derived.add(o);
            }
            root.add("derivedRequirementSuggestions", derived);
            root.addProperty("overallStatus", review.requirements().overallStatus().label());
            root.addProperty("safetyCaution", SafetyCaution.TEXT);
            return root;
        }

        private static JsonObject axis(AxisResult a) {
            JsonObject o = new JsonObject();
            o.addProperty("id", a.axisId());
            o.addProperty("name", a.axisName());
            o.addProperty("rotary", a.rotary());
            o.addProperty("kvPerS", a.positionGain());
            o.addProperty("kvMPerMinPerMm", TradeUnits.kvToMPerMinPerMm(a.positionGain()));
            o.addProperty("positionLoopType", a.dynamics().positionLoopType());
            o.addProperty("effectiveType", a.dynamics().effectiveType());
            o.addProperty("stable", a.dynamics().stable());
            o.addProperty("positionPhaseMarginDeg", Math.toDegrees(a.positionPhaseMargin()));
            o.addProperty("positionGainMarginDb", TradeUnits.decibels(a.positionGainMargin()));
            o.addProperty("velocityPhaseMarginDeg", Math.toDegrees(a.velocityPhaseMargin()));
            o.addProperty("velocityGainMarginDb", TradeUnits.decibels(a.velocityGainMargin()));
            put(o, "positionBandwidthHz", a.dynamics().positionBandwidthHz());
            put(o, "velocityBandwidthHz", a.dynamics().velocityBandwidthHz());
            a.dynamics().resonance().ifPresent(r -> {
                o.addProperty("resonanceHz", r.resonanceHz());
                o.addProperty("antiResonanceHz", r.antiResonanceHz());
            });
            o.addProperty("maxVelocityMPerMin", TradeUnits.mPerMinFromMPerS(a.maxVelocity()));
            put(o, "followingErrorAtMaxVelocityMm", scale(a.atMaxVelocity().followingError(), 1e3));
            JsonArray feeds = new JsonArray();
            for (FeedFollowingError f : a.atContourFeeds()) {
                JsonObject e = new JsonObject();
                e.addProperty("contour", f.contourName());
                e.addProperty("axisVelocityMPerMin", TradeUnits.mPerMinFromMPerS(f.velocity()));
                put(e, "followingErrorMm", scale(f.followingError(), 1e3));
                put(e, "followingErrorWithoutFeedforwardMm", scale(f.followingErrorWithoutFeedforward(), 1e3));
                feeds.add(e);
            }
            o.add("followingErrorAtContourFeeds", feeds);
            o.addProperty("encoderStepAtLoadUm", TradeUnits.micrometres(a.positionResolution()));
            return o;
        }

        private static JsonObject contourRun(ContourResult c, ContourRun run) {
            JsonObject o = new JsonObject();
            o.addProperty("contour", c.contourName());
            o.addProperty("contourId", c.contourId());
            o.addProperty("direction", run.direction().label());
            o.addProperty("programmedDirection", run.isProgrammedDirection(c.programmedDirection()));
            o.addProperty("axes", c.firstAxisName() + "/" + c.secondAxisName());
            o.addProperty("feedMPerMin", TradeUnits.mPerMinFromMPerS(c.feed()));
            o.addProperty("samplePeriodMs", c.samplePeriod() * 1e3);
            o.addProperty("samples", run.metrics().sampleCount());
            o.addProperty("durationS", run.metrics().duration());
            o.addProperty("maxContourErrorUm", TradeUnits.micrometres(run.metrics().maxContourError()));
            o.addProperty("rmsContourErrorUm", TradeUnits.micrometres(run.metrics().rmsContourError()));
            o.addProperty("timeOfMaxS", run.metrics().timeOfMax());
            o.addProperty("peakFollowingErrorFirstAxisUm",
                    TradeUnits.micrometres(run.metrics().peakFollowingErrorFirst()));
            o.addProperty("peakFollowingErrorSecondAxisUm",
                    TradeUnits.micrometres(run.metrics().peakFollowingErrorSecond()));
            put(o, "circularDeviationGUm", scale(run.metrics().circularDeviationG(), 1e6));
            put(o, "radialDeviationFUm", scale(run.metrics().radialDeviationF(), 1e6));
            put(o, "radialDeviationMaxUm", scale(run.metrics().radialDeviationMax(), 1e6));
            put(o, "radialDeviationMinUm", scale(run.metrics().radialDeviationMin(), 1e6));
            put(o, "ellipseOrientationDeg", run.metrics().ellipseOrientation().isPresent()
                    ? OptionalDouble.of(Math.toDegrees(run.metrics().ellipseOrientation().getAsDouble()))
                    : OptionalDouble.empty());
            put(o, "ellipsePeakToPeakUm", scale(run.metrics().ellipsePeakToPeak(), 1e6));
            c.bidirectional().ifPresent(b -> o.addProperty("bidirectionalDeviationGbUm",
                    TradeUnits.micrometres(b.bidirectionalDeviation())));
            JsonObject estimate = new JsonObject();
            estimate.addProperty("followingErrorFirstAxisUm",
                    TradeUnits.micrometres(c.estimate().followingErrorFirst()));
            estimate.addProperty("followingErrorSecondAxisUm",
                    TradeUnits.micrometres(c.estimate().followingErrorSecond()));
            put(estimate, "radiusLossExactUm", scale(c.estimate().radiusLossExact(), 1e6));
            put(estimate, "radiusLossApproxUm", scale(c.estimate().radiusLossApprox(), 1e6));
            put(estimate, "circularDeviationMismatchUm", scale(c.estimate().circularDeviationMismatch(), 1e6));
            put(estimate, "lineMismatchErrorUm", scale(c.estimate().lineMismatchError(), 1e6));
            put(estimate, "cornerErrorUm", scale(c.estimate().cornerError(), 1e6));
            estimate.addProperty("basis", c.estimate().basis());
            o.add("estimate", estimate);
            JsonArray checks = new JsonArray();
            for (EstimateCheck check : c.estimateChecks()) {
                JsonObject row = new JsonObject();
                row.addProperty("figure", check.figure());
                row.addProperty("simulatedUm", TradeUnits.micrometres(check.simulated()));
                row.addProperty("estimateUm", TradeUnits.micrometres(check.estimate()));
                row.addProperty("formula", check.formula());
                double relative = check.relativeDifference();
                put(row, "relativeDifference", Double.isNaN(relative) ? OptionalDouble.empty()
                        : OptionalDouble.of(relative));
                checks.add(row);
            }
            o.add("estimateChecks", checks);
            o.addProperty("csv", csvName(c, run));
            JsonArray notes = new JsonArray();
            c.notes().forEach(notes::add);
            o.add("notes", notes);
            return o;
        }

        private static JsonObject budget(MachineBudget budget) {
            JsonObject o = new JsonObject();
            o.addProperty("reservePercent", MachineBudget.RESERVE_FRACTION * 100);
            JsonArray perRequirement = new JsonArray();
            for (RequirementBudget b : budget.requirements()) {
                JsonObject r = new JsonObject();
                r.addProperty("requirement", b.requirementId());
                r.addProperty("metric", b.metric());
                r.addProperty("method", b.evaluation().method().displayName());
                r.addProperty("methodStatement", b.evaluation().methodStatement());
                r.addProperty("totalUm", TradeUnits.micrometres(b.evaluation().total()));
                r.addProperty("linearSumUm", TradeUnits.micrometres(b.evaluation().linearSum()));
                r.addProperty("rssUm", TradeUnits.micrometres(b.evaluation().rootSumSquare()));
                b.evaluation().comparison().ifPresent(cmp -> {
                    r.addProperty("targetUm", TradeUnits.micrometres(cmp.target()));
                    r.addProperty("allowedTotalUm", TradeUnits.micrometres(cmp.allowedTotal()));
                    r.addProperty("marginUm", TradeUnits.micrometres(cmp.margin()));
                    r.addProperty("marginPercent", cmp.marginPercent());
                    r.addProperty("status", cmp.status().displayName());
                });
                JsonArray lines = new JsonArray();
                for (LineContribution c : b.evaluation().ranking()) {
                    JsonObject l = new JsonObject();
                    l.addProperty("rank", c.rank());
                    l.addProperty("id", c.line().id());
                    l.addProperty("name", c.line().name());
                    l.addProperty("axis", c.line().axis());
                    l.addProperty("source", c.line().source().displayName());
                    l.addProperty("origin", c.line().origin().displayName());
                    l.addProperty("class", c.line().errorClass().name().toLowerCase(Locale.ROOT));
                    l.addProperty("distribution", c.line().distribution().displayName());
                    l.addProperty("valueUm", TradeUnits.micrometres(c.line().value()));
                    l.addProperty("sensitivity", c.line().sensitivity());
                    l.addProperty("contributionUm", TradeUnits.micrometres(c.contribution()));
                    l.addProperty("portionUm", TradeUnits.micrometres(c.portion()));
                    l.addProperty("share", c.share());
                    l.addProperty("evidence", c.line().evidence());
                    lines.add(l);
                }
                r.add("lines", lines);
                perRequirement.add(r);
            }
            o.add("requirements", perRequirement);
            JsonArray superseded = new JsonArray();
            budget.superseded().forEach(s -> {
                JsonObject l = new JsonObject();
                l.addProperty("id", s.stored().id());
                l.addProperty("storedValueUm", TradeUnits.micrometres(s.stored().value()));
                l.addProperty("replacedBy", s.replacedById());
                superseded.add(l);
            });
            o.add("supersededLines", superseded);
            return o;
        }

        private static JsonObject requirement(RequirementResult r) {
            JsonObject o = new JsonObject();
            o.addProperty("id", r.id());
            o.addProperty("statement", r.statement());
            o.addProperty("kind", r.kind());
            if (!r.metric().isEmpty()) {
                o.addProperty("metric", r.metric());
            }
            o.addProperty("bound", r.bound());
            put(o, "value", r.displayValue());
            o.addProperty("limit", r.displayLimit());
            o.addProperty("unit", DisplayUnits.shown(r.siUnit(), r.displayUnit()));
            put(o, "margin", r.displayMargin());
            put(o, "marginPercent", r.marginPercent());
            put(o, "valueSi", r.value());
            o.addProperty("limitSi", r.limit());
            o.addProperty("siUnit", r.siUnit());
            o.addProperty("status", r.status().label());
            r.notEvaluatedReason().ifPresent(reason -> o.addProperty("notEvaluatedReason", reason));
            o.addProperty("parent", r.parentId().orElse(null));
            JsonArray children = new JsonArray();
            r.childIds().forEach(children::add);
            o.add("children", children);
            o.addProperty("allocatedAxis", r.allocatedAxisName().orElse(null));
            o.addProperty("axis", r.allocatedAxisName().orElse(null));
            JsonArray verified = new JsonArray();
            for (Verification v : r.verifiedBy()) {
                verified.add(v.describe());
            }
            o.add("verifiedBy", verified);
            o.addProperty("rationale", r.rationale());
            return o;
        }

        private static OptionalDouble scale(OptionalDouble v, double factor) {
            return v.isPresent() ? OptionalDouble.of(v.getAsDouble() * factor) : OptionalDouble.empty();
        }

        private static void put(JsonObject o, String name, OptionalDouble v) {
            if (v.isPresent()) {
                o.addProperty(name, v.getAsDouble());
            } else {
                o.add(name, com.google.gson.JsonNull.INSTANCE);
            }
        }
    }
}
