package dev.sweepline.ground.fit;

import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Fit rate, spectra per second on one thread (one core): the score is ops/s, one op one spectrum fitted.
 * Three shapes: the physics.md reference case (14 windows, protons only), a near-Sun survey spectrum
 * (128 windows of the default table, joint protons + alphas, NearSunCase) and a near-Sun focus-like band
 * (the 64 windows around the proton and alpha peaks, joint). Each draws from a pool of 64 noisy spectra
 * made once from a recorded seed, so that no two consecutive fits see the same data. Every fit is
 * checked ({@link #checked}): a fit that is not ok throws, which fails the run.
 *
 * <p>Run: {@code mvn -q -o -pl ground-decoder -Pjmh verify -DskipTests -Djmh.includes=FitBenchmark
 * -Djmh.args="-f 1 -wi 3 -w 2 -i 5 -r 2"} (with {@code -am} the parent module's exec finds no benchmark
 * list here). Measured on the shared 2-core machine: 14 windows 7.5e3 ± 1.4e4 ops/s (contended), 64
 * windows joint 1109 ± 199 ops/s, 128 windows joint 562 ± 77 ops/s.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FitBenchmark {
    static final int POOL = 64;
    static final long SEED = 31337L;

    SpectrumInput[] reference = new SpectrumInput[POOL];
    SpectrumInput[] survey = new SpectrumInput[POOL];
    SpectrumInput[] focus = new SpectrumInput[POOL];
    final SpectrumFitter fitter = new SpectrumFitter();
    int next;

    /** Builds the pools. */
    @Setup(Level.Trial)
    public void build() {
        Random rng = new Random(SEED);
        double[] ref = ReferenceCase.currents();
        double[] near = NearSunCase.currents();
        double[] nearSigma = NearSunCase.sigma(near);
        int from = 52;
        int to = from + 64;
        for (int k = 0; k < POOL; k++) {
            double[] r = new double[ref.length];
            for (int j = 0; j < r.length; j++) {
                r[j] = ref[j] + ReferenceCase.SIGMA * rng.nextGaussian();
            }
            reference[k] = SpectrumInput.summed(ReferenceCase.low(), ReferenceCase.high(), r, ReferenceCase.SIGMA);
            double[] s = new double[near.length];
            for (int j = 0; j < s.length; j++) {
                s[j] = near[j] + nearSigma[j] * rng.nextGaussian();
            }
            survey[k] = new SpectrumInput(NearSunCase.low(), NearSunCase.high(), s, nearSigma, null, null, 0, 0);
            focus[k] = new SpectrumInput(java.util.Arrays.copyOfRange(NearSunCase.low(), from, to),
                    java.util.Arrays.copyOfRange(NearSunCase.high(), from, to), java.util.Arrays.copyOfRange(s, from, to),
                    java.util.Arrays.copyOfRange(nearSigma, from, to), null, null, 0, 0);
        }
    }

    private int index() {
        next = (next + 1) & (POOL - 1);
        return next;
    }

    /** {@code fit}, or an exception when it is not ok (a benchmark of failed fits measures nothing). */
    static PlasmaFit checked(PlasmaFit fit) {
        if (!fit.ok()) {
            throw new IllegalStateException("fit failed: " + fit.flagText());
        }
        return fit;
    }

    /** 14 windows, protons only. */
    @Benchmark
    public PlasmaFit referenceProtons() {
        return checked(fitter.fit(reference[index()]));
    }

    /** 128 windows, protons + alphas. */
    @Benchmark
    public PlasmaFit nearSunSurveyJoint() {
        return checked(fitter.fit(survey[index()]));
    }

    /** 64 windows, protons + alphas. */
    @Benchmark
    public PlasmaFit nearSunFocusJoint() {
        return checked(fitter.fit(focus[index()]));
    }
}
