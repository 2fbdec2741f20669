package dockline.view;

import dockline.arena.Action;
import dockline.model.BuildingMap;
import dockline.model.Cell;
import java.util.Arrays;
import java.util.Objects;

/**
 * An immutable snapshot of what the map picture shows: the plan, the overlay with its per-cell
 * values, the replay and its current step, and the hovered cell. Built on the FX thread from a
 * {@link ViewData} and the user's choices; drawn by {@link MapPainter}, in the window and in
 * {@code render} alike, so the two pictures cannot drift apart.
 */
final class MapLayers {

    private final BuildingMap map;
    private final Cell start;
    private final Overlay overlay;
    private final int[] heat;
    private final int capacityUnits;
    private final int heatLow;
    private final int heatHigh;
    private final Action[] policy;
    private final boolean[] policyVaries;
    private final ViewReplay replay;
    private final int step;
    private final Cell hover;

    private MapLayers(BuildingMap map, Cell start, Overlay overlay, int[] heat, int capacityUnits, int heatLow,
                      int heatHigh, Action[] policy, boolean[] policyVaries, ViewReplay replay, int step, Cell hover) {
        this.map = Objects.requireNonNull(map, "map");
        this.start = start;
        this.overlay = overlay;
        this.heat = heat;
        this.capacityUnits = capacityUnits;
        this.heatLow = heatLow;
        this.heatHigh = heatHigh;
        this.policy = policy;
        this.policyVaries = policyVaries;
        this.replay = replay;
        this.step = step;
        this.hover = hover;
    }

    /** The plan alone (a map opened without a mission). */
    static MapLayers plain(BuildingMap map) {
        return new MapLayers(map, null, Overlay.PLAIN, null, 0, 0, 1, null, null, null, 0, null);
    }

    /**
     * Everything for one mission's data. The heat map is read at {@code budgetLeft} and
     * {@code progress}; the policy at {@code level}, {@code budgetLeft} and {@code progress}, or,
     * when {@code level} is negative, at every level the policy has for the cell (the most
     * frequent action is drawn, marked when it depends on the level).
     * Cost: one view-model query per free cell.
     */
    static MapLayers of(ViewData data, Overlay overlay, int budgetLeft, int progress, int level,
                        ViewReplay replay, int step) {
        BuildingMap map = data.mission().map();
        int n = map.cellCount();
        int w = map.width();
        int[] heat = null;
        Action[] policy = null;
        boolean[] varies = null;
        int lo = data.mission().reserveUnits();
        int hi = lo + 1;
        if (overlay == Overlay.HEAT) {
            heat = new int[n];
            for (int i = 0; i < n; i++) {
                heat[i] = map.isFree(Cell.ofIndex(i, w)) ? data.chargeNeeded(i, budgetLeft, progress) : ViewData.UNKNOWN;
                if (heat[i] >= 0) {
                    hi = Math.max(hi, heat[i]);
                }
            }
        } else if (overlay == Overlay.POLICY) {
            policy = new Action[n];
            varies = new boolean[n];
            for (int i = 0; i < n; i++) {
                if (!map.isFree(Cell.ofIndex(i, w))) {
                    continue;
                }
                if (level >= 0) {
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
                varies, replay, s, null);
    }

    MapLayers withHover(Cell c) {
        return Objects.equals(c, hover) ? this
                : new MapLayers(map, start, overlay, heat, capacityUnits, heatLow, heatHigh, policy, policyVaries, replay, step, c);
    }

    MapLayers withStep(int s) {
        int clamped = replay == null ? 0 : Math.max(0, Math.min(s, replay.length()));
        return clamped == step ? this
                : new MapLayers(map, start, overlay, heat, capacityUnits, heatLow, heatHigh, policy, policyVaries, replay, clamped, hover);
    }

    BuildingMap map() {
        return map;
    }

    Cell start() {
        return start;
    }

    Overlay overlay() {
        return overlay;
    }

    int capacityUnits() {
        return capacityUnits;
    }

    /** Bottom of the heat colour scale, in units: the reserve floor. */
    int heatLow() {
        return heatLow;
    }

    /** Top of the heat colour scale, in units: the largest finite value shown (above {@link #heatLow}). */
    int heatHigh() {
        return heatHigh;
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

    ViewReplay replay() {
        return replay;
    }

    int step() {
        return step;
    }

    Cell hover() {
        return hover;
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
