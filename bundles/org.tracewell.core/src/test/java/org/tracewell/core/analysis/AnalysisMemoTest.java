package org.tracewell.core.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.tracewell.core.Examples;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.model.Axis;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Machine;

/**
 * The memo finds the results of unchanged inputs: after an edit only the edited axis and the runs it takes part in
 * are recomputed, and the results equal those of a fresh analysis (analyses are pure functions of their inputs).
 */
class AnalysisMemoTest {

    private static Machine lm3020() throws Exception {
        return new ModelFiles().loadMachine(Examples.file(Examples.LM_3020));
    }

    private static MachineAnalysis analyse(Machine machine, AnalysisMemo memo) throws MappingException {
        return MachineAnalyzer.analyze(EngineMapping.map(machine), java.util.List.of(), ProgressListener.SILENT,
                CancellationFlag.create(), memo);
    }

    private static CascadeController controller(Machine machine, String axisName) {
        Axis axis = Stream.concat(machine.getAxes().stream(), machine.getLibraryAxes().stream())
                .filter(a -> axisName.equals(a.getName())).findFirst().orElseThrow();
        return (CascadeController) axis.getController();
    }

    @Test
    void anEditRecomputesOnlyTheEditedAxisAndTheRunsItTakesPartIn() throws Exception {
        Machine machine = lm3020();
        AnalysisMemo memo = AnalysisMemo.bounded(16, 16);
        MachineAnalysis first = analyse(machine, memo);
        // LM-3020 (examples/): axes X1, X2, Y, Z; contours circle CCW and circle CW (each run both ways) and the 45°
        // line. The CCW circle's CW run is the CW circle's programmed run: 2 circle runs + 1 line, not 5.
        assertEquals(4, memo.axisComputations());
        assertEquals(3, memo.runComputations());
        ContourResult ccw = first.contour("lm3020-circle-r100-ccw").orElseThrow();
        ContourResult cw = first.contour("lm3020-circle-r100-cw").orElseThrow();
        assertSame(ccw.run(RunDirection.CW).orElseThrow(), cw.run(RunDirection.CW).orElseThrow());

        org.tracewell.engine.axis.AxisModel x1 = EngineMapping.map(machine).axis("lm3020-x1").orElseThrow().model();
        assertSame(first.axis("lm3020-x1").orElseThrow().dynamics(), memo.knownDynamics(x1).orElseThrow(),
                "known without computing");
        assertTrue(AnalysisMemo.bounded(2, 2).knownDynamics(x1).isEmpty(), "never computes");

        MachineAnalysis again = analyse(machine, memo);
        assertEquals(4, memo.axisComputations(), "nothing changed: nothing recomputed");
        assertEquals(3, memo.runComputations());
        assertSame(first.axis("lm3020-y").orElseThrow().dynamics(), again.axis("lm3020-y").orElseThrow().dynamics());

        // Y's Kv from 40 to 45 1/s: Y is re-analysed, and all three runs are in XY, so they run again.
        CascadeController y = controller(machine, "Y");
        double kv = y.getPositionGain();
        y.setPositionGain(45);
        MachineAnalysis edited = analyse(machine, memo);
        assertEquals(5, memo.axisComputations());
        assertEquals(6, memo.runComputations());
        assertEquals(45, edited.axis("lm3020-y").orElseThrow().positionGain(), 1e-6, "the new Kv, 1/s");
        assertSame(first.axis("lm3020-x1").orElseThrow().dynamics(), edited.axis("lm3020-x1").orElseThrow().dynamics());

        // Z takes part in no contour: its edit costs one axis analysis and no run.
        controller(machine, "Z").setPositionGain(controller(machine, "Z").getPositionGain() * 1.1);
        analyse(machine, memo);
        assertEquals(6, memo.axisComputations());
        assertEquals(6, memo.runComputations());

        // Undo both: the earlier results are found again.
        y.setPositionGain(kv);
        controller(machine, "Z").setPositionGain(controller(machine, "Z").getPositionGain() / 1.1);
        MachineAnalysis undone = analyse(machine, memo);
        assertEquals(6, memo.axisComputations());
        assertEquals(6, memo.runComputations());
        assertSame(ccw.programmedRun(), undone.contour("lm3020-circle-r100-ccw").orElseThrow().programmedRun());
    }

    @Test
    void resultsWithTheMemoEqualAFreshAnalysis() throws Exception {
        Machine machine = lm3020();
        MachineAnalysis fresh = analyse(machine, AnalysisMemo.none());
        MachineAnalysis memoised = analyse(machine, AnalysisMemo.bounded(8, 8));
        assertEquals(fresh.contours().size(), memoised.contours().size());
        for (int c = 0; c < fresh.contours().size(); c++) {
            ContourResult a = fresh.contours().get(c);
            ContourResult b = memoised.contours().get(c);
            assertEquals(a.contourId(), b.contourId());
            for (int r = 0; r < a.runs().size(); r++) {
                // every figure equal to the last bit: the same pure computation on equal inputs
                assertEquals(a.runs().get(r).metrics(), b.runs().get(r).metrics(), a.contourName());
                assertEquals(a.runs().get(r).direction(), b.runs().get(r).direction());
            }
            assertEquals(a.estimate(), b.estimate());
        }
        for (int i = 0; i < fresh.axes().size(); i++) {
            assertEquals(fresh.axes().get(i).positionGain(), memoised.axes().get(i).positionGain(), 0.0);
            assertEquals(fresh.axes().get(i).atContourFeeds(), memoised.axes().get(i).atContourFeeds());
        }
    }

    @Test
    void aBoundedMemoForgetsTheLeastRecentlyUsed() throws Exception {
        Machine machine = lm3020();
        AnalysisMemo memo = AnalysisMemo.bounded(1, 1);
        analyse(machine, memo);
        long axes = memo.axisComputations();
        analyse(machine, memo);
        assertTrue(memo.axisComputations() > axes, "one axis kept of four: the others are analysed again");
        assertThrows(IllegalArgumentException.class, () -> AnalysisMemo.bounded(0, 4));
    }

    @Test
    void aFailedComputationIsNotKept() {
        AnalysisMemo memo = AnalysisMemo.bounded(2, 2);
        AnalysisMemo.RunKey key = new AnalysisMemo.RunKey("path", null, 1e-3, null, null, null, null);
        assertThrows(IllegalStateException.class, () -> memo.run(key, () -> {
            throw new IllegalStateException("simulated failure");
        }));
        ContourRun ok = new ContourRun(RunDirection.PROGRAMMED, null, null, null, java.util.Optional.empty(),
                java.util.Optional.empty(), null);
        assertSame(ok, memo.run(key, () -> ok));
        assertSame(ok, memo.run(key, () -> {
            throw new AssertionError("kept: not computed again");
        }));
    }

    @Test
    void twoCallersAskingAtOnceShareOneComputation() throws Exception {
        AnalysisMemo memo = AnalysisMemo.bounded(2, 2);
        AnalysisMemo.RunKey key = new AnalysisMemo.RunKey("circle", null, 1e-3, null, null, null, null);
        ContourRun result = new ContourRun(RunDirection.CW, null, null, null, java.util.Optional.empty(),
                java.util.Optional.empty(), null);
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        CompletableFuture<ContourRun> firstCaller = CompletableFuture.supplyAsync(() -> memo.run(key, () -> {
            started.countDown();
            await(release);
            return result;
        }));
        assertTrue(started.await(10, TimeUnit.SECONDS));
        CompletableFuture<ContourRun> secondCaller = CompletableFuture.supplyAsync(() -> memo.run(key, () -> {
            throw new AssertionError("the second caller waits for the first computation");
        }));
        release.countDown();
        assertSame(result, firstCaller.get(10, TimeUnit.SECONDS));
        assertSame(result, secondCaller.get(10, TimeUnit.SECONDS));
        assertEquals(1, memo.runComputations());
    }

    private static void await(CountDownLatch latch) {
        try {
            latch.await(10, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
