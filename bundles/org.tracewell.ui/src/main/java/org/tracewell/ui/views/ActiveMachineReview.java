package org.tracewell.ui.views;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.ListenerList;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchPartReference;
import org.tracewell.core.analysis.AnalysisCancelledException;
import org.tracewell.core.analysis.AnalysisMemo;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ProgressListener;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.model.Machine;
import org.tracewell.requirements.DesignReview;
import org.tracewell.requirements.ReviewResults;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.editor.MachineEditorInput;

/**
 * The design review of the machine in the page's active Machine Editor, shared by the views that show it (Requirement
 * Trace, Error Budget, Tracking, Contour Deviation, Circle Test), so one edit runs one review. Follows part
 * activation; re-runs the review in a job a short pause after the editor's command stack changes (edit, undo, redo);
 * only the newest review is published, and each of its contours as soon as it is done. Reviews find the analyses of
 * unchanged axes and contour runs in {@link #MEMO}, so an edit costs what it changed. Used on the UI thread only; listeners are called there.
 */
final class ActiveMachineReview {

    /**
     * Pause after the last model change before reviewing, ms: none beyond the events already queued. A change arrives
     * as one command, not per keystroke, so a burst (an undo of several commands) is folded by the generation check
     * alone; thanks to the memo a review after an edit only recomputes what the edit changed, and the axis the Loop
     * Analysis view is already analysing is waited for, not analysed again.
     */
    static final int DEBOUNCE_MS = 0;

    /**
     * The analyses every view of the workbench shares, by value of their inputs (a pure-function cache: whichever
     * view asks first computes, the others find or wait for it). Room for the axes of a few machines and their
     * recent edits; runs hold every sample (about 1 MB per 10⁴), hence the smaller bound.
     */
    static final AnalysisMemo MEMO = AnalysisMemo.bounded(48, 16);

    private static final Map<IWorkbenchPage, ActiveMachineReview> BY_PAGE = new HashMap<>();

    /**
     * What the views show.
     *
     * @param machineName name of the reviewed machine; empty when no Machine Editor is active
     * @param results     the review; null when there is none (no machine, or it could not be reviewed)
     * @param problem     why there is no review (empty while none was asked for)
     * @param running     true while a newer review is on its way
     */
    record Outcome(String machineName, ReviewResults results, String problem, boolean running) {
    }

    private final IWorkbenchPage page;
    private final Display display;
    private final ListenerList<Consumer<Outcome>> listeners = new ListenerList<>();
    /** Told before {@link #listeners}: views that only hand the drawing to a job, so their jobs start first. */
    private final ListenerList<Consumer<Outcome>> first = new ListenerList<>();
    /** Told of each contour of the running review as soon as it is done, before the review's outcome. */
    private final ListenerList<Consumer<ContourResult>> contourListeners = new ListenerList<>();
    /** Stamps of the last published review: timer fired, job started, review done, published, job scheduled. */
    private volatile long[] lastTimings = new long[5];
    private volatile long scheduledAt;
    private final AtomicLong generation = new AtomicLong();
    private final CommandStackListener stackListener = event -> schedule(DEBOUNCE_MS);
    private final IPartListener2 partListener = new IPartListener2() {
        @Override
        public void partActivated(IWorkbenchPartReference ref) {
            if (ref.getPart(false) instanceof MachineEditor editor) {
                follow(editor);
            }
        }

        @Override
        public void partClosed(IWorkbenchPartReference ref) {
            if (ref.getPart(false) == followed) {
                follow(page.getActiveEditor() instanceof MachineEditor other && other != followed ? other : null);
            }
        }
    };
    private MachineEditor followed;
    private CancellationFlag running = CancellationFlag.create();
    private Outcome latest = new Outcome("", null, "Open a machine in the Machine Editor to review it.", false);

    private ActiveMachineReview(IWorkbenchPage page) {
        this.page = page;
        this.display = page.getWorkbenchWindow().getShell().getDisplay();
        page.addPartListener(partListener);
        if (page.getActiveEditor() instanceof MachineEditor editor) {
            follow(editor);
        }
    }

    /** Subscribes {@code listener} to the review of {@code page}'s active machine; it gets the latest at once. */
    static ActiveMachineReview subscribe(IWorkbenchPage page, Consumer<Outcome> listener) {
        return subscribe(page, listener, false);
    }

    /**
     * As {@link #subscribe(IWorkbenchPage, Consumer)}; a listener that only starts a job (and draws nothing on the UI
     * thread) asks to be told {@code early}, so its job does not wait for the views that fill widgets.
     */
    static ActiveMachineReview subscribe(IWorkbenchPage page, Consumer<Outcome> listener, boolean early) {
        ActiveMachineReview review = BY_PAGE.computeIfAbsent(page, ActiveMachineReview::new);
        (early ? review.first : review.listeners).add(listener);
        listener.accept(review.latest);
        return review;
    }

    /**
     * Tells {@code listener} (on the UI thread) of each contour of a running review as soon as its runs are done:
     * the very result the review's outcome will hold, while the outcome still holds the previous review. A view of
     * one contour draws it without waiting for the rest of the machine (the axes' dynamics, other contours, the
     * budget). Removed with {@link #unsubscribe(Consumer, Consumer)}.
     */
    void addContourListener(Consumer<ContourResult> listener) {
        contourListeners.add(listener);
    }

    /** Ends a subscription with its contour listener. */
    void unsubscribe(Consumer<Outcome> listener, Consumer<ContourResult> contourListener) {
        contourListeners.remove(contourListener);
        unsubscribe(listener);
    }

    /** Ends the subscription; the last one stops following the editor. */
    void unsubscribe(Consumer<Outcome> listener) {
        listeners.remove(listener);
        first.remove(listener);
        if (listeners.isEmpty() && first.isEmpty()) {
            follow(null);
            page.removePartListener(partListener);
            BY_PAGE.remove(page);
        }
    }

    /** The Machine Editor whose machine is reviewed, or null. */
    MachineEditor followedEditor() {
        return followed;
    }

    private void follow(MachineEditor editor) {
        if (editor == followed) {
            return;
        }
        if (followed != null && followed.getEditingDomain() != null) {
            followed.getEditingDomain().getCommandStack().removeCommandStackListener(stackListener);
        }
        followed = editor;
        if (editor == null) {
            generation.incrementAndGet();
            running.cancel();
            publish(new Outcome("", null, "Open a machine in the Machine Editor to review it.", false));
            return;
        }
        editor.getEditingDomain().getCommandStack().addCommandStackListener(stackListener);
        // The previous machine's review must not stay on screen under this one's name.
        publish(new Outcome(editor.getPartName(), null, "", true));
        schedule(0);
    }

    /**
     * Copies the machine on the UI thread (the model is only changed there) after {@code delayMs}, then reviews the
     * copy in a job. Library axes are referenced, not copied: the editor changes them only on the UI thread too, by
     * whole-value commands.
     */
    private void schedule(int delayMs) {
        long mine = generation.incrementAndGet();
        running.cancel();
        display.timerExec(delayMs, () -> {
            long fired = System.nanoTime();
            MachineEditor editor = followed;
            if (mine != generation.get() || editor == null) {
                return;
            }
            if (!(editor.model().root() instanceof Machine machine)) {
                publish(new Outcome(editor.getPartName(), null, editor.getPartName()
                        + " holds a single axis, not a machine; open a .machine file to review requirements.", false));
                return;
            }
            String name = machine.getName() == null ? editor.getPartName() : machine.getName();
            Machine copy = EcoreUtil.copy(machine);
            Path file = editor.getEditorInput() instanceof MachineEditorInput input ? input.file() : null;
            boolean dirty = editor.isDirty();
            CancellationFlag cancel = CancellationFlag.create();
            running = cancel;
            Job job = Job.create("Design review: " + name, (IProgressMonitor monitor) -> {
                if (mine != generation.get() || monitor.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                long started = System.nanoTime();
                Outcome outcome;
                try {
                    ReviewResults results = DesignReview.run(copy, WorkbenchProvenance.of(file, dirty),
                            ProgressListener.SILENT, cancel, MEMO, contour -> tellContour(mine, contour));
                    outcome = new Outcome(name, results, "", false);
                } catch (AnalysisCancelledException superseded) {
                    return Status.CANCEL_STATUS;
                } catch (MappingException e) {
                    outcome = new Outcome(name, null, "Not reviewed: element " + e.getMessage(), false);
                } catch (IllegalArgumentException | ArithmeticException e) {
                    outcome = new Outcome(name, null, "Not reviewed: " + e.getMessage(), false);
                } catch (RuntimeException e) {
                    // Whatever went wrong, the views must not keep saying "updating" over the last results.
                    outcome = new Outcome(name, null, "Not reviewed: internal error " + e, false);
                }
                Outcome result = outcome;
                long reviewed = System.nanoTime();
                display.asyncExec(() -> {
                    if (mine == generation.get()) {
                        lastTimings = new long[] {fired, started, reviewed, System.nanoTime(), scheduledAt};
                        publish(result);
                    }
                });
                return Status.OK_STATUS;
            });
            job.setSystem(true);
            job.setPriority(Job.INTERACTIVE);
            job.schedule();
            scheduledAt = System.nanoTime();
            // Told after the job is on its way, so the views' work on this thread does not hold the review back.
            publish(new Outcome(name, latest.results(), latest.problem(), true));
        });
    }

    /** Hands a contour of review {@code mine} to the contour listeners on the UI thread, unless superseded. */
    private void tellContour(long mine, ContourResult contour) {
        if (contourListeners.isEmpty() || display.isDisposed()) {
            return;
        }
        display.asyncExec(() -> {
            if (mine == generation.get()) {
                for (Consumer<ContourResult> listener : contourListeners) {
                    listener.accept(contour);
                }
            }
        });
    }

    private void publish(Outcome outcome) {
        latest = outcome;
        for (Consumer<Outcome> listener : first) {
            listener.accept(outcome);
        }
        for (Consumer<Outcome> listener : listeners) {
            listener.accept(outcome);
        }
    }

    /**
     * {@link System#nanoTime()} stamps of the last published review: its timer fired, its job started, it was done,
     * published, and when the job was scheduled (after the machine was copied on the UI thread).
     */
    long[] lastTimings() {
        return lastTimings.clone();
    }
}
