package dev.sweepline.ground;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The ground's dependency rules (architecture.md, modules: the ground is written from the interface
 * documents and depends on no project module; DEVELOPERS.md: one responsibility per package).
 * Production classes only.
 */
@AnalyzeClasses(packages = "dev.sweepline.ground", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {
    /** The packages depend on each other one way: no cycle between any two (or more) of them. */
    @ArchTest
    static final ArchRule packagesAreFreeOfCycles =
            slices().matching("dev.sweepline.ground.(*)..").should().beFreeOfCycles();

    /** Nothing of the flight software or the simulator: the ground reads their documents and data files, no code. */
    @ArchTest
    static final ArchRule noFlightOrSimulatorCode = noClasses().that().resideInAPackage("dev.sweepline.ground..")
            .should().dependOnClassesThat().resideInAnyPackage("dev.sweepline.fsw..", "dev.sweepline.sim..");
}
