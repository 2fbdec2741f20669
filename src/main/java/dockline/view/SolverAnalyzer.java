package dockline.view;

import dockline.arena.Action;
import dockline.model.Cell;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.solve.ChargeNeeded;
import dockline.solve.Policy;
import dockline.solve.PolicyEntry;
import dockline.solve.ProductTooLargeException;
import dockline.solve.ReserveAnalysis;
import dockline.solve.ReserveOptions;
import dockline.solve.ReserveSolver;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BooleanSupplier;

/**
 * The real {@link Analyzer}: the very reserve solver the command line uses
 * ({@link ReserveSolver#analyse}), with the heat map and the highest-floor search switched on and
 * the cancellation flag passed down, turned into the view's own {@link ViewData}.
 */
public final class SolverAnalyzer implements Analyzer {

    @Override
    public ViewData analyze(Mission mission, BooleanSupplier cancelled) {
        ReserveOptions options = ReserveOptions.defaults().withChargeNeeded(true).withHighestReserve(true)
                .withCancelled(cancelled);
        ReserveAnalysis a;
        try {
            a = ReserveSolver.analyse(mission, options);
        } catch (ProductTooLargeException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
        return new SolvedData(a, verdictOf(a), List.of(), a.policy());
    }

    /** The verdict in words, for a reserve analysis. */
    static Verdict verdictOf(ReserveAnalysis a) {
        Mission m = a.mission();
        int k = m.map().disturbances().budget();
        String floor = Units.both(m, a.reserveUnits());
        String disturbances = k == 0 ? "with no disturbance" : "under every disturbance the map allows (at most " + k + ")";
        StringBuilder words = new StringBuilder();
        if (a.guaranteed()) {
            words.append("the robot can always finish its tasks and dock without the battery dropping below the floor of ")
                    .append(floor).append(", ").append(disturbances).append('.');
            a.worstCaseMinimumUnits().ifPresent(u -> words.append(" Worst case: ").append(Units.both(m, u)).append('.'));
        } else {
            words.append(k == 0 ? "even with no disturbance, " : "some sequence of at most " + k + " disturbances can, whatever the robot does, ")
                    .append("drive the battery below the floor of ").append(floor).append(" before the tasks are done and the robot docks.");
            if (a.highestGuaranteedReserveUnits().isPresent()) {
                words.append(" A floor of ").append(Units.both(m, a.highestGuaranteedReserveUnits().getAsInt()))
                        .append(" can be guaranteed.");
            } else if (a.highestReserveSearched()) {
                words.append(" No floor can be guaranteed from this start.");
            }
        }
        if (m.objective() instanceof Objective.Discounted) {
            words.append(" (Checked for the reserve floor; the mission's discounted objective is not shown here.)");
        }
        for (String n : a.notes()) {
            words.append(" Note: ").append(n).append('.');
        }
        String cert = "not checked by the independent certificate checker yet";
        return new Verdict(a.guaranteed() ? Verdict.Outcome.GUARANTEED : Verdict.Outcome.NOT_GUARANTEED, words.toString(),
                cert, a.worstCaseMinimumUnits(), a.highestGuaranteedReserveUnits());
    }

    /** {@link ViewData} over a {@link ReserveAnalysis}; the policy is indexed by cell once, at construction. */
    static final class SolvedData implements ViewData {

        private final ReserveAnalysis analysis;
        private final Verdict verdict;
        private final List<ViewReplay> replays;
        private final Optional<Policy> policy;
        private final Map<Long, List<Action>> byCell;

        SolvedData(ReserveAnalysis analysis, Verdict verdict, List<ViewReplay> replays, Optional<Policy> policy) {
            this.analysis = analysis;
            this.verdict = verdict;
            this.replays = List.copyOf(replays);
            this.policy = policy;
            this.byCell = indexByCell(policy, analysis.mission().map().width());
        }

        private static long key(int cellIndex, int budgetLeft, int progress) {
            return ((long) cellIndex << 40) | ((long) budgetLeft << 20) | progress;
        }

        /** Distinct actions per (cell, budget, progress), most frequent first. O(entries). */
        private static Map<Long, List<Action>> indexByCell(Optional<Policy> policy, int width) {
            Map<Long, Map<Action, Integer>> counts = new HashMap<>();
            policy.ifPresent(p -> {
                for (PolicyEntry e : p.entries()) {
                    counts.computeIfAbsent(key(e.cell().index(width), e.budgetLeft(), e.progress()), k -> new LinkedHashMap<>())
                            .merge(e.action(), 1, Integer::sum);
                }
            });
            Map<Long, List<Action>> out = new HashMap<>();
            for (Map.Entry<Long, Map<Action, Integer>> e : counts.entrySet()) {
                List<Map.Entry<Action, Integer>> l = new ArrayList<>(e.getValue().entrySet());
                l.sort((x, y) -> Integer.compare(y.getValue(), x.getValue()));
                out.put(e.getKey(), l.stream().map(Map.Entry::getKey).toList());
            }
            return out;
        }

        ReserveAnalysis analysis() {
            return analysis;
        }

        @Override
        public Mission mission() {
            return analysis.mission();
        }

        @Override
        public Verdict verdict() {
            return verdict;
        }

        @Override
        public boolean solved() {
            return true;
        }

        @Override
        public List<ViewReplay> replays() {
            return replays;
        }

        @Override
        public int chargeNeeded(int cellIndex, int budgetLeft, int progressMask) {
            Optional<ChargeNeeded> heat = analysis.chargeNeeded();
            if (heat.isEmpty()) {
                return UNKNOWN;
            }
            try {
                int u = heat.get().unitsNeeded(cellIndex, budgetLeft, progressMask);
                return u == ChargeNeeded.IMPOSSIBLE ? IMPOSSIBLE : u;
            } catch (IllegalArgumentException outOfRange) {
                return UNKNOWN;
            }
        }

        @Override
        public Optional<Action> policyAction(int cellIndex, int levelUnits, int budgetLeft, int progressMask) {
            if (policy.isEmpty()) {
                return Optional.empty();
            }
            Cell c = Cell.ofIndex(cellIndex, analysis.mission().map().width());
            return policy.get().lookup(c, levelUnits, budgetLeft, progressMask);
        }

        @Override
        public List<Action> policyActions(int cellIndex, int budgetLeft, int progressMask) {
            return byCell.getOrDefault(key(cellIndex, budgetLeft, progressMask), List.of());
        }
    }
}
