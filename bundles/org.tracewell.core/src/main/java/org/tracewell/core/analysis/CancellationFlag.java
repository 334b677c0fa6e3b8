package org.tracewell.core.analysis;

import java.util.concurrent.atomic.AtomicBoolean;

/** Set by the caller to stop a running analysis; checked between tasks. */
public final class CancellationFlag {

    private final AtomicBoolean cancelled = new AtomicBoolean();

    /** A fresh flag, not cancelled. */
    public static CancellationFlag create() {
        return new CancellationFlag();
    }

    public void cancel() {
        cancelled.set(true);
    }

    public boolean isCancelled() {
        return cancelled.get();
    }

    /** Throws {@link AnalysisCancelledException} when the flag is set. */
    public void throwIfCancelled(String during) {
        if (cancelled.get()) {
            throw new AnalysisCancelledException("analysis cancelled during " + during);
        }
    }
}
