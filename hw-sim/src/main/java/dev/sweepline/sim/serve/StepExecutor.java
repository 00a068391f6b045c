package dev.sweepline.sim.serve;

import dev.sweepline.fsw.link.HousekeepingReply;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;

/** What the instrument server executes each step with: the simulated electronics, or a test double. */
public interface StepExecutor {
    /**
     * Executes {@code cmd} starting at {@code startMicros} of the instrument's own clock.
     *
     * @return the time the step ends (start plus the step's duration)
     */
    long execute(StepCommand cmd, long startMicros, SampleReply reply);

    /** Fills the electronics' own fields of a housekeeping reply (HV monitors, temperature). */
    default void housekeeping(HousekeepingReply hk) {
    }
}
