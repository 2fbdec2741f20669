package dockline.plan;

import dockline.arena.Arena;
import dockline.certify.ClosedLoop;
import dockline.replay.ForcedEvent;
import dockline.replay.ForcedEventException;
import dockline.replay.Replay;
import dockline.replay.Replayer;
import dockline.policy.Policy;
import dockline.solve.WinningRegion;
import java.util.List;
import java.util.Optional;

/**
 * The replays of a planned mission ({@link Route.Product} with replays): made from the certified
 * closed loop of the plan's policy, or, when the mission is not guaranteed, from the robot's best
 * effort (the certified policy for the highest floor that can still be guaranteed from the start,
 * when there is one) and the solver's winning region (the counterexample stays outside it).
 *
 * <p>On the restricted arena of a mission with lasting closures planned phase by phase ({@link LastingPhases}),
 * the policy's closed loop was certified there, where an outcome into a left-out closure phase loses: so no
 * outcome of the policy's choices leads into one, and every replay of the loop, forced events included (each
 * picks one of those outcomes), is a run of the mission itself under that policy; a forced event the policy's
 * run does not offer is refused as on the whole arena.
 *
 * <p>Immutable; each replay is computed when asked, in O(closed loop) ({@link Replayer}).
 */
public final class PlanReplays {

    private final boolean guaranteed;
    private final Arena arena;
    private final int floorUnits;
    private final int startUnits;
    private final ClosedLoop loop; // certified policy, best effort, or null
    private final int bestEffortFloor;
    private final WinningRegion region; // when not guaranteed
    private final String noLoopReason;

    PlanReplays(boolean guaranteed, Arena arena, int floorUnits, int startUnits, ClosedLoop loop, int bestEffortFloor,
                WinningRegion region, String noLoopReason) {
        this.guaranteed = guaranteed;
        this.arena = arena;
        this.floorUnits = floorUnits;
        this.startUnits = startUnits;
        this.loop = loop;
        this.bestEffortFloor = bestEffortFloor;
        this.region = region;
        this.noLoopReason = noLoopReason;
    }

    /** The floor of the best-effort policy when not guaranteed, or -1 (none, or guaranteed). */
    public int bestEffortFloor() {
        return bestEffortFloor;
    }

    /** The policy replays follow: the certified one, or the best effort; empty when there is none. */
    public Optional<Policy> policy() {
        return loop == null ? Optional.empty() : Optional.of(loop.policy());
    }

    /**
     * The worst case of the certified policy, or the counterexample when not guaranteed.
     *
     * @throws IllegalStateException if the guaranteed mission's policy failed its certificate
     */
    public Replay worstCase() {
        if (guaranteed) {
            return Replayer.worstCase(certifiedLoop());
        }
        return Replayer.counterexample(arena, floorUnits, startUnits, region, loop, bestEffortFloor);
    }

    /**
     * The nominal run of the certified (or best-effort) policy.
     *
     * @throws IllegalStateException if there is no policy to run (see {@link #policy()})
     */
    public Replay nominal() {
        return Replayer.nominal(runnableLoop(), floorUnits);
    }

    /**
     * A run with forced events, nominal outcomes elsewhere.
     *
     * @throws ForcedEventException  if an event cannot happen where it was put
     * @throws IllegalStateException if there is no policy to run
     */
    public Replay forced(List<ForcedEvent> events) throws ForcedEventException {
        return Replayer.forced(runnableLoop(), events, floorUnits);
    }

    private ClosedLoop certifiedLoop() {
        if (loop == null) {
            throw new IllegalStateException("the solver's policy failed the independent check: " + noLoopReason);
        }
        return loop;
    }

    private ClosedLoop runnableLoop() {
        if (guaranteed) {
            return certifiedLoop();
        }
        if (loop == null) {
            throw new IllegalStateException("no policy to run: not even a reserve floor of 0 can be guaranteed from"
                    + " this start; only the counterexample can be replayed");
        }
        return loop;
    }
}
