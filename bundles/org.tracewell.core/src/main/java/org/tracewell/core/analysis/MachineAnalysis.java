package org.tracewell.core.analysis;

import java.util.List;
import java.util.Optional;

/**
 * Results of a whole machine analysis: every axis and every contour, in model order.
 *
 * @param machineId           model id of the machine
 * @param machineName         machine name
 * @param interpolationPeriod path interpolator period, s
 * @param axes                one result per axis (inline, then library axes)
 * @param contours            one result per analysed contour
 * @param notes               machine-wide simplifications and assumptions
 */
public record MachineAnalysis(String machineId, String machineName, double interpolationPeriod,
        List<AxisResult> axes, List<ContourResult> contours, List<String> notes) {

    public MachineAnalysis {
        axes = List.copyOf(axes);
        contours = List.copyOf(contours);
        notes = List.copyOf(notes);
    }

    public Optional<AxisResult> axis(String axisId) {
        return axes.stream().filter(a -> a.axisId().equals(axisId)).findFirst();
    }

    public Optional<ContourResult> contour(String contourId) {
        return contours.stream().filter(c -> c.contourId().equals(contourId)).findFirst();
    }
}
