package dockline.solve;

import java.util.function.BooleanSupplier;

/**
 * What {@link ReserveSolver#analyse} computes besides the verdict, and with which limits.
 *
 * @param product         how each product game is built (memory budget, index, cancellation flag)
 * @param solver          the game solver; {@code AttractorSolver::new} unless a test swaps it
 * @param highestReserve  also search for the highest reserve floor that can be guaranteed
 * @param chargeNeeded    also compute the heat map ({@link ChargeNeeded}); needs the product over all levels
 */
public record ReserveOptions(ProductOptions product, GameSolver.Factory solver, boolean highestReserve,
                             boolean chargeNeeded) {

    public ReserveOptions {
        if (product == null) {
            product = ProductOptions.defaults();
        }
        if (solver == null) {
            solver = AttractorSolver::new;
        }
    }

    /** Verdict, policy, worst case and highest guaranteed reserve; no heat map; default memory budget. */
    public static ReserveOptions defaults() {
        return new ReserveOptions(ProductOptions.defaults(), AttractorSolver::new, true, false);
    }

    public ReserveOptions withMemoryBudget(long bytes) {
        return new ReserveOptions(product.withMemoryBudget(bytes), solver, highestReserve, chargeNeeded);
    }

    public ReserveOptions withCancelled(BooleanSupplier flag) {
        return new ReserveOptions(product.withCancelled(flag), solver, highestReserve, chargeNeeded);
    }

    public ReserveOptions withSolver(GameSolver.Factory factory) {
        return new ReserveOptions(product, factory, highestReserve, chargeNeeded);
    }

    public ReserveOptions withIndex(ProductOptions.IndexKind kind) {
        return new ReserveOptions(product.withIndex(kind), solver, highestReserve, chargeNeeded);
    }

    public ReserveOptions withHighestReserve(boolean on) {
        return new ReserveOptions(product, solver, on, chargeNeeded);
    }

    public ReserveOptions withChargeNeeded(boolean on) {
        return new ReserveOptions(product, solver, highestReserve, on);
    }
}
