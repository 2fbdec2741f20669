package dockline.solve.reserve;

import static dockline.fixtures.RandomMissions.pick;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.RandomMissions;
import dockline.fixtures.TinyMission;
import dockline.model.Cell;
import dockline.model.DisturbanceModel;
import dockline.model.EventDuration;
import dockline.model.EventKind;
import dockline.model.EventRule;
import dockline.model.Mission;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import net.jqwik.api.statistics.Statistics;

/**
 * Random tiny missions with doors and blockages, each lasting or momentary at random, optional
 * {@code at-most} limits, budgets 0 to 3 (invented data, drawn from a seed so failures reproduce).
 */
public final class LastingMissions {

    private LastingMissions() {
    }

    /**
     * @param slips whether slip rules may appear (the dominance property is for maps without them)
     */
    public static Mission fromSeed(long seed, boolean slips) {
        Random r = new Random(seed);
        int w = 2 + r.nextInt(3);
        int h = 2 + r.nextInt(2);
        RandomMissions.Plan p = RandomMissions.plan(r, w, h, 1, 3, 6, false);
        List<Cell> free = p.free();
        Cell start = p.start();
        TinyMission m = TinyMission.plan(p.rows());
        int cap = 5 + r.nextInt(10);
        m.capacity(cap).costs(1 + r.nextInt(2), 1 + r.nextInt(3), r.nextInt(2), r.nextInt(3) == 0 ? 1 + r.nextInt(2) : 0);
        if (r.nextInt(5) == 0) {
            m.eight();
        }
        m.start(start.toString(), 1 + r.nextInt(cap));
        m.reserve(r.nextInt(3));
        int budget = r.nextInt(4);
        m.budget(budget);
        m.rule(EventKind.DOOR_SHUT, "doors", pick(r, free, 1 + r.nextInt(3)), BigDecimal.ZERO);
        if (r.nextBoolean()) {
            m.rule(EventKind.DOOR_SHUT, "more doors", pick(r, free, 1 + r.nextInt(2)), BigDecimal.ZERO);
        }
        if (r.nextInt(3) > 0) {
            m.rule(EventKind.BLOCKAGE, "carts", pick(r, free, 1 + r.nextInt(2)), BigDecimal.ZERO);
        }
        if (r.nextBoolean()) {
            m.rule(EventKind.BLOCKAGE, "beds", pick(r, free, 1 + r.nextInt(2)), BigDecimal.ZERO);
        }
        if (slips && r.nextBoolean()) {
            m.rule(EventKind.SLIP, "wet patch", pick(r, free, 1 + r.nextInt(2)), BigDecimal.ZERO);
        }
        if (r.nextInt(3) == 0) {
            m.rule(EventKind.DRAG, "rug", pick(r, free, 1 + r.nextInt(2)), BigDecimal.valueOf(1 + r.nextInt(2)));
        }
        List<String> names = new ArrayList<>();
        int zones = r.nextInt(3);
        for (int i = 0; i < zones; i++) {
            String n = "room-" + (char) ('a' + i);
            m.zone(n, pick(r, free, 1 + r.nextInt(2)));
            names.add(n);
        }
        m.visit(r.nextBoolean(), names.toArray(new String[0]));
        if (r.nextInt(6) == 0) {
            List<Cell> av = pick(r, free, 1);
            av.remove(start);
            if (!av.isEmpty()) {
                m.zone("keep-out", av);
                m.avoid("keep-out");
            }
        }
        Mission base = m.build();
        List<EventRule> rules = new ArrayList<>();
        for (EventRule rule : base.map().disturbances().rules()) {
            EventRule x = rule;
            boolean closes = rule.kind() == EventKind.DOOR_SHUT || rule.kind() == EventKind.BLOCKAGE;
            if (closes && r.nextInt(3) > 0) {
                x = x.withDuration(EventDuration.REST_OF_MISSION);
            }
            if (r.nextInt(3) == 0) {
                x = x.withAtMost(r.nextInt(budget + 1), -1);
            }
            rules.add(x);
        }
        return withRules(base, rules);
    }

    /** The phases' note of a plan: states kept, states in all, rounds. */
    static final Pattern PHASES = Pattern.compile("phase by phase: (\\d+) of (\\d+) disturbance states kept,"
            + " in (\\d+) round");

    /**
     * Checks that a plan of a mission with something a lasting event closes was decided phase by phase (its
     * note), never handed back to the whole arena, and collects how often it was, was refined, left a phase out
     * and was guaranteed, with their coverage checks; whether the plan was phase by phase.
     */
    static boolean phaseStatistics(Mission m, List<String> notes, boolean guaranteed, String why) {
        Matcher x = PHASES.matcher(String.join("\n", notes));
        boolean phased = x.find();
        assertThat(phased).as("phase by phase\n%s", why).isEqualTo(dockline.arena.ArenaCompiler.states(m).itemCount() > 0);
        Statistics.label("phase by phase").collect(phased);
        Statistics.label("refined (more than one round)").collect(phased && Integer.parseInt(x.group(3)) > 1);
        Statistics.label("some phase left out").collect(phased && Integer.parseInt(x.group(1))
                < Integer.parseInt(x.group(2)));
        Statistics.label("guaranteed").collect(guaranteed);
        Statistics.label("phase by phase").coverage(c -> c.check(true).percentage(q -> q >= 30));
        Statistics.label("refined (more than one round)").coverage(c -> c.check(true).percentage(q -> q >= 5));
        Statistics.label("some phase left out").coverage(c -> c.check(true).percentage(q -> q >= 10));
        Statistics.label("guaranteed").coverage(c -> {
            c.check(true).percentage(q -> q >= 10);
            c.check(false).percentage(q -> q >= 10);
        });
        return phased;
    }

    /** The base phase of a restricted arena: the disturbance states with nothing closed. */
    static boolean[] basePhase(dockline.arena.DisturbanceStates st) {
        boolean[] keep = new boolean[st.count()];
        for (int s = 0; s < st.count(); s++) {
            keep[s] = st.closed(s).length == 0;
        }
        return keep;
    }

    /** Whether a phase is left out ({@code keep} false somewhere). */
    static boolean leavesOut(boolean[] keep) {
        for (boolean k : keep) {
            if (!k) {
                return true;
            }
        }
        return false;
    }

    public static Mission withRules(Mission base, List<EventRule> rules) {
        return new Mission(base.name(), base.source(),
                base.map().withDisturbances(new DisturbanceModel(base.map().disturbances().budget(), rules)),
                base.robot(), base.start(), base.startCharge(), base.reserve(), base.tasks(), base.objective());
    }

    public static String describe(Mission m) {
        StringBuilder sb = new StringBuilder();
        for (String row : m.map().rows()) {
            sb.append(row).append('\n');
        }
        sb.append("start ").append(m.start()).append(" charge ").append(m.startUnits()).append(" reserve ")
                .append(m.reserveUnits()).append(" cap ").append(m.capacityUnits()).append(" budget ")
                .append(m.map().disturbances().budget()).append(" wait ").append(m.robot().waitWh())
                .append(" charge ").append(m.robot().chargeWh()).append(' ').append(m.robot().neighbourhood())
                .append("\nzones ").append(m.map().zones()).append("\ntasks ").append(m.tasks());
        for (EventRule r : m.map().disturbances().rules()) {
            sb.append("\n  ").append(r.kind().word()).append(' ').append(r.cells()).append(' ')
                    .append(r.duration().word()).append(r.limited() ? " at-most " + r.atMost() : "")
                    .append(r.extraWh().signum() > 0 ? " extra " + r.extraWh() : "");
        }
        return sb.toString();
    }
}
