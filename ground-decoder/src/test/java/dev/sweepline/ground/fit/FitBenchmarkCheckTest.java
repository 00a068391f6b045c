package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The fit benchmark refuses a wrong result instead of timing it (FitBenchmark, issue "benchmarks that cannot lie"). */
class FitBenchmarkCheckTest {
    @Test
    void shouldThrowOnABrokenInputAndPassAGoodFit() {
        FitBenchmark b = new FitBenchmark();
        b.build();
        // every benchmark's next spectrum fits, with alphas where the benchmark says so (no exception)
        b.referenceProtons();
        b.focus32Protons();
        b.nearSunFocusJoint();
        b.nearSunSurveyJoint();
        // one broken input: an all-zero spectrum is flagged NO_SIGNAL (F5), and the check throws
        SpectrumInput zero = SpectrumInput.summed(ReferenceCase.low(), ReferenceCase.high(),
                new double[ReferenceCase.WINDOWS], ReferenceCase.SIGMA);
        SpectrumFitter fitter = new SpectrumFitter();
        assertThrows(IllegalStateException.class, () -> FitBenchmark.checked(fitter.fit(zero), false));
        // a proton-only fit where alphas are expected is wrong too
        PlasmaFit protons = fitter.fit(b.reference[0]);
        assertThrows(IllegalStateException.class, () -> FitBenchmark.checked(protons, true));
        // the holder path the benchmarks time: the broken input throws, and so does a fit out of the truth's bounds
        MutablePlasmaFit holder = new MutablePlasmaFit();
        fitter.fitInto(zero, null, holder);
        assertThrows(IllegalStateException.class,
                () -> FitBenchmark.checked(holder, false, FitBenchmark.REFERENCE_TRUTH));
        fitter.fitInto(b.reference[0], null, holder);
        FitBenchmark.checked(holder, false, FitBenchmark.REFERENCE_TRUTH);
        // the same good fit against a truth twice as dense: n_p is 50 % off, beyond the bound
        double[] wrongTruth = FitBenchmark.REFERENCE_TRUTH.clone();
        wrongTruth[0] *= 2;
        assertThrows(IllegalStateException.class, () -> FitBenchmark.checked(holder, false, wrongTruth));
    }
}
