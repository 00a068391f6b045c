package dev.sweepline.ground.fit;

import dev.sweepline.ground.instrument.GroundInstrument;

/**
 * Noise of one quadrant sample of an instrument, ICD §8: σ² = 2e|I|B + 4kTB/R_f + LSB²/12 with
 * B = 1/(2 T_int), T_int = integration periods × the modulation period, T the preamplifier's
 * temperature, R_f = outputFullScaleVolts / FS(range), LSB = FS/(top code − pedestal), all from the
 * instrument's description (for the demo cup: 1 ms, 300 K, 4 V, 40 pA × 32^range, 65535 − 256).
 * Immutable.
 */
public final class NoiseModel {
    private final GroundInstrument instrument;

    /** The noise model of {@code instrument}. */
    public NoiseModel(GroundInstrument instrument) {
        this.instrument = instrument;
    }

    /** Full scale of a gain range, amperes (ICD §4). */
    public double fullScaleAmps(int range) {
        return instrument.gains().fullScaleAmps(range);
    }

    /** One ADC count of a gain range, amperes (ICD §4). */
    public double lsbAmps(int range) {
        return instrument.lsbAmps(range);
    }

    /** Variance of one quadrant sample, A², for current {@code amps} on {@code range} over {@code periods}. */
    public double quadrantVariance(double amps, int range, int periods) {
        double bandwidthHz = bandwidthHz(periods);
        return quadrantVariance(amps, bandwidthHz, thermalVariance(range, bandwidthHz), quantisationVariance(range));
    }

    /**
     * The same variance from its parts that do not depend on the current, computed once per window (a window's
     * four quadrants share range and integration): shot noise 2e|I|B, plus {@code thermal}, plus
     * {@code quantisation}, summed in that order (the same bits as {@link #quadrantVariance(double, int, int)}).
     */
    public double quadrantVariance(double amps, double bandwidthHz, double thermal, double quantisation) {
        return 2 * PlasmaConstants.ELEMENTARY_CHARGE_C * Math.abs(amps) * bandwidthHz + thermal + quantisation;
    }

    /** B = 1/(2 T_int) of {@code periods} integration periods, Hz. */
    public double bandwidthHz(int periods) {
        return 1 / (2 * Math.max(1, periods) * instrument.modulator().modulationPeriodSeconds());
    }

    /** Johnson noise of the feedback resistor of {@code range} over {@code bandwidthHz}, 4kTB/R_f, A². */
    public double thermalVariance(int range, double bandwidthHz) {
        double feedbackOhms = instrument.gains().feedbackOhms(range);
        return 4 * PlasmaConstants.BOLTZMANN_J_PER_K * instrument.gains().temperatureK() * bandwidthHz / feedbackOhms;
    }

    /** Quantisation noise of {@code range}, LSB²/12, A². */
    public double quantisationVariance(int range) {
        double lsb = lsbAmps(range);
        return lsb * lsb / 12;
    }
}
