package org.tracewell.core.mapping;

import java.util.List;
import java.util.Optional;

/**
 * Everything the engine needs about one machine: its axes (inline and from library files) and its contours.
 *
 * @param id                  stable id of the machine
 * @param name                machine name
 * @param interpolationPeriod period of the path interpolator, s
 * @param axes                all axes, inline first, then library axes, in model order
 * @param contours            all contours, in model order
 */
public record MachineInputs(String id, String name, double interpolationPeriod, List<MappedAxis> axes,
        List<MappedContour> contours) {

    public MachineInputs {
        axes = List.copyOf(axes);
        contours = List.copyOf(contours);
    }

    /** The axis with this model id. */
    public Optional<MappedAxis> axis(String axisId) {
        return axes.stream().filter(a -> a.id().equals(axisId)).findFirst();
    }

    /** The contour with this model id. */
    public Optional<MappedContour> contour(String contourId) {
        return contours.stream().filter(c -> c.id().equals(contourId)).findFirst();
    }
}
