package dockline.model;

import java.util.Objects;

/**
 * What one legend character stands for: a wall, or a free cell with a surface, possibly a dock
 * and/or a door.
 *
 * @param symbol  the legend character
 * @param surface surface name (e.g. {@code tile}, {@code carpet}, {@code ramp}); {@code null} for a wall
 * @param dock    a charging dock stands on this cell
 * @param door    a door stands on this cell (it may be shut if the disturbance model says so)
 */
public record Terrain(char symbol, String surface, boolean dock, boolean door) {

    public Terrain {
        if (surface == null && (dock || door)) {
            throw new IllegalArgumentException("a wall cannot be a dock or a door");
        }
    }

    public static Terrain wall(char symbol) {
        return new Terrain(symbol, null, false, false);
    }

    public boolean wall() {
        return surface == null;
    }

    public boolean free() {
        return surface != null;
    }

    public String describe() {
        if (wall()) {
            return "wall";
        }
        StringBuilder sb = new StringBuilder(Objects.requireNonNull(surface));
        if (dock) {
            sb.append(", dock");
        }
        if (door) {
            sb.append(", door");
        }
        return sb.toString();
    }
}
