package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import javax.imageio.ImageIO;

import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYAnnotation;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/** The design-review charts: contour deviation, circle-test polar plot, budget bars. Expected values by construction. */
class ReviewChartsTest {

    static BufferedImage render(JFreeChart chart, int w, int h) throws IOException {
        return ImageIO.read(new ByteArrayInputStream(ChartExport.png(chart, w, h)));
    }

    /** CCW circle R = 100 mm about the origin, sampled at n points, with a constant signed error (left = inside). */
    private static ContourDeviation ccwCircle(int n, double signedError) {
        double[] u = new double[n];
        double[] v = new double[n];
        double[] nu = new double[n];
        double[] nv = new double[n];
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            double a = 2 * Math.PI * i / n;
            u[i] = 0.1 * Math.cos(a);
            v[i] = 0.1 * Math.sin(a);
            nu[i] = -Math.cos(a); // left of CCW travel points to the centre
            nv[i] = -Math.sin(a);
            e[i] = signedError;
        }
        return new ContourDeviation("circle", u, v, nu, nv, e);
    }

    @Test
    void contourDeviationDrawsTheErrorMagnifiedAlongTheNormalAndSaysByHowMuch() throws IOException {
        JFreeChart chart = ContourDeviationChart.create("Contour circle", ccwCircle(720, 5e-6), 1000, "X", "Y");
        XYDataset data = chart.getXYPlot().getDataset();
        // By construction: 5 µm inside, ×1000 → drawn 5 mm inside the 100 mm programmed radius.
        assertEquals(100.0, data.getXValue(0, 0), 1e-9);
        assertEquals(95.0, data.getXValue(1, 0), 1e-9);
        assertEquals(0.0, data.getYValue(1, 0), 1e-9);
        assertTrue(chart.getTitle().getText().contains("×1000"), chart.getTitle().getText());
        assertTrue(data.getSeriesKey(1).toString().contains("×1000"), "factor in the legend too");
        assertEquals("X (mm)", chart.getXYPlot().getDomainAxis().getLabel());
        BufferedImage image = render(chart, 700, 760);
        assertEquals(700, image.getWidth());
        assertEquals(760, image.getHeight());
    }

    @Test
    void planePlotsUseEqualSpansSoCirclesStayRound() {
        XYPlot plot = ContourDeviationChart.create("c", ccwCircle(360, 1e-6), 1000, "X", "Y").getXYPlot();
        assertEquals(plot.getDomainAxis().getRange().getLength(), plot.getRangeAxis().getRange().getLength(), 1e-9);
    }

    @Test
    void displayDecimationKeepsThePeakOfALongRun() {
        double[] error = new double[1_000_000];
        error[123_457] = -3e-6;
        int[] keep = ContourDeviationChart.displayIndices(error, 3000);
        assertTrue(keep.length <= 3001, "about the requested number of points, got " + keep.length);
        assertTrue(Arrays.binarySearch(keep, 123_457) >= 0, "the spike survives");
        assertEquals(0, keep[0]);
        assertEquals(error.length - 1, keep[keep.length - 1]);
        for (int i = 1; i < keep.length; i++) {
            assertTrue(keep[i] > keep[i - 1], "ascending, no repeats");
        }
    }

    @Test
    void magnificationIsTheLargestOneTwoFiveStepThatFits() {
        // 0.12 · 100 mm / 10 µm = 1200 → 1000 (1–2–5 series, floor).
        assertEquals(1000, Magnification.suggest(0.1, 10e-6, 0.12), 0);
        // 0.12 · 300 mm / 4.26 µm = 8451 → 5000.
        assertEquals(5000, Magnification.suggest(0.3, 4.26e-6, 0.12), 0);
        assertEquals(1, Magnification.suggest(0.1, 0, 0.12), 0, "no error: no magnification");
        assertEquals(1, Magnification.suggest(0.001, 1e-3, 0.12), 0, "never below 1");
        assertEquals(2, Magnification.floorOneTwoFive(2.0), 0);
        assertEquals(5, Magnification.floorOneTwoFive(9.99), 0);
        assertEquals(10, Magnification.floorOneTwoFive(10.0), 0);
        assertEquals(0.2, Magnification.floorOneTwoFive(0.3), 1e-15);
        assertEquals("×5000", Magnification.label(5000));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Magnification.suggest(0, 1e-6, 0.1));
        assertTrue(e.getMessage().contains("> 0 m"), e.getMessage());
    }

    /** A run whose radial deviation is offset + half · cos 2θ (an ellipse at 0°), sampled over 360°. */
    static CircleRun ellipticRun(String label, double offset, double half, int n) {
        double[] a = new double[n];
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = 2 * Math.PI * i / n;
            d[i] = offset + half * Math.cos(2 * a[i]);
        }
        return new CircleRun(label, a, d, 2 * half, Math.abs(offset) + half);
    }

    @Test
    void circleTestPlotMarksReversalsAnnotatesFiguresAndRendersAtSize() throws IOException {
        List<CircleRun> runs = List.of(ellipticRun("CW", -7e-6, 0.2e-6, 3600), ellipticRun("CCW", -7e-6, 0.2e-6, 3600));
        JFreeChart chart = CircleTestChart.create("Circle test", 0.1, runs, 0.45e-6,
                ReversalPoint.quadrants("X", "Y"), "X", "Y");
        XYPlot plot = chart.getXYPlot();
        assertEquals(8, plot.getDataset(1).getItemCount(0), "4 reversal points on each of 2 runs");
        String notes = texts(plot);
        assertTrue(notes.contains("CW:  G 0.400 µm,  F 7.20 µm"), notes); // G = 2·0.2 µm, F = 7 + 0.2 µm
        assertTrue(notes.contains("G(b) 0.450 µm"), notes);
        assertTrue(notes.contains("X reverses") && notes.contains("Y reverses"), notes);
        assertTrue(chart.getTitle().getText().contains("radial deviation ×"), chart.getTitle().getText());
        BufferedImage image = render(chart, 760, 840);
        assertEquals(760, image.getWidth());
        assertEquals(840, image.getHeight());
    }

    @Test
    void smallCircleTestPlotSpacesItsTextAndDropsWhatHasNoRoom() {
        List<CircleRun> runs = List.of(ellipticRun("CW", -7e-6, 0.2e-6, 3600), ellipticRun("CCW", -7e-6, 0.2e-6, 3600));
        int size = 450;
        JFreeChart small = CircleTestChart.create("Circle test", 0.1, runs, 0.45e-6,
                ReversalPoint.quadrants("X", "Y"), "X", "Y", size);
        XYPlot plot = small.getXYPlot();
        String notes = texts(plot);
        // the markers stay (the legend names them), their labels give way; the figures stay
        assertEquals(8, plot.getDataset(1).getItemCount(0));
        assertFalse(notes.contains("reverses"), notes);
        assertTrue(notes.contains("CW:  G 0.400 µm,  F 7.20 µm") && notes.contains("G(b) 0.450 µm"), notes);
        // centre lines and ring labels at least one line of text apart in pixels: 2.4 R over 82 % of the edge
        double mmPerPx = 2.4 * 100 / (0.82 * size);
        List<Double> centreYs = new ArrayList<>();
        List<Double> ringLabelRadii = new ArrayList<>();
        for (Object a : plot.getAnnotations()) {
            if (a instanceof XYTextAnnotation t && t.getX() == 0) {
                centreYs.add(t.getY());
            } else if (a instanceof XYTextAnnotation t && t.getText().endsWith("µm")) {
                ringLabelRadii.add(Math.hypot(t.getX(), t.getY()));
            }
        }
        assertTrue(centreYs.size() >= 4, "three figure lines and the note: " + centreYs);
        for (List<Double> placed : List.of(centreYs, ringLabelRadii)) {
            placed.sort(null);
            for (int i = 1; i < placed.size(); i++) {
                assertTrue((placed.get(i) - placed.get(i - 1)) / mmPerPx >= CircleTestChart.LINE_PX - 1e-9,
                        "spacing " + placed);
            }
        }
        // smaller still, the figures leave the rings for a line under the plot
        JFreeChart tiny = CircleTestChart.create("Circle test", 0.1, runs, 0.45e-6, ReversalPoint.quadrants("X", "Y"),
                "X", "Y", 300);
        assertFalse(texts(tiny.getXYPlot()).contains("G(b)"), texts(tiny.getXYPlot()));
        String under = ((TextTitle) tiny.getSubtitle(tiny.getSubtitleCount() - 1)).getText();
        assertTrue(under.contains("CW:  G 0.400 µm,  F 7.20 µm") && under.contains("G(b) 0.450 µm"), under);
        // unless the caller shows them beside the chart (a view's figures line): then the plot keeps the room
        JFreeChart beside = CircleTestChart.create("Circle test", 0.1, runs, 0.45e-6,
                ReversalPoint.quadrants("X", "Y"), "X", "Y", 300, true);
        assertEquals(tiny.getSubtitleCount() - 1, beside.getSubtitleCount());
        assertFalse(texts(beside.getXYPlot()).contains("G(b)"));
        // at the default size the reversals are named
        String large = texts(CircleTestChart.create("Circle test", 0.1, runs, 0.45e-6, ReversalPoint.quadrants("X",
                "Y"), "X", "Y").getXYPlot());
        assertTrue(large.contains("X reverses"), large);
    }

    @Test
    void circleTestPlotHasASquareDataAreaSoTheCircleIsDrawnRound() {
        List<CircleRun> runs = List.of(ellipticRun("CW", -7e-6, 0.2e-6, 3600), ellipticRun("CCW", -7e-6, 0.2e-6, 3600));
        for (int[] size : new int[][] {{300, 300}, {700, 700}, {900, 500}, {400, 800}}) {
            JFreeChart chart = CircleTestChart.create("Circle test", 0.1, runs, 0.45e-6,
                    ReversalPoint.quadrants("X", "Y"), "X", "Y", Math.min(size[0], size[1]));
            ChartRenderingInfo info = new ChartRenderingInfo();
            chart.createBufferedImage(size[0], size[1], BufferedImage.TYPE_INT_RGB, info);
            Rectangle2D data = info.getPlotInfo().getDataArea();
            // equal data spans on both axes (EqualAspect) drawn into a square: one mm is as long across as up
            assertEquals(data.getWidth(), data.getHeight(), 1.0, size[0] + "×" + size[1] + ": " + data);
            XYPlot plot = chart.getXYPlot();
            assertEquals(plot.getDomainAxis().getRange().getLength(), plot.getRangeAxis().getRange().getLength(),
                    1e-9);
        }
    }

    @Test
    void circleScaleShowsTheNominalCircleOnlyWhenItDoesNotFlattenTheShape() {
        // Offset 6.8 µm against a 0.4 µm spread: the nominal circle would squash the ellipse, so it is left off.
        CircleTestChart.Scale far = CircleTestChart.scaleOf(0.1, List.of(ellipticRun("CW", -7e-6, 0.2e-6, 720)));
        assertFalse(far.nominalShown());
        assertTrue(far.bottomM() <= -7.2e-6 + 1e-12 && far.topM() >= -6.8e-6 - 1e-12, "band holds the run");
        double drawnBandM = far.magnification() * (far.topM() - far.bottomM());
        assertTrue(drawnBandM <= 0.4 * 0.1 + 1e-12 && drawnBandM > 0.4 * 0.1 / 2.5,
                "band drawn within 40 % of R, at most a 1–2–5 step below: " + drawnBandM);
        // Offset 0.5 µm against a 0.4 µm spread: the nominal circle is one of the rings.
        CircleTestChart.Scale near = CircleTestChart.scaleOf(0.1, List.of(ellipticRun("CW", -0.7e-6, 0.2e-6, 720)));
        assertTrue(near.nominalShown());
        boolean zeroRing = false;
        for (int i = 0; i <= near.ringCount(); i++) {
            zeroRing |= Math.abs(near.ringValueM(i)) < 1e-15;
        }
        assertTrue(zeroRing, "a ring at 0 µm");
    }

    @Test
    void budgetBarsAreRankedLargestFirstWithTheAllocationLine() throws IOException {
        List<BudgetBar> bars = List.of(new BudgetBar("thermal", 2e-6), new BudgetBar("servo lag", 5e-6),
                new BudgetBar("geometric", 3e-6), new BudgetBar("quantisation", 1e-6));
        JFreeChart chart = BudgetBarChart.create("Budget", bars, "total (linear sum)", 11e-6, 25e-6, 22.5e-6);
        XYPlot plot = chart.getXYPlot();
        SymbolAxis rows = (SymbolAxis) plot.getDomainAxis();
        assertEquals(List.of("servo lag", "geometric", "thermal", "quantisation", "total (linear sum)"),
                Arrays.asList(rows.getSymbols()));
        assertEquals(5.0, plot.getDataset().getYValue(0, 0), 1e-9, "µm");
        assertEquals(11.0, plot.getDataset().getYValue(1, 0), 1e-9, "total in its own series");
        StringBuilder labels = new StringBuilder();
        for (Object m : plot.getRangeMarkers(Layer.FOREGROUND)) {
            labels.append(((Marker) m).getLabel()).append(" | ");
        }
        assertTrue(labels.toString().contains("allocation 25.0 µm"), labels.toString());
        assertTrue(labels.toString().contains("after reserve 22.5 µm"), labels.toString());
        BufferedImage image = render(chart, 1000, 330);
        assertEquals(1000, image.getWidth());
        assertEquals(330, image.getHeight());
        assertThrows(IllegalArgumentException.class, () -> new BudgetBar("negative", -1e-6));
    }

    static String texts(XYPlot plot) {
        StringBuilder all = new StringBuilder();
        for (XYAnnotation a : plot.getAnnotations()) {
            if (a instanceof XYTextAnnotation t) {
                all.append(t.getText()).append(" | ");
            }
        }
        return all.toString();
    }
}
