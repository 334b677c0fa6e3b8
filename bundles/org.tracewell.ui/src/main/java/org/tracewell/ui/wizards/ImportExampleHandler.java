package org.tracewell.ui.wizards;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracewell.core.Examples;
import org.tracewell.ui.editor.MachineEditor;

/**
 * File → Import Example Scenario…: copies the Larchmont Motion scenario (LM-3020, LM-T5, their shared axis library)
 * into a folder the user chooses and opens the LM-3020.
 */
public final class ImportExampleHandler extends AbstractHandler {

    /** The folder offered first. */
    static Path defaultFolder() {
        return Path.of(System.getProperty("user.home"), "Tracewell", "Larchmont Motion");
    }

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        DirectoryDialog dialog = new DirectoryDialog(window.getShell());
        dialog.setText("Import Example Scenario");
        dialog.setMessage("Folder for the Larchmont Motion scenario (LM-3020, LM-T5 and their axis library). "
                + "Existing files are never overwritten.");
        dialog.setFilterPath(defaultFolder().toString());
        String chosen = dialog.open();
        if (chosen == null) {
            return null;
        }
        try {
            importInto(window.getActivePage(), Path.of(chosen));
        } catch (IOException | PartInitException e) {
            MessageDialog.openError(window.getShell(), "Import Example Scenario", e.getMessage());
        }
        return null;
    }

    /** Copies the scenario into {@code folder} and opens the LM-3020 there; returns the copied files. */
    public static List<Path> importInto(IWorkbenchPage page, Path folder) throws IOException, PartInitException {
        List<Path> copied = ExampleScenario.copyTo(folder);
        MachineEditor.open(page, folder.resolve(Examples.LM_3020));
        return copied;
    }
}
