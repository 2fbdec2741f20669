package dockline.raster;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.SimpleGraph;

/**
 * The connected free areas of a cell grid: free cells joined to their free neighbours up, down,
 * left and right, split into components with jgrapht's {@link ConnectivityInspector}.
 *
 * <p>Four-neighbour connection is the right one for both mission neighbourhoods: a diagonal move
 * may not cut a wall corner (maps/README.md), so both cells beside it are free and its two ends
 * are already joined through them.
 *
 * <p>Cost: linear in the number of cells, with jgrapht's boxed vertices (a few dozen bytes per free
 * cell); it runs once per import, never in a solver loop.
 */
public final class FreeAreas {

    private FreeAreas() {
    }

    /**
     * Labels every cell with the index of its area in the returned list order (largest first, ties by
     * the lowest cell number), -1 for walls.
     *
     * @return the area sizes, largest first, and the label of every cell
     */
    public static Result of(boolean[] free, int width, int height) {
        Graph<Integer, DefaultEdge> g = new SimpleGraph<>(DefaultEdge.class);
        for (int i = 0; i < free.length; i++) {
            if (free[i]) {
                g.addVertex(i);
            }
        }
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int i = y * width + x;
                if (!free[i]) {
                    continue;
                }
                if (x + 1 < width && free[i + 1]) {
                    g.addEdge(i, i + 1);
                }
                if (y + 1 < height && free[i + width]) {
                    g.addEdge(i, i + width);
                }
            }
        }
        List<Set<Integer>> sets = new ArrayList<>(new ConnectivityInspector<>(g).connectedSets());
        List<int[]> keyed = new ArrayList<>();
        for (int a = 0; a < sets.size(); a++) {
            int min = Integer.MAX_VALUE;
            for (int c : sets.get(a)) {
                min = Math.min(min, c);
            }
            keyed.add(new int[] {sets.get(a).size(), min, a});
        }
        keyed.sort(Comparator.<int[]>comparingInt(k -> -k[0]).thenComparingInt(k -> k[1]));
        int[] label = new int[free.length];
        java.util.Arrays.fill(label, -1);
        int[] sizes = new int[keyed.size()];
        for (int rank = 0; rank < keyed.size(); rank++) {
            sizes[rank] = keyed.get(rank)[0];
            for (int c : sets.get(keyed.get(rank)[2])) {
                label[c] = rank;
            }
        }
        return new Result(sizes, label);
    }

    /**
     * @param sizes the number of cells of each area, largest first
     * @param label the area of each cell (index into {@code sizes}), -1 for a wall
     */
    public record Result(int[] sizes, int[] label) {

        /** The number of areas. */
        public int count() {
            return sizes.length;
        }
    }
}
