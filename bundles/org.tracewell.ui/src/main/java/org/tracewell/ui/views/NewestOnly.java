package org.tracewell.ui.views;

import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Supplier;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;

/**
 * A view's work off the UI thread where every request supersedes the earlier ones: the work runs in a job, and its
 * result reaches the screen (on the UI thread) only if no newer request came in meanwhile. A superseded job that has
 * not started yet does not start.
 */
final class NewestOnly {

    private final Control owner;
    private final Display display;
    private final AtomicLong generation = new AtomicLong();

    /** @param owner the control whose display shows the results; nothing is shown once it is disposed (UI thread) */
    NewestOnly(Control owner) {
        this.owner = owner;
        this.display = owner.getDisplay();
    }

    /** A new request: every earlier one is superseded. Any thread. */
    long next() {
        return generation.incrementAndGet();
    }

    /** True while no request newer than {@code request} has come in. */
    boolean isNewest(long request) {
        return request == generation.get();
    }

    /** Supersedes the earlier requests and runs {@code work} after {@code delayMs}. */
    <T> void run(long delayMs, String jobName, Supplier<T> work, Consumer<T> show) {
        run(next(), delayMs, jobName, work, show);
    }

    /** Runs {@code work} for {@code request} (from {@link #next()}) in a job after {@code delayMs}. */
    <T> void run(long request, long delayMs, String jobName, Supplier<T> work, Consumer<T> show) {
        Job job = Job.create(jobName, (IProgressMonitor monitor) -> {
            if (!isNewest(request) || monitor.isCanceled()) {
                return Status.CANCEL_STATUS;
            }
            T result = work.get();
            if (!display.isDisposed()) {
                display.asyncExec(() -> {
                    if (isNewest(request) && !owner.isDisposed()) {
                        show.accept(result);
                    }
                });
            }
            return Status.OK_STATUS;
        });
        job.setSystem(true);
        job.setPriority(Job.INTERACTIVE); // a redraw someone waits for goes before background work
        job.schedule(delayMs);
    }
}
