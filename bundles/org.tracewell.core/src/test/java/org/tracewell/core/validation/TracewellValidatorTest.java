package org.tracewell.core.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracewell.core.Examples;
import org.tracewell.core.io.LoadedModel;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.model.Axis;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.Machine;
import org.tracewell.model.NotchFilter;
import org.tracewell.model.RackPinionDrive;
import org.tracewell.model.Requirement;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.model.TransferFunctionPlant;
import org.tracewell.model.TwoMassDrive;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.VariedParameter;

/** Each rule fires on a one-change variant of the LM-3020 and says element, bad value and valid range. */
class TracewellValidatorTest {

    private LoadedModel model;
    private Machine machine;
    private Axis x1;
    private Axis x2;
    private Axis y;

    @BeforeEach
    void load() throws Exception {
        model = new ModelFiles().load(Examples.file(Examples.LM_3020));
        machine = model.machine();
        x1 = machine.getAxes().get(0);
        x2 = machine.getAxes().get(1);
        y = machine.getAxes().get(2);
    }

    private TwoMassDrive yPlant() {
        return (TwoMassDrive) y.getPlant();
    }

    private CascadeController yController() {
        return (CascadeController) y.getController();
    }

    private List<ValidationProblem> validate() {
        return new ModelValidation().validate(machine);
    }

    /** Asserts one problem with the code whose message holds all fragments; returns it. */
    private ValidationProblem expect(String code, String... fragments) {
        List<ValidationProblem> problems = validate();
        for (ValidationProblem p : problems) {
            if (p.code().equals(code) && List.of(fragments).stream().allMatch(p.message()::contains)) {
                return p;
            }
        }
        return fail("no " + code + " problem containing " + List.of(fragments) + " in " + problems);
    }

    @Test
    void theUnchangedExampleIsClean() {
        assertEquals(List.of(), validate());
    }

    @Test
    void negativeLoadMassNamesElementValueAndRange() {
        yPlant().setLoadMass(-12.0);
        ValidationProblem p = expect("tw.positive", "plant (TwoMassDrive) [lm3020-y-plant] of Axis 'Y' [lm3020-y]",
                "load mass = -12 kg", "valid range: > 0 kg");
        assertEquals(ValidationProblem.Severity.ERROR, p.severity());
        assertTrue(p.position().isPresent() && p.position().get().line() > 0, "problem carries the file position");
        assertTrue(p.toString().contains("LM-3020.machine:"), p.toString());
    }

    @Test
    void zeroLeadIsShownInMillimetres() {
        yPlant().setLead(0.0);
        expect("tw.positive", "lead = 0 mm", "valid range: > 0 mm");
    }

    @Test
    void negativeInertiaIsShownInKgCm2() {
        ((RackPinionDrive) x1.getPlant()).setMotorInertia(-8.0e-4);
        expect("tw.positive", "motor inertia = -8 kg·cm²", "> 0 kg·cm²");
    }

    @Test
    void notANumberIsReportedOnce() {
        yPlant().setNutStiffness(Double.NaN);
        expect("tw.finite", "nut stiffness = NaN", "valid: a finite number in N/µm");
        long count = validate().stream().filter(p -> p.message().contains("nut stiffness")).count();
        assertEquals(1, count, "NaN is not also reported as not positive");
    }

    @Test
    void nonPositiveKvIsShownInTradeUnits() {
        yController().setPositionGain(0.0);
        expect("tw.positive", "position gain = 0.0 (m/min)/mm", "> 0.0 (m/min)/mm");
    }

    @Test
    void feedforwardOutsideZeroToOne() {
        yController().setVelocityFeedforward(1.2);
        expect("tw.range", "velocity feedforward = 120 %", "valid range: [0 % … 100 %]");
        yController().setVelocityFeedforward(0.5);
        yController().setAccelerationFeedforward(-0.1);
        expect("tw.range", "acceleration feedforward = -10 %");
    }

    @Test
    void samplePeriodMustBePositive() {
        yController().setPositionSamplePeriod(0.0);
        expect("tw.positive", "position sample period = 0 ms", "> 0 ms");
    }

    @Test
    void samplePeriodLongerThanTheLoopTimeConstant() {
        // Kv = 40 1/s: 1/Kv = 25 ms, so Kv·T ≤ 0.1 allows at most 2.5 ms.
        yController().setPositionSamplePeriod(0.004);
        machine.setInterpolationPeriod(0.004);
        expect("tw.samplePeriod", "position sample period 4 ms", "1/Kv = 25 ms", "valid: ≤ 2.5 ms");
    }

    @Test
    void velocityLoopSlowerThanPositionLoop() {
        yController().setVelocitySamplePeriod(0.001);
        expect("tw.samplePeriod", "velocity sample period 1 ms is longer", "position sample period 0.5 ms");
    }

    @Test
    void filterAboveNyquist() {
        // Velocity loop at 125 µs: Nyquist 4 kHz.
        ((NotchFilter) yController().getFilterStages().get(0)).setCentreFrequency(5000.0);
        expect("tw.samplePeriod", "5000 Hz", "Nyquist frequency 4000 Hz");
    }

    @Test
    void nutRangeBeyondTheBearingSpan() {
        yPlant().setNutPositionMax(2.5);
        expect("tw.range", "nut position max 2500 mm", "bearing span 2300 mm");
    }

    @Test
    void improperTransferFunction() {
        TransferFunctionPlant tf = TracewellFactory.eINSTANCE.createTransferFunctionPlant();
        tf.getNumerator().addAll(List.of(1.0, 2.0, 3.0));
        tf.getDenominator().addAll(List.of(1.0, 5.0));
        tf.setRatio(0.01 / (2 * Math.PI));
        tf.setEquivalentInertia(1.6e-3);
        tf.setTorqueConstant(0.95);
        y.setPlant(tf);
        expect("tw.transferFunction", "numerator degree 2 exceeds denominator degree 1");
        tf.getNumerator().clear();
        tf.getNumerator().addAll(List.of(2.0, 3.0));
        expect("tw.transferFunction", "expected a strictly proper plant");
        tf.setRatio(-1.0);
        expect("tw.positive", "ratio = -6283 mm/rev", "> 0 mm/rev");
    }

    @Test
    void missingPlantAndController() {
        y.setPlant(null);
        y.setController(null);
        expect("tw.missing", "Axis 'Y' [lm3020-y]: has no plant");
        expect("tw.missing", "Axis 'Y' [lm3020-y]: has no controller");
    }

    @Test
    void gantryPartnerMustPointBack() {
        x2.setGantryPartner(null);
        expect("tw.gantry", "Axis 'X1' [lm3020-x1]: names Axis 'X2' [lm3020-x2] as gantry partner",
                "that axis names no partner");
    }

    @Test
    void gantryPartnerMustNotBeItself() {
        x1.setGantryPartner(x1);
        x2.setGantryPartner(null);
        expect("tw.gantry", "is its own gantry partner");
    }

    @Test
    void axisNamesMustBeUnique() {
        x2.setName("X1");
        expect("tw.duplicateName", "two axes are named 'X1'");
    }

    @Test
    void contourUsingAnAxisTheMachineLacks() throws Exception {
        Machine mill = new ModelFiles().load(Examples.file(Examples.LM_T5)).machine();
        Contour circle = machine.getContours().get(0);
        circle.getAxisAssignment().set(1, mill.getAxes().get(1));
        expect("tw.axisNotInMachine", "Contour 'circle R100 F3 CCW'", "uses Axis 'Y' [lmt5-y]",
                "expected one of X1, X2, Y, Z");
    }

    @Test
    void requirementLimitMustBePositiveAndHaveAUnit() {
        Requirement r1 = machine.getRequirements().get(0);
        r1.setLimit(-2.5e-5);
        expect("tw.positive", "requirement [lm3020-r1]", "limit = -25 µm", "> 0 µm");
        r1.setLimit(2.5e-5);
        r1.setDisplayUnit(null);
        expect("tw.unit", "has no unit", "µm");
        r1.setDisplayUnit("deg");
        expect("tw.unit", "unit 'deg' does not measure contour deviation", "valid: m, mm, µm");
        r1.setDisplayUnit("µm");
        r1.eUnset(Literals.REQUIREMENT__LIMIT);
        expect("tw.missing", "has no limit");
    }

    @Test
    void allocationWithoutAxisAndContourRequirementWithoutContour() {
        machine.getRequirements().get(2).setAllocatedAxis(null);
        expect("tw.missing", "requirement [lm3020-r1-x1-kv]", "without an allocated axis");
        machine.getRequirements().get(0).getContours().clear();
        expect("tw.missing", "requirement [lm3020-r1]", "without a contour");
    }

    @Test
    void requirementCycle() {
        Requirement r1 = machine.getRequirements().get(0);
        r1.setParent(machine.getRequirements().get(2));
        expect("tw.requirementTree", "derived from itself");
    }

    @Test
    void budgetLineWithoutAxisAndOutOfRangeSensitivity() {
        BudgetLine line = machine.getBudgetLines().get(0);
        line.setAxis(null);
        expect("tw.missing", "budget line 'Kv mismatch' [lm3020-b-x1-mismatch]", "has no axis");
        line.setAxis(x1);
        line.setSensitivity(1.5);
        expect("tw.range", "sensitivity = 1.5", "valid range: [-1 … 1]");
    }

    @Test
    void librarySharedAxisProblemsAreFoundThroughTheMachine() {
        Axis z = machine.getLibraryAxes().get(0);
        ((CascadeController) z.getController()).setVelocityIntegralTime(-0.005);
        ValidationProblem p = expect("tw.positive", "velocity integral time = -5 ms");
        assertTrue(p.toString().contains("z-slide-25x5.axis:"), p.toString());
    }

    @Test
    void duplicateIdsAreFoundByEmfStructuralChecks() {
        Axis copy = EcoreUtil.copy(y);
        copy.setName("Y2");
        machine.getAxes().add(copy);
        List<ValidationProblem> problems = validate();
        assertTrue(problems.stream().anyMatch(p -> p.code().startsWith("emf.") && p.message().contains("lm3020-y")),
                problems.toString());
    }

    @Test
    void idWithCharactersThatBreakReferences() {
        machine.getContours().get(0).setId("circle#1");
        expect("tw.id", "id 'circle#1' may contain only");
    }

    @Test
    void studyWithABadPathOrMetricNamesWhatIsValid() {
        VariationStudy study = machine.getStudies().get(0);
        VariedParameter mass = study.getParameters().get(0);
        mass.setPath("axis[X1].plant.mass");
        expect("tw.study", "parameters (VariedParameter) [lm3020-study-tolerances-x1-mass]", "'axis[X1].plant.mass'",
                "no feature 'mass'", "loadMass");
        mass.setPath("axis[X1].plant.loadMass");
        study.getMetrics().add("contour[line 45° F10].G");
        expect("tw.study", "Variation study 'XY tolerances'", "G is defined on full circles", "maxContourError");
    }

    @Test
    void toleranceNeedsItsWidthAndARangeHoldingTheNominal() {
        VariationStudy study = machine.getStudies().get(0);
        VariedParameter kv = study.getParameters().get(2);
        kv.setSigma(0);
        expect("tw.positive", "[lm3020-study-tolerances-x1-kv]", "sigma = 0", "standard deviation");
        kv.setSigma(0.04);
        kv.setMinimum(41);
        expect("tw.range", "nominal value 40.0 of axis[X1].controller.positionGain", "[41.0, 42.0]");
        kv.setMaximum(39);
        expect("tw.range", "physical range [41.0, 39.0] is empty");
        study.setVariantCount(200_000);
        expect("tw.range", "variant count = 200000", "1 … 100000");
    }

    @Test
    void sweepTakesOneOrTwoParametersWithTwoEndsAndSteps() {
        VariationStudy sweep = machine.getStudies().get(1);
        VariedParameter y = sweep.getParameters().get(0);
        y.setSteps(1);
        expect("tw.range", "[lm3020-study-kv-sweep-y]", "steps = 1", "2 … 1000");
        y.setSteps(9);
        y.setTo(y.getFrom());
        expect("tw.study", "two different ends");
        sweep.getParameters().add(EcoreUtil.copy(y));
        sweep.getParameters().get(2).setId("extra");
        expect("tw.study", "is a sweep of 3 parameters", "1 (a curve) or 2");
        expect("tw.study", "varies axis[Y].controller.positionGain twice");
    }
}
