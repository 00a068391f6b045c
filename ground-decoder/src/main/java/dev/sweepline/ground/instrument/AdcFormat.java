package dev.sweepline.ground.instrument;

/**
 * The ADC (description {@code adc}): its width, which is also the width samples travel with
 * (telemetry ICD §4), and the code of zero current.
 *
 * @param bits           ADC width w, 8..24
 * @param pedestalCounts code of zero current, 0 .. 2^bits / 4
 */
public record AdcFormat(int bits, int pedestalCounts) {
    /** The top code 2^bits − 1: a sample there is saturated (FORMAT.md, derived values). */
    public int topCode() {
        return (1 << bits) - 1;
    }

    /** Codes from the pedestal to the top, the span that stands for one full scale. */
    public int spanCounts() {
        return topCode() - pedestalCounts;
    }
}
