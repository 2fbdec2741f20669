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
 *
 * <p>How far a plan has got is told to the planning thread's progress listener
 * ({@link dockline.util.Progress#stage}, {@link dockline.util.Progress#listen}), not through these options.
 */
public record PlanOptions(long memoryBudgetBytes, BooleanSupplier cancelled, Route route) {

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
        return new PlanOptions(bytes, cancelled, route);
    }

    public PlanOptions withCancelled(BooleanSupplier flag) {
        return new PlanOptions(memoryBudgetBytes, flag, route);
    }

    public PlanOptions withRoute(Route r) {
        return new PlanOptions(memoryBudgetBytes, cancelled, r);
    }

    /** The product-game options of these limits. */
    ProductOptions product() {
        return ProductOptions.defaults().withMemoryBudget(memoryBudgetBytes).withCancelled(cancelled);
    }
}
