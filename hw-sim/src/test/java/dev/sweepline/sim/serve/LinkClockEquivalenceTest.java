package dev.sweepline.sim.serve;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.host.LinkClockLoop;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.PipeTransport;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The flight software framed over a byte pipe to the instrument server, on the link-event clock,
 * gives the in-process bench's telemetry byte for byte (serve design note S1; architecture.md,
 * determinism: "whichever link carried it"). One thread: the wait runs the server.
 */
class LinkClockEquivalenceTest {
    @Test
    void shouldGiveTheInProcessTelemetryOverAFramedPipe() {
        Scenario sc = ScenarioLoader.resolve("shock-sheath"); // has an event at 40 s (scenario file)
        long seed = 42; // recorded seed
        BenchConfig config = BenchConfig.defaults(sc, seed, 60);
        byte[] reference = HilRig.inProcessTelemetry(config);

        PipeTransport[] ends = PipeTransport.pair(4096);
        InstrumentServer server = new InstrumentServer(new ScenarioInstrument(sc, seed, TestInstruments.DEMO_CUP), ends[1], 0);
        FramedInstrumentLink link = new FramedInstrumentLink(ends[0], TestInstruments.DEMO_CUP.flight());
        ByteArrayOutputStream tm = new ByteArrayOutputStream();
        FlightSoftware fsw = HilRig.flightSoftware(config, link, tm);
        LinkClockLoop loop = new LinkClockLoop(fsw, link, l -> {
            for (int i = 0; i < 8; i++) {
                server.doWork(0);
                if (l.pump()) {
                    return true;
                }
            }
            return false;
        });
        loop.run(config.durationMicros());
        fsw.close(config.durationMicros());

        List<String> spectra = HilRig.spectra(tm.toByteArray());
        assertTrue(spectra.size() > 50, "a minute of sweeping gives many spectra; got " + spectra.size());
        assertEquals(HilRig.spectra(reference), spectra);
        assertArrayEquals(reference, tm.toByteArray()); // every frame, housekeeping and events included
        assertEquals(0, link.counters().framesBad()); // a clean pipe damages nothing
        assertEquals(0, loop.waitsGivenUp());
        assertEquals(fsw.executive().stepsSent(), server.stepsExecuted());
    }
}
