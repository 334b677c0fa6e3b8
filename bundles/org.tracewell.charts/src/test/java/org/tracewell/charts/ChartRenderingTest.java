package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.List;

import javax.imageio.ImageIO;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/** Charts render headless at the requested size and carry the data and markers they were given. */
class ChartRenderingTest {

    /** L(jω) = 10 / (jω (jω+1)(jω+5)) at n frequencies over 0.01–100 rad/s, evaluated directly (not by the engine). */
    static FrequencySeries ogataLoop(int n) {
        double[] w = new double[n];
        double[] mag = new double[n];
        double[] phase = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = Math.pow(10, -2 + 4.0 * i / (n - 1));
            mag[i] = 10 / (w[i] * Math.hypot(1, w[i]) * Math.hypot(5, w[i]));
            phase[i] = -Math.PI / 2 - Math.atan(w[i]) - Math.atan(w[i] / 5);
        }
        return new FrequencySeries("L(jω)", w, mag, phase);
    }

    @Test
    void bodeChartRendersToPngOfRequestedSize() throws IOException {
        // Margins of K/(s(s+1)(s+5)), K = 10: phase crossover √5 rad/s, GM = 3 (9.54 dB)
        // (Ogata, Modern Control Engineering, ch. 7 — from memory; recomputed in DOMAIN.md §7).
        Margins margins = new Margins(1.2271, Math.toRadians(25.39), Math.sqrt(5), 3.0);
        JFreeChart chart = BodeChart.create("Position loop", List.of(ogataLoop(400)), margins);
        byte[] png = ChartExport.png(chart, 800, 500);
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(png));
        assertEquals(800, image.getWidth());
        assertEquals(500, image.getHeight());
        assertArrayEquals(png, ChartExport.png(chart, 800, 500), "same chart, same bytes");
    }

    @Test
    void logFrequencyAxisLabelsEveryDecadeAsPlainNumbers() {
        JFreeChart chart = BodeChart.create("Position loop", List.of(ogataLoop(400)), Margins.NONE);
        ChartExport.png(chart, 800, 500); // lays the axis out
        CombinedDomainXYPlot plot = (CombinedDomainXYPlot) chart.getPlot();
        java.awt.image.BufferedImage scratch = new BufferedImage(800, 500, BufferedImage.TYPE_INT_RGB);
        java.util.List<?> ticks = plot.getDomainAxis().refreshTicks(scratch.createGraphics(),
                new org.jfree.chart.axis.AxisState(), new java.awt.geom.Rectangle2D.Double(0, 0, 700, 400),
                org.jfree.chart.ui.RectangleEdge.BOTTOM);
        java.util.List<String> labels = ticks.stream().map(t -> ((org.jfree.chart.axis.Tick) t).getText())
                .filter(t -> t != null && !t.isEmpty()).toList();
        assertTrue(labels.contains("0.1") && labels.contains("1") && labels.contains("10"), labels.toString());
    }

    @Test
    void bodeDatasetIsInHertzAndDecibels() {
        FrequencySeries loop = ogataLoop(400);
        JFreeChart chart = BodeChart.create("t", List.of(loop), Margins.NONE);
        CombinedDomainXYPlot plot = (CombinedDomainXYPlot) chart.getPlot();
        XYDataset magnitude = plot.getSubplots().get(0).getDataset();
        XYDataset phase = plot.getSubplots().get(1).getDataset();
        assertEquals(400, magnitude.getItemCount(0), "400 points are below the decimation threshold: all kept");
        assertEquals(loop.omegaRadPerSec()[7] / (2 * Math.PI), magnitude.getXValue(0, 7), 1e-12);
        assertEquals(20 * Math.log10(loop.magnitude()[7]), magnitude.getYValue(0, 7), 1e-12);
        assertEquals(Math.toDegrees(loop.phaseRad()[7]), phase.getYValue(0, 7), 1e-12);
    }

    @Test
    void marginsAreAnnotatedInTradeUnits() {
        Margins margins = new Margins(1.2271, Math.toRadians(25.39), Math.sqrt(5), 3.0);
        JFreeChart chart = BodeChart.create("t", List.of(ogataLoop(400)), margins);
        CombinedDomainXYPlot plot = (CombinedDomainXYPlot) chart.getPlot();
        XYPlot magnitude = plot.getSubplots().get(0);
        XYPlot phase = plot.getSubplots().get(1);
        String gm = labels(magnitude);
        String pm = labels(phase);
        assertTrue(gm.contains("GM 9.5 dB at 0.356 Hz"), gm); // √5/(2π) = 0.3559 Hz
        assertTrue(pm.contains("PM 25.4° at 0.195 Hz"), pm); // 1.2271/(2π) = 0.1953 Hz
    }

    @Test
    void timeChartScalesToDisplayUnitsAndDrawsTheLimit() {
        double[] t = {0, 0.001, 0.002};
        double[] e = {0, 5e-6, 8e-6};
        JFreeChart chart = TimeChart.create("Following error", List.of(new TimeSeries("X", t, e)),
                DisplayScale.MILLISECONDS, DisplayScale.MICROMETRES.named("Following error"), 10e-6, true);
        XYPlot plot = chart.getXYPlot();
        assertEquals(2.0, plot.getDataset().getXValue(0, 2), 1e-12);
        assertEquals(8.0, plot.getDataset().getYValue(0, 2), 1e-9);
        assertEquals("Following error (µm)", plot.getRangeAxis().getLabel());
        assertEquals(2, plot.getRangeMarkers(Layer.FOREGROUND).size());
        assertTrue(labels(plot).contains("limit 10.0 µm"), labels(plot));
    }

    @Test
    void svgExportIsAStandaloneDocumentWithoutScript() {
        JFreeChart chart = PoleZeroChart.create("Closed loop", new double[][] {{-1, 2}, {-1, -2}}, new double[][] {{-3, 0}});
        String svg = ChartExport.svg(chart, 640, 480);
        assertTrue(svg.startsWith("<?xml") || svg.startsWith("<svg"), svg.substring(0, 40));
        assertTrue(svg.matches("(?s).*width=['\"]640(\\.0)?['\"].*"), "requested width");
        assertTrue(!svg.contains("<script"), "no script in exported charts");
    }

    @Test
    void absurdSizesAreRejectedWithTheValidRange() {
        JFreeChart chart = PoleZeroChart.create("t", new double[0][], new double[0][]);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ChartExport.png(chart, 0, 100));
        assertTrue(e.getMessage().contains("1…8000"), e.getMessage());
    }

    /** Labels of the value markers of the plot, " | "-separated. */
    static String labels(XYPlot plot) {
        StringBuilder all = new StringBuilder();
        for (Layer layer : new Layer[] {Layer.FOREGROUND, Layer.BACKGROUND}) {
            for (var markers : new java.util.Collection<?>[] {plot.getDomainMarkers(layer), plot.getRangeMarkers(layer)}) {
                if (markers != null) {
                    for (Object m : markers) {
                        String label = ((Marker) m).getLabel();
                        if (m instanceof ValueMarker && label != null) {
                            all.append(label).append(" | ");
                        }
                    }
                }
            }
        }
        return all.toString();
    }
}
