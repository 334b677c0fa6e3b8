package org.tracewell.requirements;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * One requirement evaluated against a machine analysis. Values, limits and margins are SI (the unit of the kind:
 * m, rad, ratio, Hz, s, 1/s — see {@link #siUnit()}); {@link DisplayUnits} converts them to the display unit.
 *
 * @param id                 model id
 * @param statement          the requirement's text
 * @param kind               model literal: contourDeviation, followingError, phaseMargin, gainMargin, bandwidth,
 *                           settlingTime, steadyStateError, positionGain
 * @param metric             for contour deviations: maxNormalDeviation, circularDeviation, radialDeviation; else ""
 * @param bound              "atMost" or "atLeast"
 * @param limit              the limit, SI
 * @param siUnit             SI unit of value/limit/margin: "m", "rad", "1", "Hz", "s", "1/s"
 * @param displayUnit        unit the model shows the limit in (µm, deg, dB, (m/min)/mm …)
 * @param value              the governing computed value (worst over the verifying results), SI; empty when not
 *                           evaluated
 * @param margin             signed distance to the limit, SI, positive = met with room (atMost: limit − value,
 *                           atLeast: value − limit); empty when not evaluated
 * @param marginPercent      100·margin/|limit|; empty when not evaluated or the limit is 0
 * @param status             met, violated or not evaluated
 * @param notEvaluatedReason why it could not be evaluated; empty otherwise
 * @param parentId           the requirement it is derived from
 * @param childIds           requirements derived from it, model order
 * @param allocatedAxisId    model id of the allocated axis
 * @param allocatedAxisName  its name
 * @param verifiedBy         the computed results that verify it (the governing one first)
 * @param rationale          the model's rationale text
 * @param machineLevel       true when it has no parent
 */
public record RequirementResult(String id, String statement, String kind, String metric, String bound, double limit,
        String siUnit, String displayUnit, OptionalDouble value, OptionalDouble margin, OptionalDouble marginPercent,
        RequirementStatus status, Optional<String> notEvaluatedReason, Optional<String> parentId,
        List<String> childIds, Optional<String> allocatedAxisId, Optional<String> allocatedAxisName,
        List<Verification> verifiedBy, String rationale, boolean machineLevel) {

    public RequirementResult {
        childIds = List.copyOf(childIds);
        verifiedBy = List.copyOf(verifiedBy);
    }

    /** Value in the display unit; empty when not evaluated. */
    public OptionalDouble displayValue() {
        return value.isPresent() ? OptionalDouble.of(DisplayUnits.fromSi(value.getAsDouble(), siUnit, displayUnit))
                : OptionalDouble.empty();
    }

    /** Limit in the display unit. */
    public double displayLimit() {
        return DisplayUnits.fromSi(limit, siUnit, displayUnit);
    }

    /** Margin in the display unit (a difference of display values, so dB margins are in dB). */
    public OptionalDouble displayMargin() {
        if (value.isEmpty()) {
            return OptionalDouble.empty();
        }
        double v = displayValue().getAsDouble();
        double l = displayLimit();
        return OptionalDouble.of("atLeast".equals(bound) ? v - l : l - v);
    }

    /** The governing verification, if any. */
    public Optional<Verification> governing() {
        return verifiedBy.isEmpty() ? Optional.empty() : Optional.of(verifiedBy.get(0));
    }
}
