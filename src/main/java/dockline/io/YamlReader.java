package dockline.io;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringReader;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;

/**
 * Reads one YAML document into a {@link Node} tree that keeps every value's position, with the
 * Jackson streaming parser (never a data-binding step, so numbers stay text and are never
 * doubles).
 *
 * <p>Defences against hostile or broken files, each reported as a problem, never a crash or a hang:
 * files above {@link #MAX_BYTES}; bytes that are not UTF-8; tabs; nesting deeper than
 * {@link #MAX_DEPTH}; more than {@link #MAX_NODES} values; aliases (so an alias "bomb" cannot
 * expand); more than one document; lines longer than {@link #MAX_LINE}; anything but a regular file
 * (a named pipe, a device, a folder, a symbolic link loop), refused before it is opened. Time and
 * memory are linear in the file size.
 */
final class YamlReader {

    /** Largest file read: a 2048 x 2048 plan with its indentation fits. */
    static final int MAX_BYTES = 8 * 1024 * 1024;
    /** Deepest nesting of mappings and lists; our formats need 4. */
    static final int MAX_DEPTH = 32;
    /** Longest line, in characters: keeps the YAML scanner linear in the file size (see {@link #parse}). */
    static final int MAX_LINE = 65_536;
    /** Most values (scalars, lists, mappings) in one file. */
    static final int MAX_NODES = 500_000;

    /** A parsed file: its decoded text and its root value ({@code null} when it could not be parsed). */
    record Document(Path file, SourceText source, Node root) {
    }

    private final Problems problems;
    private final SourceText source;
    private YAMLParser parser;
    private int nodes;

    private YamlReader(Problems problems, SourceText source) {
        this.problems = problems;
        this.source = source;
    }

    /** Reads the file; problems go to {@code problems}; returns {@code null} when nothing could be read. */
    static Document read(Path file, Problems problems) {
        Refusal r = refusal(file);
        if (r != null) {
            problems.add(Pos.START, r.message(), r.hint());
            return null;
        }
        byte[] bytes;
        try (InputStream in = Files.newInputStream(file)) {
            bytes = in.readNBytes(MAX_BYTES + 1);
        } catch (NoSuchFileException e) {
            problems.add(Pos.START, "cannot read the file: it does not exist", "check the spelling and the folder");
            return null;
        } catch (AccessDeniedException e) {
            problems.add(Pos.START, "cannot read the file: permission denied", "check the file's permissions");
            return null;
        } catch (IOException | SecurityException e) {
            problems.add(Pos.START, "cannot read the file: " + ioReason(e),
                    "check that it is a map or mission file saved on disk");
            return null;
        }
        return parse(file, bytes, problems);
    }

    /** Why a path cannot be read as an input file, with a hint. */
    record Refusal(String message, String hint) {
    }

    /**
     * Why {@code file} is not a regular file that can be read, or {@code null} when it is. Asked
     * before the file is opened (opening a named pipe would wait for a writer, and a device may
     * never end), following symbolic links: a link to a map is fine, a loop or a dangling link is not.
     */
    static Refusal refusal(Path file) {
        BasicFileAttributes a;
        try {
            a = Files.readAttributes(file, BasicFileAttributes.class);
        } catch (NoSuchFileException e) {
            if (Files.isSymbolicLink(file)) {
                return new Refusal("cannot read the file: it is a symbolic link to a file that does not exist",
                        "point the link at the map or mission file, or name the file itself");
            }
            return new Refusal("cannot read the file: it does not exist", "check the spelling and the folder");
        } catch (AccessDeniedException e) {
            return new Refusal("cannot read the file: permission denied", "check the file's permissions");
        } catch (FileSystemException e) {
            if (e.getReason() != null && e.getReason().toLowerCase(java.util.Locale.ROOT).contains("symbolic link")) {
                return new Refusal("cannot read the file: its symbolic links form a loop",
                        "name the map or mission file itself, not a link that points back at itself");
            }
            return new Refusal("cannot read the file: " + ioReason(e), "check the path");
        } catch (IOException | SecurityException | UnsupportedOperationException e) {
            return new Refusal("cannot read the file: " + ioReason(e), "check the path");
        }
        if (a.isRegularFile()) {
            return null;
        }
        if (a.isDirectory()) {
            return new Refusal("this is a directory, not a file", "name a .yaml file in that folder");
        }
        return new Refusal("this is " + specialKind(file) + ", not a regular file; only files saved on disk are read",
                "give the path of a map or mission file (.yaml)");
    }

    /** "a named pipe (FIFO)", "a device", "a socket" or "a special file", from the POSIX mode when there is one. */
    private static String specialKind(Path file) {
        try {
            Object mode = Files.getAttribute(file, "unix:mode");
            if (mode instanceof Integer m) {
                switch (m & 0170000) {
                    case 0010000:
                        return "a named pipe (FIFO)";
                    case 0020000:
                    case 0060000:
                        return "a device";
                    case 0140000:
                        return "a socket";
                    default:
                        break;
                }
            }
        } catch (IOException | RuntimeException e) {
            // no POSIX attributes here: the general word below
        }
        return "a special file (a pipe, device or socket)";
    }

    private static String ioReason(Exception e) {
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }

    /**
     * Parses content given as bytes and reads it with {@code reader}, collecting every problem of both
     * steps; a defect in the reader is an internal error ({@link Problems#guard}), never a problem of the file.
     *
     * @throws InputException with every problem found, if there is any
     */
    static <T> T readContent(Path file, byte[] content, java.util.function.BiFunction<Document, Problems, T> reader)
            throws InputException {
        Problems problems = new Problems(file);
        Document doc = parse(file, content, problems);
        T value = doc.root() == null ? null : problems.guard(() -> reader.apply(doc, problems));
        problems.throwIfAny();
        return value;
    }

    /** Parses file content given as bytes (the file name is used for messages only). */
    static Document parse(Path file, byte[] bytes, Problems problems) {
        if (bytes.length > MAX_BYTES) {
            problems.add(Pos.START, "the file is too large (more than " + (MAX_BYTES / (1024 * 1024)) + " MiB)",
                    "a map or mission file is a few kilobytes; is this the right file?");
            return new Document(file, SourceText.decode(new byte[0], new Problems(file)), null);
        }
        SourceText source = SourceText.decode(bytes, problems);
        if (source.longestLine() > MAX_LINE) {
            // the YAML scanner copies its look-ahead window for every 1024 characters of a token, so its
            // time grows with the square of the longest line: refuse such a line before parsing
            problems.add(new Pos(source.longestLineNumber(), 1), "line " + source.longestLineNumber() + " is "
                            + source.longestLine() + " characters long (at most " + MAX_LINE + " are read)",
                    "a map or mission line is short (a plan row has at most 2048 cells); is this the right file?");
            return new Document(file, source, null);
        }
        Node root = new YamlReader(problems, source).parseRoot();
        return new Document(file, source, root);
    }

    private Node parseRoot() {
        LoaderOptions options = new LoaderOptions();
        options.setCodePointLimit(MAX_BYTES + 1);
        options.setNestingDepthLimit(MAX_DEPTH + 2);
        options.setMaxAliasesForCollections(10);
        options.setAllowRecursiveKeys(false);
        YAMLFactory factory = YAMLFactory.builder()
                .loaderOptions(options)
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxNestingDepth(MAX_DEPTH + 2)
                        .maxNumberLength(1000)
                        .maxStringLength(MAX_BYTES + 1)
                        .build())
                .build();
        Pos last = Pos.START;
        try (YAMLParser p = factory.createParser(new StringReader(source.text()))) {
            parser = p;
            JsonToken t = p.nextToken();
            if (t == null) {
                problems.add(Pos.START, "the file is empty", "see maps/README.md or missions/README.md for what goes in it");
                return null;
            }
            Node root = value(t, 0);
            last = root.pos();
            JsonToken more = p.nextToken();
            if (more != null) {
                problems.add(here(), "a second YAML document in the same file",
                        "put one map or one mission per file; remove the '---' line");
                return null;
            }
            return root;
        } catch (TooMuch e) {
            problems.add(e.pos, e.getMessage(), e.hint);
            return null;
        } catch (JacksonException e) {
            syntax(e, last);
            return null;
        } catch (IOException | RuntimeException e) {
            // whatever the YAML library throws, the user gets a position and a message, not a trace
            problems.add(safeHere(last), "cannot read the YAML: " + firstLine(String.valueOf(e.getMessage())),
                    "check the indentation and quoting here (maps/README.md and missions/README.md show the layout)");
            return null;
        }
    }

    private Node value(JsonToken t, int depth) throws IOException {
        Pos pos = here();
        if (++nodes > MAX_NODES) {
            throw new TooMuch(pos, "too many values in one file (more than " + MAX_NODES + ")",
                    "a map or mission has a few hundred values; is this the right file?");
        }
        if (parser.isCurrentAlias()) {
            problems.add(pos, "aliases ('*" + shortText() + "') are not supported",
                    "write the value out in full; dockline files do not use aliases");
            return new Node.Bad(pos);
        }
        switch (t) {
            case START_OBJECT: {
                checkDepth(depth, pos);
                List<Node.Entry> entries = new ArrayList<>();
                java.util.Map<String, Node.Entry> seen = new java.util.HashMap<>();
                while (true) {
                    JsonToken k = parser.nextToken();
                    if (k == JsonToken.END_OBJECT || k == null) {
                        break;
                    }
                    String key = parser.currentName();
                    Pos keyPos = here();
                    if (key != null && !plainText(key, keyPos)) {
                        key = Loading.shorten(key); // reported; the escaped form keeps the rest of the checks going
                    }
                    Node v = value(parser.nextToken(), depth + 1);
                    Node.Entry first = seen.get(key == null ? "" : key);
                    if (first != null) {
                        problems.add(keyPos, "key '" + Loading.shorten(key) + "' appears twice (first at line "
                                + first.keyPos().line() + ")", "keep only one");
                    } else {
                        Node.Entry e = new Node.Entry(key == null ? "" : key, keyPos, v);
                        entries.add(e);
                        seen.put(e.key(), e);
                    }
                }
                return new Node.MapNode(entries, pos);
            }
            case START_ARRAY: {
                checkDepth(depth, pos);
                List<Node> items = new ArrayList<>();
                while (true) {
                    JsonToken k = parser.nextToken();
                    if (k == JsonToken.END_ARRAY || k == null) {
                        break;
                    }
                    items.add(value(k, depth + 1));
                }
                return new Node.SeqNode(items, pos);
            }
            case VALUE_STRING:
                if (!plainText(parser.getText(), pos)) {
                    return new Node.Bad(pos);
                }
                return new Node.Scalar(parser.getText(), Node.Kind.STRING, pos);
            case VALUE_NUMBER_INT:
                return new Node.Scalar(parser.getText(), Node.Kind.INTEGER, pos);
            case VALUE_NUMBER_FLOAT:
                return new Node.Scalar(parser.getText(), Node.Kind.DECIMAL, pos);
            case VALUE_TRUE:
            case VALUE_FALSE:
                return new Node.Scalar(parser.getText(), Node.Kind.BOOLEAN, pos);
            case VALUE_NULL:
                return new Node.Scalar(parser.getText(), Node.Kind.NULL, pos);
            default:
                problems.add(pos, "unsupported YAML value (a tag such as '!!binary'?)", "write plain text or numbers");
                return new Node.Bad(pos);
        }
    }

    /** Longest text value or key: names and surfaces are short, and every output repeats them. */
    static final int MAX_TEXT = 1000;

    /**
     * Whether a text value or key may be used as written: at most {@link #MAX_TEXT} characters (on one
     * line) and
     * without bidirectional controls (U+202A..U+202E, U+2066..U+2069, U+200E, U+200F, U+061C), which
     * would reorder every report line that names it. A problem if not.
     */
    private boolean plainText(String t, Pos pos) {
        if (t.length() > MAX_TEXT && t.indexOf('\n') < 0) { // a plan is a long text of many lines
            problems.add(pos, "a text of " + t.length() + " characters (at most " + MAX_TEXT + "): '"
                    + Loading.shorten(t) + "'", "names and values in dockline files are short; shorten it");
            return false;
        }
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c >= 0x202A && c <= 0x202E || c >= 0x2066 && c <= 0x2069 || c == 0x200E || c == 0x200F || c == 0x061C) {
                problems.add(pos, String.format("the text '%s' contains the bidirectional control U+%04X",
                        Loading.shorten(t), (int) c), "remove it: it would reorder the lines that show this text");
                return false;
            }
        }
        return true;
    }

    private void checkDepth(int depth, Pos pos) {
        if (depth >= MAX_DEPTH) {
            throw new TooMuch(pos, "values nested too deeply (more than " + MAX_DEPTH + " levels)",
                    "dockline files nest a few levels at most");
        }
    }

    private String shortText() throws IOException {
        return Loading.shorten(String.valueOf(parser.getText()));
    }

    private Pos here() {
        return pos(parser.currentTokenLocation());
    }

    private Pos safeHere(Pos fallback) {
        try {
            return here();
        } catch (RuntimeException e) {
            return fallback;
        }
    }

    private static Pos pos(JsonLocation l) {
        if (l == null) {
            return Pos.START;
        }
        return new Pos(l.getLineNr(), l.getColumnNr());
    }

    /** Turns a parser error into a problem at the place the scanner noticed it. */
    private void syntax(JacksonException e, Pos fallback) {
        Pos at;
        String message;
        String context = null;
        Throwable cause = e.getCause();
        if (cause instanceof MarkedYAMLException m && m.getProblemMark() != null) {
            Mark pm = m.getProblemMark();
            at = new Pos(pm.getLine() + 1, pm.getColumn() + 1);
            message = firstLine(String.valueOf(m.getProblem()));
            if (m.getContext() != null && m.getContextMark() != null) {
                Mark cm = m.getContextMark();
                context = m.getContext() + " that starts at " + (cm.getLine() + 1) + ":" + (cm.getColumn() + 1);
            }
        } else {
            at = e.getLocation() != null ? pos(e.getLocation()) : fallback;
            message = firstLine(String.valueOf(e.getOriginalMessage()));
        }
        if (message.startsWith("Expected a field name")) {
            // Jackson's wording for a key that is itself a list or mapping ("? [a, b]: ...")
            message = "a key must be plain text, not a list or a mapping";
        }
        if (message.contains("org.yaml.snakeyaml")) {
            message = message.replaceAll("<?org\\.yaml\\.snakeyaml\\.[\\w.]+\\$?\\w*(\\([^)]*\\))?>?", "a YAML value");
        }
        if (source.lineHasTab(at.line()) || problems.isExplained(at)) {
            return; // the tab or the bad byte on this line is already reported and is the cause
        }
        String hint = "check the indentation and quoting here (maps/README.md and missions/README.md show the layout)";
        if (message.contains("mapping values are not allowed")) {
            hint = "check the indentation; a text value that contains ': ' must be put in quotes";
        } else if (message.contains("could not find expected ':'")) {
            hint = "check the indentation and that every key ends with ':'";
        } else if (message.contains("expected ',' or ']'") || message.contains("expected ',' or '}'")) {
            hint = "a bracket is not closed";
        } else if (message.contains("found character '@'") || message.contains("found character '`'")
                || message.contains("found undefined alias")) {
            hint = "put the value in quotes";
        }
        problems.add(at, "YAML syntax: " + message + (context != null ? " (" + context + ")" : ""), hint);
    }

    private static String firstLine(String s) {
        int nl = s.indexOf('\n');
        return (nl >= 0 ? s.substring(0, nl) : s).trim();
    }

    /** Thrown to stop reading at a limit; carries its own problem. */
    private static final class TooMuch extends RuntimeException {
        final Pos pos;
        final String hint;

        TooMuch(Pos pos, String message, String hint) {
            super(message, null, false, false);
            this.pos = pos;
            this.hint = hint;
        }
    }
}
