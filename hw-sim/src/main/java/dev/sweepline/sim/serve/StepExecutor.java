package dev.sweepline.sim.serve;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.HousekeepingReply;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;

/** What the instrument server executes each step with: the simulated electronics, or a test double. */
public interface StepExecutor {
    /** The instrument these steps run on: its sample width and modulation period. */
    InstrumentDescription instrument();

    /**
     * Executes {@code cmd} starting at {@code startMicros} of the instrument's own clock.
     *
     * @return the time the step ends (start plus the step's duration)
     */
    long execute(StepCommand cmd, long startMicros, SampleReply reply);

    /**
     * Switches the HV off at {@code atMicros} of the instrument's clock: the link watchdog tripped
     * (hardware ICD §4.1). Test doubles without an HV supply may ignore it.
     */
    default void switchHvOff(long atMicros) {
    }

    /** Fills the electronics' own fields of a housekeeping reply (HV monitors, temperature). */
    default void housekeeping(HousekeepingReply hk) {
    }
}
