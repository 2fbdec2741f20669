package dockline.view;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The modification times of the files a window shows (the mission and its map) when they were
 * opened, to notice when they change on disk. A change is reported once: a time the user has been
 * told about is not reported again. Only reads the files' times.
 */
final class FileStamps {

    private final Map<Path, FileTime> stamps = new LinkedHashMap<>();
    private final Map<Path, FileTime> told = new LinkedHashMap<>();

    void clear() {
        stamps.clear();
        told.clear();
    }

    void remember(Path p) {
        stamps.put(p, time(p));
    }

    /** The files whose time differs from the one at opening and was not reported yet; marks them reported. */
    List<Path> changed() {
        List<Path> out = new ArrayList<>();
        for (Map.Entry<Path, FileTime> e : stamps.entrySet()) {
            FileTime now = time(e.getKey());
            if (!now.equals(e.getValue()) && !now.equals(told.get(e.getKey()))) {
                out.add(e.getKey());
                told.put(e.getKey(), now);
            }
        }
        return out;
    }

    private static FileTime time(Path p) {
        try {
            return Files.getLastModifiedTime(p);
        } catch (IOException | RuntimeException gone) {
            return FileTime.fromMillis(0);
        }
    }
}
