package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;

/**
 * Test driver: scheduler and synthetic instrument in a loop without an executive; time advances by
 * each step's duration (StepCommand.durationMicros, hardware ICD timing).
 */
public final class ClosedLoop {
    /** The scheduler under test. */
    public final SweepScheduler scheduler;
    /** The plasma and preamp it measures. */
    public final SyntheticInstrument instrument;
    /** The step flyweight. */
    public final StepCommand step = new StepCommand();
    /** The reply flyweight. */
    public final SampleReply reply = new SampleReply();
    /** Present time, microseconds. */
    public long nowMicros;
    private int sequence;

    /** Drives {@code scheduler} against {@code instrument}. */
    public ClosedLoop(SweepScheduler scheduler, SyntheticInstrument instrument) {
        this.scheduler = scheduler;
        this.instrument = instrument;
    }

    /** One step and its reply; false when the scheduler had nothing to step. */
    public boolean step() {
        if (!scheduler.nextStep(step, nowMicros)) {
            return false;
        }
        step.sequence = sequence++ & 0xFFFF;
        nowMicros += step.durationMicros(DemoCup.MODULATION_PERIOD_MICROS);
        if (instrument.answer(step, reply)) {
            scheduler.ingest(reply, nowMicros);
        }
        return true;
    }

    /** Steps until {@code sweeps} more sweeps completed (bounded: at most 300 steps per sweep). */
    public void runSweeps(int sweeps) {
        long target = scheduler.sweepCount() + sweeps;
        for (int guard = 0; guard < 300 * sweeps && scheduler.sweepCount() < target; guard++) {
            if (!step()) {
                return;
            }
        }
    }
}
