package dockline.view;

import dockline.model.Mission;

/** View data for a mission that has not been solved: the map is shown, nothing else. */
public record MapOnlyData(Mission mission, VerdictSummary verdict) implements ViewData {

    public MapOnlyData(Mission mission) {
        this(mission, VerdictSummary.notChecked("press Check to solve this mission"));
    }
}
