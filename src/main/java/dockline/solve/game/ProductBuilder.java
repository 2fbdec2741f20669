package dockline.solve.game;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.monitor.Monitor;
import dockline.solve.ProductOptions;
import dockline.solve.ProductTooLargeException;
import dockline.solve.SizeEstimate;
import dockline.util.Progress;
import java.util.Arrays;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * How a {@link ProductGame} is built: the breadth-first exploration of arena × goal × monitor from its roots,
 * and the index that numbers the triples it meets (a direct array for monitors whose states lie below a bound,
 * else open addressing with linear probing). O(|V| + |E|) time, one look-up per edge; the size is estimated
 * first and the build refused over the memory budget (see {@link ProductGame}, which documents the product).
 */
final class ProductBuilder {

    private ProductBuilder() {
    }

    // ---------------------------------------------------------------- index

    interface Index {
        int find(int a, int g, int m);
    }

    static final class DenseIndex implements Index {
        private final int[] slot; // id + 1, 0 = absent
        private final int gs;
        private final int ms;

        DenseIndex(int slots, int gs, int ms) {
            this.slot = new int[slots];
            this.gs = gs;
            this.ms = ms;
        }

        int key(int a, int g, int m) {
            if (m < 0 || m >= ms) {
                throw new IllegalStateException("monitor state " + m + " outside 0.." + (ms - 1)
                        + ": the direct index needs a monitor whose states lie below stateBound()");
            }
            return (a * gs + g) * ms + m;
        }

        @Override
        public int find(int a, int g, int m) {
            if (a < 0 || g < 0 || m < 0 || m >= ms || g >= gs) {
                return -1;
            }
            long k = ((long) a * gs + g) * ms + m;
            return k < slot.length ? slot[(int) k] - 1 : -1;
        }
    }

    /** Open addressing with linear probing; keys live in the vertex arrays, the table holds id + 1. */
    static final class HashIndex implements Index {
        private int[] table;
        private int mask;
        private int size;
        private final Builder b;

        HashIndex(Builder b, int expected) {
            this.b = b;
            int cap = Integer.highestOneBit(Math.max(16, expected) * 2 - 1) << 1;
            table = new int[Math.max(16, cap)];
            mask = table.length - 1;
        }

        static int hash(int a, int g, int m) {
            long h = a * 0x9E3779B97F4A7C15L;
            h ^= (g + 0x632BE59BD9B4E019L) * 0xC2B2AE3D27D4EB4FL;
            h ^= (m + 0x165667B19E3779F9L) * 0x94D049BB133111EBL;
            h ^= h >>> 31;
            return (int) (h ^ (h >>> 29));
        }

        @Override
        public int find(int a, int g, int m) {
            int i = hash(a, g, m) & mask;
            while (true) {
                int id = table[i] - 1;
                if (id < 0) {
                    return -1;
                }
                if (b.vA[id] == a && b.vG[id] == g && b.vM[id] == m) {
                    return id;
                }
                i = (i + 1) & mask;
            }
        }

        /** Inserts a new id whose triple is already in the vertex arrays. */
        void insert(int id) {
            if (2 * (size + 1) > table.length) {
                grow();
            }
            place(id);
            size++;
        }

        private void place(int id) {
            int i = hash(b.vA[id], b.vG[id], b.vM[id]) & mask;
            while (table[i] != 0) {
                i = (i + 1) & mask;
            }
            table[i] = id + 1;
        }

        private void grow() {
            int[] old = table;
            if (old.length >= (1 << 30)) {
                throw new ArithmeticException("product hash table is full");
            }
            table = new int[old.length * 2];
            mask = table.length - 1;
            for (int s : old) {
                if (s != 0) {
                    place(s - 1);
                }
            }
        }
    }

    // ---------------------------------------------------------------- builder

    static final class Builder {
        final Arena arena;
        final GoalAutomaton goal;
        final Monitor monitor;
        final boolean everywhere;
        final BooleanSupplier cancelled;
        final long budget;
        final SizeEstimate estimate;
        Index index;
        DenseIndex dense;
        HashIndex hash;

        int[] vA;
        int[] vG;
        int[] vM;
        byte[] owner;
        int n;
        int startId;

        Builder(Arena arena, GoalAutomaton goal, Monitor monitor, ProductOptions options, boolean everywhere) {
            if (arena == null || goal == null || monitor == null || options == null) {
                throw new IllegalArgumentException("arena, goal, monitor and options are required");
            }
            this.arena = arena;
            this.goal = goal;
            this.monitor = monitor;
            this.everywhere = everywhere;
            this.cancelled = options.cancelled();
            this.budget = options.effectiveMemoryBudget();
            this.estimate = ProductSizeEstimate.estimate(arena, goal, monitor, everywhere, options.index());
            if (estimate.bytes() > budget) {
                throw new ProductTooLargeException(estimate, budget, false);
            }
            int initial = (int) Math.min(Math.max(estimate.vertices(), 16), 1 << 20);
            vA = new int[initial];
            vG = new int[initial];
            vM = new int[initial];
            owner = new byte[initial];
            if (estimate.denseSlots() > 0) {
                if (estimate.denseSlots() > ProductGame.MAX_ARRAY || monitor.stateBound() > Integer.MAX_VALUE) {
                    throw new ProductTooLargeException(estimate, budget, false);
                }
                dense = new DenseIndex((int) estimate.denseSlots(), goal.stateCount(), (int) monitor.stateBound());
                index = dense;
            } else {
                hash = new HashIndex(this, initial);
                index = hash;
            }
        }

        ProductGame build() {
            long t0 = System.nanoTime();
            // the sinks
            addRaw(-1, -1, -1, GameGraph.ROBOT);
            addRaw(-1, -1, -1, GameGraph.ROBOT);
            int a0 = arena.startVertex();
            int c0 = arena.cell(a0);
            int g0 = goal.initial(arena.cellZones(c0));
            int m0 = monitor.initialState();
            if (g0 == GoalAutomaton.REJECT || m0 == Monitor.REJECT) {
                startId = ProductGame.LOSE;
            } else if (goal.accepting(g0, arena.isDock(c0)) && monitor.acceptsAtCompletion(m0)) {
                startId = ProductGame.WIN;
            } else {
                startId = intern(a0, g0, m0);
            }
            if (everywhere) {
                addAllRoots();
            }

            IntArray outStart = new IntArray(Math.min(vA.length + 1, 1 << 20));
            IntArray edgeTarget = new IntArray((int) Math.min(Math.max(estimate.edges(), 16), 1 << 22));
            // sinks: self-loops
            outStart.add(0);
            edgeTarget.add(ProductGame.WIN);
            outStart.add(1);
            edgeTarget.add(ProductGame.LOSE);
            int steps = 0;
            // per cent of the estimated vertices built (the estimate is an upper bound)
            Progress.Tracker progress = Progress.phase("building the stored game",
                    estimate.vertices());
            for (int p = 2; p < n; p++) {
                if ((p & (Progress.EVERY - 1)) == 0) {
                    progress.at(p);
                }
                outStart.add(edgeTarget.size());
                int a = vA[p];
                int g = vG[p];
                int m = vM[p];
                int begin = arena.outBegin(a);
                int end = arena.outEnd(a);
                if (arena.isRobot(a)) {
                    for (int e = begin; e < end; e++) {
                        edgeTarget.add(intern(arena.target(e), g, m));
                    }
                } else {
                    for (int e = begin; e < end; e++) {
                        edgeTarget.add(outcome(arena.target(e), g, monitor.step(m, arena.weight(e))));
                    }
                }
                steps += end - begin + 1;
                if (steps >= AttractorSolver.POLL_INTERVAL) {
                    steps = 0;
                    if (cancelled.getAsBoolean()) {
                        throw new CancellationException("building the game was cancelled");
                    }
                    checkBudget(edgeTarget.size());
                }
            }
            outStart.add(edgeTarget.size());
            checkBudget(edgeTarget.size());
            progress.done();
            byte[] own = owner;
            boolean[] target = new boolean[n];
            target[ProductGame.WIN] = true;
            GameGraph graph = new GameGraph(own, target, outStart.array(), edgeTarget.array(), n, edgeTarget.size());
            return new ProductGame(this, graph, System.nanoTime() - t0);
        }

        /** The product vertex an outcome leads to. */
        private int outcome(int a2, int g, int m2) {
            if (m2 == Monitor.REJECT) {
                return ProductGame.LOSE;
            }
            int c2 = arena.cell(a2);
            int g2 = goal.step(g, arena.cellZones(c2));
            if (g2 == GoalAutomaton.REJECT) {
                return ProductGame.LOSE;
            }
            if (goal.accepting(g2, arena.isDock(c2)) && monitor.acceptsAtCompletion(m2)) {
                return ProductGame.WIN;
            }
            return intern(a2, g2, m2);
        }

        private void addAllRoots() {
            int gs = goal.stateCount();
            long ms = monitor.stateBound();
            for (int a = 0; a < arena.robotCount(); a++) {
                int c = arena.cell(a);
                long zones = arena.cellZones(c);
                boolean dock = arena.isDock(c);
                for (int g = 0; g < gs; g++) {
                    int gn = goal.step(g, zones);
                    if (gn == GoalAutomaton.REJECT || gn != g) {
                        continue; // not normalised: the same position is root (a, gn, m)
                    }
                    for (int m = 0; m < ms; m++) {
                        if (goal.accepting(gn, dock) && monitor.acceptsAtCompletion(m)) {
                            continue;
                        }
                        intern(a, gn, m);
                    }
                }
            }
        }

        private void checkBudget(long edges) {
            SizeEstimate sofar = SizeEstimate.of(n, edges, estimate.denseSlots());
            if (sofar.bytes() > budget) {
                throw new ProductTooLargeException(sofar, budget, true);
            }
        }

        private int intern(int a, int g, int m) {
            if (dense != null) {
                int k = dense.key(a, g, m);
                int id = dense.slot[k] - 1;
                if (id < 0) {
                    id = addRaw(a, g, m, arena.isRobot(a) ? GameGraph.ROBOT : GameGraph.DISTURBANCE);
                    dense.slot[k] = id + 1;
                }
                return id;
            }
            int id = hash.find(a, g, m);
            if (id < 0) {
                id = addRaw(a, g, m, arena.isRobot(a) ? GameGraph.ROBOT : GameGraph.DISTURBANCE);
                hash.insert(id);
            }
            return id;
        }

        private int addRaw(int a, int g, int m, byte own) {
            if (n == vA.length) {
                int cap = (int) Math.min(ProductGame.MAX_ARRAY, (long) n + (n >> 1) + 16);
                if (cap <= n) {
                    throw ProductTooLargeException.indexRange(SizeEstimate.of(n, n, 0), n);
                }
                vA = Arrays.copyOf(vA, cap);
                vG = Arrays.copyOf(vG, cap);
                vM = Arrays.copyOf(vM, cap);
                owner = Arrays.copyOf(owner, cap);
            }
            vA[n] = a;
            vG[n] = g;
            vM[n] = m;
            owner[n] = own;
            return n++;
        }
    }
}
