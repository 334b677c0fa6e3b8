package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.Collection;
import java.util.List;

import javax.imageio.ImageIO;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.IntervalXYDataset;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/** Histogram and sweep charts of tolerance studies, headless; expected values by construction. */
class StudyChartsTest {

    private static BufferedImage render(JFreeChart chart, int w, int h) throws IOException {
        return ImageIO.read(new ByteArrayInputStream(ChartExport.png(chart, w, h)));
    }

    private static List<Double> markerValues(XYPlot plot, boolean domain) {
        Collection<?> markers = domain ? plot.getDomainMarkers(Layer.FOREGROUND) : plot.getRangeMarkers(Layer.FOREGROUND);
        return markers.stream().map(m -> ((ValueMarker) m).getValue()).toList();
    }

    @Test
    void histogramSplitsTheBinsAtTheLimitAndWritesTheYield() throws IOException {
        // 5 bins of 10 µm from 0 to 50 µm; limit 25 µm: bins centred 5, 15 meet, 35, 45 fail, the straddling bin
        // (centre 25) meets a limit "at most 25"
        HistogramBins bins = new HistogramBins(new double[] {0, 10, 20, 30, 40, 50}, new int[] {40, 30, 20, 7, 3});
        JFreeChart chart = HistogramChart.create("G over 100 variants", "Circular deviation G (µm)", bins, 12.0, 25.0,
                true, "yield 90.0 % ± 3.0 % of 100 variants");
        XYPlot plot = chart.getXYPlot();
        IntervalXYDataset data = (IntervalXYDataset) plot.getDataset();
        assertEquals(2, data.getSeriesCount());
        assertEquals(3, data.getItemCount(0), "bins meeting the limit");
        assertEquals(2, data.getItemCount(1), "bins beyond it");
        assertEquals(40, data.getYValue(0, 0), 0);
        assertEquals(0, data.getStartXValue(0, 0), 0);
        assertEquals(10, data.getEndXValue(0, 0), 0);
        assertEquals(40, data.getStartXValue(1, 1), 0);
        assertEquals(3, data.getYValue(1, 1), 0);
        assertEquals(100, bins.total());
        assertEquals(List.of(25.0, 12.0), markerValues(plot, true), "limit and nominal lines");
        List<String> notes = plot.getAnnotations().stream().filter(XYTextAnnotation.class::isInstance)
                .map(a -> ((XYTextAnnotation) a).getText()).toList();
        assertEquals(List.of("yield 90.0 % ± 3.0 % of 100 variants"), notes);
        assertTrue(plot.getDomainAxis().getRange().contains(25.0));
        BufferedImage image = render(chart, 900, 420);
        assertEquals(900, image.getWidth());
        assertEquals(420, image.getHeight());
    }

    @Test
    void aFloorFailsTheBinsBelowIt() {
        // phase margin bins 40..60 deg, floor 45 deg: the bin centred at 42.5 fails
        HistogramBins bins = new HistogramBins(new double[] {40, 45, 50, 55, 60}, new int[] {2, 10, 60, 28});
        XYPlot plot = HistogramChart.create("PM", "Phase margin (deg)", bins, Double.NaN, 45, false, null).getXYPlot();
        assertEquals(1, plot.getDataset().getItemCount(1));
        assertEquals(42.5, plot.getDataset().getXValue(1, 0), 1e-12);
        assertEquals(List.of(45.0), markerValues(plot, true));
        assertTrue(plot.getAnnotations().stream().noneMatch(XYTextAnnotation.class::isInstance));
    }

    @Test
    void sweepDrawsAFamilyWithTheLimitInView() throws IOException {
        double[] ky = {2.28, 2.34, 2.40, 2.46, 2.52};
        List<SweepCurve> curves = List.of(
                new SweepCurve("X1 Kv 2.38 (m/min)/mm", ky, new double[] {36, 20, 3.5, 12, 27}),
                new SweepCurve("X1 Kv 2.40 (m/min)/mm", ky, new double[] {49, 32, 0.3, 15, 30}),
                new SweepCurve("X1 Kv 2.42 (m/min)/mm", ky, new double[] {61, 45, Double.NaN, 2.7, 18}));
        JFreeChart chart = SweepChart.create("G over Y Kv", "Y Kv ((m/min)/mm)", "G (µm)", curves, 80, 2.40);
        XYPlot plot = chart.getXYPlot();
        XYDataset data = plot.getDataset();
        assertEquals(3, data.getSeriesCount());
        assertEquals("X1 Kv 2.40 (m/min)/mm", data.getSeriesKey(1));
        assertEquals(5, data.getItemCount(2));
        assertEquals(0.3, data.getYValue(1, 2), 0);
        assertTrue(Double.isNaN(data.getYValue(2, 2)), "a point that could not be computed leaves a gap");
        assertEquals(List.of(80.0), markerValues(plot, false));
        assertEquals(List.of(2.40), markerValues(plot, true));
        assertTrue(plot.getRangeAxis().getRange().contains(80.0), "the limit stays in view above every point");
        assertTrue(chart.getLegend() != null, "a family has a legend");
        assertEquals(800, render(chart, 800, 480).getWidth());
        // one curve: no legend
        assertTrue(SweepChart.create("G", "Kv", "G", curves.subList(0, 1), Double.NaN, Double.NaN).getLegend() == null);
    }

    @Test
    void badInputsAreRefusedWithTheirValues() {
        IllegalArgumentException edges = assertThrows(IllegalArgumentException.class,
                () -> new HistogramBins(new double[] {0, 1}, new int[] {1, 2}));
        assertTrue(edges.getMessage().contains("2 edges for 2 bins"), edges.getMessage());
        IllegalArgumentException curve = assertThrows(IllegalArgumentException.class,
                () -> new SweepCurve("c", new double[] {1, 2}, new double[] {1}));
        assertTrue(curve.getMessage().contains("got 2 and 1"), curve.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SweepChart.create("t", "x", "y", List.of(), 1, 1));
    }

}
