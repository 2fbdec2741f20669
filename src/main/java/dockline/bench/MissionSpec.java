package dockline.bench;

import dockline.model.Charge;
import dockline.model.Objective;
import java.math.BigDecimal;

/**
 * What kind of mission {@link MissionGenerator} makes on a generated floor.
 *
 * @param tasks        number of rooms to visit (at least 1)
 * @param ordered      visit them in the order listed
 * @param avoidQuiet   never occupy the {@code quiet-area} room
 * @param budget       disturbance budget K (overrides the map's)
 * @param resolutionWh size of one energy unit in Wh
 * @param capacityWh   battery capacity in Wh
 * @param chargeWh     charge gained per step on a dock (zero: no charging)
 * @param startCharge  starting charge
 * @param reserve      reserve floor
 * @param taskRadius   task rooms are picked among the rooms whose centre is within this many cells
 *                     (Manhattan) of the start; 0 = anywhere on the floor
 * @param objective    the objective
 */
public record MissionSpec(int tasks, boolean ordered, boolean avoidQuiet, int budget, BigDecimal resolutionWh,
                          BigDecimal capacityWh, BigDecimal chargeWh, Charge startCharge, Charge reserve,
                          int taskRadius, Objective objective) {

    public MissionSpec {
        if (tasks < 1 || budget < 0 || taskRadius < 0) {
            throw new IllegalArgumentException("tasks must be positive, budget and radius not negative");
        }
    }

    /**
     * A consumption-only mission (no charging: charge rate 0): a 100 Wh battery at 0.1 Wh resolution
     * (1,000 levels), starting full, reserve floor 20 %, three rooms in order within 120 cells of the
     * start, then any dock. The fast path's showcase.
     */
    public static MissionSpec consumptionOnly(int budget) {
        return new MissionSpec(3, true, true, budget, new BigDecimal("0.1"), new BigDecimal("100"), BigDecimal.ZERO,
                Charge.percent(new BigDecimal("100")), Charge.percent(new BigDecimal("20")), 120,
                new Objective.Reserve());
    }

    /**
     * A mission with charging on the docks and few energy levels: a 20 Wh battery at 0.5 Wh
     * resolution (40 units; every move rounds up to one unit), reserve floor 1 Wh, 2 Wh gained per
     * step on a dock, three rooms anywhere on the floor in order. Docks are {@value BuildingGenerator#PITCH}
     * cells apart, so the robot hops from dock to dock across the floor and the product with the
     * reserve monitor covers the whole floor at most levels: its size grows with the floor area,
     * not with the battery. The product routes' benchmark.
     */
    public static MissionSpec docking(int budget) {
        return new MissionSpec(3, true, true, budget, new BigDecimal("0.5"), new BigDecimal("20"), new BigDecimal("2"),
                Charge.percent(new BigDecimal("100")), Charge.wh(new BigDecimal("1")), 0, new Objective.Reserve());
    }

    public MissionSpec withObjective(Objective o) {
        return new MissionSpec(tasks, ordered, avoidQuiet, budget, resolutionWh, capacityWh, chargeWh, startCharge,
                reserve, taskRadius, o);
    }

    public MissionSpec withTaskRadius(int r) {
        return new MissionSpec(tasks, ordered, avoidQuiet, budget, resolutionWh, capacityWh, chargeWh, startCharge,
                reserve, r, objective);
    }

    public MissionSpec withTasks(int n, boolean inOrder) {
        return new MissionSpec(n, inOrder, avoidQuiet, budget, resolutionWh, capacityWh, chargeWh, startCharge,
                reserve, taskRadius, objective);
    }

    public MissionSpec withCharge(BigDecimal wh) {
        return new MissionSpec(tasks, ordered, avoidQuiet, budget, resolutionWh, capacityWh, wh, startCharge,
                reserve, taskRadius, objective);
    }

    public MissionSpec withBattery(BigDecimal capWh, BigDecimal resWh, Charge start, Charge floor) {
        return new MissionSpec(tasks, ordered, avoidQuiet, budget, resWh, capWh, chargeWh, start, floor, taskRadius,
                objective);
    }
}
