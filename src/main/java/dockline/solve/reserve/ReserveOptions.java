package dockline.solve.reserve;

import dockline.solve.ProductOptions;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.CompactAttractorSolver;
import dockline.solve.game.GameSolver;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;
import java.util.Objects;
import java.util.function.BooleanSupplier;

/**
 * What {@link ReserveSolver#analyse} computes besides the verdict, and with which limits. Data only.
 *
 * @param product         how each product game is built (memory budget, index, cancellation flag)
 * @param highestReserve  also search for the highest reserve floor that can be guaranteed
 * @param chargeNeeded    also compute the heat map ({@link ChargeNeeded}); needs the product over all levels
 * @param safestPolicy    export the policy that keeps the battery at or above the highest guaranteed floor
 *                        (it may take more moves, e.g. to top up on a dock) instead of the one that
 *                        finishes in the fewest moves at the mission's floor; costs one more solve
 * @param route           how the verdict, policy and worst case are computed, with the settings of that
 *                        route only ({@link Route#IMPLICIT} by default)
 */
public record ReserveOptions(ProductOptions product, boolean highestReserve, boolean chargeNeeded,
                             boolean safestPolicy, Route route) {

    /**
     * Where the game of the verdict and policy lives, each route with its own settings: only the stored
     * route runs a {@link GameSolver}, so only its options name one.
     */
    public sealed interface Route permits Implicit, Stored {

        /** The default route, {@link Implicit}. */
        Route IMPLICIT = new Implicit();

        /** The stored route with its default solver, {@link CompactAttractorSolver}. */
        Route PRODUCT = new Stored(CompactAttractorSolver::new);

        /** The stored route with the given game solver. */
        static Route stored(GameSolver.Factory solver) {
            return new Stored(solver);
        }
    }

    /**
     * The default: {@link ImplicitReserveGame}, the product with its edges generated on demand and
     * nothing stored but half a byte of counter per vertex and the robot's choice per robot vertex
     * (first-in first-out attractor, so its policy also finishes in the fewest moves in the worst
     * case; among equally short choices it may pick another than the stored route, so worst levels
     * can differ by a few units). The analysis then carries no {@link ProductGame} and no
     * {@link Solution} ({@code game()} and {@code solution()} are null). It has no settings of its own.
     */
    public record Implicit() implements Route {
    }

    /**
     * The product stored in CSR arrays ({@link ProductGame}), solved by {@code solver}: the reference
     * route, kept for cross-checks and the benchmark; its policy finishes in the fewest moves in the
     * worst case.
     *
     * @param solver the game solver; {@code CompactAttractorSolver::new} by default (same winning set,
     *               ranks and chosen edges as the reference {@link AttractorSolver}, 1.4-2 times faster;
     *               see DEVELOPERS.md, "Benchmark figures")
     */
    public record Stored(GameSolver.Factory solver) implements Route {
        public Stored {
            Objects.requireNonNull(solver, "solver");
        }
    }

    public ReserveOptions {
        if (product == null) {
            product = ProductOptions.defaults();
        }
        if (route == null) {
            route = Route.IMPLICIT;
        }
    }

    public ReserveOptions withRoute(Route r) {
        return new ReserveOptions(product, highestReserve, chargeNeeded, safestPolicy, r);
    }

    /** Verdict, policy, worst case and highest guaranteed reserve; no heat map; default memory budget. */
    public static ReserveOptions defaults() {
        return new ReserveOptions(ProductOptions.defaults(), true, false, false, Route.IMPLICIT);
    }

    public ReserveOptions withMemoryBudget(long bytes) {
        return new ReserveOptions(product.withMemoryBudget(bytes), highestReserve, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withCancelled(BooleanSupplier flag) {
        return new ReserveOptions(product.withCancelled(flag), highestReserve, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withIndex(ProductOptions.IndexKind kind) {
        return new ReserveOptions(product.withIndex(kind), highestReserve, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withHighestReserve(boolean on) {
        return new ReserveOptions(product, on, chargeNeeded, safestPolicy, route);
    }

    public ReserveOptions withSafestPolicy(boolean on) {
        return new ReserveOptions(product, highestReserve, chargeNeeded, on, route);
    }

    public ReserveOptions withChargeNeeded(boolean on) {
        return new ReserveOptions(product, highestReserve, on, safestPolicy, route);
    }
}
