package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.LoopAnalysisViewTest.waitFor;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.commands.ICommandService;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.model.VariationStudy;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.views.RunVariationStudyHandler;
import org.tracewell.ui.views.VariationView;

/** Run Variation Study on the LM-3020 from the Machine Editor: a job with progress, then the Variation view. */
class VariationViewTest {

    private MachineEditor editor;

    @AfterEach
    void closeEditor() {
        if (editor != null) {
            editor.getSite().getPage().closeEditor(editor, false);
        }
    }

    @Test
    void runsTheMachinesStudiesAndShowsHistogramsAndSweepCurves(@TempDir Path temp) throws Exception {
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        ICommandService commands = PlatformUI.getWorkbench().getService(ICommandService.class);
        assertTrue(commands.getCommand(RunVariationStudyHandler.COMMAND_ID).isDefined(), "the command is registered");
        editor = MachineEditor.open(page, MachineEditorTest.copyExamples(temp).resolve("LM-3020.machine"));
        Machine machine = editor.model().machine();
        VariationStudy tolerances = machine.getStudies().get(0);
        // a short run for the test, set through the editor's command path like any edit
        Optional<String> rejected = editor.valueEntry().set(tolerances, Literals.VARIATION_STUDY__VARIANT_COUNT, 16);
        assertTrue(rejected.isEmpty(), rejected.toString());

        long start = System.nanoTime();
        Job job = RunVariationStudyHandler.start(page, machine, tolerances);
        assertNotNull(job);
        assertTrue(job.isUser(), "a user job: progress shown, cancellable");
        VariationView view = (VariationView) page.showView(VariationView.ID);
        waitFor(() -> view.shownResult() != null && view.shownResult().definition().name().equals("XY tolerances"));
        System.out.printf("Variation study of 16 variants shown after %.1f s%n", (System.nanoTime() - start) / 1e9);
        StudyResult result = view.shownResult();
        assertEquals(16, result.completedCount());
        List<List<String>> rows = view.shownRows();
        assertEquals(8, rows.size(), "one row per collected result");
        assertEquals("requirement[lm3020-r1]", rows.get(0).get(0));
        assertEquals("µm", rows.get(0).get(1));
        assertTrue(rows.get(0).get(6).contains("%"), "yield against lm3020-r1: " + rows.get(0));
        JFreeChart histogram = view.shownChart();
        assertNotNull(histogram);
        assertTrue(histogram.getTitle().getText().equals("requirement[lm3020-r1] over 16 variants"),
                histogram.getTitle().getText());
        assertTrue(view.shownTitle().startsWith("Monte-Carlo study 'XY tolerances' of LM-3020"), view.shownTitle());

        RunVariationStudyHandler.start(page, machine, machine.getStudies().get(1));
        waitFor(() -> view.shownResult() != null && view.shownResult().definition().name().equals("Kv match"));
        JFreeChart sweep = view.shownChart();
        assertEquals(3, sweep.getXYPlot().getDataset().getSeriesCount(), "one curve per X1 gain");
        assertEquals(9, sweep.getXYPlot().getDataset().getItemCount(0), "nine Y gains per curve");
        assertTrue(view.shownRows().get(0).get(6).startsWith("grid "), view.shownRows().get(0).toString());
    }
}
