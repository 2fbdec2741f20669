package dockline.solve;

import java.util.function.BooleanSupplier;

/**
 * What {@link ReserveSolver#analyse} computes besides the verdict, and with which limits.
 *
 * @param product         how each product game is built (memory budget, index, cancellation flag)
 * @param solver          the game solver; {@code CompactAttractorSolver::new} (same winning set and ranks
 *                        as the reference {@link AttractorSolver}, 1.4-2 times faster; see DEVELOPERS.md,
 *                        "Benchmark figures") unless a test swaps it
 * @param highestReserve  also search for the highest reserve floor that can be guaranteed
 * @param chargeNeeded    also compute the heat map ({@link ChargeNeeded}); needs the product over all levels
 * @param safestPolicy    export the policy that keeps the battery at or above the highest guaranteed floor
 *                        (it may take more moves, e.g. to top up on a dock) instead of the one that
 *                        finishes in the fewest moves at the mission's floor; costs one more solve
 * @param route           how the verdict, policy and worst case are computed ({@link Route#PRODUCT} by default)
 */
public record ReserveOptions(ProductOptions product, GameSolver.Factory solver, boolean highestReserve,
                             boolean chargeNeeded, boolean safestPolicy, Route route) {

    /** Where the game of the verdict and policy lives. */
    public enum Route {
        /** The stored {@link ProductGame}, solved by {@link #solver()}: policy of fewest moves in the worst case. */
        PRODUCT,
        /**
         * {@link ImplicitReserveGame}: no stored product, the robot's choice recorded per won robot slot;
         * its policy is a winning one but not necessarily of fewest moves, so its worst case may differ
         * from the product route's. The analysis then carries no {@link ProductGame} and no
         * {@link Solution} ({@code game()} and {@code solution()} are null).
         */
        IMPLICIT
    }

    public ReserveOptions {
        if (product == null) {
            product = ProductOptions.defaults();
        }
        if (solver == null) {
            solver = CompactAttractorSolver::new;
        }
        if (route == null) {
            route = Route.PRODUCT;
        }
    }

    public ReserveOptions(ProductOptions product, GameSolver.Factory solver, boolean highestReserve,
                          boolean chargeNeeded, boolean safestPolicy) {
        this(product, solver, highestReserve, chargeNeeded, safestPolicy, Route.PRODUCT);
    }

    public ReserveOptions withRoute(Route r) {
        return new ReserveOptions(product, solver, highestReserve, chargeNeeded, safestPolicy, r);
    }

    /** Verdict, policy, worst case and highest guaranteed reserve; no heat map; default memory budget. */
    public static ReserveOptions defaults() {
        return new ReserveOptions(ProductOptions.defaults(), CompactAttractorSolver::new, true, false, false);
    }

    public ReserveOptions withMemoryBudget(long bytes) {
        return new ReserveOptions(product.withMemoryBudget(bytes), solver, highestReserve, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withCancelled(BooleanSupplier flag) {
        return new ReserveOptions(product.withCancelled(flag), solver, highestReserve, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withSolver(GameSolver.Factory factory) {
        return new ReserveOptions(product, factory, highestReserve, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withIndex(ProductOptions.IndexKind kind) {
        return new ReserveOptions(product.withIndex(kind), solver, highestReserve, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withHighestReserve(boolean on) {
        return new ReserveOptions(product, solver, on, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withSafestPolicy(boolean on) {
        return new ReserveOptions(product, solver, highestReserve, chargeNeeded, on, route);
    }

    public ReserveOptions withChargeNeeded(boolean on) {
        return new ReserveOptions(product, solver, highestReserve, on, safestPolicy, route);
    }
}
