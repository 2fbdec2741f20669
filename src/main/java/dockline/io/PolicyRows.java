package dockline.io;

import dockline.io.PolicyFiles.Header;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import dockline.policy.ThresholdPolicy;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Collects a policy file's rows, checks each against those before it, and builds the policy or the
 * threshold policy (reporting duplicates at their row). Linear in the rows, plus a sort per position
 * for thresholds.
 */
final class PolicyRows {
    final Problems problems;
    final List<PolicyEntry> entries = new ArrayList<>();
    final List<Pos> positions = new ArrayList<>();
    final Set<String> seen = new HashSet<>();

    PolicyRows(Problems problems) {
        this.problems = problems;
    }

    void add(Pos pos, PolicyEntry e) {
        String key = e.cell() + "/" + e.level() + "/" + e.budgetLeft() + "/" + e.progress()
                + (e.scored() ? "/" + e.score().text() : "") + "/" + e.closures();
        if (!seen.add(key)) {
            problems.add(pos, "a second row for cell " + e.cell() + ", level " + e.level() + ", budget left "
                    + e.budgetLeft() + (e.closures().isEmpty() ? "" : " (" + e.closures() + ")") + ", progress " + e.progress() + (e.scored() ? ", score " + e.score() : ""),
                    "keep one action per situation");
            return;
        }
        entries.add(e);
        positions.add(pos);
    }

    /**
     * The threshold policy: the steps grouped by position, thresholds falling; a threshold file is for
     * the reserve floor only.
     */
    ThresholdPolicy thresholds(Header h, Pos top) {
        if (h.score().isPresent()) {
            problems.addPolicy(top, "a threshold policy is for the reserve floor: leave out 'objective: discounted'");
            return null;
        }
        for (int i = 0; i < entries.size(); i++) {
            if (entries.get(i).scored()) {
                problems.addPolicy(positions.get(i), "a threshold has no 'score'");
            }
        }
        if (problems.any()) {
            return null;
        }
        Map<String, List<PolicyEntry>> byPosition = new LinkedHashMap<>();
        for (PolicyEntry e : entries) {
            byPosition.computeIfAbsent(e.cell() + "/" + e.budgetLeft() + "/" + e.progress() + "/" + e.closures(),
                    k -> new ArrayList<>()).add(e);
        }
        List<ThresholdPolicy.Row> out = new ArrayList<>();
        for (List<PolicyEntry> steps : byPosition.values()) {
            steps.sort(Comparator.comparingInt(PolicyEntry::level).reversed());
            List<ThresholdPolicy.Step> st = new ArrayList<>();
            for (PolicyEntry e : steps) {
                st.add(new ThresholdPolicy.Step(e.level(), e.action()));
            }
            PolicyEntry first = steps.get(0);
            out.add(new ThresholdPolicy.Row(first.cell(), first.budgetLeft(), first.progress(), first.closures(), st));
        }
        return new ThresholdPolicy(out);
    }

    /** The policy; every row has a score memory exactly when the header has the discounted objective. */
    Policy policy(Header h) {
        boolean scored = h.score().isPresent();
        for (int i = 0; i < entries.size(); i++) {
            if (entries.get(i).scored() != scored) {
                problems.add(positions.get(i), scored ? "row has no 'score' (the policy is for a discounted mission)"
                        : "a row with a 'score' needs 'objective: discounted' in the header",
                        scored ? "give the score memory, e.g. 3/8 or secured" : "see missions/POLICY-FORMAT.md");
            }
        }
        return problems.any() ? null : new Policy(entries);
    }
}
