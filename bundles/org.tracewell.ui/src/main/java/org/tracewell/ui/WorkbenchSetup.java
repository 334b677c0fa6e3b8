package org.tracewell.ui;

import java.util.Set;

import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.Platform;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.preference.IPreferenceNode;
import org.eclipse.jface.preference.PreferenceManager;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.ide.IDE;
import org.osgi.framework.Bundle;
import org.tracewell.ui.prefs.TracewellPreferences;
import org.tracewell.ui.problems.ProblemMarkers;

/**
 * What the workbench advisor does for the parts of the platform Tracewell borrows: the display units from the
 * preferences, the IDE adapters the Problems view needs, a preference dialog with Tracewell's pages only (the IDE
 * bundle brings pages about builders and workspaces that mean nothing here), and saving the workspace — it holds
 * only the links the problem markers hang on — at exit.
 */
final class WorkbenchSetup {

    /** Preference pages shown in Window → Preferences (root nodes). */
    private static final Set<String> KEPT_PREFERENCE_PAGES = Set.of("org.tracewell.ui.preferences");

    private WorkbenchSetup() {
    }

    static void initialize() {
        TracewellPreferences.applyDisplayUnits();
        IDE.registerAdapters();
    }

    static void postStartup(IWorkbench workbench) {
        PreferenceManager preferences = workbench.getPreferenceManager();
        for (IPreferenceNode node : preferences.getRootSubNodes()) {
            if (!KEPT_PREFERENCE_PAGES.contains(node.getId())) {
                preferences.remove(node);
            }
        }
    }

    static void postShutdown() {
        Bundle resources = Platform.getBundle(ResourcesPlugin.PI_RESOURCES);
        if (resources == null || resources.getState() != Bundle.ACTIVE) {
            return; // no marker was ever made: nothing to save
        }
        try {
            // The editors closed with the workbench and removed their markers in jobs: let those finish first.
            Job.getJobManager().join(ProblemMarkers.JOB_FAMILY, null);
            ResourcesPlugin.getWorkspace().save(true, null);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (CoreException | IllegalStateException e) {
            ILog.of(WorkbenchSetup.class).error("The workspace (problem-marker links) was not saved", e);
        }
    }
}
