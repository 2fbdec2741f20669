package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.monitor.Monitor;
import dockline.monitor.ReserveMonitor;
import dockline.policy.Policy;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.Completions;
import dockline.solve.game.GoalPredecessors;
import dockline.solve.game.ProductGame;
import dockline.util.PagedBytes;
import dockline.util.Progress;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * The product arena × goal automaton × {@link ReserveMonitor} with nothing stored but what the
 * solver writes: vertices are numbered by arithmetic, {@code p = ((a · 2^gb) + g) · 2^lb + s} for
 * arena vertex a, goal state g &lt; G ≤ 2^gb and monitor state s &lt; L ≤ 2^lb (level minus floor,
 * L = capacity − floor + 1; padding to powers of two turns the decoding into shifts), and both
 * the successors and the predecessors of a vertex are generated on demand from the arena's CSR
 * arrays, the inverted goal step ({@link GoalPredecessors}) and the inverted battery update. No
 * product CSR, no decoded triples, no index, no per-state objects.
 *
 * <p>The game is the one {@link ProductGame} builds (same start, same sinks, same completion on
 * arrival); a robot triple that completes the mission on a dock plays the part of ProductGame's WIN
 * sink, an outcome below the floor or into an avoided zone that of LOSE (it is simply never won).
 * Unlike ProductGame, the numbering covers every triple, reachable from the start or not.
 *
 * <p>{@link #solve(boolean)} runs the linear-time backward attractor (a worklist and counters, as in
 * {@link AttractorSolver}) over that implicit graph: one byte per vertex counts the successors known
 * to be won, a worklist holds the won vertices not yet expanded (the least fixpoint does not depend on
 * the worklist order: last-in first-out keeps the search local for a verdict, first-in first-out
 * ranks the vertices for a policy of fewest moves). O(|V| + |E|) of the full
 * product; memory half a byte per slot of the padded numbering plus the worklist; it can stop as soon as the start
 * vertex is won. {@link #bfs()} is the plain breadth-first search over the same implicit graph from
 * the start (the memory-bound floor for this layout).
 *
 * <p>{@link #solveWithStrategy} also records the robot's choice (in the robot triple's own counter,
 * written once when the triple is won: no extra memory), from which {@link #policy} walks the closed loop from the start and
 * {@link #worstCaseMinimum} evaluates its lowest level (O(closed loop) each); this is the
 * {@link ReserveOptions.Route#IMPLICIT} route of {@link ReserveSolver#analyse}.
 *
 * <p>The inversion of the battery update {@code s' = min(L − 1, s + w)}, below the floor rejected:
 * for {@code s' < L − 1} the only predecessor state is {@code s = s' − w} (when in range); for
 * {@code s' = L − 1} (full) they are all {@code s ≥ L − 1 − w} when {@code w ≥ 0}, and none when
 * {@code w < 0}. Sources: the attractor of Grädel, Thomas and Wilke (2002, "Automata, Logics, and
 * Infinite Games", ch. 2), as in {@link AttractorSolver}; the product as {@link ProductGame} builds it.
 */
public final class ImplicitReserveGame {

    final Arena arena;
    final GoalAutomaton goal;
    final ReserveMonitor monitor;
    final int gc;
    final int levels;
    final int gBits;
    final int lBits;
    final long slotCount;
    final long vertexCount;
    private final GoalPredecessors inverse;
    // the arena's reverse CSR with each slot's source, weight and the source's out-degree inline, so
    // the backward search reads one slot sequentially instead of chasing in-edge -> edge -> source
    private final int[] revSource;
    private final int[] revWeight;
    private final byte[] revNeed;
    // per disturbance (action) vertex x, the index of x among its owner's out-edges: the robot's choice
    // recorded in the owner's counter (see run)
    final byte[] actionIndex;
    // per disturbance (action) vertex x, its owner: the robot vertex whose action it is
    final int[] ownerOf;
    // whether an outcome into a left-out closure phase (weight ArenaCompiler.LEFT_OUT) counts as won
    // for the robot instead of lost: the strengthened game of PhasedLastingSolver
    final boolean leftOutWins;
    // with leftOutWins, per disturbance (action) vertex x, how many of its outcomes are left-out closures
    private final byte[] leftOutOf;
    // the memory budget and the bytes taken besides the worklist (Long.MAX_VALUE, 0: no limit); see limitWorklist
    long budgetBytes = Long.MAX_VALUE;
    long fixedBytes = 0;
    // with leftOutWins, the counters at the weakened game's fixpoint (the first stage of run, exhausted
    // without winning the start), which the next round of PhasedLastingSolver starts from (carryFrom)
    PagedBytes weakened;
    // the previous round's game whose weakened fixpoint this solve starts from, or null (see carryFrom)
    ImplicitReserveGame previous;

    /** What a solve found. */
    public record Result(boolean startWon, long wonVertices, long edgesScanned, boolean stoppedEarly,
                         long vertexCount) {
    }

    /**
     * The game; its numbering has {@link #slotCount()} slots (a long: it may pass 2^31). Whether its
     * counters fit is the caller's check against the memory budget ({@link ReserveSolver}); a numbering past
     * 2^62 slots (which no memory holds) is reported as {@code Long.MAX_VALUE} slots, never numbered.
     */
    public ImplicitReserveGame(Arena arena, GoalAutomaton goal, ReserveMonitor monitor) {
        this(arena, goal, monitor, false);
    }

    /**
     * The game, with an outcome into a left-out closure phase ({@link ArenaCompiler#LEFT_OUT}, see
     * {@link ArenaCompiler#compileWithin}) counted as won for the robot when {@code leftOutWins} (the
     * strengthened game: what the robot loses there it loses in the mission), else as lost (as any
     * outcome below the floor: the weakened game, whose wins are wins in the mission).
     */
    ImplicitReserveGame(Arena arena, GoalAutomaton goal, ReserveMonitor monitor, boolean leftOutWins) {
        if (arena == null || goal == null || monitor == null) {
            throw new IllegalArgumentException("arena, goal and monitor are required");
        }
        this.arena = arena;
        this.goal = goal;
        this.monitor = monitor;
        this.gc = goal.stateCount();
        this.levels = (int) monitor.stateBound();
        this.gBits = bits(gc);
        this.lBits = bits(levels);
        this.vertexCount = SizeEstimate.satMul(SizeEstimate.satMul(arena.vertexCount(), gc), levels);
        int aBits = 64 - Long.numberOfLeadingZeros(arena.vertexCount());
        // a triple's number is a long; past 2^62 slots the counters alone would pass any memory, so the
        // count saturates and the memory check refuses the game before anything is numbered
        this.slotCount = aBits + gBits + lBits > 62 ? Long.MAX_VALUE : (long) arena.vertexCount() << (gBits + lBits);
        this.inverse = new GoalPredecessors(arena, goal);
        int m = arena.edgeCount();
        this.revSource = new int[m];
        this.revWeight = new int[m];
        this.revNeed = new byte[m];
        for (int i = 0; i < m; i++) {
            int e = arena.inEdge(i);
            int d = arena.source(e);
            int deg = arena.outEnd(d) - arena.outBegin(d);
            if (deg > 15) {
                throw new IllegalArgumentException("arena vertex " + d + " has " + deg + " out-edges; at most 15 fit");
            }
            revSource[i] = d;
            revWeight[i] = arena.weight(e);
            revNeed[i] = (byte) deg;
        }
        int rc = arena.robotCount();
        this.actionIndex = new byte[arena.vertexCount() - rc];
        this.ownerOf = new int[arena.vertexCount() - rc];
        this.leftOutWins = leftOutWins;
        this.leftOutOf = leftOutWins ? new byte[arena.vertexCount() - rc] : null;
        for (int x = rc; x < arena.vertexCount(); x++) {
            if (arena.inEnd(x) - arena.inBegin(x) != 1) {
                throw new IllegalArgumentException("disturbance vertex " + x + " must have exactly one way in, from its"
                        + " robot vertex");
            }
            int e = arena.inEdge(arena.inBegin(x));
            actionIndex[x - rc] = (byte) (e - arena.outBegin(arena.source(e)));
            ownerOf[x - rc] = arena.source(e);
            if (leftOutWins) {
                for (int f = arena.outBegin(x); f < arena.outEnd(x); f++) {
                    leftOutOf[x - rc] += arena.weight(f) == ArenaCompiler.LEFT_OUT ? 1 : 0;
                }
            }
        }
    }

    /**
     * Caps the worklist, whose size is not known before the solve (it holds the won vertices not yet
     * expanded): a solve whose worklist, with the {@code fixedBytes} the rest of the solve takes, would
     * pass {@code totalBudgetBytes} stops with a {@link ProductTooLargeException} instead of running out
     * of memory.
     */
    void limitWorklist(long fixedBytes, long totalBudgetBytes) {
        this.fixedBytes = Math.max(0, fixedBytes);
        this.budgetBytes = totalBudgetBytes;
    }

    /**
     * Makes the next solve start from the weakened fixpoint of {@code prev}, the game of the previous round of
     * {@link PhasedLastingSolver} on the same mission with a subset of this arena's phases kept: adding phases
     * turns left-out closures into real outcomes and adds vertices, so every triple the weakened game of
     * {@code prev} won is won here too, with the same choice (the kept phases' moves are the same, in the same
     * order). Its counters are copied over and the attractor continues from the new phases' completions and
     * from the new actions whose outcomes lead into won triples of the kept phases, instead of winning the
     * kept phases again.
     */
    void carryFrom(ImplicitReserveGame prev) {
        if (!leftOutWins || prev.weakened == null || prev.gBits != gBits || prev.lBits != lBits) {
            throw new IllegalArgumentException("only a strengthened game whose weakened fixpoint was kept carries over");
        }
        // its counters stay live until they are copied, besides this game's: the budget counts them, first
        CarriedRound.hold(this, prev.weakened.length(), false);
        this.previous = prev;
    }

    private static int bits(int n) {
        return n <= 1 ? 0 : 32 - Integer.numberOfLeadingZeros(n - 1);
    }

    /** The number of a triple: a long, as the numbering may pass 2^31 slots. */
    long id(int a, int g, int s) {
        return ((((long) a << gBits) | g) << lBits) | s;
    }

    /** The arena vertex of triple number p. */
    int vertexOf(long p) {
        return (int) (p >>> (lBits + gBits));
    }

    /** The goal state of triple number p. */
    int goalOf(long p) {
        return (int) (p >>> lBits) & ((1 << gBits) - 1);
    }

    /** The monitor state (level minus floor) of triple number p. */
    int levelOf(long p) {
        return (int) p & ((1 << lBits) - 1);
    }

    /** Slots of the numbering (every triple, padded): the length of the per-vertex arrays. */
    public long slotCount() {
        return slotCount;
    }

    /** Edges of the full product (every triple's moves), saturating. */
    public long edgeCount() {
        return SizeEstimate.satMul(arena.edgeCount(), vertexCount / Math.max(1, arena.vertexCount()));
    }

    /** Vertices of the full product (every triple). */
    public long vertexCount() {
        return vertexCount;
    }

    /** The start vertex, or -1 when the start is lost (below the floor, avoided zone), -2 when already complete. */
    public long start() {
        int a0 = arena.startVertex();
        int c0 = arena.cell(a0);
        int g0 = goal.initial(arena.cellZones(c0));
        int m0 = monitor.initialState();
        if (g0 == GoalAutomaton.REJECT || m0 == Monitor.REJECT) {
            return -1;
        }
        if (goal.accepting(g0, arena.isDock(c0))) {
            return -2;
        }
        return id(a0, g0, m0);
    }

    /** The attractor of the completion vertices, stopping once the start is won when {@code stopAtStart}. */
    public Result solve(boolean stopAtStart) {
        return solve(stopAtStart, () -> false);
    }

    public Result solve(boolean stopAtStart, BooleanSupplier cancelled) {
        return run(stopAtStart, cancelled, null, false, null);
    }

    /**
     * A solve that also records the robot's choice: per robot triple, in its counter, the index (among the arena
     * vertex's out-edges) of the action whose disturbance triple won it, written once, when the slot is
     * won, by a successor won strictly earlier; so the closed loop of these choices is acyclic and every
     * play of it reaches completion. Stops once the start is won (the closed loop from the start only
     * visits vertices won before it). The worklist is first-in first-out (see {@link #run}).
     */
    public Strategy solveWithStrategy(BooleanSupplier cancelled) {
        PagedBytes[] counts = new PagedBytes[1];
        Result r = run(true, cancelled, null, true, counts);
        return new Strategy(r, counts[0]);
    }

    /**
     * The whole attractor (no early stop, last-in first-out): the robot's winning region over every
     * triple, for {@link ChargeNeeded}. Same memory as {@link #solve(boolean)}, which it is, keeping
     * the counters.
     */
    public Strategy solveRegion(BooleanSupplier cancelled) {
        PagedBytes[] counts = new PagedBytes[1];
        Result r = run(false, cancelled, null, false, counts);
        return new Strategy(r, counts[0]);
    }

    /** The verdict and the robot's recorded choices of {@link #solveWithStrategy}. */
    public final class Strategy {
        private final Result result;
        private final PagedBytes count;

        private Strategy(Result result, PagedBytes count) {
            this.result = result;
            this.count = count;
        }

        /** The robot's recorded choice at won robot triple p: the index of the action among its out-edges. */
        int choice(long p) {
            return ((count.get(p >>> 1) >>> ((p & 1) << 2)) & 15) - 1;
        }

        /**
         * Whether the robot wins from robot triple (robot vertex, goal state, monitor state), by the
         * counters of this solve; exact only when the solve ran to the end ({@link #complete()}), which
         * it does whenever the start is not won. O(1).
         *
         * @throws IllegalStateException if the solve stopped early
         */
        public boolean robotWins(int robotVertex, int goalState, int monitorState) {
            if (!complete()) {
                throw new IllegalStateException("the solve stopped once the start was won: the region is partial");
            }
            if (robotVertex < 0 || robotVertex >= arena.robotCount() || goalState < 0 || goalState >= gc
                    || monitorState < 0 || monitorState >= levels) {
                return false;
            }
            long p = id(robotVertex, goalState, monitorState);
            return ((count.get(p >>> 1) >>> ((p & 1) << 2)) & 15) > 0;
        }

        /** Whether the solve ran to the end, so that {@link #robotWins} is the whole winning region. */
        public boolean complete() {
            return !result.stoppedEarly();
        }

        public Result result() {
            return result;
        }

        public boolean startWon() {
            return result.startWon();
        }
    }

    /**
     * The policy of the recorded choices: one row per robot triple of the closed loop from the start
     * (robot follows its choice, disturbance plays every outcome), the same rows as
     * {@link ProductGame#policy} gives for the same choices. O(closed loop); a bit per slot for the visited set.
     *
     * @throws IllegalArgumentException if the robot does not win from the start
     */
    public Policy policy(Strategy strategy) {
        return ImplicitWalks.policy(this, strategy);
    }

    /**
     * The lowest battery level along any play of the closed loop of the recorded choices from the
     * start, the level on arrival at completion included: W(robot p) = min(level p, W(chosen
     * successor)); W(disturbance d) = min(level d, over outcomes W(successor) or the level on arrival
     * when the outcome completes the mission). The closed loop is acyclic, so a depth-first
     * post-order evaluates it in O(closed loop) (a hash map holds W).
     */
    public int worstCaseMinimum(Strategy strategy) {
        return ImplicitWalks.worstCaseMinimum(this, strategy);
    }

    /**
     * The outcomes of disturbance triple (x, g, s) into {@code succ}: robot triples, or, for an outcome
     * that completes the mission on a dock, -1 with the level on arrival in {@code arrive} (when given;
     * else such outcomes are left out). Returns how many were written.
     *
     * @throws IllegalStateException if an outcome loses (the triple was not won)
     */
    int outcomes(int x, int g, int s, long[] succ, int[] arrive) {
        int k = 0;
        for (int e = arena.outBegin(x); e < arena.outEnd(x); e++) {
            if (leftOutWins && arena.weight(e) == ArenaCompiler.LEFT_OUT) {
                continue; // won in the strengthened game, with nothing after it
            }
            int s2 = monitor.step(s, arena.weight(e));
            int a2 = arena.target(e);
            int c2 = arena.cell(a2);
            int g2 = s2 == Monitor.REJECT ? GoalAutomaton.REJECT : goal.step(g, arena.cellZones(c2));
            if (g2 == GoalAutomaton.REJECT) {
                throw new IllegalStateException("a choice of the closed loop leads to a loss");
            }
            if (goal.accepting(g2, arena.isDock(c2))) {
                if (arrive != null) {
                    succ[k] = -1;
                    arrive[k++] = monitor.level(s2);
                }
                continue;
            }
            succ[k] = id(a2, g2, s2);
            if (arrive != null) {
                arrive[k] = -1;
            }
            k++;
        }
        return k;
    }

    /** Per slot, whether the full attractor contains it (tests compare it with ProductGame's solution). */
    boolean[] wonFlags() {
        boolean[][] out = new boolean[1][];
        Math.toIntExact(slotCount); // a test aid on small games
        run(false, () -> false, out, false, null);
        return out[0];
    }

    /**
     * The attractor. With {@code fifo} (a strategy is recorded) the worklist is first-in first-out,
     * so vertices are won in order of rank (the number of moves in which the robot can force
     * completion, as in {@link AttractorSolver}) and each robot triple's recorded choice leads to a
     * successor of least rank: the policy finishes in the fewest moves in the worst case. Without it
     * the worklist is last-in first-out, which keeps the search near the counters it just touched
     * (the least fixpoint does not depend on the order).
     */
    private Result run(boolean stopAtStart, BooleanSupplier cancelled, boolean[][] flagsOut, boolean fifo,
                       PagedBytes[] countsOut) {
        long start = start();
        if (start < 0 && flagsOut == null && countsOut == null) {
            return new Result(start == -2, 0, 0, false, vertexCount);
        }
        final long n = slotCount;
        final int rc = arena.robotCount();
        final int top = levels - 1;
        final int lb = lBits;
        final int gb = gBits;
        // 4 bits per vertex (out-degrees are at most 15): for a disturbance triple with several outcomes
        // the outcomes known to be won (won at its out-degree); for a robot triple 0 while not won, else
        // 1 + its chosen action's index (targets: 1). Half a byte per vertex keeps the whole table in the
        // last-level cache for products of tens of millions.
        final PagedBytes count = new PagedBytes((n >>> 1) + 1);
        // the worklist holds won robot triples not yet expanded (a won disturbance triple is handled on the
        // spot: its owner is won at once). Any order reaches the same least fixpoint; last-in first-out
        // keeps the search near the counters it just touched, first-in first-out ranks the triples.
        final Worklist wl = new Worklist(this);
        long wonCount = 0;
        final boolean[] flags = flagsOut != null ? new boolean[Math.toIntExact(n)] : null;
        final boolean[] carried = CarriedRound.take(this, count, flags == null);
        // the targets: robot triples completing the mission (any level); the carried ones are won and expanded
        int[] targets = Completions.of(arena, goal);
        for (int i = 0; i < targets.length; i += 2) {
            if (carried != null && carried[targets[i]]) {
                continue;
            }
            long base = id(targets[i], targets[i + 1], 0);
            for (int s = 0; s < levels; s++) {
                long t = base + s;
                count.set(t >>> 1, (byte) (count.get(t >>> 1) | (1 << ((t & 1) << 2))));
                wl.push(t);
                if (flags != null) {
                    flags[(int) t] = true;
                }
            }
        }
        long edges = 0;
        int steps = 0;
        boolean stopped = false;
        // per cent of the robot triples expanded: a bound, as the attractor may stop or win fewer
        Progress.Tracker progress = Progress.phase("solving the game at floor " + monitor.floorUnits() + " units",
                vertexCount / Math.max(1, arena.vertexCount()) * rc);
        long expanded = 0;
        // in the strengthened game the left-out outcomes count as won only once the real ones are exhausted:
        // first the attractor of the weakened game (left-out lost), then, if the start is not won yet, every
        // left-out outcome is won at once and the attractor goes on. The region is the strengthened game's
        // (the least fixpoint does not depend on the order), and a recorded choice relies on a left-out
        // closure only where the robot cannot win without one (fewer phases for PhasedLastingSolver to add).
        boolean seeded = leftOutOf == null;
        boolean intoCarried = carried == null;
        expand:
        while (true) {
            if (!intoCarried) {
                intoCarried = true;
                long[] tally = {0};
                boolean hit = CarriedRound.countIntoCarried(this, count, wl, carried, start, stopAtStart, tally);
                wonCount += tally[0];
                if (hit) {
                    stopped = true;
                    break expand;
                }
            }
            while (!wl.isEmpty()) {
                long p = wl.pop(fifo);
                if ((++expanded & (Progress.EVERY - 1)) == 0) {
                    progress.at(expanded);
                }
                int s2 = levelOf(p);
                int g2 = goalOf(p);
                int x = vertexOf(p);
                int from = arena.inBegin(x);
                int to = arena.inEnd(x);
                edges += to - from;
                // a robot triple: predecessors are disturbance triples (d, g, s) with an outcome d -> x
                int cell = arena.cell(x);
                int gFrom = inverse.begin(cell, g2);
                int gTo = inverse.end(cell, g2);
                for (int i = from; i < to; i++) {
                    int d = revSource[i];
                    int w = revWeight[i];
                    int need = revNeed[i];
                    int sLo;
                    int sHi;
                    if (s2 < top) {
                        sLo = s2 - w;
                        sHi = sLo;
                    } else if (w >= 0) {
                        sLo = Math.max(0, top - w);
                        sHi = top;
                    } else {
                        continue;
                    }
                    if (sLo < 0 || sHi > top) {
                        continue;
                    }
                    long dBase = (long) d << gb;
                    int owner = ownerOf[d - rc];
                    long oBase = (long) owner << gb;
                    int choice = (actionIndex[d - rc] + 1);
                    for (int j = gFrom; j < gTo; j++) {
                        int gj = inverse.state(j);
                        long base = (dBase | gj) << lb;
                        long ob = (oBase | gj) << lb;
                        for (int s = sLo; s <= sHi; s++) {
                            if (need > 1) {
                                // an action the disturbance can spoil: won once all its outcomes are
                                long q = base + s;
                                if (!NibbleCounters.wonByOneMore(count, q, need)) {
                                    continue;
                                }
                                if (flags != null) {
                                    flags[(int) q] = true;
                                }
                            } else if (flags != null) {
                                flags[(int) (base + s)] = true;
                            }
                            // (d, gj, s) is won now. An action with one outcome needs no counter: its only
                            // successor is the robot triple just expanded, which is expanded once. Its owner
                            // (same goal state and level) is won by it unless already won; the owner's counter
                            // records the choice, 1 + the index of d among the owner's out-edges (at most 15).
                            // The worklist holds robot triples only, so first-in first-out takes them in
                            // order of rank and the first won action of an owner is one of least rank.
                            wonCount++;
                            edges++;
                            long o = ob + s;
                            if (NibbleCounters.winOwner(count, wl, flags, o, choice) && o == start && stopAtStart) {
                                stopped = true;
                                break expand;
                            }
                        }
                    }
                }
                if (++steps == AttractorSolver.POLL_INTERVAL) {
                    steps = 0;
                    if (cancelled.getAsBoolean()) {
                        throw new CancellationException("solving was cancelled");
                    }
                }
            }
            if (seeded) {
                break;
            }
            seeded = true;
            if (flags == null) {
                CarriedRound.hold(this, count.length(), true); // the copy is held on top, counted before it is made
                weakened = NibbleCounters.copyOf(count); // the weakened fixpoint, for the next round (carryFrom)
            }
            for (int d = rc; d < arena.vertexCount(); d++) {
                int lo = leftOutOf[d - rc];
                if (lo == 0) {
                    continue;
                }
                int need = arena.outEnd(d) - arena.outBegin(d);
                int choice = actionIndex[d - rc] + 1;
                for (int g = 0; g < gc; g++) {
                    long base = id(d, g, 0);
                    long ob = id(ownerOf[d - rc], g, 0);
                    for (int s = 0; s < levels; s++) {
                        long q = base + s;
                        int qs = ((int) q & 1) << 2;
                        int cell8 = count.get(q >>> 1);
                        int c = (cell8 >>> qs) & 15;
                        if (c >= need || c + lo < need) {
                            count.set(q >>> 1, (byte) (cell8 + (c >= need ? 0 : lo << qs)));
                            continue; // won already, or still waiting for real outcomes
                        }
                        count.set(q >>> 1, (byte) (cell8 + (lo << qs)));
                        wonCount++;
                        if (flags != null) {
                            flags[(int) q] = true;
                        }
                        long o = ob + s;
                        if (NibbleCounters.winOwner(count, wl, flags, o, choice) && o == start && stopAtStart) {
                            stopped = true;
                            break expand;
                        }
                    }
                }
            }
        }
        progress.done();
        if (flagsOut != null) {
            flagsOut[0] = flags;
        }
        if (countsOut != null) {
            countsOut[0] = count;
        }
        boolean won = start == -2 || start >= 0 && (stopped || ((count.get(start >>> 1) >>> ((start & 1) << 2)) & 15) > 0);
        return new Result(won, wonCount + wl.pushed(), edges, stopped, vertexCount);
    }

    /** Breadth-first search over the implicit product from the start: vertices reached and edges scanned. */
    public Result bfs() {
        return ImplicitWalks.bfs(this);
    }
}
