package org.tracewell.requirements;

import java.util.List;
import java.util.Optional;

/**
 * Every requirement of a machine evaluated, with the trace structure around it.
 *
 * @param machineId       model id of the machine
 * @param results         one per model requirement, model order
 * @param coverage        gaps in the trace
 * @param apportionments  one per machine-level contour requirement with a budget
 * @param derived         inverse-design suggestions, not written to the model
 * @param matrix          the compliance matrix (machine requirements × axes)
 */
public record RequirementReport(String machineId, List<RequirementResult> results, List<CoverageFinding> coverage,
        List<RequirementApportionment> apportionments, List<DerivedRequirement> derived, ComplianceMatrix matrix) {

    public RequirementReport {
        results = List.copyOf(results);
        coverage = List.copyOf(coverage);
        apportionments = List.copyOf(apportionments);
        derived = List.copyOf(derived);
    }

    public Optional<RequirementResult> result(String id) {
        return results.stream().filter(r -> r.id().equals(id)).findFirst();
    }

    /** The worst status over all requirements (MET when there are none). */
    public RequirementStatus overallStatus() {
        return results.stream().map(RequirementResult::status).reduce(RequirementStatus.MET, RequirementStatus::worse);
    }

    public boolean anyViolated() {
        return results.stream().anyMatch(r -> r.status() == RequirementStatus.VIOLATED);
    }

    /** Machine-level requirements (no parent), model order. */
    public List<RequirementResult> machineLevel() {
        return results.stream().filter(RequirementResult::machineLevel).toList();
    }

    /** The requirements derived directly from {@code id}. */
    public List<RequirementResult> children(String id) {
        return result(id).map(r -> r.childIds().stream().map(this::result).flatMap(Optional::stream).toList())
                .orElse(List.of());
    }
}
