package org.tracewell.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.util.List;

import javax.imageio.ImageIO;

import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.tracewell.charts.BudgetBar;
import org.tracewell.charts.BudgetBarChart;

/** The report's PNG encoding: standard PNG, requested size, same bytes for the same chart. */
class ChartImagesTest {

    private static JFreeChart chart() {
        return BudgetBarChart.create("Budget", List.of(new BudgetBar("a", 3e-6), new BudgetBar("b", 1e-6)),
                "total", 4e-6, 5e-6, Double.NaN);
    }

    @Test
    void pngHasTheRequestedSizeAndIsReproducible() throws Exception {
        byte[] png = ChartImages.png(chart(), 640, 300);
        // PNG signature, ISO/IEC 15948 §5.2: 89 50 4E 47 0D 0A 1A 0A.
        assertEquals((byte) 0x89, png[0]);
        assertEquals('P', png[1]);
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(png));
        assertEquals(640, image.getWidth());
        assertEquals(300, image.getHeight());
        assertArrayEquals(png, ChartImages.png(chart(), 640, 300), "same chart, same bytes");
    }

    @Test
    void absurdSizesAreRejectedWithTheValidRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ChartImages.png(chart(), 0, 300));
        assertTrue(e.getMessage().contains("1…8000"), e.getMessage());
    }
}
