package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The campaign's compiler policy, in a JVM of its own (the policy is the whole process's): with c1 no
 * method is compiled by C2, with tiered the same hot method is. The tiers are read from HotSpot's
 * {@code -XX:+PrintCompilation} lines ("time id flags level class::method (size)"; levels 1-3 C1, 4 C2).
 */
class JitPolicyTest {
    private static final Pattern WORK = Pattern.compile(
            "^\\s*\\d+\\s+\\d+\\s+[%sbn! ]*\\s([0-4])\\s+" + Pattern.quote(JitPolicyProbe.class.getName()) + "::work\\b",
            Pattern.MULTILINE);

    @Test
    void shouldKeepTheHotMethodOffC2WithC1AndLetTieredCompileIt() throws IOException, InterruptedException {
        String c1 = probe("c1");
        assertTrue(c1.contains("applied true"), c1);
        Set<String> c1Levels = levels(c1);
        assertTrue(!c1Levels.contains("4") && c1Levels.contains("1"), "c1 tiers " + c1Levels + "\n" + c1);

        String tiered = probe("tiered");
        assertTrue(tiered.contains("applied true"), tiered);
        assertTrue(levels(tiered).contains("4"), "tiered tiers " + levels(tiered) + "\n" + tiered);
        // the same arithmetic in either tier (JLS §15.4): the same sum, printed by Double.toString
        assertEquals(line(tiered, "sum "), line(c1, "sum "));
    }

    @Test
    void shouldRunTheCommandLineAgainAtTierOneAndExitWithItsStatus() throws IOException, InterruptedException {
        // the probe relaunched through QuickCompilerProcess: the child at C1 alone (HotSpot's TieredStopAtLevel 1),
        // the arguments unchanged (a space kept inside one), no relaunch of the child itself, C1 in force there as
        // the JVM's own (no directive needed), its exit status returned
        String out = probe("relaunch", "child", "7", "a b");
        assertTrue(out.contains("child TieredStopAtLevel 1 args [child, 7, a b] again OptionalInt.empty c1 in force true true"),
                out);
        assertTrue(out.contains("relaunched status OptionalInt[7]"), out);
    }

    @Test
    void shouldFailInOneLineWhenTheChildIsKilled() throws IOException, InterruptedException {
        // a child ended by a signal: Process.exitValue is 128 + the signal (9, SIGKILL: 137) on Linux [memory],
        // no status of the bench's list; the parent says so and ends with 1, "failed" (ExitStatus.FAILED)
        String out = probe("relaunch", "killed");
        assertTrue(out.contains("relaunched status OptionalInt[1]"), out);
        assertTrue(out.contains("sweepline-bench: the command's second JVM (C1 alone, pid "), out);
        assertTrue(out.contains(") was ended by signal 9 (SIGKILL: kill -9, or the kernel out of memory); what it "
                + "journalled is kept: the same command resumes it"), out);
    }

    @Test
    void shouldRelaunchOnlyWithoutAgentsDebuggersOrFlightRecordings() {
        // two processes cannot share an agent's port or a recording's file: such a JVM keeps the directive
        assertTrue(QuickCompilerProcess.relaunchable(List.of("-Xmx2g", "-Dx=1", "-XX:+UseSerialGC")));
        assertFalse(QuickCompilerProcess.relaunchable(List.of("-agentlib:jdwp=transport=dt_socket,server=y")));
        assertFalse(QuickCompilerProcess.relaunchable(List.of("-XX:StartFlightRecording=filename=x.jfr")));
        assertFalse(QuickCompilerProcess.relaunchable(List.of("-javaagent:a.jar")));
        // the child's command: the JVM's options, then the flag (a later -XX option wins) and the marker property
        assertEquals(List.of("java", "-Xmx2g", QuickCompilerProcess.FLAG, "-D" + QuickCompilerProcess.CHILD_PROPERTY
                + "=true", "-cp", "b.jar", "M", "tune", "c.yaml"),
                QuickCompilerProcess.command("java", List.of("-Xmx2g"), "b.jar", "M", List.of("tune", "c.yaml")));
    }

    @Test
    void shouldChooseC1ForASmallCampaignOfTheCommandLinesOwnProcess() throws IOException, InterruptedException {
        // the probe's "default" argument: BenchMain.main's ownership, then the default mode for 600 and 601 runs
        // on 2 workers of 2 cores, and for 600 runs on 1 worker of 2 cores (C2 would have the idle core)
        String out = probe("default");
        assertTrue(out.contains("default " + JitPolicy.C1_MAX_RUNS + " runs 2 of 2 cores C1"), out);
        assertTrue(out.contains("default " + (JitPolicy.C1_MAX_RUNS + 1) + " runs 2 of 2 cores TIERED"), out);
        assertTrue(out.contains("default " + JitPolicy.C1_MAX_RUNS + " runs 1 of 2 cores TIERED"), out);
    }

    @Test
    void shouldChooseC1OnlyForTheCommandLinesOwnProcess() {
        // this test JVM is not the command line's (BenchMain.main never ran here): the JVM's default
        assertEquals(JitPolicy.Mode.TIERED, JitPolicy.effective(null, 108, 2, 2));
        // a mode given is the mode applied, whatever the campaign's size and threads
        assertEquals(JitPolicy.Mode.C1, JitPolicy.effective(JitPolicy.Mode.C1, 1_000_000, 1, 2));
        assertEquals(JitPolicy.Mode.TIERED, JitPolicy.effective(JitPolicy.Mode.TIERED, 108, 2, 2));
    }

    private static String probe(String... mode) throws IOException, InterruptedException {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        // the probe reports on stderr, into a file of its own: HotSpot's compiler threads print their
        // PrintCompilation lines on stdout whenever they finish, which can split a line of the probe's
        Path report = Files.createTempFile("jit-probe-", ".txt");
        try {
            List<String> command = new ArrayList<>(List.of(java.toString(), "-XX:+PrintCompilation", "-cp",
                    System.getProperty("java.class.path"), JitPolicyProbe.class.getName()));
            command.addAll(List.of(mode));
            Process p = new ProcessBuilder(command)
                    .redirectError(report.toFile()).start();
            String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            assertTrue(p.waitFor(60, TimeUnit.SECONDS), "probe " + List.of(mode) + " did not end");
            String all = out + "\n" + Files.readString(report, StandardCharsets.UTF_8);
            assertEquals(0, p.exitValue(), all);
            return all;
        } finally {
            Files.deleteIfExists(report);
        }
    }

    private static Set<String> levels(String out) {
        Set<String> levels = new TreeSet<>();
        Matcher m = WORK.matcher(out);
        while (m.find()) {
            levels.add(m.group(1));
        }
        return levels;
    }

    private static String line(String out, String prefix) {
        return out.lines().filter(l -> l.startsWith(prefix)).findFirst().orElse("no line " + prefix);
    }
}
