package dockline.arena;

import java.util.Random;

/**
 * Abstract random turn-based arenas for property tests (invented data): no map behind them, just
 * {@code robots} robot vertices, each with 1..3 actions, each action with 1..3 outcomes to random
 * robot vertices with weights in [-mu, mu]. Richer cycles than grid maps give, so discounted values
 * with long periods and pre-periods appear. All vertices sit on one dummy cell without zones.
 */
public final class RandomGameArenas {

    private RandomGameArenas() {
    }

    public static Arena arena(Random rnd, int robots, int mu) {
        int[] actionsOf = new int[robots];
        int dist = 0;
        for (int r = 0; r < robots; r++) {
            actionsOf[r] = 1 + rnd.nextInt(3);
            dist += actionsOf[r];
        }
        int n = robots + dist;
        int[] outStart = new int[n + 1];
        int[] outcomes = new int[dist];
        int edges = dist;
        for (int i = 0; i < dist; i++) {
            outcomes[i] = 1 + rnd.nextInt(3);
            edges += outcomes[i];
        }
        int[] target = new int[edges];
        int[] weight = new int[edges];
        byte[] event = new byte[edges];
        int[] rule = new int[edges];
        java.util.Arrays.fill(event, (byte) Arena.NOMINAL);
        java.util.Arrays.fill(rule, -1);
        int e = 0;
        int nextD = robots;
        for (int r = 0; r < robots; r++) {
            outStart[r] = e;
            for (int k = 0; k < actionsOf[r]; k++) {
                target[e++] = nextD++;
            }
        }
        for (int a = 0; a < dist; a++) {
            outStart[robots + a] = e;
            for (int k = 0; k < outcomes[a]; k++) {
                target[e] = rnd.nextInt(robots);
                weight[e] = rnd.nextInt(2 * mu + 1) - mu;
                e++;
            }
        }
        outStart[n] = e;
        byte[] kinds = new byte[dist];
        int[] actionTarget = new int[dist];
        return new Arena(null, 1, 1, 0, robots, n, rnd.nextInt(robots), new int[n], new int[n], kinds, actionTarget,
                outStart, target, weight, event, rule, new long[1], new boolean[1], new int[] {0}, new int[] {0});
    }

    /**
     * The same kind of arena with its disturbance vertices numbered in a random order, so that they are
     * still private to one robot vertex each but not numbered by the robot edges into them
     * ({@link Arena#actionsByEdge()} false): for the solvers' paths that must not assume that layout.
     */
    public static Arena arenaWithShuffledActions(Random rnd, int robots, int mu) {
        Arena a = arena(rnd, robots, mu);
        int n = a.vertexCount();
        int dist = n - robots;
        int[] perm = new int[dist];
        for (int i = 0; i < dist; i++) {
            perm[i] = i;
        }
        for (int i = dist - 1; i > 0; i--) {
            int j = rnd.nextInt(i + 1);
            int t = perm[i];
            perm[i] = perm[j];
            perm[j] = t;
        }
        int[] oldOf = new int[dist];
        for (int i = 0; i < dist; i++) {
            oldOf[perm[i]] = i;
        }
        int m = a.edgeCount();
        int[] outStart = new int[n + 1];
        int[] target = new int[m];
        int[] weight = new int[m];
        int e = 0;
        for (int r = 0; r < robots; r++) {
            outStart[r] = e;
            for (int f = a.outBegin(r); f < a.outEnd(r); f++) {
                target[e++] = robots + perm[a.target(f) - robots];
            }
        }
        for (int j = 0; j < dist; j++) {
            outStart[robots + j] = e;
            int old = robots + oldOf[j];
            for (int f = a.outBegin(old); f < a.outEnd(old); f++) {
                target[e] = a.target(f);
                weight[e] = a.weight(f);
                e++;
            }
        }
        outStart[n] = e;
        byte[] event = new byte[m];
        int[] rule = new int[m];
        java.util.Arrays.fill(event, (byte) Arena.NOMINAL);
        java.util.Arrays.fill(rule, -1);
        return new Arena(null, 1, 1, 0, robots, n, a.startVertex(), new int[n], new int[n], new byte[dist],
                new int[dist], outStart, target, weight, event, rule, new long[1], new boolean[1], new int[] {0},
                new int[] {0});
    }
}
