package dockline.raster;

import dockline.model.Cell;
import java.util.HashSet;
import java.util.Set;

/**
 * Writes an imported map in the map format of maps/README.md: a comment block recording the
 * source image (name, format, size, SHA-256) and every option used, then {@code name},
 * {@code cell-size}, the {@code legend} of the characters used and the {@code plan}. Walls from
 * the image are {@code #}, cells lost to the robot's footprint are {@code +} (also a wall), free
 * cells {@code .} and docks {@code C}. No zones, doors or disturbances are written.
 */
public final class MapText {

    private MapText() {
    }

    static String write(SourceImage src, ImportSettings s, Thresholds.Levels levels, int k, int w, int h,
                        boolean[] inImage, boolean[] free, int lost) {
        GreyImage img = src.image();
        Set<Integer> docks = new HashSet<>();
        for (Cell d : s.docks()) {
            docks.add(d.y() * w + d.x());
        }
        StringBuilder plan = new StringBuilder();
        boolean anyWall = false;
        boolean anyLost = false;
        for (int y = 0; y < h; y++) {
            plan.append("  ");
            for (int x = 0; x < w; x++) {
                int i = y * w + x;
                char c;
                if (free[i]) {
                    c = docks.contains(i) ? 'C' : '.';
                } else if (inImage[i]) {
                    c = '+';
                    anyLost = true;
                } else {
                    c = '#';
                    anyWall = true;
                }
                plan.append(c);
            }
            plan.append('\n');
        }
        String nl = "\n";
        StringBuilder sb = new StringBuilder();
        sb.append("# Imported from an occupancy image with `dockline import` (see maps/README.md, \"Imported maps\").").append(nl);
        sb.append("# source image: ").append(safe(String.valueOf(src.file().getFileName()))).append(" (").append(img.format())
                .append(", ").append(img.width()).append(" x ").append(img.height()).append(" pixels, maxval ")
                .append(img.maxval()).append(", ").append(src.bytes()).append(" bytes)").append(nl);
        sb.append("# source SHA-256: ").append(src.sha256()).append(nl);
        sb.append("# options: ").append(safe(s.asOptions())).append(nl);
        sb.append("# grey levels: occupied at or below ").append(levels.occupiedAtMost()).append(", free at or above ")
                .append(levels.freeAtLeast()).append(levels.invert() ? " (after inverting)" : "")
                .append(", unknown between (counted as occupied)").append(nl);
        sb.append("# one cell = ").append(k).append(" x ").append(k).append(" pixels; a cell is free only if all its pixels are free")
                .append(nl);
        if (s.radius() != null) {
            sb.append("# footprint: ").append(lost).append(" cells whose centre is closer than ").append(Downsampler.plain(s.radius()))
                    .append(" m to a wall or the map's edge are walls ('+')").append(nl);
        }
        sb.append("# No zones, doors or disturbances were added: add them by hand (maps/README.md).").append(nl);
        sb.append("name: \"").append(s.name().replace("\\", "\\\\").replace("\"", "\\\"")).append('"').append(nl);
        sb.append("cell-size: ").append(Downsampler.plain(s.cellSize())).append(nl);
        sb.append("legend:").append(nl);
        if (anyWall) {
            sb.append("  \"#\": wall").append(nl);
        }
        if (anyLost) {
            sb.append("  \"+\": wall            # free in the image, but the robot does not fit").append(nl);
        }
        sb.append("  \".\": ").append(s.surface()).append(nl);
        if (!docks.isEmpty()) {
            sb.append("  \"C\": {surface: ").append(s.surface()).append(", dock: true}").append(nl);
        }
        sb.append("plan: |").append(nl).append(plan);
        return sb.toString();
    }

    /** Text for a comment line: control characters shown as {@code ?}. */
    private static String safe(String t) {
        StringBuilder sb = new StringBuilder();
        t.codePoints().forEach(cp -> sb.appendCodePoint(Character.isISOControl(cp) ? '?' : cp));
        return sb.toString();
    }
}
