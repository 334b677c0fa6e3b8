package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.LoopAnalysisViewTest.waitFor;
import static org.tracewell.ui.tests.MachineEditorTest.copyExamples;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IViewPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.ide.IDE;
import org.eclipse.ui.internal.views.markers.ExtendedMarkersView;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.model.CascadeController;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.problems.ProblemMarkers;

/**
 * Model checks as Problems markers: a broken value in the file shows as an error on the machine file, naming the
 * element and the valid range; double-clicking it (opening the marker) selects the element in the open editor; the
 * marker goes when the value is fixed and when the editor closes.
 */
class ProblemMarkersTest {

    private final IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();

    @AfterEach
    void closeEditors() {
        page.closeAllEditors(false);
    }

    private static List<IMarker> markersOf(MachineEditor editor) {
        IFile file = editor.problemMarkers().markedFile();
        if (file == null || !file.exists()) {
            return List.of();
        }
        try {
            return Arrays.asList(file.findMarkers(ProblemMarkers.TYPE, false, IResource.DEPTH_ZERO));
        } catch (CoreException e) {
            throw new AssertionError(e);
        }
    }

    private static void waitForMarkerJobs() {
        waitFor(() -> Job.getJobManager().find(null).length == 0
                || Arrays.stream(Job.getJobManager().find(null)).noneMatch(j -> j.getName().startsWith("Model checks")));
    }

    @Test
    void brokenValueInTheFileIsAProblemThatRevealsItsElement(@TempDir Path temp) throws Exception {
        Path folder = copyExamples(temp);
        Path machineFile = folder.resolve("LM-3020.machine");
        // The Y axis's Kv, written by hand as -40 1/s: the file loads, the checks refuse it.
        String text = Files.readString(machineFile);
        int y = text.indexOf("id=\"lm3020-y-controller\"");
        int gain = text.indexOf("positionGain=\"40.0\"", y);
        Files.writeString(machineFile, text.substring(0, gain) + "positionGain=\"-40.0\"" + text.substring(gain + 19));

        long started = System.nanoTime();
        MachineEditor editor = MachineEditor.open(page, machineFile);
        waitFor(() -> !markersOf(editor).isEmpty());
        System.out.printf("Model checks: open (load, pages, checks) -> first Problems marker %.0f ms%n",
                (System.nanoTime() - started) / 1e6);
        IMarker marker = markersOf(editor).stream()
                .filter(m -> m.getAttribute(IMarker.MESSAGE, "").contains("position gain")).findFirst()
                .orElseThrow(() -> new AssertionError("markers: " + markersOf(editor).stream()
                        .map(m -> m.getAttribute(IMarker.MESSAGE, "")).toList()));
        assertEquals(IMarker.SEVERITY_ERROR, marker.getAttribute(IMarker.SEVERITY, -1));
        String message = marker.getAttribute(IMarker.MESSAGE, "");
        assertTrue(message.startsWith("position gain = -2.4 (m/min)/mm") && message.contains("valid"), message);
        assertTrue(marker.getAttribute(IMarker.LOCATION, "").contains("of Axis 'Y'"),
                marker.getAttribute(IMarker.LOCATION, ""));
        long checking = System.nanoTime();
        new org.tracewell.core.validation.ModelValidation().validate(editor.model().root());
        System.out.printf("Model checks: one run of the rules on the LM-3020 %.1f ms (UI thread)%n",
                (System.nanoTime() - checking) / 1e6);
        assertTrue(marker.getAttribute(IMarker.LINE_NUMBER, 0) > 1, "line of the controller in the file");
        assertEquals(machineFile.toRealPath(), Path.of(marker.getResource().getLocation().toOSString()).toRealPath());

        // The Problems view lists it.
        IViewPart problems = page.showView(IPageLayout.ID_PROBLEM_VIEW);
        waitFor(() -> treeText(problems).contains("-2.4 (m/min)/mm"));

        // Double-click: what the Problems view does with the marker; the open editor (not a second one) selects the
        // controller.
        page.activate(problems);
        editor.reveal(editor.model().machine().getAxes().get(0));
        ExtendedMarkersView.openMarkerInEditor(marker, page);
        assertSame(editor, page.getActiveEditor(), "the file opens in the editor that has it open");
        assertEquals(1, page.getEditorReferences().length);
        IEditorPart opened = IDE.openEditor(page, marker, true);
        assertSame(editor, opened);
        CascadeController yController = (CascadeController) editor.model().machine().getAxes().get(2).getController();
        Object selected = ((IStructuredSelection) editor.getSite().getSelectionProvider().getSelection())
                .getFirstElement();
        assertSame(yController, selected);

        // Fixing the value removes the marker; closing the editor removes them all.
        editor.getEditingDomain().getCommandStack().execute(SetCommand.create(editor.getEditingDomain(), yController,
                Literals.CASCADE_CONTROLLER__POSITION_GAIN, 40.0));
        waitFor(() -> markersOf(editor).stream()
                .noneMatch(m -> m.getAttribute(IMarker.MESSAGE, "").contains("position gain")));
        IFile marked = editor.problemMarkers().markedFile();
        assertNotNull(marked);
        editor.getEditingDomain().getCommandStack().undo();
        waitFor(() -> !markersOf(editor).isEmpty());
        page.closeEditor(editor, false);
        waitForMarkerJobs();
        waitFor(() -> {
            try {
                return marked.findMarkers(ProblemMarkers.TYPE, false, IResource.DEPTH_ZERO).length == 0;
            } catch (CoreException e) {
                return false;
            }
        });
    }

    @Test
    void soundExampleHasNoErrorMarkers(@TempDir Path temp) throws Exception {
        MachineEditor editor = MachineEditor.open(page, copyExamples(temp).resolve("LM-3020.machine"));
        waitFor(() -> editor.problemMarkers().markedFile() != null);
        waitForMarkerJobs();
        assertFalse(markersOf(editor).stream().anyMatch(m -> m.getAttribute(IMarker.SEVERITY, -1)
                == IMarker.SEVERITY_ERROR), "the example passes its own checks");
    }

    /** Every item text of the visible trees of the window (the Problems view's among them), groups expanded. */
    static String treeText(IViewPart view) {
        StringBuilder all = new StringBuilder();
        collect(view.getSite().getShell(), all);
        return all.toString();
    }

    private static void collect(Control control, StringBuilder all) {
        if (control instanceof Tree tree && tree.isVisible()) {
            for (TreeItem item : tree.getItems()) {
                // What a click on the twisty does: the viewer fills the group, then it opens.
                Event expand = new Event();
                expand.item = item;
                tree.notifyListeners(SWT.Expand, expand);
                item.setExpanded(true);
                appendItem(item, all);
            }
        }
        if (control instanceof Composite composite) {
            for (Control child : composite.getChildren()) {
                collect(child, all);
            }
        }
    }

    private static void appendItem(TreeItem item, StringBuilder all) {
        all.append(item.getText(0)).append('\n');
        for (TreeItem child : item.getItems()) {
            appendItem(child, all);
        }
    }
}
