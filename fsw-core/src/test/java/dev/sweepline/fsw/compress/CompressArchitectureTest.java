package dev.sweepline.fsw.compress;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

class CompressArchitectureTest {

    @Test
    void shouldUseTheJdkLangPackageAlone() {
        JavaClasses classes = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("dev.sweepline.fsw.compress");
        // architecture.md: fsw-core core packages use the JDK alone, no collections on the per-step path
        classes().should().onlyDependOnClassesThat()
                .resideInAnyPackage("dev.sweepline.fsw.compress", "java.lang")
                .check(classes);
    }
}
