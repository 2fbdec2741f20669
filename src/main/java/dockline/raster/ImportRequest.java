package dockline.raster;

import dockline.io.AtomicFiles;
import dockline.model.Cell;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * An import as a person types it (command-line options or the view's dialog): every field as text.
 * {@link #settings} checks all of them at once, before the image is read, and gives the
 * {@link ImportSettings}; {@link #outputProblem} checks the output path. Problems are sentences
 * that start with the option's name ({@code --cell-size 0.3: ...}), so both front ends word them alike.
 *
 * @param image       the image file
 * @param pixelSize   metres per pixel, e.g. {@code 0.05}
 * @param cellSize    metres per cell
 * @param robotRadius metres, or {@code null}
 * @param docks       {@code x,y;x,y}, or {@code null}
 * @param occupiedAtMost the occupied bound ({@link Thresholds})
 * @param freeAtLeast the free bound
 * @param invert      light means occupied
 * @param surface     the free cells' surface name
 * @param name        the map's name, or {@code null} for the image's file name
 */
public record ImportRequest(Path image, String pixelSize, String cellSize, String robotRadius, String docks,
                            String occupiedAtMost, String freeAtLeast, boolean invert, String surface, String name) {

    private static final Pattern METRES = Pattern.compile("([0-9]{1,12}(\\.[0-9]{1,9})?|\\.[0-9]{1,9})\\s*m?");
    private static final Pattern DOCK = Pattern.compile("\\s*(-?[0-9]{1,9})\\s*[,:]\\s*(-?[0-9]{1,9})\\s*");
    private static final BigDecimal MAX_CELL = BigDecimal.valueOf(1000);

    /** The settings, or {@code null} with every problem added to {@code bad}. */
    public ImportSettings settings(List<String> bad) {
        int before = bad.size();
        BigDecimal pixel = metres("--pixel-size", pixelSize, false, bad);
        BigDecimal cell = metres("--cell-size", cellSize, false, bad);
        BigDecimal radius = robotRadius == null || robotRadius.isBlank() ? null
                : metres("--robot-radius", robotRadius, true, bad);
        if (cell != null && cell.compareTo(MAX_CELL) > 0) {
            bad.add("--cell-size " + cellSize + ": a map cell is at most 1000 m (maps/README.md)");
            cell = null;
        }
        if (pixel != null && cell != null) {
            try {
                Downsampler.factor(pixel, cell);
            } catch (IllegalArgumentException e) {
                bad.add("--cell-size " + cellSize + ": " + e.getMessage());
            }
        }
        List<Cell> dockCells = parseDocks(bad);
        Thresholds thresholds = new Thresholds(occupiedAtMost, freeAtLeast, invert);
        String tp = thresholds.syntaxProblem();
        if (tp != null) {
            bad.add(tp);
        }
        if (surface == null || !surface.matches("[A-Za-z][A-Za-z0-9_-]{0,39}")) {
            bad.add("--surface '" + surface + "': a surface name is a letter followed by letters, digits, '-' or '_'"
                    + " (at most 40)");
        }
        String mapName = name != null && !name.isEmpty() ? name : defaultName(image);
        if (mapName.isBlank() || mapName.length() > 200 || mapName.codePoints().anyMatch(Character::isISOControl)) {
            bad.add("--name: give a name of 1 to 200 characters without control characters");
        }
        return bad.size() > before ? null
                : new ImportSettings(pixel, cell, radius, thresholds, dockCells, surface, mapName);
    }

    /** What is wrong with writing the map to {@code out}, or {@code null}: never the image, always a {@code .yaml} name. */
    public String outputProblem(Path out) {
        String why = AtomicFiles.problemWith(out);
        if (why == null && sameFile(out, image)) {
            why = "that is the input image; choose another name (outputs never overwrite inputs)";
        }
        if (why == null && !out.toString().endsWith(".yaml") && !out.toString().endsWith(".yml")) {
            why = "a map file's name ends in .yaml (like the maps in maps/), so that it is not taken for an image";
        }
        return why;
    }

    /** Reads the image, imports it and writes the map atomically (nothing is written on a problem). */
    public static Done run(Path image, ImportSettings settings, Path out) throws RasterException, IOException {
        SourceImage src = SourceImage.read(image);
        ImportResult result = Importer.run(src, settings);
        AtomicFiles.writeString(out, result.mapText());
        return new Done(src, result);
    }

    /** A finished import: the image as read and what was made of it. */
    public record Done(SourceImage source, ImportResult result) {
    }

    private static BigDecimal metres(String option, String text, boolean zeroOk, List<String> bad) {
        Matcher m = METRES.matcher(text == null ? "" : text.strip());
        if (!m.matches()) {
            bad.add(option + " '" + text + "': give metres as a decimal, e.g. 0.05 (at most 12 digits before and 9 after"
                    + " the point)");
            return null;
        }
        BigDecimal v = new BigDecimal(m.group(1));
        if (v.signum() == 0 && !zeroOk) {
            bad.add(option + " " + text + ": must be more than 0");
            return null;
        }
        return v;
    }

    private List<Cell> parseDocks(List<String> bad) {
        List<Cell> cells = new ArrayList<>();
        if (docks == null) {
            return cells;
        }
        for (String part : docks.split(";", -1)) {
            if (part.isBlank()) {
                continue;
            }
            Matcher m = DOCK.matcher(part);
            if (!m.matches()) {
                bad.add("--docks '" + part.strip() + "': a dock is x,y in cells (e.g. 2,3); several are separated by ';'");
                continue;
            }
            int x = Integer.parseInt(m.group(1));
            int y = Integer.parseInt(m.group(2));
            if (x < 0 || y < 0) {
                bad.add("--docks " + part.strip() + ": cells are counted from 0 at the top-left; negative is outside the map");
                continue;
            }
            Cell c = new Cell(x, y);
            if (cells.contains(c)) {
                bad.add("--docks " + part.strip() + ": this dock is given twice");
                continue;
            }
            cells.add(c);
        }
        if (cells.isEmpty() && bad.stream().noneMatch(b -> b.startsWith("--docks"))) {
            bad.add("--docks '" + docks + "': no dock given; write x,y;x,y or leave the option out");
        }
        return cells;
    }

    private static String defaultName(Path image) {
        Path f = image.getFileName();
        String n = f == null ? "imported map" : f.toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            if (Files.exists(a) && Files.exists(b)) {
                return Files.isSameFile(a, b);
            }
        } catch (IOException e) {
            // fall back to comparing the names
        }
        return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize());
    }
}
