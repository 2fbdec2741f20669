package dockline.report;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.model.Mission;
import dockline.plan.Plan;
import dockline.replay.Replay;
import dockline.util.ProgressListener;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@link ReportRun}: several missions at once on a bounded pool, results in input order whatever order they
 * finish in, and the same results as one at a time.
 */
class ReportRunTest {

    @TempDir
    Path dir;

    /** Counts how many pictures are drawn at the same time (each mission draws one, inside its worker). */
    static final class Counting implements Pictures {
        final AtomicInteger now = new AtomicInteger();
        final AtomicInteger most = new AtomicInteger();

        private byte[] draw() {
            int n = now.incrementAndGet();
            most.accumulateAndGet(n, Math::max);
            try {
                Thread.sleep(150);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            now.decrementAndGet();
            return new byte[] {1};
        }

        @Override
        public byte[] oneTrip(Plan plan) {
            return draw();
        }

        @Override
        public byte[] run(Mission mission, Replay run, boolean guaranteed, String headline) {
            return draw();
        }
    }

    @Test
    void boundedPool_keepsTheOrder_andGivesTheSameResultsAsOneAtATime() throws Exception {
        Path heavy = ReportRuleOfThumbTest.lane(dir, "heavy", 25);
        Path light = ReportRuleOfThumbTest.lane(dir, "light", 1);
        List<Path> files = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            files.add(ReportRuleOfThumbTest.mission(dir, i % 2 == 0 ? heavy : light, "run-" + i, 40 + 5 * i, 5));
        }
        Counting two = new Counting();
        List<String> order = new ArrayList<>();
        List<Integer> percents = new ArrayList<>();
        List<MissionResult> parallel = ReportRun.check(files, 2, two, new ProgressListener() {
            @Override
            public void stage(int percent, String missionDone) {
                order.add(missionDone);
                percents.add(percent);
            }
        });
        assertThat(two.most.get()).isBetween(1, 2);
        assertThat(order).hasSize(6);
        for (int i = 0; i < 6; i++) {
            assertThat(order.get(i)).as("one stage per mission done, counted in order").startsWith("[" + (i + 1) + "/6] ");
            String file = files.get(i).toString();
            assertThat(order).as("every mission once").filteredOn(w -> w.contains(file + ": ")).hasSize(1);
        }
        assertThat(percents).isSorted().endsWith(100);
        List<MissionResult> serial = ReportRun.check(files, 1, new Counting(), null);
        for (int i = 0; i < files.size(); i++) {
            assertThat(parallel.get(i).file()).isEqualTo(files.get(i));
            assertThat(parallel.get(i).status()).isEqualTo(serial.get(i).status());
            assertThat(parallel.get(i).figures().lowestLevelUnits()).isEqualTo(serial.get(i).figures().lowestLevelUnits());
            assertThat(parallel.get(i).figures().highestFloorUnits()).isEqualTo(serial.get(i).figures().highestFloorUnits());
        }
        // closed form of the lane (ReportRuleOfThumbTest): guaranteed when start - 9 - 2 * extra >= 5
        for (int i = 0; i < files.size(); i++) {
            int start = 40 + 5 * i;
            int extra = i % 2 == 0 ? 25 : 1;
            assertThat(parallel.get(i).figures().guaranteed()).as("run-%d", i).isEqualTo(start - 9 - 2 * extra >= 5);
        }
        assertThat(ReportRun.exitCode(parallel)).isEqualTo(1);
    }
}
