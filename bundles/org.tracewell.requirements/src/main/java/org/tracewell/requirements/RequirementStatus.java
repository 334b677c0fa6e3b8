package org.tracewell.requirements;

/** Status of one requirement after an analysis. */
public enum RequirementStatus {
    MET("met"),
    VIOLATED("violated"),
    NOT_EVALUATED("not evaluated");

    private final String label;

    RequirementStatus(String label) {
        this.label = label;
    }

    /** "met", "violated", "not evaluated". */
    public String label() {
        return label;
    }

    /** The worse of two statuses: violated over not evaluated over met. */
    public RequirementStatus worse(RequirementStatus other) {
        return rank() >= other.rank() ? this : other;
    }

    private int rank() {
        return switch (this) {
            case MET -> 0;
            case NOT_EVALUATED -> 1;
            case VIOLATED -> 2;
        };
    }
}
