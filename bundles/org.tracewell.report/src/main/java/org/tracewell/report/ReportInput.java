package org.tracewell.report;

import java.util.Objects;
import java.util.Optional;

import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.mapping.MachineInputs;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.model.Machine;
import org.tracewell.requirements.ReviewResults;

/**
 * What the report is drawn from: the review results and, when available, the engine inputs of the machine
 * (plant, controller, sensor and limits of each axis, for the machine tables and the exact-dead-time Bode
 * charts) and the machine's description.
 *
 * @param review             analysis, budget, requirements and provenance
 * @param inputs             the mapped machine; empty leaves the parameter columns of the axis table out
 * @param machineDescription free text from the model, may be empty
 * @param author             who prepares the review (the report names them in the header); may be empty
 */
public record ReportInput(ReviewResults review, Optional<MachineInputs> inputs, String machineDescription,
        String author) {

    public ReportInput {
        Objects.requireNonNull(review, "review results");
        Objects.requireNonNull(inputs, "machine inputs (use Optional.empty() when not available)");
        machineDescription = machineDescription == null ? "" : machineDescription;
        author = author == null ? "" : author.strip();
    }

    /** Without an author. */
    public ReportInput(ReviewResults review, Optional<MachineInputs> inputs, String machineDescription) {
        this(review, inputs, machineDescription, "");
    }

    /** The same input, prepared by {@code newAuthor} (empty: no author named). */
    public ReportInput withAuthor(String newAuthor) {
        return new ReportInput(review, inputs, machineDescription, newAuthor);
    }

    /** Results only: the axis table shows what the analysis carries (Kv, limits, resolution). */
    public static ReportInput of(ReviewResults review) {
        return new ReportInput(review, Optional.empty(), "");
    }

    /**
     * Results and the machine they were computed from, mapped again here (mapping is cheap and pure). The
     * review was computed from the same machine, so its mapping succeeded once already: a failure now is an
     * internal inconsistency, reported unchecked.
     */
    public static ReportInput of(ReviewResults review, Machine machine) {
        try {
            return new ReportInput(review, Optional.of(EngineMapping.map(machine)), machine.getDescription());
        } catch (MappingException e) {
            throw new IllegalStateException("machine " + machine.getName() + " was analysed but no longer maps to "
                    + "engine inputs: " + e.getMessage(), e);
        }
    }
}
