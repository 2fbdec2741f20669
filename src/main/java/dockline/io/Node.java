package dockline.io;

import java.util.List;

/**
 * A YAML value with the position where it starts. The loaders read these trees, not Jackson's
 * {@code JsonNode}, because every value must keep its line and column for error messages.
 */
sealed interface Node permits Node.MapNode, Node.SeqNode, Node.Scalar, Node.Bad {

    Pos pos();

    /** A short word for messages: "a mapping", "a list", "a number"... */
    String describe();

    /** One key of a mapping, with the key's own position. */
    record Entry(String key, Pos keyPos, Node value) {
    }

    /** A mapping; keys are distinct (duplicates are reported while reading). */
    record MapNode(List<Entry> entries, Pos pos) implements Node {
        public MapNode {
            entries = List.copyOf(entries);
        }

        Entry entry(String key) {
            for (Entry e : entries) {
                if (e.key().equals(key)) {
                    return e;
                }
            }
            return null;
        }

        Node get(String key) {
            Entry e = entry(key);
            return e == null ? null : e.value();
        }

        @Override
        public String describe() {
            return "a mapping (keys with values)";
        }
    }

    /** A list. */
    record SeqNode(List<Node> items, Pos pos) implements Node {
        public SeqNode {
            items = List.copyOf(items);
        }

        @Override
        public String describe() {
            return "a list";
        }
    }

    /** What the YAML parser made of a scalar; the text is kept exactly as written. */
    enum Kind { STRING, INTEGER, DECIMAL, BOOLEAN, NULL }

    /** A scalar, with its text exactly as written (numbers are never turned into doubles). */
    record Scalar(String text, Kind kind, Pos pos) implements Node {
        @Override
        public String describe() {
            return switch (kind) {
                case STRING -> "the text '" + Loading.shorten(text) + "'";
                case INTEGER, DECIMAL -> "the number " + Loading.shorten(text);
                case BOOLEAN -> "'" + text + "' (read as true/false)";
                case NULL -> "nothing";
            };
        }
    }

    /** A value that was already reported as wrong (an alias, an unsupported tag); readers skip it silently. */
    record Bad(Pos pos) implements Node {
        @Override
        public String describe() {
            return "an unsupported value";
        }
    }
}
