package org.tracewell.core.analysis;

/** Receives progress of a running analysis; called from worker threads, so implementations must be thread-safe. */
@FunctionalInterface
public interface ProgressListener {

    /** A listener that ignores every report. */
    ProgressListener SILENT = (task, done, total) -> {
    };

    /**
     * @param task  what was just finished (e.g. "axis X1", "contour 'circle R100 CW' CCW")
     * @param done  tasks finished so far
     * @param total tasks in the whole analysis
     */
    void progress(String task, int done, int total);
}
