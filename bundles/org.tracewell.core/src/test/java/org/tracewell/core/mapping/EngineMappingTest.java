package org.tracewell.core.mapping;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracewell.core.Examples;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.engine.axis.AxisModel;
import org.tracewell.engine.axis.PositionSensor;
import org.tracewell.engine.axis.TwoMassScrewDrive;
import org.tracewell.engine.tf.TransferFunction;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TransferFunctionPlant;

class EngineMappingTest {

    private final ModelFiles files = new ModelFiles();

    private Machine router() throws Exception {
        return files.loadMachine(Examples.file(Examples.LM_3020));
    }

    @Test
    void bothExamplesMapCompletely() throws Exception {
        MachineInputs router = EngineMapping.map(router());
        assertEquals(List.of("X1", "X2", "Y", "Z"), router.axes().stream().map(MappedAxis::name).toList());
        assertEquals(3, router.contours().size());
        assertEquals("lm3020-x2", router.axis("lm3020-x1").orElseThrow().gantryPartner().orElseThrow());
        MachineInputs mill = EngineMapping.map(files.loadMachine(Examples.file(Examples.LM_T5)));
        assertEquals(List.of("X", "Y", "Z", "A", "C"), mill.axes().stream().map(MappedAxis::name).toList());
        assertTrue(mill.axis("a-trunnion-i100").orElseThrow().rotary());
        assertEquals(PositionSensor.LOAD, mill.axis("lmt5-x").orElseThrow().model().sensor());
        assertEquals(PositionSensor.MOTOR, router.axis("lm3020-y").orElseThrow().model().sensor());
    }

    @Test
    void twoMassScrewIsEvaluatedAtMidSpanWithTheSeriesStiffnessChain() throws Exception {
        AxisModel y = EngineMapping.map(router()).axis("lm3020-y").orElseThrow().model();
        TwoMassScrewDrive plant = assertInstanceOf(TwoMassScrewDrive.class, y.plant());
        // Fixed-fixed screw, bearing span 2.3 m, nut range 0.15..2.15 m: softest at mid-span a = L/2 = 1.15 m.
        assertEquals(1.15, plant.nutPosition(), 1e-12);
        // Independent recomputation (DOMAIN.md §3, Altintas et al., CIRP Annals 60(2), 2011): fixed-fixed minimum
        // k = 4·E·A/L at mid-span, in series with nut and bearing, 1/k = Σ 1/k_i; E = 2.1e11 Pa for steel
        // (common practice), root diameter 21.5 mm. Tolerance: rounding only (1e-9 relative).
        double area = Math.PI * 0.0215 * 0.0215 / 4;
        double screw = 4 * 2.1e11 * area / 2.3;
        double chain = 1 / (1 / screw + 1 / 6.0e8 + 1 / 7.5e8);
        assertEquals(chain, plant.axialStiffness(), 1e-9 * chain);
        // First axial mode (1/2π)·√(k/m), m = 180 kg: must lie in the trade range 20–150 Hz (DOMAIN.md §8,
        // common practice) for the example to be plausible; value ≈ 105 Hz.
        double modeHz = Math.sqrt(chain / 180.0) / (2 * Math.PI);
        assertEquals(modeHz, plant.firstAxialModeRadPerSec(1.15) / (2 * Math.PI), 1e-9 * modeHz);
        assertTrue(modeHz > 20 && modeHz < 150, "first axial mode " + modeHz + " Hz");
    }

    @Test
    void unitsAndReferenceFramesAreConverted() throws Exception {
        MachineInputs router = EngineMapping.map(router());
        var y = router.axis("lm3020-y").orElseThrow().model();
        // Velocity gain: 2.0e5 N·s/m at the load → K·ρ² at the motor, ρ = h/2π = 0.01 m / 2π rad (exact relation).
        double rho = 0.01 / (2 * Math.PI);
        assertEquals(2.0e5 * rho * rho, y.controller().velocityGain(), 1e-12);
        // Current-loop bandwidth 1800 Hz → 2π·1800 rad/s.
        assertEquals(2 * Math.PI * 1800, y.plant().currentLoopBandwidth(), 1e-9);
        // Rack: gearbox inertia 6e-5 kg·m² at the motor = 6e-5·n² at the pinion, n = 10; ρ = r/n.
        var x1 = router.axis("lm3020-x1").orElseThrow().model();
        assertEquals(0.03183 / 10, x1.plant().loadPerMotorRadian(), 1e-15);
        double expectedInertia = 8.0e-4 + 6.0e-5 + 210.0 * (0.03183 / 10) * (0.03183 / 10);
        assertEquals(expectedInertia, x1.plant().equivalentInertia(), 1e-15);
        assertEquals(2 * Math.PI * 600, ((org.tracewell.engine.axis.FilterStage.LowPass2) x1.controller().filters()
                .get(0)).cornerRadPerSec(), 1e-9);
    }

    @Test
    void cascadeLoopIsTypeOneWithKvEqualToThePositionGain() throws Exception {
        // DOMAIN.md §1 [der]: P position loop around a PI velocity loop → type 1, Kv = position gain whatever the
        // velocity tuning. Checked on the shared Z axis: Kv = lim s·L(s) from the open-loop polynomials
        // (the dead times do not change the limit). Tolerance 1e-9 relative.
        AxisModel z = EngineMapping.map(router()).axis("z-slide-25x5").orElseThrow().model();
        TransferFunction open = z.positionOpenLoop();
        assertEquals(1, open.integratorCount());
        double kv = open.numerator().coefficient(0) / open.denominator().divideByPowerOfS(1).coefficient(0);
        assertEquals(50.0, kv, 50.0 * 1e-9);
    }

    @Test
    void circleAndLineContoursHaveTheirExactGeometry() throws Exception {
        MachineInputs router = EngineMapping.map(router());
        MappedContour circle = router.contour("lm3020-circle-r100-cw").orElseThrow();
        // Full circle R = 100 mm: length 2πR (geometry), feed 3 m/min = 0.05 m/s.
        assertEquals(2 * Math.PI * 0.1, circle.path().length(), 1e-12);
        assertEquals(0.05, circle.limits().feed(), 0.0);
        assertEquals("lm3020-x1", circle.firstAxisId());
        assertEquals("lm3020-y", circle.secondAxisId());
        MappedContour line = router.contour("lm3020-line-45").orElseThrow();
        assertEquals(0.3 * Math.sqrt(2), line.path().length(), 1e-12);
    }

    @Test
    void unsupportedElementsFailNamingTheElement() throws Exception {
        Machine machine = router();
        Axis y = machine.getAxes().get(2);
        y.setController(TracewellFactory.eINSTANCE.createPidController());
        MappingException pid = assertThrows(MappingException.class, () -> EngineMapping.mapAxis(y));
        assertTrue(pid.getMessage().contains("Axis 'Y' [lm3020-y]") && pid.getMessage().contains("PidController"),
                pid.getMessage());

        Axis x1 = machine.getAxes().get(0);
        TransferFunctionPlant tf = TracewellFactory.eINSTANCE.createTransferFunctionPlant();
        tf.getNumerator().add(1.0);
        tf.getDenominator().addAll(List.of(1.0e-3, 0.0));
        tf.setRatio(0.003);
        tf.setEquivalentInertia(1.0e-3);
        tf.setTorqueConstant(1.0);
        tf.setDeadTime(0.002);
        x1.setPlant(tf);
        MappingException delay = assertThrows(MappingException.class, () -> EngineMapping.mapAxis(x1));
        assertTrue(delay.getMessage().contains("dead time"), delay.getMessage());
        tf.setDeadTime(0.0);
        MappedAxis mapped = EngineMapping.mapAxis(x1);
        assertEquals(Double.POSITIVE_INFINITY, mapped.model().plant().currentLoopBandwidth(),
                "unset current loop: the function already contains it");
    }

    @Test
    void simplificationsAreReportedAsNotes() throws Exception {
        MachineInputs router = EngineMapping.map(router());
        assertTrue(router.axis("lm3020-x1").orElseThrow().notes().stream()
                .anyMatch(n -> n.contains("drivetrain stiffness is not modelled")));
        assertTrue(router.axis("lm3020-y").orElseThrow().notes().stream()
                .anyMatch(n -> n.contains("nut at 1.15 m")));
    }
}
