package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.LoopAnalysisViewTest.waitFor;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.model.Requirement;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.requirements.RequirementReport;
import org.tracewell.requirements.RequirementStatus;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.views.ErrorBudgetView;
import org.tracewell.ui.views.RequirementTraceView;
import org.tracewell.ui.views.RequirementTraceView.ShownRow;

/**
 * The Requirement Trace view on the LM-3020: the circular-deviation requirement and its axis allocations as a tree,
 * and a limit edited in the Machine Editor turning the requirement from met to violated.
 */
class RequirementTraceViewTest {

    private static final String CIRCLE_REQUIREMENT = "lm3020-r1";

    private MachineEditor editor;

    @AfterEach
    void closeEditor() {
        if (editor != null) {
            editor.getSite().getPage().closeEditor(editor, false);
        }
    }

    @Test
    void showsTheTraceAndFollowsALimitEdit(@TempDir Path temp) throws Exception {
        Path machineFile = MachineEditorTest.copyExamples(temp).resolve("LM-3020.machine");
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        editor = MachineEditor.open(page, machineFile);
        RequirementTraceView view = (RequirementTraceView) page.showView(RequirementTraceView.ID);

        waitFor(() -> view.shownReport() != null);
        RequirementReport report = view.shownReport();
        assertEquals(RequirementStatus.MET, report.result(CIRCLE_REQUIREMENT).orElseThrow().status(),
                "the demo LM-3020 meets G ≤ 25 µm (DESIGN.md demo scenario)");

        List<ShownRow> rows = view.shownRows();
        ShownRow r1 = row(rows, CIRCLE_REQUIREMENT);
        assertEquals(0, r1.depth(), "a machine requirement is at the top of the tree");
        assertEquals("met", r1.status());
        assertTrue(r1.cells().get(2).startsWith("≤ 25"), "limit shown in µm: " + r1.cells());
        Set<String> under = rows.stream().filter(r -> r.parentId().equals(CIRCLE_REQUIREMENT) && !r.id().isEmpty())
                .map(ShownRow::id).collect(Collectors.toSet());
        // The allocations the example derives from lm3020-r1 (examples/LM-3020.machine).
        assertTrue(under.containsAll(Set.of("lm3020-r1-x1-kv", "lm3020-r1-y-kv", "lm3020-r1-x1-pm", "lm3020-r1-y-pm",
                "lm3020-r1-y-gm")), "children of lm3020-r1: " + under);
        assertTrue(rows.stream().filter(r -> r.parentId().equals("lm3020-r1-y-kv")).anyMatch(
                r -> r.id().isEmpty() && r.cells().get(0).startsWith("verified by ")),
                "an allocation shows the result that verifies it");
        assertTrue(view.shownVerdict().startsWith("LM-3020"), view.shownVerdict());

        // The toolbar exports what is on screen as CSV and HTML.
        for (String format : List.of("csv", "html")) {
            assertTrue(view.getViewSite().getActionBars().getToolBarManager()
                    .find(RequirementTraceView.EXPORT_ACTION_PREFIX + format) != null, "export " + format);
        }
        String csv = org.tracewell.report.TraceMatrixExport.csv(view.shownResults());
        assertEquals(view.shownResults().requirements().results().size() + 1, csv.split("\r\n").length, csv);

        // The Error Budget view shows the same review.
        ErrorBudgetView budget = (ErrorBudgetView) page.showView(ErrorBudgetView.ID);
        waitFor(() -> budget.shownResults() != null && !budget.shownRows().isEmpty());
        assertTrue(budget.shownSummary().get(1).startsWith("Combination: "), budget.shownSummary().toString());
        page.activate(view);

        // A G limit of 1 µm (stored in SI, metres) set through the editor's command path cannot be met.
        Requirement circle = editor.model().machine().getRequirements().stream()
                .filter(r -> CIRCLE_REQUIREMENT.equals(r.getId())).findFirst().orElseThrow();
        Optional<String> rejected = editor.valueEntry().set(circle, Literals.REQUIREMENT__LIMIT, 1.0e-6);
        assertTrue(rejected.isEmpty(), rejected.toString());
        assertTrue(editor.isDirty());
        waitFor(() -> view.shownReport() != report && view.shownReport() != null
                && view.shownReport().result(CIRCLE_REQUIREMENT).orElseThrow().status() == RequirementStatus.VIOLATED);
        ShownRow violated = row(view.shownRows(), CIRCLE_REQUIREMENT);
        assertEquals("violated", violated.status());
        assertTrue(violated.cells().get(3).startsWith("-") || violated.cells().get(3).startsWith("−"),
                "negative margin: " + violated.cells());
        assertFalse(view.shownVerdict().contains("all "), view.shownVerdict());
    }

    private static ShownRow row(List<ShownRow> rows, String id) {
        return rows.stream().filter(r -> r.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no row " + id + " in " + rows.stream().map(ShownRow::id).toList()));
    }
}
