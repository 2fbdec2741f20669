package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Regression tests of {@link AtomicFiles}: what a new user met when writing outputs. */
class AtomicFilesTest {

    @TempDir
    Path dir;

    private static boolean posix(Path p) {
        return Files.getFileAttributeView(p, PosixFileAttributeView.class) != null;
    }

    /**
     * Exported policies came out as {@code rw-------}: the temporary file was made by
     * {@code Files.createTempFile}, which is owner-only, and then moved into place, so a robot
     * controller account could not read the policy. A new output now gets the same permissions as
     * any file created in that folder.
     */
    @Test
    void newFile_getsTheUsualPermissions_notOwnerOnly() throws IOException {
        assumeTrue(posix(dir));
        Path reference = Files.createFile(dir.resolve("reference.txt"));
        Path out = dir.resolve("policy.json");
        AtomicFiles.writeString(out, "{}");
        assertThat(Files.getPosixFilePermissions(out)).isEqualTo(Files.getPosixFilePermissions(reference));
        assertThat(Files.readString(out)).isEqualTo("{}");
    }

    /** Rewriting a file that someone had made group-readable reset it to owner-only; its permissions are kept now. */
    @Test
    void existingFile_keepsItsPermissions() throws IOException {
        assumeTrue(posix(dir));
        Path out = dir.resolve("replay.csv");
        Files.writeString(out, "old");
        Files.setPosixFilePermissions(out, PosixFilePermissions.fromString("rw-r-----"));
        AtomicFiles.writeString(out, "new");
        assertThat(Files.readString(out)).isEqualTo("new");
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(out))).isEqualTo("rw-r-----");
    }

    /**
     * Writing over a folder said {@code /tmp/.qa.1128…part -> /tmp/qa: Is a directory}: the temporary
     * file's name, not the user's. The message is in plain words about the target now.
     */
    @Test
    void folderTarget_isAPlainMessage_withoutTheTemporaryName() {
        assertThatThrownBy(() -> AtomicFiles.writeString(dir, "x")).isInstanceOf(IOException.class)
                .hasMessage("it is a folder, not a file");
        assertThatThrownBy(() -> AtomicFiles.writeString(Path.of(""), "x")).hasMessage("the file name is empty");
    }

    /** A writer that fails half way leaves the old content and no temporary file behind. */
    @Test
    void failingWriter_leavesTheOldFile_andNoTemporaryFile() throws IOException {
        Path out = dir.resolve("margins.json");
        Files.writeString(out, "complete old content");
        assertThatThrownBy(() -> AtomicFiles.write(out, os -> {
            os.write("half".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        })).hasMessageContaining("disk full");
        assertThat(Files.readString(out)).isEqualTo("complete old content");
        try (Stream<Path> s = Files.list(dir)) {
            assertThat(s.map(p -> p.getFileName().toString())).containsExactly("margins.json");
        }
    }

    /**
     * {@code --policy /tmp/typo/p.json} silently created the folder {@code typo}; the check before
     * any work names the missing folder instead, and says nothing about a path that can be written.
     */
    @Test
    void problemWith_namesAMissingFolder_aFolderTarget_andAnEmptyName() throws IOException {
        Path missing = dir.resolve("typo").resolve("p.json");
        assertThat(AtomicFiles.problemWith(missing)).contains("the folder " + missing.getParent() + " does not exist");
        assertThat(Files.exists(missing.getParent())).isFalse();
        assertThat(AtomicFiles.problemWith(dir)).isEqualTo("it is a folder, not a file");
        assertThat(AtomicFiles.problemWith(Path.of(""))).isEqualTo("the file name is empty");
        Path file = Files.writeString(dir.resolve("plain.txt"), "x");
        assertThat(AtomicFiles.problemWith(file.resolve("below.json"))).contains("is not a folder");
        assertThat(AtomicFiles.problemWith(dir.resolve("fine.json"))).isNull();
        assertThat(AtomicFiles.problemWith(file)).isNull();
    }
}
