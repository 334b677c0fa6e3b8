package org.tracewell.core.mapping;

import java.util.List;

import org.tracewell.engine.path.Path;
import org.tracewell.engine.trajectory.PathLimits;

/**
 * Engine inputs of one test contour.
 *
 * @param id           stable id of the model contour
 * @param name         contour name
 * @param path         the path in the contour plane (u = first axis, v = second axis), metres
 * @param limits       feed, path acceleration and jerk
 * @param samplePeriod period at which the reference is sampled, s
 * @param firstAxisId  id of the axis along u
 * @param secondAxisId id of the axis along v
 * @param notes        simplifications made while mapping
 */
public record MappedContour(String id, String name, Path path, PathLimits limits, double samplePeriod,
        String firstAxisId, String secondAxisId, List<String> notes) {

    public MappedContour {
        notes = List.copyOf(notes);
    }
}
