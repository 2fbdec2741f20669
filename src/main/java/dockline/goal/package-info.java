/**
 * The goal automaton: a deterministic automaton over the zone labels of the cells the robot
 * occupies (visit zones in order or in any order, avoid zones, finish on a dock).
 * Entry point: {@link dockline.goal.GoalAutomaton#of(dockline.model.Mission)}.
 */
package dockline.goal;
