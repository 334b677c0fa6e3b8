package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.LoopAnalysisViewTest.waitFor;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.handlers.IHandlerService;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.model.Axis;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.editor.ModelPage;
import org.tracewell.ui.views.LoopAnalysisView;

/**
 * The Machine Editor as a user drives it: open the LM-3020, select axis Y, change its Kv, watch the Loop Analysis
 * view, undo and redo through the workbench's Edit commands, save and reload.
 */
class MachineEditorTest {

    /** 1 (m/min)/mm = (1/60 m/s)/(1e-3 m) = 16.667 1/s (DOMAIN.md §4, common practice). */
    private static final double ONE_M_PER_MIN_PER_MM = 1000.0 / 60.0;

    private MachineEditor editor;

    @AfterEach
    void closeEditor() {
        if (editor != null) {
            editor.getSite().getPage().closeEditor(editor, false);
        }
    }

    @Test
    void kvEditShowsInLoopAnalysisUndoRestoresItAndSaveReloadsEqual(@TempDir Path temp) throws Exception {
        Path machineFile = copyExamples(temp).resolve("LM-3020.machine");
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        LoopAnalysisView view = (LoopAnalysisView) page.showView(LoopAnalysisView.ID);
        editor = MachineEditor.open(page, machineFile);
        assertEquals(List.of("Axes", "Contours", "Requirements", "Budget", "Studies"),
                editor.pages().stream().map(p -> p.title()).toList());

        Machine machine = editor.model().machine();
        Axis y = axis(machine, "Y");
        CascadeController controller = assertInstanceOf(CascadeController.class, y.getController());
        double oldKv = controller.getPositionGain();
        assertTrue(editor.reveal(y), "axis Y is on a page");
        waitFor(() -> view.followedAxis() == y && "Y · position loop".equals(view.shownTitle())
                && Math.abs(view.shownAnalysis().steadyState().kv() - oldKv) < 1e-6 * oldKv);

        // A rejected entry changes nothing: m/min is a feed, not a position gain.
        Optional<String> wrongUnit = editor.valueEntry().enter(controller, Literals.CASCADE_CONTROLLER__POSITION_GAIN,
                "3 m/min");
        assertTrue(wrongUnit.isPresent() && wrongUnit.get().contains("(m/min)/mm"), wrongUnit.toString());
        Optional<String> negative = editor.valueEntry().enter(controller, Literals.CASCADE_CONTROLLER__POSITION_GAIN,
                "-2");
        assertTrue(negative.isPresent(), "a negative Kv is refused by the validation rules");
        assertEquals(oldKv, controller.getPositionGain(), 0.0);
        assertFalse(editor.isDirty());

        // The edit, through the path the form uses: 3.6 (m/min)/mm = 60 1/s.
        double newKv = 3.6 * ONE_M_PER_MIN_PER_MM;
        long[] drawn = {0};
        view.addRedrawListener(analysis -> drawn[0] = System.nanoTime());
        long edited = System.nanoTime();
        Optional<String> accepted = editor.valueEntry().enter(controller, Literals.CASCADE_CONTROLLER__POSITION_GAIN,
                "3.6 (m/min)/mm");
        assertTrue(accepted.isEmpty(), accepted.toString());
        assertEquals(60.0, controller.getPositionGain(), 1e-9, "stored in SI, 1/s");
        waitFor(() -> Math.abs(view.shownAnalysis().steadyState().kv() - newKv) < 1e-6 * newKv);
        double editToRedrawMs = (drawn[0] - edited) / 1e6;
        long[] job = view.lastJobNanos();
        // One cold edit; EditRedrawLatencyTest measures warm edits and writes the figures file.
        System.out.printf("Machine Editor: first Kv edit -> Loop Analysis redraw %.1f ms (analysis %.1f ms,"
                + " charts %.1f ms)%n", editToRedrawMs, job[0] / 1e6, job[1] / 1e6);
        assertTrue(editor.isDirty());
        TreeItem yItem = Arrays.stream(editor.pages().get(0).tree().getTree().getItems())
                .filter(i -> i.getText().startsWith("Y ")).findFirst().orElseThrow();
        assertTrue(yItem.getText().contains("Kv 3.6 (m/min)/mm"), yItem.getText());

        IHandlerService handlers = editor.getSite().getService(IHandlerService.class);
        handlers.executeCommand("org.eclipse.ui.edit.undo", null);
        assertEquals(oldKv, controller.getPositionGain(), 0.0);
        waitFor(() -> Math.abs(view.shownAnalysis().steadyState().kv() - oldKv) < 1e-6 * oldKv);
        assertFalse(editor.isDirty(), "undone to the saved state");

        handlers.executeCommand("org.eclipse.ui.edit.redo", null);
        waitFor(() -> Math.abs(view.shownAnalysis().steadyState().kv() - newKv) < 1e-6 * newKv);
        assertTrue(editor.isDirty());

        editor.doSave(null);
        assertFalse(editor.isDirty());
        assertTrue(Files.exists(machineFile.resolveSibling("LM-3020.machine.bak")), "previous version kept");
        Machine reloaded = new ModelFiles().loadMachine(machineFile);
        assertTrue(new EcoreUtil.EqualityHelper().equals(machine, reloaded), "reloaded machine equals the edited one");
        assertEquals(60.0, ((CascadeController) axis(reloaded, "Y").getController()).getPositionGain(), 1e-9);
    }

    @Test
    void formRejectsAnInvalidEntryInPlaceAndKeepsTheValue(@TempDir Path temp) throws Exception {
        Path machineFile = copyExamples(temp).resolve("LM-3020.machine");
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        editor = MachineEditor.open(page, machineFile);
        CascadeController controller = (CascadeController) axis(editor.model().machine(), "Y").getController();
        double kv = controller.getPositionGain();
        assertTrue(editor.reveal(controller));
        ModelPage axes = editor.pages().get(0);
        Text field = (Text) axes.form().field(Literals.CASCADE_CONTROLLER__POSITION_GAIN).orElseThrow();
        assertEquals(org.tracewell.model.units.UnitTable.format(kv, "(m/min)/mm"), field.getText());

        field.setText("fast");
        field.notifyListeners(SWT.DefaultSelection, new Event());
        Optional<String> reason = axes.form().rejection(Literals.CASCADE_CONTROLLER__POSITION_GAIN);
        assertTrue(reason.isPresent() && reason.get().contains("not a number"), reason.toString());
        assertEquals("fast", field.getText(), "the entry stays for correction");
        assertEquals(kv, controller.getPositionGain(), 0.0);
        assertFalse(editor.isDirty());

        field.setText("40 1/s");
        field.notifyListeners(SWT.DefaultSelection, new Event());
        assertTrue(axes.form().rejection(Literals.CASCADE_CONTROLLER__POSITION_GAIN).isEmpty());
        assertEquals(40.0, controller.getPositionGain(), 0.0);
        // 40 1/s = 2.4 (m/min)/mm (common practice, 16.667 1/s per (m/min)/mm)
        assertEquals("2.4 (m/min)/mm", field.getText());
    }

    @Test
    void libraryAxisIsMarkedAndItsEditsSaveToTheAxisFile(@TempDir Path temp) throws Exception {
        Path folder = copyExamples(temp);
        Path machineFile = folder.resolve("LM-3020.machine");
        Path axisFile = folder.resolve("library/z-slide-25x5.axis");
        String machineBefore = Files.readString(machineFile);
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        editor = MachineEditor.open(page, machineFile);
        Axis z = axis(editor.model().machine(), "Z");
        assertTrue(editor.isLibraryAxis(z));
        String banner = editor.libraryBanner(z.getController()).orElseThrow();
        assertTrue(banner.startsWith("Shared library axis — used by: LM-3020, LM-T5"), banner);
        assertTrue(editor.reveal(z));
        Control bannerShown = editor.pages().get(0).form().control();
        assertTrue(bannerShown.isVisible());

        CascadeController controller = (CascadeController) z.getController();
        // No unit typed: the unit the field shows, (m/min)/mm; 2.7 (m/min)/mm = 45 1/s.
        assertTrue(editor.valueEntry().enter(controller, Literals.CASCADE_CONTROLLER__POSITION_GAIN, "2.7").isEmpty());
        assertEquals(2.7 * ONE_M_PER_MIN_PER_MM, controller.getPositionGain(), 1e-9);
        editor.doSave(null);
        assertEquals(machineBefore, Files.readString(machineFile), "the machine file itself did not change");
        CascadeController saved = (CascadeController) new ModelFiles().load(axisFile).axis().getController();
        assertEquals(2.7 * ONE_M_PER_MIN_PER_MM, saved.getPositionGain(), 1e-9);
    }

    private static Axis axis(Machine machine, String name) {
        return Stream.concat(machine.getAxes().stream(), machine.getLibraryAxes().stream())
                .filter(a -> name.equals(a.getName())).findFirst()
                .orElseThrow(() -> new AssertionError("no axis " + name + " in " + machine.getName()));
    }

    /** The examples folder (walking up from the working directory) copied into {@code target}. */
    static Path copyExamples(Path target) throws IOException {
        Path source = null;
        for (Path dir = Path.of("").toAbsolutePath(); dir != null && source == null; dir = dir.getParent()) {
            if (Files.isRegularFile(dir.resolve("examples/LM-3020.machine"))) {
                source = dir.resolve("examples");
            }
        }
        if (source == null) {
            throw new IllegalStateException("examples/LM-3020.machine not found above " + Path.of("").toAbsolutePath());
        }
        Path from = source;
        try (Stream<Path> files = Files.walk(from)) {
            for (Path p : files.toList()) {
                Path to = target.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(to);
                } else {
                    Files.copy(p, to);
                }
            }
        }
        return target;
    }
}
