package org.tracewell.core.analysis;

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

    /** The largest max-contour-error of all runs, m. */
    public double worstMaxContourError() {
        return runs.stream().mapToDouble(r -> r.metrics().maxContourError()).max().orElse(0);
    }
}
