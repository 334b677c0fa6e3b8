package org.tracewell.core.template;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineAnalyzer;
import org.tracewell.core.analysis.ProgressListener;
import org.tracewell.core.io.IdAssigner;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.validation.ModelValidation;
import org.tracewell.core.validation.ValidationProblem;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.core.variation.StudyRunner;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.model.VariationStudy;

class MachineTemplateTest {

    @Test
    void writtenTemplateReloadsEqualAndValidatesWithoutFindings(@TempDir Path temp) throws Exception {
        Path file = temp.resolve("Bench XY.machine");
        Machine written = MachineTemplate.named("Bench XY").writeTo(file, new ModelFiles());
        Machine reloaded = new ModelFiles().loadMachine(file);
        assertTrue(new EcoreUtil.EqualityHelper().equals(written, reloaded), "reloaded machine equals the written one");
        assertEquals("bench-xy", reloaded.getId());
        assertEquals(List.of("bench-xy-x", "bench-xy-y"), reloaded.getAxes().stream().map(a -> a.getId()).toList());
        List<ValidationProblem> problems = new ModelValidation().validate(reloaded);
        assertTrue(problems.isEmpty(), problems.toString());
        // Deterministic save: writing the same template again gives the same bytes.
        Path again = temp.resolve("again/Bench XY.machine");
        Files.createDirectories(again.getParent());
        MachineTemplate.named("Bench XY").writeTo(again, new ModelFiles());
        assertEquals(Files.readString(file), Files.readString(again));
    }

    @Test
    void newStudyValidatesRunsAndTakesAFreeName(@TempDir Path temp) throws Exception {
        Path file = temp.resolve("Study XY.machine");
        MachineTemplate.named("Study XY").writeTo(file, new ModelFiles());
        Machine machine = new ModelFiles().loadMachine(file);
        VariationStudy first = MachineTemplate.newStudy(machine);
        IdAssigner.assignNewIds(first, machine, Literals.MACHINE__STUDIES, machine.eResource());
        machine.getStudies().add(first);
        VariationStudy second = MachineTemplate.newStudy(machine);
        IdAssigner.assignNewIds(second, machine, Literals.MACHINE__STUDIES, machine.eResource());
        machine.getStudies().add(second);
        assertEquals("gain tolerance", first.getName());
        assertEquals("gain tolerance 2", second.getName());
        // both position gains, σ = 1 % of each
        assertEquals(List.of("axis[X].controller.positionGain", "axis[Y].controller.positionGain"),
                first.getParameters().stream().map(p -> p.getPath()).toList());
        double kv = ((CascadeController) machine.getAxes().get(0).getController()).getPositionGain();
        assertEquals(0.01 * kv, first.getParameters().get(0).getSigma(), 1e-15 * kv);
        assertEquals(List.of("contour[circle R50 F2 CCW].G"), first.getMetrics());
        List<ValidationProblem> problems = new ModelValidation().validate(machine);
        assertTrue(problems.isEmpty(), problems.toString());
        // runnable as created (a few variants here)
        first.setVariantCount(8);
        StudyResult result = StudyRunner.run(machine, StudyDefinition.of(first), RunControl.serial());
        assertEquals(8, result.completedCount());
    }

    @Test
    void chosenLoopPeriodsReachBothControllers(@TempDir Path temp) throws Exception {
        Path file = temp.resolve("Periods.machine");
        new MachineTemplate("Periods", 1e-3, 2.5e-4).writeTo(file, new ModelFiles());
        Machine machine = new ModelFiles().loadMachine(file);
        for (var axis : machine.getAxes()) {
            CascadeController c = (CascadeController) axis.getController();
            assertEquals(1e-3, c.getPositionSamplePeriod(), 0.0);
            assertEquals(2.5e-4, c.getVelocitySamplePeriod(), 0.0);
        }
        List<ValidationProblem> problems = new ModelValidation().validate(machine);
        assertTrue(problems.isEmpty(), problems.toString());
    }

    @Test
    void circleTestLosesTheRadiusOfMatchedFirstOrderLoopsAndKeepsItsShape(@TempDir Path temp) throws Exception {
        Path file = temp.resolve("XY.machine");
        MachineTemplate.named("XY").writeTo(file, new ModelFiles());
        MachineAnalysis analysis = MachineAnalyzer.analyze(EngineMapping.map(new ModelFiles().loadMachine(file)),
                ProgressListener.SILENT, CancellationFlag.create());
        ContourResult circle = analysis.contours().get(0);
        // DOMAIN.md §4 [der]: equal loops Kv/(s+Kv) lose ΔR = R·(1 − 1/√(1+(ω/Kv)²)); R = 0.05 m, ω = F/R =
        // (2/60)/0.05 = 0.667 rad/s, Kv = 33.3 1/s → ΔR = 9.997 µm. The simulated axes add the velocity loop, filter
        // and sample delays (second order in ω): 10 % tolerance, as for the LM-3020.
        double omega = MachineTemplate.CIRCLE_FEED / MachineTemplate.CIRCLE_RADIUS;
        double ratio = omega / MachineTemplate.POSITION_GAIN;
        double exact = MachineTemplate.CIRCLE_RADIUS * (1 - 1 / Math.sqrt(1 + ratio * ratio));
        assertEquals(9.997e-6, exact, 1e-9);
        for (ContourRun run : circle.runs()) {
            double inward = -run.metrics().radialDeviationMin().getAsDouble();
            assertEquals(exact, inward, 0.10 * exact, run.direction().label());
            // Matched Kv: the path stays a circle, so G stays far below the radius loss (DOMAIN.md §4 [der]).
            double g = run.metrics().circularDeviationG().getAsDouble();
            assertTrue(g < 0.1 * inward, "G " + g);
            assertTrue(g < MachineTemplate.CIRCULAR_DEVIATION_LIMIT);
        }
    }

    @Test
    void badInputsAreRefusedNamingTheValue() {
        IllegalArgumentException slowVelocity = assertThrows(IllegalArgumentException.class,
                () -> new MachineTemplate("M", 2.5e-4, 1e-3));
        assertTrue(slowVelocity.getMessage().contains("1.0 ms") && slowVelocity.getMessage().contains("valid"),
                slowVelocity.getMessage());
        IllegalArgumentException tooFast = assertThrows(IllegalArgumentException.class,
                () -> new MachineTemplate("M", 5e-4, 1e-7));
        assertTrue(tooFast.getMessage().contains("0.01 … 10 ms"), tooFast.getMessage());
        assertThrows(IllegalArgumentException.class, () -> MachineTemplate.named(" "));
        assertFalse(MachineTemplate.named("M").build().getContours().isEmpty());
    }
}
