package org.tracewell.core.variation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracewell.core.Examples;
import org.tracewell.core.analysis.AxisResult;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineAnalyzer;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.core.analysis.ProgressListener;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.model.Machine;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.paths.AttributePathException;

/**
 * The variant model must give, for the nominal machine, exactly the figures of the analysis pipeline it stands in for
 * (the independent reference here is {@link MachineAnalyzer} with {@link MachineBudgets}, the path behind
 * {@code tracewell analyze}); varied, it must follow the published closed forms.
 */
class MachineVariantModelTest {

    private static final String CCW = "contour[circle R100 F3 CCW]";
    private static final String LINE = "contour[line 45° F10]";

    static Machine machine;
    static MachineAnalysis analysis;

    @BeforeAll
    static void analyse() throws Exception {
        machine = new ModelFiles().loadMachine(Examples.file(Examples.LM_3020));
        analysis = MachineAnalyzer.analyze(EngineMapping.map(machine), ProgressListener.SILENT,
                CancellationFlag.create());
    }

    @Test
    void nominalFiguresAreThoseOfTheAnalysisPipeline() throws Exception {
        MachineVariantModel model = new MachineVariantModel(machine, List.of("axis[Y].plant.loadMass"),
                List.of(CCW + ".G", CCW + ".F", LINE + ".maxContourError", "axis[Y].phaseMargin",
                        "axis[Y].velocityGainMargin", "axis[X1].Kv", "axis[X1].bandwidth", "axis[X1].followingError",
                        "requirement[lm3020-r1]", "requirement[lm3020-r2-x1-fe]"));
        double[] v = model.evaluate(model.nominal());
        ContourRun ccw = analysis.contour("lm3020-circle-r100-ccw").orElseThrow().programmedRun();
        ContourRun line = analysis.contour("lm3020-line-45").orElseThrow().programmedRun();
        AxisResult y = analysis.axis("lm3020-y").orElseThrow();
        AxisResult x1 = analysis.axis("lm3020-x1").orElseThrow();
        // same samples, same arithmetic: agreement to rounding
        double g = ccw.metrics().circularDeviationG().getAsDouble();
        assertEquals(g, v[0], 1e-12 * g);
        double f = ccw.metrics().radialDeviationF().getAsDouble();
        assertEquals(f, v[1], 1e-12 * f);
        assertEquals(line.metrics().maxContourError(), v[2], 0);
        assertEquals(y.positionPhaseMargin(), v[3], 1e-12);
        assertEquals(y.velocityGainMargin(), v[4], 1e-12 * v[4]);
        assertEquals(x1.positionGain(), v[5], 1e-12 * v[5]);
        assertEquals(x1.dynamics().positionBandwidthHz().getAsDouble(), v[6], 1e-12 * v[6]);
        assertEquals(x1.atMaxVelocity().followingError().getAsDouble(), v[7], 1e-12 * v[7]);
        // r1: the worst of every circle run (both contours, both directions) and of its error budget total
        double worstG = 0;
        for (String id : List.of("lm3020-circle-r100-ccw", "lm3020-circle-r100-cw")) {
            for (ContourRun run : analysis.contour(id).orElseThrow().runs()) {
                worstG = Math.max(worstG, run.metrics().circularDeviationG().getAsDouble());
            }
        }
        double total = MachineBudgets.build(machine, analysis).forRequirement("lm3020-r1").orElseThrow().evaluation()
                .total();
        assertEquals(Math.max(worstG, total), v[8], 1e-12 * v[8]);
        assertTrue(total > worstG, "the budget governs r1: its entered lines exceed the servo figure");
        // r2-x1-fe inherits the line from r2: the peak following error of X1 along it
        assertEquals(line.tracking().peakFollowingError(0), v[9], 1e-15);
        // CCW and CW of the 100 mm circle: the CW contour's runs repeat the CCW contour's, so 2 circles + the line
        assertEquals(3, model.simulatedRunCount());
    }

    @Test
    void aKvMismatchGivesTheClosedFormG() throws Exception {
        MachineVariantModel model = new MachineVariantModel(machine, List.of("axis[Y].controller.positionGain"),
                List.of(CCW + ".G"));
        for (double ky : new double[] {38, 41, 42}) {
            double g = model.evaluate(ky)[0];
            // G ≈ F·|1/Kx − 1/Ky| with Kx = 40 1/s, F = 0.05 m/s (Kakino, Ihara & Shinohara 1993, DOMAIN.md §4 — from
            // memory); the velocity loops, filters and sample delays of the real axes shift it: 10 %
            double closedForm = 0.05 * Math.abs(1 / 40.0 - 1 / ky);
            assertEquals(closedForm, g, 0.10 * closedForm, "G at Ky = " + ky + " 1/s");
        }
    }

    @Test
    void aContourAttributeReplansTheReference() throws Exception {
        MachineVariantModel model = new MachineVariantModel(machine,
                List.of("contour[circle R100 F3 CCW].feed", "axis[Y].controller.positionGain"), List.of(CCW + ".G"));
        double atThree = model.evaluate(0.05, 42)[0];
        double atOneAndHalf = model.evaluate(0.025, 42)[0];
        // the mismatch ellipse scales with feed, which tells servo mismatch from squareness (DOMAIN.md §4, Kakino et
        // al. 1993 — from memory): half the feed, half the G; 5 % for the loops' second-order terms
        assertEquals(0.5, atOneAndHalf / atThree, 0.05);
        assertEquals(0.05, machine.getContours().get(0).getFeed(), 0, "the model itself is not changed");
    }

    @Test
    void aVariedBudgetLineCountsInTheRequirementValue() throws Exception {
        MachineVariantModel model = new MachineVariantModel(machine, List.of("budgetLine[XY squareness].value"),
                List.of("requirement[lm3020-r1]"));
        double nominal = model.evaluate(6e-6)[0];
        double more = model.evaluate(9e-6)[0];
        // a systematic line adds arithmetically in Σ|systematic| + √(Σ random²) (DOMAIN.md §6, Slocum 1992 — from
        // memory): 3 µm more squareness error, 3 µm more total; rounding of the sums only
        assertEquals(3e-6, more - nominal, 1e-15);
    }

    @Test
    void variantsWriteTheirOwnCopyNeverTheMachineOrItsLibraryAxis() throws Exception {
        RigidScrewDrive z = (RigidScrewDrive) machine.getLibraryAxes().get(0).getPlant();
        double mass = z.getLoadMass();
        MachineVariantModel model = new MachineVariantModel(machine, List.of("axis[Z].plant.loadMass"),
                List.of("axis[Z].velocityBandwidth"));
        double nominal = model.evaluate(mass)[0];
        double heavier = model.evaluate(2 * mass)[0];
        // same velocity-loop gain on more inertia: a lower crossover and bandwidth (ω_c ≈ K/J, common practice)
        assertTrue(heavier < nominal, heavier + " Hz should be below " + nominal + " Hz");
        assertEquals(mass, z.getLoadMass(), 0, "the shared library axis keeps its value");
        assertEquals(nominal, model.evaluate(mass)[0], 0, "a variant depends on its parameters only");
    }

    @Test
    void badPathsAndMetricsNameWhatIsValid() {
        AttributePathException path = assertThrows(AttributePathException.class,
                () -> new MachineVariantModel(machine, List.of("axis[X].plant.loadMass"), List.of()));
        assertTrue(path.getMessage().contains("no axis 'X'") && path.getMessage().contains("X1 (lm3020-x1)"),
                path.getMessage());
        IllegalArgumentException metric = assertThrows(IllegalArgumentException.class,
                () -> new MachineVariantModel(machine, List.of("axis[X1].plant.loadMass"), List.of("axis[Y].pm")));
        assertTrue(metric.getMessage().contains("'pm'") && metric.getMessage().contains("phaseMargin"),
                metric.getMessage());
        IllegalArgumentException circle = assertThrows(IllegalArgumentException.class,
                () -> new MachineVariantModel(machine, List.of("axis[X1].plant.loadMass"), List.of(LINE + ".G")));
        assertTrue(circle.getMessage().contains("full circles"), circle.getMessage());
        // a bare requirement id is the requirement's value
        assertEquals("requirement[lm3020-r2]", StudyMetrics.parse("lm3020-r2", machine).name());
    }
}
