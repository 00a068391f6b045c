package dev.sweepline.sim.cli;

import com.sun.management.HotSpotDiagnosticMXBean;
import java.lang.management.ManagementFactory;
import java.util.List;

/**
 * A JVM for {@link JitPolicyTest}: applies the mode of its argument ({@code c1} or {@code tiered}), prints on stderr (apart from HotSpot's compilation lines on stdout)
 * whether it is in force, then calls {@link #work} often enough for any compiler tier to take it; with
 * {@code default}, prints the mode the command line's own process chooses for a campaign's size; with
 * {@code relaunch child STATUS ...}, runs itself again through {@link QuickCompilerProcess} as {@code child},
 * which prints its compiler tier limit and arguments and exits with STATUS; with {@code relaunch killed}, a
 * child that ends itself with SIGKILL.
 */
final class JitPolicyProbe {
    /** Calls of {@link #work}: far above HotSpot's C2 threshold (Tier4InvocationThreshold 5000, [memory]). */
    static final int CALLS = 300_000;

    private JitPolicyProbe() {
    }

    /** A small hot method with a loop. */
    static double work(double x) {
        double s = 0;
        for (int i = 0; i < 50; i++) {
            s += Math.sqrt(x + i);
        }
        return s;
    }

    public static void main(String[] args) throws InterruptedException {
        if ("default".equals(args[0])) {
            JitPolicy.ownProcess(); // as BenchMain.main does
            long[][] cases = {{JitPolicy.C1_MAX_RUNS, 2}, {JitPolicy.C1_MAX_RUNS + 1, 2}, {JitPolicy.C1_MAX_RUNS, 1}};
            for (long[] c : cases) {
                System.err.println("default " + c[0] + " runs " + c[1] + " of 2 cores "
                        + JitPolicy.effective(null, c[0], (int) c[1], 2));
            }
            return;
        }
        if ("relaunch".equals(args[0])) {
            // QuickCompilerProcess's child: this class again, with the arguments after "relaunch"
            List<String> rest = List.of(args).subList(1, args.length);
            System.err.println("relaunched status " + QuickCompilerProcess.run(JitPolicyProbe.class, rest));
            return;
        }
        if ("killed".equals(args[0])) {
            // QuickCompilerProcess's child ended by SIGKILL (as kill -9 or the kernel's out-of-memory killer end it)
            try {
                new ProcessBuilder("kill", "-KILL", Long.toString(ProcessHandle.current().pid())).start().waitFor();
            } catch (java.io.IOException e) {
                throw new IllegalStateException(e);
            }
            Thread.sleep(60_000); // the signal ends the JVM before this does
            return;
        }
        if ("child".equals(args[0])) {
            HotSpotDiagnosticMXBean hotSpot = ManagementFactory.getPlatformMXBean(HotSpotDiagnosticMXBean.class);
            System.err.println("child TieredStopAtLevel " + hotSpot.getVMOption("TieredStopAtLevel").getValue()
                    + " args " + List.of(args) + " again " + QuickCompilerProcess.run(JitPolicyProbe.class, List.of("child"))
                    + " c1 in force " + JitPolicy.apply(JitPolicy.Mode.C1) + " " + QuickCompilerProcess.stopsAtTierOne());
            System.exit(Integer.parseInt(args[1]));
        }
        JitPolicy.Mode mode = "c1".equals(args[0]) ? JitPolicy.Mode.C1 : JitPolicy.Mode.TIERED;
        System.err.println("applied " + JitPolicy.apply(mode));
        double sum = 0;
        for (int i = 0; i < CALLS; i++) {
            sum += work(i);
        }
        System.err.println("sum " + sum);
        Thread.sleep(300); // lets a queued compilation finish and print before the JVM exits
    }
}
