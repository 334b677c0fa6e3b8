package org.tracewell.core.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ForkJoinPool;

import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.variation.MachineVariantModel;
import org.tracewell.core.variation.RequirementYield;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyMetric;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.core.variation.StudyRunner;
import org.tracewell.engine.variation.MetricSummary;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.model.Machine;
import org.tracewell.model.units.UnitTable;

/**
 * Timing of a whole-model tolerance study: the LM-3020's own Monte-Carlo study "XY tolerances" (six varied
 * attributes, eight results: each variant maps the X1 and Y axes, runs both 100 mm circle tests with the full cascade
 * loops, the 45° line, the loop margins and the error budget). Runs it on a ForkJoin pool of parallelism 1 and of 2,
 * checks both give identical results, and records the figures.
 * <p>
 * Usage: {@code StudyBenchmark EXAMPLES-FOLDER [results-file]} (default {@code benchmarks/study-benchmark.txt}).
 */
public final class StudyBenchmark {

    /** Variants run before timing, so the optimising compiler has settled (fewer leave it compiling in the runs). */
    private static final int WARM_UP = 1000;

    private final List<String> lines = new ArrayList<>();

    private StudyBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path examples = Path.of(args.length > 0 ? args[0] : "examples");
        Path out = Path.of(args.length > 1 ? args[1] : "benchmarks/study-benchmark.txt");
        new StudyBenchmark().run(examples.resolve("LM-3020.machine"), out);
    }

    private void run(Path file, Path out) throws Exception {
        line("# Tracewell whole-model study benchmark (org.tracewell.core.bench.StudyBenchmark)");
        line("date: " + ZonedDateTime.now().format(DateTimeFormatter.ISO_OFFSET_DATE_TIME));
        line("java: " + System.getProperty("java.vm.name") + " " + System.getProperty("java.version")
                + ", processors: " + Runtime.getRuntime().availableProcessors() + ", max heap: "
                + Runtime.getRuntime().maxMemory() / (1 << 20) + " MiB");
        line("note: the machine may be shared with other work while this runs; the load averages below show how much."
                + " Wall-clock times on a loaded machine are upper bounds.");
        loadAverage("start");
        Machine machine = new ModelFiles().loadMachine(file);
        StudyDefinition study = StudyDefinition.of(StudyRunner.study(machine, "XY tolerances"));
        MachineVariantModel model = new MachineVariantModel(machine, study.paths(), study.metrics());
        line("");
        line("## set-up");
        line("study '" + study.name() + "' of " + machine.getName() + ": " + study.variantCount() + " variants, seed "
                + study.seed() + "; " + model.parameterCount() + " varied attributes " + study.paths());
        line(model.metricCount() + " results " + model.studyMetrics().stream().map(StudyMetric::name).toList());
        line("contour runs simulated per variant: " + model.simulatedRunCount()
                + " (the CW circle contour repeats the CCW contour's reversed run, so it is simulated once)");
        long t0 = System.nanoTime();
        StudyDefinition warmUp = new StudyDefinition(study.name(), study.kind(), study.tolerances(), study.ranges(),
                study.metrics(), WARM_UP, study.seed() + 1, study.worstKept());
        StudyResult w = StudyRunner.run(machine, warmUp, RunControl.on(new ForkJoinPool(2)));
        StudyRunner.run(machine, warmUp, RunControl.serial());
        line(String.format(Locale.ROOT, "JIT warm-up: 2 × %d variants (2 threads, then 1), %.1f s", w.completedCount(),
                (System.nanoTime() - t0) / 1e9));

        line("");
        line("## timings, " + study.variantCount() + " variants (sensitivities at the nominal point included: 2P + 1 ="
                + " " + (2 * model.parameterCount() + 1) + " more evaluations, serial)");
        StudyResult[] results = new StudyResult[2];
        double[] cpu = new double[2];
        for (int threads = 1; threads <= 2; threads++) {
            ForkJoinPool pool = new ForkJoinPool(threads);
            long c0 = processCpuNanos();
            results[threads - 1] = StudyRunner.run(machine, study, RunControl.on(pool));
            cpu[threads - 1] = (processCpuNanos() - c0) / 1e9;
            pool.shutdown();
            loadAverage("after the " + threads + "-core run");
        }
        for (int i = 0; i < 2; i++) {
            line(String.format(Locale.ROOT, "ForkJoinPool parallelism %d: wall %8.2f s  (%.1f ms per variant), process"
                    + " CPU %8.2f s", i + 1, results[i].seconds(), 1e3 * results[i].seconds() / study.variantCount(),
                    cpu[i]));
        }
        line(String.format(Locale.ROOT, "speed-up 1 → 2 cores (wall): %.2f; CPU seconds per wall second with 2 threads:"
                + " %.2f (2.00 = both cores ours)", results[0].seconds() / results[1].seconds(),
                cpu[1] / results[1].seconds()));
        boolean identical = true;
        for (int m = 0; m < model.metricCount(); m++) {
            identical &= Arrays.equals(results[0].monteCarlo().orElseThrow().metricValues(m),
                    results[1].monteCarlo().orElseThrow().metricValues(m));
        }
        line("1-core and 2-core results bit-identical: " + identical);

        StudyResult r = results[1];
        line("");
        line("## result (trade units)");
        for (int m = 0; m < r.metrics().size(); m++) {
            StudyMetric metric = r.metrics().get(m);
            MetricSummary s = r.summary(m);
            String unit = metric.displayUnit();
            line(String.format(Locale.ROOT, "%-34s %-11s nominal %9s  p5 %9s  p50 %9s  p95 %9s  max %9s", metric.name(),
                    unit, shown(r.nominalMetrics()[m], unit), shown(s.p05(), unit), shown(s.p50(), unit),
                    shown(s.p95(), unit), shown(s.max(), unit)));
        }
        for (RequirementYield y : r.yields()) {
            line(String.format(Locale.ROOT, "yield %-20s %.4f ± %.4f (binomial SE), %d of %d", y.requirement()
                    .requirementId(), y.estimate().fraction(), y.estimate().standardError(), y.estimate().passCount(),
                    y.estimate().sampleCount()));
        }
        loadAverage("end");
        Files.createDirectories(out.toAbsolutePath().getParent());
        Files.write(out, lines, StandardCharsets.UTF_8);
        System.out.println(String.join("\n", lines));
    }

    private static String shown(double si, String unit) {
        return UnitTable.find(unit).map(u -> UnitTable.formatNumber(u.fromSi(si), u.minFractionDigits()))
                .orElse(String.valueOf(si));
    }

    private void line(String text) {
        lines.add(text);
    }

    private void loadAverage(String when) throws IOException {
        Path load = Path.of("/proc/loadavg");
        if (Files.isReadable(load)) {
            String[] f = Files.readString(load).trim().split("\\s+");
            line("load average " + when + " (1/5/15 min): " + f[0] + " " + f[1] + " " + f[2]);
        }
    }

    private static long processCpuNanos() {
        var bean = java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        return bean instanceof com.sun.management.OperatingSystemMXBean os ? os.getProcessCpuTime() : 0;
    }
}
