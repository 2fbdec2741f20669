package dockline.model;

import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A building floor: the plan as rows of legend characters, the legend, named zones, named doors,
 * the cell size and the disturbance model. Validated by the loader; the constructor only checks
 * the invariants every consumer relies on (rectangular plan, every character in the legend).
 *
 * @param name          a human name for the floor
 * @param source        the file it was read from (may be {@code null} for generated maps)
 * @param cellSizeMetres edge length of one cell in metres
 * @param rows          the plan, top row first; all rows have the same length
 * @param legend        character to terrain
 * @param zones         named zones (rooms, aisles, patches), in file order
 * @param doorNames     optional names of door cells, e.g. {@code D2}
 * @param disturbances  the disturbance model
 */
public record BuildingMap(String name, Path source, BigDecimal cellSizeMetres, List<String> rows,
                          Map<Character, Terrain> legend, List<Zone> zones, Map<Cell, String> doorNames,
                          DisturbanceModel disturbances) {

    public BuildingMap {
        rows = List.copyOf(rows);
        legend = Map.copyOf(legend);
        zones = List.copyOf(zones);
        doorNames = Map.copyOf(doorNames);
        if (rows.isEmpty() || rows.get(0).isEmpty()) {
            throw new IllegalArgumentException("plan must not be empty");
        }
        int w = rows.get(0).length();
        for (String r : rows) {
            if (r.length() != w) {
                throw new IllegalArgumentException("plan rows must all have the same length");
            }
            for (int i = 0; i < r.length(); i++) {
                if (!legend.containsKey(r.charAt(i))) {
                    throw new IllegalArgumentException("character '" + r.charAt(i) + "' is not in the legend");
                }
            }
        }
    }

    public int width() {
        return rows.get(0).length();
    }

    public int height() {
        return rows.size();
    }

    public int cellCount() {
        return width() * height();
    }

    public boolean inside(Cell c) {
        return c.x() >= 0 && c.y() >= 0 && c.x() < width() && c.y() < height();
    }

    public Terrain terrainAt(Cell c) {
        return legend.get(rows.get(c.y()).charAt(c.x()));
    }

    public boolean isFree(Cell c) {
        return inside(c) && terrainAt(c).free();
    }

    public Optional<Zone> zone(String zoneName) {
        return zones.stream().filter(z -> z.name().equals(zoneName)).findFirst();
    }

    /** Names of the zones that contain the cell, in file order. */
    public List<String> zonesAt(Cell c) {
        List<String> out = new ArrayList<>();
        for (Zone z : zones) {
            if (z.contains(c)) {
                out.add(z.name());
            }
        }
        return out;
    }

    /** The door's name, or {@code door x:y} when it has none. */
    public String doorName(Cell c) {
        String n = doorNames.get(c);
        return n != null ? n : "door " + c;
    }

    /** All dock cells, in row-major order. */
    public List<Cell> docks() {
        List<Cell> out = new ArrayList<>();
        for (int y = 0; y < height(); y++) {
            for (int x = 0; x < width(); x++) {
                Cell c = new Cell(x, y);
                if (terrainAt(c).dock()) {
                    out.add(c);
                }
            }
        }
        return out;
    }

    /** The same map with another disturbance budget. */
    /** The same map with another disturbance model. */
    public BuildingMap withDisturbances(DisturbanceModel d) {
        return new BuildingMap(name, source, cellSizeMetres, rows, legend, zones, doorNames, d);
    }

    public BuildingMap withBudget(int k) {
        return new BuildingMap(name, source, cellSizeMetres, rows, legend, zones, doorNames, disturbances.withBudget(k));
    }
}
