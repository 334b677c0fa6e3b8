package org.tracewell.model.paths;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.Encoder;
import org.tracewell.model.Machine;
import org.tracewell.model.NotchFilter;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TransferFunctionPlant;

class AttributePathTest {

    private static final TracewellFactory F = TracewellFactory.eINSTANCE;

    /** A two-axis machine in the LM-3020's style (invented demo values). */
    private static Machine machine() {
        Machine m = F.createMachine();
        m.setId("m");
        m.setName("LM-3020");
        m.setInterpolationPeriod(1e-3);
        Axis y = F.createAxis();
        y.setId("m-y");
        y.setName("Y");
        RigidScrewDrive screw = F.createRigidScrewDrive();
        screw.setId("m-y-plant");
        screw.setLoadMass(180);
        y.setPlant(screw);
        CascadeController c = F.createCascadeController();
        c.setId("m-y-controller");
        c.setPositionGain(40);
        NotchFilter notch = F.createNotchFilter();
        notch.setId("m-y-notch");
        notch.setCentreFrequency(136);
        c.getFilterStages().add(notch);
        y.setController(c);
        Encoder e = F.createEncoder();
        e.setId("m-y-encoder");
        e.setCountsPerRevolution(1 << 20);
        y.setEncoder(e);
        m.getAxes().add(y);
        Axis c1 = F.createAxis();
        c1.setId("m-c");
        c1.setName("C");
        c1.setKind(AxisKind.ROTARY);
        TransferFunctionPlant tf = F.createTransferFunctionPlant();
        tf.setId("m-c-plant");
        tf.getNumerator().add(5.0);
        tf.getDenominator().add(1.0);
        tf.getDenominator().add(2.0);
        c1.setPlant(tf);
        m.getAxes().add(c1);
        Contour line = F.createContour();
        line.setId("m-line");
        line.setName("line 45° F10");
        line.setFeed(1 / 6.0);
        m.getContours().add(line);
        BudgetLine thermal = F.createBudgetLine();
        thermal.setId("m-b-thermal");
        thermal.setName("rack expansion");
        thermal.setValue(5e-6);
        m.getBudgetLines().add(thermal);
        return m;
    }

    @Test
    void pathsReachAnyNumericAttributeByNameIdOrPosition() {
        Machine m = machine();
        RigidScrewDrive screw = (RigidScrewDrive) m.getAxes().get(0).getPlant();
        AttributeTarget mass = AttributePath.parse("axis[Y].plant.loadMass").resolve(m);
        assertSame(screw, mass.owner());
        assertEquals(180, mass.get(), 0);
        assertEquals("kg", mass.siUnit());
        mass.set(195.5);
        assertEquals(195.5, screw.getLoadMass(), 0);
        // by id, by position, by the list's own name; keys with spaces and degree signs as the model has them
        assertEquals(40, AttributePath.parse("axes[m-y].controller.positionGain").resolve(m).get(), 0);
        assertEquals(136, AttributePath.parse("axis[0].controller.filterStages[0].centreFrequency").resolve(m).get(), 0);
        assertEquals(136, AttributePath.parse("axis[Y].controller.filterStage[m-y-notch].centreFrequency").resolve(m)
                .get(), 0);
        assertEquals("(m/min)/mm", AttributePath.parse("axis[Y].controller.positionGain").resolve(m).displayUnit());
        assertEquals(1 / 6.0, AttributePath.parse("contour[line 45° F10].feed").resolve(m).get(), 0);
        assertEquals(5e-6, AttributePath.parse("budgetLine[rack expansion].value").resolve(m).get(), 0);
        assertEquals(1e-3, AttributePath.parse("interpolationPeriod").resolve(m).get(), 0);
        // a coefficient of a list of numbers
        AttributeTarget coefficient = AttributePath.parse("axis[C].plant.denominator[1]").resolve(m);
        coefficient.set(2.5);
        assertEquals(2.5, ((TransferFunctionPlant) m.getAxes().get(1).getPlant()).getDenominator().get(1), 0);
        // integer attributes take the nearest integer
        AttributeTarget counts = AttributePath.parse("axis[Y].encoder.countsPerRevolution").resolve(m);
        counts.set(1000.4);
        assertEquals(1000, m.getAxes().get(0).getEncoder().getCountsPerRevolution());
        assertEquals("1/rev", counts.siUnit());
    }

    @Test
    void aBadPathNamesTheSegmentAndWhatIsValidThere() {
        Machine m = machine();
        AttributePathException noAxis = assertThrows(AttributePathException.class,
                () -> AttributePath.parse("axis[X9].plant.loadMass").resolve(m));
        assertTrue(noAxis.getMessage().contains("'axis[X9].plant.loadMass'")
                && noAxis.getMessage().contains("no axis 'X9'") && noAxis.getMessage().contains("Y (m-y)")
                && noAxis.getMessage().contains("C (m-c)"), noAxis.getMessage());
        AttributePathException noAttribute = assertThrows(AttributePathException.class,
                () -> AttributePath.parse("axis[Y].plant.mass").resolve(m));
        assertTrue(noAttribute.getMessage().contains("no feature 'mass'")
                && noAttribute.getMessage().contains("loadMass") && noAttribute.getMessage().contains("lead"),
                noAttribute.getMessage());
        AttributePathException notNumeric = assertThrows(AttributePathException.class,
                () -> AttributePath.parse("axis[Y].name").resolve(m));
        assertTrue(notNumeric.getMessage().contains("not numeric") && notNumeric.getMessage().contains("maxVelocity"),
                notNumeric.getMessage());
        AttributePathException element = assertThrows(AttributePathException.class,
                () -> AttributePath.parse("axis[Y].plant").resolve(m));
        assertTrue(element.getMessage().contains("not a number") && element.getMessage().contains("loadMass"),
                element.getMessage());
        AttributePathException needsKey = assertThrows(AttributePathException.class,
                () -> AttributePath.parse("contour.feed").resolve(m));
        assertTrue(needsKey.getMessage().contains("is a list") && needsKey.getMessage().contains("line 45° F10"),
                needsKey.getMessage());
        AttributePathException missing = assertThrows(AttributePathException.class,
                () -> AttributePath.parse("axis[C].encoder.countsPerRevolution").resolve(m));
        assertTrue(missing.getMessage().contains("has no encoder"), missing.getMessage());
        AttributePathException coefficient = assertThrows(AttributePathException.class,
                () -> AttributePath.parse("axis[C].plant.numerator[3]").resolve(m));
        assertTrue(coefficient.getMessage().contains("numerator[0] to numerator[0]"), coefficient.getMessage());
        AttributePathException syntax = assertThrows(AttributePathException.class,
                () -> AttributePath.parse("axis[Y]..loadMass"));
        assertTrue(syntax.getMessage().contains("segment 2"), syntax.getMessage());
    }

    @Test
    void singularsOfTheMetamodelsLists() {
        assertEquals("contour", AttributePath.singular("contours"));
        assertEquals("axis", AttributePath.singular("axes"));
        assertEquals("libraryAxis", AttributePath.singular("libraryAxes"));
        assertEquals("study", AttributePath.singular("studies"));
        assertEquals("filterStage", AttributePath.singular("filterStages"));
    }
}
