package org.tracewell.core.analysis;

/** Thrown by {@link MachineAnalyzer} when its {@link CancellationFlag} is set. */
public final class AnalysisCancelledException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public AnalysisCancelledException(String message) {
        super(message);
    }
}
