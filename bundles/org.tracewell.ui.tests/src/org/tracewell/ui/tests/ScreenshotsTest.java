package org.tracewell.ui.tests;

import static org.tracewell.ui.tests.LoopAnalysisViewTest.waitFor;
import static org.tracewell.ui.tests.MachineEditorTest.copyExamples;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.jface.preference.PreferenceDialog;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IViewPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.dialogs.PreferencesUtil;
import org.eclipse.ui.internal.views.markers.ExtendedMarkersView;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.model.Axis;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.help.GettingStartedDialog;
import org.tracewell.ui.problems.ProblemMarkers;
import org.tracewell.ui.wizards.NewMachineWizard;

/**
 * Writes the README's screenshots of the workbench screens this bundle's tests drive, when the environment variable
 * {@code TRACEWELL_SCREENSHOTS} names a folder (e.g. {@code docs/}); otherwise it is skipped. Run with a display of
 * 1600×1000 (the test command's Xvfb screen).
 */
class ScreenshotsTest {

    private final IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();

    private static Path folder() {
        String target = System.getenv("TRACEWELL_SCREENSHOTS");
        Assumptions.assumeTrue(target != null && !target.isBlank(), "TRACEWELL_SCREENSHOTS not set");
        return Path.of(target);
    }

    @AfterEach
    void closeEditors() {
        page.closeAllEditors(false);
    }

    @Test
    void workbenchScreens(@TempDir Path temp) throws Exception {
        Path out = folder();
        Files.createDirectories(out);
        Shell window = page.getWorkbenchWindow().getShell();
        window.setBounds(0, 0, 1500, 940);

        // The sound LM-3020 with axis Y's controller in the Properties view.
        Path folder = copyExamples(temp);
        Path machineFile = folder.resolve("LM-3020.machine");
        MachineEditor editor = MachineEditor.open(page, machineFile);
        Axis axisY = editor.model().machine().getAxes().get(2);
        page.showView(IPageLayout.ID_PROP_SHEET);
        page.activate(editor);
        editor.reveal(axisY.getController());
        settle(2500);
        capture(window, out.resolve("properties.png"));
        page.closeAllEditors(false);

        // A budget line typed wrong by hand (a negative error): the Problems view lists it; opening the problem
        // (a double-click) selects the line on the Budget page.
        String text = Files.readString(machineFile);
        Files.writeString(machineFile, text.replace("value=\"3.5E-6\"", "value=\"-3.5E-6\""));
        editor = MachineEditor.open(page, machineFile);
        editor.reveal(editor.model().machine().getAxes().get(2).getController());
        IViewPart problems = page.showView(IPageLayout.ID_PROBLEM_VIEW);
        MachineEditor broken = editor;
        waitFor(() -> ProblemMarkersTest.treeText(problems).contains("value = -3.5"));
        IMarker marker = broken.problemMarkers().markedFile().findMarkers(ProblemMarkers.TYPE, false,
                IResource.DEPTH_ZERO)[0];
        ExtendedMarkersView.openMarkerInEditor(marker, page);
        settle(2500);
        ProblemMarkersTest.treeText(problems); // groups open
        settle(300);
        capture(window, out.resolve("problems.png"));
        page.closeAllEditors(false);

        NewMachineWizard wizard = new NewMachineWizard();
        wizard.init(PlatformUI.getWorkbench(), StructuredSelection.EMPTY);
        WizardDialog dialog = new WizardDialog(window, wizard);
        dialog.setBlockOnOpen(false);
        dialog.open();
        // Shown only: the dialog is closed without finishing, nothing is written there.
        wizard.page().chooseTemplate(Path.of(System.getProperty("user.home"), "Tracewell"), "Bench XY");
        settle(500);
        capture(dialog.getShell(), out.resolve("new-machine-wizard.png"));
        dialog.close();

        PreferenceDialog preferences = PreferencesUtil.createPreferenceDialogOn(window, "org.tracewell.ui.preferences",
                null, null);
        preferences.setBlockOnOpen(false);
        preferences.open();
        preferences.getShell().setSize(760, 520);
        settle(500);
        capture(preferences.getShell(), out.resolve("preferences.png"));
        preferences.close();

        GettingStartedDialog help = new GettingStartedDialog(window);
        help.setBlockOnOpen(false);
        help.open();
        settle(500);
        capture(help.getShell(), out.resolve("getting-started.png"));
        help.close();
    }

    private static void settle(long millis) {
        Display display = Display.getCurrent();
        long end = System.currentTimeMillis() + millis;
        while (System.currentTimeMillis() < end) {
            if (!display.readAndDispatch()) {
                display.timerExec(20, () -> { });
                display.sleep();
            }
        }
    }

    /** The shell as it draws itself (no window manager under Xvfb: nothing overlaps), as a PNG. */
    private static void capture(Shell shell, Path file) {
        Display display = shell.getDisplay();
        settle(200);
        org.eclipse.swt.graphics.Point size = shell.getSize();
        Image image = new Image(display, size.x, size.y);
        GC gc = new GC(image);
        try {
            shell.print(gc);
        } finally {
            gc.dispose();
        }
        ImageLoader loader = new ImageLoader();
        loader.data = new ImageData[] {image.getImageData()};
        loader.save(file.toString(), SWT.IMAGE_PNG);
        image.dispose();
    }
}
