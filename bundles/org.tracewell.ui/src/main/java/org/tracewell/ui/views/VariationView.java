package org.tracewell.ui.views;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.ui.part.ViewPart;
import org.jfree.chart.JFreeChart;
import org.tracewell.charts.HistogramBins;
import org.tracewell.charts.HistogramChart;
import org.tracewell.charts.SweepChart;
import org.tracewell.charts.SweepCurve;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.variation.RequirementYield;
import org.tracewell.core.variation.StudyFigures;
import org.tracewell.core.variation.StudyMetric;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.engine.variation.MetricSummary;
import org.tracewell.model.StudyKind;
import org.tracewell.model.units.UnitTable;
import org.tracewell.ui.charts.ChartCanvas;

/**
 * Variation: the result of the last variation study run from the workbench ({@link RunVariationStudyHandler}). One
 * row per collected result (nominal, percentiles, yield against its requirement) and, for the result chosen, its
 * histogram over the variants (Monte-Carlo) or its curves over the grid (sweep), drawn by the report's chart
 * factories. The safety caution stands under the results, since a sweep over gains suggests gains.
 */
public final class VariationView extends ViewPart {

    public static final String ID = "org.tracewell.ui.view.variation";

    private static final String[] COLUMNS = {"Result", "Unit", "Nominal", "5 %", "50 %", "95 %", "Yield"};
    private static final int[] WIDTHS = {260, 90, 80, 80, 80, 80, 150};

    private Label title;
    private Label facts;
    private Combo metricChoice;
    private Table table;
    private ChartCanvas chart;
    private StudyResult shown;

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(2, false));
        title = new Label(parent, SWT.WRAP);
        title.setFont(JFaceResources.getBannerFont());
        title.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        title.setText("No variation study run yet: Analysis → Run Variation Study… runs the active machine's study.");
        facts = new Label(parent, SWT.WRAP);
        facts.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        new Label(parent, SWT.NONE).setText("Result:");
        metricChoice = new Combo(parent, SWT.READ_ONLY | SWT.DROP_DOWN);
        metricChoice.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        metricChoice.addListener(SWT.Selection, e -> showChart(metricChoice.getSelectionIndex()));
        SashForm sash = new SashForm(parent, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        chart = new ChartCanvas(sash, SWT.NONE);
        table = new Table(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (int c = 0; c < COLUMNS.length; c++) {
            TableColumn column = new TableColumn(table, c >= 2 ? SWT.RIGHT : SWT.LEFT);
            column.setText(COLUMNS[c]);
            column.setWidth(WIDTHS[c]);
        }
        table.addListener(SWT.Selection, e -> {
            int row = table.getSelectionIndex();
            if (row >= 0) {
                metricChoice.select(row);
                showChart(row);
            }
        });
        sash.setWeights(60, 40);
        Label caution = new Label(parent, SWT.WRAP);
        caution.setLayoutData(new GridData(SWT.FILL, SWT.BOTTOM, true, false, 2, 1));
        caution.setText("Caution: " + SafetyCaution.SHORT);
    }

    /** Shows a study's result. Call on the UI thread. */
    void show(StudyResult result) {
        if (table == null || table.isDisposed()) {
            return;
        }
        shown = result;
        var d = result.definition();
        title.setText((d.kind() == StudyKind.SWEEP ? "Sweep" : "Monte-Carlo study") + " '" + d.name() + "' of "
                + result.machineName() + (result.cancelled() ? " — cancelled" : ""));
        facts.setText(String.format(Locale.ROOT, "%d of %d %s%s, %.1f s on %d %s; varied: %s", result.completedCount(),
                result.plannedCount(), d.kind() == StudyKind.SWEEP ? "grid points" : "variants",
                d.kind() == StudyKind.SWEEP ? "" : ", seed " + d.seed(), result.seconds(), result.threads(),
                result.threads() == 1 ? "thread" : "threads",
                String.join(", ", result.parameters().stream().map(q -> q.name()).toList())));
        metricChoice.removeAll();
        table.removeAll();
        for (int m = 0; m < result.metrics().size(); m++) {
            StudyMetric metric = result.metrics().get(m);
            metricChoice.add(metric.name());
            new TableItem(table, SWT.NONE).setText(row(result, m));
        }
        if (!result.metrics().isEmpty()) {
            metricChoice.select(0);
            showChart(0);
        }
        title.getParent().layout(true);
    }

    /** Shows why there is no result (a study that could not run). */
    void showProblem(String message) {
        if (table == null || table.isDisposed()) {
            return;
        }
        shown = null;
        title.setText(message);
        facts.setText("");
        metricChoice.removeAll();
        table.removeAll();
        chart.setChart(null);
        title.getParent().layout(true);
    }

    private void showChart(int m) {
        if (shown == null || m < 0 || m >= shown.metrics().size()) {
            return;
        }
        chart.setChart(chartOf(shown, m));
    }

    /** The chart of result {@code m}: its histogram or its sweep curves; null when nothing could be computed. */
    static JFreeChart chartOf(StudyResult r, int m) {
        if (r.monteCarlo().isPresent()) {
            return StudyFigures.histogram(r, m).map(f -> HistogramChart.create(f.title(), f.axisLabel(),
                    new HistogramBins(f.edges(), f.counts()), f.nominal(), f.limit(), f.atMost(), f.yieldText()))
                    .orElse(null);
        }
        StudyFigures.SweepFigure f = StudyFigures.sweep(r, m);
        List<SweepCurve> curves = new ArrayList<>();
        for (StudyFigures.Curve c : f.curves()) {
            curves.add(new SweepCurve(c.name(), c.x(), c.y()));
        }
        return SweepChart.create(f.title(), f.xLabel(), f.yLabel(), curves, f.limit(), f.nominalX());
    }

    private static String[] row(StudyResult r, int m) {
        StudyMetric metric = r.metrics().get(m);
        String unit = metric.displayUnit();
        String nominal = StudyFigures.number(r.nominalMetrics()[m], unit);
        if (r.monteCarlo().isEmpty()) {
            double[] v = r.sweep().orElseThrow().metricValues(m);
            return new String[] {metric.name(), unit, nominal, "", "", "", "grid " + StudyFigures.number(min(v), unit) + " … "
                    + StudyFigures.number(max(v), unit)};
        }
        MetricSummary s = r.summary(m);
        String yield = r.yieldOf(m).map(VariationView::yield).orElse("");
        return new String[] {metric.name(), unit, nominal, StudyFigures.number(s.p05(), unit), StudyFigures.number(s.p50(), unit),
                StudyFigures.number(s.p95(), unit), yield};
    }

    private static String yield(RequirementYield y) {
        return String.format(Locale.ROOT, "%.1f %% ± %.1f %%", 100 * y.estimate().fraction(),
                100 * y.estimate().standardError());
    }

    private static double min(double[] v) {
        return java.util.Arrays.stream(v).filter(Double::isFinite).min().orElse(Double.NaN);
    }

    private static double max(double[] v) {
        return java.util.Arrays.stream(v).filter(Double::isFinite).max().orElse(Double.NaN);
    }

    @Override
    public void setFocus() {
        table.setFocus();
    }

    // ---------------------------------------------------------------- for tests

    /** The result shown, or null. */
    public StudyResult shownResult() {
        return shown;
    }

    /** The chart on screen, or null. */
    public JFreeChart shownChart() {
        return chart.getChart();
    }

    /** The table's cells, row by row. */
    public List<List<String>> shownRows() {
        List<List<String>> rows = new ArrayList<>();
        for (TableItem item : table.getItems()) {
            List<String> cells = new ArrayList<>();
            for (int c = 0; c < COLUMNS.length; c++) {
                cells.add(item.getText(c));
            }
            rows.add(cells);
        }
        return rows;
    }

    /** The title line. */
    public String shownTitle() {
        return title.getText();
    }
}
