package org.tracewell.core.analysis;

import java.util.Optional;

import org.tracewell.core.mapping.MappedAxis;

/**
 * What budgets need of an axis besides its loops: its name, its encoder step at the load and its gantry partner.
 *
 * @param axisId             model id
 * @param axisName           axis name
 * @param positionResolution encoder step at the load, m (rad); 0 when the model gives none
 * @param gantryPartnerId    model id of the other motor of a gantry pair
 */
public record AxisFacts(String axisId, String axisName, double positionResolution, Optional<String> gantryPartnerId) {

    public static AxisFacts of(AxisResult a) {
        return new AxisFacts(a.axisId(), a.axisName(), a.positionResolution(), a.gantryPartnerId());
    }

    public static AxisFacts of(MappedAxis a) {
        return new AxisFacts(a.id(), a.name(), a.positionResolution(), a.gantryPartner());
    }
}
