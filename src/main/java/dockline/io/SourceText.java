package dockline.io;

import dockline.util.MonotoneSearch;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * The text of an input file, decoded strictly as UTF-8, with a line table that counts lines the
 * way the YAML scanner does (CR LF, CR, LF, NEL, LS and PS each end a line) so that positions from
 * the parser and positions computed here agree. Columns are counted in code points.
 *
 * <p>Bytes that are not UTF-8 and tab characters are reported, then replaced (by U+FFFD and a
 * space) so that the rest of the file can still be checked; later problems at those very positions
 * are suppressed. O(n) in the file size.
 */
final class SourceText {

    /** Most encoding (or tab) problems reported one by one; the rest are counted in one line. */
    private static final int SHOWN = 10;

    private final String text;
    private final int[] lineStart;
    private final int[] lineEnd;
    private final boolean[] lineHasTab;
    /** The last position {@link #posOf} computed, so that increasing queries on one line cost O(distance). */
    private int memoIndex = -1;
    private int memoLine;
    private int memoColumn;

    private SourceText(String text) {
        this.text = text;
        List<int[]> lines = new ArrayList<>();
        int start = 0;
        int n = text.length();
        int i = 0;
        while (i < n) {
            char c = text.charAt(i);
            if (c == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') {
                lines.add(new int[] {start, i});
                i += 2;
                start = i;
            } else if (c == '\n' || c == '\r' || c == '\u0085' || c == '\u2028' || c == '\u2029') {
                lines.add(new int[] {start, i});
                i++;
                start = i;
            } else {
                i++;
            }
        }
        lines.add(new int[] {start, n});
        lineStart = new int[lines.size()];
        lineEnd = new int[lines.size()];
        lineHasTab = new boolean[lines.size()];
        for (int k = 0; k < lines.size(); k++) {
            lineStart[k] = lines.get(k)[0];
            lineEnd[k] = lines.get(k)[1];
        }
    }

    /**
     * Decodes the bytes (a leading byte order mark is dropped), reporting every byte sequence that
     * is not UTF-8 and every tab.
     */
    static SourceText decode(byte[] bytes, Problems problems) {
        int skip = bytes.length >= 3 && (bytes[0] & 0xff) == 0xEF && (bytes[1] & 0xff) == 0xBB
                && (bytes[2] & 0xff) == 0xBF ? 3 : 0;
        CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, skip, bytes.length - skip);
        // UTF-8 never gives more UTF-16 chars than bytes, and each bad sequence is at least one byte.
        CharBuffer out = CharBuffer.allocate(bytes.length + 2);
        List<int[]> bad = new ArrayList<>(); // {char index, byte offset, byte value}
        while (true) {
            CoderResult r = dec.decode(in, out, true);
            if (r.isError()) {
                bad.add(new int[] {out.position(), in.position(), bytes[in.position()] & 0xff});
                out.put('\uFFFD');
                in.position(in.position() + r.length());
                continue;
            }
            if (r.isUnderflow()) {
                dec.flush(out);
                break;
            }
            throw new IllegalStateException("decoder buffer overflow");
        }
        out.flip();
        char[] chars = new char[out.remaining()];
        out.get(chars);
        List<Integer> tabs = new ArrayList<>();
        List<Integer> controls = new ArrayList<>();
        List<Integer> controlChars = new ArrayList<>();
        for (int i = 0; i < chars.length; i++) {
            char c = chars[i];
            if (c == '\t') {
                tabs.add(i);
                chars[i] = ' ';
            } else if (!printable(chars, i)) {
                controls.add(i);
                controlChars.add((int) c);
                chars[i] = ' ';
            } else if (Character.isHighSurrogate(c)) {
                i++; // a valid pair: skip its low half
            }
        }
        SourceText src = new SourceText(new String(chars));
        for (int k = 0; k < controls.size(); k++) {
            Pos p = src.posOf(controls.get(k));
            if (k < SHOWN) {
                problems.addExplaining(p, String.format("control character U+%04X is not allowed", controlChars.get(k)),
                        "remove it; dockline files are plain text");
            } else {
                problems.explain(p);
            }
        }
        if (controls.size() > SHOWN) {
            problems.addSummary(src.posOf(controls.get(SHOWN)), (controls.size() - SHOWN) + " more control characters",
                    "remove them; dockline files are plain text");
        }
        for (int k = 0; k < bad.size(); k++) {
            int[] b = bad.get(k);
            Pos p = src.posOf(b[0]);
            if (k < SHOWN) {
                problems.addExplaining(p, String.format("byte 0x%02X (at byte offset %d) is not valid UTF-8", b[2], b[1]),
                        "save the file as UTF-8 text");
            } else {
                problems.explain(p);
            }
        }
        if (bad.size() > SHOWN) {
            problems.addSummary(src.posOf(bad.get(SHOWN)[0]), (bad.size() - SHOWN) + " more bytes that are not valid UTF-8",
                    "save the file as UTF-8 text");
        }
        for (int k = 0; k < tabs.size(); k++) {
            Pos p = src.posOf(tabs.get(k));
            src.lineHasTab[p.line() - 1] = true;
            if (k < SHOWN) {
                problems.addExplaining(p, "tab character", "use spaces: tabs are not allowed in dockline files");
            } else {
                problems.explain(p);
            }
        }
        if (tabs.size() > SHOWN) {
            problems.addSummary(src.posOf(tabs.get(SHOWN)), (tabs.size() - SHOWN) + " more tab characters",
                    "use spaces: tabs are not allowed in dockline files");
        }
        return src;
    }

    /**
     * The characters YAML allows in a file (YAML 1.1, section 5.1 "Character Set"): tab, line
     * breaks, printable ASCII, NEL, and the rest of Unicode except C1 controls, surrogates
     * without a partner, U+FFFE and U+FFFF.
     */
    private static boolean printable(char[] chars, int i) {
        char c = chars[i];
        if (c == '\t' || c == '\n' || c == '\r' || (c >= 0x20 && c <= 0x7E) || c == 0x85) {
            return true;
        }
        if (Character.isHighSurrogate(c)) {
            return i + 1 < chars.length && Character.isLowSurrogate(chars[i + 1]);
        }
        if (Character.isLowSurrogate(c)) {
            return false; // a partnered low half is skipped by the caller
        }
        return (c >= 0xA0 && c <= 0xD7FF) || (c >= 0xE000 && c <= 0xFFFD);
    }

    /** For tests and for text that is already a string: no decoding, tabs still reported. */
    static SourceText of(String s, Problems problems) {
        return decode(s.getBytes(StandardCharsets.UTF_8), problems);
    }

    String text() {
        return text;
    }

    int lineCount() {
        return lineStart.length;
    }

    /** The text of a 1-based line, without its line break; empty past the end. */
    String line(int line) {
        if (line < 1 || line > lineStart.length) {
            return "";
        }
        return text.substring(lineStart[line - 1], lineEnd[line - 1]);
    }

    boolean lineHasTab(int line) {
        return line >= 1 && line <= lineHasTab.length && lineHasTab[line - 1];
    }

    /** The longest line, in chars (without its line break): the YAML scanner's cost per value grows with it. */
    int longestLine() {
        int best = 0;
        for (int k = 0; k < lineStart.length; k++) {
            best = Math.max(best, lineEnd[k] - lineStart[k]);
        }
        return best;
    }

    /** The 1-based number of the longest line. */
    int longestLineNumber() {
        int best = 0;
        for (int k = 1; k < lineStart.length; k++) {
            if (lineEnd[k] - lineStart[k] > lineEnd[best] - lineStart[best]) {
                best = k;
            }
        }
        return best + 1;
    }

    /**
     * Position of a char index in {@link #text()}. O(log lines + distance from the previous query on
     * the same line): queries in increasing order (as the encoding checks make them) cost O(n) in
     * all, even on a file that is one long line.
     */
    Pos posOf(int index) {
        int lo = MonotoneSearch.highest(0, lineStart.length - 1, i -> lineStart[i] <= index); // line 0 starts at 0
        int to = Math.min(Math.max(index, lineStart[lo]), text.length());
        int col;
        if (memoIndex >= 0 && memoLine == lo && memoIndex <= to) {
            col = memoColumn + text.codePointCount(memoIndex, to);
        } else {
            col = text.codePointCount(lineStart[lo], to) + 1;
        }
        if (to == text.length() || !Character.isLowSurrogate(text.charAt(to))) {
            memoIndex = to;
            memoLine = lo;
            memoColumn = col;
        }
        return new Pos(lo + 1, col);
    }

    /**
     * The char index within {@link #line(int)} of a 1-based code-point column, or -1 if the line
     * is shorter.
     */
    static int charIndexOfColumn(String line, int column) {
        int idx = 0;
        for (int c = 1; c < column; c++) {
            if (idx >= line.length()) {
                return -1;
            }
            idx += Character.charCount(line.codePointAt(idx));
        }
        return idx < line.length() ? idx : -1;
    }
}
