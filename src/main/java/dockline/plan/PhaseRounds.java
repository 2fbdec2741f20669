package dockline.plan;

import dockline.arena.Arena;
import dockline.arena.ArenaCompiler;
import dockline.arena.DisturbanceStates;
import dockline.model.Mission;
import dockline.solve.reserve.PhasedLastingSolver;

/**
 * The rounds of a route that decides a mission with lasting closures phase by phase ({@link LastingPhases} for
 * the charging route, {@link LastingFast} for the fast path): the phases kept (at first the base phase, nothing
 * closed), each round's arena of the kept phases only ({@link ArenaCompiler#compileWithin}) and its compile time,
 * the phases of the left-out closures that a round's plays met, added for the next round, and the plan's note.
 * This is the bookkeeping of two-sided abstraction refinement for games (T. A. Henzinger, R. Jhala and
 * R. Majumdar, "Counterexample-guided control", ICALP 2003); the passes are the routes'. Cost: per round one
 * restricted compile and O(states²) to add the phases met (a phase is every state with the same closures).
 */
final class PhaseRounds {

    private final Mission mission;
    private final DisturbanceStates states;
    private final boolean[] keep;
    private boolean[] add;
    private boolean met;
    private Arena arena;
    private int round;
    private long compileNanos;

    /** The rounds on the mission's disturbance states ({@link LastingPhases#states}), from the base phase. */
    PhaseRounds(Mission mission, DisturbanceStates states) {
        this.mission = mission;
        this.states = states;
        this.keep = new boolean[states.count()];
        for (int s = 0; s < states.count(); s++) {
            keep[s] = states.closed(s).length == 0;
        }
    }

    /** The next round's arena: the kept phases compiled (timed); nothing is met in it yet. */
    Arena compile() {
        round++;
        add = new boolean[states.count()];
        met = false;
        long t0 = System.nanoTime();
        arena = ArenaCompiler.compileWithin(mission, states, keep);
        compileNanos += System.nanoTime() - t0;
        return arena;
    }

    /**
     * A play of this round met outcome {@code e} of its arena, a closure into a left-out phase
     * ({@link ArenaCompiler#LEFT_OUT}): its phase is added by {@link #refine}.
     */
    void meet(int e) {
        met = true;
        int t = PhasedLastingSolver.leftOutState(arena, states, e);
        if (t >= 0) {
            add[t] = true;
        }
    }

    /** Whether this round's plays met a left-out closure. */
    boolean met() {
        return met;
    }

    /** Adds the phases met in this round; whether one was new (false: the rounds cannot refine). */
    boolean refine() {
        return PhasedLastingSolver.addPhases(states, keep, add);
    }

    int round() {
        return round;
    }

    /** Disturbance states kept. */
    int kept() {
        int n = 0;
        for (boolean k : keep) {
            n += k ? 1 : 0;
        }
        return n;
    }

    /** The mission's disturbance states. */
    int total() {
        return states.count();
    }

    /** Wall time of the restricted compiles, all rounds so far. */
    long compileMillis() {
        return compileNanos / 1_000_000;
    }

    /** The plan's note on the phases: how many states were kept, in how many rounds, and {@code how}. */
    /** How the note of a phase-by-phase plan begins ({@link Plan#passNote}, {@link Plan#phasesNote}). */
    static final String NOTE_START = "lasting closures phase by phase: ";

    static String note(int kept, int total, int rounds, String how) {
        return NOTE_START + kept + " of " + total + " disturbance states kept, in " + rounds
                + " round" + (rounds == 1 ? "" : "s") + " (" + how + ")";
    }
}
