package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;
import org.tracewell.ui.AboutDialog;
import org.tracewell.ui.AxisDesignPerspective;
import org.tracewell.core.SafetyCaution;

/** The product starts as a user sees it: one window, the Axis Design perspective, About with the caution. */
class WorkbenchStartTest {

    @Test
    void workbenchOpensInAxisDesignPerspective() {
        IWorkbenchWindow window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
        assertNotNull(window, "a workbench window is open");
        IWorkbenchPage page = window.getActivePage();
        assertNotNull(page, "the window has a page");
        assertEquals(AxisDesignPerspective.ID, page.getPerspective().getId());
        assertEquals("Axis Design", page.getPerspective().getLabel());
        assertTrue(window.getShell().getText().startsWith("Tracewell "), window.getShell().getText());
    }

    @Test
    void aboutDialogShowsVersionAndSafetyCaution() {
        Display display = Display.getCurrent();
        assertNotNull(display, "test runs on the UI thread");
        AboutDialog dialog = new AboutDialog(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell());
        dialog.setBlockOnOpen(false);
        dialog.open();
        try {
            while (display.readAndDispatch()) {
                // let the dialog lay itself out
            }
            Shell shell = dialog.getShell();
            assertEquals("About Tracewell", shell.getText());
            List<Text> cautions = new ArrayList<>();
            collectCautions(shell, cautions);
            assertEquals(1, cautions.size(), "one caution text");
            String caution = cautions.get(0).getText();
            assertEquals(SafetyCaution.TEXT, caution);
            assertTrue(caution.contains("reduced speed") && caution.contains("safety functions"), caution);
        } finally {
            dialog.close();
        }
    }

    private static void collectCautions(Control control, List<Text> found) {
        if (control instanceof Text text && text.getData(AboutDialog.CAUTION_KEY) != null) {
            found.add(text);
        }
        if (control instanceof Composite composite) {
            for (Control child : composite.getChildren()) {
                collectCautions(child, found);
            }
        }
    }
}
