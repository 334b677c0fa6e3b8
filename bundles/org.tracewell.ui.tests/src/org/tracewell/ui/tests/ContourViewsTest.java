package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.LoopAnalysisViewTest.waitFor;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.RunDirection;
import org.tracewell.model.Axis;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.views.CircleTestView;
import org.tracewell.ui.views.ContourDeviationView;
import org.tracewell.ui.views.TrackingView;

/**
 * The contour views on the LM-3020: they open with the example's contours, follow the contour (or axis) selected in
 * the Machine Editor, and redraw when an edit changes the review.
 */
class ContourViewsTest {

    private static final String CCW_CIRCLE = "lm3020-circle-r100-ccw";
    private static final String CW_CIRCLE = "lm3020-circle-r100-cw";
    private static final String LINE = "lm3020-line-45";

    private MachineEditor editor;

    @AfterEach
    void closeEditor() {
        if (editor != null) {
            editor.getSite().getPage().closeEditor(editor, false);
        }
    }

    @Test
    void circleTestShowsBothDirectionsWithTheirFiguresAndFollowsTheSelectedCircle(@TempDir Path temp)
            throws Exception {
        IWorkbenchPage page = page();
        editor = MachineEditor.open(page, MachineEditorTest.copyExamples(temp).resolve("LM-3020.machine"));
        CircleTestView view = (CircleTestView) page.showView(CircleTestView.ID);
        page.activate(editor); // the views follow the selection of the active part
        waitFor(() -> view.shownContour() != null);
        ContourResult circle = view.shownContour();
        assertEquals(CCW_CIRCLE, circle.contourId(), "the first full circle of examples/LM-3020.machine");
        // Both directions, each with its ISO 230-4 figures, and G(b) of both.
        String figures = view.shownText().get(1);
        for (RunDirection d : List.of(RunDirection.CCW, RunDirection.CW)) {
            ContourRun run = circle.run(d).orElseThrow();
            String g = um(run.metrics().circularDeviationG().getAsDouble());
            assertTrue(figures.contains(d.label() + ": G " + g + " µm"), figures);
        }
        assertTrue(figures.contains("G(b) "), figures);
        assertTrue(figures.contains("R 100 mm at F 3.00 m/min"), "DESIGN.md: R = 100 mm, F = 3 m/min: " + figures);
        JFreeChart chart = view.shownChart();
        assertTrue(chart.getTitle().getText().contains("radial deviation ×"), chart.getTitle().getText());
        // Reversal points: each of X1 and Y reverses twice per turn, marked on both runs (4 × 2).
        assertEquals(8, chart.getXYPlot().getDataset(1).getItemCount(0));
        // The demo machine meets its target G ≤ 25 µm (DESIGN.md demo scenario).
        assertTrue(circle.programmedRun().metrics().circularDeviationG().getAsDouble() < 25e-6);

        Machine machine = editor.model().machine();
        assertTrue(editor.reveal(contour(machine, CW_CIRCLE)));
        waitFor(() -> CW_CIRCLE.equals(view.shownContourId()));
        assertTrue(editor.reveal(contour(machine, LINE)));
        LoopAnalysisViewTest.waitFor(settled());
        assertEquals(CW_CIRCLE, view.shownContourId(), "a line is no circle test: the view keeps its circle");
    }

    @Test
    void theViewsFollowTheActiveMachine(@TempDir Path temp) throws Exception {
        IWorkbenchPage page = page();
        Path examples = MachineEditorTest.copyExamples(temp);
        editor = MachineEditor.open(page, examples.resolve("LM-3020.machine"));
        CircleTestView view = (CircleTestView) page.showView(CircleTestView.ID);
        page.activate(editor);
        waitFor(() -> CCW_CIRCLE.equals(view.shownContourId()));
        MachineEditor t5 = MachineEditor.open(page, examples.resolve("LM-T5.machine"));
        try {
            // DESIGN.md: the LM-T5's circle test is R = 50 mm at F = 2 m/min.
            waitFor(() -> "lmt5-circle-r50-ccw".equals(view.shownContourId()));
            assertTrue(view.shownText().get(1).contains("R 50.0 mm at F 2.00 m/min"), view.shownText().get(1));
            page.activate(editor);
            waitFor(() -> CCW_CIRCLE.equals(view.shownContourId()));
        } finally {
            page.closeEditor(t5, false);
        }
    }

    @Test
    void aKvMismatchEditRedrawsTheCircleTestWithTheEllipseItCauses(@TempDir Path temp) throws Exception {
        IWorkbenchPage page = page();
        editor = MachineEditor.open(page, MachineEditorTest.copyExamples(temp).resolve("LM-3020.machine"));
        CircleTestView view = (CircleTestView) page.showView(CircleTestView.ID);
        waitFor(() -> view.shownContour() != null);
        ContourResult before = view.shownContour();
        JFreeChart chartBefore = view.shownChart();

        // Y from 40 1/s (2.4 (m/min)/mm) to 2.5 (m/min)/mm = 41.667 1/s, X1 stays at 40 1/s.
        CascadeController y = (CascadeController) axis(editor.model().machine(), "Y").getController();
        Optional<String> rejected = editor.valueEntry().enter(y, Literals.CASCADE_CONTROLLER__POSITION_GAIN,
                "2.5 (m/min)/mm");
        assertTrue(rejected.isEmpty(), rejected.toString());
        waitFor(() -> view.shownContour() != before);
        assertNotSame(chartBefore, view.shownChart(), "redrawn");
        double g = view.shownContour().programmedRun().metrics().circularDeviationG().getAsDouble();
        // Kv mismatch on a circle: G ≈ F·|1/Kx − 1/Ky| (Kakino, Ihara, Shinohara 1993 — from memory; DOMAIN.md §4)
        // = 0.05 m/s · |1/40 − 1/41.667| s = 50.0 µm. The velocity loops add nearly the same lag to both axes, which
        // cancels in the difference: 10 % tolerance.
        assertEquals(50.0e-6, g, 5.0e-6);
        assertTrue(view.shownText().get(1).contains("CCW: G " + um(g) + " µm"), view.shownText().get(1));
    }

    @Test
    void trackingAndContourDeviationFollowTheSelectedContourAndAxis(@TempDir Path temp) throws Exception {
        IWorkbenchPage page = page();
        editor = MachineEditor.open(page, MachineEditorTest.copyExamples(temp).resolve("LM-3020.machine"));
        TrackingView tracking = (TrackingView) page.showView(TrackingView.ID);
        ContourDeviationView deviation = (ContourDeviationView) page.showView(ContourDeviationView.ID);
        page.activate(editor);
        Machine machine = editor.model().machine();
        assertTrue(editor.reveal(contour(machine, LINE)));
        waitFor(() -> LINE.equals(tracking.shownContourId()) && LINE.equals(deviation.shownContourId()));

        // Tracking: both axes of the line; the drawn following error keeps the run's peak (decimation keeps extremes).
        ContourRun run = tracking.shownContour().programmedRun();
        assertEquals(List.of("programmed"), tracking.runChoices());
        XYDataset errors = ((CombinedDomainXYPlot) tracking.shownChart().getPlot()).getSubplots().get(1).getDataset();
        assertEquals(2, errors.getSeriesCount(), "X1 and Y");
        assertEquals(run.metrics().peakFollowingErrorFirst() * 1e6, maxAbs(errors, 0), 1e-9, "µm");
        String text = tracking.shownText().get(1);
        assertTrue(text.contains("X1: peak following error " + um(run.metrics().peakFollowingErrorFirst()) + " µm"),
                text);
        assertTrue(tracking.shownText().get(0).startsWith("line 45° F10 · X1/Y"), tracking.shownText().get(0));

        // Contour Deviation: the factor is stated, and a chosen factor replaces the automatic one.
        assertTrue(deviation.shownChart().getTitle().getText().contains("normal error ×"),
                deviation.shownChart().getTitle().getText());
        assertTrue(deviation.shownText().get(1).contains("max contour error "
                + um(deviation.shownContour().programmedRun().metrics().maxContourError()) + " µm"));
        JFreeChart auto = deviation.shownChart();
        deviation.setMagnification(5000);
        waitFor(() -> deviation.shownChart() != auto);
        assertTrue(deviation.shownChart().getTitle().getText().endsWith("normal error ×5000"),
                deviation.shownChart().getTitle().getText());
        assertTrue(deviation.shownChart().getXYPlot().getDataset().getSeriesKey(1).toString().contains("×5000"));

        // A circle has two runs to choose from.
        assertTrue(editor.reveal(contour(machine, CCW_CIRCLE)));
        waitFor(() -> CCW_CIRCLE.equals(tracking.shownContourId()));
        assertEquals(List.of("CCW", "CW"), tracking.runChoices());
        tracking.chooseRun("CW");
        waitFor(() -> tracking.shownChart().getTitle().getText().endsWith("(CW)"));

        // Selecting an axis: Y takes part in the circle, so it stays; Z takes part in no contour, nothing changes.
        assertTrue(editor.reveal(axis(machine, "Y")));
        assertTrue(editor.reveal(axis(machine, "Z")));
        waitFor(settled());
        assertEquals(CCW_CIRCLE, tracking.shownContourId());
    }

    // ------------------------------------------------------------------------------------------------ helpers

    private static IWorkbenchPage page() {
        return PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
    }

    /** Micrometres as the views print them (three significant figures, TradeUnits.format). */
    static String um(double metres) {
        return org.tracewell.engine.units.TradeUnits.format(org.tracewell.engine.units.TradeUnits.micrometres(metres),
                3);
    }

    private static double maxAbs(XYDataset data, int series) {
        double max = 0;
        for (int i = 0; i < data.getItemCount(series); i++) {
            max = Math.max(max, Math.abs(data.getYValue(series, i)));
        }
        return max;
    }

    /** True once about 300 ms have passed: long enough for a debounced selection to have been drawn. */
    private static java.util.function.BooleanSupplier settled() {
        long until = System.nanoTime() + 300_000_000L;
        return () -> System.nanoTime() > until;
    }

    static Contour contour(Machine machine, String id) {
        return machine.getContours().stream().filter(c -> id.equals(c.getId())).findFirst()
                .orElseThrow(() -> new AssertionError("no contour " + id + " in " + machine.getName()));
    }

    static Axis axis(Machine machine, String name) {
        return java.util.stream.Stream.concat(machine.getAxes().stream(), machine.getLibraryAxes().stream())
                .filter(a -> name.equals(a.getName())).findFirst()
                .orElseThrow(() -> new AssertionError("no axis " + name + " in " + machine.getName()));
    }
}
