package org.tracewell.core.analysis;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import java.util.function.Supplier;

import org.tracewell.core.mapping.MachineInputs;
import org.tracewell.core.mapping.MappedAxis;
import org.tracewell.core.mapping.MappedContour;
import org.tracewell.engine.axis.AxisDynamics;
import org.tracewell.engine.contour.BidirectionalCircleResult;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorAnalysis;
import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.contour.ContourEstimates;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ArcSegment;
import org.tracewell.engine.path.LineSegment;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Segment;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.FeedProfile;
import org.tracewell.engine.trajectory.ProfileShape;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * Runs every analysis a machine asks for: each axis's loops, then each contour tracked by the linear closed loops of
 * the two axes of its plane, full circles in both directions with the ISO 230-4 figures. Axes run in parallel, then
 * contour runs in parallel; the result is a pure function of the inputs (sample periods come from the model, every
 * sample is kept).
 */
public final class MachineAnalyzer {

    private MachineAnalyzer() {
    }

    /** As {@link #analyze(MachineInputs, List, ProgressListener, CancellationFlag)} for every contour. */
    public static MachineAnalysis analyze(MachineInputs inputs, ProgressListener progress, CancellationFlag cancel) {
        return analyze(inputs, List.of(), progress, cancel);
    }

    /** As {@link #analyze(MachineInputs, List, ProgressListener, CancellationFlag, AnalysisMemo)}, keeping nothing. */
    public static MachineAnalysis analyze(MachineInputs inputs, List<String> contourNames, ProgressListener progress,
            CancellationFlag cancel) {
        return analyze(inputs, contourNames, progress, cancel, AnalysisMemo.none());
    }

    /**
     * @param contourNames names (or ids) of the contours to analyse; empty = all
     * @param memo         where axis analyses and contour runs of equal inputs are found instead of recomputed
     * @throws IllegalArgumentException when a named contour does not exist, or a contour's axis is missing
     * @throws AnalysisCancelledException when {@code cancel} is set while running
     */
    public static MachineAnalysis analyze(MachineInputs inputs, List<String> contourNames, ProgressListener progress,
            CancellationFlag cancel, AnalysisMemo memo) {
        return analyze(inputs, contourNames, progress, cancel, memo, contour -> { });
    }

    /**
     * As {@link #analyze(MachineInputs, List, ProgressListener, CancellationFlag, AnalysisMemo)}, telling
     * {@code contourDone} of each contour's result as soon as its runs are done, before the axes' dynamics and the
     * other contours (a view of one contour need not wait for the whole machine). It is called once per contour, on
     * whichever thread finished the contour's last run, with the very object the analysis returns; it must be quick.
     */
    public static MachineAnalysis analyze(MachineInputs inputs, List<String> contourNames, ProgressListener progress,
            CancellationFlag cancel, AnalysisMemo memo, Consumer<ContourResult> contourDone) {
        List<MappedContour> contours = selectContours(inputs, contourNames);
        int total = inputs.axes().size() + contours.stream().mapToInt(c -> isFullCircle(c.path()) ? 2 : 1).sum();
        AtomicInteger done = new AtomicInteger();

        // Without a memo of the caller's, one for this analysis: a run two contours share is simulated once, and the
        // calling thread and the pool never analyse the same axis twice.
        AnalysisMemo work = memo.keepsNothing()
                ? AnalysisMemo.bounded(inputs.axes().size() + 1, 2 * contours.size() + 1) : memo;

        // The runs need only each axis's closed loop (cheap), not its analysed dynamics: they start at once, in the
        // pool, while the dynamics are analysed alongside.
        Map<String, AxisLoop> loops = new LinkedHashMap<>();
        for (MappedAxis axis : inputs.axes()) {
            loops.put(axis.id(), work.loop(axis.model()));
        }
        List<ContourWork> contourWork = new ArrayList<>();
        for (MappedContour contour : contours) {
            MappedAxis first = axisOf(inputs, contour, contour.firstAxisId());
            MappedAxis second = axisOf(inputs, contour, contour.secondAxisId());
            AxisLoop firstLoop = loops.get(first.id());
            AxisLoop secondLoop = loops.get(second.id());
            Optional<CircleTestSetup> setup = circleSetup(contour);
            List<CompletableFuture<ContourRun>> runs = new ArrayList<>();
            if (setup.isPresent()) {
                CircleTestSetup programmed = setup.get();
                for (CircleTestSetup s : List.of(programmed, programmed.reversed())) {
                    runs.add(async(() -> runCircle(contour, s, first, second, firstLoop, secondLoop, progress, done,
                            total, cancel, work)));
                }
            } else {
                runs.add(async(() -> runProgrammed(contour, first, second, firstLoop, secondLoop, progress, done,
                        total, cancel, work)));
            }
            contourWork.add(new ContourWork(contour, first, second, setup, runs));
        }
        // Each contour's result as soon as its runs are done: it needs only the runs and each axis's Kv.
        List<CompletableFuture<ContourResult>> contourResults = new ArrayList<>();
        SharedBidirectional shared = new SharedBidirectional();
        for (ContourWork w : contourWork) {
            CompletableFuture<ContourResult> result = CompletableFuture.allOf(w.runs().toArray(CompletableFuture[]::new))
                    .thenApply(allDone -> {
                        // a superseded analysis fits no G(b)
                        cancel.throwIfCancelled("contour '" + w.contour().name() + "'");
                        return contourResult(w, w.runs().stream().map(CompletableFuture::join).toList(), shared);
                    });
            result.thenAccept(contourDone);
            contourResults.add(result);
        }

        // Axis dynamics: queued behind the runs, last axis first, while this thread works from the first axis; the
        // memo hands each axis to whichever gets there first (on two cores: runs in the pool, dynamics here).
        Map<String, CompletableFuture<AxisDynamics>> queued = new LinkedHashMap<>();
        List<MappedAxis> reversed = new ArrayList<>(inputs.axes());
        java.util.Collections.reverse(reversed);
        for (MappedAxis axis : reversed) {
            queued.put(axis.id(), async(() -> dynamics(axis, work, cancel, progress, done, total)));
        }
        Map<String, AxisDynamics> dynamics = new LinkedHashMap<>();
        for (MappedAxis axis : inputs.axes()) {
            dynamics.put(axis.id(), dynamics(axis, work, cancel, progress, null, total));
        }
        for (CompletableFuture<AxisDynamics> q : queued.values()) {
            join(q);
        }

        List<ContourResult> contoursDone = contourResults.stream().map(MachineAnalyzer::join).toList();

        List<AxisResult> axisResults = new ArrayList<>();
        for (MappedAxis axis : inputs.axes()) {
            axisResults.add(axisResult(axis, dynamics.get(axis.id()), contoursDone));
        }
        List<String> notes = new ArrayList<>();
        notes.add("contours are simulated with the linear closed loop of each axis (friction, saturation and"
                + " quantisation not in the tracking simulation; see the budget lines for them)");
        notes.add("following error at a contour feed: v/Kv_eff at the largest axis velocity of the planned contour");
        return new MachineAnalysis(inputs.id(), inputs.name(), inputs.interpolationPeriod(), axisResults,
                contoursDone, notes);
    }

    // ------------------------------------------------------------------------------------------------ contours

    private static List<MappedContour> selectContours(MachineInputs inputs, List<String> names) {
        if (names.isEmpty()) {
            return inputs.contours();
        }
        List<MappedContour> selected = new ArrayList<>();
        for (String name : names) {
            MappedContour found = inputs.contours().stream()
                    .filter(c -> c.name().equals(name) || c.id().equals(name)).findFirst()
                    .orElseThrow(() -> new IllegalArgumentException("machine " + inputs.name() + " has no contour '"
                            + name + "'; its contours are " + inputs.contours().stream()
                                    .map(c -> "'" + c.name() + "'").toList()));
            if (!selected.contains(found)) {
                selected.add(found);
            }
        }
        return selected;
    }

    private static MappedAxis axisOf(MachineInputs inputs, MappedContour contour, String axisId) {
        return inputs.axis(axisId).orElseThrow(() -> new IllegalArgumentException("contour '" + contour.name()
                + "' names axis " + axisId + ", which the machine " + inputs.name() + " does not have"));
    }

    static boolean isFullCircle(Path path) {
        return path.segmentCount() == 1 && path.segment(0) instanceof ArcSegment arc && arc.isFullCircle();
    }

    /** Time at full feed added to each overshoot arc so the loops have settled (several 1/Kv at Kv ≥ 10/s). */
    static final double OVERSHOOT_SETTLING_TIME = 0.5;

    /**
     * A full-circle contour as an ISO 230-4 set-up: overshoot arcs in and out, each long enough to reach the feed
     * (v²/a + v·a/j, generous for an S-curve) and settle for {@link #OVERSHOOT_SETTLING_TIME}, at most a quarter
     * turn, so the evaluated 360° shows the steady circle and not the start from rest.
     */
    public static Optional<CircleTestSetup> circleSetup(MappedContour contour) {
        if (!isFullCircle(contour.path())) {
            return Optional.empty();
        }
        ArcSegment arc = (ArcSegment) contour.path().segment(0);
        double feed = contour.limits().feed();
        double accel = contour.limits().acceleration();
        double jerk = contour.limits().jerk();
        double ramp = feed * feed / accel + (Double.isFinite(jerk) ? feed * accel / jerk : 0.0);
        double overshoot = Math.min(Math.PI / 2, (ramp + feed * OVERSHOOT_SETTLING_TIME) / arc.radius());
        return Optional.of(new CircleTestSetup(contour.path().plane(), arc.centre(), arc.radius(), feed,
                arc.direction(), arc.startAngle(), overshoot));
    }

    private static ContourRun runCircle(MappedContour contour, CircleTestSetup setup, MappedAxis first,
            MappedAxis second, AxisLoop firstLoop, AxisLoop secondLoop, ProgressListener progress, AtomicInteger done,
            int total, CancellationFlag cancel, AnalysisMemo memo) {
        RunDirection direction = setup.direction() == ArcDirection.CW ? RunDirection.CW : RunDirection.CCW;
        cancel.throwIfCancelled("contour '" + contour.name() + "' " + direction.label());
        ContourRun run = memo.run(AnalysisMemo.RunKey.circle(contour, setup, first, second), () -> {
            Path path = setup.path();
            TrackingResult tracking = track(contour, path, first, second, firstLoop, secondLoop);
            ContourErrorResult error = ContourErrorAnalysis.analyse(tracking, path,
                    ContourErrorAnalysis.DEFAULT_WINDOW);
            CircleTestResult circle = CircleTest.evaluate(setup, tracking);
            return new ContourRun(direction, path, tracking, error, Optional.of(setup), Optional.of(circle),
                    metrics(tracking, error, Optional.of(circle)));
        });
        progress.progress("contour '" + contour.name() + "' " + direction.label(), done.incrementAndGet(), total);
        return run;
    }

    private static ContourRun runProgrammed(MappedContour contour, MappedAxis first, MappedAxis second,
            AxisLoop firstLoop, AxisLoop secondLoop, ProgressListener progress, AtomicInteger done, int total,
            CancellationFlag cancel, AnalysisMemo memo) {
        cancel.throwIfCancelled("contour '" + contour.name() + "'");
        ContourRun run = memo.run(AnalysisMemo.RunKey.programmed(contour, first, second), () -> {
            TrackingResult tracking = track(contour, contour.path(), first, second, firstLoop, secondLoop);
            ContourErrorResult error = ContourErrorAnalysis.analyse(tracking, contour.path(),
                    ContourErrorAnalysis.DEFAULT_WINDOW);
            return new ContourRun(RunDirection.PROGRAMMED, contour.path(), tracking, error, Optional.empty(),
                    Optional.empty(), metrics(tracking, error, Optional.empty()));
        });
        progress.progress("contour '" + contour.name() + "'", done.incrementAndGet(), total);
        return run;
    }

    private static TrackingResult track(MappedContour contour, Path path, MappedAxis first, MappedAxis second,
            AxisLoop firstLoop, AxisLoop secondLoop) {
        return TrackingSimulator.simulate(reference(contour, path, first, second), List.of(firstLoop, secondLoop));
    }

    /**
     * The reference a run of {@code contour} follows along {@code path} (the contour's own path, or a circle-test
     * path with overshoot arcs): feed planned within the path and both axes' limits (S-curve when the path jerk is
     * limited), sampled at the contour's sample period.
     */
    public static Trajectory reference(MappedContour contour, Path path, MappedAxis first, MappedAxis second) {
        List<AxisLimits> axisLimits = List.of(first.limits(), second.limits());
        ProfileShape shape = Double.isFinite(contour.limits().jerk()) ? ProfileShape.S_CURVE : ProfileShape.TRAPEZOIDAL;
        FeedProfile profile = FeedPlanner.plan(path, contour.limits(), axisLimits, shape);
        return Trajectory.sample(path, profile, contour.samplePeriod());
    }

    private static ContourRunMetrics metrics(TrackingResult tracking, ContourErrorResult error,
            Optional<CircleTestResult> circle) {
        int at = error.indexOfMax();
        Trajectory reference = tracking.reference();
        int n = tracking.sampleCount();
        return new ContourRunMetrics(error.maxAbsError(), error.rmsError(), error.signedErrorAtMax(),
                reference.time(at), error.pathParameterOfMax(), tracking.actual(0, at), tracking.actual(1, at),
                tracking.peakFollowingError(0), tracking.peakFollowingError(1),
                optional(circle.map(CircleTestResult::circularDeviation)),
                optional(circle.map(CircleTestResult::radialDeviationMax)),
                optional(circle.map(CircleTestResult::radialDeviationMin)),
                optional(circle.map(CircleTestResult::radialDeviation)),
                optional(circle.map(CircleTestResult::ellipseOrientation)),
                optional(circle.map(CircleTestResult::ellipsePeakToPeak)),
                reference.time(n - 1), n);
    }

    private static ContourResult contourResult(ContourWork work, List<ContourRun> runs, SharedBidirectional shared) {
        MappedContour contour = work.contour();
        Optional<BidirectionalCircleResult> bidirectional = Optional.empty();
        RunDirection programmed = RunDirection.PROGRAMMED;
        double radius = 0;
        if (work.setup().isPresent()) {
            CircleTestSetup setup = work.setup().get();
            programmed = setup.direction() == ArcDirection.CW ? RunDirection.CW : RunDirection.CCW;
            radius = setup.radius();
            ContourRun cw = runs.stream().filter(r -> r.direction() == RunDirection.CW).findFirst().orElseThrow();
            ContourRun ccw = runs.stream().filter(r -> r.direction() == RunDirection.CCW).findFirst().orElseThrow();
            bidirectional = Optional.of(shared.of(cw, ccw));
        }
        List<String> notes = new ArrayList<>(contour.notes());
        if (work.setup().isPresent()) {
            notes.add("circle test with overshoot arcs of " + String.format(java.util.Locale.ROOT, "%.1f",
                    Math.toDegrees(work.setup().get().overshootAngle())) + "° before and after the evaluated 360°"
                    + " (ISO 230-4 set-up), so feed ramps are not evaluated");
        }
        ContourEstimate estimate = estimate(contour, runs.get(0).trajectory(), radius,
                work.first().model().positionLoopKv(), work.second().model().positionLoopKv());
        return new ContourResult(contour.id(), contour.name(), contour.firstAxisId(), contour.secondAxisId(),
                work.first().name(), work.second().name(), contour.limits().feed(), contour.samplePeriod(),
                work.setup().isPresent(), programmed, radius, runs, bidirectional, estimate, notes);
    }

    /**
     * Closed-form values beside the simulation (DOMAIN.md §4) for position gains {@code kx}, {@code ky} (1/s).
     *
     * @param reference the planned reference of the programmed run
     * @param radius    circle radius, m; 0 unless the contour is a full circle
     */
    public static ContourEstimate estimate(MappedContour contour, Trajectory reference, double radius, double kx,
            double ky) {
        double feed = contour.limits().feed();
        double feFirst = ContourEstimates.followingError(reference.peakVelocity(0), kx);
        double feSecond = ContourEstimates.followingError(reference.peakVelocity(1), ky);
        OptionalDouble lossExact = OptionalDouble.empty();
        OptionalDouble lossApprox = OptionalDouble.empty();
        OptionalDouble mismatch = OptionalDouble.empty();
        OptionalDouble line = OptionalDouble.empty();
        OptionalDouble corner = OptionalDouble.empty();
        // The mean lag 1/Kv of both axes stands for "equal loops" in the radius-loss formula.
        double meanKv = 2.0 / (1.0 / kx + 1.0 / ky);
        if (radius > 0) {
            lossExact = OptionalDouble.of(ContourEstimates.circleRadiusLossExact(radius, feed, meanKv));
            lossApprox = OptionalDouble.of(ContourEstimates.circleRadiusLossApprox(radius, feed, meanKv));
            mismatch = OptionalDouble.of(ContourEstimates.circleMismatchDeviation(feed, kx, ky));
        }
        LineSegment longest = null;
        for (Segment segment : contour.path().segments()) {
            if (segment instanceof LineSegment l && (longest == null || l.length() > longest.length())) {
                longest = l;
            }
        }
        if (longest != null) {
            double angle = Math.atan2(longest.to().v() - longest.from().v(), longest.to().u() - longest.from().u());
            line = OptionalDouble.of(Math.abs(ContourEstimates.lineMismatchError(feed, angle, kx, ky)));
        }
        if (!sharpCornerJunctions(contour.path()).isEmpty()) {
            corner = OptionalDouble.of(ContourEstimates.cornerMaxError(feed, Math.min(kx, ky)));
        }
        String basis = "first-order loops Kv/(s+Kv) in steady state: e = v/Kv; circle ΔR = R(1 − 1/√(1+(ω/Kv)²))"
                + " with the mean lag; G ≈ F·|1/Kx − 1/Ky| (Kakino et al. 1993, from memory); line"
                + " ε = (V/2)·sin2θ·(1/Kx − 1/Ky) (Koren 1980, from memory); corner V/(e·Kv) (derived)";
        return new ContourEstimate(kx, ky, feFirst, feSecond, lossExact, lossApprox, mismatch, line, corner, basis);
    }

    /** Interior junctions where the tangent direction jumps (the path corners), as junction indices. */
    static List<Integer> sharpCornerJunctions(Path path) {
        List<Integer> corners = new ArrayList<>();
        for (int j = 0; j + 1 < path.segmentCount(); j++) {
            double s = path.segmentStart(j + 1);
            Segment before = path.segment(j);
            Segment after = path.segment(j + 1);
            double bl = before.length();
            double tu0 = before.tangentUAt(bl);
            double tv0 = before.tangentVAt(bl);
            double tu1 = after.tangentUAt(0);
            double tv1 = after.tangentVAt(0);
            double angle = Math.abs(Math.atan2(tu0 * tv1 - tv0 * tu1, tu0 * tu1 + tv0 * tv1));
            if (angle > Path.TANGENT_TOLERANCE_RAD && s > 0) {
                corners.add(j);
            }
        }
        return corners;
    }

    // ------------------------------------------------------------------------------------------------ axes

    /** The axis's dynamics from the memo; the pool's copy of the request (non-null {@code done}) reports progress. */
    private static AxisDynamics dynamics(MappedAxis axis, AnalysisMemo memo, CancellationFlag cancel,
            ProgressListener progress, AtomicInteger done, int total) {
        cancel.throwIfCancelled("axis " + axis.name());
        AxisDynamics dynamics = memo.dynamics(axis.model());
        if (done != null) {
            progress.progress("axis " + axis.name(), done.incrementAndGet(), total);
        }
        return dynamics;
    }

    private static AxisResult axisResult(MappedAxis axis, AxisDynamics dynamics, List<ContourResult> contours) {
        double vmax = axis.limits().velocity();
        FeedFollowingError atMax = new FeedFollowingError("", "max velocity", vmax, dynamics.followingError(vmax),
                dynamics.followingErrorWithoutFeedforward(vmax));
        List<FeedFollowingError> atFeeds = new ArrayList<>();
        for (ContourResult contour : contours) {
            int index = contour.firstAxisId().equals(axis.id()) ? 0 : contour.secondAxisId().equals(axis.id()) ? 1 : -1;
            if (index < 0) {
                continue;
            }
            double v = contour.programmedRun().trajectory().peakVelocity(index);
            atFeeds.add(new FeedFollowingError(contour.contourId(), contour.contourName(), v,
                    dynamics.followingError(v), dynamics.followingErrorWithoutFeedforward(v)));
        }
        return new AxisResult(axis.id(), axis.name(), axis.rotary(), dynamics, vmax, atMax, atFeeds,
                axis.positionResolution(), axis.gantryPartner(), axis.notes());
    }

    // ------------------------------------------------------------------------------------------------ helpers

    private static OptionalDouble optional(Optional<Double> value) {
        return value.map(OptionalDouble::of).orElse(OptionalDouble.empty());
    }

    private static <T> CompletableFuture<T> async(Supplier<T> task) {
        return CompletableFuture.supplyAsync(task);
    }

    /** Unwraps the task's own exception so callers see what went wrong, not a CompletionException. */
    private static <T> T join(CompletableFuture<T> future) {
        try {
            return future.join();
        } catch (CompletionException failed) {
            Throwable cause = failed.getCause();
            if (cause instanceof RuntimeException runtime) {
                throw runtime;
            }
            if (cause instanceof Error error) {
                throw error;
            }
            throw failed;
        }
    }

    /**
     * G(b) of each CW/CCW pair of runs, fitted once per analysis: a circle programmed CW and the same circle programmed
     * CCW share their two runs (through the memo), and so their bidirectional result.
     */
    private static final class SharedBidirectional {
        private final Map<ContourRun, Map<ContourRun, BidirectionalCircleResult>> byRuns = new IdentityHashMap<>();

        synchronized BidirectionalCircleResult of(ContourRun cw, ContourRun ccw) {
            return byRuns.computeIfAbsent(cw, k -> new IdentityHashMap<>()).computeIfAbsent(ccw,
                    k -> CircleTest.bidirectional(cw.circleSetup().orElseThrow(), cw.tracking(),
                            cw.circleTest().orElseThrow(), ccw.circleSetup().orElseThrow(), ccw.tracking(),
                            ccw.circleTest().orElseThrow()));
        }
    }

    private record ContourWork(MappedContour contour, MappedAxis first, MappedAxis second,
            Optional<CircleTestSetup> setup, List<CompletableFuture<ContourRun>> runs) {
    }
}
