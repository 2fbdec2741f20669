package dockline.view;

import dockline.arena.Action;
import dockline.arena.ActionKind;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.EventKind;
import dockline.model.Mission;
import dockline.util.ProgressListener;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;

/**
 * A stand-in for the solver in view tests: breadth-first distances to the nearest dock give a
 * made-up "charge needed", a policy that walks down the distances, and a replay along it with one
 * door event. Invented data for exercising the view only; it makes no claim about any mission.
 * Optionally slow: it then spins, polling {@code cancelled}, until cancelled or released.
 */
final class FakeAnalyzer implements Analyzer {

    volatile boolean slow;
    volatile boolean release;
    volatile int calls;

    /** Reports 40 % ("halfway through the stand-in"), then works as {@link #analyze(Mission, BooleanSupplier)}. */
    @Override
    public ViewData analyze(Mission m, BooleanSupplier cancelled, ProgressListener progress) {
        progress.stage(40, "halfway through the stand-in");
        return analyze(m, cancelled);
    }

    @Override
    public ViewData analyze(Mission m, BooleanSupplier cancelled) {
        calls++;
        while (slow && !release) {
            if (cancelled.getAsBoolean()) {
                throw new CancellationException("cancelled");
            }
            try {
                Thread.sleep(5);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new CancellationException("interrupted");
            }
        }
        return compute(m);
    }

    static ViewData compute(Mission m) {
        BuildingMap map = m.map();
        int w = map.width();
        int n = map.cellCount();
        int[] dist = new int[n];
        Arrays.fill(dist, -1);
        ArrayDeque<Integer> q = new ArrayDeque<>();
        for (Cell d : map.docks()) {
            dist[d.index(w)] = 0;
            q.add(d.index(w));
        }
        int[][] dirs = {{0, -1}, {1, 0}, {0, 1}, {-1, 0}};
        while (!q.isEmpty()) {
            int c = q.poll();
            Cell cc = Cell.ofIndex(c, w);
            for (int[] d : dirs) {
                Cell nb = new Cell(cc.x() + d[0], cc.y() + d[1]);
                if (map.isFree(nb) && dist[nb.index(w)] < 0) {
                    dist[nb.index(w)] = dist[c] + 1;
                    q.add(nb.index(w));
                }
            }
        }
        int per = 7;
        int reserve = m.reserveUnits();
        int[] need = new int[n];
        Action[] move = new Action[n];
        for (int c = 0; c < n; c++) {
            Cell cc = Cell.ofIndex(c, w);
            if (!map.isFree(cc)) {
                need[c] = ViewData.UNKNOWN;
                continue;
            }
            need[c] = dist[c] < 0 ? ViewData.IMPOSSIBLE : reserve + per * dist[c];
            if (dist[c] == 0) {
                move[c] = new Action(ActionKind.CHARGE, cc);
            } else if (dist[c] > 0) {
                for (int[] d : dirs) {
                    Cell nb = new Cell(cc.x() + d[0], cc.y() + d[1]);
                    if (map.isFree(nb) && dist[nb.index(w)] == dist[c] - 1) {
                        move[c] = new Action(ActionKind.MOVE, nb);
                        break;
                    }
                }
            }
        }
        // replay: walk down the distances; the first door entered is shut once
        List<ViewStep> steps = new ArrayList<>();
        Cell at = m.start();
        int level = m.startUnits();
        int budget = m.map().disturbances().budget();
        steps.add(new ViewStep(0, at, null, null, "", null, level, budget, 0));
        int k = 0;
        boolean shut = false;
        while (dist[at.index(w)] > 0 && k < 200) {
            k++;
            Action a = move[at.index(w)];
            if (!shut && budget > 0 && map.terrainAt(a.target()).door()) {
                shut = true;
                budget--;
                level -= 1;
                steps.add(new ViewStep(k, at, a, EventKind.DOOR_SHUT, "door", a.target(), level, budget, 0));
                continue;
            }
            at = a.target();
            level -= per;
            steps.add(new ViewStep(k, at, a, null, "", null, level, budget, 0));
        }
        List<String> notes = List.of("Ends: made up by the test stand-in, which walks down the distances to the nearest dock"
                + " and shuts the first door it meets once.", "This line is long on purpose, so that the notes must wrap"
                + " over more than one line at 1280 pixels and still show every word of what they say about the run.");
        ViewReplay worst = new ViewReplay(ViewReplay.Kind.WORST_CASE, "worst case of the test stand-in, walking down the"
                + " distances to the nearest dock", steps, notes);
        int min = worst.minimumUnits();
        boolean ok = min >= reserve && need[m.start().index(w)] >= 0 && m.startUnits() >= need[m.start().index(w)];
        VerdictSummary v = ok
                ? new VerdictSummary(VerdictSummary.Outcome.GUARANTEED, "the robot keeps at least " + Units.both(m, reserve),
                        "checked by the test stand-in", OptionalInt.of(min), OptionalInt.of(min))
                : new VerdictSummary(VerdictSummary.Outcome.NOT_GUARANTEED, "the battery can drop below " + Units.both(m, reserve),
                        "counterexample replayed by the test stand-in", OptionalInt.empty(), OptionalInt.empty());
        ViewReplay shown = ok ? worst : new ViewReplay(ViewReplay.Kind.COUNTEREXAMPLE, "counterexample", steps, notes);
        return new ViewData() {
            @Override
            public Mission mission() {
                return m;
            }

            @Override
            public VerdictSummary verdict() {
                return v;
            }

            @Override
            public boolean solved() {
                return true;
            }

            @Override
            public int chargeNeeded(int cellIndex, int budgetLeft, int progressMask) {
                return need[cellIndex];
            }

            @Override
            public Optional<Action> policyAction(int cellIndex, int levelUnits, int budgetLeft, int progressMask) {
                return Optional.ofNullable(move[cellIndex]);
            }

            @Override
            public List<ViewReplay> replays() {
                return List.of(shown);
            }

            @Override
            public boolean canForce() {
                return true;
            }

            /** The stand-in's "forced" run is its one run under another name. */
            @Override
            public Optional<ViewReplay> force(List<ScenarioEvent> events) {
                return Optional.of(new ViewReplay(ViewReplay.Kind.FORCED, "forced " + events, steps));
            }
        };
    }
}
