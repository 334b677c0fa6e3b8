package org.tracewell.core.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tracewell.engine.contour.BidirectionalCircleResult;

/**
 * Everything computed for one contour.
 *
 * @param contourId     model id of the contour
 * @param contourName   contour name
 * @param firstAxisId   model id of the axis along the path's u
 * @param secondAxisId  model id of the axis along v
 * @param firstAxisName its name
 * @param secondAxisName its name
 * @param feed          programmed feed, m/s
 * @param samplePeriod  period of the sampled reference, s (from the model)
 * @param fullCircle    true when the contour is one full circle (circle test in both directions)
 * @param programmedDirection CW or CCW for a full circle, PROGRAMMED otherwise
 * @param radius        circle radius, m; 0 unless a full circle
 * @param runs          the programmed run first, then (full circles) the reversed one
 * @param bidirectional CW and CCW circle tests and G(b); empty unless a full circle
 * @param estimate      analytic estimates beside the simulated figures
 * @param notes         simplifications made while mapping or simulating
 */
public record ContourResult(String contourId, String contourName, String firstAxisId, String secondAxisId,
        String firstAxisName, String secondAxisName, double feed, double samplePeriod, boolean fullCircle,
        RunDirection programmedDirection, double radius, List<ContourRun> runs,
        Optional<BidirectionalCircleResult> bidirectional, ContourEstimate estimate, List<String> notes) {

    public ContourResult {
        runs = List.copyOf(runs);
        notes = List.copyOf(notes);
    }

    /** The run as the model programs it. */
    public ContourRun programmedRun() {
        return runs.get(0);
    }

    /** The run in {@code direction}, if simulated. */
    public Optional<ContourRun> run(RunDirection direction) {
        return runs.stream().filter(r -> r.direction() == direction).findFirst();
    }

    /**
     * Every simulated figure that has a closed-form counterpart, beside it: peak following errors (v/Kv), and per
     * run the radius loss and G of a circle, the error of a straight line from Kv mismatch, the corner error.
     */
    public List<EstimateCheck> estimateChecks() {
        List<EstimateCheck> checks = new ArrayList<>();
        ContourRunMetrics programmed = programmedRun().metrics();
        checks.add(new EstimateCheck("peak following error " + firstAxisName, programmed.peakFollowingErrorFirst(),
                estimate.followingErrorFirst(), "v/Kv"));
        checks.add(new EstimateCheck("peak following error " + secondAxisName, programmed.peakFollowingErrorSecond(),
                estimate.followingErrorSecond(), "v/Kv"));
        for (ContourRun run : runs) {
            String label = run.direction().label();
            if (run.circleTest().isPresent()) {
                double loss = radius - run.circleTest().get().leastSquaresCircle().radius();
                estimate.radiusLossExact().ifPresent(e -> checks.add(new EstimateCheck("radius loss " + label, loss,
                        e, "R(1 − 1/√(1+(ω/Kv)²))")));
                estimate.radiusLossApprox().ifPresent(e -> checks.add(new EstimateCheck("radius loss " + label, loss,
                        e, "F²/(2R·Kv²)")));
                estimate.circularDeviationMismatch().ifPresent(e -> checks.add(new EstimateCheck(
                        "circular deviation G " + label, run.circleTest().get().circularDeviation(), e,
                        "F·|1/Kx − 1/Ky|")));
            } else {
                double max = run.metrics().maxContourError();
                estimate.lineMismatchError().ifPresent(e -> checks.add(new EstimateCheck(
                        "max contour error " + label + " (line, Kv mismatch)", max, e, "(V/2)·sin2θ·|1/Kx − 1/Ky|")));
                estimate.cornerError().ifPresent(e -> checks.add(new EstimateCheck(
                        "max contour error " + label + " (corner)", max, e, "V/(e·Kv)")));
            }
        }
        return List.copyOf(checks);
    }

    /** The largest max-contour-error of all runs, m. */
    public double worstMaxContourError() {
        return runs.stream().mapToDouble(r -> r.metrics().maxContourError()).max().orElse(0);
    }
}
