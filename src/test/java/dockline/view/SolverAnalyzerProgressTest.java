package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.io.MissionLoader;
import dockline.model.Mission;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The window's progress while it solves: the bar only rises (the plan's stages), and the solver's own
 * phases show in the words with their per cent (one util.ProgressListener for both), so a long solve is seen
 * to move.
 */
class SolverAnalyzerProgressTest {

    @Test
    void theBarOnlyRises_andTheSolversPhasesShowInTheWords() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/night-round.yaml"));
        List<Integer> percents = new ArrayList<>();
        List<String> words = new ArrayList<>();
        new SolverAnalyzer().analyze(m, () -> false, new SolveTask.Status((w, p) -> {
            percents.add(p);
            words.add(w);
        }));
        for (int i = 1; i < percents.size(); i++) {
            assertThat(percents.get(i)).as("step %d of %s", i, words).isGreaterThanOrEqualTo(percents.get(i - 1));
        }
        assertThat(words).anySatisfy(w -> assertThat(w).contains("building the move graph: ").endsWith(" %)"));
        // the window plans on the exported policy's route, the charging route's one pass
        assertThat(words).anySatisfy(w -> assertThat(w).contains("solving the game, every floor in one pass"));
        assertThat(words).anySatisfy(w -> assertThat(w).contains("charging route: docks in decreasing floor: ")
                .endsWith(" %)"));
    }
}
