package org.tracewell.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleInsets;

/**
 * Tracewell's one chart style: a light, print-friendly sheet with a muted palette, so that
 * reports and views look alike. Applied by every factory after the chart is assembled.
 */
public final class ChartStyle {

    /** Text and axis lines. */
    public static final Color INK = new Color(0x1F, 0x29, 0x33);
    /** Grid lines. */
    public static final Color GRID = new Color(0xD5, 0xDB, 0xE1);
    /** Limits, targets and the critical point. */
    public static final Color LIMIT = new Color(0xA3, 0x1F, 0x34);
    /** Annotations and crossover markers. */
    public static final Color NOTE = new Color(0x4A, 0x55, 0x68);

    /** Behind marker labels, so they stay legible over curves. */
    public static final Color LABEL_BACKGROUND = new Color(255, 255, 255, 225);

    /** Series colours in order of use. */
    private static final Color[] SERIES = {
        new Color(0x0F, 0x6E, 0x8C), // deep cyan
        new Color(0xC8, 0x55, 0x3D), // terracotta
        new Color(0x5B, 0x7F, 0x2B), // moss
        new Color(0x7A, 0x4F, 0xA0), // plum
        new Color(0xC9, 0x97, 0x12), // mustard
        new Color(0x3D, 0x5A, 0x80), // navy
    };

    public static final Font TITLE_FONT = new Font(Font.SANS_SERIF, Font.BOLD, 14);
    public static final Font LABEL_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    public static final Font TICK_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 10);
    public static final Font NOTE_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

    static final Stroke SERIES_STROKE = new BasicStroke(1.6f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke LIMIT_STROKE = new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {6f, 4f}, 0f);
    static final Stroke GRID_STROKE = new BasicStroke(0.6f);

    static {
        // By default JFreeChart draws rotated text (the vertical axis labels) through a full TextLayout, a
        // workaround for old Java 2D bugs; current runtimes draw rotated strings correctly at a fraction of
        // the cost, which matters for the report's twenty-odd charts.
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    /** Marker of a measured series: measured data reads as samples over the predicted lines. */
    static final Shape MEASURED_SHAPE = new Ellipse2D.Double(-2, -2, 4, 4);

    private ChartStyle() {
    }

    /** Draws series {@code series} of {@code renderer} as measured data: points, no line, its own colour. */
    public static void showAsMeasured(XYLineAndShapeRenderer renderer, int series) {
        renderer.setSeriesLinesVisible(series, false);
        renderer.setSeriesShapesVisible(series, true);
        renderer.setSeriesShape(series, MEASURED_SHAPE);
    }

    /** The colour of series number {@code index} (cycles). */
    public static Paint seriesPaint(int index) {
        return SERIES[Math.floorMod(index, SERIES.length)];
    }

    /** Styles title, legend, plot(s), axes and renderers in place and returns the chart. */
    public static JFreeChart apply(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        TextTitle title = chart.getTitle();
        if (title != null) {
            title.setFont(TITLE_FONT);
            title.setPaint(INK);
        }
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setItemFont(LABEL_FONT);
            legend.setItemPaint(INK);
            legend.setBackgroundPaint(Color.WHITE);
            legend.setFrame(org.jfree.chart.block.BlockBorder.NONE);
        }
        if (chart.getPlot() instanceof CombinedDomainXYPlot combined) {
            styleAxis(combined.getDomainAxis());
            for (XYPlot sub : combined.getSubplots()) {
                stylePlot(sub);
            }
        } else if (chart.getPlot() instanceof XYPlot plot) {
            stylePlot(plot);
        }
        return chart;
    }

    private static void stylePlot(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlinePaint(GRID);
        plot.setDomainGridlinePaint(GRID);
        plot.setRangeGridlinePaint(GRID);
        plot.setDomainGridlineStroke(GRID_STROKE);
        plot.setRangeGridlineStroke(GRID_STROKE);
        plot.setAxisOffset(new RectangleInsets(4, 4, 4, 4));
        for (int i = 0; i < plot.getDomainAxisCount(); i++) {
            styleAxis(plot.getDomainAxis(i));
        }
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            styleAxis(plot.getRangeAxis(i));
        }
        for (int r = 0; r < plot.getRendererCount(); r++) {
            XYItemRenderer renderer = plot.getRenderer(r);
            if (renderer == null || plot.getDataset(r) == null) {
                continue;
            }
            for (int s = 0; s < plot.getDataset(r).getSeriesCount(); s++) {
                if (renderer.getSeriesPaint(s) == null) {
                    renderer.setSeriesPaint(s, seriesPaint(s));
                }
                if (renderer.getSeriesStroke(s) == null) {
                    renderer.setSeriesStroke(s, SERIES_STROKE);
                }
            }
        }
    }

    private static void styleAxis(ValueAxis axis) {
        if (axis == null) {
            return;
        }
        axis.setLabelFont(LABEL_FONT);
        axis.setLabelPaint(INK);
        axis.setTickLabelFont(TICK_FONT);
        axis.setTickLabelPaint(INK);
        axis.setAxisLinePaint(INK);
        axis.setTickMarkPaint(INK);
    }
}
