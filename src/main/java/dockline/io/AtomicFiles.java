package dockline.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes output files atomically: the content goes to a temporary file beside the target, which is
 * then moved over it. An interrupted run never leaves a half-written file, and an existing file is
 * replaced only by a complete one.
 *
 * <p>The temporary file is created like any new file (so it gets the usual permissions, not the
 * owner-only ones of {@link Files#createTempFile}); when the target exists, its permissions are
 * kept. A failure is an {@link IOException} whose message says in plain words what is wrong with
 * the target (never the temporary file's name). {@link #problemWith(Path)} asks the same questions
 * before any work is done, so a command can refuse a bad output path up front.
 *
 * <p>Only a regular file or a new path is written: a symbolic link, a device or a named pipe is
 * refused (a run as root must never replace {@code /dev/full} by a file). The temporary file is
 * removed on every way out; one left by a killed process ({@code .dockline-<pid>-<random>.part})
 * is removed by the next write to the same folder once that process is gone.
 */
public final class AtomicFiles {

    /** Something that writes the whole content to a stream. */
    @FunctionalInterface
    public interface Writer {
        void write(OutputStream out) throws IOException;
    }

    private AtomicFiles() {
    }

    public static void writeString(Path target, String content) throws IOException {
        write(target, out -> out.write(content.getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * Writes the file atomically; a missing parent folder is created.
     *
     * @throws IOException with a plain-words reason; the target is then untouched
     */
    public static void write(Path target, Writer writer) throws IOException {
        if (target.toString().isEmpty()) {
            throw new IOException("the file name is empty");
        }
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (dir == null) {
            throw new IOException("it names no file");
        }
        String special = notRegular(abs);
        if (special != null) {
            throw new IOException(special);
        }
        Path tmp;
        try {
            Files.createDirectories(dir);
            removeStale(dir);
            tmp = newTemporary(dir);
        } catch (IOException e) {
            throw new IOException(reason(dir, e), e);
        }
        try {
            try (OutputStream out = Files.newOutputStream(tmp, StandardOpenOption.WRITE)) {
                writer.write(out);
            }
            keepPermissions(abs, tmp);
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (FileSystemException e) {
            throw new IOException(reason(dir, e), e);
        } finally {
            // on every path out (an exception, an Error such as OutOfMemoryError, a move that failed)
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException | RuntimeException e) {
                // nothing more can be done; a later write to this folder removes it (removeStale)
            }
        }
    }

    /**
     * Why an existing {@code abs} must not be replaced, or {@code null}: only a regular file or a new
     * path is written. The link itself is looked at, not what it points to, so a symbolic link, a
     * device, a named pipe or a socket is refused rather than turned into (or written through to) a
     * regular file.
     */
    static String notRegular(Path abs) {
        java.nio.file.attribute.BasicFileAttributes a;
        try {
            a = Files.readAttributes(abs, java.nio.file.attribute.BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
        } catch (IOException | RuntimeException e) {
            return null; // a new path, or a parent that is not a folder: the checks after this one name it
        }
        if (a.isRegularFile()) {
            return null;
        }
        if (a.isDirectory()) {
            return "it is a folder, not a file";
        }
        if (a.isSymbolicLink()) {
            return "it is a symbolic link; outputs are written only to a regular file or a new name";
        }
        return "it is a device, a named pipe or a socket, not a regular file; outputs are written only to a"
                + " regular file or a new name";
    }

    /** Prefix of our temporary files: {@code .dockline-<pid>-<random>.part}. */
    static final String TEMP_PREFIX = ".dockline-";
    static final String TEMP_SUFFIX = ".part";
    private static final java.util.regex.Pattern TEMP_NAME =
            java.util.regex.Pattern.compile("\\.dockline-(\\d{1,19})-[0-9a-z]{1,13}\\.part");

    /**
     * Removes temporary files of our own naming left in {@code dir} by a writer that is no longer
     * running (killed while writing): their name carries the writer's process id. Files of a
     * running process, and every other file, are left alone. Costs one directory listing.
     */
    static void removeStale(Path dir) {
        try (java.nio.file.DirectoryStream<Path> ds = Files.newDirectoryStream(dir, TEMP_PREFIX + "*" + TEMP_SUFFIX)) {
            for (Path p : ds) {
                java.util.regex.Matcher m = TEMP_NAME.matcher(p.getFileName().toString());
                if (!m.matches()) {
                    continue;
                }
                long pid;
                try {
                    pid = Long.parseLong(m.group(1));
                } catch (NumberFormatException e) {
                    continue;
                }
                if (pid == ProcessHandle.current().pid()) {
                    continue; // ours: another thread of this process may be writing it
                }
                boolean alive = ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false);
                if (!alive && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
                    Files.deleteIfExists(p);
                }
            }
        } catch (IOException | RuntimeException e) {
            // cleaning up is a courtesy; it never stops a write
        }
    }

    /**
     * What stands in the way of writing {@code target} with {@link #write}, in plain words, or
     * {@code null} when nothing visible does: an empty name, a folder, a parent that does not exist
     * or is not a folder, a folder or a file that may not be written. Unlike {@link #write}, a missing
     * folder is a problem here: a mistyped folder name should not silently become a new folder.
     */
    public static String problemWith(Path target) {
        if (target.toString().isEmpty()) {
            return "the file name is empty";
        }
        Path abs = target.toAbsolutePath().normalize();
        String special = notRegular(abs);
        if (special != null) {
            return special;
        }
        Path dir = abs.getParent();
        if (dir == null) {
            return "it names no file";
        }
        if (!Files.exists(dir)) {
            return "the folder " + dir + " does not exist (create it first, or check the spelling)";
        }
        if (!Files.isDirectory(dir)) {
            return dir + " is not a folder";
        }
        if (!Files.isWritable(dir)) {
            return "the folder " + dir + " may not be written to";
        }
        if (Files.exists(abs) && !Files.isWritable(abs)) {
            return "the file may not be written to";
        }
        return null;
    }

    /**
     * A new, empty file beside the target, created with the usual (umask) permissions, named
     * {@code .dockline-<pid>-<random>.part} so that {@link #removeStale} can tell whether its writer
     * still runs.
     */
    private static Path newTemporary(Path dir) throws IOException {
        long pid = ProcessHandle.current().pid();
        for (int attempt = 0; ; attempt++) {
            Path tmp = dir.resolve(TEMP_PREFIX + pid + "-"
                    + Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36) + TEMP_SUFFIX);
            try {
                Files.newByteChannel(tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
                return tmp;
            } catch (java.nio.file.FileAlreadyExistsException e) {
                if (attempt > 100) {
                    throw e;
                }
            }
        }
    }

    /** Gives the new file the permissions of the file it replaces (POSIX file systems only). */
    private static void keepPermissions(Path target, Path tmp) throws IOException {
        PosixFileAttributeView old = Files.getFileAttributeView(target, PosixFileAttributeView.class,
                LinkOption.NOFOLLOW_LINKS);
        if (old != null && Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            Files.setPosixFilePermissions(tmp, old.readAttributes().permissions());
        }
    }

    /** The failure in plain words, about the target (the temporary file is an implementation detail). */
    private static String reason(Path dir, IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NoSuchFileException) {
            return Files.isDirectory(dir) ? "no file can be created in the folder " + dir : "the folder does not exist";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            String r = f.getReason();
            return r.substring(0, 1).toLowerCase(java.util.Locale.ROOT) + r.substring(1);
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }
}
