package dev.sweepline.sim.design;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.sim.cup.CupGeometry;
import dev.sweepline.sim.physics.PhysicalConstants;
import dev.sweepline.sim.plasma.ConvectedMaxwellian;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.MaxwellianWindow;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.preamp.Preamplifier;
import java.util.List;

/**
 * Fisher information about the protons' (n, U, w) carried by window measurements (physics.md,
 * Cramér-Rao bound: F_ab = Σ_j (∂I_j/∂θ_a)(∂I_j/∂θ_b)/σ_j²). Parameters are relative (θ/θ_true), so
 * the matrix is dimensionless and well conditioned; determinant ratios do not depend on that choice.
 * The noise of a window is that of the sum of the four quadrant channels: shot noise of the whole
 * window current, and per channel the feedback-resistor noise and the ADC's LSB²/12.
 */
public final class ProtonInformation {
    /** Parameters: relative density, bulk speed and thermal speed. */
    public static final int PARAMETERS = 3;
    private final double areaM2;
    private final Preamplifier preamp;

    /** Information for the cup's effective area and the noise of its preamplifier channels. */
    public ProtonInformation(CupGeometry cup, Preamplifier preamp) {
        this.areaM2 = cup.effectiveAreaM2();
        this.preamp = preamp;
    }

    /** The protons of {@code plasma}, or null. */
    public static IonPopulation protons(PlasmaState plasma) {
        List<IonPopulation> populations = plasma.populations();
        // by index: no iterator per call (once per step)
        for (int i = 0, n = populations.size(); i < n; i++) {
            IonPopulation p = populations.get(i);
            if (p.species() == IonSpecies.PROTON || p.species().equals(IonSpecies.PROTON)) {
                return p;
            }
        }
        return null;
    }

    /** Relative sensitivities θ_a ∂I/∂θ_a of the window [lowVolts, highVolts], amperes; into {@code out}. */
    public void gradient(PlasmaState plasma, IonPopulation p, double lowVolts, double highVolts, double[] out) {
        double q = p.species().chargeCoulomb();
        double m = p.species().massKg();
        double v1 = ConvectedMaxwellian.speedForVoltage(lowVolts, m, q);
        double v2 = ConvectedMaxwellian.speedForVoltage(highVolts, m, q);
        double n = p.densityPerM3();
        double u = p.vzMetresPerSecond();
        double w = plasma.normalThermalSpeed(p);
        ConvectedMaxwellian.relativeSensitivities(q, n, areaM2, u, w, v1, v2, out);
    }

    /**
     * {@link #gradient(PlasmaState, IonPopulation, double, double, double[])}, with the terms it shares with
     * the window current taken from {@code known} when that is the evaluation at the same speeds (the same
     * doubles either way).
     */
    public void gradient(PlasmaState plasma, IonPopulation p, double lowVolts, double highVolts,
            MaxwellianWindow known, double[] out) {
        double q = p.species().chargeCoulomb();
        double m = p.species().massKg();
        double v1 = ConvectedMaxwellian.speedForVoltage(lowVolts, m, q);
        double v2 = ConvectedMaxwellian.speedForVoltage(highVolts, m, q);
        ConvectedMaxwellian.relativeSensitivities(q, p.densityPerM3(), areaM2, p.vzMetresPerSecond(),
                plasma.normalThermalSpeed(p), v1, v2, known, out);
    }

    /** Variance of the summed window current, A², for a total current, gain range and integration time. */
    public double variance(double totalAmps, int range, double integrationSeconds) {
        double b = preamp.integrationBandwidthHz(integrationSeconds);
        return shotVariance(totalAmps, b) + channelsVariance(range, b);
    }

    /**
     * {@link #variance} at one integration time for many currents (the yardstick's windows): the
     * bandwidth and each range's channel noise evaluated once, the same doubles.
     */
    public Noise noiseAt(double integrationSeconds) {
        return new Noise(this, preamp.integrationBandwidthHz(integrationSeconds));
    }

    /** The variance of the summed window current at one integration time ({@link #noiseAt}). */
    public static final class Noise {
        private final double bandwidthHz;
        private final double[] channelsByRange;

        private Noise(ProtonInformation information, double bandwidthHz) {
            this.bandwidthHz = bandwidthHz;
            this.channelsByRange = new double[information.preamp.ranges()];
            for (int r = 0; r < channelsByRange.length; r++) {
                channelsByRange[r] = information.channelsVariance(r, bandwidthHz);
            }
        }

        /** {@link ProtonInformation#variance} of {@code totalAmps} read in {@code range}, A². */
        public double variance(double totalAmps, int range) {
            return shotVariance(totalAmps, bandwidthHz) + channelsByRange[range];
        }
    }

    /** Shot noise of the whole window current in bandwidth {@code b}, A². */
    private static double shotVariance(double totalAmps, double b) {
        return 2 * PhysicalConstants.ELEMENTARY_CHARGE_COULOMB * Math.abs(totalAmps) * b;
    }

    /** The four channels' feedback-resistor noise and LSB²/12 in {@code range} and bandwidth {@code b}, A². */
    private double channelsVariance(int range, double b) {
        double johnson = 4 * PhysicalConstants.BOLTZMANN_JOULE_PER_KELVIN * preamp.temperatureK() * b
                / preamp.feedbackOhms(range);
        double lsb = preamp.lsbAmps(range);
        return InstrumentDescription.QUADRANTS * (johnson + lsb * lsb / 12);
    }

    /**
     * Adds {@code weight} g gᵀ / variance to the 3x3 matrix {@code f}, element (a, b) as
     * {@code weight * g[a] * g[b] / variance}. With weight 1 that is g_a g_b / variance = g_b g_a / variance
     * exactly (1 x is x, and a product does not depend on the order of its two factors), so each pair
     * a ≤ b is computed once and added to both elements.
     */
    public static void accumulate(double[][] f, double[] g, double variance, double weight) {
        if (weight == 1.0) {
            for (int a = 0; a < PARAMETERS; a++) {
                for (int b = a; b < PARAMETERS; b++) {
                    double term = g[a] * g[b] / variance;
                    f[a][b] += term;
                    if (b != a) {
                        f[b][a] += term;
                    }
                }
            }
            return;
        }
        for (int a = 0; a < PARAMETERS; a++) {
            for (int b = 0; b < PARAMETERS; b++) {
                f[a][b] += weight * g[a] * g[b] / variance;
            }
        }
    }

    /** Determinant of a 3x3 matrix. */
    public static double det(double[][] f) {
        return f[0][0] * (f[1][1] * f[2][2] - f[1][2] * f[2][1]) - f[0][1] * (f[1][0] * f[2][2] - f[1][2] * f[2][0])
                + f[0][2] * (f[1][0] * f[2][1] - f[1][1] * f[2][0]);
    }

    /** Inverse of a 3x3 matrix (adjugate over determinant); null when singular. */
    public static double[][] inverse(double[][] f) {
        double d = det(f);
        if (!(Math.abs(d) > 0) || !Double.isFinite(d)) {
            return null;
        }
        double[][] inv = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                int r1 = (j + 1) % 3;
                int r2 = (j + 2) % 3;
                int c1 = (i + 1) % 3;
                int c2 = (i + 2) % 3;
                inv[i][j] = (f[r1][c1] * f[r2][c2] - f[r1][c2] * f[r2][c1]) / d;
            }
        }
        return inv;
    }
}
