package org.tracewell.ui.views;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Consumer;
import java.util.function.Function;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.IToolBarManager;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.util.IPropertyChangeListener;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.viewers.TreeViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.IWorkbenchPartReference;
import org.eclipse.ui.part.ViewPart;
import org.tracewell.core.SafetyCaution;
import org.tracewell.engine.units.TradeUnits;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;
import org.tracewell.model.units.UnitSystem;
import org.tracewell.report.TraceMatrixExport;
import org.tracewell.requirements.DisplayUnits;
import org.tracewell.requirements.RequirementReport;
import org.tracewell.requirements.RequirementResult;
import org.tracewell.requirements.RequirementStatus;
import org.tracewell.requirements.ReviewResults;
import org.tracewell.requirements.Verification;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.prefs.TracewellPreferences;

/**
 * Requirement Trace: each machine requirement, the axis allocations derived from it, and the computed results that
 * verify them, with value, limit, margin and status, for the machine of the active Machine Editor. The review runs in
 * a job ({@link ActiveMachineReview}); the tree shows the newest one. Selecting a requirement reveals it in the
 * editor.
 */
public final class RequirementTraceView extends ViewPart {

    public static final String ID = "org.tracewell.ui.view.requirementTrace";

    /** Significant figures of values, limits and margins: enough to see a few % of margin on a µm limit. */
    private static final int SIGNIFICANT = 3;
    /** Ids of the toolbar's export actions: this prefix plus "csv" or "html". */
    public static final String EXPORT_ACTION_PREFIX = "org.tracewell.ui.trace.export.";

    private static final String[] COLUMNS = {"Requirement / statement", "Value", "Limit", "Margin", "Status",
        "Verified by"};
    private static final int[] WIDTHS = {380, 110, 110, 150, 100, 320};

    /** A result under the requirement it verifies; the owner keeps equal results under two parents apart. */
    public record VerificationRow(RequirementResult owner, Verification verification) {
    }

    /**
     * One tree row as shown.
     *
     * @param depth       0 for a machine requirement
     * @param parentId    id of the requirement above it ("" at the top)
     * @param id          the requirement's id, "" for a verifying result
     * @param cells       the column texts, in {@link #COLUMNS} order
     */
    public record ShownRow(int depth, String parentId, String id, List<String> cells) {

        public String status() {
            return cells.get(4);
        }
    }

    private Label verdict;
    private TreeViewer viewer;
    private final IPropertyChangeListener unitsListener = event -> {
        if (TracewellPreferences.UNIT_SYSTEM.equals(event.getProperty())) {
            Display.getDefault().asyncExec(() -> {
                if (viewer != null && !viewer.getControl().isDisposed()) {
                    viewer.refresh(true);
                }
            });
        }
    };
    private ActiveMachineReview review;
    private volatile RequirementReport shown;
    private volatile ReviewResults shownResults;
    private final Consumer<ActiveMachineReview.Outcome> listener = this::show;
    /** The newest review while the view is hidden. */
    private ActiveMachineReview.Outcome pending;
    private final IPartListener2 visibility = new IPartListener2() {
        @Override
        public void partVisible(IWorkbenchPartReference ref) {
            if (ref.getPart(false) == RequirementTraceView.this && pending != null) {
                show(pending);
            }
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        verdict = new Label(parent, SWT.WRAP);
        verdict.setFont(JFaceResources.getBannerFont());
        verdict.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));

        viewer = new TreeViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        viewer.getTree().setHeaderVisible(true);
        viewer.getTree().setLinesVisible(true);
        viewer.getTree().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        for (int c = 0; c < COLUMNS.length; c++) {
            TreeViewerColumn column = new TreeViewerColumn(viewer, SWT.LEFT);
            column.getColumn().setText(COLUMNS[c]);
            column.getColumn().setWidth(WIDTHS[c]);
            column.setLabelProvider(new CellLabels(c));
        }
        viewer.setContentProvider(new TraceContent());
        viewer.addSelectionChangedListener(e -> reveal(e.getStructuredSelection()));

        Label caution = new Label(parent, SWT.WRAP);
        caution.setText("Caution: " + SafetyCaution.SHORT);
        caution.setLayoutData(new GridData(SWT.FILL, SWT.BOTTOM, true, false));

        IToolBarManager toolBar = getViewSite().getActionBars().getToolBarManager();
        toolBar.add(exportAction("Export Trace as CSV…", "csv", TraceMatrixExport::csv));
        toolBar.add(exportAction("Export Trace as HTML…", "html", TraceMatrixExport::html));

        getSite().getPage().addPartListener(visibility);
        review = ActiveMachineReview.subscribe(getSite().getPage(), listener);
        TracewellPreferences.store().addPropertyChangeListener(unitsListener);
        // The view becomes visible after this method returns; show what arrived meanwhile then.
        parent.getDisplay().asyncExec(() -> {
            if (pending != null) {
                show(pending);
            }
        });
    }

    /** Writes the trace matrix of the review on screen; the file dialog asks before replacing a file. */
    private Action exportAction(String label, String extension, Function<ReviewResults, String> format) {
        Action action = new Action(label) {
            @Override
            public void run() {
                ReviewResults results = shownResults;
                Shell shell = viewer.getControl().getShell();
                if (results == null) {
                    MessageDialog.openInformation(shell, "Export Trace",
                            "There is no reviewed machine yet: open a machine and wait for the review to finish.");
                    return;
                }
                FileDialog dialog = new FileDialog(shell, SWT.SAVE);
                dialog.setText(label.replace("…", ""));
                dialog.setFilterExtensions(new String[] {"*." + extension});
                dialog.setFileName(results.analysis().machineId() + "-trace." + extension);
                dialog.setOverwrite(true);
                String chosen = dialog.open();
                if (chosen == null) {
                    return;
                }
                try {
                    TraceMatrixExport.write(format.apply(results), Path.of(chosen));
                } catch (IOException | RuntimeException e) {
                    MessageDialog.openError(shell, "Export Trace", "Could not write " + chosen + ": " + e.getMessage());
                }
            }
        };
        action.setId(EXPORT_ACTION_PREFIX + extension);
        return action;
    }

    private void show(ActiveMachineReview.Outcome outcome) {
        if (viewer == null || viewer.getControl().isDisposed()) {
            return;
        }
        if (!viewer.getControl().isVisible()) {
            pending = outcome; // a hidden tree is not rebuilt per edit; it catches up when shown
            return;
        }
        pending = null;
        RequirementReport report = outcome.results() == null ? null : outcome.results().requirements();
        shownResults = outcome.results();
        if (report == null) {
            shown = null;
            viewer.setInput(null);
            Labels.setKeepingLayout(verdict, outcome.running() ? "Reviewing " + outcome.machineName() + "…"
                    : outcome.problem());
            verdict.setForeground(null);
        } else {
            if (report != shown) {
                // A trace is a few dozen rows: show it whole, so a status change cannot hide in a collapsed branch.
                viewer.setInput(report);
                viewer.expandAll();
                shown = report;
            }
            Labels.setKeepingLayout(verdict, verdict(outcome.machineName(), report)
                    + (outcome.running() ? " (updating…)" : ""));
            verdict.setForeground(statusColour(report.overallStatus()));
        }
    }

    /** E.g. "LM-3020: 1 of 12 requirements violated, 2 not evaluated; 1 gap in the trace". */
    static String verdict(String machine, RequirementReport report) {
        int total = report.results().size();
        long violated = report.results().stream().filter(r -> r.status() == RequirementStatus.VIOLATED).count();
        long notEvaluated = report.results().stream().filter(r -> r.status() == RequirementStatus.NOT_EVALUATED)
                .count();
        StringBuilder text = new StringBuilder(machine).append(": ");
        if (total == 0) {
            text.append("no requirements to review");
        } else if (violated == 0 && notEvaluated == 0) {
            text.append(total == 1 ? "the requirement is met" : "all " + total + " requirements met");
        } else {
            List<String> parts = new ArrayList<>();
            if (violated > 0) {
                parts.add(violated + " of " + total + " requirements violated");
            }
            if (notEvaluated > 0) {
                parts.add(notEvaluated + (violated > 0 ? "" : " of " + total + " requirements") + " not evaluated");
            }
            text.append(String.join(", ", parts));
        }
        int gaps = report.coverage().size();
        if (gaps > 0) {
            text.append("; ").append(gaps).append(gaps == 1 ? " gap" : " gaps").append(" in the trace");
        }
        return text.toString();
    }

    private Color statusColour(RequirementStatus status) {
        return viewer.getControl().getDisplay().getSystemColor(switch (status) {
            case MET -> SWT.COLOR_DARK_GREEN;
            case VIOLATED -> SWT.COLOR_RED;
            case NOT_EVALUATED -> SWT.COLOR_DARK_YELLOW;
        });
    }

    /** Selecting a requirement shows it on the editor's Requirements page (the editor stays in the background). */
    private void reveal(IStructuredSelection selection) {
        Object first = selection.getFirstElement();
        RequirementResult result = first instanceof RequirementResult r ? r
                : first instanceof VerificationRow v ? v.owner() : null;
        MachineEditor editor = review == null ? null : review.followedEditor();
        if (result == null || editor == null || !(editor.model().root() instanceof Machine machine)) {
            return;
        }
        for (Requirement requirement : machine.getRequirements()) {
            if (result.id().equals(requirement.getId())) {
                editor.reveal(requirement);
                return;
            }
        }
    }

    // ------------------------------------------------------------------------------------------------ rows and cells

    private static final class TraceContent implements ITreeContentProvider {

        private RequirementReport report;

        @Override
        public void inputChanged(org.eclipse.jface.viewers.Viewer v, Object oldInput, Object newInput) {
            report = newInput instanceof RequirementReport r ? r : null;
        }

        @Override
        public Object[] getElements(Object input) {
            return report == null ? new Object[0] : report.machineLevel().toArray();
        }

        @Override
        public Object[] getChildren(Object element) {
            if (!(element instanceof RequirementResult result) || report == null) {
                return new Object[0];
            }
            List<Object> children = new ArrayList<>(report.children(result.id()));
            for (Verification v : result.verifiedBy()) {
                children.add(new VerificationRow(result, v));
            }
            return children.toArray();
        }

        @Override
        public Object getParent(Object element) {
            if (element instanceof VerificationRow row) {
                return row.owner();
            }
            if (element instanceof RequirementResult result && report != null && result.parentId().isPresent()) {
                return report.result(result.parentId().get()).orElse(null);
            }
            return null;
        }

        @Override
        public boolean hasChildren(Object element) {
            return getChildren(element).length > 0;
        }
    }

    private final class CellLabels extends ColumnLabelProvider {

        private final int column;

        CellLabels(int column) {
            this.column = column;
        }

        @Override
        public String getText(Object element) {
            return cell(element, column);
        }

        @Override
        public String getToolTipText(Object element) {
            if (element instanceof RequirementResult r) {
                return r.notEvaluatedReason().orElse(r.rationale());
            }
            return null;
        }

        @Override
        public Color getForeground(Object element) {
            if (column == 4 && element instanceof RequirementResult r) {
                return statusColour(r.status());
            }
            return null;
        }
    }

    /** The text of {@code column} for a tree element; pure, so the tests read what the tree shows. */
    static String cell(Object element, int column) {
        if (element instanceof RequirementResult r) {
            String modelUnit = DisplayUnits.shown(r.siUnit(), r.displayUnit());
            // Lengths follow the display units preference (µm → µin); the rest is shown as the model states it.
            String unit = UnitSystem.active().shown(modelUnit);
            double k = UnitSystem.active().perMetricUnit(modelUnit);
            return switch (column) {
                case 0 -> r.id() + " — " + r.statement()
                        + r.allocatedAxisName().map(axis -> " [axis " + axis + "]").orElse("");
                case 1 -> withUnit(scaled(r.displayValue(), k), unit);
                case 2 -> ("atLeast".equals(r.bound()) ? "≥ " : "≤ ")
                        + TradeUnits.format(r.displayLimit() * k, SIGNIFICANT) + " " + unit;
                case 3 -> margin(r, unit, k);
                case 4 -> r.status().label();
                case 5 -> r.governing().map(Verification::describe)
                        .orElse(r.notEvaluatedReason().orElse(r.childIds().isEmpty() ? "—" : "its allocations"));
                default -> "";
            };
        }
        if (element instanceof VerificationRow row) {
            Verification v = row.verification();
            RequirementResult owner = row.owner();
            return switch (column) {
                case 0 -> "verified by " + v.describe();
                case 1 -> {
                    String modelUnit = DisplayUnits.shown(owner.siUnit(), owner.displayUnit());
                    yield v.value().isPresent()
                            ? withUnit(OptionalDouble.of(DisplayUnits.fromSi(v.value().getAsDouble(), owner.siUnit(),
                                    owner.displayUnit()) * UnitSystem.active().perMetricUnit(modelUnit)),
                                    UnitSystem.active().shown(modelUnit))
                            : "not computed";
                }
                default -> "";
            };
        }
        return "";
    }

    private static String withUnit(OptionalDouble value, String unit) {
        return value.isPresent() ? TradeUnits.format(value.getAsDouble(), SIGNIFICANT) + " " + unit : "—";
    }

    private static OptionalDouble scaled(OptionalDouble value, double k) {
        return value.isPresent() ? OptionalDouble.of(value.getAsDouble() * k) : value;
    }

    private static String margin(RequirementResult r, String unit, double k) {
        OptionalDouble margin = scaled(r.displayMargin(), k);
        if (margin.isEmpty()) {
            return "—";
        }
        String percent = r.marginPercent().isPresent()
                ? " (" + TradeUnits.format(r.marginPercent().getAsDouble(), 2) + " %)" : "";
        return TradeUnits.format(margin.getAsDouble(), SIGNIFICANT) + " " + unit + percent;
    }

    // ------------------------------------------------------------------------------------------------ for tests

    /** The requirements report now in the tree; null while there is none. */
    /** The review whose trace is on screen (what the export actions write), or null. */
    public ReviewResults shownResults() {
        return shownResults;
    }

    public RequirementReport shownReport() {
        return shown;
    }

    /** The verdict line above the tree. */
    public String shownVerdict() {
        return verdict.getText();
    }

    /** Every row of the tree as shown, depth first, expanded or not. */
    public List<ShownRow> shownRows() {
        viewer.expandAll();
        List<ShownRow> rows = new ArrayList<>();
        for (TreeItem item : viewer.getTree().getItems()) {
            collect(item, 0, "", rows);
        }
        return rows;
    }

    private static void collect(TreeItem item, int depth, String parentId, List<ShownRow> rows) {
        List<String> cells = new ArrayList<>();
        for (int c = 0; c < COLUMNS.length; c++) {
            cells.add(item.getText(c));
        }
        String id = Optional.ofNullable(item.getData()).filter(RequirementResult.class::isInstance)
                .map(RequirementResult.class::cast).map(RequirementResult::id).orElse("");
        rows.add(new ShownRow(depth, parentId, id, List.copyOf(cells)));
        for (TreeItem child : item.getItems()) {
            collect(child, depth + 1, id, rows);
        }
    }

    @Override
    public void setFocus() {
        viewer.getControl().setFocus();
    }

    @Override
    public void dispose() {
        TracewellPreferences.store().removePropertyChangeListener(unitsListener);
        getSite().getPage().removePartListener(visibility);
        if (review != null) {
            review.unsubscribe(listener);
        }
        super.dispose();
    }
}
