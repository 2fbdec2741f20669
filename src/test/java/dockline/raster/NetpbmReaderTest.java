package dockline.raster;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * Hand-made files after the Netpbm project's format pages pgm(5) and pbm(5). The two sample
 * images are the pages' own examples (the plain "FEEP" greymap of pgm(5) and the letter "J" of
 * pbm(5)), written here from memory of those pages; their raw twins are packed by hand from the
 * pages' description of the raw rasters (one byte per sample below maxval 256, else two, most
 * significant first; bitmap rows packed eight pixels a byte, most significant bit first, each row
 * on a new byte, 1 = black).
 */
class NetpbmReaderTest {

    private static final Path F = Path.of("test.pgm");

    /** pgm(5)'s plain example, "FEEP" in four grey levels, maxval 15. */
    private static final String FEEP = """
            P2
            # feep.pgm
            24 7
            15
            0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0
            0  3  3  3  3  0  0  7  7  7  7  0  0 11 11 11 11  0  0 15 15 15 15  0
            0  3  0  0  0  0  0  7  0  0  0  0  0 11  0  0  0  0  0 15  0  0 15  0
            0  3  3  3  0  0  0  7  7  7  0  0  0 11 11 11  0  0  0 15 15 15 15  0
            0  3  0  0  0  0  0  7  0  0  0  0  0 11  0  0  0  0  0 15  0  0  0  0
            0  3  0  0  0  0  0  7  7  7  7  0  0 11 11 11 11  0  0 15  0  0  0  0
            0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0
            """;

    /** pbm(5)'s plain example, the letter "J", 6 x 10. */
    private static final String J = """
            P1
            # This is an example bitmap of the letter "J"
            6 10
            0 0 0 0 1 0
            0 0 0 0 1 0
            0 0 0 0 1 0
            0 0 0 0 1 0
            0 0 0 0 1 0
            0 0 0 0 1 0
            1 0 0 0 1 0
            0 1 1 1 0 0
            0 0 0 0 0 0
            0 0 0 0 0 0
            """;

    private static GreyImage read(String text) throws RasterException {
        return NetpbmReader.read(F, text.getBytes(StandardCharsets.US_ASCII));
    }

    private static GreyImage read(byte[] data) throws RasterException {
        return NetpbmReader.read(F, data);
    }

    private static String error(byte[] data) {
        try {
            NetpbmReader.read(F, data);
        } catch (RasterException e) {
            return e.problems().get(0).format();
        }
        throw new AssertionError("no error");
    }

    private static String error(String text) {
        return error(text.getBytes(StandardCharsets.US_ASCII));
    }

    private static int[] feepSamples() {
        String[] tokens = FEEP.lines().skip(4).flatMap(l -> java.util.Arrays.stream(l.trim().split("\\s+"))).toArray(String[]::new);
        int[] s = new int[tokens.length];
        for (int i = 0; i < s.length; i++) {
            s[i] = Integer.parseInt(tokens[i]);
        }
        return s;
    }

    @Test
    void plain_pgm_example_of_the_format_page() throws RasterException {
        GreyImage img = read(FEEP);
        assertThat(img.width()).isEqualTo(24);
        assertThat(img.height()).isEqualTo(7);
        assertThat(img.maxval()).isEqualTo(15);
        assertThat(img.format()).isEqualTo("PGM plain (P2)");
        // the top-left "F" stroke of level 3, the "P" of level 15 (pgm(5) example)
        assertThat(img.at(1, 1)).isEqualTo(3);
        assertThat(img.at(19, 1)).isEqualTo(15);
        assertThat(img.at(22, 2)).isEqualTo(15);
        assertThat(img.at(0, 0)).isZero();
        assertThat(img.samples()).hasSize(24 * 7).isEqualTo(feepSamples());
    }

    @Test
    void raw_pgm_8_bit_is_the_same_image() throws RasterException {
        int[] s = feepSamples();
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.writeBytes("P5 24 7 15\n".getBytes(StandardCharsets.US_ASCII));
        for (int v : s) {
            b.write(v);
        }
        GreyImage img = read(b.toByteArray());
        assertThat(img.format()).isEqualTo("PGM raw (P5)");
        assertThat(img.samples()).isEqualTo(s);
    }

    @Test
    void raw_pgm_16_bit_is_most_significant_byte_first() throws RasterException {
        // pgm(5): maxval 256 or more means two bytes per sample, the most significant first
        byte[] head = "P5\n3 1\n65535\n".getBytes(StandardCharsets.US_ASCII);
        byte[] data = new byte[head.length + 6];
        System.arraycopy(head, 0, data, 0, head.length);
        byte[] raster = {0x12, 0x34, (byte) 0xff, (byte) 0xff, 0x00, 0x01};
        System.arraycopy(raster, 0, data, head.length, 6);
        GreyImage img = read(data);
        assertThat(img.maxval()).isEqualTo(65535);
        assertThat(img.samples()).containsExactly(0x1234, 65535, 1);

        // maxval 256 is the smallest with two bytes per sample (the boundary of "less than 256")
        byte[] h2 = "P5 2 1 256 ".getBytes(StandardCharsets.US_ASCII);
        byte[] d2 = java.util.Arrays.copyOf(h2, h2.length + 4);
        d2[h2.length] = 0x01;
        d2[h2.length + 1] = 0x00;
        d2[h2.length + 3] = (byte) 0xff;
        assertThat(read(d2).samples()).containsExactly(256, 255);
        // and maxval 255 one byte
        byte[] h3 = "P5 2 1 255\n".getBytes(StandardCharsets.US_ASCII);
        byte[] d3 = java.util.Arrays.copyOf(h3, h3.length + 2);
        d3[h3.length] = (byte) 200;
        d3[h3.length + 1] = 7;
        assertThat(read(d3).samples()).containsExactly(200, 7);
    }

    @Test
    void plain_pgm_16_bit() throws RasterException {
        GreyImage img = read("P2\n2 2\n65535\n0 65535\n1000 256\n");
        assertThat(img.samples()).containsExactly(0, 65535, 1000, 256);
    }

    @Test
    void plain_pbm_example_with_and_without_whitespace() throws RasterException {
        GreyImage img = read(J);
        assertThat(img.width()).isEqualTo(6);
        assertThat(img.height()).isEqualTo(10);
        assertThat(img.maxval()).isEqualTo(1);
        // 1 is black (grey 0), 0 white (grey 1)
        assertThat(img.at(4, 0)).isZero();
        assertThat(img.at(0, 0)).isEqualTo(1);
        assertThat(img.at(0, 6)).isZero();
        assertThat(img.at(1, 7)).isZero();
        // pbm(5): the same image with no whitespace between the pixels
        GreyImage packed = read("P1\n6 10\n000010000010000010000010000010000010100010011100000000000000\n");
        assertThat(packed.samples()).isEqualTo(img.samples());
    }

    @Test
    void raw_pbm_rows_start_on_a_new_byte() throws RasterException {
        // J packed by hand: rows 000010 -> 0000 1000 = 0x08, 100010 -> 0x88, 011100 -> 0x70, padding bits set to 1
        // in the last row to show they are ignored
        byte[] head = "P4\n6 10\n".getBytes(StandardCharsets.US_ASCII);
        byte[] rows = {0x08, 0x08, 0x08, 0x08, 0x08, 0x08, (byte) 0x88, 0x70, 0x00, 0x03};
        byte[] data = java.util.Arrays.copyOf(head, head.length + rows.length);
        System.arraycopy(rows, 0, data, head.length, rows.length);
        GreyImage img = read(data);
        assertThat(img.format()).isEqualTo("PBM raw (P4)");
        assertThat(img.samples()).isEqualTo(read(J).samples());
        // a width of 9 needs two bytes a row
        byte[] h9 = "P4 9 2\n".getBytes(StandardCharsets.US_ASCII);
        byte[] d9 = java.util.Arrays.copyOf(h9, h9.length + 4);
        d9[h9.length] = (byte) 0x80;      // pixel 0 black
        d9[h9.length + 1] = (byte) 0x80;  // pixel 8 black
        d9[h9.length + 3] = (byte) 0x80;  // row 2: pixel 8 black
        assertThat(read(d9).samples()).containsExactly(0, 1, 1, 1, 1, 1, 1, 1, 0, 1, 1, 1, 1, 1, 1, 1, 1, 0);
    }

    @Test
    void comments_and_line_ends_in_the_header() throws RasterException {
        // a comment runs to the next CR or LF, anywhere in the header; CR LF line ends are whitespace
        assertThat(read("P2\r\n# made by hand\r\n2 # width\r\n1\r\n# maxval next\r\n9\r\n4 9\r\n").samples())
                .containsExactly(4, 9);
        // raw: a comment after the maxval ends at the newline, which is the single whitespace before the raster
        byte[] head = "P5 1 1 255# end\n".getBytes(StandardCharsets.US_ASCII);
        byte[] data = java.util.Arrays.copyOf(head, head.length + 1);
        data[head.length] = (byte) ' '; // the raster byte is 32, which is also a blank: only one whitespace is skipped
        assertThat(read(data).samples()).containsExactly(32);
        // trailing images (the pages allow several in one file) are ignored
        assertThat(read("P2 1 1 9 5\nP2 1 1 9 7\n").samples()).containsExactly(5);
    }

    @Test
    void maxval_zero_and_above_65535_are_refused_at_their_position() {
        assertThat(error("P2\n2 2\n0\n0 0 0 0\n")).isEqualTo("test.pgm:3:1: the maxval is 0, outside 1 to 65535"
                + " (hint: maxval is 1 to 65535 (pgm(5)))");
        assertThat(error("P5\n2 2\n65536\n")).startsWith("test.pgm:3:1: the maxval is 65536, outside 1 to 65535");
        assertThat(error("P5\n2 2\n99999999999999999999\n")).startsWith("test.pgm:3:1: the maxval is far too large");
        assertThat(error("P2\n0 2\n5\n")).startsWith("test.pgm:2:1: the width is 0");
    }

    @Test
    void truncated_files() {
        assertThat(error("P2\n2 2\n")).isEqualTo("test.pgm:3:1: the header ends before the maxval"
                + " (hint: the file is cut short or is not a Netpbm image)");
        assertThat(error("P2\n2 2\n9\n1 2 3\n")).startsWith("test.pgm:5:1: the file ends after 3 of 4 samples");
        assertThat(error("P1\n3 1\n01")).startsWith("test.pgm:3:3: the file ends after 2 of 3 pixels");
        assertThat(error("P5\n4 2\n255\nabc")).isEqualTo("test.pgm: the raster is cut short: the header promises 8 bytes"
                + " (one byte per sample), the file has 3 (hint: the file is truncated, or the header's width, height or"
                + " maxval is wrong)");
        assertThat(error("P5 2 2 1000\n\0\0\0\0")).startsWith("test.pgm: the raster is cut short: the header promises 8 bytes");
        assertThat(error("P4 9 2\n\0\0\0")).startsWith("test.pgm: the raster is cut short: the header promises 4 bytes");
        assertThat(error("P5 2 2 255")).startsWith("test.pgm:1:11: the file ends after the header");
    }

    @Test
    void bad_samples_and_other_formats() {
        assertThat(error("P2\n2 1\n9\n3 10\n")).isEqualTo("test.pgm:4:3: sample 10 of pixel 1:0 is above the maxval 9"
                + " (hint: every sample is 0 to maxval)");
        assertThat(error("P5 2 1 9\n\u0003\n")).startsWith("test.pgm: sample 10 of pixel 1:0 is above the maxval 9");
        assertThat(error("P2\n2 1\n9\n3 x\n")).startsWith("test.pgm:4:3: expected a sample (a decimal number), found 'x'");
        assertThat(error("P1\n2 1\n02\n")).startsWith("test.pgm:3:2: expected a pixel 0 or 1, found '2'");
        assertThat(error("P6\n1 1\n255\nabc")).contains("colour PPM image (P6)").contains("convert it to greyscale PGM");
        assertThat(error("P7\nWIDTH 1\n")).contains("PAM image (P7)");
        assertThat(error("P5x")).startsWith("test.pgm:1:3: the magic number P5 must be followed by whitespace");
        assertThat(error("GIF89a")).contains("not a Netpbm image");
    }

    @Test
    void huge_headers_are_refused_before_allocating() {
        assertThatThrownBy(() -> read("P5 65536 65536 255\n")).isInstanceOf(RasterException.class)
                .hasMessageContaining("more than " + NetpbmReader.MAX_PIXELS);
    }
}
