package org.tracewell.engine.variation;

import java.util.concurrent.ForkJoinPool;
import java.util.function.BooleanSupplier;

/**
 * Where and how a run executes: in the calling thread or on a ForkJoin pool, with a progress listener and a
 * cancellation check (polled before every variant; once it answers true the run stops, keeping what is done).
 *
 * @param pool         the pool to run on, or null for the calling thread
 * @param progress     progress listener
 * @param cancellation answers true when the run should stop
 */
public record RunControl(ForkJoinPool pool, ProgressListener progress, BooleanSupplier cancellation) {

    private static final BooleanSupplier NEVER = () -> false;

    public RunControl {
        progress = progress == null ? ProgressListener.NONE : progress;
        cancellation = cancellation == null ? NEVER : cancellation;
    }

    /** In the calling thread, no progress, never cancelled. */
    public static RunControl serial() {
        return new RunControl(null, null, null);
    }

    /** On the common pool: all cores. */
    public static RunControl parallel() {
        return new RunControl(ForkJoinPool.commonPool(), null, null);
    }

    /** On {@code pool}. */
    public static RunControl on(ForkJoinPool pool) {
        if (pool == null) {
            throw new IllegalArgumentException("a pool is needed; use RunControl.serial() for the calling thread");
        }
        return new RunControl(pool, null, null);
    }

    public RunControl withProgress(ProgressListener listener) {
        return new RunControl(pool, listener, cancellation);
    }

    public RunControl withCancellation(BooleanSupplier cancelled) {
        return new RunControl(pool, progress, cancelled);
    }
}
