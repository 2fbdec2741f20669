package dockline.replay;

import dockline.arena.Arena;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.certify.ClosedLoop;
import dockline.margin.FixpointMargins;
import dockline.model.Charge;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.solve.WinningRegion;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveOptions;
import dockline.solve.reserve.ReserveSolver;
import java.util.List;
import java.util.Optional;

/**
 * Everything the replays of one mission need, computed once: the solver's analysis, the certificate
 * of its policy when guaranteed, and otherwise the robot's best effort (the certified policy for the
 * highest floor that can still be guaranteed from the start, when there is one).
 *
 * <p>When the mission is guaranteed, replays run the certified policy; {@link #worstCase()} is the
 * run that drives the battery lowest. When it is not, {@link #worstCase()} is the counterexample, and
 * the nominal and forced replays run the best-effort policy, judged against the mission's floor.
 * The counterexample's disturbance strategy uses the solver's winning region ({@link ReserveAnalysis#region()}).
 */
public final class MissionReplays {

    private final Mission mission;
    private final ReserveAnalysis analysis;
    private final Arena arena;
    private final Optional<Certificate> certificate;
    private final ClosedLoop loop; // certified policy, or best effort, or null
    private final int bestEffortFloor;

    private MissionReplays(Mission mission, ReserveAnalysis analysis, Arena arena, Optional<Certificate> certificate,
                           ClosedLoop loop, int bestEffortFloor) {
        this.mission = mission;
        this.analysis = analysis;
        this.arena = arena;
        this.certificate = certificate;
        this.loop = loop;
        this.bestEffortFloor = bestEffortFloor;
    }

    /**
     * Analyses the mission with the reserve objective (the highest guaranteed floor included) and
     * certifies the policy.
     *
     * @throws dockline.solve.ProductTooLargeException if a product game is over the memory budget
     * @throws dockline.certify.ClosedLoop.TooLargeException if a closed loop is too large
     */
    public static MissionReplays of(Mission mission, ReserveOptions options) {
        // the highest guaranteed floor (for the best effort) is only needed when not guaranteed
        ReserveAnalysis a = ReserveSolver.analyse(mission, options.withHighestReserve(false));
        if (!a.guaranteed()) {
            a = ReserveSolver.analyse(mission, options.withHighestReserve(true));
        }
        Arena arena = a.arena();
        int floor = a.reserveUnits();
        int start = a.startUnits();
        if (a.guaranteed()) {
            Policy p = a.policy().orElseThrow();
            ClosedLoop loop = CertificateChecker.closedLoop(arena, p, floor, start);
            Certificate c = CertificateChecker.certify(loop);
            return new MissionReplays(mission, a, arena, Optional.of(c), c.ok() ? loop : null, -1);
        }
        int best = a.highestReserveSearched() ? a.highestGuaranteedReserveUnits().orElse(-1)
                // the solver skipped the search (memory); the fixpoint needs far less
                : FixpointMargins.highestFloor(arena, a.goal(), start);
        ClosedLoop loop = null;
        if (best >= 0) {
            Mission lower = mission.withReserve(Charge.wh(mission.scale().toWh(best)));
            ReserveAnalysis b = ReserveSolver.analyse(lower, options.withHighestReserve(false).withChargeNeeded(false)
                    .withSafestPolicy(false));
            if (b.guaranteed() && b.reserveUnits() == best) {
                ClosedLoop l = CertificateChecker.closedLoop(arena, b.policy().orElseThrow(), best, start);
                if (CertificateChecker.certify(l).ok()) {
                    loop = l;
                }
            }
            if (loop == null) {
                throw new IllegalStateException("internal: the policy for the highest guaranteed floor " + best
                        + " units could not be certified");
            }
        }
        return new MissionReplays(mission, a, arena, Optional.empty(), loop, best);
    }

    public Mission mission() {
        return mission;
    }

    public ReserveAnalysis analysis() {
        return analysis;
    }

    public Arena arena() {
        return arena;
    }

    public boolean guaranteed() {
        return analysis.guaranteed();
    }

    /** The certificate of the solver's policy, when the mission is guaranteed. */
    public Optional<Certificate> certificate() {
        return certificate;
    }

    /** Whether the mission is guaranteed and its policy passed the independent check. */
    public boolean certified() {
        return certificate.map(Certificate::ok).orElse(false);
    }

    /** The floor of the best-effort policy when not guaranteed, or -1 (none, or guaranteed). */
    public int bestEffortFloor() {
        return bestEffortFloor;
    }

    /** The policy replays follow: the certified one, or the best effort; empty when there is none. */
    public Optional<Policy> policy() {
        return loop == null ? Optional.empty() : Optional.of(loop.policy());
    }

    /** The worst case of the certified policy, or the counterexample when not guaranteed. */
    public Replay worstCase() {
        if (guaranteed()) {
            return Replayer.worstCase(certifiedLoop());
        }
        return counterexample();
    }

    /** The counterexample of a mission that is not guaranteed. */
    public Replay counterexample() {
        if (guaranteed()) {
            throw new IllegalStateException("the mission is guaranteed: there is no counterexample");
        }
        // not guaranteed: every route solved its game to the end, so the whole winning region is known
        WinningRegion region = analysis.region().orElseThrow(() -> new IllegalStateException(
                "internal: the solver did not keep the winning region of a mission that is not guaranteed"));
        return Replayer.counterexample(arena, analysis.reserveUnits(), analysis.startUnits(), region, loop,
                bestEffortFloor);
    }

    /**
     * The nominal run of the certified (or best-effort) policy.
     *
     * @throws IllegalStateException if there is no policy to run (see {@link #policy()})
     */
    public Replay nominal() {
        return Replayer.nominal(runnableLoop(), analysis.reserveUnits());
    }

    /**
     * A run with forced events.
     *
     * @throws ForcedEventException  if an event cannot happen where it was put
     * @throws IllegalStateException if there is no policy to run
     */
    public Replay forced(List<ForcedEvent> events) throws ForcedEventException {
        return Replayer.forced(runnableLoop(), events, analysis.reserveUnits());
    }

    private ClosedLoop certifiedLoop() {
        if (loop == null) {
            throw new IllegalStateException("the solver's policy failed the independent check: "
                    + certificate.map(Certificate::reason).orElse("no certificate"));
        }
        return loop;
    }

    private ClosedLoop runnableLoop() {
        if (guaranteed()) {
            return certifiedLoop();
        }
        if (loop == null) {
            throw new IllegalStateException("no policy to run: not even a reserve floor of 0 can be guaranteed from"
                    + " this start; only the counterexample can be replayed");
        }
        return loop;
    }
}
