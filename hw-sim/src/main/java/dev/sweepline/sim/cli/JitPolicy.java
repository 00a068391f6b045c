package dev.sweepline.sim.cli;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalInt;
import javax.management.JMException;
import javax.management.ObjectName;

/**
 * Which of the JVM's just-in-time compilers a campaign's process uses. A campaign's runs are short,
 * each a closed loop through the flight software, the simulator and the ground's fitter: on HotSpot the
 * optimising compiler (C2) then spends about as much CPU recompiling that code (a size-3 and a size-6 fit
 * take turns through the same loops, and each turn deoptimises the last compilation) as the runs spend
 * running, so the quick compiler (C1) alone finishes a 100-run campaign in about two thirds of the CPU,
 * and lets a second worker thread have the second core. Over many more runs C2's faster code pays back its
 * compilations: from about {@link #C1_MAX_RUNS} runs on the default stays tiered, and so it does with fewer
 * workers than cores, where C2 compiles on a core no worker wanted (figures:
 * hw-sim/src/main/resources/campaigns/FORMAT.md, "Speed").
 * The outputs do not depend on it: Java's arithmetic is the same in every compiler tier (JLS §15.4, strict
 * floating point since Java 17).
 *
 * <p>{@link Mode#C1} runs the command line again in a JVM started with {@code -XX:TieredStopAtLevel=1}
 * ({@link #relaunch}, {@link QuickCompilerProcess}): every method is compiled once, by C1 without profiling.
 * Where that JVM cannot be started (or must not be: an agent, a debugger, a flight recording) it adds a
 * HotSpot compiler directive instead, as {@code jcmd PID Compiler.directives_add} does, through the
 * platform's DiagnosticCommand MBean: no method is compiled by C2, so a method hot enough for it is compiled
 * by C1 without profiling, after its profiled C1 compilation (tier 3) has run up to C2's thresholds; on
 * perihelion-tuning.yaml's 108 runs that costs about 0.9 s more CPU than the second JVM (FORMAT.md, "Speed").
 * A JVM without that MBean keeps its default; the policy is the whole process's, so only the command line's
 * own process sets it ({@link BenchMain#main}).
 */
final class JitPolicy {
    /** The JVM's compilers for a campaign. */
    enum Mode {
        /** The quick compiler alone (C1 without profiling once a method is hot). */
        C1,
        /** The JVM's default: tiered compilation up to the optimising compiler. */
        TIERED
    }

    /** The directive: every method, excluded from C2 (HotSpot's compiler-directives format, JEP 165). */
    static final String C1_ONLY_DIRECTIVE = "[ { match: \"*.*\", c2: { Exclude: true } } ]";

    /**
     * Runs up to which a process's campaign is run with C1 alone by default: the CPU of the two measured
     * equal between 432 runs (C1 about 10 % less) and 1296 runs (C1 about 15 % more), near 600 (FORMAT.md,
     * "Speed"; measured on a loaded 2-core machine, so a round figure).
     */
    static final long C1_MAX_RUNS = 600;

    /** The platform MBean of HotSpot's diagnostic commands. */
    private static final String DIAGNOSTIC_COMMANDS = "com.sun.management:type=DiagnosticCommand";

    /** Set by {@link BenchMain#main}: the process is the command line's, so its compilers are ours to choose. */
    private static volatile boolean ownsProcess;

    private JitPolicy() {
    }

    /** The command line's arguments, for {@link #relaunch}; null before {@link #ownProcess}. */
    private static volatile List<String> commandLine;

    /**
     * Called by the command line's {@code main} with its arguments: the policy may be applied to this process,
     * and {@link Mode#C1} may run them again in a JVM of its own ({@link #relaunch}).
     */
    static void ownProcess(String... args) {
        commandLine = List.of(args);
        ownsProcess = true;
    }

    /**
     * For {@link Mode#C1} in the command line's own process: its command line run again in a JVM at C1 alone
     * from the start ({@link QuickCompilerProcess}), whose exit status is returned; empty for {@link Mode#TIERED},
     * in any other process, or when no such JVM can be started (then {@link #apply} adds the directive).
     */
    static OptionalInt relaunch(Mode mode) {
        List<String> args = commandLine;
        return mode == Mode.C1 && ownsProcess && args != null
                ? QuickCompilerProcess.run(BenchMain.class, args) : OptionalInt.empty();
    }

    /**
     * The mode a command of {@code runs} runs on {@code threads} workers applies: {@code given}, else C1 in the
     * command line's own process when the workers take every one of the {@code cores} (so C2 would take a
     * worker's core, not an idle one) and the campaign has at most {@link #C1_MAX_RUNS} runs, else the JVM's
     * default.
     */
    static Mode effective(Mode given, long runs, int threads, int cores) {
        if (given != null) {
            return given;
        }
        return ownsProcess && threads >= cores && runs <= C1_MAX_RUNS ? Mode.C1 : Mode.TIERED;
    }

    /**
     * Applies {@code mode} to this JVM; true when it is in force (TIERED always is; C1 in a JVM that stops at
     * tier 1 already, {@link QuickCompilerProcess}'s child, without a directive and the platform MBean server
     * it would start), false when the JVM offers no way to add the directive.
     */
    static boolean apply(Mode mode) {
        return switch (mode) {
            case TIERED -> true;
            case C1 -> QuickCompilerProcess.stopsAtTierOne() || addDirective(C1_ONLY_DIRECTIVE);
        };
    }

    /** Adds compiler directive {@code json} through the DiagnosticCommand MBean; false when it cannot. */
    static boolean addDirective(String json) {
        Path file = null;
        try {
            file = Files.createTempFile("sweepline-jit-", ".json");
            Files.writeString(file, json, StandardCharsets.UTF_8);
            Object reply = ManagementFactory.getPlatformMBeanServer().invoke(new ObjectName(DIAGNOSTIC_COMMANDS),
                    "compilerDirectivesAdd", new Object[] {new String[] {file.toString()}},
                    new String[] {String[].class.getName()});
            // the command answers "1 compiler directives added"; a file it cannot parse, "Could not load file"
            return reply instanceof String s && s.matches("(?s)\\s*[1-9][0-9]* compiler directives added.*");
        } catch (IOException | JMException | RuntimeException | LinkageError e) {
            return false;
        } finally {
            if (file != null) {
                try {
                    Files.deleteIfExists(file);
                } catch (IOException e) {
                    // a temporary file left behind: nothing to undo
                }
            }
        }
    }
}
