package dockline.view;

import dockline.model.Mission;
import java.util.List;

/** View data for a mission that has not been solved: the map is shown, nothing else. */
public record MapOnlyData(Mission mission, VerdictSummary verdict) implements ViewData {

    public MapOnlyData(Mission mission) {
        this(mission, VerdictSummary.notChecked("press Check to solve this mission"));
    }

    @Override
    public boolean solved() {
        return false;
    }

    @Override
    public List<ViewReplay> replays() {
        return List.of();
    }
}
