package org.tracewell.core.analysis;

import java.util.List;

/**
 * What the budget of a contour requirement needs of one analysed contour: its identity, its axes, the figures of
 * each run and the closed-form estimates. From a {@link ContourResult}, or from a study's variant.
 *
 * @param contourId      model id of the contour
 * @param contourName    contour name
 * @param firstAxisId    model id of the axis along u
 * @param secondAxisId   model id of the axis along v
 * @param firstAxisName  its name
 * @param secondAxisName its name
 * @param runs           the figures of every run, programmed first
 * @param estimate       closed-form estimates with the Kv of both axes
 */
public record ContourFigures(String contourId, String contourName, String firstAxisId, String secondAxisId,
        String firstAxisName, String secondAxisName, List<RunFigures> runs, ContourEstimate estimate) {

    public ContourFigures {
        runs = List.copyOf(runs);
    }

    public static ContourFigures of(ContourResult c) {
        return new ContourFigures(c.contourId(), c.contourName(), c.firstAxisId(), c.secondAxisId(),
                c.firstAxisName(), c.secondAxisName(), c.runs().stream().map(RunFigures::of).toList(), c.estimate());
    }
}
