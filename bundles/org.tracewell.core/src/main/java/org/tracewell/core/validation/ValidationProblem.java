package org.tracewell.core.validation;

import java.util.Optional;

import org.eclipse.emf.ecore.EObject;
import org.tracewell.core.io.SourcePosition;

/**
 * One finding of {@link ModelValidation}: what is wrong, on which element, where in which file.
 *
 * @param severity error (the model cannot be analysed) or warning (it can, but the result is doubtful)
 * @param code     stable rule code, e.g. {@code tw.positive}
 * @param element  the offending element
 * @param position where the element starts in its file, when known
 * @param message  names the element, the bad value and the valid range
 */
public record ValidationProblem(Severity severity, String code, EObject element, Optional<SourcePosition> position,
        String message) {

    /** How bad a finding is. */
    public enum Severity {
        WARNING, ERROR
    }

    /** {@code file:line:column: error: message}, or without the position when the element has none. */
    @Override
    public String toString() {
        String where = position.map(p -> p + ": ").orElse("");
        return where + severity.name().toLowerCase(java.util.Locale.ROOT) + ": " + message;
    }
}
