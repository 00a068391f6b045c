package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.SweepParameters;
import org.junit.jupiter.api.Test;

import java.lang.management.ManagementFactory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Zero allocation on the step path (architecture.md, determinism: the per-step path allocates
 * nothing): nextStep + ingest + sweep analysis over 100k steps, measured with the JVM's per-thread
 * allocation counter. Not timed. 0 bytes allowed.
 */
class AllocationTest {
    private static final int STEPS = 100_000;

    @Test
    void shouldAllocateNothingPerStep() {
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        assertTrue(threads.isThreadAllocatedMemorySupported());
        threads.setThreadAllocatedMemoryEnabled(true);
        SyntheticInstrument plasma = Fixtures.oneAu(81);
        CannedReplies canned = new CannedReplies(Fixtures.TABLE, plasma);
        SweepScheduler scheduler = new SweepScheduler(Fixtures.TABLE, SweepParameters.defaults(), SweepListener.NONE);
        StepCommand step = new StepCommand();
        SampleReply reply = new SampleReply();
        long now = run(scheduler, canned, step, reply, 0, STEPS); // warm-up: class loading, JIT
        long id = Thread.currentThread().getId();
        long before = threads.getThreadAllocatedBytes(id);
        long sweepsBefore = scheduler.sweepCount();
        run(scheduler, canned, step, reply, now, STEPS);
        long after = threads.getThreadAllocatedBytes(id);
        assertEquals(0, after - before, "bytes allocated in " + STEPS + " steps");
        // the measured loop went through surveys and focus sweeps, not one state
        assertTrue(scheduler.sweepCount() - sweepsBefore > 1000);
    }

    private static long run(SweepScheduler s, CannedReplies canned, StepCommand step, SampleReply reply,
                            long now, int steps) {
        for (int k = 0; k < steps; k++) {
            s.nextStep(step, now);
            now += step.durationMicros();
            canned.answer(step, reply);
            s.ingest(reply, now);
        }
        return now;
    }
}
