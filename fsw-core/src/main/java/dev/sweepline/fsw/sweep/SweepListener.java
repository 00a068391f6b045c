package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;

/**
 * Events of the sweep scheduler (for the packer, housekeeping and the bench). Called on the
 * scheduler's thread, synchronously; arguments are the scheduler's own flyweights, valid only during
 * the call. Implementations must not allocate if the step path is to stay allocation-free.
 */
public interface SweepListener {
    /** {@link #onConfigurationApplied} bit: a new window table took effect. */
    int APPLIED_TABLE = ActiveConfiguration.TABLE_CHANGED;
    /** {@link #onConfigurationApplied} bit: new sweep parameters took effect. */
    int APPLIED_PARAMETERS = ActiveConfiguration.PARAMETERS_CHANGED;

    /** A listener that ignores everything. */
    SweepListener NONE = new SweepListener() {
    };

    /** A step was chosen (sequence not yet assigned: the executive does that). */
    default void onStep(StepCommand step, long nowMicros) {
    }

    /** The reply to {@code step} was ingested. */
    default void onSample(StepCommand step, SampleReply reply, long nowMicros) {
    }

    /** A sweep completed and was analysed; {@code spectrum} is {@link SweepScheduler#lastSpectrum()}. */
    default void onSweepComplete(Spectrum spectrum, long nowMicros) {
    }

    /** A focus band was chosen from the last spectrum: windows first..last, refined peak (window index, Q8). */
    default void onBandChosen(int firstWindow, int lastWindow, int peakWindowQ8, long nowMicros) {
    }

    /**
     * A loaded configuration took effect at a sweep boundary, before the first step of the sweep that
     * flies it: {@code applied} holds {@link #APPLIED_TABLE} and / or {@link #APPLIED_PARAMETERS};
     * {@code generation} counts the configurations applied since start (1 for the first load after the
     * start-up one). The sweep completed next is the first made with it.
     */
    default void onConfigurationApplied(int applied, int generation, long nowMicros) {
    }

    /** The mode changed; {@code reason} is a {@link ModeChangeReason} code. */
    default void onModeChange(SweepMode from, SweepMode to, int reason, long nowMicros) {
    }
}
