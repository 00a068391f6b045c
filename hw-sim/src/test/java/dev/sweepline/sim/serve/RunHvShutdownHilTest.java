package dev.sweepline.sim.serve;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.sim.instrument.TestInstruments;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.sweepline.fsw.host.FswMain;
import dev.sweepline.fsw.host.HvShutdown;
import dev.sweepline.fsw.host.SerialTransport;
import dev.sweepline.fsw.link.HousekeepingReply;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.IOException;
import java.io.InputStream;
import java.net.InetSocketAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code sweepline-fsw.jar run}'s main class in a child JVM, over a socat pty pair at 115200 baud,
 * against the simulated electronics (an {@link InstrumentServer} in this JVM on the other end), HV
 * armed and fired; after each way out the simulated electronics' HV monitor must read below the
 * {@link HvShutdown#OFF_THRESHOLD_CODES} threshold (hardware ICD §4.1, §4.2): the planned end, a
 * SIGTERM (the real shutdown hook), an exception in the loop (the ground's telemetry socket reset)
 * and a link loss (socat killed: the electronics' watchdog). Each run first proves the HV was on:
 * test as you fly. Skips only when socat is not installed.
 */
@Timeout(value = 120, unit = TimeUnit.SECONDS)
class RunHvShutdownHilTest {
    /** The HV was on: a monitor reading ten times the off threshold (3000 codes = 300 V) during the run. */
    private static final int HV_ON_CODES = 10 * HvShutdown.OFF_THRESHOLD_CODES;

    @TempDir
    Path dir;
    private Process socat;
    private Path fswEnd;
    private SerialTransport hwEnd;
    private Recording electronics;
    private InstrumentServer server;
    private Thread serverThread;

    @BeforeEach
    void startLine() throws Exception {
        String socatPath = HilRig.socatPath();
        assumeTrue(socatPath != null, "socat is not installed: the serial HV shutdown test is skipped");
        Path cup = dir.resolve("cup");
        fswEnd = dir.resolve("fsw");
        socat = new ProcessBuilder(socatPath, "-d", "-d", "pty,raw,echo=0,link=" + cup, "pty,raw,echo=0,link=" + fswEnd)
                .redirectErrorStream(true).redirectOutput(dir.resolve("socat.log").toFile()).start();
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
        while (!(Files.exists(cup) && Files.exists(fswEnd))) {
            assertTrue(System.nanoTime() < deadline, "socat made no pty pair");
            Thread.sleep(20);
        }
        hwEnd = SerialTransport.open(cup.toString(), SerialTransport.DEFAULT_BAUD);
        electronics = new Recording(new ScenarioInstrument(ScenarioLoader.resolve("quiet-perihelion"), 7, TestInstruments.DEMO_CUP));
    }

    @AfterEach
    void stopLine() throws Exception {
        if (server != null) {
            server.stop();
            serverThread.join(5_000);
        }
        if (hwEnd != null) {
            hwEnd.close();
        }
        if (socat != null) {
            socat.destroy();
            socat.waitFor(5, TimeUnit.SECONDS);
        }
    }

    @Test
    void shouldSwitchTheHvOffAtThePlannedEnd() throws Exception {
        serve(1.0); // real time, as a bench electronics
        Run run = fsw("--tm", dir.resolve("run.tm").toString(), "--minutes", "0.03"); // 1.8 s of run time
        assertEquals(0, run.exit(), run.output());
        assertTrue(run.output().contains("HV off confirmed: monitor "), run.output());
        assertTrue(run.output().contains("(run ended: planned end reached)"), run.output());
        assertHvWasOnAndIsOff("planned end", run);
    }

    @Test
    void shouldSwitchTheHvOffOnSigterm() throws Exception {
        serve(1.0);
        Run run = fsw("--tm", dir.resolve("run.tm").toString()); // until interrupted
        awaitHvOn(run);
        run.process.destroy(); // SIGTERM: the JVM's shutdown hooks, the run's among them
        assertEquals(128 + 15, run.exit(), run.output()); // the JVM's status after SIGTERM
        assertTrue(run.output().contains("HV off confirmed: monitor "), run.output());
        assertTrue(run.output().contains("(run ended: stopped by a signal (shutdown hook))"), run.output());
        assertHvWasOnAndIsOff("SIGTERM", run);
    }

    @Test
    void shouldSwitchTheHvOffWhenTheLoopThrows() throws Exception {
        serve(0); // as fast as possible, with the link-event clock: telemetry comes quickly
        try (ServerSocket ground = new ServerSocket()) {
            ground.bind(new InetSocketAddress("127.0.0.1", 0));
            Thread resetter = new Thread(() -> resetAfterFrames(ground), "ground-reset");
            resetter.setDaemon(true);
            resetter.start();
            Run run = fsw("--tm", "tcp:127.0.0.1:" + ground.getLocalPort(), "--clock", "link");
            assertEquals(1, run.exit(), run.output());
            assertTrue(run.output().contains("run stopped: java.io.UncheckedIOException: writing telemetry"), run.output());
            assertTrue(run.output().contains("HV off confirmed: monitor "), run.output());
            assertHvWasOnAndIsOff("exception in the loop", run);
        }
    }

    @Test
    void shouldLeaveTheHvOffWhenTheLinkIsLost() throws Exception {
        serve(1.0);
        Run run = fsw("--tm", dir.resolve("run.tm").toString());
        awaitHvOn(run);
        socat.destroy(); // the line is cut: nothing more reaches either side
        socat.waitFor(5, TimeUnit.SECONDS);
        assertEquals(3, run.exit(), run.output()); // HV off NOT confirmed: the host cannot know
        assertTrue(run.output().contains("HV off NOT confirmed"), run.output());
        assertTrue(run.output().contains("(run ended: link lost"), run.output());
        long deadline = System.nanoTime() + 3 * InstrumentServer.WATCHDOG_NANOS;
        while (server.watchdogTrips() == 0 && System.nanoTime() - deadline < 0) {
            Thread.sleep(20);
        }
        assertEquals(1, server.watchdogTrips(), "the electronics' link watchdog (hardware ICD §4.1)");
        assertHvWasOnAndIsOff("link loss", run);
    }

    private void serve(double speed) {
        server = new InstrumentServer(electronics, hwEnd, speed);
        serverThread = new Thread(server::run, "instrument-server");
        serverThread.setDaemon(true);
        serverThread.start();
    }

    /** Stops the server and reads its HV monitor as its housekeeping reports it (hardware ICD §3.3). */
    private void assertHvWasOnAndIsOff(String way, Run run) throws InterruptedException {
        server.stop();
        serverThread.join(5_000);
        assertFalse(serverThread.isAlive());
        HousekeepingReply hk = new HousekeepingReply();
        electronics.housekeeping(hk);
        System.out.printf("%s: HV monitor highest %d codes during the run, %d codes after it; watchdog trips %d; "
                + "exit %d%n", way, electronics.highestMonitor, hk.hvMonitorHighCode, server.watchdogTrips(), run.exit());
        run.output().lines().filter(l -> l.contains("HV off") || l.startsWith("run stopped") || l.startsWith("--tm")
                || l.startsWith("electronics:")).forEach(l -> System.out.println("  " + l));
        assertTrue(electronics.highestMonitor > HV_ON_CODES, "the HV was on: " + electronics.highestMonitor);
        assertTrue(hk.hvMonitorHighCode < HvShutdown.OFF_THRESHOLD_CODES, way + ": monitor " + hk.hvMonitorHighCode);
        assertFalse(server.hvOn(), way);
    }

    /** Waits (bounded) until the simulated electronics have run steps with the HV on. */
    private void awaitHvOn(Run run) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
        while (electronics.highestMonitor <= HV_ON_CODES) {
            assertTrue(run.process.isAlive(), run::output);
            assertTrue(System.nanoTime() - deadline < 0, "no HV within 30 s");
            Thread.sleep(20);
        }
        Thread.sleep(200); // a few sweeps' worth of steps with the HV on
    }

    /** Accepts the ground connection, takes two frames' worth, then resets it (SO_LINGER 0). */
    private static void resetAfterFrames(ServerSocket ground) {
        try (Socket s = ground.accept()) {
            InputStream in = s.getInputStream();
            byte[] b = new byte[4096];
            int total = 0;
            while (total < 2 * 1028) { // two TM frames: ASM (4) + 1024 octets (telemetry ICD)
                int n = in.read(b);
                if (n < 0) {
                    return;
                }
                total += n;
            }
            s.setSoLinger(true, 0);
        } catch (IOException e) {
            // the run went first
        }
    }

    /** Starts {@code run} in a child JVM on the pty, HV armed and fired. */
    private Run fsw(String... args) throws IOException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), FswMain.class.getName(), "run", "--link", fswEnd.toString(),
                "--hv", "arm", "--hv-confirm", "FIRE"));
        cmd.addAll(List.of(args));
        Path log = Files.createTempFile(dir, "fsw", ".log");
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        return new Run(p, log);
    }

    /** A child run and its console output. */
    private record Run(Process process, Path log) {
        int exit() throws InterruptedException {
            if (!process.waitFor(30, TimeUnit.SECONDS)) {
                process.destroyForcibly();
                throw new AssertionError("run did not end: " + output());
            }
            return process.exitValue();
        }

        String output() {
            try {
                return Files.readString(log, StandardCharsets.UTF_8);
            } catch (IOException e) {
                return "(no output: " + e + ")";
            }
        }
    }

    /** Passes through to the simulated electronics and keeps the highest HV monitor of the run. */
    private static final class Recording implements StepExecutor {
        private final ScenarioInstrument inner;
        volatile int highestMonitor;

        @Override
        public InstrumentDescription instrument() {
            return inner.instrument();
        }

        Recording(ScenarioInstrument inner) {
            this.inner = inner;
        }

        @Override
        public long execute(StepCommand cmd, long startMicros, SampleReply reply) {
            long end = inner.execute(cmd, startMicros, reply);
            highestMonitor = Math.max(highestMonitor, reply.hvMonitorCode);
            return end;
        }

        @Override
        public void switchHvOff(long atMicros) {
            inner.switchHvOff(atMicros);
        }

        @Override
        public void housekeeping(HousekeepingReply hk) {
            inner.housekeeping(hk);
        }
    }
}
