package dockline;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Every package of the program has a {@code package-info.java} (DEVELOPERS.md: what it computes and which
 * class is the entry point) that links to at least one class of its own package.
 */
class PackageInfoTest {

    @Test
    void everyPackage_hasAPackageInfo_thatLinksToItsEntryPoint() throws IOException {
        Path root = Path.of("src/main/java/dockline");
        List<Path> packages;
        try (Stream<Path> s = Files.list(root)) {
            packages = s.filter(Files::isDirectory).sorted().toList();
        }
        assertThat(packages).hasSizeGreaterThan(10);
        for (Path p : packages) {
            Path info = p.resolve("package-info.java");
            assertThat(info).as(p.toString()).exists();
            String text = Files.readString(info);
            String pkg = "dockline." + p.getFileName();
            assertThat(text).as(pkg).contains("package " + pkg + ";").contains("{@link " + pkg + ".");
        }
    }
}
