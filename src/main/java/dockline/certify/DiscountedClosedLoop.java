package dockline.certify;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.model.Relation;
import dockline.policy.Policy;
import dockline.policy.PolicyScore;
import dockline.util.IntArrayList;
import dockline.util.LongIntMap;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The closed loop of a policy for a discounted mission against every disturbance choice: nodes are
 * the robot's situations (arena robot vertex, battery level, task progress, score memory) reachable
 * from the start when the robot follows the policy, edges the disturbance's outcomes (arena edges).
 * Built on this package's own bookkeeping only: the model, the arena and the policy's data.
 *
 * <p><b>Score memory.</b> With discount d, threshold v = p/q and weights (energy deltas in units)
 * bounded by mu (the largest |delta| of any arena edge, counted here), the robot's memory after the
 * steps {@code w_0..w_i} is the scaled gap {@code s_i = d^i (DS(w_0..w_i) - v)}: {@code s_{-1} = -v/d}
 * and {@code s_{i+1} = d s_i + w_{i+1}}, so every {@code s_i} with {@code i >= 0} is an integer
 * numerator over q, kept exactly in a long ({@link Math#multiplyExact}, {@link Math#addExact}).
 * Since the rest of a run moves {@code s_i} by at most {@code B = mu/(d-1)}: a gap beyond B
 * ({@code s >= B} for {@code >=}, {@code s > B} for {@code >}) meets the threshold whatever follows
 * and is kept as "secured" (the policy's {@link PolicyScore#SECURED}); a gap below {@code -B}
 * ({@code <= -B} for {@code >}) can never meet it, which is a failure ({@link ProblemKind#SCORE_OUT_OF_REACH}).
 * This is the bound of the published discounted-sum comparator automaton construction (2018),
 * re-derived here from the geometric series, not taken from the solver.
 *
 * <p><b>Completion</b> follows the product's convention (maps/README.md, "Game semantics"; missions/README.md): a
 * situation is complete — absorbing, weight 0 for ever after, so its score is the partial sum — when
 * all tasks are done, the robot is on a dock (if the mission says so) and the score is met
 * ({@code s >= 0} for {@code >=}, {@code s > 0} for {@code >}, or secured). A docked robot with its
 * tasks done whose score is still short is not complete: it needs a policy row and goes on.
 *
 * <p><b>Battery.</b> {@code level' = min(capacity, level + delta)}; when the reserve floor is
 * checked a level below it is a failure, otherwise the level is only carried (it is part of the
 * policy's key).
 *
 * <p>Breadth-first from the start, so the first problem has a shortest trace. Cost: O(N + E) time
 * and memory for N nodes and E outcome edges, int and long arrays only (one {@link PolicyScore} per
 * distinct gap value, for the look-up), plus one policy look-up per node.
 */
public final class DiscountedClosedLoop extends LoopNodes {

    /** Score memory code: beyond the bound, the threshold is met whatever follows. */
    public static final int SECURED = 0;
    /** Score memory code: the gap {@code -v/d} before the first step. */
    public static final int BEFORE_FIRST_STEP = 1;
    private static final int OUT_OF_REACH = -1;
    private static final int FIRST_GAP = 2;

    /** Successor code: the outcome leaves the battery below the floor. */
    public static final int LOST_BELOW_FLOOR = -1;
    /** Successor code: after the outcome the threshold can no longer be met. */
    public static final int LOST_SCORE = -2;
    /** Successor code: the outcome puts the robot in an avoided zone. */
    public static final int LOST_AVOIDED_ZONE = -3;

    /** What went wrong while building the loop. */
    public enum ProblemKind {
        START_BELOW_FLOOR, START_IN_AVOIDED_ZONE, START_SCORE_OUT_OF_REACH, MISSING_ENTRY, ILLEGAL_ACTION,
        BELOW_FLOOR, SCORE_OUT_OF_REACH, AVOIDED_ZONE
    }

    /**
     * The first problem found.
     *
     * @param kind  what went wrong
     * @param node  the loop node where it happened
     * @param edge  the arena outcome edge that caused it, or -1
     * @param level for {@link ProblemKind#BELOW_FLOOR} the level reached, otherwise the node's level
     */
    public record Problem(ProblemKind kind, int node, int edge, int level) {
    }

    private final Objective.Discounted objective;
    private final boolean floorKept;

    private final long d;
    private final long p;
    private final long q;
    private final long dMinus1;
    private final int mu;
    private final long muQ;
    private final boolean strict;

    private final int startGap;
    private final boolean startMet;
    private final PolicyScore startScore;

    private final LongIntMap gapIds = new LongIntMap(256);
    private long[] gapNum = new long[64];
    private final List<PolicyScore> gapScore = new ArrayList<>();
    private int gapCount = FIRST_GAP;

    private final IntArrayList nodeGap = new IntArrayList(1024);
    private int[] table = new int[1 << 12];
    private Problem problem;

    private DiscountedClosedLoop(Arena arena, Policy policy, Objective.Discounted objective, boolean floorKept,
                                 int floor, int startLevel) {
        super(arena, policy, floor, startLevel);
        this.objective = objective;
        this.floorKept = floorKept;
        this.d = objective.discount();
        this.p = objective.threshold().num();
        this.q = objective.threshold().den();
        this.dMinus1 = d - 1;
        this.strict = objective.relation() == Relation.ABOVE;
        int bound = 0;
        for (int e = 0; e < arena.edgeCount(); e++) {
            bound = Math.max(bound, Math.abs(arena.weight(e)));
        }
        this.mu = bound;
        this.muQ = Math.multiplyExact((long) mu, q);
        gapScore.add(PolicyScore.SECURED);
        // the gap -p/(q d) before the first step, against B = mu/(d-1): -p (d-1) against mu q d, exactly
        BigInteger lhs = BigInteger.valueOf(p).negate().multiply(BigInteger.valueOf(dMinus1));
        BigInteger rhs = BigInteger.valueOf(mu).multiply(BigInteger.valueOf(q)).multiply(BigInteger.valueOf(d));
        int hi = lhs.compareTo(rhs);
        int lo = lhs.compareTo(rhs.negate());
        if (strict ? hi > 0 : hi >= 0) {
            startGap = SECURED;
            startScore = PolicyScore.SECURED;
        } else if (strict ? lo <= 0 : lo < 0) {
            startGap = OUT_OF_REACH;
            startScore = null;
        } else {
            startGap = BEFORE_FIRST_STEP;
            long g = BigInteger.valueOf(p).gcd(BigInteger.valueOf(d)).longValueExact();
            g = g == 0 ? 1 : g;
            startScore = PolicyScore.gap(new Rational(Math.negateExact(p / g), Math.multiplyExact(q, d / g)));
        }
        gapScore.add(startScore);
        // DS of nothing is 0: met when 0 >= v (0 > v)
        startMet = strict ? p < 0 : p <= 0;
    }

    /**
     * Builds the loop from the arena's start vertex; stops at the first problem.
     *
     * @param floor the reserve floor, or {@code Integer.MIN_VALUE} when the floor is not checked
     * @throws ClosedLoop.TooLargeException if the loop has more than {@code maxNodes} nodes
     * @throws ArithmeticException          if a gap does not fit 64-bit arithmetic
     */
    static DiscountedClosedLoop build(Arena arena, Policy policy, Objective.Discounted objective, int floor,
                                      int startLevel, int maxNodes) {
        boolean kept = floor != Integer.MIN_VALUE;
        DiscountedClosedLoop loop = new DiscountedClosedLoop(arena, policy, objective, kept, kept ? floor : 0,
                startLevel);
        loop.explore(maxNodes);
        return loop;
    }

    // ------------------------------------------------------------------ score memory

    /** The memory code of a gap numerator over q: {@link #SECURED}, {@link #OUT_OF_REACH} or an interned id. */
    private int classify(long n) {
        long t = Math.multiplyExact(n, dMinus1);
        if (strict ? t > muQ : t >= muQ) {
            return SECURED;
        }
        if (strict ? t <= -muQ : t < -muQ) {
            return OUT_OF_REACH;
        }
        int id = gapIds.get(n);
        if (id >= 0) {
            return id;
        }
        if (gapCount == gapNum.length) {
            gapNum = Arrays.copyOf(gapNum, gapCount * 2);
        }
        id = gapCount++;
        gapNum[id] = n;
        gapScore.add(null); // made on first look-up
        gapIds.put(n, id);
        return id;
    }

    /** The memory after reading weight w. */
    private int stepGap(int g, int w) {
        if (g == SECURED) {
            return SECURED;
        }
        long wq = Math.multiplyExact((long) w, q);
        long n = g == BEFORE_FIRST_STEP ? Math.subtractExact(wq, p) : Math.addExact(Math.multiplyExact(d, gapNum[g]), wq);
        return classify(n);
    }

    /** Whether the score so far meets the threshold (a run that ends here scores exactly that). */
    private boolean met(int g) {
        if (g == SECURED) {
            return true;
        }
        if (g == BEFORE_FIRST_STEP) {
            return startMet;
        }
        return strict ? gapNum[g] > 0 : gapNum[g] >= 0;
    }

    /** The policy's key for a memory code. */
    PolicyScore score(int g) {
        PolicyScore s = gapScore.get(g);
        if (s == null) {
            s = PolicyScore.gap(new Rational(gapNum[g], q));
            gapScore.set(g, s);
        }
        return s;
    }

    // ------------------------------------------------------------------ building

    private void explore(int maxNodes) {
        int v0 = arena.startVertex();
        int m0 = progress.step(0, arena.cellZones(arena.cell(v0)));
        addNode(v0, startLevel, Math.max(m0, 0), Math.max(startGap, SECURED), -1, -1);
        if (floorKept && startLevel < floor) {
            problem = new Problem(ProblemKind.START_BELOW_FLOOR, 0, -1, startLevel);
            return;
        }
        if (m0 == TaskProgress.AVOIDED) {
            problem = new Problem(ProblemKind.START_IN_AVOIDED_ZONE, 0, -1, startLevel);
            return;
        }
        if (startGap == OUT_OF_REACH) {
            problem = new Problem(ProblemKind.START_SCORE_OUT_OF_REACH, 0, -1, startLevel);
            return;
        }
        for (int n = 0; n < nodeVertex.size(); n++) {
            graph.openSuccessors();
            expanded = n + 1;
            int v = nodeVertex.get(n);
            int level = nodeLevel.get(n);
            int mask = nodeMask.get(n);
            int gap = nodeGap.get(n);
            if (progress.complete(mask, arena.isDock(arena.cell(v))) && met(gap)) {
                nodeChoice.add(-1);
                continue;
            }
            Optional<Action> act = policy.lookup(arena.cellOf(v), level, arena.budgetLeft(v), mask, score(gap),
                    arena.closures(v));
            if (act.isEmpty()) {
                nodeChoice.add(-1);
                problem = new Problem(ProblemKind.MISSING_ENTRY, n, -1, level);
                return;
            }
            int dv = LoopGraph.legalChoice(arena, v, act.get());
            nodeChoice.add(dv);
            if (dv < 0) {
                problem = new Problem(ProblemKind.ILLEGAL_ACTION, n, -1, level);
                return;
            }
            for (int e = arena.outBegin(dv); e < arena.outEnd(dv); e++) {
                int u = arena.target(e);
                int w = arena.weight(e);
                long raw = (long) level + w;
                if (floorKept && raw < floor) {
                    lose(LOST_BELOW_FLOOR, e, new Problem(ProblemKind.BELOW_FLOOR, n, e, (int) raw));
                    return;
                }
                int next = Math.toIntExact(Math.min(capacity, raw));
                int nextGap = stepGap(gap, w);
                if (nextGap == OUT_OF_REACH) {
                    lose(LOST_SCORE, e, new Problem(ProblemKind.SCORE_OUT_OF_REACH, n, e, next));
                    return;
                }
                int nextMask = progress.step(mask, arena.cellZones(arena.cell(u)));
                if (nextMask == TaskProgress.AVOIDED) {
                    lose(LOST_AVOIDED_ZONE, e, new Problem(ProblemKind.AVOIDED_ZONE, n, e, next));
                    return;
                }
                int id = find(u, next, nextMask, nextGap);
                if (id < 0) {
                    if (nodeVertex.size() >= maxNodes) {
                        throw new ClosedLoop.TooLargeException(maxNodes);
                    }
                    id = addNode(u, next, nextMask, nextGap, n, e);
                }
                graph.addSuccessor(id, e);
            }
        }
        graph.closeSuccessors();
    }

    private void lose(int code, int edge, Problem p) {
        graph.addSuccessor(code, edge);
        problem = p;
    }

    // open addressing over (vertex, level, mask, gap); the table holds node id + 1

    private static int hash(int v, int level, int mask, int gap) {
        long h = v * 0x9E3779B97F4A7C15L;
        h ^= (level + 0x632BE59BD9B4E019L) * 0xC2B2AE3D27D4EB4FL;
        h ^= (mask + 0x165667B19E3779F9L) * 0x94D049BB133111EBL;
        h ^= (gap + 0x27D4EB2F165667C5L) * 0xFF51AFD7ED558CCDL;
        h ^= h >>> 31;
        return (int) (h ^ (h >>> 29));
    }

    private int find(int v, int level, int mask, int gap) {
        int m = table.length - 1;
        for (int i = hash(v, level, mask, gap) & m; ; i = (i + 1) & m) {
            int id = table[i] - 1;
            if (id < 0) {
                return -1;
            }
            if (nodeVertex.get(id) == v && nodeLevel.get(id) == level && nodeMask.get(id) == mask
                    && nodeGap.get(id) == gap) {
                return id;
            }
        }
    }

    private void place(int id) {
        int m = table.length - 1;
        int i = hash(nodeVertex.get(id), nodeLevel.get(id), nodeMask.get(id), nodeGap.get(id)) & m;
        while (table[i] != 0) {
            i = (i + 1) & m;
        }
        table[i] = id + 1;
    }

    private int addNode(int v, int level, int mask, int gap, int parent, int parentEdge) {
        int id = nodeVertex.size();
        nodeVertex.add(v);
        nodeLevel.add(level);
        nodeMask.add(mask);
        nodeGap.add(gap);
        graph.addNode(parent, parentEdge);
        if (2 * (id + 1) > table.length) {
            table = new int[Math.multiplyExact(table.length, 2)];
            for (int k = 0; k < id; k++) {
                place(k);
            }
        }
        place(id);
        return id;
    }

    // ------------------------------------------------------------------ queries

    public Objective.Discounted objective() {
        return objective;
    }

    /** Whether the reserve floor is checked. */
    public boolean floorKept() {
        return floorKept;
    }

    /** The weight bound mu this loop counted on the arena. */
    public int weightBound() {
        return mu;
    }

    /** Whether the whole loop was built (no problem stopped the search). */
    public boolean complete() {
        return problem == null;
    }

    public Optional<Problem> problem() {
        return Optional.ofNullable(problem);
    }

    /** The node's score memory as the policy keys it. */
    public PolicyScore scoreMemory(int node) {
        return score(nodeGap.get(node));
    }

    @Override
    int problemNode() {
        return problem == null ? -1 : problem.node();
    }

    @Override
    Enum<?> problemKind() {
        return problem == null ? null : problem.kind();
    }
}
