package org.tracewell.charts;

import java.awt.Color;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;

/**
 * The distribution of one result over the variants of a Monte-Carlo study: bars of the variant counts, the bins on
 * the failing side of the limit in the limit colour, the limit as a dashed line, the nominal design as a note line,
 * and the yield written in the plot's corner.
 */
public final class HistogramChart {

    /** Series 0: bins that meet the limit (or all, without one); series 1: bins beyond it. */
    static final String MEETING = "variants meeting the limit";
    static final String FAILING = "variants beyond the limit";

    private HistogramChart() {
    }

    /**
     * @param axisLabel   quantity and unit of the bins, e.g. "Circular deviation G (µm)"
     * @param bins        the counts, in the axis's unit
     * @param nominal     the nominal design's value (NaN for none), axis unit
     * @param limit       the limit (NaN for none), axis unit
     * @param atMost      true when values up to the limit meet it (a deviation), false for a floor (a margin)
     * @param yieldText   e.g. "yield 86.7 % ± 1.1 % of 1000 variants"; null for none
     */
    public static JFreeChart create(String title, String axisLabel, HistogramBins bins, double nominal, double limit,
            boolean atMost, String yieldText) {
        double[] edges = bins.edges();
        int[] counts = bins.counts();
        XYIntervalSeries meeting = new XYIntervalSeries(Double.isFinite(limit) ? MEETING : "variants");
        XYIntervalSeries failing = new XYIntervalSeries(FAILING);
        int highest = 0;
        for (int i = 0; i < counts.length; i++) {
            double centre = 0.5 * (edges[i] + edges[i + 1]);
            boolean fails = Double.isFinite(limit) && (atMost ? centre > limit : centre < limit);
            (fails ? failing : meeting).add(centre, edges[i], edges[i + 1], counts[i], 0, counts[i]);
            highest = Math.max(highest, counts[i]);
        }
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        data.addSeries(meeting);
        data.addSeries(failing);
        NumberAxis value = new NumberAxis(axisLabel);
        value.setAutoRangeIncludesZero(false);
        NumberAxis count = new NumberAxis("Variants");
        count.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        count.setAutoRange(false);
        count.setRange(0, Math.max(1, highest) * 1.22); // room for the yield note above the bars
        XYBarRenderer renderer = new XYBarRenderer();
        renderer.setBarPainter(new StandardXYBarPainter());
        renderer.setShadowVisible(false);
        renderer.setDrawBarOutline(true);
        renderer.setDefaultOutlinePaint(Color.WHITE);
        renderer.setSeriesPaint(0, ChartStyle.seriesPaint(0));
        renderer.setSeriesPaint(1, ChartStyle.LIMIT);
        XYPlot plot = new XYPlot(data, value, count, renderer);
        double low = edges[0];
        double high = edges[edges.length - 1];
        if (Double.isFinite(limit)) {
            plot.addDomainMarker(BodeChart.limitMarker(limit, "limit " + (atMost ? "≤ " : "≥ ") + Units.format3(limit)));
            low = Math.min(low, limit);
            high = Math.max(high, limit);
        }
        if (Double.isFinite(nominal)) {
            ValueMarker marker = BodeChart.noteMarker(nominal, "nominal " + Units.format3(nominal));
            marker.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            marker.setLabelTextAnchor(TextAnchor.TOP_LEFT);
            plot.addDomainMarker(marker);
            low = Math.min(low, nominal);
            high = Math.max(high, nominal);
        }
        double pad = 0.04 * (high - low);
        value.setAutoRange(false);
        value.setRange(low - pad, high + pad);
        if (yieldText != null && !yieldText.isBlank()) {
            XYTextAnnotation note = new XYTextAnnotation(yieldText, high + pad - 0.01 * (high - low),
                    Math.max(1, highest) * 1.17);
            note.setTextAnchor(TextAnchor.TOP_RIGHT);
            note.setFont(ChartStyle.NOTE_FONT);
            note.setPaint(ChartStyle.INK);
            note.setBackgroundPaint(ChartStyle.LABEL_BACKGROUND);
            plot.addAnnotation(note);
        }
        return ChartStyle.apply(new JFreeChart(title, ChartStyle.TITLE_FONT, plot, Double.isFinite(limit)));
    }
}
