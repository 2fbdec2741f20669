package dockline.solve.discounted;

import dockline.arena.Action;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.goal.GoalAutomaton;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Rational;
import dockline.monitor.DiscountedComparator;
import dockline.monitor.Monitor;
import dockline.monitor.PairMonitor;
import dockline.monitor.ReserveMonitor;
import dockline.solve.Verdict;
import dockline.solve.game.GameGraph;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The threshold solver for the discounted objective (missions/README.md, "The discounted objective"): arena x
 * goal automaton x
 * {@link DiscountedComparator} (and, by default, x {@link ReserveMonitor}, side by side in a
 * {@link PairMonitor}), solved as one reachability game by the linear-time attractor.
 *
 * <p>The robot wins when every play it cannot avoid reaches a moment where the tasks are done, the
 * robot is on a dock and the comparator accepts at completion (and, when the reserve is kept, the
 * battery was never below the floor). That moment ends the mission; the energy deltas are 0 from
 * then on, so the score is the partial sum so far, which the comparator decides exactly: a gap of at
 * least 0 for {@code >=}, a positive gap (or the accepting sink reached earlier) for {@code >}. The
 * comparator's losing sink ({@code >=}: the gap fell below {@code -mu/(d-1)}) loses at once. This is
 * reachability of {@link ProductGame#WIN} while avoiding {@link ProductGame#LOSE}, as the generic
 * product builds it; note that, as there, being on a dock with the tasks done while the score is
 * still short does not end the mission: the robot may go on (charge, say) and finish later. The method follows the
 * published work on satisficing (threshold) problems in quantitative games (2021).
 *
 * <p>The score reads the arena's energy deltas step by step (moves and waits negative, charging
 * positive); it does not know the battery's capacity, so charging on a full battery still scores its
 * rate. The reserve floor is the battery's own condition; keeping both (the default) means the
 * verdict promises both.
 *
 * <p>Cost: O(|V| + |E|) of the product to build and solve; the optional baseline adds value
 * iteration on the arena ({@link DiscountedValueIteration}).
 */
public final class DiscountedSolver {

    /** Longest nominal plan reported. */
    static final int MAX_PLAN = 100_000;

    private DiscountedSolver() {
    }

    /**
     * Analyses a mission with a discounted objective.
     *
     * @throws ProductTooLargeException                   if the product game is over the memory budget
     * @throws java.util.concurrent.CancellationException if the options' cancellation flag was raised
     * @throws ArithmeticException                        if the threshold is too large for exact 64-bit comparator arithmetic
     * @throws IllegalArgumentException                   if the mission breaks an invariant of the arena or goal
     */
    public static DiscountedAnalysis analyse(Mission mission, Objective.Discounted objective, DiscountedOptions options) {
        long t0 = System.nanoTime();
        return analyse(mission, ArenaCompiler.compile(mission), GoalAutomaton.of(mission), objective, options, t0);
    }

    /** As {@link #analyse(Mission, Objective.Discounted, DiscountedOptions)} on an arena and goal already compiled from the mission. */
    public static DiscountedAnalysis analyse(Mission mission, Arena arena, GoalAutomaton goal,
                                             Objective.Discounted objective, DiscountedOptions options) {
        return analyse(mission, arena, goal, objective, options, System.nanoTime());
    }

    private static DiscountedAnalysis analyse(Mission mission, Arena arena, GoalAutomaton goal,
                                              Objective.Discounted objective, DiscountedOptions options, long t0) {
        int mu = arena.maxAbsWeight();
        DiscountedComparator comparator = DiscountedComparator.of(objective, mu);
        Monitor monitor = comparator;
        if (options.keepReserve()) {
            monitor = new PairMonitor(new ReserveMonitor(mission.reserveUnits(), mission.capacityUnits(),
                    mission.startUnits()), comparator);
        }
        List<String> notes = new ArrayList<>();
        ProductGame game = ProductGame.fromStart(arena, goal, monitor, options.product());
        Solution sol = options.solver().create(game.graph(), options.product().cancelled()).solve();
        boolean won = sol.winning(game.start());
        long solved = System.nanoTime();

        Optional<Rational> worst = Optional.empty();
        List<Action> plan = List.of();
        if (won) {
            try {
                worst = Optional.of(worstCaseScore(game, sol, objective.discount()));
            } catch (ArithmeticException e) {
                notes.add("worst-case score not shown: it needs more than 64-bit rationals");
            }
            plan = nominalPlan(game, sol);
        }

        Optional<DiscountedAnalysis.Baseline> baseline = Optional.empty();
        if (options.alsoOptimise()) {
            baseline = baseline(arena, goal, objective, notes);
        }
        long t1 = System.nanoTime();
        return new DiscountedAnalysis(mission, objective, Verdict.of(won), mu, options.keepReserve(),
                comparator.stateCount(), comparator.stateBound(), game.vertexCount(), game.edgeCount(),
                game.estimate(), millis(game.buildNanos()), millis(solved - t0), millis(t1 - t0), worst, plan,
                baseline, game, sol, notes);
    }

    private static Optional<DiscountedAnalysis.Baseline> baseline(Arena arena, GoalAutomaton goal,
                                                                  Objective.Discounted objective, List<String> notes) {
        DiscountedValueIteration vi = new DiscountedValueIteration(arena, objective.discount());
        DiscountedValueIteration.Result decided;
        try {
            decided = vi.decide(objective.threshold(), objective.relation());
        } catch (ArithmeticException e) {
            notes.add("optimisation baseline undecided: " + e.getMessage());
            return Optional.empty();
        }
        Optional<Rational> value = Optional.empty();
        Optional<Boolean> completes = Optional.empty();
        try {
            DiscountedValueIteration.Result best = vi.solve();
            value = Optional.of(best.exactValue());
            completes = Optional.of(playCompletes(arena, goal, best.play()));
        } catch (ArithmeticException e) {
            notes.add("optimal value not pinned exactly: " + e.getMessage());
        }
        return Optional.of(new DiscountedAnalysis.Baseline(decided.holds(), decided.lower(), decided.upper(), value,
                completes, decided.sweeps()));
    }

    /**
     * Whether a lasso play of robot vertices (from the start) ever completes the mission: the goal
     * automaton is run along the prefix and enough rounds of the loop (task progress only grows,
     * so {@code tasks + 1} rounds show every change). O(length x tasks).
     */
    public static boolean playCompletes(Arena arena, GoalAutomaton goal, DiscountedValueIteration.Lasso play) {
        int[] v = play.vertices();
        int loop = v.length - play.loopStart();
        int len = play.loopStart() + (goal.taskCount() + 1) * loop;
        int g = goal.initial(arena.cellZones(arena.cell(v[0])));
        for (int i = 0; i < len; i++) {
            int r = i < v.length ? v[i] : v[play.loopStart() + (i - play.loopStart()) % loop];
            if (i > 0) {
                g = goal.step(g, arena.cellZones(arena.cell(r)));
            }
            if (g == GoalAutomaton.REJECT) {
                return false;
            }
            if (goal.accepting(g, arena.isDock(arena.cell(r)))) {
                return true;
            }
        }
        return false;
    }

    /**
     * The lowest discounted score the disturbance can force while the robot follows the solution's
     * strategy: dynamic programming over the closed loop, which is acyclic (the strategy strictly
     * lowers the attractor rank) and ends in {@link ProductGame#WIN}, after which the weights are 0.
     * score(robot p) = score(chosen successor); score(disturbance p) = min over outcomes of
     * {@code w + score(next)/d}; score(WIN) = 0. Exact rationals; O(closed loop).
     *
     * @throws ArithmeticException if a value does not fit 64-bit rationals
     */
    static Rational worstCaseScore(ProductGame game, Solution sol, int d) {
        GameGraph g = game.graph();
        int n = game.vertexCount();
        Rational[] score = new Rational[n];
        score[ProductGame.WIN] = Rational.ZERO;
        // iterative post-order over the closed loop; a vertex may be pushed once per in-edge
        int[] stack = new int[g.edgeCount() + 1];
        int top = 0;
        stack[top++] = game.start();
        byte[] state = new byte[n]; // 0 new, 1 children pushed, 2 scored
        state[ProductGame.WIN] = 2;
        Rational oneOverD = Rational.of(1, d);
        while (top > 0) {
            int p = stack[top - 1];
            if (state[p] == 0) {
                state[p] = 1;
                if (g.isRobot(p)) {
                    push(stack, top++, state, sol.strategyEdge(p), g);
                } else {
                    for (int e = g.outBegin(p); e < g.outEnd(p); e++) {
                        int t = g.target(e);
                        if (state[t] == 0) {
                            stack[top++] = t;
                        }
                    }
                }
                continue;
            }
            top--;
            if (state[p] == 2) {
                continue;
            }
            if (p == ProductGame.LOSE) {
                throw new IllegalStateException("the strategy's closed loop reaches the losing sink");
            }
            if (g.isRobot(p)) {
                score[p] = score[g.target(sol.strategyEdge(p))];
            } else {
                Rational worst = null;
                for (int e = g.outBegin(p); e < g.outEnd(p); e++) {
                    int w = game.arena().weight(game.arenaEdge(p, e));
                    Rational c = Rational.of(w).add(score[g.target(e)].multiply(oneOverD));
                    if (worst == null || c.compareTo(worst) < 0) {
                        worst = c;
                    }
                }
                score[p] = worst;
            }
            state[p] = 2;
        }
        return score[game.start()];
    }

    private static void push(int[] stack, int top, byte[] state, int edge, GameGraph g) {
        if (edge < 0) {
            throw new IllegalStateException("winning robot vertex without a chosen edge");
        }
        stack[top] = g.target(edge);
    }

    /** The robot's actions when every outcome is nominal (the first outcome of each action). */
    static List<Action> nominalPlan(ProductGame game, Solution sol) {
        GameGraph g = game.graph();
        List<Action> plan = new ArrayList<>();
        int p = game.start();
        while (p != ProductGame.WIN && p != ProductGame.LOSE && plan.size() < MAX_PLAN) {
            if (g.isRobot(p)) {
                int d = g.target(sol.strategyEdge(p));
                plan.add(game.arena().action(game.arenaVertex(d)));
                p = d;
            } else {
                p = g.target(g.outBegin(p));
            }
        }
        return plan;
    }

    private static long millis(long nanos) {
        return nanos / 1_000_000;
    }
}
