package dev.sweepline.fsw.link;

/**
 * One step of the sweep as the flight software asks the electronics for it: a mutable flyweight,
 * allocated once and refilled for every step (hardware ICD, step command).
 *
 * <p>The modulator grid alternates between {@code dacLow} and {@code dacHigh}; the synchronously
 * detected collector current is the current of ions whose energy per charge lies between the two.
 * Threading: owned by one thread, the executive's.
 */
public final class StepCommand {
    /** Sequence number, 16 bits, wrapping; the reply carries it back. */
    public int sequence;
    /** Index of the window in the active table (for logs and telemetry; the electronics do not use it). */
    public int window;
    /** Modulator low level, HV DAC code (0..the DAC's top code). */
    public int dacLow;
    /** Modulator high level, HV DAC code (0..the DAC's top code), above {@code dacLow}. */
    public int dacHigh;
    /** Preamplifier gain range, 0 (most sensitive) .. the instrument's gain ranges - 1. */
    public int gainRange;
    /** Time the electronics wait after setting the levels before they start to integrate. */
    public int settleMicros;
    /** Number of modulation periods integrated for this step. */
    public int integrationPeriods;
    /** False in {@code safe}: the electronics keep the high voltage off and still return a sample. */
    public boolean hvEnabled;

    /** Copies every field of {@code other} into this command. */
    public void copyFrom(StepCommand other) {
        sequence = other.sequence;
        window = other.window;
        dacLow = other.dacLow;
        dacHigh = other.dacHigh;
        gainRange = other.gainRange;
        settleMicros = other.settleMicros;
        integrationPeriods = other.integrationPeriods;
        hvEnabled = other.hvEnabled;
    }

    /**
     * Duration of the step in microseconds: settle time plus integration, for a modulation of
     * {@code modulationPeriodMicros} (InstrumentDescription#modulationPeriodMicros).
     */
    public long durationMicros(int modulationPeriodMicros) {
        return settleMicros + (long) integrationPeriods * modulationPeriodMicros;
    }
}
