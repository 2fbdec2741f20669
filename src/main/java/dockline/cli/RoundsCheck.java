package dockline.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.certify.RoundsCertificate;
import dockline.model.Mission;
import dockline.plan.PolicyChoice;
import dockline.plan.RoundsPlan;
import dockline.model.Timing;
import dockline.report.Caveats;
import dockline.solve.ProductOptions;
import dockline.solve.rounds.DeadlineAnalysis;
import dockline.solve.rounds.DeadlineSolver;
import dockline.solve.rounds.PatrolAnalysis;
import dockline.solve.rounds.PatrolSolver;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.util.OptionalInt;

/**
 * {@code check} for the missions beyond one trip: a patrol ({@link PatrolSolver}) or a visit mission with a
 * deadline ({@link DeadlineSolver}). Every "guaranteed" is re-checked by the independent certificate
 * ({@link PatrolCertificateChecker}, {@link DeadlineCertificateChecker}); a failed certificate, or one whose
 * figures differ from the solver's, is exit 4.
 */
final class RoundsCheck {

    private RoundsCheck() {
    }

    /** Options that apply to one-trip missions only, which a patrol or deadline check refuses. */
    static String refusedOption(boolean safest, boolean nonDefaultRoute, boolean discounted) {
        if (discounted) {
            return "a patrol or a deadline is checked with the reserve objective only";
        }
        if (nonDefaultRoute) {
            return "--method and --verdict-only apply to one-trip missions; a patrol or deadline mission has one"
                    + " route (the stored product)";
        }
        return null;
    }

    /** The refusal of a command that handles one-trip missions only, or null when the mission is one. */
    static String oneTripOnly(Mission m, String command) {
        if (!m.beyondOneTrip()) {
            return null;
        }
        return "dockline " + command + ": " + (m.source() == null ? "the mission" : m.source()) + " is a "
                + (m.tasks().patrols() ? "patrol" : "mission with a deadline") + "; " + command + " handles one-trip"
                + " missions only (hint: 'dockline check' decides it, with its highest floor, and certifies its policy;"
                + " 'dockline replay' shows its " + (m.tasks().patrols() ? "lasso" : "slowest play") + ")";
    }

    static long budget(long memoryBudgetBytes) {
        return ProductOptions.defaults().withMemoryBudget(memoryBudgetBytes).effectiveMemoryBudget();
    }

    /** Plans the mission through the core ({@link RoundsPlan}), prints the result, returns the exit code. */
    static int run(Mission m, long memoryBudgetBytes, boolean safest, boolean json, PrintWriter out, PrintWriter err) {
        long bytes = budget(memoryBudgetBytes);
        RoundsPlan plan = RoundsPlan.of(m, bytes, safest ? PolicyChoice.SAFEST : PolicyChoice.FEWEST_MOVES);
        if (plan.certificateDisagrees()) {
            return internal(err, plan.certificate());
        }
        plan = plan.withLowestStart(bytes);
        if (json) {
            out.println(json(plan));
        } else {
            text(plan, out);
        }
        return plan.guaranteed() ? ExitCodes.OK : ExitCodes.NOT_GUARANTEED;
    }

    private static int internal(PrintWriter err, RoundsCertificate cert) {
        err.println("dockline: internal error: the solver says guaranteed, but its policy " + (cert.ok()
                ? "has other figures under" : "failed") + " the independent certificate: " + cert.reason());
        err.println("No verdict is given. Please report this with the input files.");
        return ExitCodes.INTERNAL;
    }

    private static String events(Mission m) {
        int k = m.map().disturbances().budget();
        if (k == 0) {
            return "with no disturbances";
        }
        return "under up to " + k + " disturbance" + (k == 1 ? "" : "s")
                + (m.tasks().patrols() ? (m.map().disturbances().budgetPerLap() ? " per lap" : " in the whole night")
                : "");
    }

    /** The text of either goal, ending in the energy, the certificate and the safety cautions. */
    static void text(RoundsPlan p, PrintWriter out) {
        if (p.patrol().isPresent()) {
            patrolText(p, out);
        } else {
            deadlineText(p, out);
        }
        tail(p.mission(), p.certificate(), out);
    }

    /** The JSON object of either goal: the shared header, the goal's own keys, then the shared last keys. */
    static String json(RoundsPlan p) {
        Mission m = p.mission();
        ObjectNode o = header(m, p.guaranteed(), p.patrol().isPresent() ? "patrol" : "deadline");
        long millis;
        if (p.patrol().isPresent()) {
            patrolKeys(o, p);
            millis = p.patrol().get().millis();
        } else {
            deadlineKeys(o, p);
            millis = p.deadline().orElseThrow().millis();
        }
        return end(o, m, millis, p.certificate(), changes(p));
    }

    // ---------------------------------------------------------------- patrol

    private static void patrolText(RoundsPlan p, PrintWriter out) {
        PatrolAnalysis a = p.patrol().orElseThrow();
        Mission m = a.mission();
        Timing t = m.timing();
        String cps = String.join(", ", m.tasks().patrol());
        if (a.guaranteed()) {
            out.println("GUARANTEED: " + m.name() + " — the robot can visit every checkpoint (" + cps + ") again and"
                    + " again for ever " + events(m) + " without going below the reserve floor.");
            out.println("  Lowest battery level ever reached under the policy: "
                    + CheckReport.amount(a.lowestLevelUnits().getAsInt(), m) + (a.policyFloorUnits() > a.reserveUnits()
                    ? " (the safest policy; its laps may be longer)" : " (the policy of shortest laps)"));
            out.println("  Longest lap in the worst case:  " + t.describeTicks(a.longestLapTicks().getAsInt())
                    + "; the first lap is complete within " + t.describeTicks(a.wayInTicks().getAsInt()));
        } else {
            out.println("NOT GUARANTEED: " + m.name() + " — no policy can visit every checkpoint (" + cps + ") again"
                    + " and again " + events(m) + " while staying at or above the reserve floor.");
            out.println("  Run 'dockline replay " + (m.source() == null ? "MISSION" : m.source()) + "' for a lap where"
                    + " the building wins (the battery or a checkpoint is lost).");
        }
        figures(p, "", out);
        out.println("  Method: recurrence (Büchi) game solved by nested attractors on the stored product (arena x"
                + " checkpoints of the lap x battery levels)");
        out.println("  Game: " + a.productVertices() + " vertices, " + a.productEdges() + " edges (at most "
                + a.boundVertices() + " vertices); " + a.rounds() + " round" + (a.rounds() == 1 ? "" : "s")
                + " of the fixpoint; " + a.millis() + " ms in all (the highest floor included)" + lowestStartTime(p));
    }

    private static void patrolKeys(ObjectNode o, RoundsPlan p) {
        PatrolAnalysis a = p.patrol().orElseThrow();
        Mission m = a.mission();
        o.putPOJO("checkpoints", m.tasks().patrol());
        o.put("budgetPer", m.map().disturbances().budgetPerLap() ? "lap" : "mission");
        Json.putBattery(o, a.startUnits(), a.reserveUnits(), a.capacityUnits());
        Json.putOptional(o, "lowestLevelUnits", a.lowestLevelUnits());
        policy(o, a.policyFloorUnits(), a.reserveUnits());
        Json.putOptional(o, "longestLapTicks", a.longestLapTicks());
        Json.putOptional(o, "wayInTicks", a.wayInTicks());
        seconds(o, "longestLapSeconds", m, a.longestLapTicks());
        Json.putOptional(o, "highestReserveUnits", a.highestGuaranteedReserveUnits());
        lowestStartJson(o, p);
        tick(o, m);
        game(o, a.productVertices(), a.productEdges(), a.boundVertices());
        o.put("fixpointRounds", a.rounds());
    }

    // ---------------------------------------------------------------- deadline

    private static void deadlineText(RoundsPlan p, PrintWriter out) {
        DeadlineAnalysis a = p.deadline().orElseThrow();
        Mission m = a.mission();
        Timing t = m.timing();
        String deadline = Timing.clock(t.deadlineSeconds()) + " (" + a.deadlineTicks() + " turns of "
                + Timing.clock(t.tickSeconds()) + ", rounded down)";
        if (a.guaranteed()) {
            out.println("GUARANTEED: " + m.name() + " — the robot can always finish and dock within " + deadline + " "
                    + events(m) + " without going below the reserve floor.");
            out.println("  Worst finishing time under the policy:  " + t.describeTicks(a.worstFinishTicks().getAsInt()));
            out.println("  Worst battery level under the policy:   "
                    + CheckReport.amount(a.worstCaseMinimumUnits().getAsInt(), m) + (a.policyFloorUnits() > a.reserveUnits()
                    ? " (the safest policy that keeps the deadline)" : " (the policy of fewest turns)"));
        } else {
            out.println("NOT GUARANTEED: " + m.name() + " — no policy can always finish and dock within " + deadline
                    + " " + events(m) + " while staying at or above the reserve floor.");
            if (a.tightestTicks().isPresent()) {
                out.println("  Only the deadline is missed: at this floor the robot can always finish, but it needs up"
                        + " to " + t.describeTicks(a.tightestTicks().getAsInt()) + " in the worst case.");
            } else {
                out.println("  Not even without the deadline: the robot cannot always finish and dock at this floor.");
            }
        }
        if (a.tightestTicks().isPresent()) {
            out.println("  Tightest deadline still guaranteed:     " + t.describeTicks(a.tightestTicks().getAsInt())
                    + " (at this floor)");
        } else {
            out.println("  Tightest deadline still guaranteed:     none (no deadline is, at this floor)");
        }
        figures(p, " (within the deadline)", out);
        out.println("  Method: reachability attractor on the stored product (arena x goal x battery levels); its ranks"
                + " stand for the ticks-left monitor");
        out.println("  Game: " + a.productVertices() + " vertices, " + a.productEdges() + " edges (at most "
                + a.boundVertices() + "); with ticks left " + a.timedVertices() + " vertices, kept as one rank per"
                + " vertex; " + a.millis() + " ms in all (the highest floor included)" + lowestStartTime(p));
    }

    private static void deadlineKeys(ObjectNode o, RoundsPlan p) {
        DeadlineAnalysis a = p.deadline().orElseThrow();
        Mission m = a.mission();
        Json.putBattery(o, a.startUnits(), a.reserveUnits(), a.capacityUnits());
        tick(o, m);
        o.put("deadlineSeconds", m.timing().deadlineSeconds().stripTrailingZeros());
        o.put("deadlineTicks", a.deadlineTicks());
        Json.putOptional(o, "worstFinishTicks", a.worstFinishTicks());
        seconds(o, "worstFinishSeconds", m, a.worstFinishTicks());
        Json.putOptional(o, "tightestDeadlineTicks", a.tightestTicks());
        seconds(o, "tightestDeadlineSeconds", m, a.tightestTicks());
        Json.putOptional(o, "lowestLevelUnits", a.worstCaseMinimumUnits());
        Json.putOptional(o, "highestReserveUnits", a.highestGuaranteedReserveUnits());
        lowestStartJson(o, p);
        policy(o, a.policyFloorUnits(), a.reserveUnits());
        game(o, a.productVertices(), a.productEdges(), a.boundVertices());
        o.put("timedVertices", a.timedVertices());
    }

    // ---------------------------------------------------------------- shared

    /** The plan's changes that make the mission guaranteed, the amounts worded as {@code check} words them. */
    static java.util.List<RoundsPlan.Change> changes(RoundsPlan p) {
        return p.changes(u -> CheckReport.amount(u, p.mission()));
    }

    private static void changesText(java.util.List<RoundsPlan.Change> changes, PrintWriter out) {
        if (!changes.isEmpty()) {
            out.println("  To make it guaranteed, change one of:");
            for (RoundsPlan.Change c : changes) {
                out.println("    - " + c.text());
            }
        }
    }

    /** The energy, the certificate (when there is one) and the safety cautions: the last lines of the text. */
    private static void tail(Mission m, RoundsCertificate cert, PrintWriter out) {
        out.println("  Energy: " + m.scale().describe());
        if (cert != null) {
            out.println("  certified: " + cert.ok() + " (" + cert.reason() + ")");
        }
        out.println(Caveats.block());
    }

    /**
     * The {@code suggestions} array of the changes: kind, from, to and the sentence (as {@link Json#putSuggestions}),
     * written from the records themselves (their components are the keys, in that order).
     */
    static void changesJson(ObjectNode o, java.util.List<RoundsPlan.Change> changes) {
        o.putPOJO("suggestions", java.util.List.copyOf(changes));
    }

    /**
     * The highest floor and the lowest start ({@code what}: of which goal), the changes that make it guaranteed,
     * the battery.
     */
    private static void figures(RoundsPlan p, String what, PrintWriter out) {
        Mission m = p.mission();
        OptionalInt h = p.patrol().isPresent() ? p.patrol().get().highestGuaranteedReserveUnits()
                : p.deadline().orElseThrow().highestGuaranteedReserveUnits();
        out.println("  Highest reserve floor guaranteed" + what + ": " + (h.isPresent()
                ? CheckReport.amount(h.getAsInt(), m) : "none (not even a floor of 0 can be guaranteed)"));
        out.println("  Lowest starting charge for the floor" + what + ": " + lowestStartWords(p));
        changesText(changes(p), out);
        CheckReport.batteryLine(m.startUnits(), m.reserveUnits(), m.capacityUnits(), m, out);
    }

    /** The lowest start in words: the amount, none, or why it was not computed. */
    /** The lowest start's search time, which the analysis' own time leaves out; empty before that search. */
    private static String lowestStartTime(RoundsPlan p) {
        return p.lowestStartMillis() > 0 || p.lowestStartSearched() ? ", and " + p.lowestStartMillis()
                + " ms for the lowest starting charge" : "";
    }

    static String lowestStartWords(RoundsPlan p) {
        if (p.lowestStartUnits().isPresent()) {
            return CheckReport.amount(p.lowestStartUnits().getAsInt(), p.mission());
        }
        return p.lowestStartSearched() ? "none (not even a full battery is enough)"
                : "not computed (a game from a higher starting charge passes the memory budget)";
    }

    /** The lowest start ({@code null} when none or not searched) and whether its search ran to the end. */
    private static void lowestStartJson(ObjectNode o, RoundsPlan p) {
        Json.putOptional(o, "lowestStartUnits", p.lowestStartUnits());
        o.put("lowestStartSearched", p.lowestStartSearched());
        o.put("lowestStartMillis", p.lowestStartMillis());
    }

    private static ObjectNode header(Mission m, boolean ok, String method) {
        ObjectNode o = Json.header(m, dockline.solve.Verdict.of(ok));
        o.put("method", method);
        Json.putUnitAndBudget(o, m);
        return o;
    }

    private static void tick(ObjectNode o, Mission m) {
        if (m.timing().hasTick()) {
            o.put("tickSeconds", m.timing().tickSeconds().stripTrailingZeros());
        } else {
            o.putNull("tickSeconds");
        }
    }

    /** Puts the seconds of {@code ticks} turns, or null when the mission has no tick length or there are no ticks. */
    static void seconds(ObjectNode o, String key, Mission m, OptionalInt ticks) {
        if (m.timing().hasTick() && ticks.isPresent()) {
            BigDecimal s = m.timing().seconds(ticks.getAsInt()).stripTrailingZeros();
            o.put(key, s);
        } else {
            o.putNull(key);
        }
    }

    /** The policy's floor and which policy it is: above the mission's floor, the safest. */
    private static void policy(ObjectNode o, int policyFloorUnits, int reserveUnits) {
        o.put("policyReserveUnits", policyFloorUnits);
        o.put("policyChoice", policyFloorUnits > reserveUnits ? "safest" : "fewest-moves");
    }

    /** The stored product's size and its bound. */
    private static void game(ObjectNode o, long vertices, long edges, long boundVertices) {
        o.put("productVertices", vertices);
        o.put("productEdges", edges);
        o.put("boundVertices", boundVertices);
    }

    /** The last keys of both goals' objects (time, certificate, suggestions, rounding, cautions), as text. */
    private static String end(ObjectNode o, Mission m, long millis, RoundsCertificate cert, java.util.List<RoundsPlan.Change> changes) {
        o.put("totalMillis", millis);
        certificate(o, cert);
        changesJson(o, changes);
        o.put("rounding", m.scale().describe());
        return Json.withCaveats(o);
    }

    private static void certificate(ObjectNode o, RoundsCertificate cert) {
        o.put("certified", cert != null && cert.ok());
        if (cert != null) {
            o.put("certifiedStates", cert.statesChecked());
            o.put("certifiedLowestLevelUnits", cert.worstMinimumUnits());
            o.put("certification", cert.reason());
        }
    }
}
