package org.tracewell.ui.editor;

import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;

/** File → Open Machine…: picks a {@code .machine} or {@code .axis} file and opens it in the Machine Editor. */
public final class OpenMachineHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        FileDialog dialog = new FileDialog(window.getShell(), SWT.OPEN);
        dialog.setText("Open Machine");
        dialog.setFilterExtensions(new String[] {"*.machine;*.axis", "*.machine", "*.axis"});
        dialog.setFilterNames(new String[] {"Machines and library axes", "Machines (*.machine)",
                "Library axes (*.axis)"});
        String chosen = dialog.open();
        if (chosen == null) {
            return null;
        }
        try {
            MachineEditor.open(window.getActivePage(), Path.of(chosen));
        } catch (PartInitException e) {
            throw new ExecutionException("Cannot open " + chosen + ": " + e.getMessage(), e);
        }
        return null;
    }
}
