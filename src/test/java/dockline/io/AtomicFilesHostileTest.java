package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Outputs under hostile conditions (issue 15): only a regular file or a new path is written, a
 * device, named pipe or symbolic link is refused; the temporary file is removed on every failure,
 * and one left by a killed writer is removed by the next write to the folder.
 */
class AtomicFilesHostileTest {

    @TempDir
    Path dir;

    private List<Path> parts() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".part")).toList();
        }
    }

    private static boolean mkfifo(Path p) throws IOException, InterruptedException {
        try {
            Process pr = new ProcessBuilder("mkfifo", p.toString()).redirectErrorStream(true).start();
            return pr.waitFor(10, TimeUnit.SECONDS) && pr.exitValue() == 0;
        } catch (IOException e) {
            return false;
        }
    }

    @Test
    void aDevice_isRefused_andLeftAlone() throws IOException {
        Path dev = Path.of("/dev/null");
        assumeTrue(Files.exists(dev), "no /dev/null on this system");
        assertThat(AtomicFiles.problemWith(dev)).contains("device");
        assertThatThrownBy(() -> AtomicFiles.writeString(dev, "x")).isInstanceOf(IOException.class)
                .hasMessageContaining("device");
        assertThat(Files.isRegularFile(dev)).isFalse();
    }

    @Test
    void aNamedPipe_isRefused_withoutBlocking() throws Exception {
        Path fifo = dir.resolve("out.json");
        if (!mkfifo(fifo)) {
            System.out.println("SKIPPED aNamedPipe_isRefused_withoutBlocking: mkfifo is not available here");
            assumeTrue(false, "mkfifo is not available");
        }
        assertThat(AtomicFiles.problemWith(fifo)).contains("named pipe");
        assertThatThrownBy(() -> AtomicFiles.writeString(fifo, "x")).isInstanceOf(IOException.class);
        assertThat(Files.isRegularFile(fifo)).isFalse();
        assertThat(parts()).isEmpty();
    }

    @Test
    void aSymbolicLink_isRefused_andItsTargetKept() throws IOException {
        Path real = Files.writeString(dir.resolve("real.txt"), "keep");
        Path link;
        try {
            link = Files.createSymbolicLink(dir.resolve("link.txt"), real);
        } catch (UnsupportedOperationException | IOException e) {
            assumeTrue(false, "no symbolic links here");
            return;
        }
        assertThat(AtomicFiles.problemWith(link)).contains("symbolic link");
        assertThatThrownBy(() -> AtomicFiles.writeString(link, "x")).isInstanceOf(IOException.class);
        assertThat(Files.isSymbolicLink(link)).isTrue();
        assertThat(Files.readString(real)).isEqualTo("keep");
    }

    @Test
    void aRegularFileOrANewPath_isWritten_andTheTemporaryNamesThePid() throws IOException {
        Path old = Files.writeString(dir.resolve("a.txt"), "old");
        assertThat(AtomicFiles.problemWith(old)).isNull();
        assertThat(AtomicFiles.problemWith(dir.resolve("new.txt"))).isNull();
        AtomicFiles.write(old, out -> {
            List<Path> p = parts();
            assertThat(p).hasSize(1);
            assertThat(p.get(0).getFileName().toString())
                    .matches("\\.dockline-" + ProcessHandle.current().pid() + "-[0-9a-z]+\\.part");
            out.write("new".getBytes(StandardCharsets.UTF_8));
        });
        assertThat(Files.readString(old)).isEqualTo("new");
        assertThat(parts()).isEmpty();
    }

    @Test
    void theTemporaryFile_isRemoved_onEveryFailure() throws IOException {
        Path out = dir.resolve("x.json");
        assertThatThrownBy(() -> AtomicFiles.write(out, o -> {
            o.write(1);
            throw new IOException("disk full");
        })).isInstanceOf(IOException.class);
        assertThatThrownBy(() -> AtomicFiles.write(out, o -> {
            o.write(1);
            throw new IllegalStateException("a defect");
        })).isInstanceOf(IllegalStateException.class);
        assertThatThrownBy(() -> AtomicFiles.write(out, o -> {
            o.write(1);
            throw new OutOfMemoryError("simulated");
        })).isInstanceOf(OutOfMemoryError.class);
        assertThat(parts()).isEmpty();
        assertThat(out).doesNotExist();
    }

    @Test
    void staleTemporaries_ofDeadWriters_areRemoved_othersKept() throws IOException {
        // a process id that is not running: the highest pid the kernel hands out is far below this
        Path dead = Files.writeString(dir.resolve(".dockline-" + (Long.MAX_VALUE / 3) + "-abc.part"), "x");
        Path live = Files.writeString(dir.resolve(".dockline-" + ProcessHandle.current().pid() + "-abc.part"), "x");
        Path notOurs = Files.writeString(dir.resolve(".other.part"), "x");
        AtomicFiles.writeString(dir.resolve("y.txt"), "y");
        assertThat(dead).doesNotExist();
        assertThat(live).exists();
        assertThat(notOurs).exists();
    }

    /** Kills a child JVM in the middle of a big write; the next write to the folder leaves no .part file. */
    @Test
    void aKilledWriter_leavesNoPartFile_afterTheNextWrite() throws Exception {
        Path target = dir.resolve("big.bin");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                SlowWriter.class.getName(), target.toString()).redirectErrorStream(true).start();
        try {
            BufferedReader r = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8));
            String line = r.readLine();
            assertThat(line).as("the child's first line").isEqualTo("writing");
            assertThat(parts()).as("the child's temporary file while it writes").hasSize(1);
        } finally {
            child.destroyForcibly();
            assertThat(child.waitFor(30, TimeUnit.SECONDS)).isTrue();
        }
        assertThat(parts()).as("a killed writer leaves its temporary file").hasSize(1);
        assertThat(target).doesNotExist();
        AtomicFiles.writeString(dir.resolve("next.txt"), "next");
        assertThat(parts()).isEmpty();
        assertThat(target).doesNotExist();
    }
}
