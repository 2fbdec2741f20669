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
}
