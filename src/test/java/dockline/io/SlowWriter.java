package dockline.io;

import java.nio.file.Path;

/**
 * A child process for {@link AtomicFilesHostileTest}: writes a large file slowly through
 * {@link AtomicFiles}, printing {@code writing} once its temporary file holds data, so that the
 * test can kill it in the middle of the write.
 */
public final class SlowWriter {

    private SlowWriter() {
    }

    public static void main(String[] args) throws Exception {
        Path target = Path.of(args[0]);
        byte[] chunk = new byte[64 * 1024];
        AtomicFiles.write(target, out -> {
            for (int i = 0; i < 100_000; i++) {
                out.write(chunk);
                out.flush();
                if (i == 0) {
                    System.out.println("writing");
                    System.out.flush();
                }
                try {
                    Thread.sleep(20);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        });
    }
}
