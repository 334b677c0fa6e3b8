package org.tracewell.ui;

import org.eclipse.swt.graphics.Point;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;
import org.eclipse.ui.application.IWorkbenchConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;

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
