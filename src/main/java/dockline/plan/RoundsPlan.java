package dockline.plan;

import dockline.certify.DeadlineCertificateChecker;
import dockline.certify.PatrolCertificateChecker;
import dockline.certify.RoundsCertificate;
import dockline.model.Mission;
import dockline.model.Timing;
import dockline.replay.RoundsReplay;
import dockline.solve.ProductTooLargeException;
import dockline.solve.rounds.DeadlineAnalysis;
import dockline.solve.rounds.DeadlineSolver;
import dockline.solve.rounds.PatrolAnalysis;
import dockline.solve.rounds.PatrolSolver;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.function.IntFunction;

/**
 * The core's answer for the missions beyond one trip, a patrol or a visit mission with a deadline: the
 * solver's analysis ({@link PatrolSolver}: Büchi nested attractors; {@link DeadlineSolver}: attractor
 * ranks as the ticks-left monitor) and, when guaranteed, the independent certificate of its policy
 * ({@link PatrolCertificateChecker}, {@link DeadlineCertificateChecker}). Front ends only print it: a
 * certificate that fails, or that finds other figures than the solver, is {@link #certificateDisagrees()},
 * which they report as an internal error (never a silent "guaranteed").
 *
 * <p>Cost: that of the route's stored product (see the solvers), plus one pass over the policy's closed
 * loop for the certificate; {@link #withLowestStart} adds one product from every start level (at most the
 * product's size bound), or O(log C) products for capacity C when that one is too large.
 *
 * @param mission     the mission as planned (overrides applied)
 * @param patrol      the patrol analysis, for a patrol
 * @param deadline    the deadline analysis, for a visit mission with a deadline
 * @param certificate the certificate of the guaranteed policy; null when not guaranteed
 * @param lowestStartUnits    the lowest starting charge that guarantees the mission's floor (and its deadline);
 *                            empty when none does or when it was not searched
 * @param lowestStartSearched whether that search ran ({@link #withLowestStart}) to the end
 * @param lowestStartMillis   wall time of that search (0 before {@link #withLowestStart}); it is not part of the
 *                            analysis' own time, which covers the solve and the highest floor
 */
public record RoundsPlan(Mission mission, Optional<PatrolAnalysis> patrol, Optional<DeadlineAnalysis> deadline,
                         RoundsCertificate certificate, OptionalInt lowestStartUnits, boolean lowestStartSearched,
                         long lowestStartMillis) {

    /**
     * Solves and certifies a patrol or deadline mission ({@link Mission#beyondOneTrip()}).
     *
     * @param budgetBytes the memory budget of the stored product
     * @param choice      the policy to report (the safest by default)
     */
    public static RoundsPlan of(Mission m, long budgetBytes, PolicyChoice choice) {
        boolean safest = choice == PolicyChoice.SAFEST;
        if (m.tasks().patrols()) {
            PatrolAnalysis a = PatrolSolver.analyse(m, budgetBytes, safest);
            RoundsCertificate cert = a.guaranteed() ? PatrolCertificateChecker.check(a.arena(),
                    a.policy().orElseThrow(), a.reserveUnits(), a.startUnits()) : null;
            return new RoundsPlan(m, Optional.of(a), Optional.empty(), cert, OptionalInt.empty(), false, 0);
        }
        DeadlineAnalysis a = DeadlineSolver.analyse(m, budgetBytes, safest);
        RoundsCertificate cert = a.guaranteed() ? DeadlineCertificateChecker.check(a.arena(), a.policy().orElseThrow(),
                a.reserveUnits(), a.startUnits(), a.deadlineTicks()) : null;
        return new RoundsPlan(m, Optional.empty(), Optional.of(a), cert, OptionalInt.empty(), false, 0);
    }

    /**
     * This plan with the lowest starting charge that guarantees the mission's floor (within its deadline, for a
     * deadline mission), exact in energy units: one product from every start level, or bisection over the start
     * when that is too large ({@link PatrolSolver#lowestStart}, {@link DeadlineSolver#lowestStart}). When the
     * bisection's products pass the memory budget too, the figure is left out and {@link #lowestStartSearched()}
     * is false; nothing else changes.
     *
     * @param budgetBytes the memory budget of each product
     */
    public RoundsPlan withLowestStart(long budgetBytes) {
        long t0 = System.nanoTime();
        try {
            OptionalInt low = patrol.isPresent() ? PatrolSolver.lowestStart(patrol.get(), budgetBytes)
                    : DeadlineSolver.lowestStart(deadline.orElseThrow(), budgetBytes);
            return new RoundsPlan(mission, patrol, deadline, certificate, low, true, millisSince(t0));
        } catch (ProductTooLargeException e) {
            return new RoundsPlan(mission, patrol, deadline, certificate, OptionalInt.empty(), false, millisSince(t0));
        }
    }

    private static long millisSince(long t0) {
        return (System.nanoTime() - t0) / 1_000_000;
    }

    /**
     * The fewest turns in which the robot can be sure to finish and dock, at the mission's floor and start and with
     * no deadline ({@link DeadlineSolver#fewestTurns}); empty when it cannot be sure to finish. For a visit mission
     * (one trip or with a deadline), not a patrol.
     */
    public static OptionalInt fewestTurns(Mission m, long budgetBytes) {
        return DeadlineSolver.fewestTurns(m, budgetBytes);
    }

    /**
     * The replay of a patrol (its lasso, or the building's winning play) or of a deadline mission (the
     * slowest play of its policy); empty for a deadline mission the robot cannot finish at all at its floor.
     */
    public static Optional<RoundsReplay> replay(Mission m, long budgetBytes, PolicyChoice choice) {
        boolean safest = choice == PolicyChoice.SAFEST;
        return m.tasks().patrols() ? Optional.of(RoundsReplay.patrol(m, budgetBytes, safest))
                : RoundsReplay.deadline(m, budgetBytes, safest);
    }

    /**
     * A change that makes the mission guaranteed.
     *
     * @param kind {@code reserve} (a lower floor), {@code deadline} (a longer deadline) or {@code start-charge}
     * @param from the value now (units, or turns for a deadline)
     * @param to   the value that works: the smallest change of its kind
     * @param text the change in words
     */
    public record Change(String kind, long from, long to, String text) {
    }

    /**
     * The changes that make a mission that is not guaranteed guaranteed, one of each kind that exists: the highest
     * floor that is guaranteed (for a deadline mission, within the deadline), for a deadline mission the tightest
     * deadline that is guaranteed at this floor, and the lowest start when it was searched and is above the
     * mission's; none for a guaranteed mission. They are the plan's figures, no search of their own.
     *
     * @param amount words for an energy figure in units (each front end has its own)
     */
    public List<Change> changes(IntFunction<String> amount) {
        List<Change> out = new ArrayList<>();
        if (guaranteed()) {
            return out;
        }
        int floor = mission.reserveUnits();
        OptionalInt highest;
        String keeps = deadline.isPresent() ? ", which keeps the deadline" : "";
        if (deadline.isPresent()) {
            DeadlineAnalysis a = deadline.get();
            highest = a.highestGuaranteedReserveUnits();
            if (a.tightestTicks().isPresent()) {
                int k = a.tightestTicks().getAsInt();
                out.add(new Change("deadline", a.deadlineTicks(), k, "allow a deadline of at least "
                        + Timing.clock(mission.timing().seconds(k)) + " (" + k + " turns; now " + a.deadlineTicks() + ")"));
            }
        } else {
            highest = patrol.orElseThrow().highestGuaranteedReserveUnits();
        }
        if (highest.isPresent()) {
            int h = highest.getAsInt();
            out.add(new Change("reserve", floor, h, "lower the reserve floor to " + amount.apply(h) + " (from "
                    + amount.apply(floor) + ")" + keeps));
        }
        int start = mission.startUnits();
        if (lowestStartUnits.isPresent() && lowestStartUnits.getAsInt() > start) {
            int low = lowestStartUnits.getAsInt();
            out.add(new Change("start-charge", start, low, "start with at least " + amount.apply(low) + " (from "
                    + amount.apply(start) + ")" + keeps));
        }
        return out;
    }

    public boolean guaranteed() {
        return patrol.map(PatrolAnalysis::guaranteed).orElseGet(() -> deadline.orElseThrow().guaranteed());
    }

    /** Whether a guaranteed policy failed its certificate, or the certificate found other figures. */
    public boolean certificateDisagrees() {
        if (certificate == null) {
            return false;
        }
        if (!certificate.ok()) {
            return true;
        }
        if (patrol.isPresent()) {
            PatrolAnalysis a = patrol.get();
            return certificate.worstMinimumUnits() != a.lowestLevelUnits().getAsInt()
                    || certificate.longestLapTicks() != a.longestLapTicks().getAsInt();
        }
        DeadlineAnalysis a = deadline.orElseThrow();
        return certificate.worstMinimumUnits() != a.worstCaseMinimumUnits().getAsInt()
                || certificate.longestLapTicks() != a.worstFinishTicks().getAsInt();
    }
}
