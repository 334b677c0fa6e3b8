package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.ui.views.LoopAnalysisView;

/** The Loop Analysis view analyses what is typed, off the UI thread, and shows it in trade units. */
class LoopAnalysisViewTest {

    @Test
    void showsTypeAndVelocityConstantOfATypedLoop() throws PartInitException {
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        LoopAnalysisView view = (LoopAnalysisView) page.showView(LoopAnalysisView.ID);
        // Nise, Control Systems Engineering, Ex. 7.3 (from memory, recomputed in DOMAIN.md §7):
        // G = 100(s+2)(s+6)/(s(s+3)(s+4)) = (100 s² + 800 s + 1200)/(s³ + 7 s² + 12 s): type 1, Kv = 100.
        view.setLoop("100 800 1200", "1 7 12 0", "0");
        waitFor(() -> {
            LoopAnalysis shown = view.shownAnalysis();
            // the default loop is type 1 too: wait for this loop's Kv
            return shown != null && Math.abs(shown.steadyState().kv() - 100) < 1e-6;
        });
        List<String[]> rows = view.shownRows();
        assertEquals("1", value(rows, "System type"));
        assertTrue(value(rows, "Kv").startsWith("100.0 1/s"), value(rows, "Kv"));
        // 100 1/s = 6.00 (m/min)/mm (1 (m/min)/mm = 16.667 1/s, common practice)
        assertTrue(value(rows, "Kv").contains("6.00 (m/min)/mm"), value(rows, "Kv"));
        assertEquals("stable", value(rows, "Closed loop"));

        // The charts of the same loop: Nyquist with the Ms circle, and the ramp settling at v/Kv.
        JFreeChart nyquist = view.shownChart("Nyquist");
        String msCircle = nyquist.getXYPlot().getDataset().getSeriesKey(2).toString();
        assertTrue(msCircle.startsWith("Ms circle: radius 1/Ms = "), msCircle);
        JFreeChart ramp = view.shownChart("Ramp response");
        assertTrue(ramp.getTitle().getText().contains("ramp at 1.00 m/min"), ramp.getTitle().getText());
        XYPlot error = ((CombinedDomainXYPlot) ramp.getPlot()).getSubplots().get(1);
        String steady = ((ValueMarker) error.getRangeMarkers(Layer.FOREGROUND).iterator().next()).getLabel();
        // Kv = 100 1/s: 1/Kv = 10 ms, and at 1 m/min (16.67 mm/s) the error settles at 16.67/100 mm = 167 µm.
        assertEquals("steady error v/Kv = 167 µm (1/Kv = 10.0 ms)", steady);
        assertTrue(view.shownChart("Step response").getTitle().getText().startsWith("Unit-step response"));
    }

    @Test
    void anUnstableLoopShowsNoSteadyStateError() throws PartInitException {
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        LoopAnalysisView view = (LoopAnalysisView) page.showView(LoopAnalysisView.ID);
        // Nise Ex. 6.9 (from memory): s³ + 18 s² + 77 s + K is stable only for K < 1386; K = 2000 is not.
        view.setLoop("2000", "1 18 77 0", "0");
        waitFor(() -> view.shownAnalysis() != null && !view.shownAnalysis().stable());
        List<String[]> rows = view.shownRows();
        assertEquals("UNSTABLE", value(rows, "Closed loop"));
        assertTrue(value(rows, "Steady-state errors").startsWith("none"), value(rows, "Steady-state errors"));
    }

    private static String value(List<String[]> rows, String quantity) {
        return rows.stream().filter(r -> r[0].equals(quantity)).map(r -> r[1]).findFirst()
                .orElseThrow(() -> new AssertionError("no row '" + quantity + "' in " + rows.stream().map(r -> r[0]).toList()));
    }

    /** Runs the event loop until {@code done} holds; analyses run in jobs and post back. */
    static void waitFor(BooleanSupplier done) {
        Display display = Display.getCurrent();
        assertNotNull(display, "runs on the UI thread");
        long deadline = System.currentTimeMillis() + 20_000;
        while (!done.getAsBoolean()) {
            if (System.currentTimeMillis() > deadline) {
                throw new AssertionError("timed out waiting for the view to update");
            }
            if (!display.readAndDispatch()) {
                display.timerExec(20, () -> { });
                display.sleep();
            }
        }
    }
}
