package org.tracewell.ui.views;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.util.IPropertyChangeListener;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.ui.part.ViewPart;
import org.tracewell.charts.BudgetBar;
import org.tracewell.charts.BudgetBarChart;
import org.tracewell.core.analysis.RequirementBudget;
import org.tracewell.engine.budget.BudgetEvaluation;
import org.tracewell.engine.budget.BudgetLine;
import org.tracewell.engine.budget.BudgetStatus;
import org.tracewell.engine.budget.LineContribution;
import org.tracewell.engine.budget.TargetComparison;
import org.tracewell.engine.units.TradeUnits;
import org.tracewell.model.units.UnitSystem;
import org.tracewell.requirements.ReviewResults;
import org.tracewell.ui.charts.ChartCanvas;
import org.tracewell.ui.prefs.TracewellPreferences;

/**
 * Error Budget: for a machine contour requirement of the active machine, its budget lines ranked by their part of
 * the total, the combination method, and the total against the requirement's limit (with the reserve), as a table
 * and as bars. Shows the same review as the Requirement Trace view ({@link ActiveMachineReview}).
 */
public final class ErrorBudgetView extends ViewPart {

    public static final String ID = "org.tracewell.ui.view.errorBudget";

    private static final String[] COLUMNS = {"Rank", "Source", "Axis", "Class", "Distribution", "Value (µm)",
        "Contribution (µm)", "Share (%)"};
    /** Columns whose header names the length unit. */
    private static final int VALUE_COLUMN = 5;
    private static final int CONTRIBUTION_COLUMN = 6;
    private static final int[] WIDTHS = {50, 220, 60, 90, 110, 90, 120, 80};

    private Combo requirementChoice;
    private Label summary;
    private Label method;
    private Table table;
    private ChartCanvas chart;
    private ActiveMachineReview review;
    private ReviewResults shown;
    private final List<RequirementBudget> choices = new ArrayList<>();
    private final Consumer<ActiveMachineReview.Outcome> listener = this::show;
    private final IPropertyChangeListener unitsListener = event -> {
        if (TracewellPreferences.UNIT_SYSTEM.equals(event.getProperty())) {
            Display.getDefault().asyncExec(this::showSelected);
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(2, false));
        new Label(parent, SWT.NONE).setText("Machine requirement:");
        requirementChoice = new Combo(parent, SWT.READ_ONLY | SWT.DROP_DOWN);
        requirementChoice.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        requirementChoice.addListener(SWT.Selection, e -> showSelected());

        summary = new Label(parent, SWT.WRAP);
        summary.setFont(JFaceResources.getBannerFont());
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        method = new Label(parent, SWT.WRAP);
        method.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));

        SashForm sash = new SashForm(parent, SWT.HORIZONTAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        table = new Table(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (int c = 0; c < COLUMNS.length; c++) {
            TableColumn column = new TableColumn(table, c >= 5 || c == 0 ? SWT.RIGHT : SWT.LEFT);
            column.setText(COLUMNS[c]);
            column.setWidth(WIDTHS[c]);
        }
        chart = new ChartCanvas(sash, SWT.NONE);
        sash.setWeights(55, 45);

        review = ActiveMachineReview.subscribe(getSite().getPage(), listener);
        TracewellPreferences.store().addPropertyChangeListener(unitsListener);
    }

    private void show(ActiveMachineReview.Outcome outcome) {
        if (table == null || table.isDisposed()) {
            return;
        }
        ReviewResults results = outcome.results();
        if (results == null) {
            shown = null;
            choices.clear();
            requirementChoice.removeAll();
            clearBudget(outcome.running() ? "Reviewing " + outcome.machineName() + "…" : outcome.problem());
            return;
        }
        if (results == shown) {
            return;
        }
        String previous = selectedRequirementId();
        shown = results;
        choices.clear();
        choices.addAll(results.budget().requirements());
        requirementChoice.removeAll();
        int select = 0;
        for (int i = 0; i < choices.size(); i++) {
            RequirementBudget budget = choices.get(i);
            String statement = results.requirements().result(budget.requirementId())
                    .map(r -> " — " + r.statement()).orElse("");
            requirementChoice.add(budget.requirementId() + statement);
            if (budget.requirementId().equals(previous)) {
                select = i;
            }
        }
        if (choices.isEmpty()) {
            clearBudget(outcome.machineName() + " has no machine contour requirement with a budget.");
            return;
        }
        requirementChoice.select(select);
        showSelected();
    }

    private String selectedRequirementId() {
        int index = requirementChoice.getSelectionIndex();
        return index >= 0 && index < choices.size() ? choices.get(index).requirementId() : null;
    }

    private void clearBudget(String message) {
        summary.setText(message);
        summary.setForeground(null);
        method.setText("");
        table.removeAll();
        chart.setChart(null);
        summary.getParent().layout(true);
    }

    private void showSelected() {
        if (table == null || table.isDisposed()) {
            return;
        }
        table.getColumn(VALUE_COLUMN).setText("Value (" + lengthUnit() + ")");
        table.getColumn(CONTRIBUTION_COLUMN).setText("Contribution (" + lengthUnit() + ")");
        int index = requirementChoice.getSelectionIndex();
        if (index < 0 || index >= choices.size()) {
            return;
        }
        RequirementBudget budget = choices.get(index);
        BudgetEvaluation evaluation = budget.evaluation();
        summary.setText(totals(budget.requirementId(), evaluation));
        summary.setForeground(table.getDisplay().getSystemColor(switch (evaluation.status()) {
            case MET -> SWT.COLOR_DARK_GREEN;
            case VIOLATED -> SWT.COLOR_RED;
            case NOT_EVALUATED -> SWT.COLOR_DARK_YELLOW;
        }));
        method.setText("Combination: " + evaluation.methodStatement());
        table.removeAll();
        for (LineContribution c : evaluation.ranking()) {
            new TableItem(table, SWT.NONE).setText(row(c));
        }
        List<BudgetBar> bars = new ArrayList<>();
        for (LineContribution c : evaluation.contributions()) {
            bars.add(new BudgetBar(label(c.line()), c.portion()));
        }
        if (bars.isEmpty()) {
            chart.setChart(null);
        } else {
            double target = evaluation.comparison().map(TargetComparison::target).orElse(Double.NaN);
            double allowed = evaluation.comparison().filter(t -> t.reserveFraction() > 0)
                    .map(TargetComparison::allowedTotal).orElse(Double.NaN);
            chart.setChart(BudgetBarChart.create("Error budget of " + budget.requirementId(), bars,
                    "total (" + evaluation.method().displayName() + ")", evaluation.total(), target, allowed));
        }
        summary.getParent().layout(true);
    }

    /** E.g. "lm3020-r1: total 18.2 µm of 25 µm (22.5 µm allowed after the 10 % reserve) — met, margin 6.8 µm". */
    static String totals(String requirementId, BudgetEvaluation evaluation) {
        String total = um(evaluation.total());
        if (evaluation.comparison().isEmpty()) {
            return requirementId + ": total " + total + " " + lengthUnit() + " (no target to compare with)";
        }
        TargetComparison t = evaluation.comparison().get();
        String unit = " " + lengthUnit();
        String reserve = t.reserveFraction() > 0 ? " (" + um(t.allowedTotal()) + unit + " allowed after the "
                + TradeUnits.format(100 * t.reserveFraction(), 2) + " % reserve)" : "";
        String verdict = t.status() == BudgetStatus.MET ? "met" : "violated";
        return requirementId + ": total " + total + unit + " of " + um(t.target()) + unit + reserve + " — " + verdict
                + ", margin " + um(t.margin()) + unit;
    }

    private static String[] row(LineContribution c) {
        BudgetLine line = c.line();
        return new String[] {
            Integer.toString(c.rank()),
            line.source().displayName() + (line.name().isBlank() ? "" : " — " + line.name()),
            line.axis() == null ? "machine" : line.axis(),
            line.errorClass().displayName(),
            line.distribution().displayName(),
            um(line.value()),
            um(c.contribution()),
            TradeUnits.format(100 * c.share(), 3),
        };
    }

    private static String label(BudgetLine line) {
        return line.name().isBlank() ? line.source().displayName() : line.name();
    }

    /** Budget values in µm, or in µin when the workbench shows inches. */
    private static String um(double metres) {
        return TradeUnits.format(TradeUnits.micrometres(metres) * UnitSystem.active().perMetricUnit("µm"), 3);
    }

    private static String lengthUnit() {
        return UnitSystem.active().shown("µm");
    }

    // ------------------------------------------------------------------------------------------------ for tests

    /** The review now shown; null while there is none. */
    public ReviewResults shownResults() {
        return shown;
    }

    /** Rows of the budget table as shown, in {@link #COLUMNS} order. */
    public List<String[]> shownRows() {
        List<String[]> rows = new ArrayList<>();
        for (TableItem item : table.getItems()) {
            String[] cells = new String[COLUMNS.length];
            for (int c = 0; c < cells.length; c++) {
                cells[c] = item.getText(c);
            }
            rows.add(cells);
        }
        return rows;
    }

    /** The totals line and the method statement as shown. */
    public List<String> shownSummary() {
        return List.of(summary.getText(), method.getText());
    }

    @Override
    public void setFocus() {
        requirementChoice.setFocus();
    }

    @Override
    public void dispose() {
        TracewellPreferences.store().removePropertyChangeListener(unitsListener);
        if (review != null) {
            review.unsubscribe(listener);
        }
        super.dispose();
    }
}
