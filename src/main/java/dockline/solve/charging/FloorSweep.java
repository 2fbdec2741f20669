package dockline.solve.charging;

import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.solve.game.MinMaxSearch;
import dockline.util.IntArrayList;
import dockline.util.PackedMinHeap;
import dockline.util.Progress;
import java.util.Arrays;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Every floor at once: one pass that gives, for a reserve mission with charging, the least charge
 * needed at the mission's floor, the highest floor that can be guaranteed from the start and the
 * threshold policy at any floor it passed, without solving the game once per floor.
 *
 * <p><b>What a floor changes.</b> With floor f and capacity C, a charging dock position is good
 * (charging there to full wins) when its consumption need without charging, towards completion and the
 * docks good at f, is at most C − f ({@link ChargingSolver}, points 3 and 4). So the floor changes only
 * the set of good docks, and these sets are nested: a lower floor keeps every good dock good. Write
 * φ(d) for the highest floor at which dock position d is good ("its floor"). For a set D of docks let
 * c<sub>D</sub>(p) be the min-max consumption from position p to completion or a dock of D (Knuth's
 * min-max Dijkstra with those targets). Then at floor f the need of p is c<sub>D(f)</sub>(p) with
 * D(f) = {d : φ(d) ≥ f}, when it is at most C − f, and ∞ otherwise.
 *
 * <p><b>The docks in decreasing floor.</b> Suppose D holds the docks found so far, all with floors at
 * least every other dock's, and φ<sub>last</sub> is the lowest floor in D. For another dock d,
 * key(d) = min(φ<sub>last</sub>, C − c<sub>D</sub>(d)) is a lower bound of φ(d) (at that floor every dock of
 * D is good, so d reaches good docks within C − key), and the largest key is exact: let f' be the
 * highest floor of a dock outside D; the docks of floor f' win at f' by reaching completion, D or
 * each other, and by the rank of the least fixpoint one of them reaches completion or D first without
 * another of them, so its key is at least f' (and no key exceeds its floor). So the docks are found in
 * decreasing floor by a priority queue over c<sub>D</sub>: add the dock of least c<sub>D</sub>, give it
 * need 0, and lower the values it lowers (a "batch"), then repeat. Batch 0 has completion alone as
 * target.
 *
 * <p><b>The figures.</b> The start (level s) wins at floor f iff c<sub>D(f)</sub>(start) ≤ s − f. After
 * batch k, with D<sub>k</sub> the docks added so far and φ<sub>k</sub> the last one's floor (∞ for
 * batch 0), term<sub>k</sub> = min(φ<sub>k</sub>, s − c<sub>D<sub>k</sub></sub>(start)) is a floor that
 * wins (every dock of D<sub>k</sub> is good there), and the highest floor is the largest term: at the
 * highest floor f* the good docks are exactly some D<sub>k</sub> with φ<sub>k</sub> ≥ f*, whose term is
 * then at least f*. Terms after a dock of floor φ are at most φ, so the pass stops once the next key
 * is at most the best term and the need at the mission's floor is known: it is read when the next key
 * first falls below that floor (every dock good there has been added), or as soon as the start's need
 * is 0 after a batch whose docks are all good at that floor (values only fall, and 0 is the least).
 *
 * <p><b>Lowering values.</b> Values only fall (more targets). A batch is a label-correcting
 * Dijkstra ({@link MinMaxSearch} with a relaxation of its own): a robot position taken from the queue recomputes each disturbance position before it
 * (max over its outcomes of need − delta, ∞ above C), and improves that position's owner. A
 * disturbance position is recomputed only when none of its outcomes waits in the queue, so a robot
 * position's value is set only from values already taken from the queue, and since every delta is at
 * most 0 (charge steps are the docks' business) keys leave the queue in increasing order and a
 * position leaves it at most once per batch, with its final value of that batch.
 *
 * <p><b>Policy.</b> Each time a robot position leaves the queue its value and action are appended to a
 * history. The threshold policy at a floor f is the history up to the end of a batch whose docks are
 * all good at f: per position its entries in order (thresholds falling), and at level λ above the floor
 * the first entry whose threshold is at most λ; a good dock below all of its entries charges. Along a
 * play the entries used have strictly earlier places in the history (an entry's action leads to
 * positions whose values were taken from the queue before it, whose first entry at or below the new
 * level is no later; a good dock's own entries predate its addition, which predates any entry that
 * used it as a target), so plays end and keep λ ≥ 0: the ranking argument of attractor strategies
 * (Grädel, Thomas and Wilke 2002, "Automata, Logics, and Infinite Games", ch. 2).
 *
 * <p><b>Cost.</b> Batch 0 is one Dijkstra over arena × goal; each later batch touches only the positions
 * whose value the new dock lowers. With n robot positions, m edges of arena × goal, out-degree at most
 * δ and a history of H entries: O((H·δ + docks)·log n + m·δ) time, 4 bytes per robot position (need),
 * 1 bit for queued, 1 byte of choice, 12 bytes per history entry and the queues. Nothing depends on the
 * number of battery levels except the size of the numbers: at ten times the resolution the same game
 * has every figure times ten, the same keys in the same order and the same batches.
 */
public final class FloorSweep extends MinMaxSearch {

    private final ChargingSolver solver;
    private final int capacity;
    /** Whether an outcome into a left-out phase ({@link ArenaCompiler#LEFT_OUT}) is skipped in a disturbance max. */
    private final boolean leftOutWins;

    private final boolean[] pending;
    private final boolean[] good;
    private final PackedMinHeap docks;

    private final IntArrayList histPos = new IntArrayList(1 << 16);
    private final IntArrayList histNeed = new IntArrayList(1 << 16);
    private final IntArrayList histEdge = new IntArrayList(1 << 16);
    /** Docks in the order added (their position), and the history length after each batch (index 0: batch 0). */
    private final IntArrayList added = new IntArrayList(64);
    private final IntArrayList batchEnd = new IntArrayList(64);
    private long recomputations;
    private int pops; // queue pops, for polling the solver's cancellation flag

    /**
     * The result of one pass.
     *
     * @param capacityUnits     capacity C
     * @param floorUnits        the mission's floor
     * @param startUnits        the starting level (at most C)
     * @param startNeed         the start's least charge above the mission's floor, or {@link ChargingSolver#INFINITE}
     * @param highestFloorUnits highest floor guaranteed from the start, empty when none
     * @param floorBatches      batches whose docks are good at the mission's floor (history prefix of its policy)
     * @param highestBatches    batches of the policy at the highest floor
     * @param batches           batches run in all (batch 0 included)
     * @param historyEntries    entries of the history
     * @param recomputations    disturbance positions recomputed (the pass's work besides the queue)
     */
    public record Result(int capacityUnits, int floorUnits, int startUnits, int startNeed,
                         OptionalInt highestFloorUnits, int floorBatches, int highestBatches, int batches,
                         int historyEntries, long recomputations) {
    }

    private final Result result;

    /** The pass gives up once its highest floor cannot reach this (-1: never). */
    private final int giveUpBelow;
    private boolean gaveUp;
    /** Whether the pass adds every dock good at the mission's floor and then stops ({@link #needsAtFloor}). */
    private final boolean everyPosition;

    private FloorSweep(ChargingSolver solver, int capacity, int floor, int start, boolean leftOutWins,
                       int giveUpBelow, boolean everyPosition) {
        super(solver.arena(), solver.goal(), solver.inverse());
        this.solver = solver;
        this.capacity = capacity;
        this.leftOutWins = leftOutWins;
        this.giveUpBelow = giveUpBelow;
        this.everyPosition = everyPosition;
        int robotN = positions();
        this.pending = new boolean[robotN];
        this.good = new boolean[robotN];
        this.docks = new PackedMinHeap(1 << 10);
        this.result = run(floor, Math.min(start, capacity));
    }

    /**
     * Runs the pass for the given capacity, mission floor and starting level (units).
     *
     * @throws IllegalArgumentException if the floor is negative or above the capacity
     */
    public static FloorSweep run(ChargingSolver solver, int capacity, int floor, int start) {
        return run(solver, capacity, floor, start, false);
    }

    /**
     * As {@link #run(ChargingSolver, int, int, int)}; with {@code leftOutWins} on a restricted arena
     * ({@link ArenaCompiler#compileWithin}) the pass solves the <em>strengthened</em> game: an outcome into a
     * left-out phase (energy change {@link ArenaCompiler#LEFT_OUT}) is not the building's to choose, so it is
     * left out of the disturbance position's maximum (the nominal outcome always remains). The building can
     * then do no more than in the mission: every need is a lower bound of the mission's, the highest floor an
     * upper bound, and a start lost there is lost in the mission. Off, such an outcome loses (the
     * <em>weakened</em> game, whose wins are real). On an arena without left-out outcomes both are the same.
     *
     * @throws IllegalArgumentException if the floor is negative or above the capacity
     */
    public static FloorSweep run(ChargingSolver solver, int capacity, int floor, int start, boolean leftOutWins) {
        if (floor < 0 || floor > capacity) {
            throw new IllegalArgumentException("reserve floor " + floor + " units is outside 0.." + capacity);
        }
        return new FloorSweep(solver, capacity, floor, start, leftOutWins, -1, false);
    }

    /**
     * The pass of the weakened game ({@link #run(ChargingSolver, int, int, int, boolean)} with {@code leftOutWins}
     * off) when its highest floor is at least {@code atLeast}; empty as soon as it cannot be (every term after
     * a dock of floor φ is at most φ, so once the next dock's key is below {@code atLeast} and no term has reached
     * it, none will), which saves the rest of the docks.
     *
     * @throws IllegalArgumentException if the floor is negative or above the capacity, or {@code atLeast} is negative
     */
    public static Optional<FloorSweep> runReaching(ChargingSolver solver, int capacity, int floor, int start,
                                                   int atLeast) {
        if (floor < 0 || floor > capacity || atLeast < 0) {
            throw new IllegalArgumentException("reserve floor " + floor + " units outside 0.." + capacity
                    + " or a negative target floor " + atLeast);
        }
        FloorSweep sweep = new FloorSweep(solver, capacity, floor, start, false, atLeast, false);
        return sweep.gaveUp ? Optional.empty() : Optional.of(sweep);
    }

    /**
     * Every position's least charge above {@code floor}, exact everywhere (not only at the start): the pass runs
     * until every dock good at that floor has been added (the next dock's key is below it), without the early
     * stop once the start's need is 0 and without the docks of lower floors. With {@code leftOutWins} the
     * strengthened game of a restricted arena (its needs are lower bounds of the mission's), else the weakened
     * one (upper bounds); on a whole arena both are the mission's needs. Cost: one pass up to that floor.
     *
     * @throws IllegalArgumentException if the floor is negative or above the capacity
     */
    public static ChargingSolver.Values needsAtFloor(ChargingSolver solver, int capacity, int floor,
                                                     boolean leftOutWins) {
        if (floor < 0 || floor > capacity) {
            throw new IllegalArgumentException("reserve floor " + floor + " units is outside 0.." + capacity);
        }
        FloorSweep sweep = new FloorSweep(solver, capacity, floor, capacity, leftOutWins, -1, true);
        return sweep.values(sweep.result.floorBatches(), capacity - floor);
    }

    public Result result() {
        return result;
    }

    private Result run(int floor, int start) {
        final int INF = ChargingSolver.INFINITE;
        Arrays.fill(need, INF);
        long dockPositions = 0;
        for (int p = 0; p < need.length; p++) {
            dockPositions += arena.isDock(arena.cell(p / gc)) ? 1 : 0;
            if (completes(p)) {
                need[p] = 0;
                pending[p] = true;
                heap.push(0, p);
            }
        }
        int g0 = solver.startGoal();
        int startP = g0 == GoalAutomaton.REJECT ? -1 : arena.startVertex() * gc + g0;
        // progress: the docks added so far of all dock positions (the pass usually stops well before the last)
        Progress.Tracker progress = Progress.phase("charging route: docks in decreasing floor", Math.max(1, dockPositions));
        drain();
        batchEnd.add(histPos.size());

        int best = -1;
        int bestBatches = -1;
        int floorNeed = INF;
        int floorBatches = -1;
        long phi = Long.MAX_VALUE; // the last added dock's floor; "infinite" after batch 0
        while (true) {
            int sNeed = startP < 0 ? INF : need[startP];
            if (!everyPosition && floorBatches < 0 && sNeed == 0 && phi >= floor) {
                // the start's need cannot fall below 0, and every dock added so far is good at the floor: the
                // need at the floor is known without adding the rest of the docks good there
                floorNeed = 0;
                floorBatches = batchEnd.size();
            }
            if (sNeed != INF && sNeed <= start) {
                long term = Math.min(phi, start - sNeed);
                if (term > best) {
                    best = (int) term;
                    bestBatches = batchEnd.size();
                }
            }
            int next = nextDock();
            long key = next < 0 ? -1 : Math.min(phi, capacity - need[next]);
            if (best < giveUpBelow && key < giveUpBelow) {
                gaveUp = true; // no later term reaches it (runReaching)
                break;
            }
            if (floorBatches < 0 && key < floor) {
                floorNeed = sNeed == INF || sNeed > capacity - floor ? INF : sNeed;
                floorBatches = batchEnd.size();
            }
            if (next < 0 || floorBatches >= 0 && (key <= best || everyPosition)) {
                break;
            }
            phi = key;
            good[next] = true;
            need[next] = 0;
            added.add(next);
            pending[next] = true;
            heap.push(0, next);
            drain();
            batchEnd.add(histPos.size());
            progress.at(added.size());
        }
        progress.done();
        return new Result(capacity, floor, start, floorNeed, best < 0 ? OptionalInt.empty() : OptionalInt.of(best),
                floorBatches, bestBatches, batchEnd.size(), histPos.size(), recomputations);
    }

    /** The not yet added dock position of least need (largest key), or -1 when none can be good at floor 0. */
    private int nextDock() {
        while (!docks.isEmpty()) {
            long top = docks.peek();
            int x = (int) (top >>> 32);
            int p = (int) top;
            if (good[p] || x != need[p]) {
                docks.poll(); // stale
                continue;
            }
            return p;
        }
        return -1;
    }

    /** One batch: lowers every value the targets in the queue lower (class comment, "Lowering values"). */
    private void drain() {
        drain(INFINITE, -1, Progress.Tracker.NONE);
    }

    /** A robot position leaves the queue: its value and action go to the history; a charging dock is a candidate. */
    @Override
    protected boolean settle(int u, int x) {
        solver.poll(++pops);
        if (x != need[u] || !pending[u]) {
            return false;
        }
        pending[u] = false;
        if (!good[u] && !completes(u)) {
            int r = u / gc;
            histPos.add(u);
            histNeed.add(x);
            histEdge.add(chosenEdge(u));
            if (solver.chargeEdge(r) >= 0) {
                docks.push(x, u);
            }
        }
        return true;
    }

    /** Recomputes disturbance position (d, g) from its outcomes and improves its owner (class comment). */
    @Override
    protected void relax(int d, int dp, int g, long cost) {
        int ownerEdge = ownerEdge(d);
        int owner = arena.source(ownerEdge);
        int rp = owner * gc + g;
        int current = need[rp];
        if (current == 0) {
            return; // completion or good dock: nothing to improve
        }
        recomputations++;
        long val = 0;
        boolean leftOut = false;
        for (int f = arena.outBegin(d), oEnd = arena.outEnd(d); f < oEnd; f++) {
            if (leftOutWins && arena.weight(f) == ArenaCompiler.LEFT_OUT) {
                leftOut = true;
                continue; // the strengthened game: not the building's to choose (see run)
            }
            int t = arena.target(f);
            int gt = goal.step(g, arena.cellZones(arena.cell(t)));
            if (gt == GoalAutomaton.REJECT) {
                return;
            }
            int tp = t * gc + gt;
            int n = need[tp];
            if (n == INFINITE || pending[tp]) {
                return; // unknown yet (pending: recomputed when it leaves the queue)
            }
            val = Math.max(val, (long) n - arena.weight(f));
        }
        if (val > capacity) {
            return;
        }
        int y = (int) val;
        if (y < current) {
            pending[rp] = true;
            improve(rp, owner, ownerEdge, y);
        } else if (leftOutWins && !leftOut && y == current && pending[rp] && reliesOnLeftOut(rp)) {
            // as good, and without relying on a left-out phase: the refinement then needs fewer phases (the
            // position is not settled yet, and the value and its queue entry stay as they are)
            choice[rp] = (byte) (1 + ownerEdge - arena.outBegin(owner));
        }
    }

    /** Whether robot position p's chosen action has an outcome into a left-out phase. O(out-degree). */
    private boolean reliesOnLeftOut(int p) {
        int d = arena.target(chosenEdge(p));
        for (int f = arena.outBegin(d); f < arena.outEnd(d); f++) {
            if (arena.weight(f) == ArenaCompiler.LEFT_OUT) {
                return true;
            }
        }
        return false;
    }

    /**
     * The needs and the threshold policy at a floor: the history of the first {@code batches} batches,
     * with the docks they added good. The floor must be one at which all of those docks are good
     * ({@link Result#floorBatches()} for the mission's floor, {@link Result#highestBatches()} for the highest).
     *
     * @param usable capacity minus that floor (needs above it are ∞)
     * @throws IllegalArgumentException if {@code batches} is outside 1..{@link Result#batches()}
     */
    public ChargingSolver.Values values(int batches, int usable) {
        if (batches < 1 || batches > batchEnd.size()) {
            throw new IllegalArgumentException("batches " + batches + " outside 1.." + batchEnd.size());
        }
        int n = need.length;
        int[] v = new int[n];
        Arrays.fill(v, ChargingSolver.INFINITE);
        boolean[] g = new boolean[n];
        for (int p = 0; p < n; p++) {
            if (completes(p)) {
                v[p] = 0;
            }
        }
        int t = batchEnd.get(batches - 1);
        int keep = 0;
        for (int i = 0; i < t; i++) {
            if (histNeed.get(i) <= usable) {
                keep++;
            }
        }
        int[] pos = new int[keep];
        int[] nd = new int[keep];
        int[] ed = new int[keep];
        int k = 0;
        for (int i = 0; i < t; i++) {
            int x = histNeed.get(i);
            if (x <= usable) {
                int p = histPos.get(i);
                pos[k] = p;
                nd[k] = x;
                ed[k] = histEdge.get(i);
                k++;
                v[p] = x;
            }
        }
        int docksGood = batches - 1;
        for (int i = 0; i < docksGood; i++) {
            int p = added.get(i);
            g[p] = true;
            v[p] = 0;
        }
        return solver.values(usable, v, g, batches, docksGood, pos, nd, ed);
    }
}
