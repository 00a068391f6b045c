package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.bound.CramerRaoBound;
import dev.sweepline.ground.bound.FisherMatrix;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ReferenceTrialsTest {
    /** Trials: physics.md asks for ≥ 500. */
    static final int TRIALS = 500;
    /** Recorded seed. */
    static final long SEED = 20260401L;

    @Test
    void shouldReachTheCramerRaoBoundOverFiveHundredNoisyTrials() {
        double[] truth = {ReferenceCase.DENSITY, ReferenceCase.SPEED, ReferenceCase.thermalSpeed()};
        double[] clean = ReferenceCase.currents();
        double[] sig = new double[ReferenceCase.WINDOWS];
        Arrays.fill(sig, ReferenceCase.SIGMA);
        CramerRaoBound bound = FisherMatrix.protons(ReferenceCase.low(), ReferenceCase.high(), sig,
                ReferenceCase.AREA, truth[0], truth[1], truth[2]);
        Random rng = new Random(SEED);
        SpectrumFitter fitter = new SpectrumFitter();
        double[] sum = new double[3];
        double[] sum2 = new double[3];
        for (int t = 0; t < TRIALS; t++) {
            double[] noisy = new double[clean.length];
            for (int j = 0; j < clean.length; j++) {
                noisy[j] = clean[j] + ReferenceCase.SIGMA * rng.nextGaussian();
            }
            PlasmaFit f = fitter.fit(SpectrumInput.summed(ReferenceCase.low(), ReferenceCase.high(), noisy,
                    ReferenceCase.SIGMA));
            assertTrue(f.ok(), f.flagText());
            double[] p = f.normalParameters();
            for (int a = 0; a < 3; a++) {
                double e = p[a] - truth[a];
                sum[a] += e;
                sum2[a] += e * e;
            }
        }
        String[] names = {"n", "U", "w"};
        for (int a = 0; a < 3; a++) {
            double bias = sum[a] / TRIALS;
            double scatter = Math.sqrt(sum2[a] / TRIALS - bias * bias);
            double ratio = scatter / bound.sigma()[a];
            System.out.printf("reference trials %s: scatter/CRLB %.4f, bias/CRLB %+.4f%n", names[a], ratio,
                    bias / bound.sigma()[a]);
            // physics.md: a good fitter's scatter over ≥ 500 trials is 0.85–1.2 × the bound with bias below
            // 0.3 × the bound (the statistical error of a 500-sample scatter is ~3 %, of the bias ~0.045)
            assertTrue(ratio >= 0.85 && ratio <= 1.2, names[a] + " scatter/CRLB " + ratio);
            assertTrue(Math.abs(bias) < 0.3 * bound.sigma()[a], names[a] + " bias/CRLB " + bias / bound.sigma()[a]);
        }
    }

    @Test
    void shouldReportTheCovarianceOfTheBoundAtTheTruth() {
        // noise-free data: the fit returns the truth, and its covariance (JᵀWJ)⁻¹ equals F⁻¹ (same
        // definition, physics.md); tolerance 1e-6 relative for the optimiser's convergence
        PlasmaFit f = new SpectrumFitter().fit(SpectrumInput.summed(ReferenceCase.low(), ReferenceCase.high(),
                ReferenceCase.currents(), ReferenceCase.SIGMA));
        assertTrue(f.ok());
        assertEquals(ReferenceCase.DENSITY, f.protons().densityPerM3(), 1e-6 * ReferenceCase.DENSITY);
        assertEquals(ReferenceCase.SPEED, f.protons().speedMPerS(), 1e-6 * ReferenceCase.SPEED);
        assertEquals(ReferenceCase.TEMPERATURE, f.protons().temperatureK(), 1e-5 * ReferenceCase.TEMPERATURE);
        // physics.md σ_n 0.0861 % of 5 cm⁻³, to the digits given
        assertEquals(0.0861e-2, f.protons().sigmaDensityPerM3() / ReferenceCase.DENSITY, 0.00005e-2);
        assertEquals(2 * f.protons().sigmaThermalSpeedMPerS() / f.protons().thermalSpeedMPerS(),
                f.protons().sigmaTemperatureK() / f.protons().temperatureK(), 1e-12);
    }
}
