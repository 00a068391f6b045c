package dev.sweepline.fsw.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
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
        return new CommandLine(c).execute(args);
    }

    private String out() {
        return out.toString(StandardCharsets.UTF_8);
    }

    private String err() {
        return err.toString(StandardCharsets.UTF_8);
    }

    private void assertOneLineNamingIt(String where) {
        assertEquals(1, err().lines().count(), err());
        assertTrue(err().contains(where), err());
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
        assertEquals(FswRunCommand.EXIT_BAD_INPUT, exit);
        // instruments/FORMAT.md: a broken file fails with its file, line and field; windows.count is 1..256
        assertOneLineNamingIt(cup + ":" + (demo.substring(0, demo.indexOf("  count: 128")).lines().count() + 1)
                + ": windows.count: ");
    }

    @Test
    void shouldListTheBuiltInInstruments() {
        FswInstrumentsCommand c = new FswInstrumentsCommand();
        c.out = new PrintStream(out, true, StandardCharsets.UTF_8);
        assertEquals(FswRunCommand.EXIT_OK, new CommandLine(c).execute());
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
        assertEquals(FswRunCommand.EXIT_BAD_INPUT, exit);
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
        assertEquals(FswRunCommand.EXIT_BAD_INPUT, exit);
        assertOneLineNamingIt("--link " + link + ": cannot open the link");
    }

    @Test
    void shouldStopWithOneLineAndNoPromptWhenTheTelemetryOutputDoesNotOpen() throws Exception {
        try (Electronics e = new Electronics()) {
            String tm = dir.resolve("no-such-dir").resolve("run.tm").toString();
            int exit = execute(command(), "--link", e.address(), "--tm", tm, "--hv", "arm");
            assertEquals(FswRunCommand.EXIT_BAD_INPUT, exit);
            assertOneLineNamingIt("--tm " + tm + ": cannot open the telemetry output (no such file or directory)");
        }
    }

    @Test
    void shouldGiveTheFullMinutesOfStepsAfterALateFireOnTheLinkClock() throws Exception {
        long immediate;
        try (Electronics e = new Electronics()) {
            int exit = execute(command(), "--link", e.address(), "--tm", dir.resolve("a.tm").toString(),
                    "--minutes", "0.05", "--clock", "link", "--hv", "arm", "--hv-confirm", "FIRE");
            assertEquals(FswRunCommand.EXIT_OK, exit, out() + err());
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
            assertEquals(FswRunCommand.EXIT_OK, exit, out() + err());
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
            assertEquals(FswRunCommand.EXIT_OK, exit, out() + err());
            assertTrue(e.electronics().stepsWithHv > 0, out());
        }
    }

    @Test
    void shouldSayThatHvConfirmWithoutHvArmIsIgnored() throws Exception {
        try (Electronics e = new Electronics()) {
            int exit = execute(command(), "--link", e.address(), "--tm", dir.resolve("c.tm").toString(),
                    "--minutes", "0.01", "--clock", "link", "--hv-confirm", "FIRE");
            assertEquals(FswRunCommand.EXIT_OK, exit, out() + err());
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
            assertEquals(FswRunCommand.EXIT_OK, exit, out() + err());
            assertTrue(out().contains("HV not fired: wrong word 'fire' (expected FIRE); running with HV off"), out());
            assertEquals(0, e.electronics().stepsWithHv);
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
