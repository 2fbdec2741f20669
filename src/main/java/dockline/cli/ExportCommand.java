package dockline.cli;

import dockline.io.PolicyFiles;
import dockline.model.Mission;
import dockline.model.Objective;
import dockline.report.Caveats;
import dockline.solve.DiscountedAnalysis;
import dockline.solve.DiscountedOptions;
import dockline.solve.DiscountedPolicies;
import dockline.solve.DiscountedSolver;
import dockline.solve.Policy;
import dockline.solve.ProductTooLargeException;
import dockline.solve.ReserveAnalysis;
import dockline.solve.ReserveOptions;
import dockline.solve.ReserveSolver;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code dockline export MISSION --policy FILE}: solves the mission and writes the robot's policy,
 * one row per situation it can meet (format: missions/POLICY-FORMAT.md; CSV for a {@code .csv}
 * name, else JSON), atomically. Nothing is written when the mission is not guaranteed. For a
 * mission with a discounted objective the rows carry the robot's score memory (format version 2,
 * {@link DiscountedPolicies}); the reserve floor is kept as well, as {@code check} does by default.
 */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = {"Writes the robot's policy for a guaranteed mission: for every situation it can meet (cell,",
                "battery level, disturbances left, tasks done, and for a discounted score the score gap) the action",
                "to take. JSON, or CSV for a .csv name."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:policy written", "1:not guaranteed (nothing written)", "2:bad input or usage",
                "3:the game is too large for the memory limit"})
public final class ExportCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Mixin
    MissionOptions mission;

    @Option(names = "--policy", required = true, paramLabel = "FILE", description = "where to write the policy (.json or .csv)")
    Path policyFile;

    private int exportDiscounted(Mission m, Objective.Discounted o, PrintWriter out, PrintWriter err)
            throws IOException {
        if (mission.safestPolicy) {
            err.println("dockline: --safest-policy applies to the reserve objective only");
            return ExitCodes.BAD_INPUT;
        }
        DiscountedAnalysis a = DiscountedSolver.analyse(m, o,
                DiscountedOptions.defaults().withMemoryBudget(mission.memoryBudgetBytes()));
        if (!a.guaranteed()) {
            out.println("NOT GUARANTEED: " + m.name() + " — there is no policy meeting " + DiscountedCheck.condition(o)
                    + " to export; nothing written.");
            out.println(Caveats.block());
            return ExitCodes.NOT_GUARANTEED;
        }
        Policy p = DiscountedPolicies.of(a);
        PolicyFiles.write(policyFile, PolicyFiles.Header.of(m, o, a.maxAbsWeight(), a.reserveKept()), p);
        out.println("Wrote the policy for " + m.name() + " to " + policyFile + ": " + p.size() + " rows with the score"
                + " memory; worst score " + a.worstCaseScore().map(DiscountedCheck::show).orElse("not shown")
                + " against " + DiscountedCheck.condition(o) + ".");
        out.println("  Energy: " + m.scale().describe());
        out.println(Caveats.block());
        return ExitCodes.OK;
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            Mission m = mission.load(err);
            if (m.reserveUnits() > m.capacityUnits()) {
                err.println("dockline: " + mission.missionFile + ": the reserve floor is above the capacity");
                return ExitCodes.BAD_INPUT;
            }
            if (m.objective() instanceof Objective.Discounted o) {
                return exportDiscounted(m, o, out, err);
            }
            ReserveAnalysis a = ReserveSolver.analyse(m, ReserveOptions.defaults().withHighestReserve(false)
                    .withMemoryBudget(mission.memoryBudgetBytes()).withSafestPolicy(mission.safestPolicy));
            if (!a.guaranteed()) {
                out.println("NOT GUARANTEED: " + m.name() + " — there is no safe policy to export; nothing written.");
                out.println(Caveats.block());
                return ExitCodes.NOT_GUARANTEED;
            }
            PolicyFiles.write(policyFile, PolicyFiles.Header.of(m), a.policy().orElseThrow());
            out.println("Wrote the policy for " + m.name() + " to " + policyFile + ": " + a.policy().get().size()
                    + " rows; battery never below " + CheckCommand.amount(a.worstCaseMinimumUnits().getAsInt(), a) + ".");
            out.println("  Energy: " + a.scale().describe());
            out.println(Caveats.block());
            return ExitCodes.OK;
        } catch (MissionOptions.BadInput e) {
            return ExitCodes.BAD_INPUT;
        } catch (ProductTooLargeException e) {
            err.println("dockline: " + mission.missionFile + ": " + e.getMessage());
            err.println("The limit is half the JVM's heap unless --max-memory MB says otherwise.");
            return ExitCodes.RESOURCE_LIMIT;
        } catch (ArithmeticException | OutOfMemoryError e) {
            // a count past the int range, or an estimate that fell short of the heap actually needed
            err.println("dockline: " + mission.missionFile + ": the game is too large: " + e.getMessage()
                    + ". Use a coarser energy resolution or a smaller disturbance budget K, or give the JVM more"
                    + " memory (-Xmx).");
            return ExitCodes.RESOURCE_LIMIT;
        } catch (IllegalArgumentException e) {
            err.println("dockline: " + mission.missionFile + ": " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        } catch (IOException e) {
            err.println("dockline: cannot write " + policyFile + ": " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        } finally {
            out.flush();
            err.flush();
        }
    }
}
