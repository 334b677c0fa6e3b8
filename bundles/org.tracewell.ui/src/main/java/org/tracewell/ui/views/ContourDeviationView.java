package org.tracewell.ui.views;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.tracewell.charts.ContourChartData;
import org.tracewell.charts.ContourDeviation;
import org.tracewell.charts.ContourDeviationChart;
import org.tracewell.charts.Magnification;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.ContourRunMetrics;

/**
 * Contour Deviation: the programmed path of the selected contour with the contour error drawn along the path normal,
 * magnified by a factor the chart states (chosen to make the largest error readable, or picked by the user).
 */
public final class ContourDeviationView extends ContourView {

    public static final String ID = "org.tracewell.ui.view.contourDeviation";

    /** Factors offered besides the automatic one (1–2–5 series, as {@link Magnification} picks). */
    static final double[] FACTORS = {100, 200, 500, 1000, 2000, 5000, 10_000, 20_000, 50_000};

    private static final String AUTO = "auto";

    private Combo magnification;

    @Override
    void createOptions(Composite row) {
        new Label(row, SWT.NONE).setText("Magnification:");
        magnification = new Combo(row, SWT.READ_ONLY | SWT.DROP_DOWN);
        magnification.add(AUTO);
        for (double f : FACTORS) {
            magnification.add(Magnification.label(f));
        }
        magnification.select(0);
        magnification.addListener(SWT.Selection, e -> redraw(0));
    }

    /** The chosen factor; NaN for the automatic one. */
    @Override
    Object options() {
        int index = magnification.getSelectionIndex();
        return index <= 0 ? Double.NaN : FACTORS[index - 1];
    }

    /** Sets the factor as a user would pick it; NaN for automatic. */
    public void setMagnification(double factor) {
        if (Double.isNaN(factor)) {
            magnification.select(0);
        } else {
            int index = java.util.Arrays.stream(FACTORS).boxed().toList().indexOf(factor);
            if (index < 0) {
                throw new IllegalArgumentException("magnification " + factor + " is not offered; choose one of "
                        + java.util.Arrays.toString(FACTORS) + " or NaN for automatic");
            }
            magnification.select(index + 1);
        }
        redraw(0);
    }

    @Override
    boolean planePlot() {
        return true;
    }

    @Override
    Drawing draw(ContourResult contour, int runIndex, Object options, int widthPx) {
        ContourRun run = contour.runs().get(runIndex);
        ContourDeviation data = ContourChartData.deviation(contour.contourName(), run.contourError(),
                displayPoints(widthPx));
        double chosen = (Double) options;
        boolean auto = Double.isNaN(chosen);
        double factor = auto ? ContourChartData.suggestedMagnification(data, run.path().length()) : chosen;
        String title = contour.contourName() + " (" + run.direction().label() + ")";
        ContourRunMetrics m = run.metrics();
        String figures = "max contour error " + Units.um(m.maxContourError()) + " µm at t = "
                + Units.plain(m.timeOfMax(), 3) + " s · RMS " + Units.um(m.rmsContourError()) + " µm · feed "
                + Units.mPerMin(contour.feed()) + " m/min · normal error drawn " + Magnification.label(factor)
                + (auto ? " (chosen so the largest error shows)" : "");
        return new Drawing(ContourDeviationChart.create(title, data, factor, contour.firstAxisName(),
                contour.secondAxisName()), figures);
    }
}
