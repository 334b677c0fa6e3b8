package org.tracewell.engine.measured;

import java.util.List;

/**
 * ISO 230-2 evaluation of one axis's positioning runs.
 *
 * @param measurement the runs evaluated
 * @param targets     statistics per target position, in increasing target order
 * @param figures     the axis figures A, R, B, E, M and their unidirectional forms
 * @param notes       departures from the standard's test conditions (fewer than 5 targets or approaches)
 */
public record PositioningEvaluation(PositioningMeasurement measurement, List<TargetStatistics> targets,
        PositioningFigures figures, List<String> notes) {

    public PositioningEvaluation {
        targets = List.copyOf(targets);
        notes = List.copyOf(notes);
    }
}
