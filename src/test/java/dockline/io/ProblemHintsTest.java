package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Every message the loaders can produce has a hint (issue 15): the io sources are scanned for every
 * place a problem is recorded ({@code problems.add(pos, message, hint)}, {@code addExplaining},
 * {@code addSummary}, {@code new Problem(...)}, {@code new Refusal(message, hint)}), and each must
 * pass a hint that is not {@code null}. {@link Problems} has no form without a hint except
 * {@code addPolicy}, which supplies its own.
 */
class ProblemHintsTest {

    private static final Path IO = Path.of("src/main/java/dockline/io");
    private static final Pattern CALL = Pattern.compile(
            "(?:\\b(?:problems|mapProblems|own|p)\\.(add|addExplaining|addSummary)|new (Problem|Refusal))\\(");

    /** One place a problem is made: file, line, the call and its arguments. */
    record Site(String file, int line, String call, List<String> args) {
        @Override
        public String toString() {
            return file + ":" + line + ": " + call + "(" + String.join(", ", args) + ")";
        }
    }

    @Test
    void everyProblemTheLoadersCanProduce_hasAHint() throws IOException {
        List<Site> sites = new ArrayList<>();
        try (Stream<Path> files = Files.list(IO)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).sorted().toList()) {
                sites.addAll(sites(f.getFileName().toString(), Files.readString(f)));
            }
        }
        // the scan finds the loaders' problems: well over a hundred places
        assertThat(sites.size()).isGreaterThan(100);
        List<Site> without = new ArrayList<>();
        for (Site s : sites) {
            if (!hasHint(s)) {
                without.add(s);
            }
        }
        assertThat(without).as("problems recorded without a hint").isEmpty();
    }

    /** The scan itself: it sees a missing hint, a null hint and a hint that may be null. */
    @Test
    void theScan_findsAMissingOrNullHint() {
        String code = """
                problems.add(pos, "a message", null);
                problems.add(pos, "two arguments");
                problems.add(n.pos(), "ok " + f(a, b), "a hint (with parentheses)");
                p.add(new Problem(file, 1, 1, "m", null));
                problems.addExplaining(pos, "m", cond ? "h" : null);
                """;
        List<Site> s = sites("X.java", code);
        assertThat(s).hasSize(6);
        assertThat(s.stream().filter(x -> !hasHint(x)).map(Site::line).toList()).containsExactly(1, 2, 4, 5);
    }

    static boolean hasHint(Site s) {
        String hint;
        switch (s.call()) {
            case "Problem":
                if (s.args().size() == 1) {
                    return true; // a copy of a problem that has one (the record's canonical form is checked below)
                }
                if (s.args().size() != 5) {
                    return false;
                }
                hint = s.args().get(4);
                if (hint.equals("hint") || hint.endsWith(".hint()")) {
                    return true; // the canonical constructor passing a hint through
                }
                break;
            case "Refusal":
                if (s.args().size() != 2) {
                    return false;
                }
                hint = s.args().get(1);
                break;
            default:
                if (s.args().size() == 1) {
                    return true; // add(Problem): a problem made elsewhere, checked where it is made
                }
                if (s.args().size() != 3) {
                    return false;
                }
                hint = s.args().get(2);
        }
        if (hint.equals("null") || hint.matches("(?s).*[?:]\\s*null\\b.*")) {
            return false;
        }
        return !hint.isBlank();
    }

    /** Every recording call in the code, with its top-level arguments split. */
    static List<Site> sites(String file, String code) {
        List<Site> out = new ArrayList<>();
        Matcher m = CALL.matcher(code);
        while (m.find()) {
            String call = m.group(1) != null ? m.group(1) : m.group(2);
            int lineStart = code.lastIndexOf('\n', m.start()) + 1;
            String before = code.substring(lineStart, m.start()).strip();
            if (before.startsWith("*") || before.startsWith("//") || before.endsWith("void") || before.startsWith("record")) {
                continue; // a comment or a declaration
            }
            List<String> args = new ArrayList<>();
            StringBuilder cur = new StringBuilder();
            int depth = 1;
            int i = m.end();
            boolean inString = false;
            char quote = 0;
            for (; i < code.length() && depth > 0; i++) {
                char c = code.charAt(i);
                if (inString) {
                    cur.append(c);
                    if (c == '\\') {
                        cur.append(code.charAt(++i));
                    } else if (c == quote) {
                        inString = false;
                    }
                } else if (c == '"' || c == '\'') {
                    inString = true;
                    quote = c;
                    cur.append(c);
                } else if (c == '(' || c == '[' || c == '{') {
                    depth++;
                    cur.append(c);
                } else if (c == ')' || c == ']' || c == '}') {
                    depth--;
                    if (depth > 0) {
                        cur.append(c);
                    }
                } else if (c == ',' && depth == 1) {
                    args.add(cur.toString().strip());
                    cur.setLength(0);
                } else {
                    cur.append(c);
                }
            }
            args.add(cur.toString().strip());
            if (call.equals("Problem") && before.contains("record")) {
                continue;
            }
            int line = (int) code.substring(0, m.start()).chars().filter(ch -> ch == '\n').count() + 1;
            out.add(new Site(file, line, call, args));
        }
        return out;
    }
}
