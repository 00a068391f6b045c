package dev.sweepline.sim.serve;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.host.LinkClockLoop;
import dev.sweepline.fsw.host.SerialTransport;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.HdrHistogram.Histogram;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * A real serial link: socat makes a pty pair, the instrument server runs on one end and the flight
 * software on the other, both through jSerialComm at 115200 baud 8N1, in this JVM on two threads.
 * The server answers as fast as possible and the flight software runs on the link-event clock, so the
 * run is not held to real time and its telemetry must equal the in-process run's (same seed) byte for
 * byte. A pty does not throttle to the baud rate: the latency measured is the software's and the
 * kernel's, not the line's (19-octet frames add 1.65 ms each way on a real 115200 line, hardware ICD §6).
 * Skips only when socat is not installed.
 */
class SerialHilTest {
    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void shouldMatchTheInProcessRunOverAPtyPairAt115200Baud() throws Exception {
        assumeTrue(HilRig.socatPath() != null, "socat is not installed: the serial hardware-in-the-loop test is skipped");
        Path dir = Files.createTempDirectory("sweepline-pty");
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        Process socat = new ProcessBuilder(HilRig.socatPath(), "-d", "-d",
                "pty,raw,echo=0,link=" + a, "pty,raw,echo=0,link=" + b).redirectErrorStream(true)
                .redirectOutput(dir.resolve("socat.log").toFile()).start();
        try {
            waitFor(a, b);
            Scenario sc = ScenarioLoader.resolve("quiet-perihelion");
            long seed = 11; // recorded seed
            // 20 s simulated, in real time over the pty: ~2100 steps (hardware ICD §6: ~106 steps/s), surveys
            // and focus sweeps, short enough for a unit test (common practice)
            BenchConfig config = BenchConfig.defaults(sc, seed, 20);
            byte[] reference = HilRig.inProcessTelemetry(config);

            InstrumentServer server;
            Thread serverThread;
            try (SerialTransport hwEnd = SerialTransport.open(b.toString(), 115_200);
                    SerialTransport fswEnd = SerialTransport.open(a.toString(), 115_200)) {
                server = new InstrumentServer(new ScenarioInstrument(sc, seed, TestInstruments.DEMO_CUP), hwEnd, 0);
                serverThread = new Thread(server::run, "instrument-server");
                serverThread.setDaemon(true);
                serverThread.start();

                FramedInstrumentLink link = new FramedInstrumentLink(fswEnd, TestInstruments.DEMO_CUP.flight());
                Histogram roundTripNanos = new Histogram(1_000_000_000L, 3);
                ByteArrayOutputStream tm = new ByteArrayOutputStream();
                FlightSoftware fsw = HilRig.flightSoftware(config, new TimedLink(link, roundTripNanos), tm);
                LinkClockLoop loop = new LinkClockLoop(fsw, link, LinkClockLoop.wallClockWait(2_000));
                long wallStart = System.nanoTime();
                loop.run(config.durationMicros());
                fsw.close(config.durationMicros());
                double wallSeconds = (System.nanoTime() - wallStart) / 1e9;
                server.stop();
                serverThread.join(2_000);

                System.out.printf("pty HIL: %d steps in %.2f s wall; round trip p50 %.3f ms, p99 %.3f ms, max %.3f ms%n",
                        fsw.executive().stepsSent(), wallSeconds,
                        roundTripNanos.getValueAtPercentile(50) / 1e6, roundTripNanos.getValueAtPercentile(99) / 1e6,
                        roundTripNanos.getMaxValue() / 1e6);
                List<String> spectra = HilRig.spectra(tm.toByteArray());
                assertTrue(spectra.size() > 10, "20 s of sweeping gives spectra; got " + spectra.size());
                assertEquals(HilRig.spectra(reference), spectra); // window indices, gain tags, samples
                assertArrayEquals(reference, tm.toByteArray());
                assertEquals(0, loop.waitsGivenUp());
                assertEquals(0, link.counters().framesBad() + server.counters().framesBad());
                // every step answered, but the one sent at the last instant (the loop ends before its reply is due)
                long inFlight = fsw.executive().outstanding() ? 1 : 0;
                assertEquals(fsw.executive().stepsSent(), roundTripNanos.getTotalCount() + inFlight);
            }
        } finally {
            socat.destroy();
            socat.waitFor(5, TimeUnit.SECONDS);
        }
    }

    private static void waitFor(Path a, Path b) throws InterruptedException {
        long deadline = System.nanoTime() + 10_000_000_000L;
        while (!(Files.exists(a) && Files.exists(b))) {
            assertTrue(System.nanoTime() < deadline, "socat made no pty pair");
            Thread.sleep(20);
        }
    }

    /** Times each step from its send to the poll that returns its reply. */
    private static final class TimedLink implements InstrumentLink {
        private final InstrumentLink link;
        private final Histogram histogram;
        private long sentNanos;

        TimedLink(InstrumentLink link, Histogram histogram) {
            this.link = link;
            this.histogram = histogram;
        }

        @Override
        public boolean send(StepCommand step, long nowMicros) {
            boolean sent = link.send(step, nowMicros);
            if (sent) {
                sentNanos = System.nanoTime();
            }
            return sent;
        }

        @Override
        public boolean poll(SampleReply into, long nowMicros) {
            boolean got = link.poll(into, nowMicros);
            if (got) {
                histogram.recordValue(System.nanoTime() - sentNanos);
            }
            return got;
        }
    }
}
