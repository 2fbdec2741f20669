package dockline.io;

import java.nio.file.Path;

/**
 * What the map reader and the mission reader share: one parsed YAML document, the problems found so
 * far and the typed value readers over them. Each reader goes on after a problem so that one run
 * reports all of them, and builds its record only when there was none.
 */
abstract class DocumentReading {

    final YamlReader.Document doc;
    final Problems problems;
    final Loading in;

    DocumentReading(YamlReader.Document doc, Problems problems) {
        this.doc = doc;
        this.problems = problems;
        this.in = new Loading(problems);
    }

    /** The document's top-level mapping, or {@code null} after a problem ({@code what}: "a map file"). */
    final Node.MapNode root(String what) {
        return in.map(doc.root(), what);
    }

    /**
     * Whether the file has the character {@code c} at {@code p}: YAML's block indicators ({@code |},
     * {@code >}) are gone from the parsed value, so the source line tells how a value was written.
     */
    final boolean writtenWith(Pos p, char c) {
        String line = doc.source().line(p.line());
        int idx = SourceText.charIndexOfColumn(line, p.column());
        return idx >= 0 && line.charAt(idx) == c;
    }

    static String stem(Path file) {
        Path f = file.getFileName();
        String s = f == null ? "map" : f.toString();
        int dot = s.lastIndexOf('.');
        return dot > 0 ? s.substring(0, dot) : s;
    }
}
