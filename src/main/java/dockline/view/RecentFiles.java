package dockline.view;

import dockline.io.AtomicFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The recently opened files, newest first, at most {@link #MAX}. Kept in memory, and in a small
 * text file of its own (one path a line) when a store is given: by default
 * {@code ~/.dockline/recent-files.txt}. Only that file is ever written; mission and map files are
 * only read.
 */
final class RecentFiles {

    static final int MAX = 8;

    private final Path store;
    private final List<Path> files = new ArrayList<>();

    /** A list kept in the given store file, or only in memory when {@code store} is {@code null}. */
    RecentFiles(Path store) {
        this.store = store;
        if (store != null && Files.isRegularFile(store)) {
            try {
                for (String line : Files.readAllLines(store, StandardCharsets.UTF_8)) {
                    if (!line.isBlank() && files.size() < MAX) {
                        files.add(Path.of(line.trim()));
                    }
                }
            } catch (IOException | RuntimeException unreadable) {
                files.clear(); // a damaged list is not worth an error: start afresh
            }
        }
    }

    /** The default store under the user's home, or {@code dockline.recent} when that property is set. */
    static Path defaultStore() {
        String p = System.getProperty("dockline.recent");
        if (p != null) {
            return p.isBlank() ? null : Path.of(p);
        }
        String home = System.getProperty("user.home");
        return home == null ? null : Path.of(home, ".dockline", "recent-files.txt");
    }

    List<Path> files() {
        return List.copyOf(files);
    }

    /** Puts the file first; saving failures are ignored (the list is a convenience). */
    void add(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        files.remove(abs);
        files.add(0, abs);
        while (files.size() > MAX) {
            files.remove(files.size() - 1);
        }
        save();
    }

    void remove(Path file) {
        files.remove(file.toAbsolutePath().normalize());
        save();
    }

    private void save() {
        if (store == null) {
            return;
        }
        StringBuilder sb = new StringBuilder();
        for (Path p : files) {
            sb.append(p).append('\n');
        }
        try {
            AtomicFiles.writeString(store, sb.toString());
        } catch (IOException | RuntimeException ignored) {
            // read-only home: keep the list in memory only
        }
    }
}
