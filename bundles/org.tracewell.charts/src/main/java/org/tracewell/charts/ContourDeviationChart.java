package org.tracewell.charts;

import java.awt.Color;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Contour deviation: the programmed path in the contour plane (mm) and, on top of it, the path displaced
 * along its normal by the contour error times a stated magnification. The factor is in the title and in the
 * legend; the largest error is marked with its true value in µm.
 */
public final class ContourDeviationChart {

    /** Display points kept per curve; the sample of largest |error| of each run of samples is always kept. */
    static final int DISPLAY_POINTS = 3000;

    private ContourDeviationChart() {
    }

    /**
     * @param magnification factor on the normal error, &gt; 0 (see {@link Magnification#suggest})
     * @param uLabel and {@code vLabel}: names of the plane coordinates, e.g. "X", "Y"
     */
    public static JFreeChart create(String title, ContourDeviation contour, double magnification, String uLabel,
            String vLabel) {
        Magnification.requireFactor(magnification);
        if (contour.sampleCount() == 0) {
            throw new IllegalArgumentException("contour '" + contour.name() + "' has no samples to draw");
        }
        int[] keep = displayIndices(contour.signedError(), DISPLAY_POINTS);
        XYSeries programmed = new XYSeries("programmed path", false, true);
        XYSeries deviated = new XYSeries("contour error " + Magnification.label(magnification), false, true);
        for (int k : keep) {
            double u = contour.pathU()[k];
            double v = contour.pathV()[k];
            double d = magnification * contour.signedError()[k];
            programmed.add(mm(u), mm(v), false);
            deviated.add(mm(u + d * contour.normalU()[k]), mm(v + d * contour.normalV()[k]), false);
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(programmed);
        data.addSeries(deviated);

        XYLineAndShapeRenderer renderer = BodeChart.lines();
        renderer.setSeriesPaint(0, ChartStyle.NOTE);
        renderer.setSeriesStroke(0, ChartStyle.LIMIT_STROKE);
        renderer.setSeriesPaint(1, ChartStyle.seriesPaint(0));
        renderer.setDrawSeriesLineAsPath(true); // one path per series, so the dashes run along the whole path
        NumberAxis u = new NumberAxis(uLabel + " (mm)");
        NumberAxis v = new NumberAxis(vLabel + " (mm)");
        XYPlot plot = new SquarePlot(data, u, v, renderer);
        EqualAspect.apply(plot, 0.08, data);

        int at = contour.indexOfMax();
        double dMax = magnification * contour.signedError()[at];
        double xMax = mm(contour.pathU()[at] + dMax * contour.normalU()[at]);
        double yMax = mm(contour.pathV()[at] + dMax * contour.normalV()[at]);
        // Label towards the middle of the plot, so it stays inside whatever side the peak is on.
        double cx = 0.5 * (u.getLowerBound() + u.getUpperBound());
        double cy = 0.5 * (v.getLowerBound() + v.getUpperBound());
        double towardsCentre = Math.atan2(-(cy - yMax), cx - xMax); // Java2D angles: y grows downwards
        XYPointerAnnotation max = new XYPointerAnnotation(
                "max " + Units.format3(contour.maxAbsError() * 1e6) + " µm", xMax, yMax, towardsCentre);
        max.setFont(ChartStyle.NOTE_FONT);
        max.setPaint(ChartStyle.LIMIT);
        max.setArrowPaint(ChartStyle.LIMIT);
        max.setBackgroundPaint(ChartStyle.LABEL_BACKGROUND);
        max.setTextAnchor(TextAnchor.CENTER);
        max.setBaseRadius(40);
        max.setLabelOffset(4);
        plot.addAnnotation(max);

        String fullTitle = title + " — normal error " + Magnification.label(magnification);
        JFreeChart chart = new JFreeChart(fullTitle, ChartStyle.TITLE_FONT, plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        return ChartStyle.apply(chart);
    }

    /**
     * Indices to draw, ascending: all of them when few, else the first and last sample plus, for each of
     * {@code points/2} consecutive runs, its first sample and its sample of largest |error| — peaks survive.
     */
    public static int[] displayIndices(double[] error, int points) {
        int n = error.length;
        if (n <= points) {
            int[] all = new int[n];
            for (int i = 0; i < n; i++) {
                all[i] = i;
            }
            return all;
        }
        int buckets = Math.max(1, points / 2);
        int[] out = new int[2 * buckets + 1];
        int count = 0;
        for (int b = 0; b < buckets; b++) {
            int from = (int) ((long) b * n / buckets);
            int to = (int) ((long) (b + 1) * n / buckets);
            int peak = from;
            for (int i = from; i < to; i++) {
                if (Math.abs(error[i]) > Math.abs(error[peak])) {
                    peak = i;
                }
            }
            out[count++] = from;
            if (peak != from) {
                out[count++] = peak;
            }
        }
        if (out[count - 1] != n - 1) {
            out[count++] = n - 1;
        }
        return java.util.Arrays.copyOf(out, count);
    }

    static double mm(double metres) {
        return metres * 1e3;
    }
}
