package dev.sweepline.fsw.link;

/**
 * The electronics' answer to one {@link StepCommand}: a mutable flyweight, allocated once and
 * refilled for every step (hardware ICD, sample reply).
 *
 * <p>Quadrant values are the demodulated preamplifier output in ADC counts, unsigned 16 bits,
 * offset by {@link InstrumentConstants#ADC_PEDESTAL_COUNTS} so that noise around zero current is not
 * clipped. Threading: owned by one thread, the executive's.
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
    public final int[] quadrant = new int[InstrumentConstants.QUADRANTS];
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

    /** Sum of the four quadrants with the pedestal removed, ADC counts (may be slightly negative from noise). */
    public int totalCountsAbovePedestal() {
        int sum = 0;
        for (int q = 0; q < quadrant.length; q++) {
            sum += quadrant[q] - InstrumentConstants.ADC_PEDESTAL_COUNTS;
        }
        return sum;
    }
}
