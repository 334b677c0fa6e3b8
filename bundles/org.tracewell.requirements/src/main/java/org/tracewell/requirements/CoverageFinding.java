package org.tracewell.requirements;

/**
 * A gap in the trace.
 *
 * @param kind          what is missing
 * @param requirementId the requirement concerned
 * @param message       one sentence naming the requirement and what would close the gap
 */
public record CoverageFinding(Kind kind, String requirementId, String message) {

    public enum Kind {
        /** A machine-level requirement with no derived (allocated) requirement. */
        MACHINE_REQUIREMENT_WITHOUT_ALLOCATION,
        /** A requirement no computed result verifies. */
        ALLOCATION_WITHOUT_VERIFICATION,
        /** A derived requirement whose parent is not in the machine, or a requirement with no parent, no children
         * and no verification. */
        ORPHAN
    }
}
