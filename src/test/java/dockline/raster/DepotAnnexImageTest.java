package dockline.raster;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** The committed demo image is exactly what {@link DepotAnnexImage} draws, and reads back pixel for pixel. */
class DepotAnnexImageTest {

    @Test
    void committed_image_is_the_drawn_one() throws IOException, RasterException {
        byte[] file = Files.readAllBytes(Path.of("maps/depot-annex.pgm"));
        assertThat(file).isEqualTo(DepotAnnexImage.bytes());
        GreyImage img = NetpbmReader.read(Path.of("maps/depot-annex.pgm"), file);
        assertThat(img.width()).isEqualTo(DepotAnnexImage.W);
        assertThat(img.height()).isEqualTo(DepotAnnexImage.H);
        assertThat(img.samples()).isEqualTo(DepotAnnexImage.draw());
    }
}
