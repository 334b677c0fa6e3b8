package org.tracewell.engine.variation;

/**
 * Receives the progress of a run after each block of variants. Calls come from worker threads but never
 * concurrently, and {@code done} never decreases; keep the work done here short.
 */
@FunctionalInterface
public interface ProgressListener {

    ProgressListener NONE = (done, total) -> { };

    /**
     * @param done  variants evaluated so far
     * @param total variants in the run
     */
    void progress(long done, long total);
}
