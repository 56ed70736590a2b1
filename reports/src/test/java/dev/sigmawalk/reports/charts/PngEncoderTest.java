package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.SplittableRandom;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;

class PngEncoderTest {
    /**
     * The JDK's own PNG reader (javax.imageio, independent of the writer under test) decodes every
     * written file to exactly the pixels drawn: random noise (the worst case for compression) and
     * anti-aliased lines on a flat background (what a chart is), at odd sizes, five seeded cases each.
     */
    @Test
    void decodedPixels_areThePixelsDrawn() throws IOException {
        SplittableRandom random = new SplittableRandom(20_261_202L);
        for (int c = 0; c < 5; c++) {
            int width = random.nextInt(1, 300);
            int height = random.nextInt(1, 200);
            assertRoundTrip(noise(width, height, random), "noise " + width + " x " + height);
            assertRoundTrip(lines(width, height, random), "lines " + width + " x " + height);
        }
    }

    /** The file starts with the PNG signature and an IHDR of the image's size, 8-bit RGB (PNG specification §5.2, §11.2.2). */
    @Test
    void header_namesTheSizeAndEightBitTruecolour() throws IOException {
        byte[] png = encode(noise(7, 5, new SplittableRandom(3)));
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'}, java.util.Arrays.copyOf(png, 8));
        assertEquals("IHDR", new String(png, 12, 4, java.nio.charset.StandardCharsets.US_ASCII));
        assertEquals(7, java.nio.ByteBuffer.wrap(png, 16, 4).getInt());
        assertEquals(5, java.nio.ByteBuffer.wrap(png, 20, 4).getInt());
        assertEquals(8, png[24], "bit depth");
        assertEquals(2, png[25], "colour type: truecolour");
    }

    @Test
    void otherImageTypes_areRefused() {
        BufferedImage argb = new BufferedImage(4, 4, BufferedImage.TYPE_INT_ARGB);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> encode(argb));
        assertTrue(e.getMessage().contains("TYPE_INT_RGB"), e.getMessage());
    }

    private static void assertRoundTrip(BufferedImage image, String label) throws IOException {
        BufferedImage back = ImageIO.read(new ByteArrayInputStream(encode(image)));
        assertEquals(image.getWidth(), back.getWidth(), label);
        assertEquals(image.getHeight(), back.getHeight(), label);
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                assertEquals(image.getRGB(x, y), back.getRGB(x, y), label + " at (" + x + ", " + y + ")");
            }
        }
    }

    private static byte[] encode(BufferedImage image) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PngEncoder.write(image, out);
        return out.toByteArray();
    }

    private static BufferedImage noise(int width, int height, SplittableRandom random) {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                image.setRGB(x, y, random.nextInt(1 << 24));
            }
        }
        return image;
    }

    private static BufferedImage lines(int width, int height, SplittableRandom random) {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, width, height);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setStroke(new BasicStroke(1.5f));
            for (int k = 0; k < 6; k++) {
                g.setColor(new Color(random.nextInt(1 << 24)));
                g.drawLine(random.nextInt(width), random.nextInt(height), random.nextInt(width), random.nextInt(height));
            }
        } finally {
            g.dispose();
        }
        return image;
    }
}
