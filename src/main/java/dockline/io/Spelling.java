package dockline.io;

import java.util.Collection;

/**
 * "Did you mean" suggestions by edit distance: insertions, deletions and substitutions
 * (Levenshtein 1966, "Binary codes capable of correcting deletions, insertions, and reversals")
 * plus swaps of two neighbouring letters, the commonest typing slip (Damerau 1964, "A technique
 * for computer detection and correction of spelling errors"), in the restricted
 * "optimal string alignment" form; the textbook dynamic programme, O(|a|·|b|).
 */
final class Spelling {

    private Spelling() {
    }

    /** Fewest single-character insertions, deletions, substitutions and neighbour swaps that turn a into b. */
    static int distance(String a, String b) {
        int n = a.length();
        int m = b.length();
        int[][] d = new int[n + 1][m + 1];
        for (int i = 0; i <= n; i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= m; j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= n; i++) {
            for (int j = 1; j <= m; j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                int v = Math.min(d[i - 1][j - 1] + cost, Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1));
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    v = Math.min(v, d[i - 2][j - 2] + 1);
                }
                d[i][j] = v;
            }
        }
        return d[n][m];
    }

    /**
     * The known word closest to {@code word}, if it is close enough to be a plausible slip
     * (at most 2 edits, and fewer than half the letters), else {@code null}. Case is ignored.
     */
    static String closest(String word, Collection<String> known) {
        if (word == null || word.length() > 100) {
            return null;
        }
        String w = word.toLowerCase(java.util.Locale.ROOT);
        String best = null;
        int bestD = Integer.MAX_VALUE;
        for (String k : known) {
            if (k.length() > 100) {
                continue;
            }
            int d = distance(w, k.toLowerCase(java.util.Locale.ROOT));
            if (d < bestD) {
                bestD = d;
                best = k;
            }
        }
        if (best == null) {
            return null;
        }
        int limit = Math.min(2, Math.max(1, (Math.max(w.length(), best.length()) - 1) / 2));
        return bestD <= limit ? best : null;
    }
}
