package dockline.replay;

import dockline.arena.ActionKind;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EnergyScale;
import dockline.model.Mission;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/**
 * The plain-words account of a replay: which events happened where (door, zone and surface names
 * from the map), the route the robot took after each, and where the battery crossed the floor or why
 * completion is out of reach.
 */
final class Explanation {

    private final Mission mission;
    private final BuildingMap map;
    private final EnergyScale scale;
    private final Replay replay;

    private Explanation(Mission mission, Replay replay) {
        this.mission = mission;
        this.map = mission.map();
        this.scale = mission.scale();
        this.replay = replay;
    }

    static List<String> lines(Mission mission, Replay replay, int bestEffortFloor) {
        return new Explanation(mission, replay).lines(bestEffortFloor);
    }

    private String units(int u) {
        return Replayer.units(u, scale);
    }

    private String place(Cell c) {
        List<String> zones = map.zonesAt(c);
        String surface = map.terrainAt(c).surface();
        String dock = map.terrainAt(c).dock() ? ", dock" : "";
        return c + " (" + (zones.isEmpty() ? "" : String.join(", ", zones) + "; ") + surface + dock + ")";
    }

    private List<String> lines(int bestEffortFloor) {
        List<String> out = new ArrayList<>();
        List<ReplayStep> steps = replay.steps();
        ReplayStep low = lowest();
        String floor = units(replay.floorUnits());
        switch (replay.kind()) {
            case WORST -> out.add("Worst case of the certified policy: the lowest battery is " + units(low.batteryUnits())
                    + " at step " + low.step() + ", at " + place(low.cell()) + "; reserve floor " + floor + ".");
            case NOMINAL -> out.add(bestEffort(bestEffortFloor) + "Nominal run (no events): the lowest battery is "
                    + units(low.batteryUnits()) + " at step " + low.step() + "; reserve floor " + floor + ".");
            case FORCED -> out.add(bestEffort(bestEffortFloor) + "Forced scenario: the policy answers the events named;"
                    + " the lowest battery is " + units(low.batteryUnits()) + " at step " + low.step() + "; reserve floor "
                    + floor + ".");
            case COUNTEREXAMPLE -> {
                out.add("Not guaranteed: the disturbances below defeat every policy the robot could follow.");
                if (bestEffortFloor >= 0) {
                    out.add("Against the robot's best effort (its policy for the highest reserve that can still be"
                            + " guaranteed from this start, " + units(bestEffortFloor) + "):");
                } else {
                    out.add("No reserve floor at all can be guaranteed from this start; the robot keeps as much charge as"
                            + " it can at each step:");
                }
            }
        }
        List<Integer> eventRows = new ArrayList<>();
        for (int i = 1; i < steps.size(); i++) {
            if (!steps.get(i).event().nominal()) {
                eventRows.add(i);
            }
        }
        for (int k = 0; k < eventRows.size(); k++) {
            int i = eventRows.get(k);
            ReplayStep s = steps.get(i);
            int until = k + 1 < eventRows.size() ? eventRows.get(k + 1) : steps.size();
            out.add("step " + s.step() + ": " + event(steps.get(i - 1), s) + route(i + 1, until) + ".");
        }
        if (eventRows.isEmpty() && replay.kind() != Replay.Kind.NOMINAL) {
            out.add(replay.kind() == Replay.Kind.COUNTEREXAMPLE
                    ? "No event is needed: the run below fails without any disturbance" + route(1, steps.size()) + "."
                    : "No event lowers the battery further than the nominal run.");
        }
        ReplayStep last = replay.last();
        switch (replay.ending()) {
            case COMPLETE -> out.add("The mission completes at step " + last.step() + " at " + place(last.cell()) + " with "
                    + units(last.batteryUnits()) + ".");
            case BELOW_FLOOR -> out.add("At step " + last.step() + " the battery falls to " + units(last.batteryUnits())
                    + ", below the reserve floor " + floor + ", at " + place(last.cell()) + ".");
            case AVOIDED_ZONE -> out.add("At step " + last.step() + " the robot is in an avoided zone at " + place(last.cell())
                    + ".");
            case REPEATS -> out.add("At step " + last.step() + " the run is back in a situation it was in before: the"
                    + " disturbance can repeat this forever, so the mission never completes.");
            case NO_POLICY -> out.add("At step " + last.step() + " the policy has no action for the situation reached.");
        }
        return out;
    }

    private String bestEffort(int bestEffortFloor) {
        return bestEffortFloor < 0 ? "" : "Not guaranteed; this runs the robot's best effort, its policy for the highest"
                + " reserve that can be guaranteed (" + units(bestEffortFloor) + "). ";
    }

    /** One event in words, with the map's names for the door, zones and surfaces. */
    private String event(ReplayStep before, ReplayStep s) {
        ReplayEvent e = s.event();
        String rule = "by rule '" + e.ruleLabel() + "'";
        int cost = before.batteryUnits() - s.batteryUnits();
        String paid = cost > 0 ? "; the step cost " + units(cost) : "";
        String from = place(before.cell());
        String target = s.action().filter(a -> a.kind() == ActionKind.MOVE).map(a -> a.target().toString()).orElse("");
        String stays = e.lasting() ? "; " + e.closed() + " stays closed for the rest of the mission, the robot stays"
                + " and must find another way" : "; it stays";
        return switch (e.kind()) {
            case DOOR_SHUT -> (e.doorName().startsWith("door ") ? e.doorName() : "door " + e.doorName()) + " at "
                    + e.cell() + " shut " + rule + " as the robot tried to go through it from " + from
                    + stays + paid;
            case BLOCKAGE -> place(e.cell()) + " blocked " + rule + " as the robot tried to enter it from " + from
                    + stays + paid;
            case SLIP -> "the wheels slipped " + rule + ": on the way from " + from + " to " + target
                    + " the robot ended at " + place(e.cell()) + paid;
            case DRAG -> "drag entering " + place(e.cell()) + " " + rule + ", coming from " + before.cell() + paid;
        };
    }

    private ReplayStep lowest() {
        ReplayStep low = replay.steps().get(0);
        for (ReplayStep s : replay.steps()) {
            if (s.batteryUnits() < low.batteryUnits()) {
                low = s;
            }
        }
        return low;
    }

    /** "; then the route runs 6 cells through hall, east-wing (carpet 4, tile 2)" for rows from..until-1. */
    private String route(int from, int until) {
        List<ReplayStep> steps = replay.steps();
        Set<String> zones = new LinkedHashSet<>();
        Map<String, Integer> surfaces = new TreeMap<>();
        int cells = 0;
        for (int i = from; i < until; i++) {
            ReplayStep s = steps.get(i);
            if (s.cell().equals(steps.get(i - 1).cell())) {
                continue;
            }
            cells++;
            zones.addAll(map.zonesAt(s.cell()));
            surfaces.merge(map.terrainAt(s.cell()).surface(), 1, Integer::sum);
        }
        if (cells == 0) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        surfaces.entrySet().stream()
                .sorted((a, b) -> a.getValue().equals(b.getValue()) ? a.getKey().compareTo(b.getKey())
                        : b.getValue() - a.getValue())
                .forEach(e -> parts.add(e.getKey() + " " + e.getValue()));
        return "; then the route runs " + cells + (cells == 1 ? " cell" : " cells")
                + (zones.isEmpty() ? "" : " through " + String.join(", ", zones)) + " (" + String.join(", ", parts) + ")";
    }
}
