package dev.sweepline.fsw;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.type;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

/**
 * The flight software's dependency rules (architecture.md, modules: core packages use the JDK alone,
 * with no collections, boxing, threads, clocks on the per-step path; one host adapter package may use
 * third-party code). Production classes only.
 */
@AnalyzeClasses(packages = "dev.sweepline.fsw", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {
    private static final String CORE = "dev.sweepline.fsw..";
    private static final String HOST = "dev.sweepline.fsw.host..";
    /** The non-volatile memory adapter: file I/O, host side like {@link #HOST} (commands.md §4.3). */
    private static final String NVM = "dev.sweepline.fsw.nvm..";
    private static final String COMMAND = "dev.sweepline.fsw.command..";

    /**
     * Core depends on java.lang, java.util.Arrays and itself: no third-party code, no java.util collections,
     * concurrency or time. One narrow exception: the command package's HMAC uses
     * java.security.MessageDigest (SHA-256) and its two checked exceptions, because javax.crypto.Mac
     * allocates 48 B per doFinal inside the JDK and the command path must allocate nothing
     * (HmacSha256, commands.md §1.2).
     */
    @ArchTest
    static final ArchRule coreUsesJdkLangOnly = classes()
        .that().resideInAPackage(CORE).and().resideOutsideOfPackage(HOST).and().resideOutsideOfPackage(NVM)
        .and().resideOutsideOfPackage(COMMAND)
        .should().onlyDependOnClassesThat(resideInAnyPackage("java.lang..", CORE).or(type(java.util.Arrays.class)));

    /** The command package: as core, plus SHA-256 from java.security for the allocation-free HMAC. */
    @ArchTest
    static final ArchRule commandUsesJdkLangAndSha256Only = classes()
        .that().resideInAPackage(COMMAND)
        .should().onlyDependOnClassesThat(resideInAnyPackage("java.lang..", CORE).or(type(java.util.Arrays.class))
            .or(type(java.security.MessageDigest.class)).or(type(java.security.NoSuchAlgorithmException.class))
            .or(type(java.security.DigestException.class)));

    /** No threads, thread-locals, reflection or references in core: the executive is driven from outside. */
    @ArchTest
    static final ArchRule coreStartsNoThreads = noClasses()
        .that().resideInAPackage(CORE).and().resideOutsideOfPackage(HOST).and().resideOutsideOfPackage(NVM)
        .should().dependOnClassesThat(type(Thread.class).or(type(ThreadLocal.class)).or(type(Runnable.class))
            .or(resideInAnyPackage("java.lang.reflect..", "java.lang.ref..")));

    /** Time is data (style.md 2): core never reads a clock. */
    @ArchTest
    static final ArchRule coreReadsNoClock = noClasses()
        .that().resideInAPackage(CORE).and().resideOutsideOfPackage(HOST).and().resideOutsideOfPackage(NVM)
        .should().callMethod(System.class, "currentTimeMillis")
        .orShould().callMethod(System.class, "nanoTime");

    /** The host adapter depends on core, never the other way. */
    @ArchTest
    static final ArchRule coreDoesNotDependOnHost = noClasses()
        .that().resideInAPackage(CORE).and().resideOutsideOfPackage(HOST).and().resideOutsideOfPackage(NVM)
        .should().dependOnClassesThat().resideInAnyPackage(HOST, NVM);

    /**
     * The packages form no cycle (review of the instrument re-layering: link, telemetry, sweep and table
     * once depended on each other through the CRC and the instrument constants): octets and instrument at
     * the bottom, telemetry CCSDS only, science and report above it, exec wiring them; host on top of all.
     */
    @ArchTest
    static final ArchRule packagesAreFreeOfCycles = slices().matching("dev.sweepline.fsw.(*)..").should().beFreeOfCycles();

    /** The CCSDS layer knows no science: telemetry depends on octets alone among the flight packages. */
    @ArchTest
    static final ArchRule telemetryIsCcsdsOnly = classes()
        .that().resideInAPackage("dev.sweepline.fsw.telemetry..")
        .should().onlyDependOnClassesThat(resideInAnyPackage("java.lang..", "dev.sweepline.fsw.telemetry..",
            "dev.sweepline.fsw.octets..").or(type(java.util.Arrays.class)));

    /** The instrument description and the octet helpers depend on no other flight package but the table's. */
    @ArchTest
    static final ArchRule instrumentAndOctetsAreAtTheBottom = noClasses()
        .that().resideInAnyPackage("dev.sweepline.fsw.instrument..", "dev.sweepline.fsw.octets..")
        .should().dependOnClassesThat().resideInAnyPackage("dev.sweepline.fsw.link..", "dev.sweepline.fsw.sweep..",
            "dev.sweepline.fsw.telemetry..", "dev.sweepline.fsw.science..", "dev.sweepline.fsw.report..",
            "dev.sweepline.fsw.command..", "dev.sweepline.fsw.fault..", "dev.sweepline.fsw.exec..",
            "dev.sweepline.fsw.compress..");
}
