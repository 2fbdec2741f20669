package dockline.certify;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.model.EnergyScale;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.Relation;
import dockline.policy.Policy;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Checks a policy for a discounted mission on its own code path, trusting neither the solver, nor
 * its comparator, nor the goal automaton: only the model, the compiled arena and the policy's data.
 *
 * <p>It builds the {@link DiscountedClosedLoop} of the policy against every disturbance choice and
 * checks (a) every reached situation has a row whose action is legal there; no outcome leaves the
 * battery below the floor (when the floor is kept), puts the robot in an avoided zone, or drops the
 * score out of reach; (b) no cycle avoids completion: the loop is acyclic, decided by a topological
 * order (Kahn 1962) and, for loops of up to {@value #JGRAPHT_LIMIT} states, cross-checked with
 * jgrapht's {@link CycleDetector}; (c) the exact worst discounted score meets the threshold. As the
 * loop is acyclic and ends in completions (weight 0 for ever after), the worst score is a dynamic
 * programme in reverse topological order: {@code worst(x) = 0} at a completion, else the minimum over
 * the outcomes of {@code w + worst(next)/d} — the definition {@code DS = sum w_i / d^i} folded from
 * the end. It is kept exactly in big integers as {@code A(x) / d^E(x)}, {@code E(x)} the most steps
 * from x to completion, and compared with {@code v = p/q} by cross-multiplication. Every completion
 * already requires the score met (the loop's convention), so (c) re-checks the gap bookkeeping with
 * a second, direct computation of the same sums.
 *
 * <p>Cost: O(N + E) look-ups and arithmetic steps for a loop of N states and E outcome edges, the
 * numbers having O(E(x) log d) bits; plus the jgrapht copy for small loops.
 */
public final class DiscountedCertificateChecker {

    /** Largest loop also copied into jgrapht for the second cycle check. */
    public static final int JGRAPHT_LIMIT = CertificateChecker.JGRAPHT_LIMIT;

    private DiscountedCertificateChecker() {
    }

    /**
     * Checks the policy on the mission's arena from its starting charge, with the reserve floor when
     * {@code keepReserve}.
     */
    public static DiscountedCertificate check(Mission mission, Policy policy, Objective.Discounted objective,
                                              boolean keepReserve) {
        return check(ArenaCompiler.compile(mission), policy, objective,
                keepReserve ? OptionalInt.of(mission.reserveUnits()) : OptionalInt.empty(), mission.startUnits());
    }

    /**
     * Checks the policy from the arena's start vertex with the given starting level.
     *
     * @param floorUnits the reserve floor to keep, or empty for the score alone
     * @throws ClosedLoop.TooLargeException if the loop exceeds {@link ClosedLoop#DEFAULT_MAX_NODES}
     * @throws ArithmeticException          if a score gap does not fit 64-bit arithmetic
     */
    public static DiscountedCertificate check(Arena arena, Policy policy, Objective.Discounted objective,
                                              OptionalInt floorUnits, int startUnits) {
        return certify(closedLoop(arena, policy, objective, floorUnits, startUnits));
    }

    /** The closed loop (possibly stopped at its first problem). */
    public static DiscountedClosedLoop closedLoop(Arena arena, Policy policy, Objective.Discounted objective,
                                                  OptionalInt floorUnits, int startUnits) {
        return DiscountedClosedLoop.build(arena, policy, objective, floorUnits.orElse(Integer.MIN_VALUE), startUnits,
                ClosedLoop.DEFAULT_MAX_NODES);
    }

    /** The certificate of a built loop. */
    public static DiscountedCertificate certify(DiscountedClosedLoop loop) {
        Words w = new Words(loop);
        if (loop.problem().isPresent()) {
            DiscountedClosedLoop.Problem p = loop.problem().get();
            return fail(loop, w.problem(p), Math.min(p.level(), loop.minLevelSeen()));
        }
        int[] order = loop.topologicalOrder();
        Boolean jgraphtCycle = loop.nodeCount() <= JGRAPHT_LIMIT ? loop.graph().jgraphtHasCycle(loop.nodeCount()) : null;
        if (jgraphtCycle != null && jgraphtCycle != (order == null)) {
            return fail(loop, "internal: the two cycle checks disagree (topological order says "
                    + (order == null ? "cyclic" : "acyclic") + ", jgrapht says " + (jgraphtCycle ? "cyclic" : "acyclic")
                    + "); the policy is not certified", loop.minLevelSeen());
        }
        if (order == null) {
            return fail(loop, w.cycle(loop.findCycle()), loop.minLevelSeen());
        }
        int n = loop.nodeCount();
        long disc = loop.objective().discount();
        List<BigInteger> pow = new ArrayList<>();
        pow.add(BigInteger.ONE);
        BigInteger[] worst = new BigInteger[n];
        int[] steps = new int[n];
        int[] lowest = new int[n];
        for (int i = n - 1; i >= 0; i--) {
            int v = order[i];
            int lo = loop.level(v);
            int begin = loop.succBegin(v);
            int end = loop.succEnd(v);
            if (begin == end) {
                if (!loop.isComplete(v)) {
                    return fail(loop, "internal: a situation with no outcome that does not complete the mission: "
                            + w.state(v), loop.minLevelSeen());
                }
                worst[v] = BigInteger.ZERO;
                steps[v] = 0;
                lowest[v] = lo;
                continue;
            }
            int len = 0;
            for (int s = begin; s < end; s++) {
                len = Math.max(len, steps[loop.succNode(s)] + 1);
            }
            while (pow.size() <= len) {
                pow.add(pow.get(pow.size() - 1).multiply(BigInteger.valueOf(disc)));
            }
            // all candidates over the common denominator d^len: w d^len + A(t) d^(len - E(t) - 1)
            BigInteger best = null;
            for (int s = begin; s < end; s++) {
                int t = loop.succNode(s);
                int weight = loop.arena().weight(loop.succEdge(s));
                BigInteger c = BigInteger.valueOf(weight).multiply(pow.get(len))
                        .add(worst[t].multiply(pow.get(len - steps[t] - 1)));
                if (best == null || c.compareTo(best) < 0) {
                    best = c;
                }
                lo = Math.min(lo, lowest[t]);
            }
            worst[v] = best;
            steps[v] = len;
            lowest[v] = lo;
        }
        ExactScore score = new ExactScore(worst[0], pow.get(steps[0]));
        int c = score.compareTo(ExactScore.of(loop.objective().threshold()));
        boolean meets = loop.objective().relation() == Relation.ABOVE ? c > 0 : c >= 0;
        if (!meets) {
            return fail(loop, "internal: every run completes with its score met, yet the worst discounted score "
                    + score + " does not meet " + w.condition() + "; the policy is not certified", lowest[0]);
        }
        EnergyScale scale = loop.arena().mission().scale();
        String battery = loop.floorKept()
                ? "the battery never drops below " + w.units(lowest[0]) + " (reserve floor " + w.units(loop.floor()) + ")"
                : "the reserve floor is not checked (lowest level " + w.units(lowest[0]) + ")";
        String reason = "every run of the policy from " + loop.cell(0) + " with " + w.units(loop.startLevel())
                + " completes the mission under every disturbance the model allows with a discounted score "
                + w.condition() + "; the worst score is " + score + "; " + battery + "; " + n
                + " states checked, longest run " + steps[0] + " steps; " + scale.describe();
        return new DiscountedCertificate(true, reason, n, Optional.of(score), lowest[0], steps[0], loop.objective(),
                loop.floorKept(), loop.floor(), loop.startLevel());
    }

    private static DiscountedCertificate fail(DiscountedClosedLoop loop, String reason, int lowest) {
        return new DiscountedCertificate(false, reason, loop.nodeCount(), Optional.empty(), lowest, -1,
                loop.objective(), loop.floorKept(), loop.floor(), loop.startLevel());
    }

    /** Wording of situations, steps and problems. */
    static final class Words extends LoopWords<DiscountedClosedLoop> {

        Words(DiscountedClosedLoop loop) {
            super(loop);
        }

        String condition() {
            Objective.Discounted o = loop.objective();
            return "DS " + o.relation().symbol() + " " + o.threshold() + " (discount " + o.discount() + ")";
        }

        String state(int node) {
            List<String> visit = mission.tasks().visit();
            int done = Integer.bitCount(loop.progress(node));
            return loop.cell(node) + " with " + units(loop.level(node)) + ", budget left " + loop.budgetLeft(node)
                    + ", " + done + " of " + visit.size() + " tasks done, score gap " + loop.scoreMemory(node);
        }

        String step(int e) {
            StringBuilder sb = new StringBuilder(arena.action(arena.source(e)).toString());
            if (arena.event(e) != Arena.NOMINAL) {
                sb.append(", ").append(EventKind.values()[arena.event(e)].word()).append(" '")
                        .append(mission.map().disturbances().rules().get(arena.rule(e)).label()).append("'");
            }
            return sb.toString();
        }

        String trace(int node) {
            List<Integer> path = loop.pathTo(node);
            StringBuilder sb = new StringBuilder();
            int from = Math.max(0, path.size() - 1 - TRACE_STEPS);
            sb.append(from > 0 ? "… " : "start ");
            for (int i = from; i < path.size(); i++) {
                int n = path.get(i);
                if (i > from) {
                    sb.append(" -").append(step(loop.parentEdge(n))).append("-> ");
                }
                sb.append(loop.cell(n)).append(" (").append(loop.level(n)).append(", ").append(loop.scoreMemory(n))
                        .append(")");
            }
            return sb.toString();
        }

        String problem(DiscountedClosedLoop.Problem p) {
            int n = p.node();
            String where = "after " + (loop.pathTo(n).size() - 1) + " steps [" + trace(n) + "], at " + state(n);
            String act = loop.choice(n) >= 0 ? "the policy says '" + arena.action(loop.choice(n)) + "' and " : "";
            String outcome = p.edge() >= 0 ? step(p.edge()) : "";
            return switch (p.kind()) {
                case START_BELOW_FLOOR -> "the starting charge " + units(p.level()) + " is below the reserve floor "
                        + units(loop.floor());
                case START_IN_AVOIDED_ZONE -> "the start cell " + loop.cell(0) + " lies in an avoided zone";
                case START_SCORE_OUT_OF_REACH -> "no run can reach a discounted score " + condition()
                        + ": the energy changes are too small to make up the threshold";
                case MISSING_ENTRY -> (loop.policy().scored() ? "" : "the policy has no score memory (is it a"
                        + " reserve policy?); ") + "the policy has no entry for a situation the robot can reach: " + where;
                case ILLEGAL_ACTION -> "the policy's action is not allowed " + where;
                case BELOW_FLOOR -> where + ": " + act + "the outcome (" + outcome + ") leaves " + units(p.level())
                        + ", below the reserve floor " + units(loop.floor());
                case SCORE_OUT_OF_REACH -> where + ": " + act + "after the outcome (" + outcome
                        + ") no continuation can reach a discounted score " + condition();
                case AVOIDED_ZONE -> where + ": " + act + "the outcome (" + outcome + ") puts the robot at "
                        + arena.cellOf(arena.target(p.edge())) + " in an avoided zone";
            };
        }

        String cycle(List<Integer> cycle) {
            StringBuilder sb = cycleStart(cycle);
            for (int i = 0; i + 1 < cycle.size(); i++) {
                int a = cycle.get(i);
                sb.append(i == 0 ? "" : " ").append(loop.cell(a)).append(" (").append(loop.level(a)).append(", ")
                        .append(loop.scoreMemory(a)).append(") -").append(arena.action(loop.choice(a))).append("->");
            }
            int last = cycle.get(cycle.size() - 1);
            sb.append(" ").append(loop.cell(last)).append(" and the same situation again");
            return sb.toString();
        }
    }
}
