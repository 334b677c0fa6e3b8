package org.tracewell.core.mapping;

import java.util.List;
import java.util.Optional;

import org.tracewell.engine.axis.AxisModel;
import org.tracewell.engine.trajectory.AxisLimits;

/**
 * Engine inputs of one axis, carrying the axis's identity so results can be traced back to the model.
 *
 * @param id             stable id of the model axis
 * @param name           axis name (X, Y, Z, A, C, X2…)
 * @param rotary         true for a rotary axis (positions in radians)
 * @param model          plant, cascade controller and sensor for loop analysis and simulation
 * @param limits         velocity, acceleration and jerk limits, SI
 * @param gantryPartner  id of the other motor of a gantry pair
 * @param notes          simplifications made while mapping (e.g. a compliance the engine model treats as rigid)
 * @param positionResolution encoder step seen at the load, m (rad for a rotary axis); 0 when the model gives none
 */
public record MappedAxis(String id, String name, boolean rotary, AxisModel model, AxisLimits limits,
        Optional<String> gantryPartner, List<String> notes, double positionResolution) {

    public MappedAxis {
        notes = List.copyOf(notes);
        if (!(positionResolution >= 0) || Double.isInfinite(positionResolution)) {
            throw new IllegalArgumentException("position resolution of axis " + name + " must be finite and >= 0 m,"
                    + " got " + positionResolution);
        }
    }

    /** Without an encoder resolution (0 = unknown). */
    public MappedAxis(String id, String name, boolean rotary, AxisModel model, AxisLimits limits,
            Optional<String> gantryPartner, List<String> notes) {
        this(id, name, rotary, model, limits, gantryPartner, notes, 0.0);
    }
}
