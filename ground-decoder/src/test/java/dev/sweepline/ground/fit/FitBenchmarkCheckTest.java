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
    }
}
