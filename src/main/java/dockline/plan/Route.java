package dockline.plan;

import dockline.solve.fast.FastPath;
import dockline.solve.game.GameSolver;

/**
 * How {@link MissionPlanner#plan} answers the mission. Each route is a record with only the settings
 * that route reads, so a setting a route would ignore cannot be passed to it.
 */
public sealed interface Route permits Route.Auto, Route.Fast, Route.Charging, Route.Product, Route.Stored,
        Route.VerdictOnly, Route.Margins, Route.Discounted {

    /**
     * Reserve objective, the route {@code check} takes by default: {@link Fast} when the robot cannot
     * charge before the mission is complete, else {@link Charging} for the safest policy (when its game
     * applies: the only energy gains are charge steps on a dock), else {@link Product}; the highest
     * floor is found and, when not guaranteed, suggestions are found.
     *
     * @param policy which guaranteed policy is reported (the fast path's and the charging route's are the
     *               safest; {@link PolicyChoice#FEWEST_MOVES} takes the product route)
     */
    record Auto(PolicyChoice policy) implements Route {
        public Auto {
            policy = policy == null ? PolicyChoice.SAFEST : policy;
        }
    }

    /**
     * Reserve objective on arena × goal by the minimum-charge solver (Knuth 1977), for missions
     * without charging before the end; its policy of least need is the safest policy.
     *
     * @param maxPolicyRows the policy is written out and certified up to this many robot situations
     */
    record Fast(int maxPolicyRows) implements Route {
        public Fast {
            if (maxPolicyRows < 0) {
                throw new IllegalArgumentException("maxPolicyRows must not be negative");
            }
        }

        public static Fast defaults() {
            return new Fast(FastPath.DEFAULT_MAX_POLICY_ROWS);
        }
    }

    /**
     * Reserve objective with charging on arena × goal, no battery levels in the game
     * ({@link dockline.solve.charging.FloorSweep}): verdict, lowest start, highest floor and the safest
     * policy as level thresholds per game position, all from one pass; the policy is certified by the
     * independent checker. Its policy is the safest (the threshold policy at the highest floor).
     *
     * @param replays     also make the worst-case, nominal and forced replays ({@link PlanReplays})
     * @param suggestions when not guaranteed, find what would make it guaranteed
     * @param orProduct   when the charging route does not apply to the mission, take {@link Product} with the
     *                    safest policy and the same replays and suggestions instead of refusing
     * @param heatBounds  also give the charge needed from every situation as bounds
     *                    ({@link dockline.solve.charging.NeedBounds}: exact on a whole arena, a lower and an upper
     *                    bound on the kept closure phases of a mission with lasting closures)
     * @param wholeHeat   with {@code heatBounds}: when the policy was found on kept closure phases but the whole
     *                    closure arena is small ({@link PictureRoute#MAX_WHOLE_ROBOT_VERTICES}), give the bounds of
     *                    the whole arena instead (exact everywhere; one more pass, the policy unchanged)
     */
    record Charging(boolean replays, boolean suggestions, boolean orProduct, boolean heatBounds, boolean wholeHeat)
            implements Route {
        /** No heat bounds. */
        public Charging(boolean replays, boolean suggestions, boolean orProduct) {
            this(replays, suggestions, orProduct, false, false);
        }

        /** Heat bounds, when asked for, on the arena the policy was found on. */
        public Charging(boolean replays, boolean suggestions, boolean orProduct, boolean heatBounds) {
            this(replays, suggestions, orProduct, heatBounds, false);
        }

        /** Verdict, policy, certificate and figures; no replays, suggestions when not guaranteed, refuse if not applicable. */
        public static Charging defaults() {
            return new Charging(false, true, false);
        }

        /**
         * The route of the safest policy of a one-trip mission as {@code export} writes it, with or without its
         * replays and heat bounds: the charging route (phase by phase on lasting closures), or the product route's
         * safest policy where the charging route does not apply. {@code replay} and the pictures ({@link
         * PictureRoute}) take this route too, so the run they show is a run of the very policy in the file; the
         * flags add replays and a heat map (on the whole arena when it is small) to the plan and never change its
         * policy.
         */
        public static Charging exportedPolicy(boolean replays, boolean heatBounds) {
            return new Charging(replays, false, true, heatBounds, heatBounds);
        }
    }

    /**
     * Reserve objective on the product game (arena × goal × battery levels) with its moves generated on
     * demand.
     *
     * @param policy       which guaranteed policy is reported
     * @param highestFloor search the highest guaranteed floor (always done for {@link PolicyChoice#SAFEST},
     *                     and for the replays of a mission that is not guaranteed)
     * @param suggestions  when not guaranteed, find what would make it guaranteed
     * @param replays      also make the worst-case, nominal and forced replays ({@link PlanReplays})
     * @param heatMap      also compute the charge needed from every situation ({@link dockline.solve.reserve.ChargeNeeded})
     */
    record Product(PolicyChoice policy, boolean highestFloor, boolean suggestions, boolean replays, boolean heatMap)
            implements Route {
        public Product {
            policy = policy == null ? PolicyChoice.SAFEST : policy;
        }

        /** The policy, the highest floor and the suggestions; no replays, no heat map. */
        public static Product of(PolicyChoice policy) {
            return new Product(policy, true, true, false, false);
        }
    }

    /**
     * Reserve objective on the product game stored in CSR arrays: the reference route.
     *
     * @param policy which guaranteed policy is reported
     * @param solver the attractor solver of the stored game (null: the compact attractor)
     */
    record Stored(PolicyChoice policy, GameSolver.Factory solver) implements Route {
        public Stored {
            policy = policy == null ? PolicyChoice.SAFEST : policy;
        }
    }

    /**
     * Reserve objective, the verdict alone, stopping as soon as it is known: no policy, no certificate,
     * no margins.
     *
     * @param where {@link Where#AUTO}: the fast path's early exit when it applies, else the product game
     *              without storing it; {@link Where#FAST} or {@link Where#PRODUCT} to force one of them
     */
    record VerdictOnly(Where where) implements Route {
        /** Where a verdict-only route decides. */
        public enum Where { AUTO, FAST, PRODUCT }

        public VerdictOnly {
            where = where == null ? Where.AUTO : where;
        }
    }

    /**
     * Reserve objective: the highest guaranteed floor and the lowest starting charge, each computed two
     * independent ways (bisection over the threshold solver; the charging route's minimum-credit pass), and the
     * suggestions when not guaranteed. No policy.
     */
    record Margins() implements Route {
    }

    /**
     * The mission's discounted objective (its tasks and dock too) on the comparator product.
     *
     * @param keepReserve  keep the reserve floor as well (the default)
     * @param alsoOptimise also run the optimisation baseline (value iteration)
     */
    record Discounted(boolean keepReserve, boolean alsoOptimise) implements Route {
        public static Discounted defaults() {
            return new Discounted(true, false);
        }
    }
}
