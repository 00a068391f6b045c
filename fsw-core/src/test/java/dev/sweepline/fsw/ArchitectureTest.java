package dev.sweepline.fsw;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.type;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

/**
 * The flight software's dependency rules (architecture.md, modules: core packages use the JDK alone,
 * with no collections, boxing, threads, clocks on the per-step path; one host adapter package may use
 * third-party code). Production classes only.
 */
@AnalyzeClasses(packages = "dev.sweepline.fsw", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {
    private static final String CORE = "dev.sweepline.fsw..";
    private static final String HOST = "dev.sweepline.fsw.host..";

    /** Core depends on java.lang, java.util.Arrays and itself: no third-party code, no java.util collections, concurrency or time. */
    @ArchTest
    static final ArchRule coreUsesJdkLangOnly = classes()
        .that().resideInAPackage(CORE).and().resideOutsideOfPackage(HOST)
        .should().onlyDependOnClassesThat(resideInAnyPackage("java.lang..", CORE).or(type(java.util.Arrays.class)));

    /** No threads, thread-locals, reflection or references in core: the executive is driven from outside. */
    @ArchTest
    static final ArchRule coreStartsNoThreads = noClasses()
        .that().resideInAPackage(CORE).and().resideOutsideOfPackage(HOST)
        .should().dependOnClassesThat(type(Thread.class).or(type(ThreadLocal.class)).or(type(Runnable.class))
            .or(resideInAnyPackage("java.lang.reflect..", "java.lang.ref..")));

    /** Time is data (style.md 2): core never reads a clock. */
    @ArchTest
    static final ArchRule coreReadsNoClock = noClasses()
        .that().resideInAPackage(CORE).and().resideOutsideOfPackage(HOST)
        .should().callMethod(System.class, "currentTimeMillis")
        .orShould().callMethod(System.class, "nanoTime");

    /** The host adapter depends on core, never the other way. */
    @ArchTest
    static final ArchRule coreDoesNotDependOnHost = noClasses()
        .that().resideInAPackage(CORE).and().resideOutsideOfPackage(HOST)
        .should().dependOnClassesThat().resideInAPackage(HOST);
}
