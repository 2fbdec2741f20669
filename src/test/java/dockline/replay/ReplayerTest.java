package dockline.replay;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.certify.CertificateChecker;
import dockline.certify.ClosedLoop;
import dockline.fixtures.TinyMission;
import dockline.goal.GoalAutomaton;
import dockline.margin.FixpointMargins;
import dockline.margin.MinimumCredit;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.policy.Policy;
import java.math.BigDecimal;
import java.util.List;
import org.junit.jupiter.api.Test;

class ReplayerTest {

    /** Tile, carpet (a rug may drag, +3 Wh), tile, dock; 1 unit = 1 Wh; one event at most. */
    private static Mission corridor() {
        return TinyMission.plan(".c.D")
                .costs(1, 2, 1, 0).capacity(20).start("0:0", 10).budget(1)
                .rule(EventKind.DRAG, "rug", TinyMission.cells("1:0"), BigDecimal.valueOf(3))
                .build();
    }

    private static ClosedLoop loop(Mission m) {
        Arena a = ArenaCompiler.compile(m);
        int floor = m.reserveUnits();
        Policy p = MinimumCredit.solve(a, floor).policy(m.startUnits());
        return CertificateChecker.closedLoop(a, p, floor, m.startUnits());
    }

    /** Worked by hand (maps/README.md, "Game semantics"): the drag on the carpet gives 10 → 5 → 4 → 3. */
    @Test
    void worstCase_corridor_isTheDragRun() {
        Replay r = Replayer.worstCase(loop(corridor()));
        assertThat(r.steps()).extracting(ReplayStep::batteryUnits).containsExactly(10, 5, 4, 3);
        assertThat(r.steps().get(1).event().kind()).isEqualTo(EventKind.DRAG);
        assertThat(r.steps().get(1).event().ruleLabel()).isEqualTo("rug");
        assertThat(r.steps()).extracting(ReplayStep::budgetLeft).containsExactly(1, 0, 0, 0);
        assertThat(r.ending()).isEqualTo(Replay.Ending.COMPLETE);
        assertThat(r.minimumUnits()).isEqualTo(3);
        assertThat(String.join("\n", r.explanation())).contains("step 1: drag entering 1:0 (carpet) by rule 'rug', coming from 0:0; the step cost 5 units (5 Wh)")
                .contains("lowest battery is 3 units (3 Wh)");
    }

    /** By hand: nominal 10 → 8 → 7 → 6. */
    @Test
    void nominal_corridor() {
        Replay r = Replayer.nominal(loop(corridor()));
        assertThat(r.steps()).extracting(ReplayStep::batteryUnits).containsExactly(10, 8, 7, 6);
        assertThat(r.steps()).allMatch(s -> s.event().nominal());
    }

    @Test
    void forced_dragAtStepOne_equalsWorstCase_andImpossibleEventsAreClearErrors() throws Exception {
        ClosedLoop l = loop(corridor());
        Replay f = Replayer.forced(l, ForcedEvent.parseList("1:drag"));
        assertThat(f.steps()).isEqualTo(Replayer.worstCase(l).steps());
        assertThatThrownBy(() -> Replayer.forced(l, ForcedEvent.parseList("2:drag")))
                .isInstanceOf(ForcedEventException.class).hasMessageContaining("2:0 is not in a drag zone");
        assertThatThrownBy(() -> Replayer.forced(l, ForcedEvent.parseList("1:door-shut")))
                .hasMessageContaining("1:0 is not a door that may shut");
        assertThatThrownBy(() -> Replayer.forced(l, ForcedEvent.parseList("9:drag")))
                .hasMessageContaining("the run is already over");
    }

    @Test
    void forced_noBudgetLeft_isAClearError() {
        Mission m = TinyMission.plan(".cc.D").costs(1, 2, 1, 0).capacity(30).start("0:0", 20).budget(1)
                .rule(EventKind.DRAG, "rug", TinyMission.cells("1:0 2:0"), BigDecimal.ONE).build();
        ClosedLoop l = loop(m);
        assertThatThrownBy(() -> Replayer.forced(l, ForcedEvent.parseList("1:drag,2:drag")))
                .hasMessageContaining("no disturbance budget is left");
    }

    /**
     * A blockage the map limits with {@code at-most} is refused by naming the limit, not by saying the place takes no
     * blockage (it does): at-most 0 allows none; at-most 1 allows one, so a second forced one is refused too.
     */
    @Test
    void forced_blockageOverItsLimit_namesTheLimit() throws Exception {
        for (int limit : new int[] {0, 1}) {
            Mission plain = TinyMission.plan("...D").costs(1, 1, 1, 0).capacity(30).start("0:0", 20).budget(2)
                    .rule(EventKind.BLOCKAGE, "carts", "1:0").build();
            List<dockline.model.EventRule> limited = List.of(plain.map().disturbances().rules().get(0)
                    .withAtMost(limit, -1));
            Mission m = new Mission(plain.name(), plain.source(), plain.map().withDisturbances(
                    new dockline.model.DisturbanceModel(2, limited)), plain.robot(), plain.start(), plain.startCharge(),
                    plain.reserve(), plain.tasks(), plain.objective());
            ClosedLoop l = loop(m);
            String forced = limit == 0 ? "1:blockage" : "1:blockage,2:blockage";
            assertThatThrownBy(() -> Replayer.forced(l, ForcedEvent.parseList(forced)))
                    .isInstanceOf(ForcedEventException.class)
                    .hasMessageContaining("1:0 takes blockage events only under carts (at-most: " + limit + ")")
                    .hasMessageContaining("no more of them at this step")
                    .hasMessageNotContaining("not in a blockage zone");
            if (limit == 1) {
                assertThat(Replayer.forced(l, ForcedEvent.parseList("1:blockage")).steps().get(1).event().kind())
                        .isEqualTo(EventKind.BLOCKAGE);
            }
        }
    }

    /** A slip beside the target may end in two cells: the user must name one. */
    @Test
    void forced_slip_needsACellWhenThereAreTwo() throws Exception {
        Mission m = TinyMission.plan("...", "...", ".D.").costs(1, 1, 1, 0).capacity(30).start("1:0", 20).budget(1)
                .rule(EventKind.SLIP, "wet", TinyMission.cells("1:1"), BigDecimal.ZERO).build();
        ClosedLoop l = loop(m);
        assertThatThrownBy(() -> Replayer.forced(l, ForcedEvent.parseList("1:slip")))
                .hasMessageContaining("name one");
        Replay r = Replayer.forced(l, ForcedEvent.parseList("1:slip@0:1"));
        assertThat(r.steps().get(1).cell()).isEqualTo(new dockline.model.Cell(0, 1));
        assertThat(r.ending()).isEqualTo(Replay.Ending.COMPLETE);
        assertThatThrownBy(() -> ForcedEvent.parseList("x:slip")).hasMessageContaining("whole number");
        assertThatThrownBy(() -> ForcedEvent.parseList("3:fog")).hasMessageContaining("unknown event 'fog'");
        assertThatThrownBy(() -> ForcedEvent.parseList("0:slip")).hasMessageContaining("count from 1");
    }

    /**
     * A door D1 on the only way to the dock may shut twice; each shut costs a wait. Worked by hand:
     * the route costs 3 (three tile cells), two shut doors cost 2 waits: 4 units start, floor 0 → no
     * plan survives (4 - 2 - 3 < 0) but 5 units do.
     */
    @Test
    void counterexample_doorShut_crossesTheFloorAndNamesTheDoor() {
        Mission m = TinyMission.plan("..|D").costs(1, 1, 1, 0).capacity(10).start("0:0", 4).budget(2)
                .rule(EventKind.DOOR_SHUT, "fire doors", TinyMission.cells("2:0"), BigDecimal.ZERO)
                .door("2:0", "D1").reserve(0).zone("hall", "0:0 1:0").build();
        Arena a = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        MinimumCredit mc = MinimumCredit.solve(a, goal, 0);
        assertThat(mc.needAtStart()).isEqualTo(5);
        int best = FixpointMargins.highestFloor(a, goal, 4);
        assertThat(best).isEqualTo(-1);
        Replay r = Replayer.counterexample(a, 0, 4, mc::robotWins, null, -1);
        assertThat(r.ending()).isEqualTo(Replay.Ending.BELOW_FLOOR);
        assertThat(r.last().batteryUnits()).isLessThan(0);
        String words = String.join("\n", r.explanation());
        assertThat(words).contains("door D1 at 2:0 shut by rule 'fire doors'").contains("below the reserve floor 0 units");
    }

    /** With 6 units and a floor of 2 the highest guaranteed floor is 1: the best effort dips to 1. */
    @Test
    void counterexample_withBestEffortPolicy() {
        Mission m = TinyMission.plan("..|D").costs(1, 1, 1, 0).capacity(10).start("0:0", 6).budget(2)
                .rule(EventKind.DOOR_SHUT, "fire doors", TinyMission.cells("2:0"), BigDecimal.ZERO)
                .door("2:0", "D1").reserve(2).build();
        Arena a = ArenaCompiler.compile(m);
        GoalAutomaton goal = GoalAutomaton.of(m);
        int best = FixpointMargins.highestFloor(a, goal, 6);
        assertThat(best).isEqualTo(1); // by hand: 6 - 3 - 2 = 1
        Policy p = MinimumCredit.solve(a, goal, best).policy(6);
        ClosedLoop l = CertificateChecker.closedLoop(a, p, best, 6);
        Replay r = Replayer.counterexample(a, 2, 6, MinimumCredit.solve(a, goal, 2)::robotWins, l, best);
        assertThat(r.ending()).isEqualTo(Replay.Ending.BELOW_FLOOR);
        assertThat(r.last().batteryUnits()).isEqualTo(1);
        assertThat(r.steps()).filteredOn(s -> !s.event().nominal()).hasSize(2);
        assertThat(String.join("\n", r.explanation())).contains("highest reserve that can still be guaranteed from this start, 1 unit");
    }

    @Test
    void csv_isDeterministic_andQuoted() {
        Replay r1 = Replayer.worstCase(loop(corridor()));
        Replay r2 = Replayer.worstCase(loop(corridor()));
        String c1 = ReplayFormats.csv(r1);
        assertThat(c1).isEqualTo(ReplayFormats.csv(r2));
        assertThat(c1).startsWith("step,cell,action,event,eventDetail,levelUnits,levelWh,budgetLeft,progress,progressWords\r\n");
        assertThat(c1).contains("1,1:0,move 1:0,drag,drag entering 1:0 (rule 'rug'),5,5,0,0,0 of 0 tasks done\r\n");
        assertThat(ReplayFormats.field("a,\"b\"")).isEqualTo("\"a,\"\"b\"\"\""); // RFC 4180 section 2, rules 6-7
        assertThat(ReplayFormats.json(corridor(), r1)).contains("\"levelWh\" : 5");
        assertThat(List.of(ReplayFormats.table(r1).split("\\R"))).hasSize(5);
    }
}
