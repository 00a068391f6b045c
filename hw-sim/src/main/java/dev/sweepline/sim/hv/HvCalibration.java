package dev.sweepline.sim.hv;

import dev.sweepline.fsw.instrument.InstrumentDescription;

/**
 * Transfer function of the HV DAC and of the monitor ADC (which share one scale): volts = offset +
 * voltsPerCode * code, clamped to the DAC's codes 0..topCode. The real unit differs a little from the
 * nominal {@link InstrumentDescription#millivoltsPerCode}; the flight software only knows the nominal one.
 *
 * @param voltsPerCode volts per DAC code
 * @param offsetVolts  output at code 0, volts
 * @param topCode      the DAC's top code, 2^dacBits - 1
 */
public record HvCalibration(double voltsPerCode, double offsetVolts, int topCode) {
    /** Checks the scale is positive and finite and the DAC has codes. */
    public HvCalibration {
        if (!(voltsPerCode > 0) || !Double.isFinite(offsetVolts) || topCode < 1) {
            throw new IllegalArgumentException("bad calibration " + voltsPerCode + " V/code, " + offsetVolts
                    + " V, top code " + topCode);
        }
    }

    /**
     * The real unit of an instrument: its nominal scale times (1 + gainError), its offset
     * (instruments/FORMAT.md, modulator: {@code gainError}, {@code offsetVolts}).
     */
    public static HvCalibration of(InstrumentDescription d, double gainError, double offsetVolts) {
        return new HvCalibration(nominalVoltsPerCode(d) * (1 + gainError), offsetVolts, d.dacTopCode());
    }

    /** The nominal transfer function of an instrument (its nominal scale, no offset). */
    public static HvCalibration nominal(InstrumentDescription d) {
        return new HvCalibration(nominalVoltsPerCode(d), 0, d.dacTopCode());
    }

    private static double nominalVoltsPerCode(InstrumentDescription d) {
        return d.millivoltsPerCode() / 1000.0;
    }

    /** Output for a DAC code, volts (before the supply's own clamp at 0 V). */
    public double volts(int code) {
        return offsetVolts + voltsPerCode * code;
    }

    /** Nearest code for a voltage, clamped to 0..{@link #topCode}. */
    public int code(double volts) {
        double c = Math.rint((volts - offsetVolts) / voltsPerCode);
        if (!(c > 0)) {
            return 0;
        }
        return c >= topCode ? topCode : (int) c;
    }
}
