package dev.sweepline.sim.serve;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.exec.Executive;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.LinkCounters;
import dev.sweepline.fsw.link.PipeTransport;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import org.junit.jupiter.api.Test;

/**
 * Link faults (serve design note S3): bit-error rate 1e-4 plus lost and duplicated octets and stalls,
 * both directions, over the in-process pipe on one thread (deterministic for the recorded seeds).
 * Every damaged frame is discarded, every accepted sample is the one the instrument sent for its
 * sequence number, the run completes (the test plays the ground and commands survey after each link
 * time-out SAFE), and every counter is accounted for exactly by the injector's ledger.
 */
class LinkFaultTest {
    /**
     * Injected bit-error rate, 1e-4: far worse than a working serial line, so that damage is frequent
     * (common practice for a stress test).
     */
    private static final double BER = 1e-4;
    /** Lost and duplicated octets, per octet: 3e-4 each, so that 10,000 faults come in a few seconds. */
    private static final double DROP = 3e-4;
    private static final double DUP = 3e-4;
    /** Stalls per octet, each 30 ms: longer than the 20 ms reply margin, so they cause time-outs. */
    private static final double STALL = 3e-6;
    private static final long STALL_MICROS = 30_000;
    /** Virtual wall time per server cycle while the flight software waits, microseconds. */
    private static final long WALL_STEP_MICROS = 50;
    /** Server cycles per wait before the wait gives up (5 ms of virtual wall time). */
    private static final int CYCLES_PER_WAIT = 100;

    private long wallMicros;

    @Test
    void shouldDetectEveryDamagedFrameAndAccountForEveryFault() {
        Scenario sc = ScenarioLoader.resolve("quiet-perihelion");
        long seed = 3; // recorded seed of the run
        BenchConfig config = BenchConfig.defaults(sc, seed, 2400); // 40 simulated minutes, ~230 k steps
        PipeTransport[] ends = PipeTransport.pair(4096);
        FaultPlan plan = new FaultPlan(BER, DROP, DUP, STALL, STALL_MICROS, 20_261_201L); // recorded fault seed
        FaultyTransport faulty = new FaultyTransport(ends[1], plan, () -> wallMicros);
        RecordingExecutor instrument = new RecordingExecutor(new ScenarioInstrument(sc, seed, TestInstruments.DEMO_CUP));
        InstrumentServer server = new InstrumentServer(instrument, faulty, 0);
        FramedInstrumentLink link = new FramedInstrumentLink(ends[0], TestInstruments.DEMO_CUP.flight());
        CheckingLink checking = new CheckingLink(link, instrument);
        // the link layer alone: the fault-protection monitor of link time-outs (which retries on its own)
        // is switched off, so every safe entry waits for the ground's command below (commands.md §6)
        dev.sweepline.fsw.exec.FlightConfig flight = HilRig.flightConfig(config);
        flight.faults.threshold[dev.sweepline.fsw.fault.FaultMonitorId.LINK_TIMEOUT] = 0;
        ByteArrayOutputStream tm = new ByteArrayOutputStream();
        FlightSoftware fsw = new FlightSoftware(flight, checking, tm::write,
                dev.sweepline.fsw.sweep.SweepListener.NONE);
        Executive exec = fsw.executive();

        long now = 0;
        long safeRecoveries = 0;
        long end = config.durationMicros();
        while (now < end) {
            fsw.doWork(now);
            if (fsw.scheduler().mode() == SweepMode.SAFE) {
                fsw.scheduler().requestMode(SweepMode.SURVEY, now); // the ground's command after a link time-out
                safeRecoveries++;
            }
            if (exec.outstanding()) {
                now = awaitReply(server, link) ? Math.max(now, link.expectedReplyMicros())
                        : Math.max(now, exec.nextWakeMicros());
            } else {
                now += 10_000;
            }
        }
        long acceptedOrStale = exec.repliesAccepted() + exec.sequenceErrors();
        drain(server, link, faulty, checking);

        FaultLedger in = faulty.inbound();
        FaultLedger out = faulty.outbound();
        LinkCounters hw = server.counters();
        LinkCounters fs = link.counters();
        System.out.printf("faults: inbound %d (flips %d, drops %d, dups %d, stalls %d), outbound %d (flips %d, drops %d,"
                + " dups %d, stalls %d)%n", in.faults(), in.bitFlips, in.drops, in.duplicates, in.stalls, out.faults(),
                out.bitFlips, out.drops, out.duplicates, out.stalls);
        System.out.printf("frames: steps %d (damaged %d), replies %d (damaged %d); server bad %d (CRC %d, COBS %d, "
                + "length %d, type %d, wrong length %d, empty %d); fsw bad %d (CRC %d, COBS %d, length %d, type %d, "
                + "wrong length %d, empty %d)%n", in.frames, in.damagedFrames, out.frames, out.damagedFrames,
                hw.framesBad(), hw.badCrc, hw.badCobs, hw.badLength, hw.unknownType, hw.wrongLength, hw.emptyChunks,
                fs.framesBad(), fs.badCrc, fs.badCobs, fs.badLength, fs.unknownType, fs.wrongLength, fs.emptyChunks);
        System.out.printf("executive: sent %d, accepted %d, sequence errors %d, time-outs %d, retries %d, safe %d%n",
                exec.stepsSent(), exec.repliesAccepted(), exec.sequenceErrors(), exec.timeouts(), exec.retries(),
                exec.safeEntries());

        assertTrue(in.faults() + out.faults() >= 10_000,
                "at least 10,000 injected faults: every kind of damage many times over (serve design note S3)");
        // the flight software reports its link's bad frames in housekeeping (telemetry ICD §5, offset 38)
        fsw.close(end);
        long[] reported = {-1};
        dev.sweepline.ground.decode.TelemetryDecoder d = new dev.sweepline.ground.decode.TelemetryDecoder(
                dev.sweepline.ground.decode.DecoderConfig.icdDefaults(),
                new dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder(),
                new dev.sweepline.ground.decode.DecodeListener() {
                    @Override
                    public void onHousekeeping(dev.sweepline.ground.decode.HousekeepingReport r) {
                        reported[0] = r.linkFramesBad();
                    }
                });
        byte[] frames = tm.toByteArray();
        d.accept(frames, 0, frames.length);
        d.finish();
        assertEquals(Math.min(0xFFFF, fs.framesBad()), reported[0]);
        // no wrong sample: every reply the link delivered is exactly what the instrument sent for its number
        assertEquals(0, checking.mismatches);
        // inbound: every step frame the flight software wrote is intact or damaged; the server saw
        // exactly the chunks the ledger predicts and accepted exactly the intact frames
        assertEquals(fs.framesSent, in.frames);
        assertEquals(exec.stepsSent(), fs.framesSent);
        assertEquals(in.expectedChunks(), hw.chunks());
        assertEquals(in.intactFrames, hw.framesGood);
        assertEquals(hw.framesGood, server.stepsExecuted() + server.repeatsAnswered());
        // outbound: one reply per good step frame; the flight software accepted exactly the intact ones
        assertEquals(hw.framesGood, out.frames);
        assertEquals(hw.framesSent, out.frames);
        assertEquals(out.expectedChunks(), fs.chunks());
        assertEquals(out.intactFrames, fs.framesGood);
        assertEquals(fs.framesGood, link.repliesDelivered());
        // every transmission is answered, or lost in exactly one damaged frame
        assertEquals(exec.stepsSent(), link.repliesDelivered() + in.damagedFrames + out.damagedFrames);
        // the executive saw every delivered reply as accepted or stale (the drain's are the test's)
        assertEquals(link.repliesDelivered(), acceptedOrStale + checking.drained);
        assertEquals(exec.timeouts(), exec.retries() + exec.safeEntries());
        assertEquals(safeRecoveries, exec.safeEntries());
        assertTrue(exec.retries() > 0 && fs.framesBad() > 0 && hw.framesBad() > 0, "the faults must bite");
        assertTrue(fsw.scheduler().sweepCount() > 100, "the run completes its sweeps");
    }

    private boolean awaitReply(InstrumentServer server, FramedInstrumentLink link) {
        for (int i = 0; i < CYCLES_PER_WAIT; i++) {
            wallMicros += WALL_STEP_MICROS;
            server.doWork(wallMicros * 1_000);
            if (link.pump()) {
                return true;
            }
        }
        return false;
    }

    private void drain(InstrumentServer server, FramedInstrumentLink link, FaultyTransport faulty, CheckingLink checking) {
        SampleReply scratch = new SampleReply();
        for (int i = 0; i < 100_000; i++) {
            wallMicros += WALL_STEP_MICROS;
            server.doWork(wallMicros * 1_000);
            while (checking.poll(scratch, 0)) {
                checking.drained++;
            }
            if (faulty.drained() && i > 2 * STALL_MICROS / WALL_STEP_MICROS) {
                return;
            }
        }
    }

    /** Keeps, per sequence number, the last reply the instrument sent. */
    private static final class RecordingExecutor implements StepExecutor {
        private final StepExecutor inner;
        private final SampleReply[] sent = new SampleReply[65_536];

        @Override
        public InstrumentDescription instrument() {
            return inner.instrument();
        }

        RecordingExecutor(StepExecutor inner) {
            this.inner = inner;
        }

        @Override
        public long execute(StepCommand cmd, long startMicros, SampleReply reply) {
            long end = inner.execute(cmd, startMicros, reply);
            SampleReply copy = sent[cmd.sequence] == null ? new SampleReply() : sent[cmd.sequence];
            copy.copyFrom(reply);
            sent[cmd.sequence] = copy;
            return end;
        }
    }

    /** Compares every delivered reply, field by field, with what the instrument sent for its sequence number. */
    private static final class CheckingLink implements InstrumentLink, dev.sweepline.fsw.link.LinkHealth {
        private final InstrumentLink link;
        private final RecordingExecutor instrument;
        long mismatches;
        long drained;

        CheckingLink(InstrumentLink link, RecordingExecutor instrument) {
            this.link = link;
            this.instrument = instrument;
        }

        @Override
        public long framesBad() {
            return ((dev.sweepline.fsw.link.LinkHealth) link).framesBad();
        }

        @Override
        public boolean send(StepCommand step, long nowMicros) {
            return link.send(step, nowMicros);
        }

        @Override
        public boolean poll(SampleReply into, long nowMicros) {
            if (!link.poll(into, nowMicros)) {
                return false;
            }
            SampleReply s = instrument.sent[into.sequence];
            boolean same = s != null && s.status == into.status && s.gainRange == into.gainRange
                    && s.hvMonitorCode == into.hvMonitorCode && java.util.Arrays.equals(s.quadrant, into.quadrant);
            if (!same) {
                mismatches++;
            }
            return true;
        }
    }
}
