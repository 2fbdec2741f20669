package dockline.raster;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * An image file as read for an import: its name, its size in bytes, the SHA-256 of its bytes (so
 * that the map records exactly which file it came from) and its pixels. The format is told by the
 * file's first bytes, not by its name: Netpbm ({@link NetpbmReader}) or PNG ({@link PngReader}).
 *
 * @param file   the file as the user named it
 * @param bytes  its length
 * @param sha256 the SHA-256 of its content, 64 lower-case hex digits
 * @param image  its pixels
 */
public record SourceImage(Path file, long bytes, String sha256, GreyImage image) {

    /** Largest image file read. */
    public static final long MAX_BYTES = 512L * 1024 * 1024;

    /** Reads and decodes the file; every failure is a {@link RasterException} in plain words. */
    public static SourceImage read(Path file) throws RasterException {
        byte[] data;
        try {
            if (Files.isDirectory(file)) {
                throw new RasterException(RasterProblem.of(file, "cannot read the image: it is a folder", null));
            }
            // asked before opening: a named pipe would wait for a writer and a device may never end
            if (Files.exists(file) && !Files.isRegularFile(file)) {
                throw new RasterException(RasterProblem.of(file, "cannot read the image: it is not a regular file"
                        + " (a named pipe, a device or a socket)", "give the path of an image file saved on disk"));
            }
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw new RasterException(RasterProblem.of(file, "the file has " + size + " bytes, more than "
                        + MAX_BYTES + " are not read", "scale the image down before importing"));
            }
            try (InputStream in = Files.newInputStream(file)) {
                data = in.readNBytes((int) MAX_BYTES);
            }
        } catch (NoSuchFileException e) {
            throw new RasterException(RasterProblem.of(file, "cannot read the image: it does not exist", "check the name"));
        } catch (AccessDeniedException e) {
            throw new RasterException(RasterProblem.of(file, "cannot read the image: permission denied", null));
        } catch (IOException e) {
            throw new RasterException(RasterProblem.of(file, "cannot read the image: " + e.getMessage(), null));
        }
        if (data.length == 0) {
            throw new RasterException(RasterProblem.of(file, "the file is empty", "give a PGM, PBM or PNG image"));
        }
        GreyImage image;
        if (NetpbmReader.looksLikeNetpbm(data)) {
            image = NetpbmReader.read(file, data);
        } else if (PngReader.looksLikePng(data)) {
            image = PngReader.read(file, data);
        } else {
            throw new RasterException(RasterProblem.of(file, "this is neither a Netpbm (PGM/PBM) nor a PNG image",
                    "give a PGM (P2/P5), PBM (P1/P4) or PNG file; the format is told by the content, not the name"));
        }
        return new SourceImage(file, data.length, sha256(data), image);
    }

    static String sha256(byte[] data) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(data));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
