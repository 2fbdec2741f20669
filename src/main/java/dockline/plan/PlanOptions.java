package dockline.plan;

import dockline.model.Mission;
import dockline.model.Objective;
import dockline.solve.ProductOptions;
import java.util.function.BooleanSupplier;

/**
 * The options of {@link MissionPlanner#plan}: the limits every route shares and the route itself
 * (which carries its own settings).
 *
 * @param limits the memory budget (0: half the JVM's heap) and the cancellation flag, polled by the
 *               solvers (when it turns true the plan stops with
 *               {@link java.util.concurrent.CancellationException}), as the product games take them
 * @param route  how the mission is answered
 *
 * <p>How far a plan has got is told to the planning thread's progress listener
 * ({@link dockline.util.Progress#stage}, {@link dockline.util.Progress#listen}), not through these options.
 */
public record PlanOptions(ProductOptions limits, Route route) {

    public PlanOptions {
        if (limits == null) {
            limits = ProductOptions.defaults();
        }
        if (route == null) {
            throw new IllegalArgumentException("a route is needed");
        }
    }

    /** The given route, the default memory budget, never cancelled. */
    public static PlanOptions of(Route route) {
        return new PlanOptions(ProductOptions.defaults(), route);
    }

    /**
     * What {@code check} does with a mission by default: its discounted objective when it has one,
     * else {@link Route.Auto} with the safest policy.
     */
    public static PlanOptions defaults(Mission mission) {
        return of(mission.objective() instanceof Objective.Discounted ? Route.Discounted.defaults()
                : new Route.Auto(PolicyChoice.SAFEST));
    }

    /** Refuse games estimated to need more than {@code bytes} (must not be negative; 0: the default). */
    public PlanOptions withMemoryBudget(long bytes) {
        return new PlanOptions(limits.withMemoryBudget(bytes), route);
    }

    public PlanOptions withCancelled(BooleanSupplier flag) {
        return new PlanOptions(limits.withCancelled(flag), route);
    }

    /** The memory budget asked for, 0 for the default. */
    public long memoryBudgetBytes() {
        return limits.memoryBudgetBytes();
    }

    /** Polled by the solvers. */
    public BooleanSupplier cancelled() {
        return limits.cancelled();
    }

    /** The product-game options of these limits. */
    ProductOptions product() {
        return limits;
    }
}
