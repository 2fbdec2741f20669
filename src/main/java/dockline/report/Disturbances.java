package dockline.report;

import dockline.model.DisturbanceModel;
import dockline.model.EventRule;
import dockline.model.Mission;

/**
 * The disturbance model of a mission in plain words, for the report: the budget, and each rule with its
 * kind, place, duration and limit (maps/README.md, "Game semantics", gives the rules the words describe).
 */
final class Disturbances {

    private Disturbances() {
    }

    static String words(Mission m) {
        DisturbanceModel d = m.map().disturbances();
        int k = d.budget();
        if (k == 0 || d.rules().isEmpty()) {
            return "No disturbances: the building is assumed to behave as planned (budget " + k + ").";
        }
        StringBuilder sb = new StringBuilder();
        sb.append("Up to ").append(k).append(k == 1 ? " disturbance" : " disturbances")
                .append(d.budgetPerLap() ? " per lap" : m.tasks().patrols() ? " in the whole patrol" : " per mission")
                .append(", each chosen by the building at the worst moment for the robot:");
        for (EventRule r : d.rules()) {
            sb.append(' ').append(rule(r, m)).append(';');
        }
        sb.setLength(sb.length() - 1);
        sb.append('.');
        return sb.toString();
    }

    private static String rule(EventRule r, Mission m) {
        String where = (r.label() == null || r.label().isBlank() ? "" : r.label() + ", ") + r.cells().size()
                + (r.cells().size() == 1 ? " cell" : " cells");
        String what = switch (r.kind()) {
            case DOOR_SHUT -> "a door shuts as the robot arrives (" + where + ")" + (r.lasting()
                    ? " and stays shut for the rest of the mission" : "; the robot waits one step and pushes through");
            case BLOCKAGE -> "the way is blocked (" + where + ")" + (r.lasting()
                    ? " for the rest of the mission" : " for one step");
            case SLIP -> "the wheels slip to a free cell beside the target (" + where + ")";
            case DRAG -> "a drag costs " + r.extraWh().stripTrailingZeros().toPlainString() + " Wh more per move ("
                    + where + ")";
        };
        if (r.limited()) {
            what += ", at most " + r.atMost() + (r.atMost() == 1 ? " time" : " times");
        }
        return what;
    }
}
