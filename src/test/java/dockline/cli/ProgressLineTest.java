package dockline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import dockline.io.MissionLoader;
import dockline.model.Mission;
import dockline.plan.MissionPlanner;
import dockline.plan.PlanOptions;
import dockline.plan.PolicyChoice;
import dockline.plan.Route;
import dockline.util.Progress;
import dockline.util.ProgressListener;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Progress of long work on standard error: shown only on a terminal, never with --json or --quiet,
 * throttled, erased before other output; and the core's callback sees phases whose per cent only rises.
 */
class ProgressLineTest {

    @TempDir
    Path dir;

    private BooleanSupplier saved;

    @BeforeEach
    void save() {
        saved = ProgressLine.terminal;
    }

    @AfterEach
    void restore() {
        ProgressLine.terminal = saved;
    }

    private record Event(String phase, int percent) {
    }

    /** A listener that keeps the phases in {@code phases} and the stages in {@code stages}. */
    private static ProgressListener recording(List<Event> phases, List<Event> stages) {
        return new ProgressListener() {
            @Override
            public void phase(String phase, int percent) {
                phases.add(new Event(phase, percent));
            }

            @Override
            public void stage(int percent, String stage) {
                stages.add(new Event(stage, percent));
            }
        };
    }

    @Test
    void theCoreReportsPhasesWhosePerCentOnlyRises() throws Exception {
        Mission m = MissionLoader.load(Path.of("missions/night-round.yaml"));
        for (var route : List.of(new Route.Auto(PolicyChoice.SAFEST), Route.Product.of(PolicyChoice.SAFEST),
                new Route.Stored(PolicyChoice.SAFEST, null))) {
            List<Event> events = new ArrayList<>();
            List<Event> stages = new ArrayList<>();
            try (Progress.Scope s = Progress.listen(recording(events, stages))) {
                MissionPlanner.plan(m, PlanOptions.of(route));
            }
            // the product routes' stages reach the same listener: their per cent of the plan only rises, to 100
            if (!(route instanceof Route.Auto)) {
                assertThat(stages).as(route.toString()).isNotEmpty();
                assertThat(stages).extracting(Event::percent).isSorted().endsWith(100);
            }
            assertThat(events).as(route.toString()).isNotEmpty();
            assertThat(events.get(0).percent()).isZero();
            assertThat(events).extracting(Event::phase).contains("building the move graph");
            // a phase begins with its one 0 % report; after it, in the same phase, the per cent rises
            int segments = 0;
            for (int i = 0; i < events.size(); i++) {
                Event e = events.get(i);
                assertThat(e.percent()).isBetween(0, 100);
                if (e.percent() == 0) {
                    segments++;
                    continue;
                }
                Event before = events.get(i - 1);
                assertThat(e.phase()).isEqualTo(before.phase());
                assertThat(e.percent()).isGreaterThan(before.percent());
            }
            assertThat(segments).as(route.toString()).isGreaterThanOrEqualTo(2);
            assertThat(events).as("every phase ends at 100 %").filteredOn(e -> e.percent() == 100)
                    .hasSize(segments);
        }
        // nobody listening: nothing is reported, and the tracker is the no-op one
        assertThat(Progress.phase("x", 10)).isSameAs(Progress.Tracker.NONE);
    }

    @Test
    void aTrackerReportsWholePerCentsRisingOnly() {
        List<Event> events = new ArrayList<>();
        try (Progress.Scope s = Progress.listen(recording(events, new ArrayList<>()))) {
            Progress.Tracker t = Progress.phase("counting", 1000);
            t.at(5);   // 0 %: not again
            t.at(10);  // 1 %
            t.at(9);   // lower: nothing
            t.at(10);  // same: nothing
            t.at(999); // 99 %
            t.at(5000); // past the total: still 99 % until done
            t.done();
            t.done();
            Progress.Tracker huge = Progress.phase("huge", Long.MAX_VALUE);
            huge.at(Long.MAX_VALUE / 2);
        }
        assertThat(events).containsExactly(new Event("counting", 0), new Event("counting", 1),
                new Event("counting", 99), new Event("counting", 100), new Event("huge", 0), new Event("huge", 50));
        assertThat(Progress.phase("after", 1)).isSameAs(Progress.Tracker.NONE);
    }

    @Test
    void theLineIsThrottledOverwrittenAndErasedBeforeOtherOutput() throws Exception {
        StringWriter w = new StringWriter();
        AtomicLong now = new AtomicLong(1_000_000_000L);
        ProgressLine line = new ProgressLine(w, now::get);
        line.phase("solving the game at floor 3 units", 0);
        now.addAndGet(100_000_000L);
        line.phase("solving the game at floor 3 units", 10); // 100 ms later: dropped
        now.addAndGet(200_000_000L);
        line.phase("solving", 20); // 300 ms after the first: shown, padded over the longer line
        String first = "dockline: solving the game at floor 3 units  0 %  0.0 s";
        String second = "dockline: solving  20 %  0.3 s";
        assertThat(w.toString()).isEqualTo("\r" + first + "\r" + second + " ".repeat(first.length() - second.length()));
        var guarded = line.guard(w);
        guarded.write("problem\n");
        assertThat(w.toString()).endsWith("\r" + " ".repeat(second.length()) + "\rproblem\n");
        line.erase(); // nothing shown any more: nothing written
        assertThat(w.toString()).endsWith("\rproblem\n");
    }

    @Test
    void resultsOnStandardOutputEraseTheLineFirst() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        ProgressLine.terminal = () -> true;
        try (ProgressLine.Frame f = ProgressLine.open(new java.io.PrintWriter(out), new java.io.PrintWriter(err), false,
                false)) {
            Progress.phase("solving", 10).at(5);
            String shown = err.toString();
            assertThat(shown).startsWith("\rdockline: solving  0 %");
            f.out().println("GUARANTEED");
            // the line was erased on standard error before the result went to standard output
            assertThat(err.toString()).isEqualTo(shown + "\r" + " ".repeat(shown.length() - 1) + "\r");
            assertThat(out.toString()).isEqualTo("GUARANTEED" + System.lineSeparator());
        }
    }

    @Test
    void onATerminalCheckShowsProgressAndErasesIt() {
        ProgressLine.terminal = () -> true;
        CliRun r = CliRun.run("check", "missions/night-round.yaml");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.err()).startsWith("\rdockline: building the move graph  0 %");
        assertThat(r.err()).endsWith("\r");
        assertThat(r.err().replaceAll("\r[^\r]*", "")).isEmpty();
        assertThat(r.out()).doesNotContain("\r");
    }

    @Test
    void noProgressWithoutATerminalOrWithJsonOrQuiet() throws Exception {
        ProgressLine.terminal = () -> false;
        assertThat(CliRun.run("check", "missions/night-round.yaml").err()).isEmpty();
        ProgressLine.terminal = () -> true;
        CliRun json = CliRun.run("check", "missions/night-round.yaml", "--json");
        assertThat(json.err()).isEmpty();
        assertThat(json.out()).doesNotContain("\r", "%  ");
        Path policy = dir.resolve("p.yaml");
        Path csv = dir.resolve("r.csv");
        for (String[] args : List.of(new String[] {"check", "missions/night-round.yaml", "--quiet"},
                new String[] {"export", "missions/night-round.yaml", "--policy", policy.toString(), "--quiet"},
                new String[] {"margin", "missions/night-round.yaml", "--quiet"},
                new String[] {"replay", "missions/night-round.yaml", "--csv", csv.toString(), "--quiet"},
                new String[] {"check", "missions/late-return.yaml", "--quiet"})) {
            CliRun r = CliRun.run(args);
            assertThat(r.code()).as(String.join(" ", args) + "\n" + r.err()).isIn(ExitCodes.OK, ExitCodes.NOT_GUARANTEED);
            assertThat(r.err()).as(String.join(" ", args)).doesNotContain("\r");
        }
        CommandLine.Model.CommandSpec render = Main.commandLine().getSubcommands().get("render").getCommandSpec();
        assertThat(render.findOption("--quiet")).isNotNull();
        assertThat(ProgressLine.wanted(false, false)).isTrue();
        assertThat(ProgressLine.wanted(true, false)).isFalse();
        assertThat(ProgressLine.wanted(false, true)).isFalse();
    }
}
