package org.tracewell.ui.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.analysis.AnalysisCancelledException;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.model.Machine;
import org.tracewell.report.ReportInput;
import org.tracewell.report.ReportWriter;
import org.tracewell.requirements.DesignReview;
import org.tracewell.requirements.ReviewProvenance;
import org.tracewell.requirements.ReviewResults;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.prefs.TracewellPreferences;
import org.tracewell.ui.views.WorkbenchProvenance;

/**
 * Analysis → Write Design Review Report…: reviews the machine of the active Machine Editor and writes the report
 * (the same as {@code tracewell analyze}) into a folder, naming the author from the preferences. Runs as a
 * cancellable job with progress; the UI thread only copies the model and shows the outcome.
 */
public final class WriteReportHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        Shell shell = window.getShell();
        if (!(window.getActivePage().getActiveEditor() instanceof MachineEditor editor)
                || !(editor.model().root() instanceof Machine machine)) {
            MessageDialog.openInformation(shell, "Write Design Review Report",
                    "Open a machine (.machine file) in the Machine Editor first; the report reviews that machine.");
            return null;
        }
        Path file = editor.model().file();
        DirectoryDialog dialog = new DirectoryDialog(shell);
        dialog.setText("Write Design Review Report");
        dialog.setMessage("Folder for the report of " + machine.getName() + " (index.html and its charts).");
        Path parent = file.toAbsolutePath().getParent();
        dialog.setFilterPath((parent == null ? Path.of(".") : parent).resolve(file.getFileName().toString()
                .replaceFirst("\\.machine$", "") + "-report").toString());
        String chosen = dialog.open();
        if (chosen == null) {
            return null;
        }
        schedule(EcoreUtil.copy(machine), WorkbenchProvenance.of(file, editor.isDirty()), Path.of(chosen),
                TracewellPreferences.reportAuthor(), shell.getDisplay(), written -> MessageDialog.openInformation(
                        shell, "Design review report", "Written: " + written + "\n\n" + SafetyCaution.TEXT));
        return null;
    }

    /**
     * Reviews {@code machine} (a copy, owned by the job) and writes the report; {@code done} gets the page written,
     * on the UI thread. Library axes are referenced by the copy, as in the views' reviews.
     */
    public static Job schedule(Machine machine, ReviewProvenance provenance, Path folder, String author,
            Display display, java.util.function.Consumer<Path> done) {
        Job job = Job.create("Design review report: " + machine.getName(), (IProgressMonitor monitor) -> {
            SubMonitor progress = SubMonitor.convert(monitor, "Reviewing " + machine.getName(), 100);
            CancellationFlag cancel = CancellationFlag.create();
            try {
                SubMonitor review = progress.split(80);
                ReviewResults results = DesignReview.run(machine, provenance, (task, finished, total) -> {
                    review.setWorkRemaining(Math.max(1, total - finished));
                    review.subTask(task);
                    review.worked(1);
                    if (monitor.isCanceled()) {
                        cancel.cancel();
                    }
                }, cancel);
                progress.split(20).subTask("writing the report");
                List<Path> written = ReportWriter.write(ReportInput.of(results, machine).withAuthor(author), folder);
                display.asyncExec(() -> done.accept(written.get(0)));
                return Status.OK_STATUS;
            } catch (AnalysisCancelledException cancelled) {
                return Status.CANCEL_STATUS;
            } catch (MappingException e) {
                return Status.error("Not reviewed: element " + e.getMessage(), e);
            } catch (IOException e) {
                return Status.error("The report was not written to " + folder + ": " + e.getMessage(), e);
            } catch (IllegalArgumentException | ArithmeticException e) {
                return Status.error("Not reviewed: " + e.getMessage(), e);
            }
        });
        job.setUser(true);
        job.schedule();
        return job;
    }
}
