package dev.sweepline.sim.instrument;

import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.sim.cup.CupGeometry;
import dev.sweepline.sim.hv.HvCalibration;
import dev.sweepline.sim.hv.HvSupplyParameters;
import dev.sweepline.sim.preamp.Preamplifier;

/**
 * Parameter set of one simulated instrument, built from its description file (instruments/FORMAT.md).
 *
 * @param spec                       the instrument description file it models (the flight software is
 *                                   configured from the same file: {@link #flight()})
 * @param cup                        cup geometry
 * @param calibration                the unit's HV DAC / monitor calibration
 * @param hv                         HV supply dynamics and monitor noise
 * @param preamp                     the preamplifier and ADC of every quadrant
 * @param hvUnsettledToleranceCodes  largest |monitor - commanded high code| at integration start that still
 *                                   counts as settled, DAC codes
 */
public record InstrumentModel(InstrumentSpec spec, CupGeometry cup, HvCalibration calibration, HvSupplyParameters hv,
                              Preamplifier preamp, int hvUnsettledToleranceCodes) {
    /** Checks the parts are present and the tolerance non-negative. */
    public InstrumentModel {
        if (spec == null || cup == null || calibration == null || hv == null || preamp == null || hvUnsettledToleranceCodes < 0) {
            throw new IllegalArgumentException("incomplete instrument model");
        }
    }

    /**
     * The instrument a description file describes: geometry from its area (cm² to m²) and lengths (mm
     * to m); the HV unit's scale and offset, slew (V/ms to V/s), settling tau (µs to s), monitor noise
     * and settled tolerance; the preamplifier's ranges, output full scale, temperature and bandwidth;
     * the ADC's width and pedestal (through {@link InstrumentSpec#flight()}). Unit conversions divide
     * by exact powers of ten, so a value written as 150 µs is the double 150e-6.
     */
    public static InstrumentModel of(InstrumentSpec spec) {
        InstrumentDescription d = spec.flight();
        InstrumentSpec.Geometry g = spec.geometry();
        InstrumentSpec.Modulator m = spec.modulator();
        InstrumentSpec.Preamp p = spec.preamp();
        CupGeometry cup = CupGeometry.ofEffectiveArea(g.effectiveAreaCm2() / 1e4, g.apertureToCollectorMm() / 1e3,
                g.collectorRadiusMm() / 1e3, g.grids(), g.gridTransparency());
        HvSupplyParameters hv = new HvSupplyParameters(m.slewVoltsPerMs() * 1e3, m.settleTauMicros() / 1e6,
                m.monitorNoiseVoltsRms());
        return new InstrumentModel(spec, cup, HvCalibration.of(d, m.gainError(), m.offsetVolts()), hv,
                new Preamplifier(d, p.outputFullScaleVolts(), p.temperatureK(), p.bandwidthHz()),
                m.settledToleranceCodes());
    }

    /** The flight software's description of this instrument (from {@link #spec()}). */
    public InstrumentDescription flight() {
        return spec.flight();
    }

    /** The instrument's name (its description's). */
    public String name() {
        return spec.name();
    }
}
