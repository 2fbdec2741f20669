package dockline.io;

import java.util.Collection;

/**
 * "Did you mean" suggestions by edit distance (Levenshtein 1966, "Binary codes capable of
 * correcting deletions, insertions, and reversals"; the textbook dynamic programme, O(|a|·|b|)).
 */
final class Spelling {

    private Spelling() {
    }

    /** Number of single-character insertions, deletions and substitutions that turn a into b. */
    static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(sub, Math.min(prev[j] + 1, cur[j - 1] + 1));
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
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
