package org.tracewell.charts;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Renders charts to PNG or SVG without a display (the report and the command line use this). */
public final class ChartExport {

    /** Largest edge accepted, in pixels: keeps a typo from allocating gigabytes. */
    public static final int MAX_EDGE_PX = 8000;

    private ChartExport() {
    }

    /** Opaque RGB PNG (the charts have a white background); the same chart always gives the same bytes. */
    public static byte[] png(JFreeChart chart, int widthPx, int heightPx) {
        checkSize(widthPx, heightPx);
        BufferedImage image = new BufferedImage(widthPx, heightPx, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            draw(chart, g, widthPx, heightPx);
        } finally {
            g.dispose();
        }
        return PngEncoder.encode(image);
    }

    /**
     * Draws a small throw-away chart so that Java 2D, its fonts and the chart classes are loaded and initialised.
     * A short headless run calls this on an otherwise idle core while its analysis runs, so the first real
     * chart does not pay for that start-up.
     */
    public static void warmUp() {
        TimeSeries ramp = new TimeSeries("warm-up", new double[] { 0, 1, 2 }, new double[] { 0, 1e-6, 4e-6 });
        JFreeChart chart = TimeChart.create("warm-up", java.util.List.of(ramp), DisplayScale.SECONDS,
                DisplayScale.MICROMETRES, 3e-6, true);
        png(chart, 160, 120);
    }

    public static String svg(JFreeChart chart, int widthPx, int heightPx) {
        checkSize(widthPx, heightPx);
        SVGGraphics2D g = new SVGGraphics2D(widthPx, heightPx);
        draw(chart, g, widthPx, heightPx);
        return g.getSVGDocument();
    }

    public static void writePng(JFreeChart chart, Path file, int widthPx, int heightPx) throws IOException {
        Files.write(file, png(chart, widthPx, heightPx));
    }

    public static void writeSvg(JFreeChart chart, Path file, int widthPx, int heightPx) throws IOException {
        Files.writeString(file, svg(chart, widthPx, heightPx), StandardCharsets.UTF_8);
    }

    private static void draw(JFreeChart chart, Graphics2D g, int widthPx, int heightPx) {
        chart.draw(g, new Rectangle2D.Double(0, 0, widthPx, heightPx));
    }

    private static void checkSize(int widthPx, int heightPx) {
        if (widthPx < 1 || heightPx < 1 || widthPx > MAX_EDGE_PX || heightPx > MAX_EDGE_PX) {
            throw new IllegalArgumentException("chart size " + widthPx + "×" + heightPx
                    + " px is outside 1…" + MAX_EDGE_PX + " px per edge");
        }
    }
}
