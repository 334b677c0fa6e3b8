package org.tracewell.core.variation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicBoolean;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracewell.core.Examples;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.engine.variation.MetricSummary;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.engine.variation.SweepResult;
import org.tracewell.engine.variation.YieldEstimate;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Machine;
import org.tracewell.model.StudyKind;
import org.tracewell.model.ToleranceShape;

class StudyRunnerTest {

    private static ForkJoinPool twoThreads;
    private Machine machine;

    @BeforeAll
    static void pool() {
        twoThreads = new ForkJoinPool(2);
    }

    @AfterAll
    static void shutdown() {
        twoThreads.shutdown();
    }

    @BeforeEach
    void load() throws Exception {
        machine = new ModelFiles().loadMachine(Examples.file(Examples.LM_3020));
    }

    private static StudyDefinition monteCarlo(List<Tolerance> tolerances, List<String> metrics, int n, long seed) {
        return new StudyDefinition("test", StudyKind.MONTE_CARLO, tolerances, List.of(), metrics, n, seed, 5);
    }

    @Test
    void yieldAgainstAKvFloorIsTheNormalTail() throws Exception {
        // Y set 0.5 1/s above its 40 1/s floor (requirement lm3020-r1-y-kv), commissioned with σ = 0.5 1/s
        ((CascadeController) machine.getAxes().get(2).getController()).setPositionGain(40.5);
        StudyDefinition study = monteCarlo(List.of(new Tolerance("axis[Y].controller.positionGain",
                ToleranceShape.NORMAL, 0.5, Double.NaN, Double.NaN)), List.of("requirement[lm3020-r1-y-kv]"), 2000, 7);
        StudyResult r = StudyRunner.run(machine, study, RunControl.on(twoThreads));
        // Kv of a P position loop around a PI velocity loop equals the position gain (DOMAIN.md §1, derived), so
        // P(Kv ≥ 40) = P(Z ≥ −1) = Φ(1) = 0.841345 (standard normal CDF); within 3 binomial standard errors
        YieldEstimate y = r.yields().get(0).estimate();
        double exact = new NormalDistribution(null, 0, 1).cumulativeProbability(1);
        assertEquals(exact, y.fraction(), 3 * y.standardError());
        assertEquals(2000, y.sampleCount());
        assertTrue(r.yields().get(0).nominalMet());
        // median 40.5; 95th percentile μ + 1.645σ, its standard error √(p(1−p)/n)/f ≈ 0.024 1/s here: 4 of them
        MetricSummary s = r.summary(0);
        assertEquals(40.5, s.p50(), 4 * 1.2533 * 0.5 / Math.sqrt(2000));
        assertEquals(40.5 + 1.644854 * 0.5, s.p95(), 0.1);
        // the worst variants are the lowest gains (an AT_LEAST requirement), worst first
        assertEquals(5, r.worst(0).size());
        assertEquals(s.min(), r.worst(0).get(0).value(), 0);
        // sensitivities at the nominal point: Kv moves one for one with the position gain, normalised 1
        assertEquals(1.0, r.sensitivities().orElseThrow().normalised(0, 0), 1e-6);
    }

    @Test
    void theSameSeedGivesTheSameVariantsOnAnyNumberOfThreads() throws Exception {
        StudyDefinition study = monteCarlo(List.of(
                new Tolerance("axis[X1].controller.positionGain", ToleranceShape.NORMAL, 0.1, Double.NaN, Double.NaN),
                new Tolerance("axis[Y].plant.nutStiffness", ToleranceShape.TRIANGULAR, 6e7, 3e8, Double.NaN)),
                List.of("axis[X1].phaseMargin", "axis[Y].velocityGainMargin"), 150, 3020);
        StudyResult serial = StudyRunner.run(machine, study, RunControl.serial());
        StudyResult parallel = StudyRunner.run(machine, study, RunControl.on(twoThreads));
        for (int m = 0; m < 2; m++) {
            assertArrayEquals(serial.monteCarlo().orElseThrow().metricValues(m),
                    parallel.monteCarlo().orElseThrow().metricValues(m)); // bit for bit
        }
        assertEquals(2, parallel.threads());
        StudyResult otherSeed = StudyRunner.run(machine, new StudyDefinition("test", StudyKind.MONTE_CARLO,
                study.tolerances(), List.of(), study.metrics(), 150, 3021, 5), RunControl.serial());
        assertNotEquals(serial.monteCarlo().orElseThrow().metric(0, 0), otherSeed.monteCarlo().orElseThrow().metric(0, 0));
        // every sample stays in the physical range given (nut stiffness ≥ 300 N/µm)
        double[] nut = serial.monteCarlo().orElseThrow().parameterValues(1);
        assertTrue(java.util.Arrays.stream(nut).allMatch(k -> k >= 3e8), "truncated to the physical range");
    }

    @Test
    void theModelsKvSweepHasItsMinimumAtMatchedGains() throws Exception {
        StudyDefinition study = StudyDefinition.of(StudyRunner.study(machine, "Kv match"));
        StudyResult r = StudyRunner.run(machine, study, RunControl.on(twoThreads));
        SweepResult sweep = r.sweep().orElseThrow();
        assertEquals(27, sweep.pointCount());
        assertEquals(List.of("contour[circle R100 F3 CCW].G", "requirement[lm3020-r1]"),
                r.metrics().stream().map(StudyMetric::name).toList());
        int g = r.metricIndex("contour[circle R100 F3 CCW].G");
        // along each curve (X1 fixed) G is smallest where Ky = Kx: G ≈ F·|1/Kx − 1/Ky| (DOMAIN.md §4, from memory)
        double[] kx = sweep.axes().get(1).values();
        double[] ky = sweep.axes().get(0).values();
        for (int j = 0; j < kx.length; j++) {
            int best = 0;
            for (int i = 1; i < ky.length; i++) {
                if (sweep.metric(g, i, j) < sweep.metric(g, best, j)) {
                    best = i;
                }
            }
            double nearest = ky[0];
            for (double k : ky) {
                nearest = Math.abs(k - kx[j]) < Math.abs(nearest - kx[j]) ? k : nearest;
            }
            assertEquals(nearest, ky[best], 1e-12, "minimum of G for Kx = " + kx[j]);
        }
        assertTrue(r.yields().isEmpty(), "a sweep has no yields");
        assertEquals(r.nominalMetrics()[g], sweep.metric(g, 4, 1), 1e-12 * r.nominalMetrics()[g],
                "the grid point at the nominal gains is the nominal machine");
    }

    @Test
    void cancellingKeepsTheFinishedVariants() throws Exception {
        AtomicBoolean cancel = new AtomicBoolean();
        StudyDefinition study = monteCarlo(List.of(new Tolerance("axis[Y].controller.positionGain",
                ToleranceShape.UNIFORM, 0.5, Double.NaN, Double.NaN)), List.of("axis[Y].Kv"), 5000, 1);
        StudyResult r = StudyRunner.run(machine, study, RunControl.serial()
                .withProgress((done, total) -> cancel.set(done >= 128)).withCancellation(cancel::get));
        assertTrue(r.cancelled());
        assertTrue(r.completedCount() >= 128 && r.completedCount() < 5000, "completed " + r.completedCount());
        assertEquals(r.completedCount(), r.summary(0).count());
        assertFalse(r.sensitivities().isPresent(), "no sensitivities after a cancel");
    }

    @Test
    void theModelsMonteCarloStudyReadsAsDefined() {
        StudyDefinition study = StudyDefinition.of(StudyRunner.study(machine, "lm3020-study-tolerances"));
        assertEquals(StudyKind.MONTE_CARLO, study.kind());
        assertEquals(1000, study.variantCount());
        assertEquals(3020, study.seed());
        assertEquals(6, study.tolerances().size());
        Tolerance kv = study.tolerances().get(2);
        assertEquals("axis[X1].controller.positionGain", kv.path());
        assertEquals(38, kv.lowerFor(40), 0);
        assertEquals(42, kv.upperFor(), 0);
        Tolerance mass = study.tolerances().get(1);
        assertEquals(0, mass.lowerFor(180), 0, "a positive nominal is truncated at 0 by default");
        assertEquals(Double.POSITIVE_INFINITY, mass.upperFor(), 0);
        assertEquals(ToleranceShape.TRIANGULAR, study.tolerances().get(4).shape());
        IllegalArgumentException none = assertThrows(IllegalArgumentException.class,
                () -> StudyRunner.study(machine, "nope"));
        assertTrue(none.getMessage().contains("XY tolerances") && none.getMessage().contains("Kv match"),
                none.getMessage());
    }
}
