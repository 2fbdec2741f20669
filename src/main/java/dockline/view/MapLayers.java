package dockline.view;

import dockline.arena.Action;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import dockline.model.Mission;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * An immutable snapshot of what the map picture shows: the plan, the overlay with its per-cell
 * values, the replay and its current step, and the hovered cell. Built on the FX thread from a
 * {@link ViewData} and the user's choices; drawn by {@link MapPainter}, in the window and in
 * {@code render} alike, so the two pictures cannot drift apart.
 *
 * <p>The per-cell arrays belong to the snapshot (the factories copy or build them) and are never changed;
 * read them by cell through {@link #heat(int)}, {@link #policy(int)} and {@link #policyVaries(int)}. Two
 * snapshots are equal when their components are (the arrays by identity), and then draw the same picture, so
 * the map view does not redraw when an equal one is set.
 *
 * @param map           the plan
 * @param start         the start cell, or {@code null} (a map alone)
 * @param overlay       what is drawn over the plan
 * @param heat          charge needed per cell ({@link ViewData#chargeNeeded}), or {@code null} without a heat layer
 * @param capacityUnits the battery capacity (0 for a map alone)
 * @param heatLow       bottom of the heat colour scale, in units: the reserve floor
 * @param heatHigh      top of the heat colour scale, in units: the largest finite value shown (above {@code heatLow})
 * @param policy        the policy's move per cell, or {@code null} without a policy layer
 * @param policyVaries  per cell, whether that move depends on the battery level (all-levels mode), or {@code null}
 * @param replay        the run shown, or {@code null}
 * @param step          its current step
 * @param hover         the cell under the pointer, or {@code null}
 * @param situation     what the policy layer was read for, or {@code null}
 * @param heatRanged    per cell, whether its heat value is only an upper bound (the need lies in a range,
 *                      {@link ViewData#chargeNeededAtLeast}), or {@code null} when every value is exact
 * @param heatNote      what the heat layer claims when it is not exact everywhere ({@link ViewData#heatNote}), or
 *                      {@code null}
 */
record MapLayers(BuildingMap map, Cell start, Overlay overlay, int[] heat, int capacityUnits, int heatLow, int heatHigh,
                 Action[] policy, boolean[] policyVaries, ViewReplay replay, int step, Cell hover, Situation situation,
                 boolean[] heatRanged, String heatNote) {

    /**
     * What the policy layer was read for, to say a cell's rule in words: the mission (for Wh), the
     * rules, disturbances left, tasks done and closures.
     */
    record Situation(Mission mission, PolicyRules rules, int budgetLeft, int progress, String closures) {
    }

    MapLayers {
        Objects.requireNonNull(map, "map");
    }

    /** The plan alone (a map opened without a mission). */
    static MapLayers plain(BuildingMap map) {
        return new MapLayers(map, null, Overlay.PLAIN, null, 0, 0, 1, null, null, null, 0, null, null, null, null);
    }

    /**
     * Layers put together directly (the view benchmark's generated maps, tests): the heat values
     * (or {@code null}), the policy's move per cell (or {@code null}) and a replay at a step.
     */
    static MapLayers of(BuildingMap map, Cell start, Overlay overlay, int[] heat, int heatLow, int heatHigh,
                        Action[] policy, ViewReplay replay, int step) {
        int s = replay == null ? 0 : Math.max(0, Math.min(step, replay.length()));
        return new MapLayers(map, start, overlay, heat == null ? null : heat.clone(), 0, heatLow, Math.max(heatLow + 1, heatHigh),
                policy == null ? null : policy.clone(), null, replay, s, null, null, null, null);
    }

    /**
     * Everything for one mission's data. The heat map is read at {@code budgetLeft} and
     * {@code progress}; the policy at {@code level}, {@code budgetLeft} and {@code progress} in
     * threshold form ({@link PolicyRules}: the move of the policy's row at the highest level not
     * above {@code level}, with the closures of the replay's current step when the layer follows
     * that step, else those at the start), or, when {@code level} is negative, at every level the
     * policy has for the cell (the most frequent action is drawn, marked when it depends on the level).
     * Cost: one view-model query per free cell.
     */
    static MapLayers of(ViewData data, Overlay overlay, int budgetLeft, int progress, int level,
                        ViewReplay replay, int step) {
        BuildingMap map = data.mission().map();
        int n = map.cellCount();
        int w = map.width();
        int[] heat = null;
        boolean[] ranged = null;
        String note = null;
        Action[] policy = null;
        boolean[] varies = null;
        int lo = data.mission().reserveUnits();
        int hi = lo + 1;
        if (overlay == Overlay.HEAT) {
            heat = new int[n];
            note = data.heatNote();
            for (int i = 0; i < n; i++) {
                boolean free = map.isFree(Cell.ofIndex(i, w));
                heat[i] = free ? data.chargeNeeded(i, budgetLeft, progress) : ViewData.UNKNOWN;
                if (heat[i] >= 0) {
                    hi = Math.max(hi, heat[i]);
                }
                // a need known only as a range: the colour is its upper bound (enough charge), marked as such
                if (note != null && free && data.chargeNeededAtLeast(i, budgetLeft, progress) != heat[i]) {
                    ranged = ranged == null ? new boolean[n] : ranged;
                    ranged[i] = true;
                }
            }
        }
        Situation situation = null;
        if (overlay == Overlay.POLICY) {
            policy = new Action[n];
            varies = new boolean[n];
            PolicyRules rules = data.policyRules();
            String closures = closuresOf(rules, replay, step, level, budgetLeft, progress, w);
            situation = new Situation(data.mission(), rules, budgetLeft, progress, closures);
            for (int i = 0; i < n; i++) {
                if (!map.isFree(Cell.ofIndex(i, w))) {
                    continue;
                }
                if (level >= 0 && !rules.isEmpty()) {
                    policy[i] = rules.actionAt(i, level, budgetLeft, progress, closures);
                } else if (level >= 0) {
                    policy[i] = data.policyAction(i, level, budgetLeft, progress).orElse(null);
                } else {
                    java.util.List<Action> all = data.policyActions(i, budgetLeft, progress);
                    policy[i] = all.isEmpty() ? null : all.get(0);
                    varies[i] = all.size() > 1;
                }
            }
        }
        int s = replay == null ? 0 : Math.max(0, Math.min(step, replay.length()));
        return new MapLayers(map, data.mission().start(), overlay, heat, data.mission().capacityUnits(), lo, hi, policy,
                varies, replay, s, null, situation, ranged, note);
    }

    /**
     * The closures the policy layer is read with: those of the replay's current step when the layer
     * is read for that step's situation (the step is a row of the policy), else those at the start
     * (nothing closed yet), else none.
     */
    private static String closuresOf(PolicyRules rules, ViewReplay replay, int step, int level, int budgetLeft,
                                     int progress, int width) {
        if (replay == null || rules.isEmpty()) {
            return "";
        }
        ViewStep st = replay.steps().get(Math.max(0, Math.min(step, replay.length())));
        if (st.levelUnits() == level && st.budgetLeft() == budgetLeft && st.progress() == progress) {
            java.util.Optional<String> c = rules.closuresAt(st.cell().index(width), level, budgetLeft, progress);
            if (c.isPresent()) {
                return c.get();
            }
        }
        ViewStep first = replay.steps().get(0);
        return rules.closuresAt(first.cell().index(width), first.levelUnits(), first.budgetLeft(), first.progress())
                .orElse("");
    }

    /**
     * The policy's rule on a cell in words, for the situation the layer was read for, e.g.
     * {@code at 23 Wh or more: go east; below 23 Wh: no move is guaranteed from here}; empty
     * without a policy layer or a policy in threshold form.
     */
    java.util.Optional<String> policyWords(Cell c) {
        if (situation == null || situation.rules().isEmpty() || c == null || !map.inside(c) || !map.isFree(c)) {
            return java.util.Optional.empty();
        }
        List<PolicyRules.Threshold> ts = situation.rules().thresholds(c.index(map.width()), situation.budgetLeft(),
                situation.progress(), situation.closures());
        return java.util.Optional.of(PolicyRules.words(situation.mission(), c, ts));
    }

    MapLayers withHover(Cell c) {
        return Objects.equals(c, hover) ? this
                : new MapLayers(map, start, overlay, heat, capacityUnits, heatLow, heatHigh, policy, policyVaries, replay, step, c,
                        situation, heatRanged, heatNote);
    }

    MapLayers withStep(int s) {
        int clamped = replay == null ? 0 : Math.max(0, Math.min(s, replay.length()));
        return clamped == step ? this
                : new MapLayers(map, start, overlay, heat, capacityUnits, heatLow, heatHigh, policy, policyVaries, replay, clamped,
                        hover, situation, heatRanged, heatNote);
    }

    /**
     * Whether the static picture (surfaces, walls, heat map, symbols, zones, words) of the two is the
     * same: the same map object, start, heat layer and heat scale. O(cells) at worst (the heat values).
     */
    boolean sameStaticAs(MapLayers o) {
        return o != null && map == o.map && Objects.equals(start, o.start)
                && (heat == o.heat || Arrays.equals(heat, o.heat))
                && (heat == null || heatLow == o.heatLow && heatHigh == o.heatHigh)
                && Arrays.equals(heatRanged, o.heatRanged);
    }

    /** Whether the cell's heat value is only an upper bound of its need (see {@link #heatRanged}). */
    boolean heatRanged(int cellIndex) {
        return heatRanged != null && heatRanged[cellIndex];
    }

    /** Heat value of a cell (see {@link ViewData#chargeNeeded}); {@link ViewData#UNKNOWN} without a heat layer. */
    int heat(int cellIndex) {
        return heat == null ? ViewData.UNKNOWN : heat[cellIndex];
    }

    boolean hasHeat() {
        return heat != null;
    }

    /** The policy's action on a cell, or {@code null}. */
    Action policy(int cellIndex) {
        return policy == null ? null : policy[cellIndex];
    }

    /** Whether the policy's action on the cell depends on the battery level (all-levels mode only). */
    boolean policyVaries(int cellIndex) {
        return policyVaries != null && policyVaries[cellIndex];
    }

    /** Where the robot is at the current step of the replay; {@code null} without a replay. */
    Cell robotCell() {
        return replay == null ? null : replay.steps().get(step).cell();
    }

    @Override
    public String toString() {
        return "MapLayers[" + overlay + ", step " + step + ", heat " + (heat != null ? Arrays.stream(heat).max().orElse(0) : -1) + "]";
    }
}
