package dev.sweepline.ground.instrument;

/**
 * What the ground knows of one instrument, read from its description file (FORMAT.md): the id
 * telemetry names it by, its geometry, its modulator and default window table, its gain ranges and
 * ADC. Spectra are turned into currents, edges and moments with the instrument whose id the packet
 * carries (telemetry ICD §4, §8). Immutable and thread-safe.
 *
 * @param id          the id telemetry carries, 1..65535
 * @param name        the description's name ({@code demo-cup})
 * @param description the description's one or two sentences
 * @param source      where it was read from: {@code instruments/NAME.yaml} for a built-in, else the file
 * @param geometry    aperture, collector, grids
 * @param modulator   levels, DAC, calibration, modulation period
 * @param windows     the default window table (table id 0)
 * @param gains       the preamplifier's gain ranges
 * @param adc         ADC width (the sample width) and pedestal
 */
public record GroundInstrument(int id, String name, String description, String source, Geometry geometry,
        Modulator modulator, DefaultWindowTable windows, GainRanges gains, AdcFormat adc) {
    /** The sample width telemetry must carry for this instrument: {@code adc.bits} (telemetry ICD §4). */
    public int sampleBits() {
        return adc.bits();
    }

    /** The HV calibration of both modulator levels. */
    public HvCalibration calibration() {
        return modulator.calibration();
    }

    /** One ADC count of gain range {@code r}, amperes: FS_r / (top code − pedestal) (telemetry ICD §4, §8). */
    public double lsbAmps(int r) {
        return gains.fullScaleAmps(r) / adc.spanCounts();
    }

    /**
     * The current of an ADC value on range {@code r}: (ADC − pedestal) × LSB_r, amperes;
     * negative below the pedestal.
     */
    public double amps(int adcCounts, int r) {
        return (adcCounts - adc.pedestalCounts()) * lsbAmps(r);
    }

    /** "name (id N)", for listings and messages. */
    public String label() {
        return name + " (id " + id + ")";
    }
}
