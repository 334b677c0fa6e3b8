package org.tracewell.ui.views;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.Supplier;

import org.eclipse.core.runtime.ListenerList;
import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EContentAdapter;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.Point;
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
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.part.ViewPart;
import org.jfree.chart.JFreeChart;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.engine.axis.AxisModel;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.LoopAnalyzer;
import org.tracewell.engine.poly.CoefficientText;
import org.tracewell.engine.tf.TransferFunction;
import org.tracewell.core.SafetyCaution;
import org.tracewell.model.Axis;
import org.tracewell.ui.charts.ChartCanvas;

/**
 * Loop Analysis: type, error constants, steady-state errors, margins, bandwidth and step
 * figures of one loop, with Bode, Nyquist, step, ramp and pole-zero charts. The loop is either typed as
 * transfer-function coefficients, or it is the position loop of the axis selected in the
 * Machine Editor (or any part whose selection holds a model element): the view follows the
 * selection and re-analyses when that axis changes, at once and on its own (it does not wait for the review of the
 * whole machine; an axis analysis already in the shared {@link ActiveMachineReview#MEMO} is used as it is). Analyses
 * and the chart on top run off the UI thread; only the newest result is shown.
 */
public final class LoopAnalysisView extends ViewPart {

    public static final String ID = "org.tracewell.ui.view.loopAnalysis";

    /** Pause after the last keystroke before analysing, ms. */
    static final long DEBOUNCE_MS = 250;

    /**
     * Pause after a model change before analysing, ms: none beyond the current turn of the event loop, which already
     * folds a burst (the commands of one undo arrive in one turn); a change arrives as one command, not per keystroke.
     */
    static final int MODEL_DEBOUNCE_MS = 0;

    /** Pause after a selection before analysing, ms: arrow keys through the tree analyse only where they stop. */
    static final int SELECTION_DEBOUNCE_MS = 30;

    /** Title shown for the typed loop. */
    public static final String TYPED_TITLE = "Typed loop";

    /** The chart tabs, in order. */
    public static final List<String> CHART_TABS = List.of("Bode", "Nyquist", "Step response", "Ramp response",
            "Closed-loop poles");

    private Text numerator;
    private Text denominator;
    private Text feedbackNumerator;
    private Text feedbackDenominator;
    private Text deadTimeMs;
    private Label title;
    private Composite form;
    private Button typeOwn;
    private Label message;
    private Table table;
    private ChartCanvas bode;
    private ChartCanvas nyquist;
    private ChartCanvas step;
    private ChartCanvas ramp;
    private ChartCanvas poles;

    private CTabFolder chartTabs;
    private NewestOnly work;
    /** Tabs whose chart of the analysis on screen is not built yet (built when the tab is first shown). */
    private final boolean[] chartPending = new boolean[CHART_TABS.size()];
    private volatile LoopAnalysis shown;
    private volatile String shownTitle;
    private volatile long lastRedrawNanos;
    private volatile long lastAnalysisNanos;
    private volatile long lastChartsNanos;
    /** Stamps of the last model-driven redraw: asked for, job started, analysed, chart drawn, on screen. */
    private volatile long[] lastTimings = new long[5];
    private volatile long[] pendingTimings = new long[5];
    private final ListenerList<Consumer<LoopAnalysis>> redrawListeners = new ListenerList<>();

    private Axis followed;
    private final EContentAdapter axisChanges = new EContentAdapter() {
        @Override
        public void notifyChanged(Notification notification) {
            super.notifyChanged(notification);
            if (!notification.isTouch()) {
                scheduleFollowed(MODEL_DEBOUNCE_MS);
            }
        }
    };
    private final ISelectionListener selectionListener = this::selectionChanged;

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));

        Composite heading = new Composite(parent, SWT.NONE);
        heading.setLayout(new GridLayout(2, false));
        heading.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        title = new Label(heading, SWT.NONE);
        title.setFont(JFaceResources.getBannerFont());
        title.setText(TYPED_TITLE);
        title.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        // A model loop hides the coefficient fields (they would show a different loop); this brings them back.
        typeOwn = new Button(heading, SWT.PUSH);
        typeOwn.setText("Type a loop…");
        typeOwn.setToolTipText("Analyse a loop typed as transfer-function coefficients instead of the selected axis");
        typeOwn.setVisible(false);
        typeOwn.addListener(SWT.Selection, e -> {
            follow(null);
            schedule(0);
        });

        form = new Composite(parent, SWT.NONE);
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
            column.setWidth(title.equals("Quantity") ? 175 : 330);
        }
        CTabFolder tabs = new CTabFolder(sash, SWT.BORDER | SWT.BOTTOM);
        bode = tab(tabs, CHART_TABS.get(0));
        nyquist = tab(tabs, CHART_TABS.get(1));
        step = tab(tabs, CHART_TABS.get(2));
        ramp = tab(tabs, CHART_TABS.get(3));
        poles = tab(tabs, CHART_TABS.get(4));
        tabs.setSelection(0);
        tabs.addListener(SWT.Selection, e -> ensureChart(tabs.getSelectionIndex()));
        chartTabs = tabs;
        sash.setWeights(52, 48);

        Label caution = new Label(parent, SWT.WRAP);
        caution.setText("Caution: " + SafetyCaution.SHORT);
        caution.setLayoutData(new GridData(SWT.FILL, SWT.BOTTOM, true, false));

        work = new NewestOnly(table);
        for (Text t : List.of(numerator, denominator, deadTimeMs, feedbackNumerator, feedbackDenominator)) {
            t.addModifyListener(e -> schedule(DEBOUNCE_MS));
        }
        schedule(0);
        getSite().getPage().addSelectionListener(selectionListener);
        ISelection current = getSite().getPage().getSelection();
        if (current != null) {
            selectionChanged(getSite().getPage().getActivePart(), current);
        }
    }

    // ------------------------------------------------------------------------------------------------ following an axis

    private void selectionChanged(IWorkbenchPart part, ISelection selection) {
        if (part == this || !(selection instanceof IStructuredSelection structured)
                || !(structured.getFirstElement() instanceof EObject element)) {
            return;
        }
        for (EObject e = element; e != null; e = e.eContainer()) {
            if (e instanceof Axis axis) {
                follow(axis);
                return;
            }
        }
    }

    /** Shows the position loop of {@code axis} and keeps it up to date while the axis changes; null stops. */
    public void follow(Axis axis) {
        if (axis == followed) {
            return;
        }
        if (followed != null) {
            followed.eAdapters().remove(axisChanges);
        }
        followed = axis;
        if (axis != null) {
            axis.eAdapters().add(axisChanges);
            scheduleFollowed(SELECTION_DEBOUNCE_MS);
        }
    }

    /** The axis whose position loop the view follows, or null. */
    public Axis followedAxis() {
        return followed;
    }

    /**
     * Maps the followed axis on the UI thread (the model is only read there) after {@code delayMs}, then analyses its
     * position loop in a job.
     */
    private void scheduleFollowed(int delayMs) {
        long mine = work.next();
        Display display = table.getDisplay();
        display.timerExec(delayMs, () -> {
            Axis axis = followed;
            if (!work.isNewest(mine) || axis == null || table.isDisposed()) {
                return;
            }
            String loopTitle = (axis.getName() == null ? "axis" : axis.getName()) + " · position loop";
            AxisModel engineModel;
            try {
                engineModel = EngineMapping.mapAxis(axis).model();
            } catch (MappingException | RuntimeException e) {
                showRejected(loopTitle, e.getMessage());
                return;
            }
            // The position loop of the axis's dynamics, from the memo the machine review shares: after an edit this
            // view asks first and analyses the axis (both loops), and the review, asking a moment later, waits for
            // it instead of analysing it again; on a machine with few cores the contour views' runs get the rest.
            run(mine, loopTitle, () -> {
                try {
                    return ActiveMachineReview.MEMO.dynamics(engineModel).positionLoop();
                } catch (IllegalArgumentException | ArithmeticException velocityLoopRefused) {
                    // The axis as a whole could not be analysed (its velocity loop, say): the position loop alone.
                    return LoopAnalyzer.analyze(engineModel.positionOpenLoop().withPadeDelay(engineModel.padeOrder()),
                            null);
                }
            });
        });
    }

    /** Shows a given analysis (charts are drawn off the UI thread), e.g. a loop another view has analysed. */
    public void showAnalysis(String loopTitle, LoopAnalysis analysis) {
        run(work.next(), loopTitle, () -> analysis);
    }

    /** Analyses and shows the loop {@code forward} with feedback {@code feedback} under {@code loopTitle}. */
    public void showLoop(String loopTitle, TransferFunction forward, TransferFunction feedback) {
        run(work.next(), loopTitle, () -> LoopAnalyzer.analyze(forward, feedback));
    }

    private void run(long mine, String loopTitle, Supplier<LoopAnalysis> analysis) {
        ChartTarget target = chartOnTop();
        long requested = System.nanoTime();
        submit(mine, 0, loopTitle, false, () -> {
            try {
                long started = System.nanoTime();
                LoopAnalysis result = analysis.get();
                long analysed = System.nanoTime();
                Outcome outcome = withCharts(result, target);
                long charted = System.nanoTime();
                lastAnalysisNanos = analysed - started;
                lastChartsNanos = charted - analysed;
                pendingTimings = new long[] {requested, started, analysed, charted, 0};
                return outcome;
            } catch (IllegalArgumentException | ArithmeticException e) {
                return Outcome.rejected(e.getMessage());
            }
        });
    }

    /** The one way work reaches the screen: in a job after {@code delayMs}, shown only if still the newest request. */
    private void submit(long mine, long delayMs, String loopTitle, boolean typed, Supplier<Outcome> job) {
        work.run(mine, delayMs, "Loop analysis: " + loopTitle, job, outcome -> {
            title.setText(loopTitle);
            showTypedFields(typed);
            show(outcome);
        });
    }

    /** Which chart is on top and its size, read on the UI thread, so the job draws that one ahead. */
    private ChartTarget chartOnTop() {
        List<ChartCanvas> canvases = canvases();
        for (int i = 0; i < canvases.size(); i++) {
            Point size = canvases.get(i).drawingSize();
            if (size != null) {
                return new ChartTarget(i, size);
            }
        }
        return new ChartTarget(-1, null);
    }

    private List<ChartCanvas> canvases() {
        return List.of(bode, nyquist, step, ramp, poles);
    }

    private void showRejected(String loopTitle, String reason) {
        title.setText(loopTitle);
        showTypedFields(false);
        show(Outcome.rejected(reason));
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

    private void showTypedFields(boolean typed) {
        if (form.getVisible() == typed) {
            return;
        }
        form.setVisible(typed);
        ((GridData) form.getLayoutData()).exclude = !typed;
        typeOwn.setVisible(!typed);
        form.getParent().layout(true, true);
    }

    /** Reads the fields on the UI thread, analyses in a job, shows the newest result only. */
    private void schedule(long delayMs) {
        String num = numerator.getText();
        String den = denominator.getText();
        String fbNum = feedbackNumerator.getText();
        String fbDen = feedbackDenominator.getText();
        String delay = deadTimeMs.getText();
        ChartTarget target = chartOnTop();
        submit(work.next(), delayMs, TYPED_TITLE, true, () -> compute(num, den, fbNum, fbDen, delay, target));
    }

    /** Pure: text in, analysis and charts (or the reason for rejecting the input) out. */
    static Outcome compute(String num, String den, String fbNum, String fbDen, String delayMsText,
            ChartTarget target) {
        try {
            double delayMs = parseDelay(delayMsText);
            TransferFunction forward = TransferFunction.of(CoefficientText.parse("Numerator", num),
                    CoefficientText.parse("Denominator", den), delayMs / 1000.0);
            TransferFunction feedback = TransferFunction.of(CoefficientText.parse("Feedback numerator", fbNum),
                    CoefficientText.parse("Feedback denominator", fbDen));
            return withCharts(LoopAnalyzer.analyze(forward, feedback), target);
        } catch (IllegalArgumentException e) {
            return Outcome.rejected(e.getMessage());
        }
    }

    /**
     * Builds and draws the chart on top only: the others are built when their tab is first shown, so an edit costs
     * one chart, not five.
     */
    private static Outcome withCharts(LoopAnalysis analysis, ChartTarget target) {
        ChartCanvas.Drawn onTop = target.index() < 0 ? ChartCanvas.Drawn.NONE
                : ChartCanvas.draw(LoopCharts.forTab(analysis, target.index()), target.size());
        return new Outcome(analysis, target.index(), onTop, null);
    }

    /** Builds the chart of tab {@code index} for the analysis on screen if it is still missing (UI thread). */
    private void ensureChart(int index) {
        if (index >= 0 && index < chartPending.length && chartPending[index] && shown != null) {
            chartPending[index] = false;
            canvases().get(index).setChart(LoopCharts.forTab(shown, index));
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
        shownTitle = title.getText();
        String verdict = outcome.analysis().stable() ? "Closed loop stable."
                : "Closed loop UNSTABLE: no steady-state error, bandwidth or step figures (the final-value theorem does not apply).";
        boolean relayout = !verdict.equals(message.getText());
        message.setText(verdict);
        message.setForeground(message.getDisplay().getSystemColor(
                outcome.analysis().stable() ? SWT.COLOR_DARK_GREEN : SWT.COLOR_DARK_RED));
        showRows(LoopSummary.rows(outcome.analysis()));
        List<ChartCanvas> canvases = canvases();
        for (int i = 0; i < canvases.size(); i++) {
            chartPending[i] = i != outcome.drawnIndex();
            canvases.get(i).show(i == outcome.drawnIndex() ? outcome.drawn() : ChartCanvas.Drawn.NONE);
        }
        ensureChart(chartTabs.getSelectionIndex()); // the tab on top changed while the job ran
        if (relayout) {
            message.getParent().layout(true);
        }
        // Paint now, so the time stamp is that of the finished redraw rather than of a queued one.
        table.update();
        for (ChartCanvas chart : canvases) {
            if (chart.isVisible()) {
                chart.update();
            }
        }
        lastRedrawNanos = System.nanoTime();
        long[] stamps = pendingTimings.clone();
        stamps[4] = lastRedrawNanos;
        lastTimings = stamps;
        for (Consumer<LoopAnalysis> listener : redrawListeners) {
            listener.accept(outcome.analysis());
        }
    }

    /** The chart of the tab {@code title} (one of {@link #CHART_TABS}) as now shown; null where it does not apply. */
    public JFreeChart shownChart(String tabTitle) {
        int index = CHART_TABS.indexOf(tabTitle);
        if (index < 0) {
            throw new IllegalArgumentException("no chart tab '" + tabTitle + "'; the tabs are " + CHART_TABS);
        }
        ensureChart(index);
        return canvases().get(index).getChart();
    }

    /** Fills the results table, rewriting the rows in place when their number is unchanged (an edit of a value). */
    private void showRows(List<String[]> rows) {
        if (table.getItemCount() != rows.size()) {
            table.removeAll();
            for (String[] row : rows) {
                new TableItem(table, SWT.NONE).setText(row);
            }
            return;
        }
        for (int i = 0; i < rows.size(); i++) {
            TableItem item = table.getItem(i);
            String[] row = rows.get(i);
            for (int c = 0; c < row.length; c++) {
                if (!row[c].equals(item.getText(c))) {
                    item.setText(c, row[c]);
                }
            }
        }
    }

    /** The title of the loop now on screen, e.g. "Y · position loop" or {@link #TYPED_TITLE}. */
    public String shownTitle() {
        return shownTitle;
    }

    /** {@link System#nanoTime()} when the last analysis finished drawing; 0 before the first. */
    public long lastRedrawNanos() {
        return lastRedrawNanos;
    }

    /** How long the last model-driven run took in its job: analysis and chart building, ns. */
    public long[] lastJobNanos() {
        return new long[] {lastAnalysisNanos, lastChartsNanos};
    }

    /**
     * {@link System#nanoTime()} stamps of the last redraw of an analysed loop: asked for (after the pause), its job
     * started, the loop analysed, the chart on top drawn into pixels, on screen.
     */
    public long[] lastRedrawTimings() {
        return lastTimings.clone();
    }

    /** Called on the UI thread each time an analysis has been drawn. */
    public void addRedrawListener(Consumer<LoopAnalysis> listener) {
        redrawListeners.add(listener);
    }

    public void removeRedrawListener(Consumer<LoopAnalysis> listener) {
        redrawListeners.remove(listener);
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(selectionListener);
        follow(null);
        super.dispose();
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

    /** The chart to draw ahead: index into the tabs (−1 for none) and the size to draw at. */
    record ChartTarget(int index, Point size) {
    }

    /** An analysis with the chart on top drawn ahead (tab {@code drawnIndex}); or the reason the input was rejected. */
    record Outcome(LoopAnalysis analysis, int drawnIndex, ChartCanvas.Drawn drawn, String error) {

        static Outcome rejected(String reason) {
            return new Outcome(null, -1, ChartCanvas.Drawn.NONE, reason);
        }
    }
}
