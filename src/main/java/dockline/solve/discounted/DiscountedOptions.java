package dockline.solve.discounted;

import dockline.solve.ProductOptions;
import dockline.solve.game.AttractorSolver;
import dockline.solve.game.GameSolver;
import java.util.function.BooleanSupplier;

/**
 * What {@link DiscountedSolver#analyse} computes besides the verdict, and with which limits.
 *
 * @param product      how the product game is built (memory budget, index, cancellation flag)
 * @param solver       the game solver; {@code AttractorSolver::new} unless a test swaps it
 * @param keepReserve  also keep the battery at or above the reserve floor (the comparator and the
 *                     reserve monitor side by side, {@link dockline.monitor.PairMonitor}); on by default
 * @param alsoOptimise also run the optimisation baseline ({@link DiscountedValueIteration}) on the
 *                     arena without the tasks, and report whether its value-optimal play completes the mission
 *
 * <p>Data only (settings).
 */
public record DiscountedOptions(ProductOptions product, GameSolver.Factory solver, boolean keepReserve,
                                boolean alsoOptimise) {

    public DiscountedOptions {
        if (product == null) {
            product = ProductOptions.defaults();
        }
        if (solver == null) {
            solver = AttractorSolver::new;
        }
    }

    /** Score and reserve floor together, no baseline, default memory budget. */
    public static DiscountedOptions defaults() {
        return new DiscountedOptions(ProductOptions.defaults(), AttractorSolver::new, true, false);
    }

    public DiscountedOptions withKeepReserve(boolean on) {
        return new DiscountedOptions(product, solver, on, alsoOptimise);
    }

    public DiscountedOptions withAlsoOptimise(boolean on) {
        return new DiscountedOptions(product, solver, keepReserve, on);
    }

    public DiscountedOptions withMemoryBudget(long bytes) {
        return new DiscountedOptions(product.withMemoryBudget(bytes), solver, keepReserve, alsoOptimise);
    }

    public DiscountedOptions withCancelled(BooleanSupplier flag) {
        return new DiscountedOptions(product.withCancelled(flag), solver, keepReserve, alsoOptimise);
    }

    public DiscountedOptions withSolver(GameSolver.Factory factory) {
        return new DiscountedOptions(product, factory, keepReserve, alsoOptimise);
    }
}
