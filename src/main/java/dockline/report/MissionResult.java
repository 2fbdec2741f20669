package dockline.report;

import dockline.model.EnergyScale;
import dockline.model.Worded;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalInt;

/**
 * Everything the report says about one mission file: what the core found ({@link MissionChecker}), or the
 * located errors that stopped it. Immutable; energy figures in units of {@code scale}.
 *
 * @param file             the mission file as given
 * @param status           how the check ended (gives the exit code)
 * @param errors           the errors, when the mission could not be checked
 * @param inputs           every input file read, with its SHA-256 (the mission file first, then its map)
 * @param mission          the mission's name (the file name when it could not be read)
 * @param kind             {@code one-trip}, {@code patrol} or {@code deadline}; null when not read
 * @param figures          the figures, when checked
 * @param suggestions      what would make a mission that is not guaranteed guaranteed, in words
 * @param disturbances     the disturbance model in words (null when not read)
 * @param run              the run the figures show (worst case or counterexample), when there is one
 * @param picture          the map picture as PNG bytes, or null (then {@code pictureNote} says why)
 * @param pictureNote      why there is no picture, or null
 * @param notes            things the reader should know
 */
public record MissionResult(Path file, Status status, List<LocatedError> errors, List<Input> inputs, String mission,
                            String kind, Figures figures, List<String> suggestions, String disturbances, Run run,
                            byte[] picture, String pictureNote, List<String> notes) {

    public MissionResult {
        errors = List.copyOf(errors);
        inputs = List.copyOf(inputs);
        suggestions = List.copyOf(suggestions);
        notes = List.copyOf(notes);
        picture = picture == null ? null : picture.clone();
    }

    /** The picture bytes (a copy), or null. */
    @Override
    public byte[] picture() {
        return picture == null ? null : picture.clone();
    }

    /**
     * How the check of one mission ended, with the command line's exit code. Each constant names its code (the
     * numbers of README's "Exit codes", which the command line keeps in {@code cli.ExitCodes}; the report may
     * not depend on the command line), so that the order of the constants means nothing.
     */
    public enum Status implements Worded {
        GUARANTEED(0),
        NOT_GUARANTEED(1),
        BAD_INPUT(2),
        OVER_RESOURCE_LIMIT(3),
        INTERNAL_ERROR(4);

        private final int exitCode;

        Status(int exitCode) {
            this.exitCode = exitCode;
        }

        /** The command line's exit code (0 to 4, README). */
        public int exitCode() {
            return exitCode;
        }
    }

    /** Whether the mission was checked (it has a verdict). */
    public boolean checked() {
        return figures != null;
    }

    /**
     * An input file and its SHA-256 (hex), or null when it could not be read.
     *
     * @param file   the path as given or as the mission names it
     * @param sha256 lowercase hex digest
     */
    public record Input(String file, String sha256) {
    }

    /**
     * The figures of a checked mission.
     *
     * @param scale            the energy scale (size of one unit; rounding against the robot)
     * @param verdict          guaranteed or not
     * @param method           the route taken, as {@code check} names it
     * @param methodReason     why that route
     * @param certified        whether the policy passed its independent certificate
     * @param certification    the certificate in words
     * @param capacityUnits    the battery capacity
     * @param startUnits       the starting charge
     * @param reserveUnits     the reserve floor
     * @param budget           the disturbance budget K
     * @param lowestLevelUnits the worst case: the lowest level the disturbances can force under the policy
     * @param highestFloorUnits the highest reserve floor that can be guaranteed from the start
     * @param lowestStartUnits the lowest starting charge that guarantees the floor
     * @param lowestStartSearched whether its search ran to the end (false: a patrol's or deadline mission's
     *                          search passed the memory budget, and the figure is not known; the notes say so)
     * @param rules            the rule of thumb at each margin of {@link RuleOfThumb#MARGINS}
     */
    public record Figures(EnergyScale scale, boolean guaranteed, String method, String methodReason, boolean certified,
                          String certification, int capacityUnits, int startUnits, int reserveUnits, int budget,
                          OptionalInt lowestLevelUnits, OptionalInt highestFloorUnits, OptionalInt lowestStartUnits,
                          boolean lowestStartSearched, List<RuleOfThumb> rules) {
        public Figures {
            rules = List.copyOf(rules);
        }

        /** Units as Wh with the unit, e.g. {@code 12.5 Wh}. */
        public String wh(int units) {
            return scale.formatWh(units);
        }
    }

    /**
     * The run drawn in the battery chart.
     *
     * @param title       what run this is, in words
     * @param levelsUnits the battery level at each step, the start first
     * @param ending      how it ends, in words
     * @param loopStart   first step of a patrol's loop, or -1
     */
    public record Run(String title, List<Integer> levelsUnits, String ending, int loopStart) {
        public Run {
            levelsUnits = List.copyOf(levelsUnits);
        }
    }
}
