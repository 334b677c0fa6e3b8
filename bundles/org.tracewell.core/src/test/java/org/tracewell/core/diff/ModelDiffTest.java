package org.tracewell.core.diff;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracewell.core.Examples;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TwoMassDrive;

class ModelDiffTest {

    private final ModelFiles files = new ModelFiles();

    private Machine router() throws Exception {
        return files.loadMachine(Examples.file(Examples.LM_3020));
    }

    @Test
    void sameModelHasNoDifferences() throws Exception {
        assertEquals(List.of(), ModelDiff.compare(router(), router()));
    }

    @Test
    void changedValuesAreShownOldToNewInDisplayUnits() throws Exception {
        Machine before = router();
        Machine after = router();
        ((CascadeController) after.getAxes().get(2).getController()).setPositionGain(50.0);
        ((TwoMassDrive) after.getAxes().get(2).getPlant()).setLead(0.005);
        List<String> changes = ModelDiff.compare(before, after).stream().map(ModelChange::toString).toList();
        assertEquals(List.of(
                "~ plant (TwoMassDrive) [lm3020-y-plant] of Axis 'Y' [lm3020-y] › lead: 10 mm → 5 mm",
                "~ controller (CascadeController) [lm3020-y-controller] of Axis 'Y' [lm3020-y] › position gain:"
                        + " 2.4 (m/min)/mm → 3.0 (m/min)/mm"), changes);
    }

    @Test
    void addedAndRemovedElementsAreListedOnceAtTheirTop() throws Exception {
        Machine before = router();
        Machine after = router();
        after.getContours().remove(2);
        var contour = TracewellFactory.eINSTANCE.createContour();
        contour.setId("lm3020-corner");
        contour.setName("corner");
        var line = TracewellFactory.eINSTANCE.createLine();
        line.setId("lm3020-corner-line");
        contour.getSegments().add(line);
        after.getContours().add(contour);
        List<ModelChange> changes = ModelDiff.compare(before, after);
        assertTrue(changes.stream().anyMatch(c -> c.kind() == ModelChange.Kind.ADDED && c.id().equals("lm3020-corner")),
                changes.toString());
        assertTrue(changes.stream().noneMatch(c -> c.id().equals("lm3020-corner-line")), "child of an added element");
        assertTrue(changes.stream().anyMatch(c -> c.kind() == ModelChange.Kind.REMOVED && c.id().equals("lm3020-line-45")),
                changes.toString());
        assertEquals(2, changes.size(), "no order change reported for an addition and a removal: " + changes);
        after.getRequirements().get(1).getContours().clear();
        after.getRequirements().get(1).getContours().add(after.getContours().get(0));
        assertTrue(ModelDiff.compare(before, after).stream().anyMatch(c -> c.id().equals("lm3020-r2")
                && c.feature().equals("contours") && c.oldValue().equals("lm3020-line-45")
                && c.newValue().equals("lm3020-circle-r100-ccw")), "references are shown as ids");
    }

    @Test
    void reorderedChildrenAreReported() throws Exception {
        Machine before = router();
        Machine after = router();
        var stages = ((CascadeController) after.getAxes().get(2).getController()).getFilterStages();
        stages.move(0, 1);
        List<String> changes = ModelDiff.compare(before, after).stream().map(ModelChange::toString).toList();
        assertEquals(List.of("~ controller (CascadeController) [lm3020-y-controller] of Axis 'Y' [lm3020-y]"
                + " › order of filter stages: lm3020-y-notch, lm3020-y-lowpass → lm3020-y-lowpass, lm3020-y-notch"),
                changes);
    }

    @Test
    void libraryAxesAreComparedToo() throws Exception {
        Machine before = router();
        Machine after = router();
        ((CascadeController) after.getLibraryAxes().get(0).getController()).setVelocityFeedforward(0.8);
        List<String> changes = ModelDiff.compare(before, after).stream().map(ModelChange::toString).toList();
        assertEquals(List.of("~ controller (CascadeController) [z-slide-25x5-controller] of Axis 'Z' [z-slide-25x5]"
                + " › velocity feedforward: 0 % → 80 %"), changes);
    }
}
