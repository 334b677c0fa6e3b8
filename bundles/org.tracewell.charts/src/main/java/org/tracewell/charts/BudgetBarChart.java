package org.tracewell.charts;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.labels.ItemLabelAnchor;
import org.jfree.chart.labels.ItemLabelPosition;
import org.jfree.chart.labels.StandardXYItemLabelGenerator;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;

/**
 * Error budget as horizontal bars: contributors ranked largest first (top), then the combined total, against
 * the allocation drawn as a limit line (and the allowed total after the reserve, when one is kept). Values in µm.
 */
public final class BudgetBarChart {

    /** Half the height of a bar, in rank units (bars are one unit apart). */
    static final double HALF_BAR = 0.36;

    private BudgetBarChart() {
    }

    /**
     * @param contributors the lines' portions; drawn largest first, ties by label (deterministic)
     * @param totalLabel e.g. "total (systematic sum plus random RSS)"
     * @param totalM the combined total, metres
     * @param allocationM the target (allocation) to draw as the limit line, metres; NaN for none
     * @param allowedM allowed total after the reserve, metres; NaN when no reserve is kept
     */
    public static JFreeChart create(String title, List<BudgetBar> contributors, String totalLabel, double totalM,
            double allocationM, double allowedM) {
        if (contributors.isEmpty()) {
            throw new IllegalArgumentException("a budget chart needs at least one contributor");
        }
        if (!(totalM >= 0) || !Double.isFinite(totalM)) {
            throw new IllegalArgumentException("budget total must be finite and ≥ 0 m, got " + totalM);
        }
        List<BudgetBar> ranked = new ArrayList<>(contributors);
        ranked.sort(Comparator.comparingDouble(BudgetBar::portion).reversed().thenComparing(BudgetBar::label));

        String[] names = new String[ranked.size() + 1];
        XYIntervalSeries lines = new XYIntervalSeries("contributors (portion of the total)");
        for (int i = 0; i < ranked.size(); i++) {
            double um = ranked.get(i).portion() * 1e6;
            lines.add(i, i - HALF_BAR, i + HALF_BAR, um, 0, um);
            names[i] = ranked.get(i).label();
        }
        int totalRow = ranked.size();
        XYIntervalSeries total = new XYIntervalSeries(totalLabel);
        total.add(totalRow, totalRow - HALF_BAR, totalRow + HALF_BAR, totalM * 1e6, 0, totalM * 1e6);
        names[totalRow] = totalLabel;
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        data.addSeries(lines);
        data.addSeries(total);

        SymbolAxis rows = new SymbolAxis(null, names);
        rows.setInverted(true); // rank 1 at the top
        rows.setGridBandsVisible(false);
        NumberAxis value = new NumberAxis("Contribution (µm)");
        value.setAutoRangeIncludesZero(true);
        XYBarRenderer renderer = new XYBarRenderer();
        renderer.setBarPainter(new StandardXYBarPainter());
        renderer.setShadowVisible(false);
        renderer.setDrawBarOutline(false);
        renderer.setSeriesPaint(0, ChartStyle.seriesPaint(0));
        renderer.setSeriesPaint(1, ChartStyle.seriesPaint(5));
        renderer.setDefaultItemLabelGenerator(new StandardXYItemLabelGenerator("{2}",
                new java.text.DecimalFormat("0.00"), new java.text.DecimalFormat("0.00")));
        renderer.setDefaultItemLabelsVisible(true);
        renderer.setDefaultItemLabelFont(ChartStyle.TICK_FONT);
        renderer.setDefaultItemLabelPaint(ChartStyle.INK);
        // Horizontal bars: the value sits just right of the bar's end (3 o'clock).
        renderer.setDefaultPositiveItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE3,
                TextAnchor.CENTER_LEFT));
        renderer.setItemLabelAnchorOffset(4);
        XYPlot plot = new XYPlot(data, rows, value, renderer);
        plot.setOrientation(PlotOrientation.HORIZONTAL);

        double upper = totalM * 1e6;
        if (Double.isFinite(allocationM)) {
            double um = allocationM * 1e6;
            addLine(plot, BodeChart.limitMarker(um, "allocation " + Units.format3(um) + " µm"), RectangleAnchor.TOP_RIGHT,
                    TextAnchor.TOP_LEFT);
            upper = Math.max(upper, um);
        }
        if (Double.isFinite(allowedM) && allowedM != allocationM) {
            double um = allowedM * 1e6;
            addLine(plot, BodeChart.noteMarker(um, "after reserve " + Units.format3(um) + " µm"),
                    RectangleAnchor.TOP_LEFT, TextAnchor.TOP_RIGHT);
            upper = Math.max(upper, um);
        }
        value.setAutoRange(false);
        value.setRange(0, upper > 0 ? upper * 1.18 : 1); // room for the value labels
        JFreeChart chart = ChartStyle.apply(new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true));
        rows.setTickLabelFont(ChartStyle.LABEL_FONT);
        plot.setDomainGridlinesVisible(false);
        return chart;
    }

    /** A vertical line with its label at the top, on the given side, clear of the bars. */
    private static void addLine(XYPlot plot, ValueMarker marker, RectangleAnchor labelAnchor, TextAnchor textAnchor) {
        marker.setLabelAnchor(labelAnchor);
        marker.setLabelTextAnchor(textAnchor);
        plot.addRangeMarker(marker);
    }
}
