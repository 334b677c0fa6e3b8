package org.tracewell.ui.charts;

import java.awt.image.BufferedImage;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.jfree.chart.JFreeChart;

/**
 * Shows a JFreeChart in SWT by rendering it off-screen (AWT, headless) at the control's size, so the view looks
 * exactly like the exported PNG in the report. A chart can arrive already drawn ({@link #draw} runs on any thread,
 * so views draw in their jobs and the UI thread only copies pixels); otherwise, or after a resize, it is drawn
 * when painted. Re-renders only when the chart or the size changes.
 */
public final class ChartCanvas extends Canvas {

    /**
     * A chart with its pixels drawn at {@code size}; {@code image} is null when it was not drawn ahead (the
     * canvas was hidden), and then the canvas draws it when it is first painted.
     */
    public record Drawn(JFreeChart chart, ImageData image, Point size) {

        public static final Drawn NONE = new Drawn(null, null, null);
    }

    private boolean square;
    private JFreeChart chart;
    private ImageData ahead;
    private Point aheadSize;
    private Image image;
    private Point imageSize = new Point(0, 0);

    public ChartCanvas(Composite parent, int style) {
        super(parent, style | SWT.DOUBLE_BUFFERED | SWT.NO_BACKGROUND);
        addPaintListener(e -> paint(e.gc));
        addListener(SWT.Resize, e -> redraw());
        addDisposeListener(e -> disposeImage());
    }

    /**
     * Draws {@code chart} at {@code size} into pixels; any thread (AWT off-screen, no SWT resource). A null size (a
     * hidden canvas) or a null chart gives no pixels.
     */
    public static Drawn draw(JFreeChart chart, Point size) {
        if (chart == null || size == null || size.x < 2 || size.y < 2) {
            return new Drawn(chart, null, size);
        }
        BufferedImage rendered = chart.createBufferedImage(size.x, size.y, BufferedImage.TYPE_INT_RGB, null);
        return new Drawn(chart, toImageData(rendered), size);
    }

    /**
     * Draws charts square, centred (for plane plots with equal data spans on both axes: a circle stays round). Call
     * on the UI thread before charts are shown.
     */
    public void setSquare(boolean square) {
        checkWidget();
        this.square = square;
        disposeImage();
        redraw();
    }

    /** The size to draw ahead at: the chart's size in the control while it is visible, else null. UI thread. */
    public Point drawingSize() {
        checkWidget();
        Point size = chartSize();
        return isVisible() && size.x >= 2 && size.y >= 2 ? size : null;
    }

    /** The control's size, or the largest centred square in it. */
    private Point chartSize() {
        Point size = getSize();
        int edge = Math.min(size.x, size.y);
        return square ? new Point(edge, edge) : size;
    }

    /** Shows {@code newChart}; {@code null} clears the canvas. Call on the UI thread. */
    public void setChart(JFreeChart newChart) {
        show(new Drawn(newChart, null, null));
    }

    /** Shows a chart drawn ahead; its pixels are used while the canvas keeps the size they were drawn at. */
    public void show(Drawn drawn) {
        checkWidget();
        chart = drawn.chart();
        ahead = drawn.image();
        aheadSize = drawn.size();
        disposeImage();
        redraw();
    }

    public JFreeChart getChart() {
        checkWidget();
        return chart;
    }

    private void paint(GC gc) {
        Point whole = getSize();
        Point size = chartSize();
        if (chart == null || size.x < 2 || size.y < 2 || !size.equals(whole)) {
            gc.setBackground(getDisplay().getSystemColor(SWT.COLOR_WHITE));
            gc.fillRectangle(0, 0, whole.x, whole.y);
        }
        if (chart == null || size.x < 2 || size.y < 2) {
            return;
        }
        if (image == null || !imageSize.equals(size)) {
            disposeImage();
            ImageData pixels = ahead != null && size.equals(aheadSize) ? ahead : draw(chart, size).image();
            image = new Image(getDisplay(), pixels);
            imageSize = size;
        }
        gc.drawImage(image, (whole.x - size.x) / 2, (whole.y - size.y) / 2);
    }

    private void disposeImage() {
        if (image != null) {
            image.dispose();
            image = null;
        }
    }

    static ImageData toImageData(BufferedImage rgb) {
        int width = rgb.getWidth();
        int height = rgb.getHeight();
        ImageData data = new ImageData(width, height, 24, new PaletteData(0xFF0000, 0x00FF00, 0x0000FF));
        int[] row = new int[width];
        for (int y = 0; y < height; y++) {
            rgb.getRGB(0, y, width, 1, row, 0, width);
            data.setPixels(0, y, width, row, 0);
        }
        return data;
    }
}
