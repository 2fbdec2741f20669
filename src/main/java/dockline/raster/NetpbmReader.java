package dockline.raster;

import java.nio.file.Path;

/**
 * Reads the greyscale and bitmap formats of the Netpbm project, written from the project's
 * published format pages, pgm(5) ("PGM - Netpbm grayscale image format") and pbm(5) ("PBM -
 * Netpbm bitmap format"):
 *
 * <ul>
 *   <li>{@code P2} plain PGM and {@code P5} raw PGM: the magic number, whitespace, the width, the
 *       height and the maxval as ASCII decimals separated by whitespace, then the raster. maxval
 *       is more than 0 and less than 65536. In {@code P5}, exactly one whitespace character
 *       follows the maxval, then {@code height} rows of {@code width} samples, one byte each when
 *       maxval is below 256, else two bytes, the most significant first. In {@code P2} every
 *       sample is an ASCII decimal, separated by whitespace. 0 is black, maxval white.</li>
 *   <li>{@code P1} plain PBM and {@code P4} raw PBM: the magic number, the width and the height
 *       (no maxval). {@code 1} is black and {@code 0} white. In {@code P1} each pixel is one
 *       character {@code 0} or {@code 1}; whitespace between them is allowed but not needed. In
 *       {@code P4} each row is packed eight pixels to a byte, the first pixel in the most
 *       significant bit, and every row starts on a new byte (the last byte's unused bits are
 *       ignored).</li>
 * </ul>
 *
 * <p>Whitespace is blank, TAB, CR and LF (the pages' list). A comment runs from {@code #} to the
 * next CR or LF and is allowed wherever whitespace is in the header (in raw files, before the
 * single whitespace character that ends the header); this reader also skips comments between the
 * samples of a plain file. A file may hold several images one after the other (the pages allow
 * it): only the first is read and the rest is ignored. A sample above maxval, a header that is
 * cut short or a raster with fewer bytes or values than the header promises is an error;
 * {@code P3}/{@code P6} (colour) and PAM ({@code P7}) are refused with a hint.
 *
 * <p>Cost: linear in the file size; one {@code int} per pixel. Errors in the header and in a
 * plain raster name the line and column; errors in a raw raster name the pixel.
 */
public final class NetpbmReader {

    /** Most pixels of an image this reader accepts (about 8192 x 8192); more is refused before allocating. */
    public static final long MAX_PIXELS = 64L * 1024 * 1024;
    /** Longest side of an image. */
    public static final int MAX_SIDE = 65536;

    private final Path file;
    private final byte[] data;
    private int pos;
    private int line = 1;
    private int col = 1;

    private NetpbmReader(Path file, byte[] data) {
        this.file = file;
        this.data = data;
    }

    /** True when the bytes start like a Netpbm file ({@code P} and a digit). */
    public static boolean looksLikeNetpbm(byte[] data) {
        return data.length >= 2 && data[0] == 'P' && data[1] >= '1' && data[1] <= '7';
    }

    /**
     * Reads the first image of {@code data}; {@code file} names it in messages.
     *
     * @throws RasterException with the first problem (a broken file gives no sensible later ones)
     */
    public static GreyImage read(Path file, byte[] data) throws RasterException {
        return new NetpbmReader(file, data).readImage();
    }

    private GreyImage readImage() throws RasterException {
        if (!looksLikeNetpbm(data)) {
            throw fail("this is not a Netpbm image (it does not start with P1, P2, P4 or P5)",
                    "give a PGM, PBM or PNG file");
        }
        char kind = (char) data[1];
        switch (kind) {
            case '3', '6' -> throw fail("this is a colour PPM image (P" + kind + "); only greyscale and bitmap images"
                    + " are read", "convert it to greyscale PGM first");
            case '7' -> throw fail("this is a PAM image (P7), which is not read", "convert it to PGM (P5)");
            default -> { }
        }
        advance();
        advance();
        boolean bitmap = kind == '1' || kind == '4';
        boolean plain = kind == '1' || kind == '2';
        if (pos < data.length && !isWhitespace(data[pos]) && data[pos] != '#') {
            throw failHere("the magic number P" + kind + " must be followed by whitespace", null);
        }
        int width = headerNumber("width", 1, MAX_SIDE);
        int height = headerNumber("height", 1, MAX_SIDE);
        int maxval = bitmap ? 1 : headerNumber("maxval", 1, 65535);
        if ((long) width * height > MAX_PIXELS) {
            throw fail("the image has " + width + " x " + height + " pixels, more than " + MAX_PIXELS + " are not read",
                    "scale the image down (a coarser pixel) before importing");
        }
        String format = (bitmap ? "PBM " : "PGM ") + (plain ? "plain" : "raw") + " (P" + kind + ")";
        int[] samples = new int[width * height];
        if (plain) {
            if (bitmap) {
                readPlainBits(samples, width);
            } else {
                readPlainSamples(samples, width, maxval);
            }
        } else {
            endOfHeader();
            if (bitmap) {
                readRawBits(samples, width, height);
            } else {
                readRawSamples(samples, width, height, maxval);
            }
        }
        return new GreyImage(width, height, maxval, samples, format);
    }

    /** Skips whitespace and comments, then reads a decimal from {@code min} to {@code max}. */
    private int headerNumber(String what, int min, int max) throws RasterException {
        skipWhitespaceAndComments();
        if (pos >= data.length) {
            throw failHere("the header ends before the " + what, "the file is cut short or is not a Netpbm image");
        }
        if (!isDigit(data[pos])) {
            throw failHere("expected the " + what + " (a decimal number), found " + shown(data[pos]), null);
        }
        int l = line;
        int c = col;
        long v = digits();
        if (v < min || v > max) {
            String hint = what.equals("maxval") ? "maxval is 1 to 65535 (pgm(5))"
                    : "an image is 1 to " + max + " pixels wide and high";
            throw new RasterException(new RasterProblem(file, l, c, "the " + what + " " + (v >= 1L << 40 ? "is far too large"
                    : "is " + v) + ", outside " + min + " to " + max, hint));
        }
        return (int) v;
    }

    /** The decimal number at the position, capped at 2^40 (so "far too large" needs no overflow). */
    private long digits() {
        long v = 0;
        while (pos < data.length && isDigit(data[pos])) {
            v = Math.min(v * 10 + (data[pos] - '0'), 1L << 40);
            advance();
        }
        return v;
    }

    /** After the last header number of a raw file: an optional comment, then exactly one whitespace character. */
    private void endOfHeader() throws RasterException {
        if (pos < data.length && data[pos] == '#') {
            while (pos < data.length && data[pos] != '\n' && data[pos] != '\r') {
                advance();
            }
        }
        if (pos >= data.length) {
            throw failHere("the file ends after the header: there is no raster", "the file is cut short");
        }
        if (!isWhitespace(data[pos])) {
            throw failHere("expected one whitespace character after the header, found " + shown(data[pos]), null);
        }
        advance();
    }

    private void readPlainSamples(int[] samples, int width, int maxval) throws RasterException {
        for (int i = 0; i < samples.length; i++) {
            skipWhitespaceAndComments();
            if (pos >= data.length) {
                throw failHere("the file ends after " + i + " of " + samples.length + " samples",
                        "the file is cut short, or the width or height in the header is wrong");
            }
            if (!isDigit(data[pos])) {
                throw failHere("expected a sample (a decimal number), found " + shown(data[pos]), null);
            }
            int l = line;
            int c = col;
            long v = digits();
            if (v > maxval) {
                throw new RasterException(new RasterProblem(file, l, c, "sample " + (v >= 1L << 40 ? "far too large" : v)
                        + " of pixel " + (i % width) + ":" + (i / width) + " is above the maxval " + maxval,
                        "every sample is 0 to maxval"));
            }
            samples[i] = (int) v;
        }
    }

    private void readPlainBits(int[] samples, int width) throws RasterException {
        for (int i = 0; i < samples.length; i++) {
            skipWhitespaceAndComments();
            if (pos >= data.length) {
                throw failHere("the file ends after " + i + " of " + samples.length + " pixels",
                        "the file is cut short, or the width or height in the header is wrong");
            }
            byte b = data[pos];
            if (b != '0' && b != '1') {
                throw failHere("expected a pixel 0 or 1, found " + shown(b), "a plain PBM raster is made of 0 and 1");
            }
            samples[i] = b == '1' ? 0 : 1;
            advance();
        }
    }

    private void readRawBits(int[] samples, int width, int height) throws RasterException {
        int rowBytes = (width + 7) / 8;
        long need = (long) rowBytes * height;
        if (data.length - pos < need) {
            throw truncated(need, data.length - pos, "bytes", "rows of " + rowBytes + " bytes");
        }
        for (int y = 0; y < height; y++) {
            int rowStart = pos + y * rowBytes;
            for (int x = 0; x < width; x++) {
                int bit = (data[rowStart + (x >> 3)] >> (7 - (x & 7))) & 1;
                samples[y * width + x] = bit == 1 ? 0 : 1;
            }
        }
    }

    private void readRawSamples(int[] samples, int width, int height, int maxval) throws RasterException {
        int bytes = maxval < 256 ? 1 : 2;
        long need = (long) samples.length * bytes;
        if (data.length - pos < need) {
            throw truncated(need, data.length - pos, "bytes", bytes == 1 ? "one byte per sample" : "two bytes per sample");
        }
        for (int i = 0; i < samples.length; i++) {
            int v = bytes == 1 ? data[pos + i] & 0xff
                    : ((data[pos + 2 * i] & 0xff) << 8) | (data[pos + 2 * i + 1] & 0xff);
            if (v > maxval) {
                throw new RasterException(RasterProblem.of(file, "sample " + v + " of pixel " + (i % width) + ":"
                        + (i / width) + " is above the maxval " + maxval, "every sample is 0 to maxval; the file may be damaged"));
            }
            samples[i] = v;
        }
    }

    private RasterException truncated(long need, long have, String unit, String layout) {
        return new RasterException(RasterProblem.of(file, "the raster is cut short: the header promises " + need + " "
                + unit + " (" + layout + "), the file has " + have, "the file is truncated, or the header's width, height or"
                + " maxval is wrong"));
    }

    private void skipWhitespaceAndComments() {
        while (pos < data.length) {
            byte b = data[pos];
            if (isWhitespace(b)) {
                advance();
            } else if (b == '#') {
                while (pos < data.length && data[pos] != '\n' && data[pos] != '\r') {
                    advance();
                }
            } else {
                return;
            }
        }
    }

    /** Moves one byte on, counting lines at LF (and at a CR not followed by LF) and columns in bytes. */
    private void advance() {
        byte b = data[pos++];
        if (b == '\n' || (b == '\r' && (pos >= data.length || data[pos] != '\n'))) {
            line++;
            col = 1;
        } else if (b != '\r') {
            col++;
        }
    }

    private RasterException fail(String message, String hint) {
        return new RasterException(RasterProblem.of(file, message, hint));
    }

    private RasterException failHere(String message, String hint) {
        return new RasterException(new RasterProblem(file, line, col, message, hint));
    }

    private static boolean isWhitespace(byte b) {
        return b == ' ' || b == '\t' || b == '\r' || b == '\n';
    }

    private static boolean isDigit(byte b) {
        return b >= '0' && b <= '9';
    }

    private static String shown(byte b) {
        int v = b & 0xff;
        return v >= 0x21 && v < 0x7f ? "'" + (char) v + "'" : String.format("byte 0x%02x", v);
    }
}
