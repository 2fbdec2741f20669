package dockline.plan;

import dockline.model.Mission;
import dockline.model.Objective;
import dockline.solve.ProductOptions;
import java.util.function.BooleanSupplier;

/**
 * The options of {@link MissionPlanner#plan}: the limits every route shares and the route itself
 * (which carries its own settings).
 *
 * @param memoryBudgetBytes refuse games estimated to need more than this; 0: half the JVM's heap
 * @param cancelled         polled by the solvers; when it turns true the plan stops with
 *                          {@link java.util.concurrent.CancellationException}
 * @param route             how the mission is answered
 * @param progress          told how far the plan has got (stage boundaries of the route); never null
 */
public record PlanOptions(long memoryBudgetBytes, BooleanSupplier cancelled, Route route, Progress progress) {

    /**
     * Where a plan is: a per cent of its stages done (stage boundaries, not time: the stages differ in
     * cost from mission to mission) and the stage now running, in words. Called on the planning thread.
     */
    @FunctionalInterface
    public interface Progress {
        /** Nobody listens. */
        Progress NONE = (percent, stage) -> { };

        void reached(int percent, String stage);
    }

    /** Options that nobody watches the progress of. */
    public PlanOptions(long memoryBudgetBytes, BooleanSupplier cancelled, Route route) {
        this(memoryBudgetBytes, cancelled, route, Progress.NONE);
    }

    public PlanOptions {
        if (memoryBudgetBytes < 0) {
            throw new IllegalArgumentException("memory budget must not be negative");
        }
        if (cancelled == null) {
            cancelled = () -> false;
        }
        if (route == null) {
            throw new IllegalArgumentException("a route is needed");
        }
        if (progress == null) {
            progress = Progress.NONE;
        }
    }

    /** The given route, the default memory budget, never cancelled. */
    public static PlanOptions of(Route route) {
        return new PlanOptions(0, () -> false, route);
    }

    /**
     * What {@code check} does with a mission by default: its discounted objective when it has one,
     * else {@link Route.Auto} with the safest policy.
     */
    public static PlanOptions defaults(Mission mission) {
        return of(mission.objective() instanceof Objective.Discounted ? Route.Discounted.defaults()
                : new Route.Auto(PolicyChoice.SAFEST));
    }

    public PlanOptions withMemoryBudget(long bytes) {
        return new PlanOptions(bytes, cancelled, route, progress);
    }

    public PlanOptions withCancelled(BooleanSupplier flag) {
        return new PlanOptions(memoryBudgetBytes, flag, route, progress);
    }

    public PlanOptions withRoute(Route r) {
        return new PlanOptions(memoryBudgetBytes, cancelled, r, progress);
    }

    public PlanOptions withProgress(Progress p) {
        return new PlanOptions(memoryBudgetBytes, cancelled, route, p);
    }

    /** The product-game options of these limits. */
    ProductOptions product() {
        return ProductOptions.defaults().withMemoryBudget(memoryBudgetBytes).withCancelled(cancelled);
    }
}
