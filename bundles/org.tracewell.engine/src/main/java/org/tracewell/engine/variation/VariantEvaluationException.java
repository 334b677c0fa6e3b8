package org.tracewell.engine.variation;

/** A model failed on one variant; the message names the variant and its parameter values. */
public final class VariantEvaluationException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public VariantEvaluationException(String message, Throwable cause) {
        super(message + ": " + cause.getMessage(), cause);
    }
}
