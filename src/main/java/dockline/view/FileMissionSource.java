package dockline.view;

import dockline.io.InputException;
import dockline.io.InputKind;
import dockline.io.MapLoader;
import dockline.io.MissionLoader;
import dockline.io.Problem;
import dockline.model.BuildingMap;
import dockline.model.Mission;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Opens mission and map files through the project's loaders ({@link MissionLoader},
 * {@link MapLoader}), telling them apart by their keys ({@link InputKind}): one-trip missions,
 * patrols and missions with a deadline alike. Only reads.
 */
public final class FileMissionSource implements MissionSource {

    @Override
    public Opened open(Path file) throws OpenException {
        try {
            if (InputKind.of(file) == InputKind.MAP) {
                BuildingMap map = MapLoader.load(file);
                return new Opened(file, null, map);
            }
            Mission m = MissionLoader.load(file);
            return new Opened(file, m, m.map());
        } catch (InputException e) {
            List<String> lines = new ArrayList<>();
            for (Problem p : e.problems()) {
                lines.add(p.format());
            }
            throw new OpenException(lines);
        } catch (RuntimeException e) {
            throw new OpenException(List.of(file + ": cannot read this file (" + e.getMessage() + ")"));
        }
    }
}
