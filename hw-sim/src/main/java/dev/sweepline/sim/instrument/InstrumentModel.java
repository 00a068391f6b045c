package dev.sweepline.sim.instrument;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.sim.cup.CupGeometry;
import dev.sweepline.sim.hv.HvCalibration;
import dev.sweepline.sim.hv.HvSupplyParameters;
import dev.sweepline.sim.preamp.Preamplifier;

/**
 * Parameter set of one simulated instrument (physics.md "The demo instrument"; the values are invented).
 *
 * @param spec                       the instrument description file it models (the flight software is
 *                                   configured from the same file: {@link #flight()})
 * @param cup                        cup geometry
 * @param calibration                the unit's HV DAC / monitor calibration
 * @param hv                         HV supply dynamics and monitor noise
 * @param preampTemperatureK         feedback-resistor temperature, kelvin
 * @param hvUnsettledToleranceCodes  largest |monitor - commanded high code| at integration start that still
 *                                   counts as settled, DAC codes
 */
public record InstrumentModel(InstrumentSpec spec, CupGeometry cup, HvCalibration calibration, HvSupplyParameters hv,
                              double preampTemperatureK, int hvUnsettledToleranceCodes) {
    /**
     * Demo tolerance: 50 codes (5 V), ten times the 0.5 V rms monitor noise, so a settled rail
     * raises a false alarm with probability ~1e-23 per step (Gaussian tail at 10 sigma).
     */
    public static final int DEMO_HV_UNSETTLED_TOLERANCE_CODES = 50;

    /** Checks the parts are present and the tolerance non-negative. */
    public InstrumentModel {
        if (spec == null || cup == null || calibration == null || hv == null || !(preampTemperatureK >= 0) || hvUnsettledToleranceCodes < 0) {
            throw new IllegalArgumentException("incomplete instrument model");
        }
    }

    /** The flight software's description of this instrument (from {@link #spec()}). */
    public InstrumentDescription flight() {
        return spec.flight();
    }

    /** The demo instrument (instruments/demo-cup.yaml): demo cup, calibration, HV supply, preamp at 300 K, 50-code settle tolerance. */
    public static InstrumentModel demo() {
        return new InstrumentModel(Instruments.defaultSpec(), CupGeometry.demo(), HvCalibration.demo(), HvSupplyParameters.demo(),
                Preamplifier.DEMO_TEMPERATURE_K, DEMO_HV_UNSETTLED_TOLERANCE_CODES);
    }
}
