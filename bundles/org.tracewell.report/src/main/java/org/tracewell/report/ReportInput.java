package org.tracewell.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.mapping.MachineInputs;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.model.Machine;
import org.tracewell.model.VariationStudy;
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
 * @param studies            the tolerance studies the model asks for, each with its result when it was run; the
 *                           report has a studies section only when there are some
 */
public record ReportInput(ReviewResults review, Optional<MachineInputs> inputs, String machineDescription,
        String author, List<StudyReport> studies) {

    public ReportInput {
        Objects.requireNonNull(review, "review results");
        Objects.requireNonNull(inputs, "machine inputs (use Optional.empty() when not available)");
        machineDescription = machineDescription == null ? "" : machineDescription;
        author = author == null ? "" : author.strip();
        studies = studies == null ? List.of() : List.copyOf(studies);
    }

    /** Without an author or studies. */
    public ReportInput(ReviewResults review, Optional<MachineInputs> inputs, String machineDescription) {
        this(review, inputs, machineDescription, "", List.of());
    }

    /** Without an author. */
    public ReportInput(ReviewResults review, Optional<MachineInputs> inputs, String machineDescription,
            List<StudyReport> studies) {
        this(review, inputs, machineDescription, "", studies);
    }

    /** The same input, prepared by {@code newAuthor} (empty: no author named). */
    public ReportInput withAuthor(String newAuthor) {
        return new ReportInput(review, inputs, machineDescription, newAuthor, studies);
    }

    /**
     * The same input with study results: each replaces the not-run entry of the study of its name (or is added when
     * the model does not ask for it, e.g. a study given on the command line).
     */
    public ReportInput withStudyResults(List<StudyResult> results) {
        List<StudyReport> merged = new ArrayList<>(studies);
        for (StudyResult r : results) {
            StudyReport run = StudyReport.of(r);
            int at = -1;
            for (int i = 0; i < merged.size(); i++) {
                if (merged.get(i).name().equals(run.name())) {
                    at = i;
                }
            }
            if (at >= 0) {
                merged.set(at, run.withDescription(merged.get(at).description()));
            } else {
                merged.add(run);
            }
        }
        return new ReportInput(review, inputs, machineDescription, author, merged);
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
            List<StudyReport> studies = new ArrayList<>();
            for (VariationStudy study : machine.getStudies()) {
                studies.add(StudyReport.notRun(study));
            }
            return new ReportInput(review, Optional.of(EngineMapping.map(machine)), machine.getDescription(), studies);
        } catch (MappingException e) {
            throw new IllegalStateException("machine " + machine.getName() + " was analysed but no longer maps to "
                    + "engine inputs: " + e.getMessage(), e);
        }
    }
}
