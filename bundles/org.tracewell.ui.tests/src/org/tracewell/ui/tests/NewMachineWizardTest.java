package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.validation.ModelValidation;
import org.tracewell.core.validation.ValidationProblem;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Machine;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.prefs.TracewellPreferences;
import org.tracewell.ui.wizards.ExampleScenario;
import org.tracewell.ui.wizards.ImportExampleHandler;
import org.tracewell.ui.wizards.NewMachineWizard;

/** Getting a machine: the New Machine wizard (template, example) and the example scenario import. */
class NewMachineWizardTest {

    private final IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();

    @AfterEach
    void closeEditors() {
        page.closeAllEditors(false);
        TracewellPreferences.store().setToDefault(TracewellPreferences.POSITION_PERIOD_US);
    }

    /** Opens the wizard in its dialog without blocking, so the test fills and finishes it as a user would. */
    private static WizardDialog openWizard(NewMachineWizard wizard) {
        wizard.init(PlatformUI.getWorkbench(), StructuredSelection.EMPTY);
        WizardDialog dialog = new WizardDialog(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(), wizard);
        dialog.setBlockOnOpen(false);
        dialog.open();
        return dialog;
    }

    @Test
    void templateMachineIsWrittenValidatesAndOpens(@TempDir Path temp) throws Exception {
        // The loop period preference reaches the new machine: 250 µs position loop.
        TracewellPreferences.store().setValue(TracewellPreferences.POSITION_PERIOD_US, 250);
        NewMachineWizard wizard = new NewMachineWizard();
        WizardDialog dialog = openWizard(wizard);
        try {
            wizard.page().chooseTemplate(temp.resolve("new"), "Bench XY");
            assertTrue(wizard.page().isPageComplete(), String.valueOf(wizard.page().getErrorMessage()));
            assertTrue(wizard.performFinish());
        } finally {
            dialog.close();
        }
        Path file = temp.resolve("new/Bench XY.machine");
        assertEquals(file, wizard.createdFile());
        Machine machine = new ModelFiles().loadMachine(file);
        List<ValidationProblem> problems = new ModelValidation().validate(machine);
        assertTrue(problems.isEmpty(), problems.toString());
        assertEquals(List.of("X", "Y"), machine.getAxes().stream().map(a -> a.getName()).toList());
        assertEquals(250e-6, ((CascadeController) machine.getAxes().get(0).getController()).getPositionSamplePeriod(),
                1e-12);

        MachineEditor editor = assertInstanceOf(MachineEditor.class, page.getActiveEditor());
        assertEquals("Bench XY.machine", editor.getPartName());
        assertEquals(5, editor.pages().size(), "Axes, Contours, Requirements, Budget, Studies");
        assertFalse(editor.isDirty());
    }

    @Test
    void wizardRefusesToOverwriteAnExistingMachine(@TempDir Path temp) throws Exception {
        Files.writeString(temp.resolve("Taken.machine"), "anything");
        NewMachineWizard wizard = new NewMachineWizard();
        WizardDialog dialog = openWizard(wizard);
        try {
            wizard.page().chooseTemplate(temp, "Taken");
            assertFalse(wizard.page().isPageComplete());
            String message = wizard.page().getErrorMessage();
            assertTrue(message.contains("Taken.machine already exists") && message.contains("nothing is ever overwritten"),
                    message);
            wizard.page().chooseTemplate(Path.of("relative/folder"), "Fine");
            assertFalse(wizard.page().isPageComplete(), "a relative folder is refused");
        } finally {
            dialog.close();
        }
        assertEquals("anything", Files.readString(temp.resolve("Taken.machine")));
    }

    @Test
    void exampleMachineIsCopiedWithItsLibraryAxesAndOpens(@TempDir Path temp) throws Exception {
        NewMachineWizard wizard = new NewMachineWizard();
        WizardDialog dialog = openWizard(wizard);
        try {
            wizard.page().chooseExample(temp, "LM-T5.machine");
            assertTrue(wizard.performFinish());
        } finally {
            dialog.close();
        }
        // The LM-T5 uses the shared Z slide and the A and C rotary axes from the library.
        for (String file : List.of("LM-T5.machine", "library/z-slide-25x5.axis", "library/a-trunnion-i100.axis",
                "library/c-table-torque.axis")) {
            assertTrue(Files.isRegularFile(temp.resolve(file)), file);
        }
        assertFalse(Files.exists(temp.resolve("LM-3020.machine")), "only the chosen example");
        MachineEditor editor = assertInstanceOf(MachineEditor.class, page.getActiveEditor());
        assertEquals("LM-T5.machine", editor.getPartName());
        assertEquals(3, editor.model().machine().getLibraryAxes().size());
    }

    @Test
    void importCopiesTheScenarioOpensTheLm3020AndNeverOverwrites(@TempDir Path temp) throws Exception {
        List<Path> copied = ImportExampleHandler.importInto(page, temp);
        assertEquals(5, copied.size(), copied.toString());
        IEditorPart active = page.getActiveEditor();
        assertNotNull(active);
        assertEquals("LM-3020.machine", active.getTitle());
        assertEquals(List.of("LM-3020.machine", "LM-T5.machine"), ExampleScenario.machines());

        // Importing again into the same folder leaves identical files alone ...
        ExampleScenario.copyTo(temp);
        // ... and refuses to replace a file the user changed, before writing anything.
        page.closeAllEditors(false); // (an open editor would rightly ask about the change on disk)
        Files.writeString(temp.resolve("library/z-slide-25x5.axis"), "<!-- edited -->");
        IOException refused = assertThrows(IOException.class, () -> ExampleScenario.copyTo(temp));
        assertTrue(refused.getMessage().contains("z-slide-25x5.axis"), refused.getMessage());
        assertEquals("<!-- edited -->", Files.readString(temp.resolve("library/z-slide-25x5.axis")));
    }
}
