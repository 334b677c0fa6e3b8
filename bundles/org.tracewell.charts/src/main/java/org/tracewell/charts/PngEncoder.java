package org.tracewell.charts;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;
import java.util.zip.Deflater;
import java.util.zip.DeflaterOutputStream;

/**
 * A small PNG writer for opaque chart images (ISO/IEC 15948): 8-bit RGB, one IDAT chunk, the "Sub" row filter
 * and the fastest deflate level. Charts are mostly flat colour, so this comes within a few per cent of the
 * size of a maximum-effort encoding at a fraction of the time; the report writes some twenty of them per run.
 * The same image always gives the same bytes.
 */
final class PngEncoder {

    private static final byte[] SIGNATURE = { (byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n' };
    private static final int COLOUR_TYPE_RGB = 2;
    private static final int FILTER_SUB = 1;

    private PngEncoder() {
    }

    /** Encodes an image of type {@link BufferedImage#TYPE_INT_RGB}. */
    static byte[] encode(BufferedImage image) {
        if (image.getType() != BufferedImage.TYPE_INT_RGB) {
            throw new IllegalArgumentException("PNG encoding expects an opaque TYPE_INT_RGB image, got type "
                    + image.getType());
        }
        int width = image.getWidth();
        int height = image.getHeight();
        int[] pixels = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        try {
            ByteArrayOutputStream png = new ByteArrayOutputStream(width * height / 4 + 1024);
            png.write(SIGNATURE);
            byte[] header = new byte[13];
            putInt(header, 0, width);
            putInt(header, 4, height);
            header[8] = 8; // bits per sample
            header[9] = COLOUR_TYPE_RGB;
            // compression 0 (deflate), filter method 0, no interlace
            chunk(png, "IHDR", header, header.length);

            ByteArrayOutputStream compressed = new ByteArrayOutputStream(width * height / 8 + 1024);
            Deflater deflater = new Deflater(Deflater.BEST_SPEED);
            try (DeflaterOutputStream z = new DeflaterOutputStream(compressed, deflater, 1 << 16)) {
                byte[] row = new byte[1 + 3 * width];
                row[0] = FILTER_SUB;
                for (int y = 0; y < height; y++) {
                    int previous = 0;
                    int base = y * width;
                    for (int x = 0, k = 1; x < width; x++, k += 3) {
                        int rgb = pixels[base + x];
                        // Sub filter: each byte minus the same colour byte of the pixel to its left (mod 256)
                        row[k] = (byte) ((rgb >>> 16) - (previous >>> 16));
                        row[k + 1] = (byte) ((rgb >>> 8) - (previous >>> 8));
                        row[k + 2] = (byte) (rgb - previous);
                        previous = rgb;
                    }
                    z.write(row);
                }
            } finally {
                deflater.end();
            }
            chunk(png, "IDAT", compressed.toByteArray(), compressed.size());
            chunk(png, "IEND", new byte[0], 0);
            return png.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("writing to memory failed", e); // a ByteArrayOutputStream does not throw
        }
    }

    private static void chunk(ByteArrayOutputStream out, String type, byte[] data, int length) throws IOException {
        byte[] lengthBytes = new byte[4];
        putInt(lengthBytes, 0, length);
        out.write(lengthBytes);
        byte[] typeBytes = type.getBytes(StandardCharsets.US_ASCII);
        out.write(typeBytes);
        out.write(data, 0, length);
        CRC32 crc = new CRC32(); // over type and data, ISO/IEC 15948 §5.3
        crc.update(typeBytes);
        crc.update(data, 0, length);
        byte[] crcBytes = new byte[4];
        putInt(crcBytes, 0, (int) crc.getValue());
        out.write(crcBytes);
    }

    private static void putInt(byte[] target, int offset, int value) {
        target[offset] = (byte) (value >>> 24);
        target[offset + 1] = (byte) (value >>> 16);
        target[offset + 2] = (byte) (value >>> 8);
        target[offset + 3] = (byte) value;
    }
}
