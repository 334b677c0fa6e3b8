package org.tracewell.ui.wizards;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.jface.dialogs.DialogSettings;
import org.eclipse.jface.dialogs.IDialogSettings;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.ui.INewWizard;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;
import org.osgi.framework.FrameworkUtil;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.prefs.TracewellPreferences;

/**
 * File → New → Tracewell Machine: writes a machine from the template (through the model and the save code) or copies
 * an example with its library axes into the chosen folder, then opens it in the Machine Editor.
 */
public final class NewMachineWizard extends Wizard implements INewWizard {

    private IWorkbench workbench;
    private NewMachinePage page;
    private Path created;

    public NewMachineWizard() {
        setWindowTitle("New Tracewell Machine");
        setNeedsProgressMonitor(false);
        IDialogSettings all = PlatformUI.isWorkbenchRunning() ? PlatformUI.getDialogSettingsProvider(
                FrameworkUtil.getBundle(NewMachineWizard.class)).getDialogSettings() : new DialogSettings("root");
        IDialogSettings mine = all.getSection("NewMachineWizard");
        setDialogSettings(mine == null ? all.addNewSection("NewMachineWizard") : mine);
    }

    @Override
    public void init(IWorkbench newWorkbench, IStructuredSelection selection) {
        workbench = newWorkbench;
    }

    @Override
    public void addPages() {
        page = new NewMachinePage();
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        Optional<Path> folder = page.targetFolder();
        if (folder.isEmpty()) {
            return false;
        }
        try {
            Files.createDirectories(folder.get());
            Optional<String> name = page.templateName();
            if (name.isPresent()) {
                Path file = folder.get().resolve(name.get() + ".machine");
                TracewellPreferences.template(name.get()).writeTo(file, new ModelFiles());
                created = file;
            } else {
                created = ExampleScenario.copyMachine(page.exampleMachine(), folder.get());
            }
        } catch (IOException | IllegalArgumentException e) {
            page.setErrorMessage("The machine was not created: " + e.getMessage());
            return false;
        }
        getDialogSettings().put(NewMachinePage.FOLDER_SETTING, folder.get().toString());
        IWorkbench target = workbench != null ? workbench : PlatformUI.getWorkbench();
        try {
            MachineEditor.open(target.getActiveWorkbenchWindow().getActivePage(), created);
        } catch (PartInitException e) {
            page.setErrorMessage(created + " was written but cannot be opened: " + e.getMessage());
            return false;
        }
        return true;
    }

    /** The page (for tests, which fill it as a user would). */
    public NewMachinePage page() {
        return page;
    }

    /** The machine file written by the last finish, or null. */
    public Path createdFile() {
        return created;
    }
}
