package dev.sweepline.sim.preamp;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.sim.physics.PhysicalConstants;
import java.util.SplittableRandom;

/**
 * Collector preamplifier, synchronous demodulator and 16-bit ADC of one quadrant, with three gain
 * ranges (physics.md "Noise and gain ranging"; {@code instruments/demo-cup.yaml}).
 *
 * <p>Range r has full scale FS_r = 40 pA * 32^r (40 pA, 1.28 nA, 40.96 nA) and feedback resistor
 * R_f = 4 V / FS_r, so full scale is 4 V at the amplifier output. The ADC is unsigned 16-bit with a
 * pedestal: counts = pedestal + round(I / LSB), LSB = FS / (65535 - pedestal), clipped to 0..65535;
 * a sample at the top code is saturated.
 *
 * <p>Calibration: the output is calibrated to the window current I. With square-wave modulation the
 * fundamental of the detected signal is (2/pi) I (physics.md); that factor is absorbed in the gain
 * of the demodulator chain, so it does not appear here.
 *
 * <p>Noise, added in amperes before quantisation: shot noise sqrt(2 e |I| B) and the feedback
 * resistor's Johnson noise sqrt(4 k T B / R_f), with the integration's equivalent noise bandwidth
 * B = 1/(2 T_int) (common practice); quantisation comes from the rounding. Simplifications: the
 * shot term uses the window current and the elementary charge; strictly the demodulated output
 * carries the shot noise of the whole collected current, and an alpha carries 2e.
 *
 * <p>Threading: stateless apart from the caller's random stream; allocation-free.
 */
public final class Preamplifier {
    /** The demo cup's flight description (instruments/demo-cup.yaml), the instrument this part models. */
    private static final InstrumentDescription DEMO = Instruments.defaultSpec().flight();
    /** Amplifier output at full scale, volts (invented demo value, see the class comment). */
    public static final double FULL_SCALE_VOLTS = 4.0;
    /** Feedback-resistor temperature of the demo unit, kelvin (room temperature: common practice). */
    public static final double DEMO_TEMPERATURE_K = 300.0;
    /** Codes above the pedestal up to the top of the ADC. */
    private static final int SPAN_COUNTS = DEMO.adcTopCode() - DEMO.pedestalCounts();

    private final double temperatureK;

    /** A preamplifier with its feedback resistors at {@link #DEMO_TEMPERATURE_K}. */
    public Preamplifier() {
        this(DEMO_TEMPERATURE_K);
    }

    /** A preamplifier with its feedback resistors at {@code temperatureK}. */
    public Preamplifier(double temperatureK) {
        if (!(temperatureK >= 0)) {
            throw new IllegalArgumentException("temperature must be non-negative: " + temperatureK);
        }
        this.temperatureK = temperatureK;
    }

    /** Full scale of {@code range}, amperes: 40 pA * 32^range. */
    public static double fullScaleAmps(int range) {
        checkRange(range);
        return (DEMO.fullScaleRange0Femtoamps() << (DEMO.rangeRatioShift() * range)) * 1e-15;
    }

    /** Feedback resistor of {@code range}: 4 V / full scale, ohms. */
    public static double feedbackOhms(int range) {
        return FULL_SCALE_VOLTS / fullScaleAmps(range);
    }

    /** Current of one ADC count in {@code range}, amperes. */
    public static double lsbAmps(int range) {
        return fullScaleAmps(range) / SPAN_COUNTS;
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
        double b = noiseBandwidthHz(integrationSeconds);
        double shot = shotNoiseAmpsRms(amps, b);
        double johnson = johnsonNoiseAmpsRms(range, b);
        return Math.sqrt(shot * shot + johnson * johnson);
    }

    /** Noise-free ADC code of a current: pedestal + round(I / LSB), clipped to 0..65535. */
    public static int countsFor(double amps, int range) {
        double c = DEMO.pedestalCounts() + Math.rint(amps / lsbAmps(range));
        if (!(c > 0)) {
            return 0;
        }
        return c >= DEMO.adcTopCode() ? DEMO.adcTopCode() : (int) c;
    }

    /**
     * One demodulated sample: the current plus Gaussian noise, quantised and clipped.
     *
     * @param amps               true window current on this quadrant, amperes
     * @param range              gain range, 0..{@link InstrumentDescription#gainRanges} - 1
     * @param integrationSeconds integration time, seconds
     * @param rng                the caller's seeded random stream
     * @return ADC counts, 0..65535
     */
    public int sample(double amps, int range, double integrationSeconds, SplittableRandom rng) {
        return countsFor(amps + noiseAmpsRms(amps, range, integrationSeconds) * rng.nextGaussian(), range);
    }

    /** Current of an ADC code in {@code range} (the inverse of the quantiser, for truth and tests), amperes. */
    public static double amps(int counts, int range) {
        return (counts - DEMO.pedestalCounts()) * lsbAmps(range);
    }

    /** True when a code sits at the top of the ADC range. */
    public static boolean isSaturated(int counts) {
        return counts >= DEMO.adcTopCode();
    }

    private static void checkRange(int range) {
        if (range < 0 || range >= DEMO.gainRanges()) {
            throw new IllegalArgumentException("no gain range " + range);
        }
    }
}
