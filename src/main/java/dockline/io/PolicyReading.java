package dockline.io;

import static dockline.io.PolicyFields.header;

import dockline.io.PolicyFiles.Document;
import dockline.io.PolicyFiles.Header;
import dockline.policy.Policy;
import dockline.policy.ThresholdPolicy;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What the JSON and the CSV policy reader have in common: each goes through its file once, gathers
 * the header's values (as text, with the position of each), the task list and the rows, and then
 * builds the document the same way. Problems go to {@link #p}; the document is returned only when
 * there is none.
 */
abstract class PolicyReading {
    final Problems p;
    final byte[] bytes;
    /** The header's values by key (keys of earlier versions renamed), as written. */
    final Map<String, String> values = new LinkedHashMap<>();
    /** Where each header value stands. */
    final Map<String, Pos> at = new LinkedHashMap<>();
    final List<String> tasks = new ArrayList<>();
    final PolicyRows rows;

    PolicyReading(Problems p, byte[] bytes) {
        this.p = p;
        this.bytes = bytes;
        this.rows = new PolicyRows(p);
    }

    /** The document, or {@code null} after a problem. */
    abstract Document read();

    /** Whether {@code key} is one of {@code keys}; if not, reports it (with the nearest key) at {@code pos}. */
    boolean known(String key, List<String> keys, Pos pos, boolean inRow) {
        if (keys.contains(key)) {
            return true;
        }
        String near = Spelling.closest(key, keys);
        p.add(pos, "unknown key '" + Loading.shorten(key) + "'" + (inRow ? " in a row" : ""),
                near != null ? "did you mean '" + near + "'?"
                        : "missions/POLICY-FORMAT.md lists the keys" + (inRow ? " of a row" : ""));
        return false;
    }

    /**
     * The document from what was gathered: the header checked, then the rows as a policy, or, in the
     * threshold form, as a threshold policy; {@code null} after any problem.
     */
    Document document(Pos top, boolean thresholdForm) {
        Header h = header(p, top, values, at, tasks);
        if (h == null) {
            return null;
        }
        if (thresholdForm) {
            ThresholdPolicy tp = rows.thresholds(h, top);
            return tp == null || p.any() ? null : new Document(h, new Policy(List.of()), tp);
        }
        Policy policy = rows.policy(h);
        return policy == null || p.any() ? null : new Document(h, policy);
    }
}
