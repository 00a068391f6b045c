package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.bound.FisherMatrix;
import dev.sweepline.ground.spectrum.SpectrumValues;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Interleaved spectra whose speed drift ΔU the data cannot give (docs/physics.md, "Speed drift within an
 * interleaved sweep"): the drift fit is then not kept, the spectrum keeps the fit without ΔU, and ΔU stays NaN
 * (written empty / null, never a number). {@link NearSunCase}'s protons (n 3600 cm⁻³, U 300 km/s, T_p 6e5 K) on
 * bands of the demo cup's default table around their peak, τ_j from ICD §4's step rule over c − 1, noise-free
 * currents with the ICD §8 noise as weights.
 */
class DriftFitDegenerateTest {
    private static final double[] LOW = NearSunCase.low();
    private static final double[] HIGH = NearSunCase.high();
    private static final int PEAK;

    static {
        double peakVolts = Species.PROTON.voltsAtSpeed(NearSunCase.U);
        int peak = 0;
        while (peak < LOW.length - 1 && HIGH[peak] < peakVolts) {
            peak++;
        }
        PEAK = peak;
    }

    private static double[] band(double[] edges, int c) {
        return Arrays.copyOfRange(edges, PEAK - c / 2, PEAK - c / 2 + c);
    }

    private static double[] tau(int c) {
        double[] t = new double[c];
        for (int j = 0; j < c; j++) {
            t[j] = SpectrumValues.stepOf(j, c, false, true) / (double) (c - 1);
        }
        return t;
    }

    /** The protons' currents on the band of {@code c} windows read at {@code tau} with a change {@code du}. */
    private static SpectrumInput spectrum(int c, double du, double[] tau) {
        double[] lo = band(LOW, c);
        double[] hi = band(HIGH, c);
        double[] amps = new double[c];
        double[] p = NearSunCase.truth();
        new PlasmaModel(lo, hi, DemoCup.CUP.effectiveAreaM2(), false, tau(c)).evaluate(new double[] {p[0], p[1], p[2], du},
                amps, null);
        return new SpectrumInput(lo, hi, amps, NearSunCase.sigma(amps), null, null, 0, 0, tau);
    }

    @Test
    void shouldKeepADegreeOfFreedomForTheDriftFit() {
        SpectrumFitter fitter = new SpectrumFitter(DemoCup.CUP);
        // 4 windows: the proton fit has one degree of freedom (SpectrumFitter.MIN_WINDOWS), the drift model's 4
        // parameters none; the fit without ΔU stays and its reduced χ² is a number
        SpectrumInput four = spectrum(4, 1e3, tau(4));
        PlasmaFit f4 = fitter.fit(four);
        assertTrue(f4.ok(), f4.flagText());
        assertFalse(f4.driftFitted(), "ΔU from 4 windows: " + f4.speedChangeMPerS());
        assertTrue(Double.isNaN(f4.speedChangeMPerS()) && Double.isNaN(f4.sigmaSpeedChangeMPerS()));
        assertTrue(Double.isFinite(f4.reducedChiSquare()), "reduced χ² " + f4.reducedChiSquare());
        // the same as the spectrum fitted without its order, bit for bit
        PlasmaFit plain = fitter.fit(four.withStepFraction(null));
        assertArrayEquals(plain.normalParameters(), f4.normalParameters());
        // 5 windows leave the drift model one: ΔU is fitted, its reduced χ² a number
        PlasmaFit f5 = fitter.fit(spectrum(5, 1e3, tau(5)));
        assertTrue(f5.ok() && f5.driftFitted(), f5.flagText());
        assertTrue(Double.isFinite(f5.reducedChiSquare()) && Double.isFinite(f5.sigmaSpeedChangeMPerS()));
    }

    @Test
    void shouldLeaveDeltaUUnknownWhenEveryWindowHasTheSameStepFraction() {
        // τ all equal: ∂I/∂ΔU = (τ − ½) ∂I/∂U is U's column times one number (or 0 at τ = ½), so the data
        // cannot tell ΔU from U: the drift model's F is singular and ΔU is not reported
        SpectrumFitter fitter = new SpectrumFitter(DemoCup.CUP);
        int c = 32;
        SpectrumInput reference = spectrum(c, 1e3, tau(c));
        PlasmaFit plain = fitter.fit(reference.withStepFraction(null));
        for (double t : new double[] {0.5, 0.3, 1.0}) {
            double[] same = new double[c];
            Arrays.fill(same, t);
            PlasmaFit f = fitter.fit(reference.withStepFraction(same));
            assertTrue(f.ok(), f.flagText());
            assertFalse(f.driftFitted(), "τ = " + t + ": ΔU " + f.speedChangeMPerS());
            assertTrue(Double.isNaN(f.speedChangeMPerS()) && Double.isNaN(f.sigmaSpeedChangeMPerS()));
            assertArrayEquals(plain.normalParameters(), f.normalParameters(), "τ = " + t);
            double[] p = Arrays.copyOf(f.normalParameters(), 4);
            assertTrue(FisherMatrix.bound(new PlasmaModel(reference.lowVolts(), reference.highVolts(),
                    DemoCup.CUP.effectiveAreaM2(), false, same), p, reference.sigmaAmps()).singular(), "τ = " + t);
        }
    }

    @Test
    void shouldNotReportADriftHeldAtItsIterationGuard() {
        // a zigzag no wind makes: ±300 km/s over one sweep, three times the guard PlasmaModel.MAX_SPEED_CHANGE
        // (100 km/s); the optimiser stops at the guard, which is no minimum, so ΔU is not a product
        SpectrumFitter fitter = new SpectrumFitter(DemoCup.CUP);
        for (double du : new double[] {3e5, -3e5}) {
            PlasmaFit f = fitter.fit(spectrum(32, du, tau(32)));
            assertFalse(f.driftFitted(), "ΔU " + du + ": fitted " + f.speedChangeMPerS());
            assertTrue(Double.isNaN(f.speedChangeMPerS()));
        }
        // inside the guard it is fitted, to the truth (noise-free: to 1e-6 of it, the solution's last digits)
        PlasmaFit f = fitter.fit(spectrum(32, 5e4, tau(32)));
        assertTrue(f.driftFitted(), f.flagText());
        assertEquals(5e4, f.speedChangeMPerS(), 5e4 * 1e-6);
    }
}
