package dockline.model;

import java.nio.file.Path;

/**
 * One mission on one building map: the robot, where and with how much charge it starts, the
 * reserve floor, the tasks and the objective.
 *
 * @param name        a human name
 * @param source      the mission file (may be {@code null} for generated missions)
 * @param map         the building map it runs on (already loaded)
 * @param robot       the robot's energy profile
 * @param start       start cell (free)
 * @param startCharge starting charge (Wh or % of capacity)
 * @param reserve     reserve floor (Wh or % of capacity)
 * @param tasks       the tasks
 * @param objective   the objective
 */
public record Mission(String name, Path source, BuildingMap map, RobotProfile robot, Cell start,
                      Charge startCharge, Charge reserve, Tasks tasks, Objective objective) {

    public EnergyScale scale() {
        return robot.scale();
    }

    public int capacityUnits() {
        return scale().capacity(robot.capacityWh());
    }

    public int startUnits() {
        return Math.min(capacityUnits(), scale().start(startCharge.toWh(robot.capacityWh())));
    }

    public int reserveUnits() {
        return scale().reserve(reserve.toWh(robot.capacityWh()));
    }

    public Mission withReserve(Charge r) {
        return new Mission(name, source, map, robot, start, startCharge, r, tasks, objective);
    }

    public Mission withStartCharge(Charge c) {
        return new Mission(name, source, map, robot, start, c, reserve, tasks, objective);
    }

    public Mission withBudget(int k) {
        return new Mission(name, source, map.withBudget(k), robot, start, startCharge, reserve, tasks, objective);
    }

    /** The same mission with every door-shut and blockage of its map given duration {@code d}. */
    public Mission withDoorsAndBlockages(EventDuration d) {
        return new Mission(name, source, map.withDisturbances(map.disturbances().withDoorsAndBlockages(d)), robot, start,
                startCharge, reserve, tasks, objective);
    }

    public Mission withObjective(Objective o) {
        return new Mission(name, source, map, robot, start, startCharge, reserve, tasks, o);
    }
}
