package dockline.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dockline.certify.Certificate;
import dockline.certify.CertificateChecker;
import dockline.certify.DiscountedCertificate;
import dockline.io.PolicyFiles;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.policy.Policy;
import dockline.report.Caveats;
import dockline.solve.Verdict;
import dockline.solve.discounted.DiscountedAnalysis;
import dockline.solve.discounted.DiscountedOptions;
import dockline.solve.discounted.DiscountedPolicies;
import dockline.solve.discounted.DiscountedSolver;
import dockline.solve.reserve.ReserveAnalysis;
import dockline.solve.reserve.ReserveOptions;
import dockline.solve.reserve.ReserveSolver;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine;

/**
 * {@code dockline export MISSION --policy FILE}: solves the mission and writes the robot's policy,
 * one row per situation it can meet (format: missions/POLICY-FORMAT.md; CSV for a {@code .csv}
 * name, else JSON), atomically. Nothing is written when the mission is not guaranteed, and nothing
 * is written unless the policy passes its independent certificate ({@link CertificateChecker}, or
 * the discounted checker for a discounted objective): a failed certificate is exit 4. For a
 * mission with a discounted objective the rows carry the robot's score memory (format version 2,
 * {@link DiscountedPolicies}); the reserve floor is kept as well, as {@code check} does by default.
 */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = {"Writes the certified policy of a guaranteed mission: the action to take in every situation the"
                + " robot can meet.",
                "A situation is the cell, the battery level, the disturbances left, the tasks done and, for a discounted"
                + " score, the score gap. JSON, or CSV for a .csv name; nothing is written when the mission is not"
                + " guaranteed."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:policy certified and written", "1:not guaranteed (nothing written)", "2:bad input or usage",
                "3:over a resource limit (the game is too large for the memory limit)",
                "4:internal error (e.g. the policy failed its independent certificate; nothing written)"})
public final class ExportCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Mixin
    MissionOptions mission;

    @Mixin
    SafestPolicyOption safest;

    @Option(names = "--policy", required = true, paramLabel = "FILE", description = "where to write the policy (.json or .csv)")
    Path policyFile;

    @Option(names = "--json", description = "print the result as one JSON object instead of the text")
    boolean json;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            Mission m = mission.load(err);
            if (RoundsCheck.oneTripOnly(m, "export") != null) {
                err.println(RoundsCheck.oneTripOnly(m, "export"));
                return ExitCodes.BAD_INPUT;
            }
            if (!mission.outputOk("--policy", policyFile, m, err)) {
                return ExitCodes.BAD_INPUT;
            }
            if (m.objective() instanceof Objective.Discounted o) {
                return exportDiscounted(m, o, out, err);
            }
            ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults().withHighestReserve(false)
                    .withMemoryBudget(mission.memoryBudgetBytes()).withSafestPolicy(safest.on));
            if (!a.guaranteed()) {
                notGuaranteed(m, "there is no safe policy to export", out);
                return ExitCodes.NOT_GUARANTEED;
            }
            Policy p = a.policy().orElseThrow();
            Certificate cert = CertificateChecker.check(a.arena(), p, a.reserveUnits(), a.startUnits());
            if (!cert.ok()) {
                return uncertified("its policy failed the independent certificate: " + cert.reason(), err);
            }
            PolicyFiles.write(policyFile, PolicyFiles.Header.of(m), p);
            String worst = CheckCommand.amount(a.worstCaseMinimumUnits().getAsInt(), a);
            if (json) {
                ObjectNode o = summary(m, p, cert.statesChecked());
                o.put("worstCaseMinimumUnits", a.worstCaseMinimumUnits().getAsInt());
                out.println(Json.withCaveats(o));
            } else {
                out.println("Wrote the policy for " + m.name() + " to " + policyFile + ": " + p.size()
                        + " rows; battery never below " + worst + ".");
                out.println("  certified: true (the policy re-checked independently over " + cert.statesChecked()
                        + " situations)");
                out.println("  Energy: " + a.scale().describe());
                out.println(Caveats.block());
            }
            return ExitCodes.OK;
        } catch (MissionOptions.BadInput e) {
            return ExitCodes.BAD_INPUT;
        } catch (IOException e) {
            err.println("dockline: cannot write " + policyFile + ": " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        } catch (RuntimeException | OutOfMemoryError e) {
            return mission.failure(e, err);
        } finally {
            out.flush();
            err.flush();
        }
    }

    private int exportDiscounted(Mission m, Objective.Discounted o, PrintWriter out, PrintWriter err)
            throws IOException {
        if (safest.on) {
            err.println("dockline: --safest-policy applies to the reserve objective only");
            return ExitCodes.BAD_INPUT;
        }
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o,
                DiscountedOptions.defaults().withMemoryBudget(mission.memoryBudgetBytes()));
        if (!a.guaranteed()) {
            notGuaranteed(m, "there is no policy meeting " + DiscountedCheck.condition(o) + " to export", out);
            return ExitCodes.NOT_GUARANTEED;
        }
        Policy p = DiscountedPolicies.of(a);
        DiscountedCertificate cert = DiscountedCheck.certify(a, p);
        String problem = DiscountedCheck.certificateProblem(a, cert);
        if (problem != null) {
            return uncertified(problem, err);
        }
        PolicyFiles.write(policyFile, PolicyFiles.Header.of(m, o, a.maxAbsWeight(), a.reserveKept()), p);
        String worst = a.worstCaseScore().map(DiscountedCheck::show).orElse("not shown");
        if (json) {
            ObjectNode j = summary(m, p, cert.statesChecked());
            j.put("worstCaseScore", cert.worstScore().map(Object::toString).orElse(null));
            out.println(Json.withCaveats(j));
        } else {
            out.println("Wrote the policy for " + m.name() + " to " + policyFile + ": " + p.size() + " rows with the"
                    + " score memory; worst score " + worst + " against " + DiscountedCheck.condition(o) + ".");
            out.println("  certified: true (the policy re-checked independently over " + cert.statesChecked()
                    + " situations)");
            out.println("  Energy: " + m.scale().describe());
            out.println(Caveats.block());
        }
        return ExitCodes.OK;
    }

    private void notGuaranteed(Mission m, String why, PrintWriter out) {
        if (json) {
            ObjectNode o = Json.object();
            o.put("mission", m.name());
            o.put("file", m.source() == null ? null : m.source().toString());
            o.put("verdict", Verdict.NOT_GUARANTEED.word());
            o.put("written", false);
            o.putNull("policyFile");
            o.put("discretisation", m.scale().describe());
            out.println(Json.withCaveats(o));
        } else {
            out.println("NOT GUARANTEED: " + m.name() + " — " + why + "; nothing written.");
            out.println(Caveats.block());
        }
    }

    private static int uncertified(String problem, PrintWriter err) {
        err.println("dockline: internal error: the solver says guaranteed, but " + problem);
        err.println("No policy is written. Please report this with the input files.");
        return ExitCodes.INTERNAL;
    }

    private ObjectNode summary(Mission m, Policy p, int certifiedStates) {
        ObjectNode o = Json.object();
        o.put("mission", m.name());
        o.put("file", m.source() == null ? null : m.source().toString());
        o.put("verdict", Verdict.GUARANTEED.word());
        o.put("written", true);
        o.put("policyFile", policyFile.toString());
        o.put("policyRows", p.size());
        o.put("certified", true);
        o.put("certifiedStates", certifiedStates);
        o.put("unitWh", m.scale().unitWh().stripTrailingZeros());
        o.put("discretisation", m.scale().describe());
        return o;
    }
}
