package dockline.io;

import java.nio.file.Path;

/**
 * What the map reader and the mission reader share: one parsed YAML document, the problems found so
 * far and the typed value readers over them. Each reader goes on after a problem so that one run
 * reports all of them, and builds its record only when there was none.
 */
abstract class DocumentReading<T> {

    final YamlReader.Document doc;
    final Problems problems;
    final Loading in;
    /** What the document is, for messages: "a map file". */
    private final String what;
    /** Problems raised before this document was read. */
    private int before;

    DocumentReading(YamlReader.Document doc, Problems problems, String what) {
        this.doc = doc;
        this.problems = problems;
        this.in = new Loading(problems);
        this.what = what;
    }

    /** The record, or {@code null} after a problem. */
    final T read() {
        before = problems.raised();
        Node.MapNode root = in.map(doc.root(), what);
        return root == null ? null : read(root);
    }

    /** The record from the document's top-level mapping, or {@code null} after a problem. */
    abstract T read(Node.MapNode root);

    /** Whether reading this document has raised no problem so far. */
    final boolean clean() {
        return problems.raised() == before;
    }

    /** The top-level keys checked against {@code keys}, and the document's name: its {@code name}, else the file's stem. */
    final String name(Node.MapNode root, String... keys) {
        in.onlyKeys(root, what, keys);
        return root.get("name") == null ? stem(doc.file()) : in.string(root.get("name"), "name");
    }

    /**
     * Whether the file has the character {@code c} at {@code p}: YAML's block indicators ({@code |},
     * {@code >}) are gone from the parsed value, so the source line tells how a value was written.
     */
    static boolean writtenWith(YamlReader.Document doc, Pos p, char c) {
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
