package org.tracewell.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Nyquist diagram of an open loop L(jω) in the complex plane, with the critical point −1 and the Ms circle: the circle
 * of radius 1/Ms about −1, which the curve touches where it comes closest to −1 (Ms = max |1/(1 + L)|). The frame
 * shows the part of the curve with |L| ≤ {@link #FRAME_MAGNITUDE} around −1; the whole curve stays in the dataset.
 */
public final class NyquistChart {

    /** The frame holds every point with |L| up to this, and −1 with its Ms circle: the region that decides stability. */
    static final double FRAME_MAGNITUDE = 3;
    /** Points drawn on the Ms circle and on the unit circle. */
    static final int CIRCLE_POINTS = 241;

    /** Dataset series, in order. */
    static final int CURVE = 0;
    static final int MIRROR = 1;
    static final int MS_CIRCLE = 2;
    static final int UNIT_CIRCLE = 3;

    private NyquistChart() {
    }

    /**
     * @param loop              the open loop over ω &gt; 0 (rad/s, magnitude ratio, phase rad)
     * @param sensitivityPeak   Ms (&gt; 1 when defined); NaN when the closed loop is not stable and Ms is undefined
     * @param peakFrequencyRadPerSec where |S| peaks; the nearest point of the curve is marked; NaN for none
     */
    public static JFreeChart create(String title, FrequencySeries loop, double sensitivityPeak,
            double peakFrequencyRadPerSec) {
        int n = loop.omegaRadPerSec().length;
        if (n == 0) {
            throw new IllegalArgumentException("a Nyquist chart of '" + loop.name() + "' needs at least one frequency");
        }
        boolean withMs = Double.isFinite(sensitivityPeak);
        if (withMs && !(sensitivityPeak > 0)) {
            throw new IllegalArgumentException("sensitivity peak Ms must be > 0 (usually ≥ 1), got " + sensitivityPeak);
        }
        XYSeries curve = new XYSeries(loop.name() + ", ω > 0", false, true);
        XYSeries mirror = new XYSeries("ω < 0 (mirror image)", false, true);
        XYSeries framed = new XYSeries("frame", false, true);
        for (int i = 0; i < n; i++) {
            double re = loop.magnitude()[i] * Math.cos(loop.phaseRad()[i]);
            double im = loop.magnitude()[i] * Math.sin(loop.phaseRad()[i]);
            curve.add(re, im, false);
            mirror.add(re, -im, false);
            if (loop.magnitude()[i] <= FRAME_MAGNITUDE) {
                framed.add(re, im, false);
                framed.add(re, -im, false);
            }
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(curve);
        data.addSeries(mirror);
        double msRadius = withMs ? 1 / sensitivityPeak : Double.NaN;
        data.addSeries(withMs ? circle("Ms circle: radius 1/Ms = " + Units.format3(msRadius) + " about −1", -1, 0,
                msRadius) : new XYSeries("no Ms (closed loop not stable)", false, true));
        data.addSeries(circle("unit circle |L| = 1", 0, 0, 1));

        XYLineAndShapeRenderer renderer = BodeChart.lines();
        renderer.setSeriesPaint(CURVE, ChartStyle.seriesPaint(0));
        Color mirrorPaint = (Color) ChartStyle.seriesPaint(0);
        renderer.setSeriesPaint(MIRROR, new Color(mirrorPaint.getRed(), mirrorPaint.getGreen(), mirrorPaint.getBlue(), 110));
        renderer.setSeriesStroke(MIRROR, ChartStyle.LIMIT_STROKE);
        renderer.setSeriesPaint(MS_CIRCLE, ChartStyle.LIMIT);
        renderer.setSeriesStroke(MS_CIRCLE, new BasicStroke(1.3f));
        renderer.setSeriesPaint(UNIT_CIRCLE, ChartStyle.NOTE);
        renderer.setSeriesStroke(UNIT_CIRCLE, new BasicStroke(0.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {2f, 3f}, 0f));

        NumberAxis re = new NumberAxis("Real part of L(jω)");
        NumberAxis im = new NumberAxis("Imaginary part of L(jω)");
        XYPlot plot = new SquarePlot(data, re, im, renderer);
        plot.addDomainMarker(new ValueMarker(0, ChartStyle.GRID.darker(), new BasicStroke(0.8f)));
        plot.addRangeMarker(new ValueMarker(0, ChartStyle.GRID.darker(), new BasicStroke(0.8f)));

        // The critical point as a filled dot in the limit colour, its own dataset so it sits on top of the circles.
        XYSeries critical = new XYSeries("critical point −1", false, true);
        critical.add(-1, 0);
        XYLineAndShapeRenderer dot = new XYLineAndShapeRenderer(false, true);
        dot.setSeriesShape(0, new Ellipse2D.Double(-4, -4, 8, 8));
        dot.setSeriesPaint(0, ChartStyle.LIMIT);
        plot.setDataset(1, new XYSeriesCollection(critical));
        plot.setRenderer(1, dot);

        XYSeriesCollection frame = new XYSeriesCollection(framed);
        XYSeries must = new XYSeries("must", false, true);
        must.add(0, 0);
        double reach = withMs ? Math.max(1, msRadius) : 1;
        must.add(-1 - reach, -reach);
        must.add(-1 + reach, reach);
        must.add(1, 1);
        frame.addSeries(must);
        EqualAspect.apply(plot, 0.08, frame);

        XYTextAnnotation minusOne = new XYTextAnnotation("−1", -1, 0);
        minusOne.setFont(ChartStyle.NOTE_FONT);
        minusOne.setPaint(ChartStyle.LIMIT);
        minusOne.setTextAnchor(TextAnchor.BOTTOM_RIGHT);
        plot.addAnnotation(minusOne);
        if (withMs && Double.isFinite(peakFrequencyRadPerSec)) {
            int at = nearest(loop.omegaRadPerSec(), peakFrequencyRadPerSec);
            double x = curve.getX(at).doubleValue();
            double y = curve.getY(at).doubleValue();
            XYPointerAnnotation closest = Notes.pointer("Ms " + Units.format3(sensitivityPeak) + " at "
                    + Units.format3(Units.hertz(peakFrequencyRadPerSec)) + " Hz", x, y,
                    Math.atan2(-y, x + 1), 34, ChartStyle.NOTE); // label on the side away from −1
            closest.setTipRadius(3);
            plot.addAnnotation(closest);
        }
        JFreeChart chart = new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true);
        TextTitle note = new TextTitle("frame: |L| ≤ " + Units.format3(FRAME_MAGNITUDE)
                + " around −1; the curve leaves it where |L| is larger", ChartStyle.NOTE_FONT);
        note.setPaint(ChartStyle.NOTE);
        chart.addSubtitle(note);
        return ChartStyle.apply(chart);
    }

    private static int nearest(double[] omega, double target) {
        int best = 0;
        for (int i = 1; i < omega.length; i++) {
            // Grids are logarithmic, so nearness is a ratio; ω = 0 is nowhere near a positive peak frequency.
            if (omega[i] > 0 && !(Math.abs(Math.log(omega[i] / target)) >= Math.abs(Math.log(omega[best] / target)))) {
                best = i;
            }
        }
        return best;
    }

    static XYSeries circle(String name, double centreX, double centreY, double radius) {
        XYSeries s = new XYSeries(name, false, true);
        for (int i = 0; i < CIRCLE_POINTS; i++) {
            double a = 2 * Math.PI * i / (CIRCLE_POINTS - 1);
            s.add(centreX + radius * Math.cos(a), centreY + radius * Math.sin(a), false);
        }
        return s;
    }
}
