package dockline.view;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.policy.PolicyEntry;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The policy in threshold form, per situation without the battery level: for a cell, disturbances
 * left, tasks done and closures, the levels at which the chosen move changes ("at 23 Wh or more: go
 * east; below: go to the dock"). Built once from the policy's rows; the view reads it, it decides
 * nothing.
 *
 * <p>Reading a level between two rows: the move of the row at the highest level not above it. That
 * move keeps the guarantee, because winning is monotone in the battery level (a fuller battery stays
 * at least as full after any step, saturation at the capacity included; see
 * {@code solve.reserve.ChargeNeeded}), and the rows are the policy's own closed loop, so the robot can
 * go on as if it had that row's level. Below the lowest row of a situation no move is known.
 *
 * <p>Cost: O(rows log rows) to build, O(log rows of the situation) per look-up.
 */
public final class PolicyRules {

    /** No policy at all. */
    static final PolicyRules NONE = new PolicyRules(Map.of(), Map.of(), List.of(), Map.of());

    /**
     * From {@code fromLevel} units up (to the next threshold) the policy takes {@code action}.
     */
    record Threshold(int fromLevel, Action action) {
    }

    private record Situation(int cell, int budget, int progress, int closures) {
    }

    private record Exact(int cell, int level, int budget, int progress) {
    }

    /** Rows of one situation, sorted by level: levels[i] takes actions[i]. */
    private record Rows(int[] levels, Action[] actions) {
    }

    private final Map<Situation, Rows> rows;
    private final Map<Exact, Integer> closuresOfRow;
    private final List<String> closures;
    private final Map<String, Integer> closureIds;

    private PolicyRules(Map<Situation, Rows> rows, Map<Exact, Integer> closuresOfRow, List<String> closures,
                        Map<String, Integer> closureIds) {
        this.rows = rows;
        this.closuresOfRow = closuresOfRow;
        this.closures = closures;
        this.closureIds = closureIds;
    }

    /** The rules of a policy's rows on a map of the given width. */
    static PolicyRules of(Collection<PolicyEntry> entries, int width) {
        if (entries.isEmpty()) {
            return NONE;
        }
        Map<String, Integer> ids = new HashMap<>();
        List<String> names = new ArrayList<>();
        Map<Situation, List<PolicyEntry>> bySituation = new HashMap<>();
        Map<Exact, Integer> closuresOfRow = new HashMap<>();
        for (PolicyEntry e : entries) {
            if (e.scored()) {
                continue; // a discounted policy's rows also depend on the score memory: no threshold form
            }
            int id = ids.computeIfAbsent(e.closures(), k -> {
                names.add(k);
                return names.size() - 1;
            });
            int c = e.cell().index(width);
            bySituation.computeIfAbsent(new Situation(c, e.budgetLeft(), e.progress(), id), k -> new ArrayList<>()).add(e);
            closuresOfRow.putIfAbsent(new Exact(c, e.level(), e.budgetLeft(), e.progress()), id);
        }
        Map<Situation, Rows> rows = new HashMap<>();
        for (Map.Entry<Situation, List<PolicyEntry>> en : bySituation.entrySet()) {
            List<PolicyEntry> l = en.getValue();
            l.sort((a, b) -> Integer.compare(a.level(), b.level()));
            int[] lv = new int[l.size()];
            Action[] ac = new Action[l.size()];
            for (int i = 0; i < lv.length; i++) {
                lv[i] = l.get(i).level();
                ac[i] = l.get(i).action();
            }
            rows.put(en.getKey(), new Rows(lv, ac));
        }
        return new PolicyRules(rows, closuresOfRow, List.copyOf(names), Map.copyOf(ids));
    }

    boolean isEmpty() {
        return rows.isEmpty();
    }

    /**
     * The closures of the policy's row for exactly this situation (a replay that follows the policy
     * is always in one), or empty when the policy has no such row.
     */
    Optional<String> closuresAt(int cell, int level, int budget, int progress) {
        Integer id = closuresOfRow.get(new Exact(cell, level, budget, progress));
        return id == null ? Optional.empty() : Optional.of(closures.get(id));
    }

    /** The move at that level: the row at the highest level not above it; {@code null} below every row. */
    Action actionAt(int cell, int level, int budget, int progress, String closure) {
        Rows r = rowsOf(cell, budget, progress, closure);
        if (r == null) {
            return null;
        }
        int i = Arrays.binarySearch(r.levels(), level);
        if (i < 0) {
            i = -i - 2; // the insertion point minus one: the highest row below
        }
        return i < 0 ? null : r.actions()[i];
    }

    /** The thresholds of a situation, lowest first (empty when the policy has no row there). */
    List<Threshold> thresholds(int cell, int budget, int progress, String closure) {
        Rows r = rowsOf(cell, budget, progress, closure);
        List<Threshold> out = new ArrayList<>();
        if (r == null) {
            return out;
        }
        for (int i = 0; i < r.levels().length; i++) {
            if (i == 0 || !r.actions()[i].equals(r.actions()[i - 1])) {
                out.add(new Threshold(r.levels()[i], r.actions()[i]));
            }
        }
        return out;
    }

    private Rows rowsOf(int cell, int budget, int progress, String closure) {
        Integer id = closureIds.get(closure == null ? "" : closure);
        return id == null ? null : rows.get(new Situation(cell, budget, progress, id));
    }

    /**
     * The thresholds in words, highest first, e.g. {@code at 23 Wh or more: go east; from 12 Wh to
     * below 23 Wh: charge; below 12 Wh: no move is guaranteed from here}.
     */
    static String words(Mission m, Cell at, List<Threshold> ts) {
        if (ts.isEmpty()) {
            return "the policy never gets here in this situation";
        }
        BuildingMap map = m.map();
        StringBuilder sb = new StringBuilder();
        for (int i = ts.size() - 1; i >= 0; i--) {
            Threshold t = ts.get(i);
            String from = Units.wh(m, t.fromLevel());
            if (i == ts.size() - 1) {
                sb.append("at ").append(from).append(" or more: ");
            } else {
                sb.append("; from ").append(from).append(" to below ").append(Units.wh(m, ts.get(i + 1).fromLevel())).append(": ");
            }
            sb.append(moveWords(map, at, t.action()));
        }
        sb.append("; below ").append(Units.wh(m, ts.get(0).fromLevel())).append(": no move is guaranteed from here");
        return sb.toString();
    }

    /** A move in words: {@code go east}, {@code go north-west onto the dock}, {@code wait}, {@code charge}. */
    static String moveWords(BuildingMap map, Cell at, Action a) {
        if (a.kind() == ActionKind.WAIT) {
            return "wait";
        }
        if (a.kind() == ActionKind.CHARGE) {
            return "charge";
        }
        int dx = Integer.signum(a.target().x() - at.x());
        int dy = Integer.signum(a.target().y() - at.y());
        String ns = dy < 0 ? "north" : dy > 0 ? "south" : "";
        String ew = dx > 0 ? "east" : dx < 0 ? "west" : "";
        String dir = ns.isEmpty() ? ew : ew.isEmpty() ? ns : ns + "-" + ew;
        boolean dock = map.inside(a.target()) && map.terrainAt(a.target()).dock();
        return "go " + (dir.isEmpty() ? "to " + a.target() : dir) + (dock ? " onto the dock" : "");
    }
}
