package dev.sweepline.ground.instrument;

/**
 * What the ground keeps of the description's {@code modulator}: its levels, its DAC and calibration,
 * and the modulation period integration periods are counted in.
 *
 * @param minVolts               lowest level of the default table, V
 * @param maxVolts               the rating: no window of any table commands more, V
 * @param dacBits                HV DAC width, 8..16
 * @param calibration            nominal scale and the real unit's calibration
 * @param modulationPeriodMicros period of the square-wave modulation, µs
 */
public record Modulator(double minVolts, double maxVolts, int dacBits, HvCalibration calibration,
        int modulationPeriodMicros) {
    /** Seconds per microsecond. */
    private static final double S_PER_US = 1e-6;

    /** Highest code any table may command: ⌊maxVolts × 1000 / scale⌋ (FORMAT.md, derived values). */
    public int highestCode() {
        return (int) Math.floor(maxVolts * 1000.0 / calibration.nominalMillivoltsPerCode());
    }

    /** The DAC's reach on the nominal scale: (2^dacBits − 1) × scale / 1000, V. */
    public double reachVolts() {
        return calibration.nominalVolts((1 << dacBits) - 1);
    }

    /** The modulation period, s. */
    public double modulationPeriodSeconds() {
        return modulationPeriodMicros * S_PER_US;
    }
}
