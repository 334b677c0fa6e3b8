package org.tracewell.charts;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.Shape;
import java.awt.geom.Path2D;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Circle-test polar plot (ISO 230-4 figures). Each run is drawn at radius R + m·(d − d_top) about the centre,
 * d = ρ − R its radial deviation and d_top the outermost ring, so the radial deviation is magnified m times
 * while angles stay true. Rings of equal deviation, labelled in µm, give the scale; the nominal circle (d = 0)
 * is one of them unless the whole run lies so far to one side that showing it would flatten the shape — then
 * the plot says so. Axis reversal points are marked on every run; G and F per run and G(b) sit in the middle.
 */
public final class CircleTestChart {

    /** Points drawn per full turn of a ring. */
    static final int RING_POINTS = 361;
    /** Display points kept per run. */
    static final int RUN_POINTS = 2000;
    /** Share of the radius the band of rings takes. */
    static final double BAND_FRACTION = 0.4;
    /** The nominal circle is drawn when its distance from the runs is at most this many spreads. */
    static final double NOMINAL_WITHIN_SPREADS = 3;

    /** Chart edge, px, the annotations are spaced for when no size is given (the report draws at about this). */
    public static final int DEFAULT_SIZE_PX = 700;
    /** Below this chart edge, px, reversal points keep their markers but not their labels (the legend names them). */
    static final int LABELLED_REVERSALS_MIN_PX = 600;
    /** Below this chart edge, px, the scale note takes two centre lines instead of one. */
    static final int ONE_LINE_NOTE_MIN_PX = 560;
    /** Below this chart edge, px, the figures go under the plot instead of inside the rings. */
    static final int CENTRE_TEXT_MIN_PX = 400;
    /** Height given to one line of centre text and the least gap between ring labels, px. */
    static final double LINE_PX = 16;

    private CircleTestChart() {
    }

    /**
     * @param nominalRadiusM R, metres, &gt; 0
     * @param runs the runs, usually CW and CCW
     * @param bidirectionalG G(b) of the runs together, metres; NaN when not evaluated
     * @param reversals where axes reverse (marked on every run)
     * @param uLabel and {@code vLabel}: names of the plane coordinates, e.g. "X", "Y"
     * @return the chart; its scale is in {@link #scaleOf}
     */
    public static JFreeChart create(String title, double nominalRadiusM, List<CircleRun> runs, double bidirectionalG,
            List<ReversalPoint> reversals, String uLabel, String vLabel) {
        return create(title, nominalRadiusM, runs, bidirectionalG, reversals, uLabel, vLabel, DEFAULT_SIZE_PX);
    }

    /**
     * As {@link #create(String, double, List, double, List, String, String)} for a chart drawn about {@code sizePx}
     * square: the text inside the plot (fixed in pixels, placed in millimetres) is spaced so it does not overlap at
     * that size, and gives way where there is no room.
     */
    public static JFreeChart create(String title, double nominalRadiusM, List<CircleRun> runs, double bidirectionalG,
            List<ReversalPoint> reversals, String uLabel, String vLabel, int sizePx) {
        return create(title, nominalRadiusM, runs, bidirectionalG, reversals, uLabel, vLabel, sizePx, false);
    }

    /**
     * As {@link #create(String, double, List, double, List, String, String, int)}; {@code figuresShownBeside} tells
     * that the caller shows G, F and G(b) next to the chart (a view's figures line), so a chart too small for them
     * inside the rings leaves them out instead of taking room from the plot for a line under it.
     */
    public static JFreeChart create(String title, double nominalRadiusM, List<CircleRun> runs, double bidirectionalG,
            List<ReversalPoint> reversals, String uLabel, String vLabel, int sizePx, boolean figuresShownBeside) {
        return create(title, nominalRadiusM, runs, bidirectionalG, List.of(), Double.NaN, reversals, uLabel, vLabel,
                sizePx, figuresShownBeside);
    }

    /**
     * Predicted runs drawn as lines and measured runs as points, on one ring scale that holds both.
     *
     * @param runs                   predicted runs (lines); may be empty when {@code measured} is not
     * @param bidirectionalG         G(b) of the predicted runs, metres; NaN when not evaluated
     * @param measured               measured runs (points), series after the predicted runs in the same dataset;
     *                               their labels must differ from the predicted ones (e.g. "measured CW")
     * @param measuredBidirectionalG G(b) of the measured runs, metres; NaN when not evaluated
     */
    public static JFreeChart create(String title, double nominalRadiusM, List<CircleRun> runs, double bidirectionalG,
            List<CircleRun> measured, double measuredBidirectionalG, List<ReversalPoint> reversals, String uLabel,
            String vLabel) {
        return create(title, nominalRadiusM, runs, bidirectionalG, measured, measuredBidirectionalG, reversals, uLabel,
                vLabel, DEFAULT_SIZE_PX, false);
    }

    /**
     * As the method above, for a chart drawn about {@code sizePx} square, {@code figuresShownBeside} as in
     * {@link #create(String, double, List, double, List, String, String, int, boolean)}.
     */
    public static JFreeChart create(String title, double nominalRadiusM, List<CircleRun> runs, double bidirectionalG,
            List<CircleRun> measured, double measuredBidirectionalG, List<ReversalPoint> reversals, String uLabel,
            String vLabel, int sizePx, boolean figuresShownBeside) {
        if (sizePx < 2) {
            throw new IllegalArgumentException("chart size must be at least 2 px, got " + sizePx);
        }
        if (!(nominalRadiusM > 0) || !Double.isFinite(nominalRadiusM)) {
            throw new IllegalArgumentException("nominal radius must be finite and > 0 m, got " + nominalRadiusM);
        }
        if (runs.isEmpty() && measured.isEmpty()) {
            throw new IllegalArgumentException("a circle-test plot needs at least one run");
        }
        List<CircleRun> all = new ArrayList<>(runs);
        all.addAll(measured);
        Scale scale = scale(nominalRadiusM, all);
        double radiusMm = nominalRadiusM * 1e3;

        XYSeriesCollection runData = new XYSeriesCollection();
        XYSeries reversalSeries = new XYSeries("axis reversal", false, true);
        for (CircleRun run : all) {
            XYSeries s = new XYSeries(run.label(), false, true);
            int[] keep = ContourDeviationChart.displayIndices(run.radialDeviation(), RUN_POINTS);
            for (int k : keep) {
                double r = scale.drawnRadiusMm(radiusMm, run.radialDeviation()[k]);
                s.add(r * Math.cos(run.angleRad()[k]), r * Math.sin(run.angleRad()[k]), false);
            }
            runData.addSeries(s);
            if (run.angleRad().length > 0) {
                for (ReversalPoint p : reversals) {
                    double r = scale.drawnRadiusMm(radiusMm, run.deviationNear(p.angleRad()));
                    reversalSeries.add(r * Math.cos(p.angleRad()), r * Math.sin(p.angleRad()), false);
                }
            }
        }
        XYSeriesCollection reversalData = new XYSeriesCollection(reversalSeries);

        XYSeriesCollection rings = new XYSeriesCollection();
        int nominalIndex = -1;
        for (int i = 0; i <= scale.ringCount(); i++) {
            double d = scale.ringValueM(i);
            boolean nominal = Math.abs(d) < 1e-3 * scale.stepM();
            String name = nominal ? "nominal circle R = " + Units.format3(radiusMm) + " mm"
                    : ringLabel(d);
            if (nominal) {
                nominalIndex = i;
            }
            rings.addSeries(circle(name, scale.drawnRadiusMm(radiusMm, d)));
        }

        XYLineAndShapeRenderer runRenderer = BodeChart.lines();
        for (int i = runs.size(); i < all.size(); i++) {
            ChartStyle.showAsMeasured(runRenderer, i);
        }
        XYLineAndShapeRenderer ringRenderer = BodeChart.lines();
        ringRenderer.setDrawSeriesLineAsPath(true);
        for (int i = 0; i < rings.getSeriesCount(); i++) {
            boolean nominal = i == nominalIndex;
            ringRenderer.setSeriesPaint(i, nominal ? ChartStyle.NOTE : ChartStyle.GRID);
            ringRenderer.setSeriesStroke(i, nominal ? ChartStyle.LIMIT_STROKE : new BasicStroke(0.9f));
            ringRenderer.setSeriesVisibleInLegend(i, nominal);
        }
        XYLineAndShapeRenderer reversalRenderer = new XYLineAndShapeRenderer(false, true);
        reversalRenderer.setSeriesShape(0, triangle(5));
        reversalRenderer.setSeriesPaint(0, ChartStyle.LIMIT);

        // The plot is polar: positions off the circle mean nothing in mm, so no Cartesian axes are shown.
        NumberAxis u = new NumberAxis(uLabel);
        NumberAxis v = new NumberAxis(vLabel);
        u.setVisible(false);
        v.setVisible(false);
        XYPlot plot = new SquarePlot(runData, u, v, runRenderer);
        plot.setDataset(1, reversalData);
        plot.setRenderer(1, reversalRenderer);
        plot.setDataset(2, rings);
        plot.setRenderer(2, ringRenderer);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        EqualAspect.apply(plot, 0.1, runData, rings);

        // Text keeps its size in pixels while the plot scales: the plot spans about 2.4 R across about 82 % of the
        // chart's edge, which gives the millimetres one pixel stands for.
        double mmPerPx = 2.4 * radiusMm / (0.82 * sizePx);
        double ringGapPx = scale.magnification() * scale.stepM() * 1e3 / mmPerPx;
        int labelEvery = (int) Math.max(1, Math.ceil(LINE_PX / ringGapPx));
        double labelAngle = Math.toRadians(52);
        for (int i = 0; i <= scale.ringCount(); i++) {
            if ((scale.ringCount() - i) % labelEvery != 0) {
                continue; // too close to the next labelled ring at this size; the outermost is always labelled
            }
            double r = scale.drawnRadiusMm(radiusMm, scale.ringValueM(i));
            XYTextAnnotation ringLabel = new XYTextAnnotation(ringLabel(scale.ringValueM(i)),
                    r * Math.cos(labelAngle), r * Math.sin(labelAngle));
            ringLabel.setFont(ChartStyle.TICK_FONT);
            ringLabel.setPaint(ChartStyle.NOTE);
            ringLabel.setBackgroundPaint(ChartStyle.LABEL_BACKGROUND);
            ringLabel.setTextAnchor(TextAnchor.CENTER);
            plot.addAnnotation(ringLabel);
        }
        double outer = radiusMm * 1.06;
        Set<String> labelled = new LinkedHashSet<>();
        for (ReversalPoint p : sizePx >= LABELLED_REVERSALS_MIN_PX ? reversals : List.<ReversalPoint>of()) {
            if (labelled.add(p.label() + "@" + Math.round(Math.toDegrees(p.angleRad())))) {
                XYTextAnnotation a = new XYTextAnnotation(p.label(), outer * Math.cos(p.angleRad()),
                        outer * Math.sin(p.angleRad()));
                a.setFont(ChartStyle.TICK_FONT);
                a.setPaint(ChartStyle.LIMIT);
                a.setBackgroundPaint(ChartStyle.LABEL_BACKGROUND);
                plot.addAnnotation(a);
            }
        }
        XYTextAnnotation directions = new XYTextAnnotation("+" + uLabel + " →   +" + vLabel + " ↑", radiusMm * 1.1,
                -radiusMm * 1.1);
        directions.setFont(ChartStyle.NOTE_FONT);
        directions.setPaint(ChartStyle.INK);
        directions.setTextAnchor(TextAnchor.BOTTOM_RIGHT);
        plot.addAnnotation(directions);

        String ringStep = "rings every " + Units.format3(scale.stepM() * 1e6) + " µm";
        List<String> note = scale.nominalShown() ? List.of(ringStep) : sizePx >= ONE_LINE_NOTE_MIN_PX
                ? List.of("nominal circle (0 µm) off scale; " + ringStep)
                : List.of("nominal circle (0 µm) off scale", ringStep);
        List<CentreLine> lines = new ArrayList<>();
        figureLines(lines, runs, bidirectionalG, "G(b) ");
        figureLines(lines, measured, measuredBidirectionalG, "measured G(b) ");
        note.forEach(text -> lines.add(new CentreLine(text, false)));
        String fullTitle = title + " — radial deviation " + Magnification.label(scale.magnification());
        JFreeChart chart = new JFreeChart(fullTitle, ChartStyle.TITLE_FONT, plot, true);
        if (sizePx >= CENTRE_TEXT_MIN_PX) {
            double lineHeight = Math.max(radiusMm * 0.09, LINE_PX * mmPerPx);
            double y = lineHeight * (lines.size() - 1) / 2.0;
            for (CentreLine line : lines) {
                plot.addAnnotation(centreText(line.text(), y, line.bold()));
                y -= lineHeight;
            }
        } else if (!figuresShownBeside) {
            // No room inside the rings: the figures go under the plot, where the chart wraps them.
            TextTitle figures = new TextTitle(String.join("  ·  ", lines.stream().map(CentreLine::text).toList()),
                    ChartStyle.TICK_FONT);
            figures.setPaint(ChartStyle.INK);
            figures.setPosition(RectangleEdge.BOTTOM);
            chart.addSubtitle(figures);
        }
        return ChartStyle.apply(chart);
    }

    /** One line of figures: G and F of a run, or G(b), or the scale note. */
    private record CentreLine(String text, boolean bold) {
    }

    /** One line per run ("CW:  G … µm,  F … µm") and one for G(b) when given. */
    private static void figureLines(List<CentreLine> lines, List<CircleRun> runs, double bidirectionalG,
            String gbLabel) {
        for (CircleRun run : runs) {
            lines.add(new CentreLine(run.label() + ":  G " + Units.format3(run.circularDeviationG() * 1e6)
                    + " µm,  F " + Units.format3(run.radialDeviationF() * 1e6) + " µm", false));
        }
        if (Double.isFinite(bidirectionalG)) {
            lines.add(new CentreLine(gbLabel + Units.format3(bidirectionalG * 1e6) + " µm", true));
        }
    }

    /** The ring scale {@link #create} uses for these runs (predicted and measured together). */
    public static Scale scaleOf(double nominalRadiusM, List<CircleRun> runs) {
        return scale(nominalRadiusM, runs);
    }

    /**
     * The radial scale of a plot.
     *
     * @param bottomM deviation of the innermost ring, metres
     * @param stepM ring spacing, metres (1–2–5 series)
     * @param ringCount rings above the innermost one
     * @param magnification drawn millimetres per millimetre of deviation
     * @param nominalShown whether the nominal circle (deviation 0) is one of the rings
     */
    public record Scale(double bottomM, double stepM, int ringCount, double magnification, boolean nominalShown) {

        public double ringValueM(int i) {
            return bottomM + i * stepM;
        }

        public double topM() {
            return ringValueM(ringCount);
        }

        /** Drawn radius, mm, of a deviation: the outermost ring sits on the nominal radius. */
        double drawnRadiusMm(double radiusMm, double deviationM) {
            return radiusMm + magnification * (deviationM - topM()) * 1e3;
        }
    }

    static Scale scale(double radiusM, List<CircleRun> runs) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (CircleRun run : runs) {
            for (double d : run.radialDeviation()) {
                lo = Math.min(lo, d);
                hi = Math.max(hi, d);
            }
        }
        if (!(hi >= lo)) {
            lo = 0;
            hi = 0;
        }
        double spread = Math.max(hi - lo, 1e-9); // 1 nm floor: a perfect run still gets a readable scale
        double offset = lo > 0 ? lo : hi < 0 ? -hi : 0;
        boolean nominal = offset <= NOMINAL_WITHIN_SPREADS * spread;
        if (nominal) {
            lo = Math.min(lo, 0);
            hi = Math.max(hi, 0);
        }
        double step = Magnification.floorOneTwoFive(Math.max(hi - lo, 1e-9) / 3);
        double bottom = Math.floor(lo / step - 1e-9) * step;
        int count = (int) Math.max(1, Math.ceil((hi - bottom) / step - 1e-9));
        double band = count * step;
        double magnification = Magnification.floorOneTwoFive(BAND_FRACTION * radiusM / band);
        return new Scale(bottom, step, count, Math.max(1, magnification), nominal);
    }

    private static String ringLabel(double deviationM) {
        double um = deviationM * 1e6;
        if (Math.abs(um) < 1e-9) {
            return "0 µm";
        }
        return (um > 0 ? "+" : "−") + Units.format3(Math.abs(um)) + " µm";
    }

    private static XYTextAnnotation centreText(String text, double y, boolean bold) {
        XYTextAnnotation a = new XYTextAnnotation(text, 0, y);
        a.setFont(bold ? ChartStyle.NOTE_FONT.deriveFont(Font.BOLD) : ChartStyle.NOTE_FONT);
        a.setPaint(ChartStyle.INK);
        a.setTextAnchor(TextAnchor.CENTER);
        return a;
    }

    private static XYSeries circle(String name, double radius) {
        XYSeries s = new XYSeries(name, false, true);
        for (int i = 0; i < RING_POINTS; i++) {
            double a = 2 * Math.PI * i / (RING_POINTS - 1);
            s.add(radius * Math.cos(a), radius * Math.sin(a), false);
        }
        return s;
    }

    private static Shape triangle(double half) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(0, -half);
        p.lineTo(half, half);
        p.lineTo(-half, half);
        p.closePath();
        return p;
    }
}
