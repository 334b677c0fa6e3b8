package org.tracewell.report;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.Iterator;

import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.MemoryCacheImageOutputStream;

import org.jfree.chart.JFreeChart;
import org.tracewell.charts.ChartExport;

/**
 * PNG encoding tuned for the report: opaque RGB (the charts have a white background, so no alpha channel)
 * and a light deflate setting. A report holds some twenty charts and the whole {@code tracewell analyze} run
 * has a time budget; the default maximum-effort encodings cost several times more for files only slightly
 * smaller. The result is a standard PNG and, for the same chart, the same bytes.
 */
final class ChartImages {

    /**
     * ImageIO's PNG writer maps compression quality q to a deflate level of about 9·(1 − q); 0.75 gives a
     * fast level with most of the size reduction.
     */
    static final float COMPRESSION_QUALITY = 0.75f;

    private ChartImages() {
    }

    static byte[] png(JFreeChart chart, int widthPx, int heightPx) throws IOException {
        if (widthPx < 1 || heightPx < 1 || widthPx > ChartExport.MAX_EDGE_PX || heightPx > ChartExport.MAX_EDGE_PX) {
            throw new IllegalArgumentException("chart size " + widthPx + "×" + heightPx + " px is outside 1…"
                    + ChartExport.MAX_EDGE_PX + " px per edge");
        }
        BufferedImage image = new BufferedImage(widthPx, heightPx, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            chart.draw(g, new Rectangle2D.Double(0, 0, widthPx, heightPx));
        } finally {
            g.dispose();
        }
        Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName("png");
        if (!writers.hasNext()) {
            throw new IOException("this Java runtime has no PNG image writer");
        }
        ImageWriter writer = writers.next();
        try {
            ImageWriteParam param = writer.getDefaultWriteParam();
            param.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
            param.setCompressionQuality(COMPRESSION_QUALITY);
            ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
            try (MemoryCacheImageOutputStream stream = new MemoryCacheImageOutputStream(out)) {
                writer.setOutput(stream);
                writer.write(null, new IIOImage(image, null, null), param);
            }
            return out.toByteArray();
        } finally {
            writer.dispose();
        }
    }
}
