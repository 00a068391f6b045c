package dev.sweepline.ground.fit;

/**
 * Noise of one quadrant sample, ICD §8: σ² = 2e|I|B + 4kTB/R_f + LSB²/12 with B = 1/(2 T_int),
 * T = 300 K, R_f = 4 V / FS(range), LSB = FS/(65535 − 256), FS = 40 pA × 32^range (ICD §4).
 */
public final class NoiseModel {
    /** Preamp temperature, K (ICD §8). */
    public static final double PREAMP_TEMPERATURE_K = 300.0;
    /** Feedback voltage at full scale, V: R_f = 4 V / FS (ICD §8). */
    public static final double FULL_SCALE_VOLTS = 4.0;
    /** One modulation period, seconds: 1000 µs (ICD §4). */
    public static final double PERIOD_SECONDS = 1.0e-3;
    /** Full scale of range 0, A (ICD §4). */
    public static final double FULL_SCALE_RANGE0_AMPS = 40e-12;
    /** ADC codes from pedestal to top: 65535 − 256 (ICD §4). */
    public static final double ADC_SPAN_COUNTS = 65535 - 256;

    private NoiseModel() {
    }

    /** Full scale of a gain range 0..2, amperes (ICD §4). */
    public static double fullScaleAmps(int range) {
        return FULL_SCALE_RANGE0_AMPS * Math.pow(32, range);
    }

    /** Variance of one quadrant sample, A², for current {@code amps} on {@code range} over {@code periods}. */
    public static double quadrantVariance(double amps, int range, int periods) {
        double bandwidthHz = 1 / (2 * Math.max(1, periods) * PERIOD_SECONDS);
        double fs = fullScaleAmps(range);
        double feedbackOhms = FULL_SCALE_VOLTS / fs;
        double lsb = fs / ADC_SPAN_COUNTS;
        return 2 * PlasmaConstants.ELEMENTARY_CHARGE_C * Math.abs(amps) * bandwidthHz
                + 4 * PlasmaConstants.BOLTZMANN_J_PER_K * PREAMP_TEMPERATURE_K * bandwidthHz / feedbackOhms
                + lsb * lsb / 12;
    }
}
