package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.util.SplittableRandom;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;

/** The chart PNG writer, checked against an independent decoder (the JDK's ImageIO PNG reader). */
class PngEncoderTest {

    @Test
    void decodesToTheSamePixels() throws Exception {
        BufferedImage image = new BufferedImage(97, 41, BufferedImage.TYPE_INT_RGB);
        SplittableRandom random = new SplittableRandom(7);
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                // flat runs, gradients and noise: every byte difference of the Sub filter, wrapping included
                int rgb = x < 30 ? 0xFFFFFF : x < 60 ? (x * 4) << 16 | (y * 6) << 8 | (255 - x) : random.nextInt(1 << 24);
                image.setRGB(x, y, rgb);
            }
        }
        byte[] png = PngEncoder.encode(image);
        // PNG signature, ISO/IEC 15948 §5.2: 89 50 4E 47 0D 0A 1A 0A.
        assertArrayEquals(new byte[] { (byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n' },
                java.util.Arrays.copyOf(png, 8));
        BufferedImage decoded = ImageIO.read(new ByteArrayInputStream(png));
        assertEquals(97, decoded.getWidth());
        assertEquals(41, decoded.getHeight());
        for (int y = 0; y < 41; y++) {
            for (int x = 0; x < 97; x++) {
                assertEquals(image.getRGB(x, y), decoded.getRGB(x, y), "pixel " + x + "," + y);
            }
        }
        assertArrayEquals(png, PngEncoder.encode(image), "same image, same bytes");
    }

    @Test
    void imagesWithAlphaAreRefused() {
        BufferedImage argb = new BufferedImage(4, 4, BufferedImage.TYPE_INT_ARGB);
        assertThrows(IllegalArgumentException.class, () -> PngEncoder.encode(argb));
    }
}
