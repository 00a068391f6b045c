package dev.sweepline.fsw.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.StringWriter;
import java.net.InetSocketAddress;
import java.nio.channels.ServerSocketChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.locks.LockSupport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code run} in process against {@link FakeElectronics} on loopback TCP: the link opens before the
 * prompt and a link that does not is one line; the run's time starts after the prompt; options that
 * do nothing say so; every run ends with a confirmed HV off (hardware ICD §4.2, §7).
 */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class FswRunCommandTest {
    @TempDir
    Path dir;
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();
    private long promptMicros;

    /** The command with a console that fails the test when read, unless replaced. */
    private FswRunCommand command() {
        FswRunCommand c = new FswRunCommand();
        c.console = timeoutMillis -> {
            throw new AssertionError("the prompt was not expected here");
        };
        c.promptClock = () -> promptMicros;
        c.out = new PrintStream(out, true, StandardCharsets.UTF_8);
        c.err = new PrintStream(err, true, StandardCharsets.UTF_8);
        return c;
    }

    private static int execute(FswRunCommand c, String... args) {
        return CommandLines.configure(new CommandLine(c), "run").execute(args);
    }

    private String out() {
        return out.toString(StandardCharsets.UTF_8);
    }

    private String err() {
        return err.toString(StandardCharsets.UTF_8);
    }

    private void assertOneLineNamingIt(String where) {
        assertEquals(1, err().lines().count(), err());
        assertTrue(err().startsWith(FswRunCommand.PREFIX) && err().contains(where), err());
        assertFalse(err().contains("Exception") || err().contains("\tat "), "no stack trace: " + err());
        assertFalse(out().contains("HV ARMED") || out().contains("HIGH VOLTAGE"), "no prompt before the link: " + out());
    }

    @Test
    void shouldStopWithTheFileLineAndFieldOfABrokenInstrumentDescription() throws IOException {
        Path cup = dir.resolve("my-cup.yaml");
        String demo = dev.sweepline.fsw.host.instrument.InstrumentFileReaderTest.demoText();
        java.nio.file.Files.writeString(cup, demo.replace("  count: 128", "  count: 257"));
        int exit = execute(command(), "--instrument", cup.toString(), "--link", "tcp:127.0.0.1:1",
                "--tm", dir.resolve("run.tm").toString(), "--hv", "arm");
        assertEquals(ExitStatus.INPUT, exit);
        // instruments/FORMAT.md: a broken file fails with its file, line and field; windows.count is 1..256
        assertOneLineNamingIt(cup + ":" + (demo.substring(0, demo.indexOf("  count: 128")).lines().count() + 1)
                + ": windows.count: ");
    }

    @Test
    void shouldListTheBuiltInInstruments() {
        FswInstrumentsCommand c = new FswInstrumentsCommand();
        c.out = new PrintStream(out, true, StandardCharsets.UTF_8);
        assertEquals(ExitStatus.OK, new CommandLine(c).execute());
        // instruments/index.txt: demo-cup (the default, id 1, 16-bit, 128 windows) and fine-cup (id 2, 20-bit, 256)
        assertTrue(out().lines().anyMatch(l -> l.startsWith("demo-cup") && l.contains("id 1 ") && l.contains("16-bit")
                && l.contains("128 windows") && l.contains("(default)")), out());
        assertTrue(out().lines().anyMatch(l -> l.startsWith("fine-cup") && l.contains("20-bit")
                && l.contains("256 windows")), out());
    }

    @Test
    void shouldStopWithOneLineAndNoPromptWhenTheSerialPortDoesNotOpen() {
        String tty = dir.resolve("no-such-tty").toString();
        int exit = execute(command(), "--link", tty, "--tm", dir.resolve("run.tm").toString(), "--hv", "arm");
        assertEquals(ExitStatus.IO, exit);
        assertOneLineNamingIt("--link " + tty + ": cannot open the link");
    }

    @Test
    void shouldStopWithOneLineAndNoPromptWhenNothingListensOnTheTcpPort() throws IOException {
        int port;
        try (ServerSocketChannel probe = TcpTransport.listen(LinkAddress.LOOPBACK, 0)) {
            port = ((InetSocketAddress) probe.getLocalAddress()).getPort();
        } // closed: nothing listens there now
        String link = "tcp:127.0.0.1:" + port;
        int exit = execute(command(), "--link", link, "--tm", dir.resolve("run.tm").toString(), "--hv", "arm");
        assertEquals(ExitStatus.IO, exit);
        assertOneLineNamingIt("--link " + link + ": cannot open the link");
    }

    @Test
    void shouldStopWithOneLineAndNoPromptWhenTheTelemetryOutputDoesNotOpen() throws Exception {
        try (Electronics e = new Electronics()) {
            String tm = dir.resolve("no-such-dir").resolve("run.tm").toString();
            int exit = execute(command(), "--link", e.address(), "--tm", tm, "--hv", "arm");
            assertEquals(ExitStatus.IO, exit);
            assertOneLineNamingIt("--tm " + tm + ": cannot open the telemetry output (no such file or directory)");
        }
    }

    @Test
    void shouldGiveTheFullMinutesOfStepsAfterALateFireOnTheLinkClock() throws Exception {
        long immediate;
        try (Electronics e = new Electronics()) {
            int exit = execute(command(), "--link", e.address(), "--tm", dir.resolve("a.tm").toString(),
                    "--minutes", "0.05", "--clock", "link", "--hv", "arm", "--hv-confirm", "FIRE");
            assertEquals(ExitStatus.OK, exit, out() + err());
            immediate = e.electronics().stepsWithHv;
        }
        try (Electronics e = new Electronics()) {
            FswRunCommand c = command();
            c.console = timeoutMillis -> {
                promptMicros += 25_000_000L; // FIRE typed 25 s after the arm: late, but within the 30 s
                return "FIRE";
            };
            int exit = execute(c, "--link", e.address(), "--tm", dir.resolve("b.tm").toString(),
                    "--minutes", "0.05", "--clock", "link", "--hv", "arm");
            assertEquals(ExitStatus.OK, exit, out() + err());
            // 3 s of run time after FIRE however long the prompt took: every step of the immediate run
            assertTrue(immediate > 100, "3 s of 9-12 ms steps; got " + immediate);
            assertEquals(immediate, e.electronics().stepsWithHv);
            assertEquals(1, e.electronics().hvOffSteps); // and the run's end commanded the HV off
        }
        assertTrue(out().contains("HV off confirmed: monitor 8 codes"), out());
    }

    @Test
    void shouldStartTheRunsRealTimeAfterThePrompt() throws Exception {
        try (Electronics e = new Electronics()) {
            FswRunCommand c = command();
            c.promptClock = new MonotonicClock()::nowMicros;
            c.console = timeoutMillis -> {
                LockSupport.parkNanos(TimeUnit.MILLISECONDS.toNanos(1_500)); // the operator reads the caution
                return "FIRE";
            };
            // --minutes 0.01 = 0.6 s: had the prompt's 1.5 s counted, the run would have had no time left
            int exit = execute(c, "--link", e.address(), "--tm", dir.resolve("rt.tm").toString(),
                    "--minutes", "0.01", "--hv", "arm");
            assertEquals(ExitStatus.OK, exit, out() + err());
            assertTrue(e.electronics().stepsWithHv > 0, out());
        }
    }

    @Test
    void shouldSayThatHvConfirmWithoutHvArmIsIgnored() throws Exception {
        try (Electronics e = new Electronics()) {
            int exit = execute(command(), "--link", e.address(), "--tm", dir.resolve("c.tm").toString(),
                    "--minutes", "0.01", "--clock", "link", "--hv-confirm", "FIRE");
            assertEquals(ExitStatus.OK, exit, out() + err());
            assertTrue(out().contains("--hv-confirm ignored: it confirms only an armed HV (--hv arm)"), out());
            assertTrue(out().contains("HV OFF"), out());
            assertTrue(e.electronics().steps > 0);
            assertEquals(0, e.electronics().stepsWithHv);
        }
    }

    @Test
    void shouldSayWhyTheHvWasNotFired() throws Exception {
        try (Electronics e = new Electronics()) {
            int exit = execute(command(), "--link", e.address(), "--tm", dir.resolve("d.tm").toString(),
                    "--minutes", "0.01", "--clock", "link", "--hv", "arm", "--hv-confirm", "fire");
            assertEquals(ExitStatus.OK, exit, out() + err());
            assertTrue(out().contains("HV not fired: wrong word 'fire' (expected FIRE); running with HV off"), out());
            assertEquals(0, e.electronics().stepsWithHv);
        }
    }

    @Test
    void shouldRefuseAnUnknownLinkSchemeInOneLine() {
        int exit = execute(command(), "--link", "udp:127.0.0.1:5000", "--tm", dir.resolve("run.tm").toString());
        assertEquals(ExitStatus.USAGE, exit);
        assertOneLineNamingIt("--link: unknown scheme 'udp:' in udp:127.0.0.1:5000");
    }

    @Test
    void shouldStopWithOneLineWhenNoGroundListensOnTheTelemetryPort() throws Exception {
        int port;
        try (ServerSocketChannel probe = TcpTransport.listen(LinkAddress.LOOPBACK, 0)) {
            port = ((InetSocketAddress) probe.getLocalAddress()).getPort();
        } // closed: nothing listens there now
        try (Electronics e = new Electronics()) {
            String tm = "tcp:127.0.0.1:" + port;
            int exit = execute(command(), "--link", e.address(), "--tm", tm);
            assertEquals(ExitStatus.IO, exit);
            assertOneLineNamingIt("--tm " + tm + ": cannot open the telemetry output");
        }
    }

    @Test
    void shouldRefuseToOverwriteTelemetryUnlessForced() throws Exception {
        Path tm = dir.resolve("earlier.tm");
        java.nio.file.Files.write(tm, new byte[] {1, 2, 3});
        try (Electronics e = new Electronics()) {
            int exit = execute(command(), "--link", e.address(), "--tm", tm.toString(), "--minutes", "0.01",
                    "--clock", "link");
            assertEquals(ExitStatus.IO, exit);
            assertOneLineNamingIt("--tm " + tm + ": exists; give --force to overwrite it");
        }
        assertEquals(3, java.nio.file.Files.size(tm)); // the earlier telemetry is untouched
        err.reset();
        try (Electronics e = new Electronics()) {
            int exit = execute(command(), "--link", e.address(), "--tm", tm.toString(), "--minutes", "0.01",
                    "--clock", "link", "--force");
            assertEquals(ExitStatus.OK, exit, out() + err());
        }
        assertTrue(java.nio.file.Files.size(tm) > 3);
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.CsvSource(delimiter = '|', value = {
        "--minutes|-1|must be above 0, got -1",
        "--minutes|0|must be above 0, got 0",
        "--hv-timeout-s|-5|must be 1 or more, got -5",
        "--baud|0|must be 1 to 2147483647, got 0",
        "--reply-wait-ms|0|must be 1 or more, got 0"})
    void shouldRefuseAnOutOfRangeValueInOneLineBeforeOpeningAnything(String option, String value, String why) {
        StringWriter text = new StringWriter();
        CommandLine cl = CommandLines.configure(new CommandLine(command()), "run");
        cl.setErr(new java.io.PrintWriter(text, true));
        int exit = cl.execute("--link", "tcp:127.0.0.1:1", "--tm", dir.resolve("run.tm").toString(), option, value);
        assertEquals(ExitStatus.USAGE, exit);
        assertEquals(1, text.toString().lines().count(), text.toString());
        assertTrue(text.toString().contains(option) && text.toString().contains(why), text.toString());
        assertFalse(java.nio.file.Files.exists(dir.resolve("run.tm")));
    }

    @Test
    void shouldRefuseAScriptWithAFaultInjectionBeforeOpeningTheLink() throws IOException {
        Path script = dir.resolve("faults.cmd");
        java.nio.file.Files.writeString(script, "1.0 NO_OP\n2.0 INJECT STUCK 2 100\n");
        int exit = execute(command(), "--link", "tcp:127.0.0.1:1", "--tm", dir.resolve("run.tm").toString(),
                "--commands", script.toString());
        assertEquals(ExitStatus.INPUT, exit);
        // commands.md §7: injections are the bench's; the flight software on a PC sends telecommands only
        assertOneLineNamingIt("--commands " + script + ":line 2: INJECT STUCK needs the bench's simulated instrument");
    }

    @Test
    void shouldNameAMissingScriptAndABadLineOfOne() throws IOException {
        Path missing = dir.resolve("missing.cmd");
        assertEquals(ExitStatus.INPUT, execute(command(), "--link", "tcp:127.0.0.1:1", "--tm",
                dir.resolve("run.tm").toString(), "--commands", missing.toString()));
        assertOneLineNamingIt("--commands " + missing + ": no such file or directory");
        err.reset();
        Path image = dir.resolve("bad.cmd");
        java.nio.file.Files.writeString(image, "1.0 TABLE_IMAGE nowhere.table\n");
        assertEquals(ExitStatus.INPUT, execute(command(), "--link", "tcp:127.0.0.1:1", "--tm",
                dir.resolve("run.tm").toString(), "--commands", image.toString()));
        // the image is looked for beside the script (commands.md §7)
        assertOneLineNamingIt("line 1: TABLE_IMAGE " + dir.resolve("nowhere.table") + ": no such file");
    }

    @Test
    void shouldRefuseATimeoutMarginBeyondTheLinkWatchdog() {
        // hardware ICD §4.1: the electronics switch the HV off after 2 s without a step
        assertEquals(ExitStatus.USAGE, execute(command(), "--link", "tcp:127.0.0.1:1", "--tm",
                dir.resolve("run.tm").toString(), "--timeout-margin", "2001"));
        assertOneLineNamingIt("--timeout-margin: must be at most 2000 ms");
    }

    @Test
    void shouldSendTheScriptsTelecommandsOnTheLink() throws Exception {
        Path script = dir.resolve("noop.cmd");
        java.nio.file.Files.writeString(script, "0.5 NO_OP\n1.0 NO_OP\n");
        try (Electronics e = new Electronics()) {
            int exit = execute(command(), "--link", e.address(), "--tm", dir.resolve("cmd.tm").toString(),
                    "--minutes", "0.05", "--clock", "link", "--commands", script.toString(), "--nvm",
                    dir.resolve("fsw.nvm").toString());
            assertEquals(ExitStatus.OK, exit, out() + err());
        }
        assertTrue(out().contains("commands: 2 sent, 0 refused"), out());
        // commands.md §7.3: the sender's counter is kept beside the NVM file for the next run
        assertTrue(java.nio.file.Files.exists(dir.resolve("fsw.nvm.ground")), out());
    }

    @Test
    void shouldListTheExitStatusesInItsHelp() {
        StringWriter text = new StringWriter();
        CommandLine cl = FswMain.commandLine();
        cl.setOut(new java.io.PrintWriter(text, true));
        assertEquals(ExitStatus.OK, cl.execute("run", "--help"));
        for (String line : new String[] {"Exit status:", "2   usage error", "3   HV off NOT confirmed",
            "4   input error", "5   I/O error", "6   did not fit / warnings"}) {
            assertTrue(text.toString().contains(line), line + " in " + text);
        }
    }

    /** {@link FakeElectronics} listening on loopback, served on a thread until the run hangs up. */
    private static final class Electronics implements AutoCloseable {
        private final ServerSocketChannel listener = TcpTransport.listen(LinkAddress.LOOPBACK, 0);
        private final Thread thread;
        private volatile FakeElectronics electronics;
        private volatile boolean stop;

        Electronics() throws IOException {
            thread = new Thread(this::serve, "fake-electronics");
            thread.setDaemon(true);
            thread.start();
        }

        private void serve() {
            try (TcpTransport t = TcpTransport.accept(listener)) {
                FakeElectronics e = new FakeElectronics(t);
                electronics = e;
                while (!stop && e.doWork()) {
                    LockSupport.parkNanos(20_000);
                }
            } catch (IOException e) {
                // closed before anyone connected
            }
        }

        String address() throws IOException {
            return "tcp:127.0.0.1:" + ((InetSocketAddress) listener.getLocalAddress()).getPort();
        }

        FakeElectronics electronics() throws InterruptedException {
            thread.join(5_000); // the run has hung up: the counters are final
            return electronics;
        }

        @Override
        public void close() throws Exception {
            stop = true;
            listener.close();
            thread.join(5_000);
        }
    }
}
