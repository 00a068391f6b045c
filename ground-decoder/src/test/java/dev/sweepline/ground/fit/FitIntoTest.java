package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The holder path {@link SpectrumFitter#fitInto} against the public {@link SpectrumFitter#fit}, and the warm
 * start from the previous spectrum against the cold start.
 */
class FitIntoTest {
    @Test
    void shouldGiveTheSameFitBitForBitThroughTheHolder() {
        FitBenchmark b = new FitBenchmark();
        b.build();
        SpectrumFitter fitter = new SpectrumFitter();
        MutablePlasmaFit holder = new MutablePlasmaFit();
        SpectrumInput zero = SpectrumInput.summed(ReferenceCase.low(), ReferenceCase.high(),
                new double[ReferenceCase.WINDOWS], ReferenceCase.SIGMA);
        SpectrumInput[][] pools = {b.reference, b.focus32, b.focus, b.survey, {zero}};
        int alphas = 0;
        for (SpectrumInput[] pool : pools) {
            for (SpectrumInput in : pool) {
                PlasmaFit f = fitter.fit(in);
                fitter.fitInto(in, null, holder);
                // the holder, reused across shapes and after failures, holds exactly the public fit
                assertSame(f, holder.toPlasmaFit());
                assertEquals(f.ok(), holder.ok());
                assertEquals(f.alphasFitted(), holder.alphasFitted());
                alphas += f.alphasFitted() ? 1 : 0;
            }
        }
        // the joint pools carry alphas (NearSunCase, 3 % alphas in the windows), so both paths were compared
        assertTrue(alphas >= FitBenchmark.POOL, "joint fits compared: " + alphas);
    }

    @Test
    void shouldAgreeWithTheColdStartAndIterateLessOnATimeSeries() {
        // a time series of the reference plasma: the speed drifts 400 → 420 km/s over 60 spectra, n and T by ±5 %
        Random rng = new Random(4711L);
        SpectrumFitter fitter = new SpectrumFitter();
        MutablePlasmaFit cold = new MutablePlasmaFit();
        MutablePlasmaFit warm = new MutablePlasmaFit().warmStart(true);
        PlasmaModel model = new PlasmaModel(ReferenceCase.low(), ReferenceCase.high(), ReferenceCase.AREA, false);
        int coldIterations = 0;
        int warmIterations = 0;
        int warmStarted = 0;
        for (int k = 0; k < 60; k++) {
            double s = k / 59.0;
            double[] truth = {ReferenceCase.DENSITY * (1 + 0.05 * Math.sin(6 * s)), ReferenceCase.SPEED + 20e3 * s,
                ReferenceCase.thermalSpeed() * (1 - 0.05 * Math.cos(5 * s))};
            double[] amps = new double[ReferenceCase.WINDOWS];
            model.evaluate(truth, amps, null);
            for (int j = 0; j < amps.length; j++) {
                amps[j] += ReferenceCase.SIGMA * rng.nextGaussian();
            }
            SpectrumInput in = SpectrumInput.summed(ReferenceCase.low(), ReferenceCase.high(), amps, ReferenceCase.SIGMA);
            fitter.fitInto(in, null, cold);
            fitter.fitInto(in, null, warm);
            assertTrue(cold.ok() && warm.ok(), "spectrum " + k);
            assertEquals(cold.parameterCount(), warm.parameterCount(), "spectrum " + k);
            PlasmaFit c = cold.toPlasmaFit();
            double[] sigma = {c.protons().sigmaDensityPerM3(), c.protons().sigmaSpeedMPerS(),
                c.protons().sigmaThermalSpeedMPerS()};
            for (int i = 0; i < PlasmaModel.PROTON_PARAMETERS; i++) {
                // MINPACK's ftol test (LevenbergMarquardt.COST_TOLERANCE) ends a run once a Gauss–Newton step
                // predicts a relative drop of χ² under it: the step's χ² drop, the decrement d = δᵀJᵀJδ, is then
                // below COST_TOLERANCE χ², and the point within √(C_aa d) ≤ σ_a √(COST_TOLERANCE χ²) of the
                // minimum (Cauchy–Schwarz in the metric JᵀJ); the two runs differ by at most twice that
                double p = cold.normalParameter(i);
                double tolerance = 2 * sigma[i] * Math.sqrt(LevenbergMarquardt.COST_TOLERANCE
                        * c.reducedChiSquare() * (ReferenceCase.WINDOWS - PlasmaModel.PROTON_PARAMETERS));
                assertEquals(p, warm.normalParameter(i), tolerance, "spectrum " + k + " parameter " + i);
            }
            coldIterations += cold.iterations();
            warmIterations += warm.iterations();
            warmStarted += warm.warmStarted() ? 1 : 0;
        }
        // every spectrum after the first starts from its predecessor's solution
        assertEquals(59, warmStarted);
        assertTrue(warmIterations < coldIterations, "iterations warm " + warmIterations + " cold " + coldIterations);
    }

    @Test
    void shouldAllocateNothingPerFitAfterWarmUp() {
        FitBenchmark b = new FitBenchmark();
        b.build();
        SpectrumFitter fitter = new SpectrumFitter();
        MutablePlasmaFit holder = new MutablePlasmaFit();
        com.sun.management.ThreadMXBean threads =
                (com.sun.management.ThreadMXBean) java.lang.management.ManagementFactory.getThreadMXBean();
        SpectrumInput[][] pools = {b.reference, b.focus32, b.focus, b.survey};
        String[] names = {"14 windows", "32 windows", "64 windows joint", "128 windows joint"};
        for (int k = 0; k < pools.length; k++) {
            // warm-up: the first pass builds this shape's models and grows the optimiser's workspace
            for (SpectrumInput in : pools[k]) {
                fitter.fitInto(in, null, holder);
            }
            long before = threads.getCurrentThreadAllocatedBytes();
            for (SpectrumInput in : pools[k]) {
                fitter.fitInto(in, null, holder);
            }
            long bytes = threads.getCurrentThreadAllocatedBytes() - before;
            // the per-thread allocation counter of the JVM (com.sun.management.ThreadMXBean): 0 bytes in 64 fits
            assertEquals(0, bytes, names[k] + ": bytes allocated by 64 fits after warm-up");
            assertTrue(holder.ok(), names[k]);
        }
    }

    /** Field by field, the arrays by content. */
    private static void assertSame(PlasmaFit want, PlasmaFit got) {
        assertEquals(want.protons(), got.protons());
        assertEquals(want.alphas(), got.alphas());
        assertEquals(want.angles(), got.angles());
        assertEquals(Double.doubleToLongBits(want.reducedChiSquare()), Double.doubleToLongBits(got.reducedChiSquare()));
        assertEquals(want.windowsUsed(), got.windowsUsed());
        assertEquals(want.iterations(), got.iterations());
        assertEquals(want.flags(), got.flags());
        assertArrayEquals(want.normalParameters(), got.normalParameters());
        assertEquals(Double.doubleToLongBits(want.areaM2()), Double.doubleToLongBits(got.areaM2()));
        assertEquals(want.alphaPrior(), got.alphaPrior());
        assertEquals(Double.doubleToLongBits(want.sigmaLogArea()), Double.doubleToLongBits(got.sigmaLogArea()));
    }
}
