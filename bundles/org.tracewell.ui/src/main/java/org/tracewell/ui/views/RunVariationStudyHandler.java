package org.tracewell.ui.views;

import java.util.List;
import java.util.concurrent.ForkJoinPool;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.window.Window;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.dialogs.ListDialog;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.core.variation.StudyRunner;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.engine.variation.VariantEvaluationException;
import org.tracewell.model.Machine;
import org.tracewell.model.StudyKind;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.edit.units.TradeLabels;
import org.tracewell.ui.editor.MachineEditor;

/**
 * Analysis → Run Variation Study…: runs a variation study the active machine asks for (chosen from a list when it asks
 * for several) as a cancellable job with progress on all cores, then shows the result in the {@link VariationView}.
 * The machine is copied on the UI thread before the job starts, so editing it meanwhile does not reach the run.
 */
public final class RunVariationStudyHandler extends AbstractHandler {

    public static final String COMMAND_ID = "org.tracewell.ui.command.runVariationStudy";
    /** Family of the study jobs, for tests and for cancelling them together. */
    public static final Object JOB_FAMILY = RunVariationStudyHandler.class;

    @Override
    public Object execute(ExecutionEvent event) {
        Shell shell = HandlerUtil.getActiveShell(event);
        IWorkbenchPage page = HandlerUtil.getActiveWorkbenchWindow(event).getActivePage();
        if (!(page.getActiveEditor() instanceof MachineEditor editor)
                || !(editor.model().root() instanceof Machine machine)) {
            MessageDialog.openInformation(shell, "Run Variation Study", "Open a machine in the Machine Editor first:"
                    + " its variation studies are run.");
            return null;
        }
        List<VariationStudy> studies = List.copyOf(machine.getStudies());
        if (studies.isEmpty()) {
            MessageDialog.openInformation(shell, "Run Variation Study", "Machine " + machine.getName() + " asks for no"
                    + " variation study. Add one to the machine (Studies), or run one from the command line:"
                    + " tracewell montecarlo --dist PATH=normal:SIGMA.");
            return null;
        }
        VariationStudy study = studies.size() == 1 ? studies.get(0) : choose(shell, studies);
        if (study != null) {
            start(page, machine, study);
        }
        return null;
    }

    private static VariationStudy choose(Shell shell, List<VariationStudy> studies) {
        ListDialog dialog = new ListDialog(shell);
        dialog.setTitle("Run Variation Study");
        dialog.setMessage("Which study of the machine?");
        dialog.setContentProvider(ArrayContentProvider.getInstance());
        dialog.setLabelProvider(new LabelProvider() {
            @Override
            public String getText(Object element) {
                return TradeLabels.text(element);
            }
        });
        dialog.setInput(studies);
        dialog.setInitialSelections(studies.get(0));
        if (dialog.open() != Window.OK || dialog.getResult().length == 0) {
            return null;
        }
        return (VariationStudy) dialog.getResult()[0];
    }

    /**
     * Starts {@code study} of {@code machine} as a job and shows its result in the Variation view of {@code page}.
     * Call on the UI thread (the machine is copied here). Returns the job, already scheduled.
     */
    public static Job start(IWorkbenchPage page, Machine machine, VariationStudy study) {
        Display display = page.getWorkbenchWindow().getShell().getDisplay();
        StudyDefinition definition;
        try {
            definition = StudyDefinition.of(study);
        } catch (IllegalArgumentException bad) {
            show(page, view -> view.showProblem("Study '" + study.getName() + "' cannot run: " + bad.getMessage()));
            return null;
        }
        Machine snapshot = StudyRunner.snapshot(machine);
        int planned = definition.kind() == StudyKind.SWEEP ? definition.ranges().stream()
                .mapToInt(r -> r.steps()).reduce(1, (a, b) -> a * b) : definition.variantCount();
        Job job = new Job("Variation study '" + definition.name() + "' of " + machine.getName()) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                monitor.beginTask(getName(), planned);
                ForkJoinPool pool = new ForkJoinPool(Runtime.getRuntime().availableProcessors());
                long[] reported = {0};
                RunControl control = new RunControl(pool, (done, total) -> {
                    synchronized (reported) { // calls never overlap, but come from several worker threads
                        monitor.worked((int) (done - reported[0]));
                        reported[0] = done;
                        monitor.subTask(done + " of " + total + (definition.kind() == StudyKind.SWEEP
                                ? " grid points" : " variants"));
                    }
                }, monitor::isCanceled);
                try {
                    StudyResult result = StudyRunner.run(snapshot, definition, control);
                    display.asyncExec(() -> show(page, view -> view.show(result)));
                    return result.cancelled() ? Status.CANCEL_STATUS : Status.OK_STATUS;
                } catch (MappingException e) {
                    return problem(page, display, "Study '" + definition.name() + "' cannot run: element "
                            + e.getMessage());
                } catch (IllegalArgumentException | VariantEvaluationException e) {
                    return problem(page, display, "Study '" + definition.name() + "' cannot run: " + e.getMessage());
                } finally {
                    pool.shutdown();
                    monitor.done();
                }
            }

            @Override
            public boolean belongsTo(Object family) {
                return family == JOB_FAMILY;
            }
        };
        job.setUser(true);
        job.schedule();
        return job;
    }

    private static IStatus problem(IWorkbenchPage page, Display display, String message) {
        display.asyncExec(() -> show(page, view -> view.showProblem(message)));
        return Status.error(message);
    }

    private static void show(IWorkbenchPage page, java.util.function.Consumer<VariationView> action) {
        try {
            action.accept((VariationView) page.showView(VariationView.ID));
        } catch (PartInitException e) {
            MessageDialog.openError(page.getWorkbenchWindow().getShell(), "Variation", "The Variation view cannot"
                    + " open: " + e.getMessage());
        }
    }
}
