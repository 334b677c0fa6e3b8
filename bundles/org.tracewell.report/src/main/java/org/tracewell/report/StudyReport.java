package org.tracewell.report;

import java.util.Optional;

import org.tracewell.core.variation.StudyResult;
import org.tracewell.model.StudyKind;
import org.tracewell.model.VariationStudy;

/**
 * One tolerance study in the report: what the model asks for and, when it was run for this report, its result.
 *
 * @param name        study name
 * @param kind        "Monte-Carlo" or "sweep"
 * @param description the model's description of the study, may be empty
 * @param result      the result when the study was run
 */
public record StudyReport(String name, String kind, String description, Optional<StudyResult> result) {

    public StudyReport {
        name = name == null || name.isBlank() ? "(unnamed study)" : name;
        description = description == null ? "" : description;
    }

    /** A study of the model not run for this report. */
    public static StudyReport notRun(VariationStudy study) {
        return new StudyReport(study.getName(), label(study.getKind()), study.getDescription(), Optional.empty());
    }

    public static StudyReport of(StudyResult result) {
        return new StudyReport(result.definition().name(), label(result.definition().kind()), "",
                Optional.of(result));
    }

    StudyReport withDescription(String text) {
        return new StudyReport(name, kind, text, result);
    }

    private static String label(StudyKind kind) {
        return kind == StudyKind.SWEEP ? "sweep" : "Monte-Carlo";
    }
}
