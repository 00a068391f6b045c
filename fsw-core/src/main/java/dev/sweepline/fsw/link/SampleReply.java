package dev.sweepline.fsw.link;

import dev.sweepline.fsw.instrument.InstrumentDescription;

/**
 * The electronics' answer to one {@link StepCommand}: a mutable flyweight, allocated once and
 * refilled for every step (hardware ICD, sample reply).
 *
 * <p>Quadrant values are the demodulated preamplifier output in ADC counts, unsigned, of the
 * instrument's ADC width, offset by its pedestal (InstrumentDescription#pedestalCounts) so that noise
 * around zero current is not clipped. Threading: owned by one thread, the executive's.
 */
public final class SampleReply {
    /** Status bit: at least one quadrant reached the top of the ADC range. */
    public static final int STATUS_SATURATED = 1;
    /** Status bit: the HV monitor disagreed with the command when integration started. */
    public static final int STATUS_HV_UNSETTLED = 1 << 1;
    /** Status bit: high voltage was off for this step. */
    public static final int STATUS_HV_OFF = 1 << 2;

    /** Sequence number of the step this reply answers. */
    public int sequence;
    /** Status bits, {@code STATUS_*}. */
    public int status;
    /** Demodulated output of collector quadrants Q1..Q4, ADC counts. */
    public final int[] quadrant = new int[InstrumentDescription.QUADRANTS];
    /** HV monitor readback of the high level at the start of integration, HV DAC code units. */
    public int hvMonitorCode;
    /** Gain range the electronics actually used (tags the sample). */
    public int gainRange;

    /** Copies every field of {@code other} into this reply. */
    public void copyFrom(SampleReply other) {
        sequence = other.sequence;
        status = other.status;
        System.arraycopy(other.quadrant, 0, quadrant, 0, quadrant.length);
        hvMonitorCode = other.hvMonitorCode;
        gainRange = other.gainRange;
    }
}
