package dev.sweepline.sim.serve;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.host.instrument.Instruments;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.link.ByteTransport;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.HousekeepingCodec;
import dev.sweepline.fsw.link.PipeTransport;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import org.junit.jupiter.api.Test;

/** The server's rules (serve design note S2, S5, S6; hardware ICD §4, §4.1, §5). */
class InstrumentServerTest {
    /** The demo cup's flight description (instruments/demo-cup.yaml), the instrument this part models. */
    private static final InstrumentDescription DEMO = Instruments.defaultSpec().flight();
    /** Counts executions; the reply carries the execution number in Q1 and the start time in Q2. */
    private static final class CountingExecutor implements StepExecutor {
        @Override
        public InstrumentDescription instrument() {
            return DEMO;
        }

        int executions;
        boolean lastHvEnabled;
        int hvSwitchedOff;
        long hvSwitchedOffAtMicros = -1;

        @Override
        public void switchHvOff(long atMicros) {
            hvSwitchedOff++;
            hvSwitchedOffAtMicros = atMicros;
        }

        @Override
        public long execute(StepCommand cmd, long startMicros, SampleReply reply) {
            executions++;
            lastHvEnabled = cmd.hvEnabled;
            reply.sequence = cmd.sequence;
            reply.quadrant[0] = executions;
            reply.quadrant[1] = (int) (startMicros / 1000);
            reply.status = cmd.hvEnabled ? 0 : SampleReply.STATUS_HV_OFF;
            return startMicros + cmd.durationMicros(DEMO.modulationPeriodMicros());
        }
    }

    private final PipeTransport[] ends = PipeTransport.pair(1024);
    private final CountingExecutor executor = new CountingExecutor();
    private final FramedInstrumentLink link = new FramedInstrumentLink(ends[0], TestInstruments.DEMO_CUP.flight());
    private final SampleReply reply = new SampleReply();

    @Test
    void shouldAnswerARepeatedSequenceWithTheStoredReplyWithoutExecuting() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 0);
        assertTrue(exchange(server, step(7, 100, 200)));
        assertEquals(1, reply.quadrant[0]);
        assertTrue(exchange(server, step(7, 100, 200)));
        assertEquals(1, reply.quadrant[0]); // the stored reply: still execution 1
        assertEquals(1, server.repeatsAnswered());
        assertTrue(exchange(server, step(8, 100, 200)));
        assertEquals(2, reply.quadrant[0]);
        assertEquals(2, server.stepsExecuted());
    }

    @Test
    void shouldAdvanceItsClockByEachExecutedStepsDuration() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 0);
        StepCommand s = step(1, 100, 200); // 1 ms settle + 8 ms = 9 ms
        exchange(server, s);
        assertEquals(0, reply.quadrant[1]); // the first step starts at 0
        exchange(server, step(2, 100, 200));
        assertEquals(9, reply.quadrant[1]); // the second where the first ended, in ms
        assertEquals(2 * s.durationMicros(DEMO.modulationPeriodMicros()), server.clockMicros());
    }

    @Test
    void shouldKeepTheHvOffForAStepWithLevelsOutOfOrder() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 0);
        exchange(server, step(3, 500, 500)); // low not below high (ICD §5)
        assertFalse(executor.lastHvEnabled);
        assertEquals(SampleReply.STATUS_HV_OFF, reply.status);
        assertEquals(1, server.levelRefusals());
    }

    @Test
    void shouldPaceTheReplyByTheStepDurationOverTheSpeed() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 2.0); // twice real time
        StepCommand s = step(1, 100, 200);
        link.send(s, 0);
        server.doWork(0);
        long dueNanos = s.durationMicros(DEMO.modulationPeriodMicros()) * 1_000 / 2; // 4.5 ms of wall time
        server.doWork(dueNanos - 1);
        assertFalse(link.poll(reply, 0)); // at T-1: not yet
        server.doWork(dueNanos);
        assertTrue(link.poll(reply, 0)); // at T: sent
    }

    @Test
    void shouldAnswerHousekeepingWithItsFrameCounts() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 0);
        exchange(server, step(4, 100, 200));
        byte[] junk = {5, 1, 0}; // a truncated block: one bad chunk
        ends[0].write(junk, 0, junk.length);
        assertTrue(link.requestHousekeeping(99));
        for (int i = 0; i < 4; i++) {
            server.doWork(0);
            link.pump();
        }
        assertEquals(1, link.housekeepingReplies());
        assertEquals(99, link.housekeeping().sequence);
        assertEquals(2, link.housekeeping().framesGood); // the step and the request itself
        assertEquals(1, link.housekeeping().framesBad);
        assertEquals(4, link.housekeeping().lastStepSequence);
    }

    @Test
    void shouldSwitchTheHvOffWhenNoStepFrameCameForTheWatchdogTime() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 0);
        long replyNanos = 7_000_000_000L; // any wall time: the reply of the last step goes out here
        assertTrue(exchange(server, step(1, 100, 200), replyNanos));
        long t = InstrumentServer.WATCHDOG_NANOS; // hardware ICD §4.1: 2 s
        assertEquals(2_000_000_000L, t);
        server.doWork(replyNanos + t - 1_000_000); // T - 1 ms: quiet, but not for long enough
        assertEquals(0, executor.hvSwitchedOff);
        server.doWork(replyNanos + t); // at T: still on (the deadline itself is in time, as the executive's)
        assertTrue(server.hvOn());
        server.doWork(replyNanos + t + 1_000_000); // T + 1 ms: tripped
        assertEquals(1, executor.hvSwitchedOff);
        assertEquals(9_000, executor.hvSwitchedOffAtMicros); // at the instrument clock's end of the 9 ms step
        assertEquals(1, server.watchdogTrips());
        assertFalse(server.hvOn());
        server.doWork(replyNanos + 10 * t);
        assertEquals(1, executor.hvSwitchedOff); // once per quiet spell

        assertTrue(housekeeping(server, replyNanos + 10 * t));
        assertEquals(HousekeepingCodec.STATUS_WATCHDOG_OFF, link.housekeeping().status); // ICD §3.3: bit 1, HV off
        assertEquals(1, link.housekeeping().watchdogTrips);
        assertTrue(exchange(server, step(2, 100, 200), replyNanos + 11 * t)); // the next step enables it again
        assertTrue(housekeeping(server, replyNanos + 11 * t));
        assertEquals(HousekeepingCodec.STATUS_HV_ON, link.housekeeping().status);
        assertEquals(1, link.housekeeping().watchdogTrips); // the count stays (since power-up)
    }

    @Test
    void shouldNotRunTheWatchdogWhileTheHvIsOffOrAStepExecutes() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 1.0); // real time: a 2.2 s step
        StepCommand off = step(1, 0, 0);
        off.hvEnabled = false;
        link.send(off, 0);
        server.doWork(0);
        server.doWork(off.durationMicros(DEMO.modulationPeriodMicros()) * 1_000); // its reply is due after 9 ms
        assertTrue(link.poll(reply, 0));
        server.doWork(10 * InstrumentServer.WATCHDOG_NANOS);
        assertEquals(0, executor.hvSwitchedOff); // nothing to switch off
        StepCommand longStep = step(2, 100, 200);
        longStep.settleMicros = 1_200_000; // longer than T with its integration: the watchdog waits for the reply
        longStep.integrationPeriods = 1000;
        long start = 20 * InstrumentServer.WATCHDOG_NANOS;
        link.send(longStep, 0);
        server.doWork(start);
        server.doWork(start + InstrumentServer.WATCHDOG_NANOS + 1);
        assertEquals(0, executor.hvSwitchedOff);
        assertFalse(link.poll(reply, 0));
    }

    @Test
    void shouldSwitchTheHvOffAtOnceWhenTheStreamEnds() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 0);
        assertTrue(exchange(server, step(1, 100, 200), 0));
        ends[0].close(); // the flight software's end hangs up
        server.doWork(1); // long before T
        assertEquals(1, executor.hvSwitchedOff);
        assertTrue(server.ended());
    }

    @Test
    void shouldReadAtMostEightBuffersPerCycleHoweverFastOctetsCome() {
        // a peer that never stops sending noise (0x55, no delimiter: no frame ever completes)
        int[] reads = new int[1];
        ByteTransport flood = new ByteTransport() {
            @Override
            public int read(byte[] buffer, int offset, int length) {
                reads[0]++;
                java.util.Arrays.fill(buffer, offset, offset + length, (byte) 0x55);
                return length;
            }

            @Override
            public int write(byte[] buffer, int offset, int length) {
                return length;
            }
        };
        InstrumentServer server = new InstrumentServer(executor, flood, 0);
        assertTrue(server.doWork(0) > 0); // reading is work: the serving loop does not park on a full line
        // serve design note S6: 8 reads of the 256-octet buffer per cycle (common practice: bound every loop)
        assertEquals(InstrumentServer.MAX_READS_PER_CALL, reads[0]);
        assertEquals(8 * 256, server.counters().octetsRead);
        server.doWork(0);
        assertEquals(16, reads[0]);
    }

    @Test
    void shouldAnswerAStepThatArrivesBehindALongBurstOfNoise() {
        InstrumentServer server = new InstrumentServer(executor, ends[1], 0);
        // 900 octets of noise closed by a delimiter (one bad chunk, hardware ICD §2), then the step's frame:
        // more than 3 buffers of 256 octets, fewer than the pipe's 1024
        byte[] noise = new byte[900];
        java.util.Arrays.fill(noise, 0, 899, (byte) 0x55);
        ends[0].write(noise, 0, noise.length);
        link.send(step(1, 100, 200), 0);
        boolean answered = false;
        for (int cycle = 0; cycle < 8 && !answered; cycle++) {
            server.doWork(0);
            answered = link.poll(reply, 0);
        }
        assertTrue(answered);
        assertEquals(1, server.stepsExecuted());
        assertEquals(1, server.counters().framesBad());
    }

    private boolean housekeeping(InstrumentServer server, long nowNanos) {
        long before = link.housekeepingReplies();
        link.requestHousekeeping(5);
        for (int i = 0; i < 4 && link.housekeepingReplies() == before; i++) {
            server.doWork(nowNanos);
            link.pump();
        }
        return link.housekeepingReplies() > before;
    }

    private boolean exchange(InstrumentServer server, StepCommand s) {
        return exchange(server, s, 0);
    }

    private boolean exchange(InstrumentServer server, StepCommand s, long nowNanos) {
        link.send(s, 0);
        for (int i = 0; i < 4; i++) {
            server.doWork(nowNanos);
            if (link.poll(reply, 0)) {
                return true;
            }
        }
        return false;
    }

    private static StepCommand step(int sequence, int low, int high) {
        StepCommand s = new StepCommand();
        s.sequence = sequence;
        s.dacLow = low;
        s.dacHigh = high;
        s.settleMicros = 1_000;
        s.integrationPeriods = 8;
        s.hvEnabled = true;
        return s;
    }
}
