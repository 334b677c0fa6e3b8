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
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorAnalysis;
import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.contour.StreamingContourRun;
import org.tracewell.engine.contour.StreamingContourSummary;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.path.Polyline;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.ContinuousStateSpace;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.FeedProfile;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.engine.trajectory.ProfileShape;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * Timings of the tracking simulation and contour-error evaluation on the LM-3020 circle test
 * (R = 100 mm, F = 3 m/min, XY, CCW, 90° overshoot arcs), at the 1 kHz interpolation rate and at
 * 10⁶ samples; plus the targets: an 8-state closed axis loop over 10⁶ samples and the contour
 * error of 10⁶ samples against a ~200-segment path. When python3 with SciPy is present, the same
 * 8-state system runs through scipy.signal.lsim in this run for a ratio. Finally the circle is
 * streamed (no per-sample arrays) at 10⁶ and 10⁷ samples, with the bytes each run allocates.
 * <p>
 * Usage: {@code ContourBenchmark [results-file]} (default {@code benchmarks/contour-benchmark.txt}).
 */
public final class ContourBenchmark {

    private static final double RADIUS = 0.100;
    private static final double FEED = 3.0 / 60;
    /** LM-3020 X/Y: Kv = 2.5 (m/min)/mm, velocity loop lag 4 ms (invented demo values). */
    private static final double KV = 2.5 * 1000 / 60;
    private static final double VELOCITY_LAG = 4e-3;

    private final List<String> lines = new ArrayList<>();

    private ContourBenchmark() {
    }

    public static void main(String[] args) throws IOException, InterruptedException {
        Path out = Path.of(args.length > 0 ? args[0] : "benchmarks/contour-benchmark.txt");
        new ContourBenchmark().run(out);
    }

    private void run(Path out) throws IOException, InterruptedException {
        line("# Tracewell contour benchmark (org.tracewell.engine.bench.ContourBenchmark)");
        line("date: " + ZonedDateTime.now().format(DateTimeFormatter.ISO_OFFSET_DATE_TIME));
        line("java: " + System.getProperty("java.vm.name") + " " + System.getProperty("java.version")
                + ", processors: " + Runtime.getRuntime().availableProcessors() + ", max heap: "
                + Runtime.getRuntime().maxMemory() / (1 << 20) + " MiB, os: " + System.getProperty("os.name") + " "
                + System.getProperty("os.arch"));
        loadAverage("start");
        line("timings in ms: median and min over the measured repetitions, after warm-up repetitions");
        line("");
        circle("circle R=100 mm F=3 m/min, T=1 ms", 1e-3, 5, 41);
        double duration = plan(1e-3).profile().duration();
        circle("circle R=100 mm F=3 m/min, 10^6 samples", duration / (1_000_000 - 1), 3, 11);
        eightState();
        contourAgainst200Segments();
        streaming();
        loadAverage("end");
        Path parent = out.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Files.write(out, lines, StandardCharsets.UTF_8);
        System.out.println("results written to " + out.toAbsolutePath());
    }

    private static CircleTestSetup setup() {
        return new CircleTestSetup(ContourPlane.xy(), new Point2(0.5, 0.3), RADIUS, FEED, ArcDirection.CCW, 0, Math.PI / 2);
    }

    private static Trajectory plan(double dt) {
        org.tracewell.engine.path.Path path = setup().path();
        List<AxisLimits> axes = List.of(new AxisLimits(1.0, 3.0, 300.0), new AxisLimits(1.0, 3.0, 300.0));
        FeedProfile profile = FeedPlanner.plan(path, PathLimits.of(FEED, 2.0, 100.0), axes, ProfileShape.S_CURVE);
        return Trajectory.sample(path, profile, dt);
    }

    private void circle(String title, double dt, int warmup, int reps) {
        List<AxisLoop> loops = List.of(AxisLoop.withVelocityLag("X", KV, VELOCITY_LAG, 0, 0),
                AxisLoop.withVelocityLag("Y", KV, VELOCITY_LAG, 0, 0));
        Trajectory ref = plan(dt);
        TrackingResult tracking = TrackingSimulator.simulate(ref, loops);
        ContourErrorResult contour = ContourErrorAnalysis.analyse(tracking);
        CircleTestResult circle = CircleTest.evaluate(setup(), tracking);
        line("## " + title);
        line(String.format(Locale.ROOT, "samples: %d, sample period %.6g s, 2 axes (2-state loops Kv=%.2f 1/s, T=%.0f ms)",
                ref.sampleCount(), dt, KV, VELOCITY_LAG * 1e3));
        double w = FEED / RADIUS;
        // exact steady-state radius change of Kv/(s(Ts+1)) closed: R·(|Kv/(Kv − Tω² + jω)| − 1) [der]
        double exactDr = RADIUS * (KV / Math.hypot(KV - VELOCITY_LAG * w * w, w) - 1);
        line(String.format(Locale.ROOT, "result: max contour error %.3f um, G %.4f um, F min %.3f um; exact steady-state dR %.3f um",
                contour.maxAbsError() * 1e6, circle.circularDeviation() * 1e6, circle.radialDeviationMin() * 1e6,
                exactDr * 1e6));
        time("plan + sample trajectory", warmup, reps, () -> plan(dt));
        time("simulate 2 axes (incl. ZOH discretisation)", warmup, reps, () -> TrackingSimulator.simulate(ref, loops));
        time("contour error (monotone exact search)", warmup, reps, () -> ContourErrorAnalysis.analyse(tracking));
        time("circle test (select, LSQ fit, G, F, ellipse)", warmup, reps, () -> CircleTest.evaluate(setup(), tracking));
        time("total: plan + simulate + contour error", warmup, reps, () -> {
            TrackingResult t = TrackingSimulator.simulate(plan(dt), loops);
            return ContourErrorAnalysis.analyse(t);
        });
        line("");
    }

    /** SISO block x' = A x + B u, y = C x; series composition below. */
    private record Block(double[][] a, double[] b, double[] c) {
    }

    private static Block secondOrder(double w, double zeta) {
        return new Block(new double[][] {{0, 1}, {-w * w, -2 * zeta * w}}, new double[] {0, w * w}, new double[] {1, 0});
    }

    private static Block firstOrder(double tau) {
        return new Block(new double[][] {{-1 / tau}}, new double[] {1 / tau}, new double[] {1});
    }

    private static Block series(Block first, Block second) {
        int n1 = first.b.length;
        int n2 = second.b.length;
        double[][] a = new double[n1 + n2][n1 + n2];
        double[] b = new double[n1 + n2];
        double[] c = new double[n1 + n2];
        for (int i = 0; i < n1; i++) {
            System.arraycopy(first.a[i], 0, a[i], 0, n1);
            b[i] = first.b[i];
        }
        for (int i = 0; i < n2; i++) {
            System.arraycopy(second.a[i], 0, a[n1 + i], n1, n2);
            for (int j = 0; j < n1; j++) {
                a[n1 + i][j] = second.b[i] * first.c[j];
            }
            c[n1 + i] = second.c[i];
        }
        return new Block(a, b, c);
    }

    /** Velocity command → position: 2nd-order command filter, current lag, 2nd-order velocity loop, encoder lag, integrator. */
    static ContinuousStateSpace eightStatePlant() {
        Block chain = series(secondOrder(2 * Math.PI * 400, 0.7), firstOrder(0.5e-3));
        chain = series(chain, secondOrder(2 * Math.PI * 60, 0.7));
        chain = series(chain, firstOrder(0.3e-3));
        chain = series(chain, firstOrder(0.2e-3));
        chain = series(chain, new Block(new double[][] {{0}}, new double[] {1}, new double[] {1}));
        double[][] b = new double[chain.b.length][1];
        for (int i = 0; i < b.length; i++) {
            b[i][0] = chain.b[i];
        }
        return new ContinuousStateSpace(chain.a, b, chain.c, new double[] {0});
    }

    private void eightState() throws IOException, InterruptedException {
        ContinuousStateSpace plant = eightStatePlant();
        double kv = 40;
        List<AxisLoop> loops = List.of(AxisLoop.closePositionLoop("X", plant, kv, 0, 0, 0),
                AxisLoop.closePositionLoop("Y", plant, kv, 0, 0, 0));
        double duration = plan(1e-3).profile().duration();
        double dt = duration / (1_000_000 - 1);
        Trajectory ref = plan(dt);
        TrackingResult tracking = TrackingSimulator.simulate(ref, loops);
        line("## 8-state closed axis loop, 10^6 samples");
        line(String.format(Locale.ROOT, "samples: %d, %d states per axis, Kv=%.0f 1/s; peak following error X %.3f um",
                ref.sampleCount(), loops.get(0).stateCount(), kv, tracking.peakFollowingError(0) * 1e6));
        double[] javaMs = time("simulate 2 axes (incl. ZOH discretisation)", 5, 15,
                () -> TrackingSimulator.simulate(ref, loops));
        line(String.format(Locale.ROOT, "per axis (target <= 50 ms): median %.3f ms, min %.3f ms", javaMs[0] / 2,
                javaMs[1] / 2));
        // With feedforward the velocity and acceleration inputs drive the loop too: the full three-input kernel.
        List<AxisLoop> fed = List.of(AxisLoop.closePositionLoop("X", plant, kv, 1.0, 0.5, 0),
                AxisLoop.closePositionLoop("Y", plant, kv, 1.0, 0.5, 0));
        double[] fedMs = time("simulate 2 axes, velocity/acceleration FF 1.0/0.5", 5, 15,
                () -> TrackingSimulator.simulate(ref, fed));
        line(String.format(Locale.ROOT, "per axis with feedforward: median %.3f ms, min %.3f ms", fedMs[0] / 2,
                fedMs[1] / 2));
        scipy(loops.get(0).system(), ref, tracking, javaMs[0]);
        line("");
    }

    /** Runs the same closed loop through scipy.signal.lsim (reference position input) for a ratio. */
    private void scipy(ContinuousStateSpace sys, Trajectory ref, TrackingResult tracking, double javaMedianMs)
            throws IOException, InterruptedException {
        Path dir = Files.createTempDirectory("tracewell-bench");
        Path input = dir.resolve("ref.bin");
        int n = ref.sampleCount();
        java.nio.ByteBuffer buf = java.nio.ByteBuffer.allocate(2 * n * 8).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        for (int axis = 0; axis < 2; axis++) {
            for (int k = 0; k < n; k++) {
                buf.putDouble(ref.position(axis, k));
            }
        }
        Files.write(input, buf.array());
        StringBuilder a = new StringBuilder("[");
        StringBuilder b = new StringBuilder("[");
        StringBuilder c = new StringBuilder("[");
        for (int i = 0; i < sys.stateCount(); i++) {
            a.append(Arrays.toString(sys.a()[i])).append(',');
            b.append('[').append(sys.b(i, 0)).append("],");
            c.append(sys.c(i)).append(',');
        }
        a.append(']');
        b.append(']');
        c.append(']');
        String script = String.join("\n",
                "import sys, time, numpy as np",
                "from scipy import signal",
                "A=np.array(" + a + "); B=np.array(" + b + "); C=np.array([" + c + "]); D=np.zeros((1,1))",
                "n=" + n + "; T=" + ref.samplePeriod(),
                "r=np.fromfile(sys.argv[1], dtype='<f8').reshape(2, n)",
                "t=np.arange(n)*T",
                "x0=[np.linalg.solve(A, -B[:,0]*r[ax,0]) for ax in range(2)]",
                "runs=[]; ys=None",
                "for rep in range(4):",
                "    t0=time.perf_counter()",
                "    ys=[signal.lsim((A,B,C,D), r[ax], t, X0=x0[ax], interp=False)[1] for ax in range(2)]",
                "    runs.append(time.perf_counter()-t0)",
                "runs=sorted(runs[1:])",
                "print('%.3f %.3f %.17g %.17g' % (1e3*runs[len(runs)//2], 1e3*runs[0], ys[0][n//2], ys[1][n//2]))");
        Path scriptFile = dir.resolve("lsim.py");
        Files.writeString(scriptFile, script);
        ProcessBuilder pb = new ProcessBuilder("python3", scriptFile.toString(), input.toString()).redirectErrorStream(true);
        String output;
        int exit;
        try {
            Process p = pb.start();
            output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).trim();
            exit = p.waitFor(600, TimeUnit.SECONDS) ? p.exitValue() : -1;
        } catch (IOException e) {
            line("scipy.signal.lsim: not run (" + e.getMessage() + ")");
            return;
        } finally {
            Files.deleteIfExists(input);
            Files.deleteIfExists(scriptFile);
            Files.deleteIfExists(dir);
        }
        String[] parts = output.split("\\s+");
        if (exit != 0 || parts.length != 4) {
            line("scipy.signal.lsim: not run (python3/scipy unavailable or failed: " + output.lines().reduce((x, y) -> y).orElse("")
                    + ")");
            return;
        }
        double median = Double.parseDouble(parts[0]);
        double min = Double.parseDouble(parts[1]);
        double midY = Double.parseDouble(parts[2]);
        int mid = ref.sampleCount() / 2;
        line(String.format(Locale.ROOT, "scipy.signal.lsim (interp=False, i.e. ZOH; 2 axes; 3 runs after 1 warm-up): median %.1f ms,"
                + " min %.1f ms; ratio scipy/Tracewell (medians) %.1f", median, min, median / javaMedianMs));
        line(String.format(Locale.ROOT, "agreement at the middle sample, X: |y_scipy - y_tracewell| = %.3g m",
                Math.abs(midY - tracking.actual(0, mid))));
    }

    private void contourAgainst200Segments() {
        List<Point2> pts = new ArrayList<>();
        for (int i = 0; i < 102; i++) {
            pts.add(new Point2(0.004 * i, (i % 2) * 0.01 + 0.00002 * i * i));
        }
        org.tracewell.engine.path.Path path = Polyline.blended(ContourPlane.xy(), pts, 50e-6);
        List<AxisLimits> axes = List.of(new AxisLimits(1.0, 5.0, 500.0), new AxisLimits(1.0, 5.0, 500.0));
        FeedProfile profile = FeedPlanner.plan(path, PathLimits.of(10.0 / 60, 3.0, 300.0), axes, ProfileShape.S_CURVE);
        double dt = profile.duration() / (1_000_000 - 1);
        Trajectory ref = Trajectory.sample(path, profile, dt);
        TrackingResult tracking = TrackingSimulator.simulate(ref, List.of(AxisLoop.withVelocityLag("X", KV, VELOCITY_LAG, 0, 0),
                AxisLoop.withVelocityLag("Y", KV * 0.95, VELOCITY_LAG, 0, 0)));
        ContourErrorResult r = ContourErrorAnalysis.analyse(tracking);
        line("## contour error, 10^6 samples against a " + path.segmentCount() + "-segment blended polyline");
        line(String.format(Locale.ROOT, "samples: %d, path %.3f m, max contour error %.2f um at s = %.4f m, RMS %.2f um",
                ref.sampleCount(), path.length(), r.maxAbsError() * 1e6, r.pathParameterOfMax(), r.rmsError() * 1e6));
        time("contour error (monotone exact search)", 3, 11, () -> ContourErrorAnalysis.analyse(tracking));
        line("");
    }

    /** The circle streamed at 10⁶ and 10⁷ samples: time and bytes allocated by the run. */
    private void streaming() {
        org.tracewell.engine.path.Path path = setup().path();
        List<AxisLimits> axes = List.of(new AxisLimits(1.0, 3.0, 300.0), new AxisLimits(1.0, 3.0, 300.0));
        FeedProfile profile = FeedPlanner.plan(path, PathLimits.of(FEED, 2.0, 100.0), axes, ProfileShape.S_CURVE);
        List<AxisLoop> loops = List.of(AxisLoop.withVelocityLag("X", KV, VELOCITY_LAG, 0, 0),
                AxisLoop.withVelocityLag("Y", KV, VELOCITY_LAG, 0, 0));
        line("## streaming plan + simulate + contour error (StreamingContourRun), circle R=100 mm F=3 m/min");
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) java.lang.management.ManagementFactory
                .getThreadMXBean();
        for (long samples : new long[] {1_000_000L, 10_000_000L}) {
            double dt = profile.duration() / (samples - 1);
            long before = threads.getCurrentThreadAllocatedBytes();
            StreamingContourSummary summary = StreamingContourRun.run(path, profile, dt, loops,
                    ContourErrorAnalysis.DEFAULT_WINDOW);
            long allocated = threads.getCurrentThreadAllocatedBytes() - before;
            line(String.format(Locale.ROOT, "samples: %d, max contour error %.3f um, RMS %.3f um, bytes allocated by one run: %d",
                    summary.sampleCount(), summary.maxAbsContourError() * 1e6, summary.rmsContourError() * 1e6, allocated));
            time("streaming run, " + samples + " samples", 1, samples > 1_000_000L ? 3 : 7,
                    () -> StreamingContourRun.run(path, profile, dt, loops, ContourErrorAnalysis.DEFAULT_WINDOW));
        }
        line("(the stored pipeline holds 7 + 2 + 2 doubles per sample for 2 axes: 88 bytes, 880 MB at 10^7)");
        line("");
    }

    /** Records the system load, since other work on the machine slows and spreads the timings. */
    private void loadAverage(String when) throws IOException {
        Path loadavg = Path.of("/proc/loadavg");
        if (Files.isReadable(loadavg)) {
            line("load average at " + when + " (1/5/15 min): "
                    + String.join(" ", Arrays.copyOf(Files.readString(loadavg).trim().split("\\s+"), 3)));
        }
    }

    private double[] time(String what, int warmup, int reps, Supplier<?> task) {
        Object sink = null;
        for (int i = 0; i < warmup; i++) {
            sink = task.get();
        }
        double[] ms = new double[reps];
        for (int i = 0; i < reps; i++) {
            long t0 = System.nanoTime();
            sink = task.get();
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        if (sink == null) {
            throw new IllegalStateException("benchmark task returned nothing");
        }
        Arrays.sort(ms);
        double median = ms[reps / 2];
        line(String.format(Locale.ROOT, "%-48s median %9.3f ms   min %9.3f ms   (%d reps)", what, median, ms[0], reps));
        return new double[] {median, ms[0]};
    }

    private void line(String text) {
        lines.add(text);
        System.out.println(text);
    }
}
