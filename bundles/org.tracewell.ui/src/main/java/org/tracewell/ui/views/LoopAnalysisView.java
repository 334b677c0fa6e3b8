package org.tracewell.ui.views;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.part.ViewPart;
import org.jfree.chart.JFreeChart;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.LoopAnalyzer;
import org.tracewell.engine.poly.CoefficientText;
import org.tracewell.engine.tf.TransferFunction;
import org.tracewell.core.SafetyCaution;
import org.tracewell.ui.charts.ChartCanvas;

/**
 * Loop Analysis: type, error constants, steady-state errors, margins, bandwidth and step
 * figures of one loop, with Bode, step and pole-zero charts. The loop is typed as
 * transfer-function coefficients; edits are analysed off the UI thread after a short pause.
 */
public final class LoopAnalysisView extends ViewPart {

    public static final String ID = "org.tracewell.ui.view.loopAnalysis";

    /** Pause after the last keystroke before analysing, ms. */
    static final long DEBOUNCE_MS = 250;

    private Text numerator;
    private Text denominator;
    private Text feedbackNumerator;
    private Text feedbackDenominator;
    private Text deadTimeMs;
    private Label message;
    private Table table;
    private ChartCanvas bode;
    private ChartCanvas step;
    private ChartCanvas poles;

    private final AtomicLong generation = new AtomicLong();
    private volatile LoopAnalysis shown;

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));

        Composite form = new Composite(parent, SWT.NONE);
        form.setLayout(new GridLayout(6, false));
        form.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        // Invented demo loop (LM-3020 Y bridge): Kv = 50 1/s around a 3 ms velocity-loop lag.
        numerator = field(form, "Forward G(s) numerator", "50",
                "Coefficients in descending powers of s, separated by spaces or commas");
        denominator = field(form, "denominator", "0.003 1 0", "e.g. \"0.003 1 0\" is 0.003·s² + s");
        deadTimeMs = field(form, "Dead time (ms)", "0", "Pure delay in milliseconds, e.g. 1.5 sample periods");
        feedbackNumerator = field(form, "Feedback H(s) numerator", "1", "1 / 1 for unity feedback");
        feedbackDenominator = field(form, "denominator", "1", "");
        Button analyse = new Button(form, SWT.PUSH);
        analyse.setText("Analyse");
        analyse.addListener(SWT.Selection, e -> schedule(0));
        analyse.setLayoutData(new GridData(SWT.LEFT, SWT.CENTER, false, false, 2, 1));

        message = new Label(parent, SWT.WRAP);
        message.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));

        SashForm sash = new SashForm(parent, SWT.HORIZONTAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        table = new Table(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String title : new String[] {"Quantity", "Value"}) {
            TableColumn column = new TableColumn(table, SWT.LEFT);
            column.setText(title);
            column.setWidth(title.equals("Quantity") ? 190 : 250);
        }
        CTabFolder tabs = new CTabFolder(sash, SWT.BORDER | SWT.BOTTOM);
        bode = tab(tabs, "Bode");
        step = tab(tabs, "Step response");
        poles = tab(tabs, "Closed-loop poles");
        tabs.setSelection(0);
        sash.setWeights(42, 58);

        Label caution = new Label(parent, SWT.WRAP);
        caution.setText("Caution: " + SafetyCaution.SHORT);
        caution.setLayoutData(new GridData(SWT.FILL, SWT.BOTTOM, true, false));

        for (Text t : List.of(numerator, denominator, deadTimeMs, feedbackNumerator, feedbackDenominator)) {
            t.addModifyListener(e -> schedule(DEBOUNCE_MS));
        }
        schedule(0);
    }

    private static Text field(Composite form, String label, String initial, String tooltip) {
        new Label(form, SWT.NONE).setText(label);
        Text text = new Text(form, SWT.BORDER | SWT.SINGLE);
        text.setText(initial);
        text.setToolTipText(tooltip);
        GridData data = new GridData(SWT.FILL, SWT.CENTER, true, false);
        data.widthHint = 150;
        text.setLayoutData(data);
        return text;
    }

    private static ChartCanvas tab(CTabFolder tabs, String title) {
        CTabItem item = new CTabItem(tabs, SWT.NONE);
        item.setText(title);
        ChartCanvas canvas = new ChartCanvas(tabs, SWT.NONE);
        item.setControl(canvas);
        return canvas;
    }

    /** Reads the fields on the UI thread, analyses in a job, shows the newest result only. */
    private void schedule(long delayMs) {
        String num = numerator.getText();
        String den = denominator.getText();
        String fbNum = feedbackNumerator.getText();
        String fbDen = feedbackDenominator.getText();
        String delay = deadTimeMs.getText();
        long mine = generation.incrementAndGet();
        Display display = numerator.getDisplay();
        Job job = Job.create("Loop analysis", (IProgressMonitor monitor) -> {
            if (mine != generation.get() || monitor.isCanceled()) {
                return Status.CANCEL_STATUS;
            }
            Outcome outcome = compute(num, den, fbNum, fbDen, delay);
            display.asyncExec(() -> {
                if (mine == generation.get() && !table.isDisposed()) {
                    show(outcome);
                }
            });
            return Status.OK_STATUS;
        });
        job.setSystem(true);
        job.schedule(delayMs);
    }

    /** Pure: text in, analysis and charts (or the reason for rejecting the input) out. */
    static Outcome compute(String num, String den, String fbNum, String fbDen, String delayMsText) {
        try {
            double delayMs = parseDelay(delayMsText);
            TransferFunction forward = TransferFunction.of(CoefficientText.parse("Numerator", num),
                    CoefficientText.parse("Denominator", den), delayMs / 1000.0);
            TransferFunction feedback = TransferFunction.of(CoefficientText.parse("Feedback numerator", fbNum),
                    CoefficientText.parse("Feedback denominator", fbDen));
            LoopAnalysis analysis = LoopAnalyzer.analyze(forward, feedback);
            return new Outcome(analysis, LoopCharts.bode(analysis), LoopCharts.step(analysis),
                    LoopCharts.poles(analysis), null);
        } catch (IllegalArgumentException e) {
            return new Outcome(null, null, null, null, e.getMessage());
        }
    }

    private static double parseDelay(String text) {
        String t = text.trim();
        if (t.isEmpty()) {
            return 0;
        }
        double v = CoefficientText.parseNumber("Dead time (ms)", t);
        if (v < 0) {
            throw new IllegalArgumentException("Dead time must be ≥ 0 ms, got " + t);
        }
        return v;
    }

    private void show(Outcome outcome) {
        if (outcome.error() != null) {
            message.setText("Not analysed: " + outcome.error());
            message.setForeground(message.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
            message.getParent().layout(true);
            return;
        }
        shown = outcome.analysis();
        message.setText(outcome.analysis().stable() ? "Closed loop stable."
                : "Closed loop UNSTABLE: no steady-state error, bandwidth or step figures (the final-value theorem does not apply).");
        message.setForeground(message.getDisplay().getSystemColor(
                outcome.analysis().stable() ? SWT.COLOR_DARK_GREEN : SWT.COLOR_DARK_RED));
        table.removeAll();
        for (String[] row : LoopSummary.rows(outcome.analysis())) {
            new TableItem(table, SWT.NONE).setText(row);
        }
        bode.setChart(outcome.bode());
        step.setChart(outcome.step());
        poles.setChart(outcome.poles());
        message.getParent().layout(true);
    }

    /** The analysis now on screen (for tests and for other views); null before the first. */
    public LoopAnalysis shownAnalysis() {
        return shown;
    }

    /** Rows of the results table as shown: quantity, value. */
    public List<String[]> shownRows() {
        List<String[]> rows = new ArrayList<>();
        for (TableItem item : table.getItems()) {
            rows.add(new String[] {item.getText(0), item.getText(1)});
        }
        return rows;
    }

    /** Sets the loop fields as a user would type them (tests, future model selection). */
    public void setLoop(String num, String den, String deadTimeMsText) {
        numerator.setText(num);
        denominator.setText(den);
        deadTimeMs.setText(deadTimeMsText);
        schedule(0);
    }

    @Override
    public void setFocus() {
        numerator.setFocus();
    }

    record Outcome(LoopAnalysis analysis, JFreeChart bode, JFreeChart step, JFreeChart poles, String error) {
    }
}
