package org.tracewell.charts;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Renders charts to PNG or SVG without a display (the report and the command line use this). */
public final class ChartExport {

    /** Largest edge accepted, in pixels: keeps a typo from allocating gigabytes. */
    public static final int MAX_EDGE_PX = 8000;

    private ChartExport() {
    }

    public static byte[] png(JFreeChart chart, int widthPx, int heightPx) {
        checkSize(widthPx, heightPx);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ChartUtils.writeChartAsPNG(out, chart, widthPx, heightPx);
        } catch (IOException e) {
            throw new UncheckedIOException("could not encode the chart as PNG", e);
        }
        return out.toByteArray();
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
