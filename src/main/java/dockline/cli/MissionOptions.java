package dockline.cli;

import dockline.io.InputException;
import dockline.io.MissionLoader;
import dockline.io.Problem;
import dockline.io.Quantities;
import dockline.model.Charge;
import dockline.model.Mission;
import java.io.PrintWriter;
import java.nio.file.Path;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The mission file and the overrides shared by {@code check} and {@code export} (a picocli mixin):
 * another reserve floor, starting charge or disturbance budget, and a memory limit for the game.
 */
final class MissionOptions {

    @Parameters(index = "0", paramLabel = "MISSION", description = "the mission file (YAML); it names its map")
    Path missionFile;

    @Option(names = "--reserve", paramLabel = "CHARGE",
            description = "reserve floor instead of the mission's: Wh (12, 12 Wh) or %% of the capacity (20%%)")
    String reserve;

    @Option(names = "--start-charge", paramLabel = "CHARGE",
            description = "starting charge instead of the mission's: Wh or %% of the capacity")
    String startCharge;

    @Option(names = "--budget", paramLabel = "K",
            description = "at most K disturbances per mission, instead of the map's budget")
    Integer budget;

    @Option(names = "--safest-policy",
            description = "use the policy that keeps the battery at or above the highest guaranteed floor (it may take"
                    + " more moves, e.g. to top up on a dock) instead of the one with the fewest moves")
    boolean safestPolicy;

    @Option(names = "--max-memory", paramLabel = "MB",
            description = "refuse games estimated to need more than this many MB (default: half the JVM's heap)")
    Long maxMemoryMb;

    /** Thrown when the input or an override is bad; the problems are already printed. */
    static final class BadInput extends Exception {
        BadInput() {
            super(null, null, false, false);
        }
    }

    /** Loads the mission and applies the overrides; prints problems to {@code err}. */
    Mission load(PrintWriter err) throws BadInput {
        Mission m;
        try {
            m = MissionLoader.load(missionFile);
        } catch (InputException e) {
            for (Problem p : e.problems()) {
                err.println(p.format());
            }
            throw new BadInput();
        }
        boolean bad = false;
        if (reserve != null) {
            Charge c = charge("--reserve", reserve, m, err);
            if (c == null) {
                bad = true;
            } else {
                m = m.withReserve(c);
            }
        }
        if (startCharge != null) {
            Charge c = charge("--start-charge", startCharge, m, err);
            if (c == null) {
                bad = true;
            } else {
                m = m.withStartCharge(c);
            }
        }
        if (budget != null) {
            if (budget < 0) {
                err.println("dockline: --budget must be 0 or more, not " + budget);
                bad = true;
            } else {
                m = m.withBudget(budget);
            }
        }
        if (maxMemoryMb != null && maxMemoryMb <= 0) {
            err.println("dockline: --max-memory must be a positive number of MB, not " + maxMemoryMb);
            bad = true;
        }
        if (bad) {
            throw new BadInput();
        }
        return m;
    }

    private static Charge charge(String option, String text, Mission m, PrintWriter err) {
        try {
            Charge c = Quantities.parseCharge(text);
            String why = Quantities.checkAgainstCapacity(c, m.robot().capacityWh());
            if (why != null) {
                err.println("dockline: " + option + " " + why);
                return null;
            }
            return c;
        } catch (IllegalArgumentException e) {
            err.println("dockline: " + option + ": " + e.getMessage());
            return null;
        }
    }

    /** The memory budget in bytes, 0 for the default. */
    long memoryBudgetBytes() {
        return maxMemoryMb == null ? 0 : Math.multiplyExact(maxMemoryMb, 1L << 20);
    }
}
