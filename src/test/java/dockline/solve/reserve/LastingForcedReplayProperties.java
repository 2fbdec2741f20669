package dockline.solve.reserve;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.certify.CertificateChecker;
import dockline.certify.ClosedLoop;
import dockline.fixtures.LastingMoves;
import dockline.goal.GoalAutomaton;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.PlanReplays;
import dockline.plan.Route;
import dockline.policy.ThresholdPolicy;
import dockline.replay.ForcedEvent;
import dockline.replay.ForcedEventException;
import dockline.replay.Replay;
import dockline.replay.ReplayStep;
import dockline.replay.Replayer;
import dockline.solve.charging.ChargingPolicies;
import dockline.solve.charging.ChargingRoute;
import dockline.solve.charging.ChargingSolver;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.regex.Pattern;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

/**
 * {@code replay --force} on a mission with lasting closures, planned as the replay command plans it: the
 * charging route with replays, phase by phase (only some closure phases compiled). On random tiny maps with
 * lasting and momentary doors and blockages, at-most limits, slips, drags and budgets 0-3
 * ({@link LastingMissions}), with events forced along the policy's own run (at a step or at a named door or
 * zone, so that most of them can happen) and now and then one that cannot:
 * <ul>
 *   <li>the whole arena (every closure phase compiled): the plan's threshold policy played there with the same
 *       forced events gives the same replay, step for step (cells, actions, events and closures, levels, budget,
 *       progress, explanation), or the same refusal in the same words, and its closed loop has as many
 *       situations (the certificate line of the text), so the kept phases hid nothing from the forced run;</li>
 *   <li>{@link LastingMoves}, the move generation written separately from the map records (own closure sets and
 *       counts, no arena compiler): every step of the replay is one of the building's answers to the robot's
 *       action there, so no step goes into a closure phase the restricted arena left out;</li>
 *   <li>{@link LastingBruteForce}, the separately written explicit-state oracle: every level of the run, the
 *       forced prefix and the nominal rest after it alike, is at or above the highest floor the oracle
 *       guarantees from the start (the policy replayed is certified at that floor: the safest policy when
 *       guaranteed, the best effort at the highest floor when not), and there is a policy to replay exactly when
 *       the oracle guarantees some floor.</li>
 * </ul>
 * How often the replay also equals the one of the whole arena's own charging route is counted, not asserted:
 * that route may choose differently between equally safe moves (a different policy with the same figures).
 */
class LastingForcedReplayProperties {

    private static final Pattern LEFT_OUT = Pattern.compile("phase by phase: (\\d+) of (\\d+) disturbance states kept");

    @Property(tries = 1000)
    void forcedReplayPhaseByPhase_isTheWholeArenasRunOfThePolicy_andOnlyRealMoves(@ForAll long seed)
            throws ForcedEventException {
        // a tiny map's policy often passes no door or zone: the next seeds are tried (up to 30) for one that does,
        // except one time in ten, which keeps the first map as it is (often with no policy, or nothing to force)
        Random r = new Random(seed);
        boolean first = r.nextInt(10) == 0;
        Mission drawn = null;
        Plan p = null;
        List<ForcedEvent> events = List.of();
        boolean lastingOnly = r.nextInt(3) > 0;
        for (int attempt = 0; attempt < 40 && (drawn == null || events.isEmpty() && !first); attempt++) {
            drawn = LastingMissions.fromSeed(seed + attempt * 1_000_003L, true);
            p = MissionPlanner.plan(drawn, PlanOptions.of(new Route.Charging(true, false, true)));
            events = p.replays().orElseThrow().policy().isPresent()
                    ? alongTheRun(drawn, p.replays().get(), r, lastingOnly && attempt < 30) : List.of();
        }
        Mission m = drawn;
        String why = LastingMissions.describe(m);
        PlanReplays replays = p.replays().orElseThrow();
        if (events.isEmpty() || r.nextInt(10) == 0) {
            // one that may well not happen where it is put
            events = new ArrayList<>(events);
            events.add(new ForcedEvent(1 + r.nextInt(6), r.nextBoolean() ? EventKind.DOOR_SHUT : EventKind.BLOCKAGE,
                    null));
            events = dropRepeatedSteps(events);
        }
        List<ForcedEvent> ev = events;
        why += "\nforced " + ev;

        int highest = new LastingBruteForce(m).highestFloor();
        Arena full = ArenaCompiler.compile(m);
        String phased = outcome(() -> replays.forced(ev));
        Plan.Detail.Charging detail = (Plan.Detail.Charging) p.detail();
        assertThat(replays.policy().isPresent()).as("a policy to replay iff the brute force guarantees a floor\n%s",
                why).isEqualTo(highest >= 0);
        if (replays.policy().isPresent()) {
            int loopFloor = p.guaranteed() ? m.reserveUnits() : p.highestFloorUnits().getAsInt();
            String whole = outcome(() -> forcedOnWholeArena(full, detail.thresholds(), loopFloor, m, ev));
            assertThat(phased).as("the same policy's forced run on the whole arena\n%s", why).isEqualTo(whole);
            // the text's "certified: ... situations" line: the same closed loop on both arenas
            int situations = CertificateChecker.certify(CertificateChecker.closedLoop(full, detail.thresholds(),
                    loopFloor, m.startUnits())).statesChecked();
            if (p.certification() instanceof dockline.plan.Certification.Reserve c) {
                assertThat(c.certificate().statesChecked()).as("situations checked\n%s", why).isEqualTo(situations);
            }
        } else {
            assertThat(phased).as("no policy to run\n%s", why).startsWith("no policy to run");
        }
        String ownRoute = outcome(() -> wholeArenaChargingRoute(full, m, ev));

        boolean made = phased.startsWith("Replay[");
        boolean lastingClosure = false;
        if (made) {
            Replay run = replays.forced(ev);
            assertThat(run.steps().get(0).batteryUnits()).isEqualTo(m.startUnits());
            realMoves(m, run, why);
            for (ReplayStep s : run.steps()) {
                assertThat(s.batteryUnits()).as("step %d at or above the brute force's highest floor %d\n%s",
                        s.step(), highest, why).isGreaterThanOrEqualTo(highest);
                lastingClosure |= s.event().lasting();
            }
        }
        var kept = LEFT_OUT.matcher(String.join("\n", p.notes()));
        boolean partial = kept.find() && Integer.parseInt(kept.group(1)) < Integer.parseInt(kept.group(2));
        Statistics.label("forced run made").collect(made);
        Statistics.label("refused").collect(phased.startsWith("refused"));
        Statistics.label("a lasting closure forced").collect(lastingClosure);
        Statistics.label("some phase left out").collect(partial);
        Statistics.label("same as the whole arena's own charging route").collect(phased.equals(ownRoute)
                || phased.startsWith("no policy") && ownRoute.startsWith("no policy"));
        Statistics.label("forced run made").coverage(c -> {
            c.check(true).percentage(q -> q >= 15);
            c.check(false).percentage(q -> q >= 15);
        });
        Statistics.label("refused").coverage(c -> c.check(true).percentage(q -> q >= 10));
        // seen: made 45 %, refused 34 %, a lasting closure 7 %, some phase left out 42 % (1,000 tries)
        Statistics.label("a lasting closure forced").coverage(c -> c.check(true).percentage(q -> q >= 3));
        Statistics.label("some phase left out").coverage(c -> c.check(true).percentage(q -> q >= 10));
    }

    /** A replay's record text, or the refusal's words. */
    private static String outcome(Run run) {
        try {
            return run.run().toString();
        } catch (ForcedEventException e) {
            return "refused: " + e.getMessage();
        } catch (IllegalStateException e) {
            return e.getMessage();
        }
    }

    @FunctionalInterface
    private interface Run {
        Replay run() throws ForcedEventException;
    }

    /** The threshold policy played on the whole arena, certified at {@code loopFloor}, judged at the mission's. */
    private static Replay forcedOnWholeArena(Arena full, ThresholdPolicy policy, int loopFloor, Mission m,
                                             List<ForcedEvent> ev) throws ForcedEventException {
        ClosedLoop loop = CertificateChecker.closedLoop(full, policy, loopFloor, m.startUnits());
        assertThat(CertificateChecker.certify(loop).ok()).as("the policy certified on the whole arena").isTrue();
        return Replayer.forced(loop, ev, m.reserveUnits());
    }

    /** The whole arena's own charging route: its threshold policy at its highest floor, forced. */
    private static Replay wholeArenaChargingRoute(Arena full, Mission m, List<ForcedEvent> ev)
            throws ForcedEventException {
        ChargingSolver s = new ChargingSolver(full, GoalAutomaton.of(m));
        int cap = m.capacityUnits();
        ChargingRoute.Analysis a = ChargingRoute.analyse(s, cap, m.reserveUnits(), m.startUnits());
        if (a.highestFloorUnits().isEmpty()) {
            throw new IllegalStateException("no policy to run");
        }
        int hf = a.highestFloorUnits().getAsInt();
        ThresholdPolicy t = ChargingPolicies.thresholds(s, a.highest(), hf, m.startUnits(), cap);
        return forcedOnWholeArena(full, t, a.guaranteed() ? m.reserveUnits() : hf, m, ev);
    }

    /**
     * Every step is an answer of the building to the robot's action, as {@link LastingMoves} generates them from
     * the map records; the disturbance part (budget left, closures, counts) is followed as the set of those that
     * fit the steps so far (a door-shut and a blockage at one cell look alike in a row).
     */
    private static void realMoves(Mission m, Replay run, String why) {
        LastingMoves moves = new LastingMoves(m, 2);
        int cap = m.capacityUnits();
        Set<List<Long>> parts = new HashSet<>();
        parts.add(List.of((long) m.map().disturbances().budget(), 0L, 0L));
        for (int i = 1; i < run.steps().size(); i++) {
            ReplayStep before = run.steps().get(i - 1);
            ReplayStep s = run.steps().get(i);
            Action a = s.taken();
            Set<List<Long>> next = new HashSet<>();
            for (List<Long> d : parts) {
                for (List<LastingMoves.Outcome> answers : moves.actions(before.cell(), d.get(0).intValue(), d.get(1),
                        d.get(2))) {
                    if (!isAction(answers, a, before.cell())) {
                        continue;
                    }
                    for (LastingMoves.Outcome o : answers) {
                        if (o.cell().equals(s.cell()) && o.k() == s.budgetLeft()
                                && Math.min(cap, before.batteryUnits() + o.delta()) == s.batteryUnits()) {
                            next.add(List.of((long) o.k(), o.closedSet(), o.counts()));
                        }
                    }
                }
            }
            assertThat(next).as("step %d (%s to %s, %d units) is a move of the building\n%s", s.step(), a, s.cell(),
                    s.batteryUnits(), why).isNotEmpty();
            parts = next;
        }
    }

    /** Whether the list of answers is that of the action: a move's first answer enters its target. */
    private static boolean isAction(List<LastingMoves.Outcome> answers, Action a, Cell at) {
        LastingMoves.Outcome first = answers.get(0);
        return switch (a.kind()) {
            case MOVE -> first.cell().equals(a.target()) && !a.target().equals(at);
            case WAIT -> answers.size() == 1 && first.cell().equals(at) && first.delta() <= 0;
            case CHARGE -> answers.size() == 1 && first.cell().equals(at) && first.delta() > 0;
        };
    }

    /**
     * Up to three door-shut or blockage events (of lasting rules only, if asked) along the policy's run: each at a
     * step (or, one time in three, at the named door or zone) where the run's move enters a cell one of those rules
     * covers with budget left, after the events already placed (a rule with at-most 0 is passed over; a limit used up or an earlier rule on the
     * cell may still refuse it).
     */
    private static List<ForcedEvent> alongTheRun(Mission m, PlanReplays replays, Random r, boolean lastingOnly) {
        List<ForcedEvent> ev = new ArrayList<>();
        int last = 0;
        for (int n = 1 + r.nextInt(3); ev.size() < n; ) {
            Replay run;
            try {
                run = ev.isEmpty() ? replays.nominal() : replays.forced(ev);
            } catch (ForcedEventException e) {
                return ev;
            }
            List<ForcedEvent> candidates = new ArrayList<>();
            for (int s = last; s + 1 < run.steps().size(); s++) {
                ReplayStep next = run.steps().get(s + 1);
                if (next.taken().kind() != ActionKind.MOVE || !next.event().nominal()
                        || run.steps().get(s).budgetLeft() == 0) {
                    continue;
                }
                Cell t = next.taken().target();
                for (EventRule rule : m.map().disturbances().rules()) {
                    boolean door = rule.kind() == EventKind.DOOR_SHUT && m.map().terrainAt(t).door();
                    if (rule.covers(t) && (door || rule.kind() == EventKind.BLOCKAGE)
                            && (rule.lasting() || !lastingOnly) && !(rule.limited() && rule.atMost() == 0)) {
                        // a lasting rule twice as often: its closure is what the kept phases must not hide
                        for (int i = rule.lasting() ? 0 : 1; i < 2; i++) {
                            candidates.add(r.nextInt(3) > 0 ? new ForcedEvent(s + 1, rule.kind(), null)
                                    : new ForcedEvent(0, rule.kind(), null, door ? t.toString() : rule.label()));
                        }
                    }
                }
            }
            if (candidates.isEmpty()) {
                return ev;
            }
            ForcedEvent f = candidates.get(r.nextInt(candidates.size()));
            ev.add(f);
            if (f.atPlace()) {
                return ev; // its step is not known in advance
            }
            last = f.step();
        }
        return ev;
    }

    /** The events without a second one at a step already named. */
    private static List<ForcedEvent> dropRepeatedSteps(List<ForcedEvent> events) {
        Set<Integer> steps = new HashSet<>();
        List<ForcedEvent> out = new ArrayList<>();
        for (ForcedEvent f : events) {
            if (f.atPlace() || steps.add(f.step())) {
                out.add(f);
            }
        }
        return out;
    }
}
