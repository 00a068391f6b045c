package dev.sweepline.ground.instrument;

/**
 * The modulator's DAC: the nominal scale the flight software commands with and the real unit's
 * calibration against it (description {@code modulator}; telemetry ICD §8): volts = (1 + gainError) ×
 * nominalMillivoltsPerCode / 1000 × code + offsetVolts, both levels alike.
 *
 * @param nominalMillivoltsPerCode the nominal DAC scale, mV per code (whole, 1..10000)
 * @param gainError                the real unit's scale against nominal, −0.05..0.05
 * @param offsetVolts              the real unit's output at code 0, V
 */
public record HvCalibration(int nominalMillivoltsPerCode, double gainError, double offsetVolts) {
    /** Millivolts per volt. */
    private static final double MV_PER_V = 1000.0;

    /** Nominal volts per code: scale / 1000. */
    public double nominalVoltsPerCode() {
        return nominalMillivoltsPerCode / MV_PER_V;
    }

    /** Calibrated volts per code: (1 + gainError) × scale / 1000. */
    public double voltsPerCode() {
        return (1 + gainError) * nominalMillivoltsPerCode / MV_PER_V;
    }

    /** The voltage the modulator really gives at {@code code}: (1 + gainError) × scale / 1000 × code + offset. */
    public double volts(int code) {
        return voltsPerCode() * code + offsetVolts;
    }

    /** The voltage a code stands for on the nominal scale: code × scale / 1000. */
    public double nominalVolts(int code) {
        return code * (double) nominalMillivoltsPerCode / MV_PER_V;
    }

    /** The nearest code of the nominal scale to {@code volts}: round(V × 1000 / scale) (FORMAT.md, windows). */
    public int nearestCode(double volts) {
        return (int) Math.round(volts * MV_PER_V / nominalMillivoltsPerCode);
    }
}
