package dev.sweepline.ground.instrument;

/**
 * The preamplifier's gain ranges and what the noise model needs of it (description {@code preamp};
 * telemetry ICD §8): full scale FS_r = FS₀ × ratio^r, feedback resistor R_f = outputFullScaleVolts / FS_r.
 *
 * @param ranges                 gain ranges, 1..4 (telemetry tags 0 .. ranges − 1)
 * @param rangeRatio             full scale of range r+1 over range r, a power of two 2..1024
 * @param fullScaleRange0Amps    FS₀, the full scale of the most sensitive range, A
 * @param outputFullScaleVolts   amplifier output at full scale, V
 * @param bandwidthHz            analog bandwidth, Hz
 * @param temperatureK           feedback-resistor temperature, K (Johnson noise)
 * @param noiseCountsPerQuadrant the flight software's noise estimate per quadrant, counts
 */
public record GainRanges(int ranges, int rangeRatio, double fullScaleRange0Amps, double outputFullScaleVolts,
        double bandwidthHz, double temperatureK, int noiseCountsPerQuadrant) {
    /** Full scale of range {@code r} (0 .. ranges − 1): FS₀ × ratio^r, A (ratio^r ≤ 1024³ is a whole number, exact). */
    public double fullScaleAmps(int r) {
        long factor = 1;
        for (int k = 0; k < r; k++) {
            factor *= rangeRatio;
        }
        return fullScaleRange0Amps * factor;
    }

    /** Feedback resistor of range {@code r}: outputFullScaleVolts / FS_r, Ω. */
    public double feedbackOhms(int r) {
        return outputFullScaleVolts / fullScaleAmps(r);
    }

    /** True when {@code tag} names a range of this preamplifier. */
    public boolean hasRange(int tag) {
        return tag >= 0 && tag < ranges;
    }
}
