package org.tracewell.ui.views;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Consumer;

import org.eclipse.core.runtime.ListenerList;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.IWorkbenchPartReference;
import org.eclipse.ui.part.ViewPart;
import org.jfree.chart.JFreeChart;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.model.Axis;
import org.tracewell.model.Contour;
import org.tracewell.ui.charts.ChartCanvas;

/**
 * A view of one contour of the active machine's review ({@link ActiveMachineReview}): it follows the contour (or axis)
 * selected in the Machine Editor, redraws when a new review's results for it are done (before the whole review), and builds and draws its chart in a job, so the
 * UI thread only copies pixels. Nothing is drawn while the view is hidden; it catches up when shown. A review that
 * leaves the shown contour's runs as they were (an edit elsewhere; the memo hands back the same runs) redraws
 * nothing.
 */
public abstract class ContourView extends ViewPart {

    /** Pause after a selection before drawing, ms: arrow keys through the tree draw only where they stop. */
    static final int SELECTION_DEBOUNCE_MS = 30;

    /** What the job produces: the chart and the figures line under the heading. */
    record Drawing(JFreeChart chart, String summary) {
    }

    /** A drawing with its pixels, as the job hands it to the UI thread, and when the job started and finished. */
    private record Drawn(Drawing drawing, ChartCanvas.Drawn pixels, long startedNanos, long finishedNanos,
            String failure) {
    }

    /** What is on screen (or on its way), and what it was drawn from (to skip drawing the same again). */
    private record Shown(ContourResult contour, int runIndex, Object options, Point size, Drawing drawing) {

        String contourId() {
            return contour.contourId();
        }

        List<ContourRun> runs() {
            return contour.runs();
        }

        /** True when {@code other}'s run {@code index} with {@code otherOptions} at {@code otherSize} draws as this does. */
        boolean sameAs(ContourResult other, int index, Object otherOptions, Point otherSize) {
            return contourId().equals(other.contourId()) && runs().equals(other.runs()) && runIndex == index
                    && Objects.equals(options, otherOptions) && Objects.equals(size, otherSize);
        }
    }

    private Label heading;
    private Label summary;
    private Combo runChoice;
    private ChartCanvas canvas;
    private NewestOnly work;
    private ActiveMachineReview review;
    private ActiveMachineReview.Outcome latest;
    private String wantedContourId;
    private boolean stale;
    private volatile Shown shown;
    /** What the drawing job on its way will show (its drawing not made yet); null when none is. UI thread. */
    private Shown pending;
    /** The heading the newest request asked for, shown with the drawing. UI thread. */
    private String pendingTitle = "";
    private volatile long lastRedrawNanos;
    private volatile long[] lastTimings = new long[4];
    private final ListenerList<Runnable> redrawListeners = new ListenerList<>();
    private final List<String> runLabels = new ArrayList<>();
    /** A contour done ahead of its review, and which review (by {@link #reviewsStarted}) it belongs to. */
    private record Ahead(ContourResult contour, int review) {
    }

    /**
     * Contours done ahead of the reviews since the last finished one, by id: newer than that review's results, and
     * final when they belong to the review now running (emptied when a review's outcome arrives).
     */
    private final Map<String, Ahead> doneAhead = new HashMap<>();
    /** Reviews started (running outcomes told); the contours of the newest are the ones told now. UI thread. */
    private int reviewsStarted;
    private final Consumer<ActiveMachineReview.Outcome> reviewListener = outcome -> {
        latest = outcome;
        if (outcome.running()) {
            reviewsStarted++; // kept: a contour of a superseded review is still newer than the outcome's results
        } else {
            doneAhead.clear();
        }
        redraw(0);
    };
    private final Consumer<ContourResult> contourListener = contour -> {
        doneAhead.put(contour.contourId(), new Ahead(contour, reviewsStarted));
        redraw(0);
    };
    private final ISelectionListener selectionListener = this::selectionChanged;
    private final IPartListener2 visibility = new IPartListener2() {
        @Override
        public void partVisible(IWorkbenchPartReference ref) {
            if (ref.getPart(false) == ContourView.this && stale) {
                redraw(0);
            }
        }
    };

    // ------------------------------------------------------------------------------------------------ what views add

    /** True for the contours this view can show; every contour unless a view narrows it (full circles only). */
    boolean accepts(ContourResult contour) {
        return true;
    }

    /** Why nothing is shown when the machine has no contour this view accepts. */
    String noContourMessage(String machineName) {
        return machineName + " has no contour: add one on the Machine Editor's Contours page.";
    }

    /** True when the view shows one run at a time and offers the choice (CW / CCW of a circle test). */
    boolean choosesRun() {
        return true;
    }

    /** True for a plot of the contour plane, drawn square so that equal data spans look equal (circles round). */
    boolean planePlot() {
        return false;
    }

    /** Adds view-specific controls to the heading row (they call {@link #redraw} when changed). */
    void createOptions(Composite row) {
    }

    /** The view-specific options as now set, read on the UI thread and handed to {@link #draw}; an immutable value. */
    Object options() {
        return null;
    }

    /** The contour to show when {@code axis} is selected; null keeps the current one. */
    String contourForAxis(String axisId, MachineAnalysis analysis, String currentContourId) {
        return null;
    }

    /**
     * Builds the chart and the figures of {@code contour} (run {@code runIndex} when the view chooses runs), for a
     * chart {@code widthPx} wide (what a time series needs no more columns than). Any thread.
     */
    abstract Drawing draw(ContourResult contour, int runIndex, Object options, int widthPx);

    /** Width to build for when the chart is not drawn ahead (hidden now; drawn at whatever size it is shown). */
    static final int DEFAULT_WIDTH_PX = 1600;

    /**
     * Samples to draw per run of a plane plot {@code widthPx} wide: three per pixel of width, at least 1000; each run
     * of samples keeps its largest error (ContourDeviationChart.displayIndices), so no peak is lost, and the results
     * keep every sample.
     */
    static int displayPoints(int widthPx) {
        return Math.max(1000, 3 * widthPx);
    }

    // ------------------------------------------------------------------------------------------------ the view

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        Composite row = new Composite(parent, SWT.NONE);
        row.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        GridLayout rowLayout = new GridLayout(1, false);
        rowLayout.marginWidth = 0;
        rowLayout.marginHeight = 0;
        row.setLayout(rowLayout);
        heading = new Label(row, SWT.NONE);
        heading.setFont(JFaceResources.getBannerFont());
        heading.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        if (choosesRun()) {
            new Label(row, SWT.NONE).setText("Run:");
            runChoice = new Combo(row, SWT.READ_ONLY | SWT.DROP_DOWN);
            runChoice.addListener(SWT.Selection, e -> redraw(0));
        }
        createOptions(row);
        rowLayout.numColumns = row.getChildren().length;

        summary = new Label(parent, SWT.WRAP);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        canvas = new ChartCanvas(parent, SWT.NONE);
        canvas.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        canvas.setSquare(planePlot());
        // A chart is built for its size (time series decimated per column, a circle test's text spaced): build it
        // again once a resize settles.
        canvas.addListener(SWT.Resize, e -> redraw(SELECTION_DEBOUNCE_MS));
        work = new NewestOnly(canvas);

        getSite().getPage().addPartListener(visibility);
        getSite().getPage().addSelectionListener(selectionListener);
        ISelection current = getSite().getPage().getSelection();
        if (current != null) {
            selectionChanged(getSite().getPage().getActivePart(), current);
        }
        review = ActiveMachineReview.subscribe(getSite().getPage(), reviewListener, true);
        review.addContourListener(contourListener);
        // The view becomes visible after this method returns; draw then.
        parent.getDisplay().asyncExec(() -> redraw(0));
    }

    private void selectionChanged(IWorkbenchPart part, ISelection selection) {
        if (part == this || !(selection instanceof IStructuredSelection structured)
                || !(structured.getFirstElement() instanceof EObject element)) {
            return;
        }
        for (EObject e = element; e != null; e = e.eContainer()) {
            if (e instanceof Contour contour) {
                follow(contour.getId());
                return;
            }
            if (e instanceof Axis axis) {
                MachineAnalysis analysis = latest == null || latest.results() == null ? null
                        : latest.results().analysis();
                Shown now = shown;
                String chosen = analysis == null ? null
                        : contourForAxis(axis.getId(), analysis, now == null ? null : now.contourId());
                if (chosen != null) {
                    follow(chosen);
                }
                return;
            }
        }
    }

    /** Shows the contour with this model id (when the view accepts it) and keeps showing it across reviews. */
    public void follow(String contourId) {
        if (Objects.equals(contourId, wantedContourId)) {
            return;
        }
        wantedContourId = contourId;
        redraw(SELECTION_DEBOUNCE_MS);
    }

    /** Draws the chosen contour of the latest review in a job, unless it is on screen as it would be drawn. */
    void redraw(int delayMs) {
        if (canvas == null || canvas.isDisposed()) {
            return;
        }
        ActiveMachineReview.Outcome outcome = latest;
        if (outcome == null || outcome.results() == null) {
            work.next(); // nothing older may land on top of the message
            pending = null;
            String text = outcome == null ? "" : outcome.running() ? "Analysing " + outcome.machineName() + "…"
                    : outcome.problem();
            showMessage(text);
            return;
        }
        if (!canvas.isVisible()) {
            stale = true;
            return;
        }
        stale = false;
        ContourResult contour = choose(outcome.results().analysis());
        if (contour == null) {
            work.next();
            pending = null;
            showMessage(noContourMessage(outcome.machineName()));
            return;
        }
        // While a review runs, its results for this contour may be done already: final when they are the running
        // review's, newer than the outcome's results (an edit came before the last review finished) otherwise.
        Ahead ahead = outcome.running() ? doneAhead.get(contour.contourId()) : null;
        if (ahead != null && accepts(ahead.contour())) {
            contour = ahead.contour();
        }
        boolean updating = outcome.running() && (ahead == null || ahead.review() != reviewsStarted);
        int runIndex = choosesRun() ? chooseRun(contour) : -1;
        Object options = options();
        Shown now = shown;
        String title = contour.contourName() + " · " + contour.firstAxisName() + "/" + contour.secondAxisName()
                + (updating ? " (updating…)" : "");
        pendingTitle = title;
        Point size = canvas.drawingSize();
        if (pending != null && pending.sameAs(contour, runIndex, options, size)) {
            return; // this very drawing is on its way: restarting it (as each further contour arrives) only delays it
        }
        if (now != null && now.sameAs(contour, runIndex, options, size)) {
            work.next(); // what is on screen is what would be drawn: drop any older drawing still on its way
            pending = null;
            heading.setText(title);
            return;
        }
        long requested = System.nanoTime();
        ContourResult drawn = contour;
        Shown coming = new Shown(drawn, runIndex, options, size, null);
        pending = coming;
        work.run(delayMs, getPartName() + ": " + contour.contourName(), () -> {
            long started = System.nanoTime();
            try {
                Drawing drawing = draw(drawn, runIndex, options, size == null ? DEFAULT_WIDTH_PX : size.x);
                return new Drawn(drawing, ChartCanvas.draw(drawing.chart(), size), started, System.nanoTime(), null);
            } catch (RuntimeException e) {
                // e.g. figures a chart cannot scale to: say so in the view rather than leave the drawing pending
                return new Drawn(null, null, started, System.nanoTime(), e.getMessage() == null ? e.toString()
                        : e.getMessage());
            }
        }, result -> {
            if (pending == coming) {
                pending = null;
            }
            if (result.failure() != null) {
                showMessage("Cannot draw " + drawn.contourName() + ": " + result.failure());
                return;
            }
            Drawing drawing = result.drawing();
            shown = new Shown(drawn, runIndex, options, size, drawing);
            heading.setText(pendingTitle); // as the newest request for this drawing has it (updating or not)
            Labels.setKeepingLayout(summary, drawing.summary());
            canvas.show(result.pixels());
            canvas.update(); // paint now, so the time stamp is the finished redraw's
            lastRedrawNanos = System.nanoTime();
            lastTimings = new long[] {requested, result.startedNanos(), result.finishedNanos(), lastRedrawNanos};
            for (Runnable listener : redrawListeners) {
                listener.run();
            }
        });
    }

    private ContourResult choose(MachineAnalysis analysis) {
        if (wantedContourId != null) {
            for (ContourResult c : analysis.contours()) {
                if (c.contourId().equals(wantedContourId) && accepts(c)) {
                    return c;
                }
            }
        }
        Shown now = shown;
        for (ContourResult c : analysis.contours()) {
            if (now != null && c.contourId().equals(now.contourId()) && accepts(c)) {
                return c; // the wanted one is not for this view: keep what is shown
            }
        }
        return analysis.contours().stream().filter(this::accepts).findFirst().orElse(null);
    }

    /** Offers the contour's runs in the run box, keeping the chosen direction; returns the chosen run's index. */
    private int chooseRun(ContourResult contour) {
        String previous = runChoice.getSelectionIndex() >= 0 ? runChoice.getItem(runChoice.getSelectionIndex()) : null;
        List<String> labels = contour.runs().stream().map(r -> r.direction().label()).toList();
        if (!labels.equals(runLabels)) {
            runLabels.clear();
            runLabels.addAll(labels);
            runChoice.setItems(labels.toArray(String[]::new));
            int keep = previous == null ? 0 : Math.max(0, labels.indexOf(previous));
            runChoice.select(keep);
            runChoice.getParent().layout(true);
        }
        return Math.max(0, runChoice.getSelectionIndex());
    }

    private void showMessage(String text) {
        shown = null;
        heading.setText(getPartName());
        summary.setText(text);
        canvas.setChart(null);
        summary.getParent().layout(true, true);
    }

    // ------------------------------------------------------------------------------------------------ for tests

    /** Model id of the contour on screen; null when none is. */
    public String shownContourId() {
        Shown now = shown;
        return now == null ? null : now.contourId();
    }

    /** The results of the contour on screen, as the review computed them; null when none is shown. */
    public ContourResult shownContour() {
        Shown now = shown;
        return now == null ? null : now.contour();
    }

    /** The chart on screen; null when none is. */
    public JFreeChart shownChart() {
        Shown now = shown;
        return now == null ? null : now.drawing().chart();
    }

    /** The heading and the figures line as shown. */
    public List<String> shownText() {
        return List.of(heading.getText(), summary.getText());
    }

    /** The run box's choices as shown (empty when the view shows every run). */
    public List<String> runChoices() {
        return List.copyOf(runLabels);
    }

    /** Chooses a run by its label (CW, CCW, programmed), as a user would in the run box. */
    public void chooseRun(String label) {
        int index = runLabels.indexOf(label);
        if (index < 0) {
            throw new IllegalArgumentException("no run '" + label + "' here; the runs are " + runLabels);
        }
        runChoice.select(index);
        redraw(0);
    }

    /** {@link System#nanoTime()} when the last chart finished drawing; 0 before the first. */
    public long lastRedrawNanos() {
        return lastRedrawNanos;
    }

    /**
     * {@link System#nanoTime()} stamps of the last redraw: asked for (a review arrived or the selection changed), its
     * job started, the chart drawn into pixels, on screen.
     */
    public long[] lastRedrawTimings() {
        return lastTimings.clone();
    }

    /**
     * {@link System#nanoTime()} stamps of the last review the view was told of: its timer fired, its job started, it
     * was done, it was published, its job was scheduled.
     */
    public long[] reviewTimings() {
        return review == null ? new long[5] : review.lastTimings();
    }

    /** Called on the UI thread each time a chart has been drawn. */
    public void addRedrawListener(Runnable listener) {
        redrawListeners.add(listener);
    }

    public void removeRedrawListener(Runnable listener) {
        redrawListeners.remove(listener);
    }

    @Override
    public void setFocus() {
        canvas.setFocus();
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(selectionListener);
        getSite().getPage().removePartListener(visibility);
        if (review != null) {
            review.unsubscribe(reviewListener, contourListener);
        }
        super.dispose();
    }
}
