package dockline.solve.reserve;

import dockline.arena.Arena;
import dockline.goal.GoalAutomaton;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.solve.SizeEstimate;
import dockline.solve.Verdict;
import dockline.solve.WinningRegion;
import dockline.solve.game.ProductGame;
import dockline.solve.game.Solution;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Everything one run of {@link ReserveSolver#analyse} found out about a mission with the reserve
 * objective. All energy figures are in units of {@link #scale()}.
 *
 * @param mission                        the mission as analysed (overrides applied)
 * @param verdict                        whether the mission is guaranteed
 * @param startUnits                     starting level (rounded down, at most the capacity)
 * @param reserveUnits                   reserve floor (rounded up)
 * @param capacityUnits                  capacity (rounded down)
 * @param scale                          the energy unit and rounding
 * @param worstCaseMinimumUnits          the lowest level the disturbances can force while the robot
 *                                       follows {@link #policy()}; empty when not guaranteed
 * @param highestGuaranteedReserveUnits  the highest floor that can be guaranteed from the start; empty
 *                                       when no floor can (or when not searched: see {@code highestReserveSearched})
 * @param highestReserveSearched         whether the highest floor was searched to the end
 * @param productVertices                vertices of the product game of the verdict (at the reserve floor)
 * @param productEdges                   edges of that game
 * @param estimate                       its size estimated before building
 * @param buildMillis                    time to build that game
 * @param solveMillis                    time to build and solve it and derive the policy and worst case
 * @param totalMillis                    time of the whole analysis (highest floor and heat map included)
 * @param policy                         the robot's policy when guaranteed
 * @param policyFloorUnits               the floor of the game the policy comes from: the reserve, or with
 *                                       {@link ReserveOptions#safestPolicy()} the highest guaranteed floor
 * @param game                           on the stored route ({@link ReserveOptions.Route#PRODUCT}) the
 *                                       product game the policy comes from, at {@code policyFloorUnits}
 *                                       (when not guaranteed, the game of the verdict); null on the
 *                                       implicit route (the default), which stores no product
 * @param solution                       its solution (null when {@code game} is)
 * @param chargeNeeded                   the heat map, when asked for
 * @param notes                          things the reader should know (e.g. a search skipped for memory)
 * @param arena                          the compiled arena of the mission (for certificates and replays)
 * @param goal                           the mission's goal automaton
 * @param region                         the robot's whole winning region at the reserve floor, when the
 *                                       solve computed all of it: always on the stored route, and on the
 *                                       implicit route when not guaranteed (there the search stops as soon
 *                                       as the start is won). The counterexample stays outside it.
 *
 * <p>Data only (an immutable result).
 */
public record ReserveAnalysis(Mission mission, Verdict verdict, int startUnits, int reserveUnits, int capacityUnits,
                              EnergyScale scale, OptionalInt worstCaseMinimumUnits,
                              OptionalInt highestGuaranteedReserveUnits, boolean highestReserveSearched,
                              long productVertices, long productEdges, SizeEstimate estimate,
                              long buildMillis, long solveMillis, long totalMillis,
                              Optional<Policy> policy, int policyFloorUnits, ProductGame game, Solution solution,
                              Optional<ChargeNeeded> chargeNeeded, List<String> notes, Arena arena,
                              GoalAutomaton goal, Optional<WinningRegion> region) {

    public ReserveAnalysis {
        notes = List.copyOf(notes);
    }

    public boolean guaranteed() {
        return verdict == Verdict.GUARANTEED;
    }

    /** Whether the stored CSR product route ({@link ReserveOptions.Route#PRODUCT}) produced this analysis. */
    public boolean storedProduct() {
        return game != null;
    }
}
