package dockline.raster;

/**
 * A greyscale image as read from a file, row by row from the top-left pixel: sample 0 is black
 * (dark, occupied in an occupancy image), {@code maxval} is white, and {@link #NO_VALUE} marks a
 * pixel that has no usable grey level (a PNG pixel that is not fully opaque). A bitmap (PBM) is
 * read as {@code maxval} 1 with black 0 and white 1.
 *
 * @param width   pixels per row, at least 1
 * @param height  rows, at least 1
 * @param maxval  the white level, 1 to 65535
 * @param samples {@code width * height} grey levels, 0 to maxval or {@link #NO_VALUE}; the record
 *                keeps the array given (it is not copied: images are large), callers do not change it
 * @param format  the file format in words, e.g. {@code PGM raw (P5)}
 */
public record GreyImage(int width, int height, int maxval, int[] samples, String format) {

    /** A pixel without a grey level; classified as unknown. */
    public static final int NO_VALUE = -1;

    public GreyImage {
        if (width < 1 || height < 1) {
            throw new IllegalArgumentException("an image has at least one pixel");
        }
        if (maxval < 1 || maxval > 65535) {
            throw new IllegalArgumentException("maxval " + maxval);
        }
        if ((long) width * height != samples.length) {
            throw new IllegalArgumentException("samples do not match the size");
        }
    }

    /** The grey level of pixel (x, y), or {@link #NO_VALUE}. */
    public int at(int x, int y) {
        return samples[y * width + x];
    }
}
