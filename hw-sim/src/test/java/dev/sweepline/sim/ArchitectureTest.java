package dev.sweepline.sim;

import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The simulator's package rules (DEVELOPERS.md, packages: one responsibility each). Production classes only.
 */
@AnalyzeClasses(packages = "dev.sweepline.sim", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {
    /**
     * No cycle between hw-sim's packages: each package depends only on packages below it, so a
     * helper lives with its owner (the HV calibration's windows in hv, the link budget in link, the
     * seeds in seed), never in the package of its first user.
     */
    @ArchTest
    static final ArchRule packagesAreFreeOfCycles =
        slices().matching("dev.sweepline.sim.(*)..").should().beFreeOfCycles();
}
