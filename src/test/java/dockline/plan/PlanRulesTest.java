package dockline.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dockline.io.MissionLoader;
import dockline.model.Mission;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The core entry point's own rules: it imports no front end, and a route refuses what it cannot do. */
class PlanRulesTest {

    /** The core never depends on the command line or the view (DEVELOPERS.md, Layout). */
    @Test
    void thePlanPackage_importsNoFrontEnd() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(Path.of("src/main/java/dockline/plan"))) {
            files = s.filter(f -> f.toString().endsWith(".java")).toList();
        }
        assertThat(files).hasSizeGreaterThan(5);
        for (Path f : files) {
            assertThat(Files.readString(f)).as(f.toString()).doesNotContain("import dockline.cli")
                    .doesNotContain("import dockline.view").doesNotContain("import javafx").doesNotContain("picocli");
        }
    }

    /** missions/README.md: the supply run charges on the dock during the round, so the fast path does not apply. */
    @Test
    void theFastRoute_refusesAMissionThatCharges() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/supply-run.yaml"));
        assertThatThrownBy(() -> MissionPlanner.plan(m, PlanOptions.of(Route.Fast.defaults())))
                .isInstanceOf(RouteNotApplicableException.class).hasMessageContaining("fast path does not apply");
        assertThatThrownBy(() -> MissionPlanner.plan(m, PlanOptions.of(Route.Discounted.defaults())))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("discounted objective");
    }

    /**
     * missions/README.md's figures: night-round's safest policy keeps 83 units (the highest floor), the
     * policy of fewest moves 47; supply-run's safest keeps 40 (its highest floor), fewest moves 24.
     */
    @Test
    void demoFigures_ofBothPolicies() throws Exception {
        Mission night = MissionLoader.load(Path.of("missions/night-round.yaml"));
        Mission supply = MissionLoader.load(Path.of("missions/supply-run.yaml"));
        assertThat(MissionPlanner.plan(night, PlanOptions.defaults(night)).lowestLevelUnits()).hasValue(83);
        assertThat(MissionPlanner.plan(night, PlanOptions.of(new Route.Auto(PolicyChoice.FEWEST_MOVES)))
                .lowestLevelUnits()).hasValue(47);
        Plan safe = MissionPlanner.plan(supply, PlanOptions.defaults(supply));
        assertThat(safe.lowestLevelUnits()).hasValue(40);
        assertThat(safe.highestFloorUnits()).hasValue(40);
        assertThat(MissionPlanner.plan(supply, PlanOptions.of(new Route.Auto(PolicyChoice.FEWEST_MOVES)))
                .lowestLevelUnits()).hasValue(24);
    }
}
