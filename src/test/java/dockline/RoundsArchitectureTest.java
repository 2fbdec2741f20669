package dockline;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The patrol and deadline route ({@code dockline.solve.rounds}) is a route of its own, as DEVELOPERS.md
 * ("Layout") says: it uses no other route, and no other route uses it.
 */
@AnalyzeClasses(packages = "dockline", importOptions = ImportOption.DoNotIncludeTests.class)
class RoundsArchitectureTest {

    @ArchTest
    static final ArchRule roundsRoute_usesNoOtherRoute = noClasses().that().resideInAPackage("dockline.solve.rounds..")
            .should().dependOnClassesThat().resideInAnyPackage("dockline.solve.reserve..", "dockline.solve.fast..",
                    "dockline.solve.discounted..");

    @ArchTest
    static final ArchRule noOtherRoute_usesRounds = noClasses().that().resideInAnyPackage("dockline.solve.reserve..",
            "dockline.solve.fast..", "dockline.solve.discounted..", "dockline.solve.game..").should()
            .dependOnClassesThat().resideInAPackage("dockline.solve.rounds..");
}
