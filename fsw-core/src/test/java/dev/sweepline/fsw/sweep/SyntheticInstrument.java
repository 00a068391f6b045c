package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import java.util.Random;

/**
 * A test-side instrument: answers step commands with the window currents of a convected Maxwellian
 * of protons and alphas, read through the demo preamplifier (three ranges, 16-bit ADC with pedestal)
 * with seeded Gaussian noise.
 *
 * <p>Where the shape comes from: the window current of physics.md "Window current of a convected
 * Maxwellian", I = q n A [ (U/2)(erf x2 - erf x1) + (w / (2 sqrt(pi)))(e1 - e2) ], with
 * v_i = sqrt(2 q V_i / m); erf from Abramowitz &amp; Stegun 7.1.26 (|error| &lt;= 1.5e-7). The current is
 * shared equally by the four quadrants (flow along the cup normal). Constants are CODATA 2018
 * (physics.md, constants). Floating point is fine here: this is the test's plasma, not flight code.
 */
public final class SyntheticInstrument {
    /** Elementary charge, C (CODATA 2018, physics.md). */
    public static final double E_CHARGE = 1.602176634e-19;
    /** Proton mass, kg (CODATA 2018, physics.md). */
    public static final double PROTON_MASS = 1.67262192369e-27;
    /** Alpha mass, kg (CODATA 2018, physics.md). */
    public static final double ALPHA_MASS = 6.6446573357e-27;
    /** Boltzmann constant, J/K (CODATA 2018, physics.md). */
    public static final double BOLTZMANN = 1.380649e-23;

    /** Proton density, per cm^3. */
    public double protonDensityPerCm3 = 5;
    /** Bulk speed, km/s. */
    public double speedKmPerS = 400;
    /** Proton thermal speed w = sqrt(2kT/m), km/s. */
    public double protonThermalKmPerS = 40.6310;
    /** He/H density ratio. */
    public double alphaPerProton = 0.04;
    /** T_alpha / T_p (physics.md: about 4 in fast wind). */
    public double alphaTemperatureRatio = 4;
    /** Collecting area, cm^2. */
    public double areaCm2 = 1;
    /** Noise per quadrant, ADC counts rms. */
    public double noiseCounts = 2;
    /** When true, every reply is lost (for time-out tests). */
    public boolean mute;

    private final Random random;

    /** @param seed recorded seed of the noise */
    public SyntheticInstrument(long seed) {
        this.random = new Random(seed);
    }

    /** Abramowitz &amp; Stegun 7.1.26, |error| &lt;= 1.5e-7. */
    public static double erf(double x) {
        double t = 1 / (1 + 0.3275911 * Math.abs(x));
        double poly = t * (0.254829592 + t * (-0.284496736 + t * (1.421413741 + t * (-1.453152027 + t * 1.061405429))));
        double y = 1 - poly * Math.exp(-x * x);
        return x >= 0 ? y : -y;
    }

    /**
     * physics.md window current of one species, amperes.
     *
     * @param chargeNumber 1 for protons, 2 for alphas
     */
    public static double windowCurrent(double densityPerCm3, double speedKmPerS, double thermalKmPerS,
                                       double massKg, int chargeNumber, double areaCm2,
                                       double lowVolts, double highVolts) {
        double q = chargeNumber * E_CHARGE;
        double u = speedKmPerS * 1e3;
        double w = thermalKmPerS * 1e3;
        double v1 = Math.sqrt(2 * q * lowVolts / massKg);
        double v2 = Math.sqrt(2 * q * highVolts / massKg);
        double x1 = (v1 - u) / w;
        double x2 = (v2 - u) / w;
        double bracket = u / 2 * (erf(x2) - erf(x1)) + w / (2 * Math.sqrt(Math.PI)) * (Math.exp(-x1 * x1) - Math.exp(-x2 * x2));
        return q * densityPerCm3 * 1e6 * areaCm2 * 1e-4 * bracket;
    }

    /** Thermal speed, km/s, of a species of mass {@code massKg} at temperature {@code kelvin}. */
    public static double thermalKmPerS(double kelvin, double massKg) {
        return Math.sqrt(2 * BOLTZMANN * kelvin / massKg) / 1e3;
    }

    /** Total (protons + alphas) current of a window between two DAC codes, amperes. */
    public double currentAmps(int dacLow, int dacHigh) {
        double lowVolts = dacLow * DemoCup.INSTRUMENT.millivoltsPerCode() / 1000.0;
        double highVolts = dacHigh * DemoCup.INSTRUMENT.millivoltsPerCode() / 1000.0;
        double protons = windowCurrent(protonDensityPerCm3, speedKmPerS, protonThermalKmPerS, PROTON_MASS, 1,
            areaCm2, lowVolts, highVolts);
        double protonKelvin = protonThermalKmPerS * 1e3 * protonThermalKmPerS * 1e3 * PROTON_MASS / (2 * BOLTZMANN);
        double alphaThermal = thermalKmPerS(protonKelvin * alphaTemperatureRatio, ALPHA_MASS);
        double alphas = windowCurrent(protonDensityPerCm3 * alphaPerProton, speedKmPerS, alphaThermal, ALPHA_MASS, 2,
            areaCm2, lowVolts, highVolts);
        return protons + alphas;
    }

    /** Proton peak E/q of the present plasma, volts: m_p U^2 / (2e) (physics.md: 835.175 V at 400 km/s). */
    public double protonPeakVolts() {
        double u = speedKmPerS * 1e3;
        return PROTON_MASS * u * u / (2 * E_CHARGE);
    }

    /**
     * Answers a step: current split over four quadrants, scaled to the commanded range, pedestal and
     * noise added, clipped to the ADC.
     *
     * @return false when muted (the reply is lost)
     */
    public boolean answer(StepCommand step, SampleReply out) {
        if (mute) {
            return false;
        }
        out.sequence = step.sequence;
        out.gainRange = step.gainRange;
        out.hvMonitorCode = step.hvEnabled ? step.dacHigh : 0;
        out.status = step.hvEnabled ? 0 : SampleReply.STATUS_HV_OFF;
        double amps = step.hvEnabled ? currentAmps(step.dacLow, step.dacHigh) : 0;
        double fullScaleAmps = DemoCup.INSTRUMENT.fullScaleRange0Femtoamps() * 1e-15
            * (1L << (DemoCup.INSTRUMENT.rangeRatioShift() * step.gainRange));
        double countsPerAmp = (DemoCup.INSTRUMENT.adcTopCode() - DemoCup.INSTRUMENT.pedestalCounts()) / fullScaleAmps;
        for (int q = 0; q < InstrumentDescription.QUADRANTS; q++) {
            long counts = Math.round(DemoCup.INSTRUMENT.pedestalCounts() + amps / 4 * countsPerAmp
                + noiseCounts * random.nextGaussian());
            if (counts >= DemoCup.INSTRUMENT.adcTopCode()) {
                counts = DemoCup.INSTRUMENT.adcTopCode();
                out.status |= SampleReply.STATUS_SATURATED;
            }
            out.quadrant[q] = (int) Math.max(0, counts);
        }
        return true;
    }

    /** Window index (fractional) of {@code volts} in a contiguous log-spaced table from {@code lowVolts} to {@code highVolts}. */
    public static double logWindow(double volts, int windows, double lowVolts, double highVolts) {
        return windows * Math.log(volts / lowVolts) / Math.log(highVolts / lowVolts);
    }
}
