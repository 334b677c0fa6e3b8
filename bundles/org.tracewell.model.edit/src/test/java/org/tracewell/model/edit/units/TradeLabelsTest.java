package org.tracewell.model.edit.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.junit.jupiter.api.Test;
import org.tracewell.model.Axis;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.BudgetSource;
import org.tracewell.model.CascadeController;
import org.tracewell.model.ContourMetric;
import org.tracewell.model.ErrorClass;
import org.tracewell.model.Machine;
import org.tracewell.model.NotchFilter;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.StudyKind;
import org.tracewell.model.ToleranceShape;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.VariedParameter;
import org.tracewell.model.provider.TracewellItemProviderAdapterFactory;

class TradeLabelsTest {

    private static final TracewellFactory F = TracewellFactory.eINSTANCE;

    private static Axis yAxis() {
        Axis y = F.createAxis();
        y.setName("Y");
        RigidScrewDrive screw = F.createRigidScrewDrive();
        screw.setLead(0.010);
        screw.setLoadMass(180.0);
        y.setPlant(screw);
        CascadeController controller = F.createCascadeController();
        controller.setPositionGain(50.0); // 50 1/s = 3.0 (m/min)/mm
        controller.setVelocityIntegralTime(0.006);
        y.setController(controller);
        return y;
    }

    /** The LM-3020's G ≤ 25 µm. */
    private static Requirement circularDeviationLimit() {
        Requirement g = F.createRequirement();
        g.setId("lm3020-r1");
        g.setKind(RequirementKind.CONTOUR_DEVIATION);
        g.setMetric(ContourMetric.CIRCULAR_DEVIATION);
        g.setLimit(25e-6);
        g.setDisplayUnit("µm");
        return g;
    }

    @Test
    void axisLabelInTradeUnits() {
        assertEquals("Y · ball screw 10 mm · Kv 3.0 (m/min)/mm", TradeLabels.text(yAxis()));
    }

    @Test
    void itemProvidersUseTheTradeLabels() {
        TracewellItemProviderAdapterFactory factory = new TracewellItemProviderAdapterFactory();
        Axis y = yAxis();
        IItemLabelProvider labels = (IItemLabelProvider) factory.adapt(y, IItemLabelProvider.class);
        assertEquals("Y · ball screw 10 mm · Kv 3.0 (m/min)/mm", labels.getText(y));
        IItemLabelProvider plantLabels = (IItemLabelProvider) factory.adapt(y.getPlant(), IItemLabelProvider.class);
        assertEquals("ball screw 10 mm · load 180 kg", plantLabels.getText(y.getPlant()));
        factory.dispose();
    }

    @Test
    void changingTheControllerRefreshesTheAxisLabel() {
        TracewellItemProviderAdapterFactory factory = new TracewellItemProviderAdapterFactory();
        Axis y = yAxis();
        factory.adapt(y, IItemLabelProvider.class);
        factory.adapt(y.getController(), IItemLabelProvider.class);
        java.util.List<Object> refreshed = new java.util.ArrayList<>();
        factory.addListener(n -> refreshed.add(((org.eclipse.emf.edit.provider.ViewerNotification) n).getElement()));
        ((CascadeController) y.getController()).setPositionGain(40.0);
        assertEquals(java.util.List.of(y.getController(), y), refreshed);
        factory.dispose();
    }

    @Test
    void controllerFilterRequirementBudgetAndMachineLabels() {
        Axis y = yAxis();
        assertEquals("cascade · Kv 3.0 (m/min)/mm · Tn 6 ms", TradeLabels.text(y.getController()));
        NotchFilter notch = F.createNotchFilter();
        notch.setCentreFrequency(110.0);
        notch.setWidth(30.0);
        assertEquals("notch 110 Hz, width 30 Hz", TradeLabels.text(notch));

        assertEquals("lm3020-r1 · circular deviation G ≤ 25 µm", TradeLabels.text(circularDeviationLimit()));

        BudgetLine line = F.createBudgetLine();
        line.setAxis(y);
        line.setSource(BudgetSource.FRICTION_REVERSAL);
        line.setValue(3.5e-6);
        line.setErrorClass(ErrorClass.SYSTEMATIC);
        assertEquals("Y friction reversal · 3.5 µm systematic", TradeLabels.text(line));

        Machine m = F.createMachine();
        m.setName("LM-3020");
        m.getAxes().add(y);
        assertEquals("LM-3020 · 1 axis", TradeLabels.text(m));
    }

    @Test
    void inchSystemShowsLengthsInInches() {
        try {
            org.tracewell.model.units.UnitSystem.activate(org.tracewell.model.units.UnitSystem.INCH);
            // 10 mm lead = 0.3937 in (10 / 25.4, international inch); 50 1/s = 3.0 (in/min)/mil = 3.0 (m/min)/mm
            // (common practice: both are 1000/60 1/s).
            assertEquals("Y · ball screw 0.3937 in · Kv 3.0 (in/min)/mil", TradeLabels.text(yAxis()));
            // 25 µm = 984.3 µin (25e-6 / 25.4e-9).
            assertEquals("lm3020-r1 · circular deviation G ≤ 984.3 µin", TradeLabels.text(circularDeviationLimit()));
        } finally {
            org.tracewell.model.units.UnitSystem.activate(org.tracewell.model.units.UnitSystem.METRIC);
        }
    }

    @Test
    void studiesAndVariedParametersShowTheSpreadInTheTargetsTradeUnit() {
        Machine machine = F.createMachine();
        machine.getAxes().add(yAxis());
        VariationStudy study = F.createVariationStudy();
        study.setName("Y tolerances");
        study.setVariantCount(2000);
        study.setSeed(3020);
        VariedParameter kv = F.createVariedParameter();
        kv.setPath("axis[Y].controller.positionGain");
        kv.setSigma(0.5); // 0.5 1/s = 0.03 (m/min)/mm
        VariedParameter mass = F.createVariedParameter();
        mass.setPath("axis[Y].plant.loadMass");
        mass.setShape(ToleranceShape.UNIFORM);
        mass.setHalfWidth(25);
        mass.setMinimum(150);
        study.getParameters().add(kv);
        study.getParameters().add(mass);
        machine.getStudies().add(study);
        assertEquals("Y tolerances · Monte-Carlo 2000 variants, seed 3020 · 2 parameters", TradeLabels.text(study));
        assertEquals("axis[Y].controller.positionGain · normal σ 0.03 (m/min)/mm", TradeLabels.text(kv));
        assertEquals("axis[Y].plant.loadMass · uniform ± 25 kg in [150 kg, ∞]", TradeLabels.text(mass));
        study.setKind(StudyKind.SWEEP);
        kv.setFrom(40);
        kv.setTo(60);
        kv.setSteps(11);
        assertEquals("axis[Y].controller.positionGain · 2.4 (m/min)/mm to 3.6 (m/min)/mm, 11 points",
                TradeLabels.text(kv));
        // a path that leads nowhere still labels, with the bare SI number
        kv.setPath("axis[Q].controller.positionGain");
        assertEquals("axis[Q].controller.positionGain · 40 to 60, 11 points", TradeLabels.text(kv));
    }
}
