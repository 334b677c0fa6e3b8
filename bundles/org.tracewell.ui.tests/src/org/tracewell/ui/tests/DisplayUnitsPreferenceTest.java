package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.LoopAnalysisViewTest.waitFor;
import static org.tracewell.ui.tests.MachineEditorTest.copyExamples;

import java.nio.file.Path;
import java.util.Arrays;

import org.eclipse.swt.widgets.Text;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.model.Axis;
import org.tracewell.model.CascadeController;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.model.units.UnitSystem;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.editor.ModelPage;
import org.tracewell.ui.prefs.TracewellPreferences;

/** Window → Preferences → Tracewell → Display units: inch changes what the editor shows, not what it stores. */
class DisplayUnitsPreferenceTest {

    private final IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();

    @AfterEach
    void backToMetric() {
        TracewellPreferences.store().setToDefault(TracewellPreferences.UNIT_SYSTEM);
        page.closeAllEditors(false);
    }

    private static String label(ModelPage axes, String axisName) {
        return Arrays.stream(axes.tree().getTree().getItems()).map(TreeItem::getText)
                .filter(t -> t.startsWith(axisName + " ")).findFirst().orElseThrow();
    }

    @Test
    void inchPreferenceChangesTreeLabelsAndFormsAndEntriesFollowIt(@TempDir Path temp) throws Exception {
        MachineEditor editor = MachineEditor.open(page, copyExamples(temp).resolve("LM-3020.machine"));
        ModelPage axes = editor.pages().get(0);
        assertEquals("Y · ball screw 10 mm, two-mass · Kv 2.4 (m/min)/mm", label(axes, "Y"));

        TracewellPreferences.store().setValue(TracewellPreferences.UNIT_SYSTEM, UnitSystem.INCH.name());
        assertEquals(UnitSystem.INCH, UnitSystem.active());
        // 10 mm = 0.3937 in (international inch, 25.4 mm); 40 1/s = 2.4 (in/min)/mil = 2.4 (m/min)/mm (common
        // practice: both units are 1000/60 1/s).
        waitFor(() -> label(axes, "Y").equals("Y · ball screw 0.3937 in, two-mass · Kv 2.4 (in/min)/mil"));

        CascadeController controller = (CascadeController) editor.model().machine().getAxes().get(2).getController();
        assertTrue(editor.reveal(controller));
        Text kv = (Text) axes.form().field(Literals.CASCADE_CONTROLLER__POSITION_GAIN).orElseThrow();
        assertEquals("2.4 (in/min)/mil", kv.getText());
        // A bare number is read in the unit shown; the model keeps SI.
        assertTrue(editor.valueEntry().enter(controller, Literals.CASCADE_CONTROLLER__POSITION_GAIN, "3").isEmpty());
        assertEquals(50.0, controller.getPositionGain(), 1e-9, "3 (in/min)/mil = 50 1/s");
        // A metric entry is still understood.
        assertTrue(editor.valueEntry().enter(controller, Literals.CASCADE_CONTROLLER__POSITION_GAIN, "2.4 (m/min)/mm")
                .isEmpty());
        assertEquals(40.0, controller.getPositionGain(), 1e-9);
        // The inch trade's shorthand: 787.4 ipm = 787.4 · 0.0254 m/min = 20.0 m/min; 2.4 ipm/mil = 40 1/s.
        Axis y = editor.model().machine().getAxes().get(2);
        assertTrue(editor.valueEntry().enter(y, Literals.AXIS__MAX_VELOCITY, "787.4 ipm").isEmpty());
        assertEquals(20.0 / 60.0, y.getMaxVelocity(), 1e-5 * 20.0 / 60.0, "787.4 ipm is 20 m/min to 4 digits");
        assertTrue(editor.valueEntry().enter(controller, Literals.CASCADE_CONTROLLER__POSITION_GAIN, "2.4 ipm/mil")
                .isEmpty());
        assertEquals(40.0, controller.getPositionGain(), 1e-9);

        TracewellPreferences.store().setValue(TracewellPreferences.UNIT_SYSTEM, UnitSystem.METRIC.name());
        waitFor(() -> label(axes, "Y").contains("10 mm"));
    }
}
