package dockline.arena;

import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.util.LongIntMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The disturbance part of a robot vertex: budget left, the doors and zones closed so far by lasting
 * events, and the events used per {@code at-most} entry (maps/README.md, "Game semantics"). What the
 * robot has observed of the building; a policy may depend on all of it.
 *
 * <p>A <em>closure item</em> is what a lasting event closes: one door cell of a lasting door-shut
 * rule, or the whole zone of a lasting blockage rule. States are numbered densely in the order they
 * are found: ids {@code 0 .. K} are (budget left k, nothing closed, no entry used), so that with no
 * lasting rule and no {@code at-most} the state id is the budget left and the arena's numbering is the
 * reference one. Further states are found breadth-first from these by spending one event of a rule
 * that may still happen; only states an event sequence can produce are kept (a door item is only
 * closed by the robot trying to enter that door, so the sets found are those of at most K items).
 * A patrol with {@code budget-per: lap} also keeps, for every state, its renewal at a completed lap
 * ({@link #renewed}: full budget, counts at 0, the same closures), so there the sets may grow over the
 * laps up to every item.
 *
 * <p>Cost: O(S · (R + C)) time for S states, R rules and C door cells of lasting rules, plus
 * O(S · K) memory; S is at most the sum over j ≤ K of (items choose j), times the count tuples of the
 * at-most entries. A limit on S makes a model far too large fail fast ({@link TooManyStates}).
 */
public final class DisturbanceStates {

    private final int budget;
    private final int items;
    private final String[] itemName;
    private final int[][] itemCells;
    private final int[] cellItemStart;
    private final int[] cellItem;
    private final int[] doorItemOfCell;
    private final int[] ruleItem;
    private final int[] ruleGroup;
    private final int[] groupLimit;
    // per state
    private final int[] stBudget;
    private final int[][] stClosed;
    private final int[][] stUsed;
    private final LongIntMap next;
    private final int[] renewed;
    private final boolean plain;
    private final String[] keys;

    private DisturbanceStates(int budget, int items, String[] itemName, int[][] itemCells,
                              int[] cellItemStart, int[] cellItem, int[] doorItemOfCell, int[] ruleItem,
                              int[] ruleGroup, int[] groupLimit, int[] stBudget,
                              int[][] stClosed, int[][] stUsed, LongIntMap next, int[] renewed) {
        this.budget = budget;
        this.items = items;
        this.itemName = itemName;
        this.itemCells = itemCells;
        this.cellItemStart = cellItemStart;
        this.cellItem = cellItem;
        this.doorItemOfCell = doorItemOfCell;
        this.ruleItem = ruleItem;
        this.ruleGroup = ruleGroup;
        this.groupLimit = groupLimit;
        this.stBudget = stBudget;
        this.stClosed = stClosed;
        this.stUsed = stUsed;
        this.next = next;
        this.renewed = renewed;
        this.plain = stBudget.length == budget + 1 && items == 0 && groupLimit.length == 0;
        this.keys = new String[stBudget.length];
    }

    /**
     * The states of a map's disturbance model.
     *
     * @param doorRule  per cell (row-major): the door-shut rule that applies there, or -1
     * @param blockRule per cell: the blockage rule that applies there, or -1
     * @throws ArithmeticException if there would be more than {@code Integer.MAX_VALUE / 2} states
     */
    static DisturbanceStates of(BuildingMap map, int budget, int[] doorRule, int[] blockRule) {
        return of(map, budget, doorRule, blockRule, Integer.MAX_VALUE / 2, false);
    }

    /** Thrown when more than the allowed number of states would be found; says how many were found. */
    static final class TooManyStates extends ArithmeticException {
        final int found;

        TooManyStates(int found) {
            super("more than " + found + " disturbance states");
            this.found = found;
        }
    }

    /**
     * The states, or {@link TooManyStates} as soon as more than {@code maxStates} are found (so that a
     * model far too large is refused in time proportional to the limit, not to its own size).
     *
     * @param renewPerLap a patrol with {@code budget-per: lap}: every state also has its renewal (full budget,
     *                    no at-most entry used, the same closures; {@link #renewed}), and the states found from
     *                    those, so that closures may pile up over the laps beyond K
     */
    static DisturbanceStates of(BuildingMap map, int budget, int[] doorRule, int[] blockRule, int maxStates,
                                boolean renewPerLap) {
        int w = map.width();
        int cells = doorRule.length;
        List<EventRule> rules = map.disturbances().rules();
        int nr = rules.size();
        // closure items: lasting door cells in row-major order, then lasting blockage rules in file order
        List<String> names = new ArrayList<>();
        List<int[]> icells = new ArrayList<>();
        int[] doorItemOfCell = new int[cells];
        Arrays.fill(doorItemOfCell, -1);
        for (int c = 0; c < cells; c++) {
            if (doorRule[c] >= 0 && rules.get(doorRule[c]).lasting()) {
                doorItemOfCell[c] = names.size();
                names.add(map.doorName(Cell.ofIndex(c, w)).startsWith("door ") ? map.doorName(Cell.ofIndex(c, w))
                        : "door " + map.doorName(Cell.ofIndex(c, w)));
                icells.add(new int[] {c});
            }
        }
        int[] ruleItem = new int[nr];
        Arrays.fill(ruleItem, -1);
        boolean[] usedBlock = new boolean[nr];
        for (int c = 0; c < cells; c++) {
            if (blockRule[c] >= 0) {
                usedBlock[blockRule[c]] = true;
            }
        }
        for (int r = 0; r < nr; r++) {
            EventRule rule = rules.get(r);
            if (rule.kind() == EventKind.BLOCKAGE && rule.lasting() && usedBlock[r]) {
                ruleItem[r] = names.size();
                names.add("zone " + rule.label());
                int[] cs = rule.cells().stream().filter(map::inside).mapToInt(x -> x.index(w)).toArray();
                icells.add(cs);
            }
        }
        unique(names, icells, w);
        int items = names.size();
        // cell -> items covering it (CSR)
        int[] cnt = new int[cells + 1];
        for (int[] cs : icells) {
            for (int c : cs) {
                cnt[c + 1]++;
            }
        }
        for (int c = 0; c < cells; c++) {
            cnt[c + 1] += cnt[c];
        }
        int[] cellItem = new int[cnt[cells]];
        int[] fill = Arrays.copyOf(cnt, cells);
        for (int i = 0; i < items; i++) {
            for (int c : icells.get(i)) {
                cellItem[fill[c]++] = i;
            }
        }
        // at-most groups in file order
        int[] ruleGroup = new int[nr];
        Arrays.fill(ruleGroup, -1);
        Map<Integer, Integer> groupOf = new LinkedHashMap<>();
        List<Integer> limits = new ArrayList<>();
        for (int r = 0; r < nr; r++) {
            EventRule rule = rules.get(r);
            if (!rule.limited()) {
                continue;
            }
            int key = rule.group() >= 0 ? rule.group() : -2 - r;
            Integer g = groupOf.get(key);
            if (g == null) {
                g = limits.size();
                groupOf.put(key, g);
                limits.add(Math.min(rule.atMost(), budget));
            }
            ruleGroup[r] = g;
        }
        int groups = limits.size();
        int[] groupLimit = limits.stream().mapToInt(Integer::intValue).toArray();

        // states, breadth-first
        List<Integer> sb = new ArrayList<>();
        List<int[]> sc = new ArrayList<>();
        List<int[]> su = new ArrayList<>();
        Map<String, Integer> index = new HashMap<>();
        for (int k = 0; k <= budget; k++) {
            intern(k, new int[0], new int[groups], sb, sc, su, index);
        }
        LongIntMap next = new LongIntMap(64);
        int[] renew = new int[16];
        boolean closable = items > 0;
        if (closable || groups > 0) {
            for (int s = 0; s < sb.size(); s++) {
                int k = sb.get(s);
                if (renewPerLap) {
                    // what lasts stays closed; the counts of new events start afresh
                    if (s >= renew.length) {
                        renew = Arrays.copyOf(renew, 2 * renew.length);
                    }
                    renew[s] = intern(budget, sc.get(s), new int[groups], sb, sc, su, index);
                }
                if (k == 0) {
                    continue;
                }
                for (int r = 0; r < nr; r++) {
                    int g = ruleGroup[r];
                    int[] used = su.get(s);
                    if (g >= 0 && used[g] >= groupLimit[g]) {
                        continue;
                    }
                    int[] u2 = used;
                    if (g >= 0) {
                        u2 = used.clone();
                        u2[g]++;
                    }
                    EventRule rule = rules.get(r);
                    if (!rule.lasting()) {
                        int t = intern(k - 1, sc.get(s), u2, sb, sc, su, index);
                        next.put(key(s, r, -1), t);
                    } else if (ruleItem[r] >= 0) {
                        addItem(s, r, ruleItem[r], k, u2, sb, sc, su, index, next);
                    } else if (rule.kind() == EventKind.DOOR_SHUT) {
                        for (Cell c : rule.cells()) {
                            if (map.inside(c) && doorRule[c.index(w)] == r && doorItemOfCell[c.index(w)] >= 0) {
                                addItem(s, r, doorItemOfCell[c.index(w)], k, u2, sb, sc, su, index, next);
                            }
                        }
                    }
                    if (sb.size() > maxStates) {
                        throw new TooManyStates(maxStates);
                    }
                }
            }
        }
        int[] renewed = new int[sb.size()];
        for (int s = 0; s < renewed.length; s++) {
            // without closable items or limits every state renews to the full budget, id K
            renewed[s] = renewPerLap && (closable || groups > 0) ? renew[s] : budget;
        }
        return new DisturbanceStates(budget, items, names.toArray(String[]::new),
                icells.toArray(int[][]::new), cnt, cellItem, doorItemOfCell, ruleItem, ruleGroup, groupLimit,
                sb.stream().mapToInt(Integer::intValue).toArray(),
                sc.toArray(int[][]::new), su.toArray(int[][]::new), next, renewed);
    }

    /** The plain states 0..K (no lasting rule, no at-most): state id == budget left. */
    static DisturbanceStates plain(int budget) {
        int[] sb = new int[budget + 1];
        int[][] sc = new int[budget + 1][];
        int[][] su = new int[budget + 1][];
        for (int k = 0; k <= budget; k++) {
            sb[k] = k;
            sc[k] = new int[0];
            su[k] = new int[0];
        }
        int[] renewed = new int[budget + 1];
        Arrays.fill(renewed, budget);
        return new DisturbanceStates(budget, 0, new String[0], new int[0][], new int[1], new int[0],
                new int[0], new int[0], new int[0], new int[0], sb, sc, su, new LongIntMap(4), renewed);
    }

    private static void addItem(int s, int r, int item, int k, int[] u2, List<Integer> sb, List<int[]> sc,
                                List<int[]> su, Map<String, Integer> index, LongIntMap next) {
        int[] closed = sc.get(s);
        if (Arrays.binarySearch(closed, item) >= 0) {
            return;
        }
        int[] c2 = Arrays.copyOf(closed, closed.length + 1);
        c2[closed.length] = item;
        Arrays.sort(c2);
        int t = intern(k - 1, c2, u2, sb, sc, su, index);
        next.put(key(s, r, item), t);
    }

    private static int intern(int k, int[] closed, int[] used, List<Integer> sb, List<int[]> sc, List<int[]> su,
                              Map<String, Integer> index) {
        String key = k + "/" + Arrays.toString(closed) + "/" + Arrays.toString(used);
        Integer id = index.get(key);
        if (id != null) {
            return id;
        }
        int n = sb.size();
        index.put(key, n);
        sb.add(k);
        sc.add(closed);
        su.add(used);
        return n;
    }

    private static long key(int state, int rule, int item) {
        return ((long) state << 34) ^ ((long) rule << 17) ^ (item + 1L);
    }

    /**
     * The state after an event of {@code rule} in {@code state}, closing {@code item} (a closure item,
     * or -1 for a momentary event), or -1 if that event cannot happen there (budget spent, the rule's
     * {@code at-most} reached, or the item already closed).
     */
    public int after(int state, int rule, int item) {
        if (plain) {
            return stBudget[state] > 0 ? state - 1 : -1;
        }
        return next.get(key(state, rule, item));
    }

    /**
     * The state a patrol with {@code budget-per: lap} goes on in once a lap is complete: the full budget and
     * no {@code at-most} entry used, with the same doors and zones closed (maps/README.md, "Game semantics").
     * Only states of a model built for a patrol per lap have a renewal of their own closures; elsewhere it is
     * the plain full budget.
     */
    public int renewed(int state) {
        return renewed[state];
    }

    /** Whether there is exactly one state per budget left (no lasting rule, no at-most). */
    public boolean plain() {
        return plain;
    }

    /** Number of states. */
    public int count() {
        return stBudget.length;
    }

    public int budgetLeft(int state) {
        return stBudget[state];
    }

    /** The closure items closed in the state, ascending (do not modify). */
    public int[] closed(int state) {
        return stClosed[state];
    }

    /** Whether cell (row-major) is closed in the state: a closed door, or in a closed zone. */
    public boolean isClosed(int state, int cell) {
        int[] cl = stClosed[state];
        if (cl.length == 0) {
            return false;
        }
        for (int i = cellItemStart[cell]; i < cellItemStart[cell + 1]; i++) {
            if (Arrays.binarySearch(cl, cellItem[i]) >= 0) {
                return true;
            }
        }
        return false;
    }

    /** Number of closure items (lasting door cells and lasting blockage zones). */
    public int itemCount() {
        return items;
    }

    /**
     * Gives every closure item a name of its own: a name that several items share (door cells under one
     * name, as a map built in code may have; or two lasting blockage rules over one zone) gets the item's
     * first cell added ("door fire door 2 at 5:15"). The closures are part of every policy's situation key,
     * so two items under one name would make two positions one. O(items).
     */
    private static void unique(List<String> names, List<int[]> icells, int w) {
        Map<String, Integer> count = new HashMap<>();
        for (String n : names) {
            count.merge(n, 1, Integer::sum);
        }
        for (int i = 0; i < names.size(); i++) {
            if (count.get(names.get(i)) > 1 && icells.get(i).length > 0) {
                names.set(i, names.get(i) + " at " + Cell.ofIndex(icells.get(i)[0], w));
            }
        }
        // still shared (two lasting rules over one zone start at the same cell): the item's number too
        Map<String, Integer> again = new HashMap<>();
        for (String n : names) {
            again.merge(n, 1, Integer::sum);
        }
        for (int i = 0; i < names.size(); i++) {
            if (again.get(names.get(i)) > 1) {
                names.set(i, names.get(i) + " (closure " + (i + 1) + ")");
            }
        }
    }

    /** The item's name for reports: {@code door NAME} or {@code zone NAME}. */
    public String itemName(int item) {
        return itemName[item];
    }

    /** The cells (row-major) the item closes (do not modify). */
    public int[] itemCells(int item) {
        return itemCells[item];
    }

    /** The closure item of a lasting door cell, or -1. */
    public int doorItem(int cell) {
        return doorItemOfCell[cell];
    }

    /** The closure item of a lasting blockage rule, or -1. */
    public int blockageItem(int rule) {
        return ruleItem[rule];
    }

    /** Number of {@code at-most} entries. */
    public int limitCount() {
        return groupLimit.length;
    }

    /**
     * The state's situation key beyond the budget, as written in policy files
     * (missions/POLICY-FORMAT.md): {@code ""} when nothing is closed and no {@code at-most} entry
     * exists; else {@code closed: NAME, NAME} (items in arena order) and/or {@code used: N, N} (events
     * per at-most entry in file order), joined by {@code "; "}.
     */
    public String key(int state) {
        String k = keys[state];
        if (k == null) {
            k = makeKey(state);
            keys[state] = k;
        }
        return k;
    }

    private String makeKey(int state) {
        StringBuilder sb = new StringBuilder();
        int[] cl = stClosed[state];
        if (cl.length > 0) {
            sb.append("closed: ");
            for (int i = 0; i < cl.length; i++) {
                sb.append(i > 0 ? ", " : "").append(itemName[cl[i]]);
            }
        }
        int[] u = stUsed[state];
        if (u.length > 0) {
            sb.append(sb.length() > 0 ? "; " : "").append("used: ");
            for (int i = 0; i < u.length; i++) {
                sb.append(i > 0 ? ", " : "").append(u[i]);
            }
        }
        return sb.toString();
    }

    /** The state id of a budget left and a situation key ({@link #key}), or -1. */
    public int find(int budgetLeft, String key) {
        if (plain) {
            return key.isEmpty() && budgetLeft >= 0 && budgetLeft <= budget ? budgetLeft : -1;
        }
        for (int s = 0; s < stBudget.length; s++) {
            if (stBudget[s] == budgetLeft && key(s).equals(key)) {
                return s;
            }
        }
        return -1;
    }
}
