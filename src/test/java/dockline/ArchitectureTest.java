package dockline;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The package rules of DEVELOPERS.md ("Layout"), checked on the compiled main classes (tests are not
 * imported): the certificate checker and the policy data stay independent of the solver, the core never
 * depends on a front end, and only the view uses JavaFX. Each rule fails the build with the offending
 * classes and the dependency that breaks it.
 */
@AnalyzeClasses(packages = "dockline", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    @ArchTest
    static final ArchRule certify_neverUsesTheSolver = noClasses().that().resideInAPackage("dockline.certify..")
            .should().dependOnClassesThat().resideInAPackage("dockline.solve..")
            .because("the certificate checker re-checks the solver's policy and must share no code with it");

    @ArchTest
    static final ArchRule certify_usesOnlyModelArenaGoalMonitorPolicy = classes().that()
            .resideInAPackage("dockline.certify..").should().onlyDependOnClassesThat().resideInAnyPackage(
                    "dockline.certify..", "dockline.model..", "dockline.arena..", "dockline.goal..",
                    "dockline.monitor..", "dockline.policy..", "dockline.util..", "dockline.report..", "java..",
                    "org.jgrapht..");

    @ArchTest
    static final ArchRule core_neverUsesCliOrView = noClasses().that().resideInAPackage("dockline..")
            .and().resideOutsideOfPackages("dockline.cli..", "dockline.view..", "dockline.bench..")
            .should().dependOnClassesThat().resideInAnyPackage("dockline.cli..", "dockline.view..")
            .because("the core is used by every front end and knows none of them");

    @ArchTest
    static final ArchRule report_knowsNoFrontEnd = noClasses().that().resideInAPackage("dockline.report..")
            .should().dependOnClassesThat().resideInAnyPackage("dockline.cli..", "dockline.view..", "dockline.bench..",
                    "javafx..", "picocli..")
            .because("the report is built from the core's plans; a front end hands in the picture code"
                    + " (report.Pictures) and prints or writes the result");

    @ArchTest
    static final ArchRule report_plansOnlyThroughTheCore = noClasses().that().resideInAPackage("dockline.report..")
            .should().dependOnClassesThat().resideInAnyPackage("dockline.solve.reserve..", "dockline.solve.fast..",
                    "dockline.solve.discounted..", "dockline.solve.game..", "dockline.solve.charging..",
                    "dockline.arena..", "dockline.goal..", "dockline.monitor..")
            .because("every mission of a report goes through plan.MissionPlanner (or plan.RoundsPlan), never a"
                    + " solver of its own");

    @ArchTest
    static final ArchRule policy_isDataBelowSolverAndChecker = classes().that().resideInAPackage("dockline.policy..")
            .should().onlyDependOnClassesThat().resideInAnyPackage("dockline.policy..", "dockline.model..",
                    "dockline.arena..", "dockline.goal..", "dockline.monitor..", "dockline.util..", "java..")
            .because("the policy is plain data that the solver writes and the checker and the files read");

    @ArchTest
    static final ArchRule io_neverUsesTheSolver = noClasses().that().resideInAPackage("dockline.io..")
            .should().dependOnClassesThat().resideInAPackage("dockline.solve..")
            .because("policy files are read and written without the solver");

    @ArchTest
    static final ArchRule onlyView_usesJavaFx = noClasses().that().resideOutsideOfPackage("dockline.view..")
            .should().dependOnClassesThat().resideInAPackage("javafx..")
            .because("everything but the view is testable without a display");

    @ArchTest
    static final ArchRule solvePackages_formNoCycle = slices().matching("dockline.solve.(*)..").should()
            .beFreeOfCycles().because("the routes build on the shared game package, never the other way round");

    @ArchTest
    static final ArchRule reserveRoute_usesNoOtherRoute = noClasses().that().resideInAPackage("dockline.solve.reserve..")
            .should().dependOnClassesThat().resideInAnyPackage("dockline.solve.fast..", "dockline.solve.discounted..");

    @ArchTest
    static final ArchRule fastPath_usesNoOtherRoute = noClasses().that().resideInAPackage("dockline.solve.fast..")
            .should().dependOnClassesThat().resideInAnyPackage("dockline.solve.reserve..", "dockline.solve.discounted..");

    @ArchTest
    static final ArchRule discountedRoute_usesNoOtherRoute = noClasses().that()
            .resideInAPackage("dockline.solve.discounted..").should().dependOnClassesThat()
            .resideInAnyPackage("dockline.solve.reserve..", "dockline.solve.fast..");

    @ArchTest
    static final ArchRule chargingRoute_usesNoOtherRoute = noClasses().that()
            .resideInAPackage("dockline.solve.charging..").should().dependOnClassesThat()
            .resideInAnyPackage("dockline.solve.reserve..", "dockline.solve.fast..", "dockline.solve.discounted..");
}
