package dockline.report;

import dockline.io.InputException;
import dockline.io.MissionLoader;
import dockline.io.Problem;
import dockline.margin.Suggestion;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.model.ResourceLimitException;
import dockline.model.Timing;
import dockline.plan.Certification;
import dockline.plan.MissionPlanner;
import dockline.plan.Plan;
import dockline.plan.PictureRoute;
import dockline.plan.PlanOptions;
import dockline.plan.PolicyChoice;
import dockline.plan.RoundsPlan;
import dockline.plan.Route;
import dockline.replay.Replay;
import dockline.replay.ReplayStep;
import dockline.replay.RoundsReplay;
import dockline.certify.RoundsCertificate;
import dockline.solve.ProductOptions;
import dockline.solve.rounds.DeadlineAnalysis;
import dockline.solve.rounds.PatrolAnalysis;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Checks one mission file for the report: loads it, asks the core and collects what the report shows
 * ({@link MissionResult}). It decides nothing itself: the verdict, method, certificate, worst case,
 * highest floor and suggestions are those of {@link MissionPlanner#plan} with the options
 * {@code dockline check} uses ({@link PlanOptions#defaults}); the lowest start comes from the core's
 * margins route, the pictured run from the route {@code export} writes the safest policy from, with replays and a
 * heat map (the one {@code render} draws, {@link PictureRoute}: the run of the exported policy), and
 * the rule of thumb's nominal need from the core at a disturbance budget of 0. Patrols and deadlines go
 * through {@link RoundsPlan} the same way (the lowest start by {@link RoundsPlan#withLowestStart}; for a
 * deadline, the rule's shortest run by {@link RoundsPlan#fewestTurns} at a budget of 0).
 *
 * <p>Cost: four plans of the mission (one-trip) or three (patrols, deadlines) and, for these, the bisection over
 * the start and for a deadline one more attractor; see {@link MissionPlanner} and {@link RoundsPlan}.
 */
public final class MissionChecker {

    /** The note of a patrol or deadline mission whose lowest start could not be searched within the memory budget. */
    private static final String LOWEST_START_NOT_COMPUTED = "the lowest start was not computed: a game from a higher starting"
            + " charge passes the memory budget";

    private MissionChecker() {
    }

    /**
     * Checks one mission file; never throws for a problem of the mission: bad input, a resource limit and
     * an internal error are results with their errors.
     *
     * @param file              the mission file
     * @param memoryBudgetBytes the memory budget of each game (0: the default, half the heap)
     * @param pictures          draws the map pictures
     */
    public static MissionResult check(Path file, long memoryBudgetBytes, Pictures pictures) {
        List<MissionResult.Input> inputs = new ArrayList<>();
        inputs.add(new MissionResult.Input(file.toString(), sha256(file)));
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        Mission m;
        try {
            m = MissionLoader.load(file);
        } catch (InputException e) {
            List<LocatedError> errors = new ArrayList<>();
            for (Problem p : e.problems()) {
                errors.add(LocatedError.of(p));
            }
            return failed(file, MissionResult.Status.BAD_INPUT, errors, inputs, name, null, null);
        } catch (RuntimeException e) {
            return failed(file, MissionResult.Status.INTERNAL_ERROR, List.of(LocatedError.plain("internal error while"
                    + " reading " + file + ": " + e, "please report this with the input files")), inputs, name, null, null);
        }
        if (m.map().source() != null) {
            inputs.add(new MissionResult.Input(m.map().source().toString(), sha256(m.map().source())));
        }
        return checkLoaded(file, m, inputs, memoryBudgetBytes, pictures);
    }

    /**
     * Checks a mission built in code (no file is read; its inputs are listed without digests).
     *
     * @param m                 the mission
     * @param memoryBudgetBytes the memory budget of each game (0: the default)
     * @param pictures          draws the map pictures
     */
    public static MissionResult check(Mission m, long memoryBudgetBytes, Pictures pictures) {
        Path file = m.source() != null ? m.source() : Path.of(m.name());
        return checkLoaded(file, m, List.of(new MissionResult.Input(file.toString(), null)), memoryBudgetBytes,
                pictures);
    }

    private static MissionResult checkLoaded(Path file, Mission m, List<MissionResult.Input> inputs,
                                             long memoryBudgetBytes, Pictures pictures) {
        String kind = !m.beyondOneTrip() ? "one-trip" : m.tasks().patrols() ? "patrol" : "deadline";
        String words = Disturbances.words(m);
        try {
            return m.beyondOneTrip() ? rounds(file, m, inputs, kind, words, memoryBudgetBytes, pictures)
                    : oneTrip(file, m, inputs, words, memoryBudgetBytes, pictures);
        } catch (ResourceLimitException e) {
            return failed(file, MissionResult.Status.OVER_RESOURCE_LIMIT, List.of(LocatedError.plain(file + ": "
                    + e.getMessage(), e.advice())), inputs, m.name(), kind, words);
        } catch (OutOfMemoryError e) {
            return failed(file, MissionResult.Status.OVER_RESOURCE_LIMIT, List.of(LocatedError.plain(file
                    + ": the memory ran out (" + ResourceLimitException.maxHeapMb() + " MB of heap)",
                    "give the JVM more heap (-Xmx) or report fewer missions at once")), inputs, m.name(), kind, words);
        } catch (RuntimeException e) {
            return failed(file, MissionResult.Status.INTERNAL_ERROR, List.of(LocatedError.plain(file
                    + ": internal error: " + e, "no verdict is given; please report this with the input files")),
                    inputs, m.name(), kind, words);
        }
    }

    private static MissionResult failed(Path file, MissionResult.Status s, List<LocatedError> errors,
                                        List<MissionResult.Input> inputs, String name, String kind, String words) {
        return new MissionResult(file, s, errors, inputs, name, kind, null, List.of(), words, null, null,
                "not checked", List.of());
    }

    private static MissionResult internal(Path file, Mission m, List<MissionResult.Input> inputs, String kind,
                                          String words, String problem) {
        return failed(file, MissionResult.Status.INTERNAL_ERROR, List.of(LocatedError.plain(file + ": internal error: "
                + problem, "no verdict is given; please report this with the input files")), inputs, m.name(), kind, words);
    }

    // ---- one trip

    private static MissionResult oneTrip(Path file, Mission m, List<MissionResult.Input> inputs, String words,
                                         long budget, Pictures pictures) {
        Plan a = MissionPlanner.plan(m, PlanOptions.defaults(m).withMemoryBudget(budget));
        Optional<String> problem = a.certification().problem();
        if (problem.isPresent()) {
            return internal(file, m, inputs, "one-trip", words, problem.get());
        }
        Plan margins = MissionPlanner.plan(m, PlanOptions.of(new Route.Margins()).withMemoryBudget(budget));
        Plan pictured = MissionPlanner.plan(m, PlanOptions.of(PictureRoute.of(m)).withMemoryBudget(budget));
        boolean reserveOnly = !(m.objective() instanceof Objective.Discounted);
        if (reserveOnly && (pictured.verdict() != a.verdict() || margins.verdict() != a.verdict())) {
            return internal(file, m, inputs, "one-trip", words, "the routes disagree on the verdict ("
                    + a.method().word() + ": " + a.verdict().word() + ", pictures: " + pictured.verdict().word()
                    + ", margins: " + margins.verdict().word() + ")");
        }
        List<String> notes = new ArrayList<>(a.notes());
        if (!reserveOnly) {
            notes.add("the verdict answers the mission's discounted objective (with its reserve floor); the highest"
                    + " floor, the lowest start, the pictured run and the rule of thumb answer the reserve floor alone");
        }
        OptionalInt highest = a.highestFloorSearched() || !reserveOnly ? a.highestFloorUnits() : margins.highestFloorUnits();
        if (!reserveOnly && highest.isEmpty()) {
            highest = margins.highestFloorUnits();
        }
        List<String> suggestions = new ArrayList<>();
        for (Suggestion s : a.guaranteed() ? List.<Suggestion>of() : a.suggestions().isEmpty() ? margins.suggestions()
                : a.suggestions()) {
            suggestions.add(s.text());
        }
        if (a.suggestionsNote() != null) {
            notes.add(a.suggestionsNote());
        }
        Plan nominal = MissionPlanner.plan(m.withBudget(0), PlanOptions.of(new Route.Auto(PolicyChoice.SAFEST))
                .withMemoryBudget(budget));
        OptionalInt need = nominalNeed(m.startUnits(), nominal.highestFloorUnits());
        MissionResult.Figures f = new MissionResult.Figures(m.scale(), a.guaranteed(), a.method().word(),
                a.methodReason(), a.certification().ok(), certificationWords(a), m.capacityUnits(), m.startUnits(),
                m.reserveUnits(), m.map().disturbances().budget(), a.lowestLevelUnits(), highest,
                margins.lowestStartUnits(), true, rules(m, need, OptionalInt.empty(), OptionalInt.empty(),
                a.guaranteed()));
        MissionResult.Run run = null;
        byte[] png = null;
        String pictureNote = null;
        try {
            Replay worst = pictured.replays().orElseThrow().worstCase();
            run = run(worst, pictured.guaranteed() ? "worst case under the safest policy (" + (worst.steps().size() - 1)
                    + " steps)" : "counterexample: disturbances that drive the battery below the floor whatever the"
                    + " robot does (" + (worst.steps().size() - 1) + " steps)", -1);
        } catch (IllegalStateException e) {
            pictureNote = "no run to show: " + e.getMessage();
        }
        try {
            png = pictures.oneTrip(pictured);
        } catch (IOException | RuntimeException e) {
            pictureNote = "the map could not be drawn: " + e.getMessage();
        }
        return new MissionResult(file, a.guaranteed() ? MissionResult.Status.GUARANTEED
                : MissionResult.Status.NOT_GUARANTEED, List.of(), inputs, m.name(), "one-trip", f, suggestions, words,
                run, png, pictureNote, notes);
    }

    private static String certificationWords(Plan p) {
        Certification c = p.certification();
        if (c instanceof Certification.Reserve r) {
            return "certified: " + r.certificate().ok() + " (the policy re-checked independently of the solver over "
                    + r.certificate().statesChecked() + " situations)";
        }
        if (c instanceof Certification.Discounted d) {
            return "certified: " + d.certificate().ok() + " (the policy re-checked independently of the solver over "
                    + d.certificate().statesChecked() + " situations)";
        }
        return "not certified: " + ((Certification.NotChecked) c).why();
    }

    // ---- patrols and deadlines

    private static MissionResult rounds(Path file, Mission m, List<MissionResult.Input> inputs, String kind,
                                        String words, long budget, Pictures pictures) {
        long bytes = ProductOptions.defaults().withMemoryBudget(budget).effectiveMemoryBudget();
        RoundsPlan first = RoundsPlan.of(m, bytes, PolicyChoice.SAFEST);
        RoundsCertificate cert = first.certificate();
        if (first.certificateDisagrees()) {
            return internal(file, m, inputs, kind, words, "the solver says guaranteed, but its policy " + (cert.ok()
                    ? "has other figures under" : "failed") + " the independent certificate: " + cert.reason());
        }
        RoundsPlan rp = first.withLowestStart(bytes);
        boolean ok = rp.guaranteed();
        List<String> notes = new ArrayList<>();
        OptionalInt lowest;
        OptionalInt highest;
        if (rp.patrol().isPresent()) {
            PatrolAnalysis a = rp.patrol().get();
            lowest = a.lowestLevelUnits();
            highest = a.highestGuaranteedReserveUnits();
            if (a.longestLapTicks().isPresent()) {
                notes.add("longest lap in the worst case: " + m.timing().describeTicks(a.longestLapTicks().getAsInt())
                        + "; the first lap is complete within " + m.timing().describeTicks(a.wayInTicks().getAsInt()));
            }
            notes.add("checkpoints: " + String.join(", ", m.tasks().patrol()) + ", again and again for ever");
        } else {
            DeadlineAnalysis a = rp.deadline().orElseThrow();
            lowest = a.worstCaseMinimumUnits();
            highest = a.highestGuaranteedReserveUnits();
            notes.add("deadline: " + m.timing().describeTicks(a.deadlineTicks()) + (a.tightestTicks().isPresent()
                    ? "; the tightest deadline that can be guaranteed at this floor: "
                    + m.timing().describeTicks(a.tightestTicks().getAsInt())
                    : "; the robot cannot be sure to finish at all at this floor"));
        }
        if (!rp.lowestStartSearched()) {
            notes.add(LOWEST_START_NOT_COMPUTED);
        }
        OptionalInt nominalHighest;
        OptionalInt deadlineTicks = OptionalInt.empty();
        OptionalInt shortestRun = OptionalInt.empty();
        if (m.tasks().patrols()) {
            nominalHighest = RoundsPlan.of(m.withBudget(0), bytes, PolicyChoice.SAFEST).patrol().orElseThrow()
                    .highestGuaranteedReserveUnits();
        } else {
            // the rule of thumb is about energy: the cheapest run to the end, whatever the time it takes
            Mission noDeadline = m.withBudget(0).withTiming(new Timing(m.timing().tickSeconds(), null));
            nominalHighest = MissionPlanner.plan(noDeadline, PlanOptions.of(new Route.Auto(PolicyChoice.SAFEST))
                    .withMemoryBudget(budget)).highestFloorUnits();
            // and about time: the shortest run when nothing happens, against the deadline
            deadlineTicks = OptionalInt.of(rp.deadline().orElseThrow().deadlineTicks());
            shortestRun = RoundsPlan.fewestTurns(m.withBudget(0), bytes);
            notes.add("the rule of thumb's energy need is that of the cheapest run with no disturbance and no deadline;"
                    + " its time is that of the shortest run with no disturbance (" + (shortestRun.isPresent()
                    ? m.timing().describeTicks(shortestRun.getAsInt()) : "none finishes") + "), which with the same"
                    + " percentage of the deadline as a buffer must fit in the deadline");
        }
        OptionalInt need = nominalNeed(m.startUnits(), nominalHighest);
        String certification = cert == null ? "not certified: not guaranteed, there is no policy to certify"
                : "certified: " + cert.ok() + " (the policy re-checked independently of the solver over "
                + cert.statesChecked() + " situations)";
        MissionResult.Figures f = new MissionResult.Figures(m.scale(), ok, kind, kind.equals("patrol")
                ? "a patrol: a Büchi game within the reserve floor on the stored product"
                : "a visit mission with a deadline: attractor ranks as the ticks left, on the stored product",
                cert != null && cert.ok(), certification, m.capacityUnits(), m.startUnits(), m.reserveUnits(),
                m.map().disturbances().budget(), lowest, highest, rp.lowestStartUnits(), rp.lowestStartSearched(),
                rules(m, need, deadlineTicks, shortestRun, ok));
        MissionResult.Run run = null;
        byte[] png = null;
        String pictureNote = null;
        Optional<RoundsReplay> rr = RoundsPlan.replay(m, bytes, PolicyChoice.SAFEST);
        if (rr.isPresent()) {
            RoundsReplay r = rr.get();
            String title = kind.equals("patrol") ? (ok ? "the policy's worst lasso (the loop repeats for ever)"
                    : "the building's winning play") : ok ? "the slowest play of the policy" : "the slowest play: late";
            run = run(r.replay(), title + " (" + (r.replay().steps().size() - 1) + " steps)", r.loopStart());
            try {
                png = pictures.run(m, r.replay(), ok, (ok ? "GUARANTEED: " : "NOT GUARANTEED: ") + m.name());
            } catch (IOException | RuntimeException e) {
                pictureNote = "the map could not be drawn: " + e.getMessage();
            }
        } else {
            pictureNote = "no run to show: the robot cannot finish at all at this floor";
        }
        return new MissionResult(file, ok ? MissionResult.Status.GUARANTEED : MissionResult.Status.NOT_GUARANTEED,
                List.of(), inputs, m.name(), kind, f, suggestions(rp), words, run, png, pictureNote, notes);
    }

    /** The changes that make a patrol or deadline mission guaranteed, in words with the figures in Wh. */
    private static List<String> suggestions(RoundsPlan rp) {
        List<String> out = new ArrayList<>();
        for (RoundsPlan.Change c : rp.changes(u -> rp.mission().scale().formatWh(u))) {
            out.add(c.text());
        }
        return out;
    }

    // ---- shared

    /** The nominal need: how far below the start the cheapest run with no disturbance must go. */
    static OptionalInt nominalNeed(int startUnits, OptionalInt nominalHighestFloor) {
        return nominalHighestFloor.isPresent() ? OptionalInt.of(Math.subtractExact(startUnits,
                nominalHighestFloor.getAsInt())) : OptionalInt.empty();
    }

    /** The rule at each margin; with a deadline ({@code deadlineTicks}) also on time ({@code shortestRun}). */
    private static List<RuleOfThumb> rules(Mission m, OptionalInt need, OptionalInt deadlineTicks,
                                           OptionalInt shortestRun, boolean guaranteed) {
        List<RuleOfThumb> rules = new ArrayList<>();
        for (int pct : RuleOfThumb.MARGINS) {
            rules.add(RuleOfThumb.judge(pct, m.capacityUnits(), m.startUnits(), m.reserveUnits(), need, deadlineTicks,
                    shortestRun, guaranteed));
        }
        return rules;
    }

    private static MissionResult.Run run(Replay r, String title, int loopStart) {
        List<Integer> levels = new ArrayList<>();
        for (ReplayStep s : r.steps()) {
            levels.add(s.batteryUnits());
        }
        return new MissionResult.Run(title, levels, endingWords(r.ending()), loopStart);
    }

    static String endingWords(Replay.Ending e) {
        return switch (e) {
            case COMPLETE -> "mission complete";
            case BELOW_FLOOR -> "the battery falls below the reserve floor";
            case AVOIDED_ZONE -> "the robot is put into a zone it must avoid";
            case REPEATS -> "back in an earlier situation: the disturbances can repeat this for ever";
            case NO_POLICY -> "the policy has no action for the situation reached";
        };
    }

    /** The SHA-256 of a file in lowercase hex, or null when it cannot be read. */
    static String sha256(Path file) {
        try {
            if (!Files.isRegularFile(file)) {
                return null;
            }
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            try (var in = Files.newInputStream(file)) {
                byte[] buf = new byte[1 << 16];
                for (int n; (n = in.read(buf)) > 0; ) {
                    md.update(buf, 0, n);
                }
            }
            return HexFormat.of().formatHex(md.digest());
        } catch (IOException e) {
            return null;
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("the JDK has no SHA-256", e);
        }
    }
}
