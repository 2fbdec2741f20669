package dockline.certify;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.fixtures.ModelMoves;
import dockline.fixtures.ThresholdPlays;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.Route;
import dockline.policy.ThresholdPolicy;
import dockline.solve.BruteForceMinimax;
import dockline.solve.RandomMissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * The certificate checker on threshold policies. Oracles: {@link ThresholdPlays} (the policy played against
 * every disturbance sequence, exhaustively, with the moves read from the map and mission records by
 * {@link ModelMoves}, its own task bookkeeping and battery arithmetic: no arena compiler, goal automaton, solver
 * or checker code) and {@link BruteForceMinimax} (the highest floor by minimax over explicit states). Tiny
 * random missions with charging, capacity saturation and disturbances ({@link RandomMissions#tiny}).
 */
class ThresholdCertificateProperties {

    /**
     * The charging route's exported thresholds: every play from the start stays at or above the floor and
     * completes, the worst level of all plays is the highest floor, and the checker says the same.
     */
    @Property(tries = 2000)
    void exportedThresholds_everyPlaySafe_andCheckerAgrees(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Plan p = MissionPlanner.plan(m, PlanOptions.of(Route.Charging.defaults()));
        boolean charging = m.scale().gain(m.robot().chargeWh()) > 0;
        Statistics.label("replayed").collect(p.guaranteed() ? (charging ? "charging" : "no charging") : "not guaranteed");
        Statistics.label("replayed").coverage(c -> c.check("charging").percentage(x -> x > 10));
        if (!p.guaranteed()) {
            return;
        }
        String why = RandomMissions.describe(m);
        ThresholdPolicy tp = ((Plan.Detail.Charging) p.detail()).thresholds();
        ThresholdPlays.Outcome o = ThresholdPlays.play(m, tp, m.reserveUnits(), m.startUnits());
        assertThat(o.ok()).as("%s\n%s", o.problem(), why).isTrue();
        int highest = new BruteForceMinimax(m).highestFloor();
        assertThat(o.worstLevel()).as("worst level of every play = highest floor\n%s", why).isEqualTo(highest);
        Certificate c = CertificateChecker.check(ArenaCompiler.compile(m), tp, m.reserveUnits(), m.startUnits());
        assertThat(c.ok()).as(c.reason()).isTrue();
        assertThat(c.worstMinimumUnits()).isEqualTo(o.worstLevel());
        Statistics.label("thresholds per position").collect(tp.stepCount() > tp.size() ? "some position has two or more"
                : "one each");
        Statistics.label("thresholds per position").coverage(x -> x.check("some position has two or more")
                .count(n -> n >= 20));
    }

    /**
     * Mutated threshold policies (one step's action or threshold changed at random, or a row dropped): the
     * checker's verdict and worst level are those of the exhaustive plays, on both outcomes.
     */
    @Property(tries = 2000)
    void mutatedThresholds_checkerAgreesWithExhaustivePlays(@ForAll long seed) {
        Mission m = RandomMissions.tiny(seed);
        Plan p = MissionPlanner.plan(m, PlanOptions.of(Route.Charging.defaults()));
        ThresholdPolicy exported = p.guaranteed() ? ((Plan.Detail.Charging) p.detail()).thresholds() : null;
        Statistics.label("mutated").collect(!p.guaranteed() ? "not guaranteed" : exported.size() == 0
                ? "complete at the start: nothing to mutate" : "mutated");
        if (exported == null || exported.size() == 0) {
            return;
        }
        ThresholdPolicy tp = mutate(m, exported, new Random(seed));
        Arena arena = ArenaCompiler.compile(m);
        ThresholdPlays.Outcome o = ThresholdPlays.play(m, tp, m.reserveUnits(), m.startUnits());
        Certificate c = CertificateChecker.check(arena, tp, m.reserveUnits(), m.startUnits());
        String why = RandomMissions.describe(m);
        assertThat(c.ok()).as("checker %s, plays %s\n%s", c.reason(), o.problem(), why).isEqualTo(o.ok());
        if (o.ok()) {
            assertThat(c.worstMinimumUnits()).as(why).isEqualTo(o.worstLevel());
        }
        Statistics.label("certificate after the mutation").collect(o.ok() ? "still safe" : "refused");
        Statistics.label("certificate after the mutation").coverage(x -> {
            x.check("still safe").count(n -> n >= 20);
            x.check("refused").count(n -> n >= 20);
        });
    }

    private static ThresholdPolicy mutate(Mission m, ThresholdPolicy tp, Random r) {
        List<ThresholdPolicy.Row> rows = new ArrayList<>(tp.rows());
        int i = r.nextInt(rows.size());
        ThresholdPolicy.Row row = rows.get(i);
        int kind = r.nextInt(3);
        if (kind == 0) {
            rows.remove(i);
            return new ThresholdPolicy(rows);
        }
        List<ThresholdPolicy.Step> steps = new ArrayList<>(row.steps());
        int j = r.nextInt(steps.size());
        ThresholdPolicy.Step s = steps.get(j);
        if (kind == 1) {
            List<Action> legal = legal(m, row.cell(), row.budgetLeft());
            steps.set(j, new ThresholdPolicy.Step(s.atLeastUnits(), legal.get(r.nextInt(legal.size()))));
        } else {
            int lo = j + 1 < steps.size() ? steps.get(j + 1).atLeastUnits() + 1 : 0;
            int hi = j > 0 ? steps.get(j - 1).atLeastUnits() - 1 : m.capacityUnits();
            steps.set(j, new ThresholdPolicy.Step(lo + r.nextInt(hi - lo + 1), s.action()));
        }
        rows.set(i, new ThresholdPolicy.Row(row.cell(), row.budgetLeft(), row.progress(), row.closures(), steps));
        return new ThresholdPolicy(rows);
    }

    /** The robot's actions on a cell, from the model records. */
    private static List<Action> legal(Mission m, Cell c, int k) {
        ModelMoves moves = new ModelMoves(m);
        List<Action> out = new ArrayList<>();
        for (Cell n : moves.neighbours(c)) {
            out.add(new Action(ActionKind.MOVE, n));
        }
        out.add(new Action(ActionKind.WAIT, c));
        if (moves.actions(c, k).size() > out.size()) {
            out.add(new Action(ActionKind.CHARGE, c));
        }
        return out;
    }
}
