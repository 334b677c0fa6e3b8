package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.List;

import javax.imageio.ImageIO;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/** Measured data drawn over predictions: points over lines, same axes, dataset values as given. */
class MeasuredOverlayTest {

    /** 1/(J·jω) with J = 1.6e-3 kg·m², by formula: a rigid axis's torque → velocity response. */
    private static FrequencySeries inertia(String name, int n, double fromHz, double toHz) {
        double[] w = new double[n];
        double[] mag = new double[n];
        double[] phase = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = 2 * Math.PI * fromHz * Math.pow(toHz / fromHz, i / (n - 1.0));
            mag[i] = 1 / (1.6e-3 * w[i]);
            phase[i] = -Math.PI / 2;
        }
        return new FrequencySeries(name, w, mag, phase);
    }

    @Test
    void bodeOverlayKeepsMeasuredPointsAsGivenAndDrawsThemAsPoints() throws IOException {
        FrequencySeries model = inertia("model", 400, 1, 1000);
        FrequencySeries measured = inertia("measured (y-frf.csv)", 37, 5, 500);
        JFreeChart chart = BodeChart.create("Y: torque → motor velocity", List.of(model), List.of(measured),
                Margins.NONE);
        CombinedDomainXYPlot plot = (CombinedDomainXYPlot) chart.getPlot();
        for (int sub = 0; sub < 2; sub++) {
            XYPlot p = plot.getSubplots().get(sub);
            XYDataset data = p.getDataset();
            assertEquals(2, data.getSeriesCount());
            assertEquals("measured (y-frf.csv)", data.getSeriesKey(1));
            assertEquals(37, data.getItemCount(1), "few points: none decimated away");
            XYLineAndShapeRenderer r = (XYLineAndShapeRenderer) p.getRenderer();
            assertFalse(r.getSeriesLinesVisible(1), "measured: no line");
            assertTrue(r.getSeriesShapesVisible(1), "measured: points");
            assertSame(ChartStyle.MEASURED_SHAPE, r.getSeriesShape(1));
            assertTrue(r.getSeriesLinesVisible(0) == null || r.getSeriesLinesVisible(0), "model: a line");
            assertTrue(!r.getSeriesPaint(0).equals(r.getSeriesPaint(1)), "own colour");
        }
        XYDataset magnitude = plot.getSubplots().get(0).getDataset();
        XYDataset phase = plot.getSubplots().get(1).getDataset();
        for (int i : new int[] {0, 18, 36}) {
            // Hz, dB and degrees of the given SI values (the chart's conversion, by definition)
            assertEquals(measured.omegaRadPerSec()[i] / (2 * Math.PI), magnitude.getXValue(1, i), 1e-9);
            assertEquals(20 * Math.log10(measured.magnitude()[i]), magnitude.getYValue(1, i), 1e-12);
            assertEquals(-90, phase.getYValue(1, i), 1e-12);
        }
        assertTrue(chart.getLegend() != null, "two series: a legend");
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(ChartExport.png(chart, 800, 500)));
        assertEquals(800, image.getWidth());
    }

    @Test
    void measuredOnlyBodeChartIsAllowedButNotAnEmptyOne() {
        JFreeChart chart = BodeChart.create("m", List.of(), List.of(inertia("measured", 10, 5, 50)), Margins.NONE);
        assertEquals(1, ((CombinedDomainXYPlot) chart.getPlot()).getSubplots().get(0).getDataset().getSeriesCount());
        assertThrows(IllegalArgumentException.class, () -> BodeChart.create("e", List.of(), List.of(), Margins.NONE));
    }

    @Test
    void circleOverlayDrawsMeasuredRunsOnTheSameRingScale() throws IOException {
        CircleRun predicted = ReviewChartsTest.ellipticRun("CCW", -0.3e-6, 0.1e-6, 3600);
        CircleRun measured = ReviewChartsTest.ellipticRun("measured CCW", -4e-6, 3e-6, 720);
        JFreeChart chart = CircleTestChart.create("XY circle", 0.1, List.of(predicted), Double.NaN, List.of(measured),
                7.5e-6, ReversalPoint.quadrants("X1", "Y"), "X1", "Y");
        XYPlot plot = chart.getXYPlot();
        XYDataset runs = plot.getDataset();
        assertEquals(2, runs.getSeriesCount());
        assertEquals("measured CCW", runs.getSeriesKey(1));
        XYLineAndShapeRenderer r = (XYLineAndShapeRenderer) plot.getRenderer();
        assertFalse(r.getSeriesLinesVisible(1));
        assertTrue(r.getSeriesShapesVisible(1));
        // One scale for both: it must hold the measured band −7 .. −1 µm as well as the predicted one.
        CircleTestChart.Scale scale = CircleTestChart.scaleOf(0.1, List.of(predicted, measured));
        assertTrue(scale.bottomM() <= -7e-6 + 1e-12 && scale.topM() >= -0.2e-6 - 1e-12, scale.toString());
        // Sample 0 of the measured run: θ = 0, ρ − R = −4 + 3 = −1 µm, drawn at R + m·(d − d_top) on the x axis.
        double expected = (0.1 + scale.magnification() * (-1e-6 - scale.topM())) * 1e3;
        assertEquals(expected, runs.getXValue(1, 0), 1e-9);
        assertEquals(0, runs.getYValue(1, 0), 1e-9);
        assertEquals(720, runs.getItemCount(1), "below the display limit: every sample kept");
        String notes = ReviewChartsTest.texts(plot);
        assertTrue(notes.contains("measured CCW:  G 6.00 µm,  F 7.00 µm"), notes);
        assertTrue(notes.contains("measured G(b) 7.50 µm"), notes);
        assertEquals(8, plot.getDataset(1).getItemCount(0), "4 reversal marks on each of the 2 runs");
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(ChartExport.png(chart, 760, 840)));
        assertEquals(840, image.getHeight());
    }
}
