package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;

/** The workbench's menus reach the new parts: File → New → Tracewell Machine, the import, Preferences, help. */
class WorkbenchMenusTest {

    /** The labels of a menu bar's menu and its submenus as the user opens them ("File/New/Tracewell Machine..."). */
    private static List<String> labels(Menu menu, String path) {
        menu.notifyListeners(SWT.Show, new Event()); // what opening it does: the workbench fills it
        List<String> labels = new ArrayList<>();
        for (MenuItem item : menu.getItems()) {
            String label = path + item.getText().replace("&", "").split("\t")[0];
            labels.add(label);
            if (item.getMenu() != null) {
                labels.addAll(labels(item.getMenu(), label + "/"));
            }
        }
        menu.notifyListeners(SWT.Hide, new Event());
        return labels;
    }

    @Test
    void newWorkbenchCommandsAreInTheMenus() {
        Menu bar = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell().getMenuBar();
        List<String> all = new ArrayList<>();
        for (MenuItem top : bar.getItems()) {
            all.addAll(labels(top.getMenu(), top.getText().replace("&", "") + "/"));
        }
        for (String expected : List.of("File/New/Tracewell Machine...", "File/Import Example Scenario...",
                "File/Open Machine...", "Analysis/Write Design Review Report...", "Window/Problems",
                "Window/Properties", "Window/Preferences...", "Help/Getting Started", "Help/About Tracewell")) {
            assertTrue(all.contains(expected), expected + " not in " + all);
        }
    }

    @Test
    void workspaceResourceWizardsOfTheIdeAreHiddenAndTracewellMachineIsOffered() {
        var activities = PlatformUI.getWorkbench().getActivitySupport().getActivityManager();
        assertFalse(activities.getIdentifier("org.eclipse.ui.ide/org.eclipse.ui.wizards.new.project").isEnabled());
        assertFalse(activities.getIdentifier("org.eclipse.ui.ide/org.eclipse.ui.wizards.new.file").isEnabled());
        assertTrue(activities.getIdentifier("org.tracewell.ui/org.tracewell.ui.wizard.newMachine").isEnabled());
        assertTrue(PlatformUI.getWorkbench().getNewWizardRegistry().findWizard("org.tracewell.ui.wizard.newMachine")
                != null);
    }
}
