package dockline.raster;

import java.awt.image.BufferedImage;
import java.awt.image.ColorModel;
import java.awt.image.Raster;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Iterator;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;

/**
 * Reads a PNG image with the JDK's image I/O ({@code javax.imageio}) into a {@link GreyImage}.
 *
 * <p>A greyscale PNG keeps its levels (maxval 255, or 65535 for 16-bit samples). A colour PNG
 * is turned into grey with the integer luma of ITU-R BT.601, {@code (299 R + 587 G + 114 B) / 1000}
 * rounded down (common practice for luminance; exact integer arithmetic). A pixel that is not fully
 * opaque has no usable level ({@link GreyImage#NO_VALUE}), so it counts as unknown. The size is
 * read from the header first, and images over {@link NetpbmReader#MAX_PIXELS} are refused before
 * any pixel is decoded.
 *
 * <p>Cost: linear in the number of pixels; one {@code int} per pixel besides the decoded image.
 */
public final class PngReader {

    private static final byte[] SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};

    private PngReader() {
    }

    /** True when the bytes start with the PNG signature. */
    public static boolean looksLikePng(byte[] data) {
        if (data.length < SIGNATURE.length) {
            return false;
        }
        for (int i = 0; i < SIGNATURE.length; i++) {
            if (data[i] != SIGNATURE[i]) {
                return false;
            }
        }
        return true;
    }

    /** Decodes {@code data}; {@code file} names it in messages. */
    public static GreyImage read(Path file, byte[] data) throws RasterException {
        BufferedImage img;
        try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(data))) {
            Iterator<ImageReader> readers = in == null ? null : ImageIO.getImageReaders(in);
            if (readers == null || !readers.hasNext()) {
                throw bad(file, "the PNG image cannot be decoded: no reader accepts it", null);
            }
            ImageReader reader = readers.next();
            try {
                reader.setInput(in, true, true);
                long w = reader.getWidth(0);
                long h = reader.getHeight(0);
                if (w * h > NetpbmReader.MAX_PIXELS) {
                    throw bad(file, "the image has " + w + " x " + h + " pixels, more than " + NetpbmReader.MAX_PIXELS
                            + " are not read", "scale the image down (a coarser pixel) before importing");
                }
                img = reader.read(0);
            } finally {
                reader.dispose();
            }
        } catch (IOException | RuntimeException e) {
            String why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            throw bad(file, "the PNG image cannot be decoded: " + why, "the file may be truncated or damaged");
        }
        return grey(img);
    }

    private static GreyImage grey(BufferedImage img) {
        int w = img.getWidth();
        int h = img.getHeight();
        int[] samples = new int[w * h];
        ColorModel cm = img.getColorModel();
        Raster r = img.getRaster();
        boolean greyBands = cm.getNumColorComponents() == 1;
        if (greyBands && !cm.hasAlpha() && cm.getColorSpace().getType() == java.awt.color.ColorSpace.TYPE_GRAY
                && r.getNumBands() == 1) {
            int bits = r.getSampleModel().getSampleSize(0);
            int maxval = (1 << bits) - 1;
            for (int y = 0; y < h; y++) {
                for (int x = 0; x < w; x++) {
                    samples[y * w + x] = r.getSample(x, y, 0);
                }
            }
            return new GreyImage(w, h, maxval, samples, "PNG greyscale, " + bits + "-bit");
        }
        // colour, palette or alpha: through the 8-bit ARGB view
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                int argb = img.getRGB(x, y);
                int a = argb >>> 24;
                int red = (argb >> 16) & 0xff;
                int green = (argb >> 8) & 0xff;
                int blue = argb & 0xff;
                samples[y * w + x] = a != 255 ? GreyImage.NO_VALUE : (299 * red + 587 * green + 114 * blue) / 1000;
            }
        }
        return new GreyImage(w, h, 255, samples, "PNG " + (greyBands ? "greyscale with alpha" : "colour") + ", as 8-bit grey");
    }

    private static RasterException bad(Path file, String message, String hint) {
        return new RasterException(RasterProblem.of(file, message, hint));
    }
}
