package dockline.cli;

import dockline.io.AtomicFiles;
import dockline.io.InputException;
import dockline.io.MapLoader;
import dockline.io.MissionLoader;
import dockline.io.Problem;
import dockline.io.Quantities;
import dockline.model.Charge;
import dockline.model.Mission;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The mission file and the overrides shared by {@code check}, {@code export}, {@code replay} and
 * {@code margin} (a picocli mixin): another reserve floor, starting charge or disturbance budget,
 * and a memory limit for the game. Also the handling those commands share: loading with the
 * overrides applied ({@link #load}), refusing an output path before any work ({@link #outputOk}),
 * and turning what the solver throws into a message and an exit code ({@link #failure}), so that
 * every command words the same problem the same way.
 */
final class MissionOptions {

    @Parameters(index = "0", paramLabel = "MISSION", description = "the mission file (YAML); it names its map")
    Path missionFile;

    @Option(names = "--reserve", paramLabel = "CHARGE",
            description = "reserve floor instead of the mission's: Wh (12 or 12Wh) or %% of the capacity (20%%)")
    String reserve;

    @Option(names = "--start-charge", paramLabel = "CHARGE",
            description = "starting charge instead of the mission's: Wh or %% of the capacity")
    String startCharge;

    @Option(names = "--budget", paramLabel = "K",
            description = "at most K disturbances per mission (0 to " + MapLoader.MAX_BUDGET + "), instead of the"
                    + " map's budget")
    Integer budget;

    @Option(names = "--max-memory", paramLabel = "MB",
            description = "refuse games estimated to need more than this many MB (default: half the JVM's heap)")
    Long maxMemoryMb;

    /** Thrown when the input or an override is bad; the problems are already printed. */
    static final class BadInput extends Exception {
        private static final long serialVersionUID = 1L;

        BadInput() {
            super(null, null, false, false);
        }
    }

    /** Loads the mission and applies the overrides; prints problems to {@code err}. */
    Mission load(PrintWriter err) throws BadInput {
        Mission m = read(missionFile, err);
        Charge newReserve = reserve == null ? null : charge("--reserve", reserve, m, err);
        Charge newStart = startCharge == null ? null : charge("--start-charge", startCharge, m, err);
        boolean bad = (reserve != null && newReserve == null) || (startCharge != null && newStart == null);
        if (newReserve != null) {
            m = m.withReserve(newReserve);
        }
        if (newStart != null) {
            m = m.withStartCharge(newStart);
        }
        if (budget != null) {
            if (budget < 0 || budget > MapLoader.MAX_BUDGET) {
                err.println("dockline: --budget must be a whole number from 0 to " + MapLoader.MAX_BUDGET + ", not "
                        + budget);
                bad = true;
            } else {
                m = m.withBudget(budget);
            }
        }
        if (maxMemoryMb != null && maxMemoryMb <= 0) {
            err.println("dockline: --max-memory must be a positive number of MB, not " + maxMemoryMb);
            bad = true;
        }
        if (!bad && floorProblem(missionFile, m, reserve != null, startCharge != null, err)) {
            bad = true;
        }
        if (bad) {
            throw new BadInput();
        }
        return m;
    }

    /**
     * Whether the floor, after {@code --reserve} / {@code --start-charge}, is above the capacity or the starting
     * charge in whole energy units; prints the problem with its hint to {@code err}. Shared by every command
     * that takes these options.
     */
    static boolean floorProblem(Path file, Mission m, boolean reserveGiven, boolean startGiven, PrintWriter err) {
        if (m.reserveUnits() > m.capacityUnits()) {
            // both are within the capacity in Wh, but the floor rounds up and the capacity down
            err.println("dockline: " + file + ": the reserve floor (" + m.scale().formatWh(m.reserveUnits())
                    + ") is above the capacity (" + m.scale().formatWh(m.capacityUnits()) + ") in whole energy units"
                    + " (hint: the floor rounds up and the capacity down to units of " + m.scale().formatWh(1)
                    + "; give a lower reserve)");
            return true;
        }
        if ((reserveGiven || startGiven)
                && m.reserveUnits() > Math.min(m.capacityUnits(), m.startUnits())) {
            // the same check as a mission file's (MissionReading): a robot that starts below its floor is
            // an input mistake, not a question the solver should answer with "not guaranteed"
            String fix = reserveGiven && startGiven ? "lower --reserve or raise --start-charge"
                    : reserveGiven ? "lower --reserve" : "raise --start-charge";
            err.println("dockline: " + file + ": the reserve floor (" + m.scale().formatWh(m.reserveUnits())
                    + ") is above the starting charge (" + m.scale().formatWh(Math.min(m.capacityUnits(), m.startUnits()))
                    + ") in whole energy units (hint: " + fix + "; the floor rounds up and the charge down to units of "
                    + m.scale().formatWh(1) + ")");
            return true;
        }
        return false;
    }

    /**
     * Refuses options that mean nothing outside the reserve objective (for example a policy choice on a
     * discounted mission), in the one wording every command uses: {@code dockline: OPTION applies to the
     * reserve objective only} (several: {@code A and B apply ...}) on {@code err}. Returns the exit code of
     * bad input.
     */
    static int reserveObjectiveOnly(PrintWriter err, String... options) {
        err.println("dockline: " + String.join(" and ", options) + (options.length == 1 ? " applies" : " apply")
                + " to the reserve objective only");
        return ExitCodes.BAD_INPUT;
    }

    /** Loads the mission file as it is; prints its problems ({@code file:line:column: message}) to {@code err}. */
    static Mission read(Path file, PrintWriter err) throws BadInput {
        try {
            return MissionLoader.load(file);
        } catch (InputException e) {
            for (Problem p : e.problems()) {
                err.println(p.format());
            }
            throw new BadInput();
        }
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

    /** The mission as the first line of a report names it, e.g. {@code mission 'Night round' (missions/night-round.yaml)}. */
    String title(Mission m) {
        return "mission '" + m.name() + "' (" + missionFile + ")";
    }

    /** The memory budget in bytes, 0 for the default. */
    long memoryBudgetBytes() {
        return maxMemoryMb == null ? 0 : Math.multiplyExact(maxMemoryMb, 1L << 20);
    }

    /**
     * Whether {@code target} (given with {@code option}) can be written: checked before any work, so
     * that a long solve does not end in "cannot write". A path that cannot be written, or that is
     * the mission file or its map, is refused with a message on {@code err}: an output never
     * overwrites an input.
     */
    boolean outputOk(String option, Path target, Mission m, PrintWriter err) {
        if (target == null) {
            return true;
        }
        String why = outputProblem(target, missionFile, m);
        if (why != null) {
            err.println("dockline: " + option + " " + (target.toString().isEmpty() ? "''" : target) + ": " + why);
            return false;
        }
        return true;
    }

    /**
     * What is wrong with writing {@code target} as an output of the mission read from
     * {@code missionFile}, or {@code null}: a path that cannot be written, or one of the mission's
     * input files (an output never overwrites an input).
     */
    static String outputProblem(Path target, Path missionFile, Mission m) {
        String why = AtomicFiles.problemWith(target);
        if (why == null && (sameFile(target, missionFile) || (m.map().source() != null
                && sameFile(target, m.map().source())))) {
            why = "that is an input file of this mission; choose another name (outputs never overwrite inputs)";
        }
        return why;
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
        } catch (IOException | SecurityException e) {
            return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize());
        }
    }

    /**
     * The message and exit code for what solving, certifying or replaying the mission threw, by type
     * ({@link Failures#report}): 3 for a {@link dockline.model.ResourceLimitException} or an exhausted
     * heap, 4 (with the stack trace in a log file) for anything else. Bad input never gets here: the
     * loader reports it (exit 2) before any solving.
     */
    int failure(Throwable e, PrintWriter err) {
        return Failures.report(e, missionFile, err);
    }
}
