package dev.sweepline.sim.hv;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.host.instrument.Instruments;

/**
 * Transfer function of the HV DAC and of the monitor ADC (which share one scale): volts = offset +
 * voltsPerCode * code. The real unit differs a little from the nominal
 * {@link InstrumentDescription#millivoltsPerCode}; the flight software only knows the nominal one.
 *
 * @param voltsPerCode volts per DAC code
 * @param offsetVolts  output at code 0, volts
 */
public record HvCalibration(double voltsPerCode, double offsetVolts) {
    /** The demo cup's flight description (instruments/demo-cup.yaml), the instrument this part models. */
    private static final InstrumentDescription DEMO = Instruments.defaultSpec().flight();
    /** Nominal scale, volts per code (hardware ICD: 0.1 V per code). */
    public static final double NOMINAL_VOLTS_PER_CODE = DEMO.millivoltsPerCode() / 1000.0;
    /** Demo gain error: +0.15 % (invented, the size of a resistor-divider tolerance: common practice). */
    public static final double DEMO_GAIN_ERROR = 0.0015;
    /** Demo offset, volts (invented). */
    public static final double DEMO_OFFSET_VOLTS = -0.8;

    /** Checks the scale is positive and finite. */
    public HvCalibration {
        if (!(voltsPerCode > 0) || !Double.isFinite(offsetVolts)) {
            throw new IllegalArgumentException("bad calibration " + voltsPerCode + " V/code, " + offsetVolts + " V");
        }
    }

    /** The demo unit: nominal scale +0.15 %, offset -0.8 V. */
    public static HvCalibration demo() {
        return new HvCalibration(NOMINAL_VOLTS_PER_CODE * (1 + DEMO_GAIN_ERROR), DEMO_OFFSET_VOLTS);
    }

    /** The nominal transfer function (0.1 V per code, no offset). */
    public static HvCalibration nominal() {
        return new HvCalibration(NOMINAL_VOLTS_PER_CODE, 0);
    }

    /** Output for a DAC code, volts (before the supply's own clamp at 0 V). */
    public double volts(int code) {
        return offsetVolts + voltsPerCode * code;
    }

    /** Nearest code for a voltage, clamped to 0..{@link InstrumentDescription#dacTopCode}. */
    public int code(double volts) {
        double c = Math.rint((volts - offsetVolts) / voltsPerCode);
        if (!(c > 0)) {
            return 0;
        }
        return c >= DEMO.dacTopCode() ? DEMO.dacTopCode() : (int) c;
    }
}
