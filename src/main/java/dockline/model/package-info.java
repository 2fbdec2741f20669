/**
 * Immutable records for a building map and a mission, and the energy discretisation.
 *
 * <p>Start with {@link dockline.model.Mission} (what is asked) and {@link dockline.model.BuildingMap}
 * (the floor and its disturbance model); {@link dockline.model.EnergyScale} turns Wh figures into
 * integer energy units, always rounding against the robot.
 */
package dockline.model;
