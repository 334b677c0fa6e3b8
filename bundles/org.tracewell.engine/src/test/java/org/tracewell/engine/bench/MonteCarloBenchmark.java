package org.tracewell.engine.bench;

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
import org.tracewell.engine.budget.LimitBound;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.engine.trajectory.ProfileShape;
import org.tracewell.engine.variation.CircleTestVariantModel;
import org.tracewell.engine.variation.MetricSummary;
import org.tracewell.engine.variation.MonteCarloPlan;
import org.tracewell.engine.variation.MonteCarloResult;
import org.tracewell.engine.variation.MonteCarloRunner;
import org.tracewell.engine.variation.ParameterDistribution;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.engine.variation.WorstVariant;
import org.tracewell.engine.variation.YieldEstimate;

/**
 * Monte-Carlo timing on the LM-3020 XY circle test (R = 100 mm, F = 3 m/min, CCW, path acceleration
 * 1 m/s², jerk 20 m/s³, 1 ms interpolation, 10° overshoot arcs): 10⁴ variants of two position loops with a
 * first-order velocity lag, nominal Kv = 50 1/s and T = 3 ms (invented demo values). Kv is normal with
 * ±5 % as its 3σ tolerance, truncated at ±5 %; T is uniform ±5 %. Times the same plan on a ForkJoin pool
 * of parallelism 1 and of 2, checks both give identical results, and records the figures.
 * <p>
 * Usage: {@code MonteCarloBenchmark [results-file]} (default {@code benchmarks/montecarlo-benchmark.txt}).
 */
public final class MonteCarloBenchmark {

    private static final double RADIUS = 0.100;
    private static final double FEED = 3.0 / 60;
    private static final double KV = 50;
    private static final double LAG = 3e-3;
    private static final double TOLERANCE = 0.05;
    private static final int VARIANTS = 10_000;
    private static final long SEED = 3020;
    /** LM-3020 target: circular deviation G ≤ 25 µm at F = 3 m/min, R = 100 mm (DESIGN.md demo scenario). */
    private static final double G_LIMIT = 25e-6;

    private final List<String> lines = new ArrayList<>();

    private MonteCarloBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        Path out = Path.of(args.length > 0 ? args[0] : "benchmarks/montecarlo-benchmark.txt");
        new MonteCarloBenchmark().run(out);
    }

    private void run(Path out) throws IOException {
        line("# Tracewell Monte-Carlo benchmark (org.tracewell.engine.bench.MonteCarloBenchmark)");
        line("date: " + ZonedDateTime.now().format(DateTimeFormatter.ISO_OFFSET_DATE_TIME));
        line("java: " + System.getProperty("java.vm.name") + " " + System.getProperty("java.version")
                + ", processors: " + Runtime.getRuntime().availableProcessors() + ", max heap: "
                + Runtime.getRuntime().maxMemory() / (1 << 20) + " MiB, os: " + System.getProperty("os.name") + " "
                + System.getProperty("os.arch"));
        line("note: the machine may be shared with other work while this runs; the load averages below show how much."
                + " Wall-clock times on a loaded machine are upper bounds.");
        loadAverage("start");

        CircleTestSetup setup = new CircleTestSetup(ContourPlane.xy(), new Point2(0.5, 0.3), RADIUS, FEED, ArcDirection.CCW,
                0, Math.toRadians(10));
        long t0 = System.nanoTime();
        CircleTestVariantModel model = CircleTestVariantModel.planned(setup, PathLimits.of(FEED, 1.0, 20.0),
                new AxisLimits(1.0, 3.0, 300.0), ProfileShape.S_CURVE, 1e-3, false);
        double planMs = (System.nanoTime() - t0) / 1e6;
        MonteCarloPlan plan = new MonteCarloPlan(List.of(
                ParameterDistribution.normal(KV, KV * TOLERANCE / 3, KV * (1 - TOLERANCE), KV * (1 + TOLERANCE)),
                ParameterDistribution.normal(KV, KV * TOLERANCE / 3, KV * (1 - TOLERANCE), KV * (1 + TOLERANCE)),
                ParameterDistribution.uniform(LAG, LAG * TOLERANCE, 1e-5, 1),
                ParameterDistribution.uniform(LAG, LAG * TOLERANCE, 1e-5, 1)), VARIANTS, SEED);
        line("");
        line("## set-up");
        line(String.format(Locale.ROOT, "circle R = %.0f mm, F = %.1f m/min, CCW, 10° overshoot arcs, T_s = 1 ms: %d samples"
                + " per variant (reference planned once in %.1f ms, shared by all threads)", RADIUS * 1e3, FEED * 60,
                model.sampleCount(), planMs));
        line(String.format(Locale.ROOT, "parameters: Kv_x, Kv_y normal %.0f 1/s, σ = %.3f 1/s (±5 %% = 3σ), truncated to"
                + " ±5 %%; T_x, T_y uniform %.1f ms ± 5 %%; N = %d, seed %d", KV, KV * TOLERANCE / 3, LAG * 1e3, VARIANTS, SEED));

        ForkJoinPool one = new ForkJoinPool(1);
        ForkJoinPool two = new ForkJoinPool(2);
        try {
            MonteCarloPlan warmup = new MonteCarloPlan(plan.distributions(), 384, SEED + 1);
            t0 = System.nanoTime();
            MonteCarloRunner.run(model, warmup, RunControl.on(two));
            MonteCarloRunner.run(model, warmup, RunControl.on(one));
            line(String.format(Locale.ROOT, "JIT warm-up: 2 × %d variants, %.1f s", warmup.variantCount(),
                    (System.nanoTime() - t0) / 1e9));

            line("");
            line("## timings, " + VARIANTS + " variants");
            double[] s1 = new double[2];
            MonteCarloResult r1 = timed(model, plan, one, s1);
            loadAverage("after the 1-core run");
            double[] s2 = new double[2];
            MonteCarloResult r2 = timed(model, plan, two, s2);
            loadAverage("after the 2-core run");
            line(String.format(Locale.ROOT, "ForkJoinPool parallelism 1: wall %8.2f s  (%.3f ms per variant), process CPU"
                    + " %7.2f s", s1[0], s1[0] * 1e3 / VARIANTS, s1[1]));
            line(String.format(Locale.ROOT, "ForkJoinPool parallelism 2: wall %8.2f s  (%.3f ms per variant), process CPU"
                    + " %7.2f s", s2[0], s2[0] * 1e3 / VARIANTS, s2[1]));
            line(String.format(Locale.ROOT, "speed-up 1 → 2 cores (wall): %.2f; CPU seconds per wall second with 2 threads:"
                    + " %.2f (2.00 = both cores ours)", s1[0] / s2[0], s2[1] / s2[0]));
            line(String.format(Locale.ROOT, "target ≤ 10 s for 10^4 variants on 2 cores: %s on this run", s2[0] <= 10 ? "met"
                    : "NOT met"));
            line(String.format(Locale.ROOT, "projection, not a measurement: with both cores free the 2-thread run would take"
                    + " about its process CPU / 2 = %.2f s (GC and JIT threads included in the CPU time)", s2[1] / 2));
            boolean identical = true;
            for (int m = 0; m < model.metricCount(); m++) {
                identical &= Arrays.equals(r1.metricValues(m), r2.metricValues(m));
            }
            line("1-core and 2-core results bit-identical: " + identical);

            line("");
            line("## result (µm)");
            for (MetricSummary s : r2.summaries()) {
                line(String.format(Locale.ROOT, "%-16s mean %8.3f  σ %7.3f  min %8.3f  p1 %8.3f  p5 %8.3f  p50 %8.3f  p95 %8.3f"
                        + "  p99 %8.3f  max %8.3f", s.metric().name(), s.mean() * 1e6, s.standardDeviation() * 1e6,
                        s.min() * 1e6, s.p01() * 1e6, s.p05() * 1e6, s.p50() * 1e6, s.p95() * 1e6, s.p99() * 1e6,
                        s.max() * 1e6));
            }
            int g = model.metricIndex(CircleTestVariantModel.CIRCULAR_DEVIATION);
            YieldEstimate y = r2.yield(g, LimitBound.AT_MOST, G_LIMIT);
            line(String.format(Locale.ROOT, "yield G ≤ %.0f µm: %.4f ± %.4f (binomial SE), %d of %d", G_LIMIT * 1e6,
                    y.fraction(), y.standardError(), y.passCount(), y.sampleCount()));
            line("worst 5 variants on G (index: Kv_x, Kv_y 1/s, T_x, T_y ms → G µm):");
            for (WorstVariant w : r2.worst(g, 5, LimitBound.AT_MOST)) {
                double[] p = w.parameters();
                line(String.format(Locale.ROOT, "  %5d: %.3f, %.3f, %.4f, %.4f → %.3f", w.index(), p[0], p[1], p[2] * 1e3,
                        p[3] * 1e3, w.value() * 1e6));
            }
            // cross-check against the closed form G ≈ F·|1/Kx − 1/Ky| (DOMAIN.md §4, from memory)
            double worstAbsolute = 0;
            double worstRelative = 0;
            for (int v = 0; v < VARIANTS; v++) {
                double formula = FEED * Math.abs(1 / r2.parameter(v, 0) - 1 / r2.parameter(v, 1));
                double deviation = Math.abs(r2.metric(g, v) - formula);
                worstAbsolute = Math.max(worstAbsolute, deviation);
                if (formula > 1e-6) {
                    worstRelative = Math.max(worstRelative, deviation / formula);
                }
            }
            line(String.format(Locale.ROOT, "closed form G ≈ F·|1/Kx − 1/Ky|: largest deviation %.3f µm; largest relative"
                    + " deviation where the formula exceeds 1 µm: %.4f", worstAbsolute * 1e6, worstRelative));
        } finally {
            one.shutdown();
            two.shutdown();
        }
        loadAverage("end");
        Path parent = out.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Files.write(out, lines, StandardCharsets.UTF_8);
        System.out.println("results written to " + out.toAbsolutePath());
    }

    /** Wall-clock seconds in seconds[0], CPU seconds of this process (all threads) in seconds[1]. */
    private static MonteCarloResult timed(CircleTestVariantModel model, MonteCarloPlan plan, ForkJoinPool pool,
                                          double[] seconds) {
        com.sun.management.OperatingSystemMXBean os = (com.sun.management.OperatingSystemMXBean)
                java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        long cpu0 = os.getProcessCpuTime();
        long t0 = System.nanoTime();
        MonteCarloResult r = MonteCarloRunner.run(model, plan, RunControl.on(pool));
        seconds[0] = (System.nanoTime() - t0) / 1e9;
        seconds[1] = (os.getProcessCpuTime() - cpu0) / 1e9;
        if (r.completedCount() != plan.variantCount()) {
            throw new IllegalStateException("run ended after " + r.completedCount() + " of " + plan.variantCount());
        }
        return r;
    }

    /** Records the system load, since other work on the machine slows and spreads the timings. */
    private void loadAverage(String when) throws IOException {
        Path loadavg = Path.of("/proc/loadavg");
        if (Files.isReadable(loadavg)) {
            line("load average " + when + " (1/5/15 min): "
                    + String.join(" ", Arrays.copyOf(Files.readString(loadavg).trim().split("\\s+"), 3)));
        }
    }

    private void line(String text) {
        lines.add(text);
        System.out.println(text);
    }
}
