package org.tracewell.ui.wizards;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.handlers.HandlerUtil;

/** File → New → Tracewell Machine…: the New Machine wizard. */
public final class NewMachineHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        NewMachineWizard wizard = new NewMachineWizard();
        wizard.init(window.getWorkbench(), StructuredSelection.EMPTY);
        new WizardDialog(window.getShell(), wizard).open();
        return null;
    }
}
