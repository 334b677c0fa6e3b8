package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.MachineEditorTest.copyExamples;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.handlers.IHandlerService;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.validation.ModelValidation;
import org.tracewell.model.Axis;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.Machine;
import org.tracewell.model.NotchFilter;
import org.tracewell.model.Requirement;
import org.tracewell.model.VariationStudy;
import org.tracewell.ui.editor.ElementCommands;
import org.tracewell.ui.editor.MachineEditor;

/** Adding and deleting elements in the Machine Editor: EMF commands, undo, ids, references, save. */
class ElementEditingTest {

    private final IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
    private MachineEditor editor;

    @AfterEach
    void closeEditor() {
        page.closeAllEditors(false);
    }

    private MachineEditor open(Path temp) throws Exception {
        editor = MachineEditor.open(page, copyExamples(temp).resolve("LM-3020.machine"));
        return editor;
    }

    private void undo() throws Exception {
        editor.getSite().getService(IHandlerService.class).executeCommand("org.eclipse.ui.edit.undo", null);
    }

    @Test
    void addedAxisIsCompleteValidAndUndoable(@TempDir Path temp) throws Exception {
        open(temp);
        Machine machine = editor.model().machine();
        int before = machine.getAxes().size();
        ElementCommands.Edit add = editor.elementCommands().addToMachine(machine, MachineEditor.AXES_PAGE)
                .orElseThrow();
        assertEquals("Add axis A", add.label(), "X1, X2, Y and the library Z are taken; A is next");
        Optional<Object> created = editor.elementCommands().execute(add);
        Axis axis = assertInstanceOf(Axis.class, created.orElseThrow());
        assertEquals(before + 1, machine.getAxes().size());
        assertEquals("lm3020-a", axis.getId());
        assertEquals("lm3020-a-controller", axis.getController().getId());
        assertTrue(new ModelValidation().validate(machine).stream().noneMatch(p -> EcoreUtil.isAncestor(axis,
                p.element())), "the new axis passes the checks");
        assertTrue(editor.isDirty());
        assertTrue(editor.undoLabel().contains("Add axis A"), editor.undoLabel());

        undo();
        assertEquals(before, machine.getAxes().size());
        assertFalse(editor.isDirty());
    }

    @Test
    void addedStudyFromTheStudiesPageIsValidAndUndoable(@TempDir Path temp) throws Exception {
        open(temp);
        Machine machine = editor.model().machine();
        int before = machine.getStudies().size();
        ElementCommands.Edit add = editor.elementCommands().addToMachine(machine, MachineEditor.STUDIES_PAGE)
                .orElseThrow();
        assertEquals("Add study gain tolerance", add.label());
        VariationStudy study = assertInstanceOf(VariationStudy.class,
                editor.elementCommands().execute(add).orElseThrow());
        assertEquals(before + 1, machine.getStudies().size());
        assertEquals(List.of("axis[X1].controller.positionGain", "axis[Y].controller.positionGain"),
                study.getParameters().stream().map(p -> p.getPath()).toList());
        assertTrue(study.getParameters().stream().allMatch(p -> p.getId() != null), "ids assigned");
        assertTrue(new ModelValidation().validate(machine).stream().noneMatch(p -> EcoreUtil.isAncestor(study,
                p.element())), "the new study passes the checks");
        undo();
        assertEquals(before, machine.getStudies().size());
    }

    @Test
    void deletingAnAxisClearsItsReferencesAndUndoRestoresThem(@TempDir Path temp) throws Exception {
        open(temp);
        Machine machine = editor.model().machine();
        Axis y = machine.getAxes().stream().filter(a -> "Y".equals(a.getName())).findFirst().orElseThrow();
        Requirement yKv = machine.getRequirements().stream().filter(r -> "lm3020-r1-y-kv".equals(r.getId()))
                .findFirst().orElseThrow();
        Contour circle = machine.getContours().get(0);
        assertSame(y, yKv.getAllocatedAxis());
        assertTrue(circle.getAxisAssignment().contains(y));

        editor.elementCommands().execute(editor.elementCommands().delete(y, machine, false));
        assertFalse(machine.getAxes().contains(y));
        assertNull(yKv.getAllocatedAxis(), "the allocation no longer names a deleted axis");
        assertFalse(circle.getAxisAssignment().contains(y));

        undo();
        assertTrue(machine.getAxes().contains(y));
        assertSame(y, yKv.getAllocatedAxis());
        assertTrue(circle.getAxisAssignment().contains(y));
    }

    @Test
    void newFilterStageAndSegmentComeFromTheItemProvidersAndSaveReloadsEqual(@TempDir Path temp) throws Exception {
        open(temp);
        Machine machine = editor.model().machine();
        Axis x1 = machine.getAxes().get(0);
        CascadeController controller = (CascadeController) x1.getController();
        List<ElementCommands.Edit> children = editor.elementCommands().newChildren(controller);
        ElementCommands.Edit notch = children.stream().filter(e -> e.label().contains("Notch")).findFirst()
                .orElseThrow(() -> new AssertionError("offered: " + children.stream().map(e -> e.label()).toList()));
        assertEquals("Filter stages: Notch Filter", notch.label());
        editor.elementCommands().execute(notch);
        NotchFilter added = assertInstanceOf(NotchFilter.class, controller.getFilterStages().get(1));
        assertEquals("lm3020-x1-controller-filter-stages", added.getId());

        Contour line = machine.getContours().get(2);
        int segments = line.getSegments().size();
        editor.elementCommands().execute(editor.elementCommands().newChildren(line).stream()
                .filter(e -> e.label().endsWith(": Line")).findFirst().orElseThrow());
        assertEquals(segments + 1, line.getSegments().size());

        editor.doSave(null);
        Machine reloaded = new ModelFiles().loadMachine(editor.model().file());
        assertTrue(new EcoreUtil.EqualityHelper().equals(machine, reloaded), "reloaded machine equals the edited one");
    }

    @Test
    void libraryAxisIsRemovedFromTheMachineNotDeletedFromItsFile(@TempDir Path temp) throws Exception {
        open(temp);
        Machine machine = editor.model().machine();
        Axis z = machine.getLibraryAxes().get(0);
        assertTrue(editor.isLibraryAxis(z));
        ElementCommands.Edit remove = editor.elementCommands().delete(z, machine, true);
        assertEquals("Remove library axis Z from LM-3020", remove.label());
        editor.elementCommands().execute(remove);
        assertTrue(machine.getLibraryAxes().isEmpty());
        assertNotNull(z.eResource(), "the axis stays in its library file");
        assertFalse(editor.elementCommands().delete(machine, machine, false).command().canExecute(),
                "the machine itself cannot be deleted");
    }

    @Test
    void contextMenuOffersAddNewAndDelete(@TempDir Path temp) throws Exception {
        open(temp);
        Axis x1 = editor.model().machine().getAxes().get(0);
        assertTrue(editor.reveal(x1.getController()));
        Menu menu = editor.pages().get(0).tree().getControl().getMenu();
        assertNotNull(menu, "the tree has a context menu");
        menu.notifyListeners(SWT.Show, new Event()); // what opening it does: the menu manager fills it
        try {
            List<String> labels = Stream.of(menu.getItems()).map(MenuItem::getText).toList();
            assertTrue(labels.stream().anyMatch(l -> l.startsWith("Add axis")), labels.toString());
            assertTrue(labels.contains("&New"), labels.toString());
            assertTrue(labels.stream().anyMatch(l -> l.startsWith("Delete cascade controller")), labels.toString());
            assertTrue(labels.contains("Show &Properties"), labels.toString());
        } finally {
            menu.notifyListeners(SWT.Hide, new Event());
        }
    }
}
