package org.tracewell.ui;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.runtime.Platform;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.graphics.Point;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;
import org.eclipse.ui.application.IWorkbenchConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;
import org.tracewell.ui.editor.MachineEditor;

/** Opens every window in the Axis Design perspective with Tracewell's menus. */
final class TracewellWorkbenchAdvisor extends WorkbenchAdvisor {

    @Override
    public String getInitialWindowPerspectiveId() {
        return AxisDesignPerspective.ID;
    }

    @Override
    public void initialize(IWorkbenchConfigurer configurer) {
        // Layout is restored per workspace, which the launcher keeps per user.
        configurer.setSaveAndRestore(true);
        WorkbenchSetup.initialize();
    }

    @Override
    public void postShutdown() {
        WorkbenchSetup.postShutdown();
    }

    /** Opens the model files named on the command line ({@code tracewell gui FILE.machine}). */
    @Override
    public void postStartup() {
        WorkbenchSetup.postStartup(getWorkbenchConfigurer().getWorkbench());
        IWorkbenchWindow window = getWorkbenchConfigurer().getWorkbench().getActiveWorkbenchWindow();
        if (window == null || window.getActivePage() == null) {
            return;
        }
        for (String argument : Platform.getApplicationArgs()) {
            if (!(argument.endsWith(".machine") || argument.endsWith(".axis"))) {
                continue;
            }
            Path file = Path.of(argument);
            if (!Files.isRegularFile(file)) {
                MessageDialog.openError(window.getShell(), "Open Machine", "No such file: " + file.toAbsolutePath());
                continue;
            }
            try {
                MachineEditor.open(window.getActivePage(), file);
            } catch (PartInitException e) {
                MessageDialog.openError(window.getShell(), "Open Machine", e.getMessage());
            }
        }
    }

    @Override
    public WorkbenchWindowAdvisor createWorkbenchWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        return new WorkbenchWindowAdvisor(configurer) {
            @Override
            public ActionBarAdvisor createActionBarAdvisor(IActionBarConfigurer actionBars) {
                return new TracewellActionBarAdvisor(actionBars);
            }

            @Override
            public void preWindowOpen() {
                configurer.setInitialSize(new Point(1280, 800));
                configurer.setShowCoolBar(false);
                configurer.setShowStatusLine(true);
                configurer.setShowPerspectiveBar(false);
                configurer.setTitle("Tracewell " + ProductInfo.version());
            }
        };
    }
}
