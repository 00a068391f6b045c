package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.AllocationMeter;
import dev.sweepline.fsw.sweep.CannedReplies;
import dev.sweepline.fsw.sweep.ModeChangeReason;
import dev.sweepline.fsw.sweep.RecordingListener;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.sweep.SyntheticInstrument;
import dev.sweepline.fsw.table.WindowTable;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.ArgumentMatchers.anyLong;
import static org.mockito.Mockito.mock;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.times;
import static org.mockito.Mockito.verify;
import static org.mockito.Mockito.when;

/** The executive's sequence, timeout, retry and safe behaviour (exec design note E1-E8). */
class ExecutiveTest {
    private static final WindowTable TABLE = DemoCup.table();
    /** First step from HV off: 1000 us + 519 codes * 1 us settle + 8 ms integration (issue 2 settle formula). */
    private static final long FIRST_STEP_MICROS = 1000 + 519 + 8 * 1000;
    private static final int MARGIN = 5000;

    private RecordingListener listener;
    private SweepScheduler scheduler;
    private FakeLink link;
    private Executive exec;

    @BeforeEach
    void setUp() {
        SyntheticInstrument plasma = new SyntheticInstrument(91);
        listener = new RecordingListener();
        scheduler = new SweepScheduler(DemoCup.INSTRUMENT, TABLE, DemoCup.parameters(), listener);
        link = new FakeLink(new CannedReplies(TABLE, plasma));
        exec = new Executive(link, scheduler, MARGIN, 2);
    }

    @Test
    void shouldSendOneStepAndIngestItsReply() {
        assertTrue(exec.doWork(0) > 0);
        assertEquals(1, exec.stepsSent());
        assertTrue(exec.outstanding());
        assertEquals(FIRST_STEP_MICROS, exec.currentStep().durationMicros(DemoCup.MODULATION_PERIOD_MICROS));
        assertEquals(0, exec.doWork(1000)); // reply not due: nothing to do
        exec.doWork(FIRST_STEP_MICROS + 100); // due (latency 100 us): ingest, and send the next step
        assertEquals(1, exec.repliesAccepted());
        assertEquals(2, exec.stepsSent());
        assertEquals(1, link.sentSequences[1]);
    }

    @Test
    void shouldWrapSequenceAtSixteenBits() {
        long now = 0;
        for (int guard = 0; guard < 1_000_000 && exec.stepsSent() < 65_537; guard++) {
            exec.doWork(now);
            now = Math.max(now + 1, exec.nextWakeMicros());
        }
        // hardware ICD: 16-bit wrapping sequence; send 65536 carries 65535, send 65537 carries 0
        assertEquals(65_537, exec.stepsSent());
        assertEquals(65_535, link.sentSequences[(65_536 - 1) & 15]);
        assertEquals(0, link.sentSequences[(65_537 - 1) & 15]);
        exec.doWork(now + 100_000);
        assertEquals(65_537, exec.repliesAccepted()); // the wrapped sequence 0 was accepted
        assertEquals(0, exec.sequenceErrors());
        assertEquals(0, exec.timeouts());
    }

    @Test
    void shouldDropAndCountWrongSequence() {
        exec.doWork(0);
        link.injectStale(1234);
        exec.doWork(10);
        assertEquals(1, exec.sequenceErrors());
        assertEquals(0, exec.repliesAccepted());
        assertTrue(exec.outstanding()); // the step still waits for its own reply
        exec.doWork(FIRST_STEP_MICROS + 100);
        assertEquals(1, exec.repliesAccepted());
    }

    @Test
    void shouldTimeOutOnlyAfterDeadline() {
        link.dropNext = 1;
        exec.doWork(0);
        long deadline = FIRST_STEP_MICROS + MARGIN;
        exec.doWork(deadline); // at T: still in time (style.md: timeouts tested at T-1/T+1)
        assertEquals(0, exec.timeouts());
        assertEquals(deadline, exec.nextWakeMicros() - 1);
        exec.doWork(deadline + 1);
        assertEquals(1, exec.timeouts());
        assertEquals(1, exec.retries());
        assertEquals(2, exec.stepsSent());
        assertEquals(1, link.sentSequences[1]); // the re-send has a fresh sequence number
        assertEquals(0, listener.steps.get(0).window()); // and it is the same step
        assertEquals(1, listener.steps.size());
    }

    @Test
    void shouldAcceptLateReplyToFirstTransmission() {
        link.dropNext = 1;
        exec.doWork(0);
        exec.doWork(FIRST_STEP_MICROS + MARGIN + 1); // re-sent as sequence 1
        link.injectStale(0); // the first transmission's reply turns up late
        exec.doWork(FIRST_STEP_MICROS + MARGIN + 2);
        assertEquals(1, exec.repliesAccepted());
        assertEquals(0, exec.sequenceErrors());
    }

    @Test
    void shouldGoSafeAfterBoundedRetries() {
        link.dead = true;
        long now = 0;
        for (int k = 0; k < 10; k++) {
            exec.doWork(now);
            now += FIRST_STEP_MICROS + MARGIN + 1;
        }
        // 1 send + 2 retries, 3 time-outs, then SAFE with LINK_TIMEOUT (issue 2)
        assertEquals(3, exec.stepsSent());
        assertEquals(2, exec.retries());
        assertEquals(3, exec.timeouts());
        assertEquals(SweepMode.SAFE, scheduler.mode());
        assertEquals(ModeChangeReason.LINK_TIMEOUT, listener.lastChange().reason());
        assertEquals(1, exec.safeEntries());
        assertEquals(0, exec.doWork(now)); // nothing to step in SAFE
        assertEquals(Long.MAX_VALUE, exec.nextWakeMicros());
        // leaving SAFE only by command
        link.dead = false;
        scheduler.requestMode(SweepMode.SURVEY, now);
        assertTrue(exec.doWork(now) > 0);
        assertEquals(4, exec.stepsSent());
    }

    @Test
    void shouldNotResendStepAbandonedBySafeCommand() {
        link.dead = true;
        exec.doWork(0);
        scheduler.requestMode(SweepMode.SAFE, 10); // ground command while the step is in flight
        exec.doWork(FIRST_STEP_MICROS + MARGIN); // at the deadline: the reply could still come
        assertTrue(exec.outstanding());
        exec.doWork(FIRST_STEP_MICROS + MARGIN + 1);
        assertFalse(exec.outstanding());
        assertEquals(1, exec.stepsSent()); // no re-send with HV on after SAFE
        assertEquals(0, exec.retries());
        assertEquals(1, exec.abandonedSteps());
    }

    @Test
    void shouldSettleFromTheLastSentLevelsWhenAnUnsentStepIsAbandoned() {
        listener.scheduler = scheduler; // steps record the mode they were chosen in
        long now = 0;
        for (int guard = 0; guard < 100_000 && !(scheduler.mode() == SweepMode.FOCUS && listener.steps.size() > 3
                && listener.steps.get(listener.steps.size() - 1).mode() == SweepMode.FOCUS); guard++) {
            exec.doWork(now);
            now = Math.max(now + 1, exec.nextWakeMicros());
        }
        assertEquals(SweepMode.FOCUS, scheduler.mode());
        assertTrue(exec.outstanding()); // a focus step the link accepted is in flight
        link.refuseNext = 1_000; // from now on the link refuses every send
        int sendsBefore = link.sends;
        int stepsBefore = listener.steps.size();
        for (int guard = 0; guard < 100 && listener.steps.size() == stepsBefore; guard++) {
            now = Math.max(now + 1, exec.nextWakeMicros());
            exec.doWork(now); // the reply comes; the next step is chosen and refused
        }
        assertEquals(stepsBefore + 1, listener.steps.size());
        assertEquals(sendsBefore, link.sends);
        RecordingListener.Step sent = listener.steps.get(listener.steps.size() - 2);
        RecordingListener.Step refused = listener.steps.get(listener.steps.size() - 1);
        assertEquals(SweepMode.FOCUS, refused.mode());
        scheduler.requestMode(SweepMode.SURVEY, now); // ground command: abandons the unsent step
        exec.doWork(now + 1);
        assertEquals(1, exec.abandonedSteps());
        RecordingListener.Step next = listener.steps.get(listener.steps.size() - 1);
        assertEquals(SweepMode.SURVEY, next.mode());
        // the electronics never saw the refused step: the rails stand at the last sent one's levels (R13;
        // demo cup: 1000 us fixed + 1 us per code, demo-cup.yaml cadence)
        int fromSent = Math.max(Math.abs(next.dacLow() - sent.dacLow()), Math.abs(next.dacHigh() - sent.dacHigh()));
        int fromRefused = Math.max(Math.abs(next.dacLow() - refused.dacLow()), Math.abs(next.dacHigh() - refused.dacHigh()));
        assertTrue(fromSent != fromRefused);
        assertEquals(1000 + fromSent, next.settleMicros());
    }

    @Test
    void shouldRetrySendRefusedByLink() {
        link.refuseNext = 2;
        exec.doWork(0);
        exec.doWork(10);
        assertEquals(0, exec.stepsSent());
        assertEquals(2, exec.sendRefusals());
        exec.doWork(20);
        assertEquals(1, exec.stepsSent());
        assertEquals(1, listener.steps.size()); // one step, sent on the third try
    }

    @Test
    void shouldRunClosedLoopWithoutErrors() {
        long now = 0;
        for (int k = 0; k < 20_000; k++) {
            exec.doWork(now);
            now = Math.max(now + 1, exec.nextWakeMicros());
        }
        assertEquals(0, exec.timeouts());
        assertEquals(0, exec.sequenceErrors());
        assertEquals(exec.stepsSent() - 1, exec.repliesAccepted());
        assertTrue(scheduler.sweepCount() > 20);
        assertTrue(listener.changes.stream().anyMatch(c -> c.reason() == ModeChangeReason.LOCK_ACQUIRED));
    }

    @Test
    void shouldAllocateNothingPerCycle() {
        // architecture.md: the per-step path allocates nothing; executive + scheduler (AllocationMeter rule)
        Executive quiet = new Executive(link, new SweepScheduler(DemoCup.INSTRUMENT, TABLE, DemoCup.parameters(), null), MARGIN, 2);
        long[] now = {0};
        AllocationMeter.assertAllocationFree(cycles -> {
            for (int k = 0; k < cycles; k++) {
                quiet.doWork(now[0]);
                now[0] = Math.max(now[0] + 1, quiet.nextWakeMicros());
            }
        });
        assertTrue(quiet.repliesAccepted() > 50_000);
    }

    @Test
    void shouldNotSendInSafeWithMockLink() {
        InstrumentLink mockLink = mock(InstrumentLink.class);
        when(mockLink.send(any(StepCommand.class), anyLong())).thenReturn(true);
        when(mockLink.poll(any(SampleReply.class), anyLong())).thenReturn(false);
        Executive e = new Executive(mockLink, scheduler, MARGIN, 0);
        e.doWork(0);
        verify(mockLink, times(1)).send(any(StepCommand.class), anyLong());
        e.doWork(FIRST_STEP_MICROS + MARGIN + 1); // no retries allowed: straight to SAFE
        assertEquals(SweepMode.SAFE, scheduler.mode());
        for (int k = 0; k < 5; k++) {
            e.doWork(100_000 + k);
        }
        verify(mockLink, times(1)).send(any(StepCommand.class), anyLong());
        assertFalse(e.outstanding());
    }

    @Test
    void shouldDrainStaleRepliesInSafeWithMockLink() {
        InstrumentLink mockLink = mock(InstrumentLink.class);
        when(mockLink.poll(any(SampleReply.class), anyLong())).thenReturn(true, true, false);
        scheduler.requestMode(SweepMode.SAFE, 0);
        Executive e = new Executive(mockLink, scheduler);
        assertEquals(2, e.doWork(0));
        assertEquals(2, e.sequenceErrors());
        verify(mockLink, never()).send(any(StepCommand.class), anyLong());
    }
}
