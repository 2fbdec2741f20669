package dockline.solve.reserve;

import dockline.policy.Policy;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.fixtures.TinyMission;
import dockline.io.MissionLoader;
import dockline.io.PolicyFiles;
import dockline.model.EventDuration;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.replay.ForcedEvent;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PlanOptions;
import dockline.plan.PlanReplays;
import dockline.plan.PolicyChoice;
import dockline.plan.Route;
import dockline.replay.Replay;
import dockline.replay.ReplayStep;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The lasting-event demo, the worked example with a slip, replays and policy files with closures. */
class LastingDemoTest {

    @TempDir
    Path dir;

    private static Mission vaultCheck() throws Exception {
        return MissionLoader.load(Path.of("missions/vault-check.yaml"));
    }

    /**
     * Oracle: the hand count in missions/README.md ("The shut fire door"): 26 cells + one wait = 26.5 Wh
     * momentary, 38 cells lasting, 30 Wh above the floor; and {@link LastingBruteForce} (independent).
     */
    @Test
    void vaultCheck_guaranteedWhenMomentary_notWhenTheDoorStaysShut() throws Exception {
        Mission lasting = vaultCheck();
        assertThat(lasting.map().disturbances().anyLasting()).as("the map's default is rest-of-mission").isTrue();
        ReserveAnalysis a = ReserveSolver.analyse(lasting, ReserveOptions.defaults());
        assertThat(a.guaranteed()).isFalse();
        // 40 Wh - 38 Wh = 2 Wh = 4 units of 0.5 Wh
        assertThat(a.highestGuaranteedReserveUnits()).hasValue(4);
        assertThat(new LastingBruteForce(lasting).highestFloor()).isEqualTo(4);

        Mission momentary = lasting.withDoorsAndBlockages(EventDuration.MOMENTARY);
        ReserveAnalysis b = ReserveSolver.analyse(momentary, ReserveOptions.defaults());
        assertThat(b.guaranteed()).isTrue();
        // 40 Wh - 26.5 Wh = 13.5 Wh = 27 units
        assertThat(b.worstCaseMinimumUnits()).hasValue(27);
        assertThat(b.highestGuaranteedReserveUnits()).hasValue(27);
        assertThat(new LastingBruteForce(momentary).highestFloor()).isEqualTo(27);
        Certificate c = CertificateChecker.check(b.arena(), b.policy().orElseThrow(), momentary.reserveUnits());
        assertThat(c.ok()).isTrue();
    }

    /**
     * With a slip rule a lasting door can help the robot: once the door is shut for good it is an
     * obstacle, and a later slip can no longer land on it. Found by search over random tiny maps and
     * kept as a worked example; oracle: {@link LastingBruteForce} (independent of the production
     * route), which agrees with it. Map (1 unit = 1 Wh): a door at 0:0, the dock at 1:0 (start, 5 Wh),
     * tile 2 Wh per cell, wait 1 Wh, charge 1 Wh a step, capacity 12 Wh; visit 0:1, back to the dock;
     * budget 2; the door may shut, and moves from or to 1:1 may slip.
     */
    @Test
    void withSlips_aLastingDoorCanRaiseTheHighestFloor_workedExample() {
        Mission base = TinyMission.plan("|D", "..")
                .capacity(12).costs(2, 3, 1, 1)
                .start("1:0", 5).reserve(0).budget(2)
                .zone("room-a", "0:1").zone("room-b", "0:0 0:1").visit(false, "room-a", "room-b")
                .rule(EventKind.DOOR_SHUT, "doors", TinyMission.cells("0:0 1:1"), BigDecimal.ZERO)
                .rule(EventKind.SLIP, "wet patch", TinyMission.cells("1:1"), BigDecimal.ZERO)
                .build();
        Mission momentary = base.withDoorsAndBlockages(EventDuration.MOMENTARY);
        Mission lasting = base.withDoorsAndBlockages(EventDuration.REST_OF_MISSION);
        int mom = ReserveSolver.analyse(momentary, ReserveOptions.defaults()).highestGuaranteedReserveUnits().orElse(-1);
        int las = ReserveSolver.analyse(lasting, ReserveOptions.defaults()).highestGuaranteedReserveUnits().orElse(-1);
        assertThat(mom).isEqualTo(new LastingBruteForce(momentary).highestFloor()).isEqualTo(2);
        assertThat(las).isEqualTo(new LastingBruteForce(lasting).highestFloor()).isEqualTo(3);
    }

    /** Two ways round a wall, each through a lasting door; budget 1 (invented data). */
    private static Mission ring() {
        Mission m = TinyMission.plan("#####", "#.|.#", "#D#.#", "#.|.#", "#####")
                .capacity(30).costs(1, 2, 1, 0)
                .start("1:2", 30).reserve(0).budget(1)
                .zone("lab", "3:2").visit(true, "lab")
                .door("2:1", "north").door("2:3", "south")
                .rule(EventKind.DOOR_SHUT, "doors", TinyMission.cells("2:1 2:3"), BigDecimal.ZERO)
                .build();
        return m.withDoorsAndBlockages(EventDuration.REST_OF_MISSION);
    }

    @Test
    void worstCaseReplay_saysWhichDoorStaysShut_andTheForcedFormNamesTheDoor() throws Exception {
        Mission m = ring();
        Plan plan = MissionPlanner.plan(m, PlanOptions.of(
                new Route.Product(PolicyChoice.FEWEST_MOVES, false, false, true, false)));
        assertThat(plan.guaranteed()).isTrue();
        assertThat(plan.certification().ok()).isTrue();
        PlanReplays mr = plan.replays().orElseThrow();
        Replay worst = mr.worstCase();
        assertThat(String.join("\n", worst.explanation())).contains("stays closed for the rest of the mission");
        ReplayStep shut = worst.steps().stream().filter(s -> !s.event().nominal()).findFirst().orElseThrow();
        assertThat(shut.event().lasting()).isTrue();
        assertThat(shut.event().closed()).isIn("door north", "door south");
        // after the shut the robot never stands on that door: the detour
        int at = worst.steps().indexOf(shut);
        assertThat(worst.steps().subList(at, worst.steps().size()))
                .noneMatch(s -> shut.event().closedCells().contains(s.cell()));

        String door = mr.nominal().steps().stream().anyMatch(s -> s.cell().toString().equals("2:1")) ? "north" : "south";
        Replay forced = mr.forced(ForcedEvent.parseList("door-shut@" + door));
        ReplayStep f = forced.steps().stream().filter(s -> !s.event().nominal()).findFirst().orElseThrow();
        assertThat(f.event().closed()).isEqualTo("door " + door);
        assertThat(forced.last().cell().toString()).isEqualTo("1:2");
    }

    /**
     * One map entry naming two doors with {@code at-most: 1} shares one count (maps/README.md): with
     * budget 2 the building may still shut only one of them, so the robot always gets round the wall;
     * without the limit both can stay shut and the lab is cut off. Oracle: that hand reasoning, and
     * {@link LastingBruteForce} for the unlimited case (it counts per rule, so it is not asked about
     * the shared count).
     */
    @Test
    void atMost_isSharedByTheRulesOfOneEntry() {
        Mission two = ring().withBudget(2);
        assertThat(ReserveSolver.analyse(two, ReserveOptions.defaults()).guaranteed()).isFalse();
        assertThat(new LastingBruteForce(two).guaranteed()).isFalse();
        java.util.List<dockline.model.EventRule> rules = new java.util.ArrayList<>();
        for (dockline.model.EventRule r : two.map().disturbances().rules()) {
            // one rule per door, both in entry 0, as the loader makes them from `where: [north, south]`
            for (dockline.model.Cell c : r.cells()) {
                rules.add(new dockline.model.EventRule(r.kind(), "door " + c, List.of(c), r.extraWh(), r.duration(), 1, 0));
            }
        }
        assertThat(rules).hasSize(2);
        Mission shared = LastingMissions.withRules(two, rules);
        ReserveAnalysis a = ReserveSolver.analyse(shared, ReserveOptions.defaults());
        assertThat(a.guaranteed()).isTrue();
        assertThat(a.arena().states().limitCount()).isEqualTo(1);
        assertThat(CertificateChecker.check(a.arena(), a.policy().orElseThrow(), shared.reserveUnits()).ok()).isTrue();
    }

    /** Oracle: the format of missions/POLICY-FORMAT.md, read back by the reader (round trip). */
    @Test
    void policyFiles_carryTheClosures_inJsonAndCsv() throws Exception {
        Mission m = ring();
        ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults());
        Policy p = a.policy().orElseThrow();
        assertThat(p.entries()).anyMatch(e -> e.closures().equals("closed: door north")
                || e.closures().equals("closed: door south"));
        for (String name : List.of("p.json", "p.csv")) {
            Path f = dir.resolve(name);
            PolicyFiles.write(f, PolicyFiles.Header.of(m), p);
            assertThat(Files.readString(f)).contains("closed");
            PolicyFiles.Document d = PolicyFiles.read(f);
            assertThat(d.policy().entries()).isEqualTo(p.entries());
            Certificate c = CertificateChecker.check(a.arena(), d.policy(), m.reserveUnits());
            assertThat(c.ok()).as(c.reason()).isTrue();
        }
    }

    /**
     * With lasting door-shut events the arena carries the closed doors, and the forecast (which walks
     * the arena) counts those disturbance states too: within 20 % of the reachable product on a generated
     * building (the target of ProductEstimateTest, here with the implicit route's BFS as the oracle).
     */
    @Test
    void generatedBuilding_withLastingDoors_estimateWithinTwentyPercent() {
        Mission m = dockline.bench.MissionGenerator.generate(dockline.bench.BuildingGenerator.generate(32, 5, 1), dockline.bench.MissionSpec.docking(1), 5);
        java.util.List<dockline.model.EventRule> rules = new java.util.ArrayList<>();
        for (dockline.model.EventRule r : m.map().disturbances().rules()) {
            rules.add(r.kind() == dockline.model.EventKind.DOOR_SHUT
                    ? r.withDuration(dockline.model.EventDuration.REST_OF_MISSION) : r);
        }
        Mission lasting = LastingMissions.withRules(m, rules);
        dockline.arena.Arena arena = dockline.arena.ArenaCompiler.compile(lasting);
        assertThat(arena.stateCount()).isGreaterThan(3);
        dockline.goal.GoalAutomaton goal = dockline.goal.GoalAutomaton.of(lasting);
        // the stored product would take gigabytes here: the implicit route's reachable part is the oracle
        long forecast = dockline.solve.game.ReserveSizeForecast.of(arena, goal, new dockline.monitor.ReserveMonitor(lasting.reserveUnits(), lasting.capacityUnits(), lasting.startUnits())).vertices();
        long reachable = new ImplicitReserveGame(arena, goal, new dockline.monitor.ReserveMonitor(lasting.reserveUnits(), lasting.capacityUnits(), lasting.startUnits())).bfs().wonVertices();
        assertThat((double) forecast / reachable).as("forecast / reachable").isBetween(1.0, 1.2);
    }
}
