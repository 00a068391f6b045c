package dev.sweepline.sim.preamp;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.sim.physics.PhysicalConstants;
import java.util.SplittableRandom;

/**
 * Collector preamplifier, synchronous demodulator and ADC of one quadrant, with the gain ranges of
 * one instrument description (physics.md "Noise and gain ranging"; instruments/FORMAT.md, preamp and adc).
 *
 * <p>Range r has full scale FS_r = FS_0 * ratio^r and feedback resistor R_f = V_fs / FS_r, so full
 * scale is V_fs ({@code outputFullScaleVolts}) at the amplifier output (demo cup: 40 pA * 32^r, 4 V).
 * The ADC is unsigned with a pedestal: counts = pedestal + round(I / LSB), LSB = FS / (top - pedestal),
 * clipped to 0..top (top = 2^bits - 1); a sample at the top code is saturated.
 *
 * <p>Calibration: the output is calibrated to the window current I. With square-wave modulation the
 * fundamental of the detected signal is (2/pi) I (physics.md); that factor is absorbed in the gain
 * of the demodulator chain, so it does not appear here.
 *
 * <p>Noise, added in amperes before quantisation: shot noise sqrt(2 e |I| B) and the feedback
 * resistor's Johnson noise sqrt(4 k T B / R_f), with the integration's equivalent noise bandwidth
 * B = 1/(2 T_int) (common practice), capped at the analog bandwidth; quantisation comes from the
 * rounding. Simplifications: the shot term uses the window current and the elementary charge;
 * strictly the demodulated output carries the shot noise of the whole collected current, and an
 * alpha carries 2e.
 *
 * <p>Threading: immutable apart from the caller's random stream; allocation-free.
 */
public final class Preamplifier {
    private final int ranges;
    private final int rangeRatioShift;
    private final long fullScaleRange0Femtoamps;
    private final int pedestalCounts;
    private final int topCode;
    /** Codes above the pedestal up to the top of the ADC. */
    private final int spanCounts;
    private final double outputFullScaleVolts;
    private final double temperatureK;
    private final double bandwidthHz;

    /**
     * The preamplifier and ADC of an instrument.
     *
     * @param d                    its ranges, full scale and ADC (the flight description)
     * @param outputFullScaleVolts amplifier output at full scale, volts (sets the feedback resistors)
     * @param temperatureK         feedback-resistor temperature, kelvin
     * @param bandwidthHz          analog bandwidth, hertz (caps the noise bandwidth)
     */
    public Preamplifier(InstrumentDescription d, double outputFullScaleVolts, double temperatureK, double bandwidthHz) {
        if (!(temperatureK >= 0) || !(outputFullScaleVolts > 0) || !(bandwidthHz > 0)) {
            throw new IllegalArgumentException("bad preamplifier: " + outputFullScaleVolts + " V full scale, "
                    + temperatureK + " K, " + bandwidthHz + " Hz");
        }
        this.ranges = d.gainRanges();
        this.rangeRatioShift = d.rangeRatioShift();
        this.fullScaleRange0Femtoamps = d.fullScaleRange0Femtoamps();
        this.pedestalCounts = d.pedestalCounts();
        this.topCode = d.adcTopCode();
        this.spanCounts = topCode - pedestalCounts;
        this.outputFullScaleVolts = outputFullScaleVolts;
        this.temperatureK = temperatureK;
        this.bandwidthHz = bandwidthHz;
    }

    /** Gain ranges. */
    public int ranges() {
        return ranges;
    }

    /** Feedback-resistor temperature, kelvin. */
    public double temperatureK() {
        return temperatureK;
    }

    /** Full scale of {@code range}, amperes: FS_0 * ratio^range. */
    public double fullScaleAmps(int range) {
        checkRange(range);
        return (fullScaleRange0Femtoamps << (rangeRatioShift * range)) * 1e-15;
    }

    /** Feedback resistor of {@code range}: output full scale / full scale, ohms. */
    public double feedbackOhms(int range) {
        return outputFullScaleVolts / fullScaleAmps(range);
    }

    /** Current of one ADC count in {@code range}, amperes. */
    public double lsbAmps(int range) {
        return fullScaleAmps(range) / spanCounts;
    }

    /** Noise bandwidth of an integration of {@code integrationSeconds}: 1/(2 T), at most the analog bandwidth, hertz. */
    public double integrationBandwidthHz(double integrationSeconds) {
        return Math.min(noiseBandwidthHz(integrationSeconds), bandwidthHz);
    }

    /** Equivalent noise bandwidth of an integration of {@code integrationSeconds}: 1/(2 T), hertz. */
    public static double noiseBandwidthHz(double integrationSeconds) {
        if (!(integrationSeconds > 0)) {
            throw new IllegalArgumentException("integration time must be positive: " + integrationSeconds);
        }
        return 0.5 / integrationSeconds;
    }

    /** Shot noise of a current in a bandwidth: sqrt(2 e |I| B), amperes rms. */
    public static double shotNoiseAmpsRms(double amps, double bandwidthHz) {
        return Math.sqrt(2 * PhysicalConstants.ELEMENTARY_CHARGE_COULOMB * Math.abs(amps) * bandwidthHz);
    }

    /** Johnson noise current of the feedback resistor of {@code range}: sqrt(4 k T B / R_f), amperes rms. */
    public double johnsonNoiseAmpsRms(int range, double bandwidthHz) {
        return Math.sqrt(4 * PhysicalConstants.BOLTZMANN_JOULE_PER_KELVIN * temperatureK * bandwidthHz / feedbackOhms(range));
    }

    /** Current at which shot and Johnson noise are equal: I* = 2kT/(e R_f), amperes (physics.md). */
    public double crossoverAmps(int range) {
        return 2 * PhysicalConstants.BOLTZMANN_JOULE_PER_KELVIN * temperatureK
                / (PhysicalConstants.ELEMENTARY_CHARGE_COULOMB * feedbackOhms(range));
    }

    /** Total input-referred noise for a current, range and integration time, amperes rms. */
    public double noiseAmpsRms(double amps, int range, double integrationSeconds) {
        double b = integrationBandwidthHz(integrationSeconds);
        double shot = shotNoiseAmpsRms(amps, b);
        double johnson = johnsonNoiseAmpsRms(range, b);
        return Math.sqrt(shot * shot + johnson * johnson);
    }

    /** Noise-free ADC code of a current: pedestal + round(I / LSB), clipped to 0..top. */
    public int countsFor(double amps, int range) {
        return counts(amps, lsbAmps(range));
    }

    /** {@link #countsFor} with the range's LSB given, amperes. */
    private int counts(double amps, double lsbAmps) {
        double c = pedestalCounts + Math.rint(amps / lsbAmps);
        if (!(c > 0)) {
            return 0;
        }
        return c >= topCode ? topCode : (int) c;
    }

    /**
     * One demodulated sample: the current plus Gaussian noise, quantised and clipped.
     *
     * @param amps               true window current on this quadrant, amperes
     * @param range              gain range, 0..{@link InstrumentDescription#gainRanges} - 1
     * @param integrationSeconds integration time, seconds
     * @param rng                the caller's seeded random stream
     * @return ADC counts, 0..top
     */
    public int sample(double amps, int range, double integrationSeconds, SplittableRandom rng) {
        return countsFor(amps + noiseAmpsRms(amps, range, integrationSeconds) * rng.nextGaussian(), range);
    }

    /**
     * One sample of each quadrant, in order, in one range and integration: {@link #sample} of each
     * current into {@code countsOut}, the same draws and the same codes, with the bandwidth, the Johnson
     * noise and the LSB of the range evaluated once.
     */
    public void sample(double[] quadrantAmps, int range, double integrationSeconds, SplittableRandom rng,
            int[] countsOut) {
        double b = integrationBandwidthHz(integrationSeconds);
        double johnson = johnsonNoiseAmpsRms(range, b);
        double lsb = lsbAmps(range);
        for (int q = 0; q < quadrantAmps.length; q++) {
            double amps = quadrantAmps[q];
            double shot = shotNoiseAmpsRms(amps, b);
            double noise = Math.sqrt(shot * shot + johnson * johnson);
            countsOut[q] = counts(amps + noise * rng.nextGaussian(), lsb);
        }
    }

    /** Current of an ADC code in {@code range} (the inverse of the quantiser, for truth and tests), amperes. */
    public double amps(int counts, int range) {
        return (counts - pedestalCounts) * lsbAmps(range);
    }

    /** True when a code sits at the top of the ADC range. */
    public boolean isSaturated(int counts) {
        return counts >= topCode;
    }

    private void checkRange(int range) {
        if (range < 0 || range >= ranges) {
            throw new IllegalArgumentException("no gain range " + range);
        }
    }
}
