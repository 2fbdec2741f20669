package dockline.raster;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;

/**
 * PNG through the JDK's image I/O: images written by {@code javax.imageio} (the reference encoder
 * here) read back level for level; colour through the integer BT.601 luma (ITU-R BT.601 weights
 * 0.299, 0.587, 0.114, common practice); pixels that are not opaque are unknown.
 */
class PngReaderTest {

    private static final Path F = Path.of("test.png");

    private static byte[] png(BufferedImage img) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertThat(ImageIO.write(img, "png", out)).isTrue();
        return out.toByteArray();
    }

    @Test
    void grey_8_and_16_bit() throws IOException, RasterException {
        BufferedImage g8 = new BufferedImage(3, 2, BufferedImage.TYPE_BYTE_GRAY);
        g8.getRaster().setSamples(0, 0, 3, 2, 0, new int[] {0, 100, 255, 7, 205, 254});
        GreyImage a = PngReader.read(F, png(g8));
        assertThat(a.maxval()).isEqualTo(255);
        assertThat(a.samples()).containsExactly(0, 100, 255, 7, 205, 254);

        BufferedImage g16 = new BufferedImage(2, 1, BufferedImage.TYPE_USHORT_GRAY);
        g16.getRaster().setSamples(0, 0, 2, 1, 0, new int[] {65535, 300});
        GreyImage b = PngReader.read(F, png(g16));
        assertThat(b.maxval()).isEqualTo(65535);
        assertThat(b.samples()).containsExactly(65535, 300);
    }

    @Test
    void colour_by_integer_luma_and_transparent_pixels_unknown() throws IOException, RasterException {
        BufferedImage c = new BufferedImage(3, 1, BufferedImage.TYPE_INT_ARGB);
        c.setRGB(0, 0, 0xff_ff_ff_ff);
        c.setRGB(1, 0, 0xff_ff_00_00);  // pure red: 299 * 255 / 1000 = 76.245, rounded down 76
        c.setRGB(2, 0, 0x80_ff_ff_ff);  // half transparent
        GreyImage img = PngReader.read(F, png(c));
        assertThat(img.samples()).containsExactly(255, 76, GreyImage.NO_VALUE);
    }

    @Test
    void truncated_png_is_a_clear_error() throws IOException {
        BufferedImage g8 = new BufferedImage(40, 40, BufferedImage.TYPE_BYTE_GRAY);
        for (int i = 0; i < 40; i++) {
            g8.getRaster().setSample(i, i, 0, 255);
        }
        byte[] whole = png(g8);
        byte[] cut = Arrays.copyOf(whole, whole.length / 2);
        try {
            PngReader.read(F, cut);
            throw new AssertionError("no error");
        } catch (RasterException e) {
            assertThat(e.problems().get(0).format()).startsWith("test.png: the PNG image cannot be decoded")
                    .endsWith("(hint: the file may be truncated or damaged)");
        }
    }
}
