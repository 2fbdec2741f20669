package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.arena.Action;
import dockline.io.MissionLoader;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.policy.Policy;
import dockline.policy.PolicyEntry;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The policy layer for the situation of each replay step (tasks done, disturbances left, battery,
 * closures), on a demo mission with the real solver: every cell the policy has rows for in that
 * situation at or below the step's battery level shows a move, and it is the move of the row at
 * the highest such level. The expectation is a plain scan over the policy's rows, not the view's
 * threshold index.
 */
class PolicyLayerTest {

    private static SolverAnalyzer.SolvedData data;
    private static Policy policy;

    @BeforeAll
    static void solve() throws Exception {
        org.testfx.api.FxToolkit.registerPrimaryStage();
        Mission m = MissionLoader.load(Path.of("missions/night-round.yaml"));
        data = (SolverAnalyzer.SolvedData) new SolverAnalyzer().analyze(m, () -> false);
        policy = data.plan().replays().orElseThrow().policy().orElseThrow();
    }

    /** The closures of the policy's row for exactly this situation, by a scan. */
    private static String closuresOf(ViewStep st) {
        for (PolicyEntry e : policy.entries()) {
            if (e.cell().equals(st.cell()) && e.level() == st.levelUnits() && e.budgetLeft() == st.budgetLeft()
                    && e.progress() == st.progress()) {
                return e.closures();
            }
        }
        return null;
    }

    /** The row at the highest level not above the battery, by a scan; null when there is none. */
    private static PolicyEntry expected(Cell c, ViewStep st, String closures) {
        PolicyEntry best = null;
        for (PolicyEntry e : policy.entries()) {
            if (e.cell().equals(c) && e.budgetLeft() == st.budgetLeft() && e.progress() == st.progress()
                    && e.closures().equals(closures) && e.level() <= st.levelUnits()
                    && (best == null || e.level() > best.level())) {
                best = e;
            }
        }
        return best;
    }

    @Test
    void every_cell_the_policy_reaches_in_the_steps_situation_shows_its_move() {
        Mission m = data.mission();
        BuildingMap map = m.map();
        int w = map.width();
        ViewReplay r = data.replays().get(0);
        int arrows = 0;
        int pathCells = 0;
        int checkedSteps = 0;
        for (int i = 0; i < r.length(); i++) {
            ViewStep st = r.steps().get(i);
            String closures = closuresOf(st);
            assertThat(closures).as("step %d is a row of the policy it follows", i).isNotNull();
            MapLayers l = MapLayers.of(data, Overlay.POLICY, st.budgetLeft(), st.progress(), st.levelUnits(), r, i);
            for (int y = 0; y < map.height(); y++) {
                for (int x = 0; x < w; x++) {
                    Cell c = new Cell(x, y);
                    PolicyEntry e = map.isFree(c) ? expected(c, st, closures) : null;
                    Action shown = l.policy(c.index(w));
                    assertThat(shown).as("step %d, cell %s", i, c).isEqualTo(e == null ? null : e.action());
                    if (shown != null) {
                        arrows++;
                    }
                }
            }
            // where the robot stands the arrow is the move it makes next in the replay
            Action next = r.steps().get(i + 1).action();
            assertThat(l.policy(st.cell().index(w))).isEqualTo(next);
            pathCells++;
            checkedSteps++;
        }
        assertThat(checkedSteps).isGreaterThan(5);
        // more than the robot's own cell per step: the layer is not just the path
        assertThat(arrows).isGreaterThan(pathCells);
    }

    @Test
    void hovering_a_cell_says_its_thresholds_in_words() {
        Mission m = data.mission();
        int w = m.map().width();
        ViewReplay r = data.replays().get(0);
        ViewStep st = r.steps().get(0);
        MapLayers l = MapLayers.of(data, Overlay.POLICY, st.budgetLeft(), st.progress(), st.levelUnits(), r, 0);
        String closures = closuresOf(st);
        // a cell whose move changes with the level in the start's situation, found by a scan over the rows
        Cell changing = null;
        for (PolicyEntry a : policy.entries()) {
            for (PolicyEntry b : policy.entries()) {
                if (a.cell().equals(b.cell()) && a.budgetLeft() == st.budgetLeft() && b.budgetLeft() == st.budgetLeft()
                        && a.progress() == st.progress() && b.progress() == st.progress()
                        && a.closures().equals(closures) && b.closures().equals(closures) && !a.action().equals(b.action())) {
                    changing = a.cell();
                    break;
                }
            }
            if (changing != null) {
                break;
            }
        }
        String here = l.policyWords(st.cell()).orElseThrow();
        assertThat(here).startsWith("at ").contains(" or more: ").contains("; below ");
        assertThat(here).contains(PolicyRules.moveWords(m.map(), st.cell(), r.steps().get(1).action()));
        if (changing != null) {
            assertThat(l.policyWords(changing).orElseThrow()).contains(" to below ");
        }
        // a wall says nothing; a cell the policy never reaches in this situation says so
        Cell wall = new Cell(0, 0);
        assertThat(l.policyWords(wall)).isEmpty();
        List<Cell> free = new java.util.ArrayList<>();
        for (int i = 0; i < m.map().cellCount(); i++) {
            Cell c = Cell.ofIndex(i, w);
            if (m.map().isFree(c) && expected(c, new ViewStep(0, c, null, null, "", null, Integer.MAX_VALUE,
                    st.budgetLeft(), st.progress()), closures) == null) {
                free.add(c);
            }
        }
        if (!free.isEmpty()) {
            assertThat(l.policyWords(free.get(0)).orElseThrow()).contains("never gets here");
        }
    }

    @Test
    void moves_in_words_follow_the_compass_of_the_map_rows_from_the_top() {
        BuildingMap map = data.mission().map();
        Cell c = new Cell(5, 5);
        // maps/README.md: y counts rows from the top, so a smaller y is north
        assertThat(PolicyRules.moveWords(map, c, new Action(dockline.arena.ActionKind.MOVE, new Cell(6, 5)))).startsWith("go east");
        assertThat(PolicyRules.moveWords(map, c, new Action(dockline.arena.ActionKind.MOVE, new Cell(5, 4)))).startsWith("go north");
        assertThat(PolicyRules.moveWords(map, c, new Action(dockline.arena.ActionKind.MOVE, new Cell(4, 6)))).startsWith("go south-west");
        assertThat(PolicyRules.moveWords(map, c, new Action(dockline.arena.ActionKind.WAIT, c))).isEqualTo("wait");
    }
}
