package dev.sweepline.sim.cli;

import com.sun.management.HotSpotDiagnosticMXBean;
import dev.sweepline.fsw.host.ExitStatus;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;

/**
 * The command line run again in a JVM of its own that compiles with C1 alone from its start
 * ({@code -XX:TieredStopAtLevel=1}), for {@link JitPolicy.Mode#C1}. The compiler directive that keeps C2 out
 * of this process ({@link JitPolicy#apply}) still lets every hot method go through C1's profiling tier
 * first (tier 3, about 2 500 methods of a 108-run campaign) and be compiled again without profiling once
 * C2 would have taken it (tier 1); a JVM started at tier 1 compiles each method once, without profiling
 * code, at the same thresholds. The flag exists only on the command line, hence the second JVM: the same
 * java, the same JVM options, class path, arguments, working directory and environment, its standard
 * streams this process's. This process waits for it and exits with its status (a child ended by a signal
 * from elsewhere: one line, {@link ExitStatus#FAILED}); a signal that ends this
 * process (SIGTERM, SIGINT) ends the child first ({@link Process#destroy}), so a campaign's journal is left as
 * a killed run leaves it.
 *
 * <p>Not relaunched (the directive applies instead): a process that is not the command line's
 * ({@link JitPolicy#ownProcess}), a JVM that is not tiered up to C2 (already at tier 1, or told to stop at another tier), a child of this class (the
 * property {@value #CHILD_PROPERTY}), a JVM with an agent, a debugger or a flight recording (two processes
 * would share them), and a JVM without HotSpot's diagnostic MBean or its java executable.
 */
final class QuickCompilerProcess {
    /** The flag of the child JVM: tiered compilation stopped at C1 without profiling. */
    static final String FLAG = "-XX:TieredStopAtLevel=1";
    /**
     * A child's status above this is 128 + the signal that ended it (the JDK's Process on Unix reports a
     * signalled process as a shell does [memory]); the bench's own statuses are 0..6 ({@link ExitStatus}).
     */
    private static final int SIGNALLED = 128;
    /** Set in the child, so that it never relaunches itself. */
    static final String CHILD_PROPERTY = "sweepline.jit.quickCompilerProcess";
    /** JVM options that a second process must not repeat: agents, debuggers, flight recordings. */
    private static final List<String> SHARED_OPTIONS = List.of("-agentlib", "-agentpath", "-javaagent", "-Xrunjdwp",
            "-Xdebug", "-XX:StartFlightRecording", "-XX:FlightRecorderOptions", "-XX:+FlightRecorder");

    private QuickCompilerProcess() {
    }

    /**
     * Runs {@code args} (the command line's) through {@code mainClass} in a JVM at tier 1 and returns its exit
     * status; empty when this process is not to be relaunched (see the class comment) or the child cannot be
     * started.
     */
    static OptionalInt run(Class<?> mainClass, List<String> args) {
        if (System.getProperty(CHILD_PROPERTY) != null || !compilesAboveTierOne()) {
            return OptionalInt.empty();
        }
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        List<String> jvm = ManagementFactory.getRuntimeMXBean().getInputArguments();
        if (!Files.isExecutable(java) || !relaunchable(jvm)) {
            return OptionalInt.empty();
        }
        Process child;
        try {
            child = new ProcessBuilder(command(java.toString(), jvm, System.getProperty("java.class.path"),
                    mainClass.getName(), args)).inheritIO().start();
        } catch (IOException | RuntimeException e) {
            return OptionalInt.empty();
        }
        Thread stop = new Thread(child::destroy, "quick-compiler-child-stop");
        Runtime.getRuntime().addShutdownHook(stop);
        boolean interrupted = false;
        while (true) {
            try {
                int status = child.waitFor();
                boolean stopping = !removeHook(stop);
                if (interrupted) {
                    Thread.currentThread().interrupt();
                }
                return OptionalInt.of(status > SIGNALLED && !stopping ? signalled(child.pid(), status - SIGNALLED)
                        : status);
            } catch (InterruptedException e) {
                interrupted = true; // the child still runs: its status is this process's
            }
        }
    }

    /**
     * Removes {@code hook}; false when this process is already shutting down (then the hook has run or is running,
     * and the signal that ended the child came from it).
     */
    private static boolean removeHook(Thread hook) {
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
            return true;
        } catch (IllegalStateException e) {
            return false; // shutdown in progress: the hook is destroying the child, which has ended
        }
    }

    /**
     * The status of a child ended by {@code signal} from outside: {@link ExitStatus#FAILED}, after one line on
     * the standard error saying so (the child had no chance to say anything).
     */
    private static int signalled(long pid, int signal) {
        System.err.println("sweepline-bench: the command's second JVM (C1 alone, pid " + pid + ") was ended by signal "
                + signal + (signal == 9 ? " (SIGKILL: kill -9, or the kernel out of memory)" : "")
                + "; what it journalled is kept: the same command resumes it");
        System.err.flush();
        return ExitStatus.FAILED;
    }

    /**
     * The child's command: {@code java}, the JVM options {@code jvm} with {@link #FLAG} and {@link #CHILD_PROPERTY}
     * after them (a later -XX option wins), the class path, the main class, then {@code args} unchanged.
     */
    static List<String> command(String java, List<String> jvm, String classPath, String mainClass, List<String> args) {
        List<String> command = new ArrayList<>();
        command.add(java);
        command.addAll(jvm);
        command.add(FLAG);
        command.add("-D" + CHILD_PROPERTY + "=true");
        command.add("-cp");
        command.add(classPath);
        command.add(mainClass);
        command.addAll(args);
        return command;
    }

    /** True when none of {@code jvm}'s options is one a second process must not repeat. */
    static boolean relaunchable(List<String> jvm) {
        for (String option : jvm) {
            for (String shared : SHARED_OPTIONS) {
                if (option.startsWith(shared)) {
                    return false;
                }
            }
        }
        return true;
    }

    /** This HotSpot JVM compiles tiered up to C2 (its default, level 4); false when it cannot tell. */
    static boolean compilesAboveTierOne() {
        return "true".equals(vmOption("TieredCompilation")) && "4".equals(vmOption("TieredStopAtLevel"));
    }

    /** This HotSpot JVM compiles tiered and stops at tier 1, C1 without profiling; false when it cannot tell. */
    static boolean stopsAtTierOne() {
        return "true".equals(vmOption("TieredCompilation")) && "1".equals(vmOption("TieredStopAtLevel"));
    }

    /** The value of HotSpot's VM option {@code name}, or null when this JVM does not tell. */
    private static String vmOption(String name) {
        try {
            HotSpotDiagnosticMXBean hotSpot = ManagementFactory.getPlatformMXBean(HotSpotDiagnosticMXBean.class);
            return hotSpot == null ? null : hotSpot.getVMOption(name).getValue();
        } catch (LinkageError | RuntimeException e) {
            return null;
        }
    }
}
