package dev.sweepline.ground.spectrum;

/**
 * ADC counts to collector current, ICD §4 "Converting to current":
 * current (A) = (ADC − 256) × FS(range) / (65535 − 256), FS = 40 pA × 32^range.
 */
public final class QuadrantCurrent {
    /** ADC pedestal at zero current, counts (ICD §4). */
    public static final int PEDESTAL_COUNTS = 256;
    /** ADC top, counts: unsigned 16 bits (ICD §4). */
    public static final int ADC_TOP_COUNTS = 65535;
    /** Full scale of range 0, amperes: 40 pA (ICD §4). */
    public static final double FULL_SCALE_RANGE0_AMPS = 40e-12;
    /** Full-scale ratio between adjacent ranges (ICD §4: 32^range). */
    public static final int RANGE_RATIO = 32;
    /** Highest gain range (ICD §4: tags 0..2). */
    public static final int MAX_RANGE = 2;

    private static final double[] LSB_AMPS = {
        FULL_SCALE_RANGE0_AMPS / (ADC_TOP_COUNTS - PEDESTAL_COUNTS),
        FULL_SCALE_RANGE0_AMPS * RANGE_RATIO / (ADC_TOP_COUNTS - PEDESTAL_COUNTS),
        FULL_SCALE_RANGE0_AMPS * RANGE_RATIO * RANGE_RATIO / (ADC_TOP_COUNTS - PEDESTAL_COUNTS),
    };

    private QuadrantCurrent() {
    }

    /** Full scale of {@code range} (0..2), amperes. */
    public static double fullScaleAmps(int range) {
        return LSB_AMPS[range] * (ADC_TOP_COUNTS - PEDESTAL_COUNTS);
    }

    /** One ADC count of {@code range} (0..2), amperes. */
    public static double lsbAmps(int range) {
        return LSB_AMPS[range];
    }

    /** Current of an ADC value on {@code range} (0..2), amperes; negative below the pedestal. */
    public static double amps(int adcCounts, int range) {
        return (adcCounts - PEDESTAL_COUNTS) * LSB_AMPS[range];
    }
}
