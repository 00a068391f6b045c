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
 * Four shapes: the physics.md reference case (14 windows, protons only), the same plasma on a 32-window
 * focus band of the default table centred on its peak (protons only: the band stops below the alphas'
 * reach), a near-Sun survey spectrum (128 windows of the default table, joint protons + alphas,
 * NearSunCase) and a near-Sun focus-like band (the 64 windows around the proton and alpha peaks, joint).
 * Each draws from a pool of 64 noisy spectra made once from a recorded seed, so that no two consecutive
 * fits see the same data. Each op fits into a reused {@link MutablePlasmaFit} ({@link SpectrumFitter#fitInto}),
 * the allocation-free path, and is checked ({@link #checked}): a fit that fails, that should carry alphas and
 * does not, or whose proton parameters lie outside the bounds around the truth ({@link #inBounds}) throws, so
 * a broken fitter cannot post a fast score.
 *
 * <p>Run: {@code mvn -q -o -pl ground-decoder -Pjmh verify -DskipTests -Djmh.includes=FitBenchmark
 * -Djmh.args="-f 1 -wi 3 -w 2 -i 5 -r 2"} (with {@code -am} the parent module's exec finds no benchmark
 * list here; offline the exec plugin may be missing: then {@code java -cp <test classpath> org.openjdk.jmh.Main
 * FitBenchmark}). Measured on the shared 2-core machine: 14 windows 7.5e3 ± 1.4e4 ops/s (contended), 64
 * windows joint 1109 ± 199 ops/s, 128 windows joint 562 ± 77 ops/s. Measured again at a load average of
 * 18–25 ({@code -f 1 -wi 2 -w 1 -i 3 -r 1 -prof gc}, figures only good for the allocation): 14 windows 428
 * ops/s and 54 KB/op (34 KB/op before the constrained alpha component, whose score-screened attempts these
 * proton spectra pay for), 32 windows 103 ops/s and 104 KB/op, 64 windows joint 49 ops/s and 509 KB/op,
 * 128 windows joint 32 ops/s and 884 KB/op. With the ground's own Levenberg–Marquardt, the per-edge model and
 * the per-thread model reuse, at a load average of 12–20 (so ops/s say little; spectra per CPU-second of the
 * fitting thread, ThreadMXBean, 2 s after 2 s of warm-up, before → after in the same minute): 14 windows
 * 23.6e3 → 55e3, 32 windows 15.3e3 → 24.9e3, 64 windows joint 3.5e3 → 6.5e3, 128 windows joint 1.6e3 →
 * 4.4e3; {@code -prof gc} 908, 928, 1433, 1432 B/op (was 44, 83, 380, 650 KB/op), what is left being the
 * result objects ({@link PlasmaFit}, its moments, angles and flag set, the outcome records). Timing the holder
 * path ({@link SpectrumFitter#fitInto}), {@code -wi 2 -i 3 -f 1 -prof gc} at a load average of 6–7: 14 windows
 * 0.06 B/op, 32 windows 0.17, 64 windows joint 0.62, 128 windows joint 1.2, each about 3 KB/s whatever the
 * rate, i.e. the harness's own per-iteration allocation on the benchmark thread; per fit 0 bytes
 * ({@code FitIntoTest}, the JVM's per-thread counter over 64 fits). With the optimiser made MINPACK's lmder
 * step for step as Hipparchus ports it (its stopping tests), at a load average of 5–7: spectra per CPU-second
 * of the fitting thread (2 s after 1.5 s of warm-up, two alternating runs each) 14 windows 76e3–79e3 (the
 * previous own optimiser 67e3–70e3), 32 windows 38e3–39e3 (24e3–30e3), 64 windows joint 8.9e3–9.3e3 (8.2e3),
 * 128 windows joint 5.1e3–5.3e3 (4.7e3–5.0e3); {@code -f 1 -wi 2 -i 3 -prof gc} 38.8e3, 33.0e3, 8.7e3, 4.1e3
 * ops/s (errors of the order of the scores: contended) and 0.09, 0.09, 0.34, 0.75 B/op. With the erfc table,
 * the fused QR pivot norms and the loops' fields in locals (the same bits), {@code -f 1 -wi 3 -w 1 -i 5 -r 1
 * -prof gc}, before and after alternating, two runs each, at a load average of 2.2–3.6: with C1 alone
 * ({@code -jvmArgsAppend -XX:TieredStopAtLevel=1}, as a campaign's {@code tune} runs) 14 windows 57e3–59e3 →
 * 75e3–81e3 ops/s, 32 windows 24e3–25e3 → 35e3, 64 windows joint 5.5e3–5.9e3 → 8.1e3–8.4e3, 128 windows joint
 * 3.3e3 → 4.7e3–4.8e3; tiered 83e3–87e3 → 101e3–104e3, 42e3–46e3 → 52e3, 9.8e3–10.7e3 → 11.9e3–12.5e3, 5.1e3–5.3e3
 * → 5.7e3–6.3e3; still under 2 B/op (the harness's).
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
    SpectrumInput[] focus32 = new SpectrumInput[POOL];
    SpectrumInput[] survey = new SpectrumInput[POOL];
    SpectrumInput[] focus = new SpectrumInput[POOL];
    final SpectrumFitter fitter = new SpectrumFitter();
    final MutablePlasmaFit result = new MutablePlasmaFit();
    /** Proton truth (n_p, U_p, w_p) of the reference and focus-32 pools and of the near-Sun pools. */
    static final double[] REFERENCE_TRUTH = {ReferenceCase.DENSITY, ReferenceCase.SPEED, ReferenceCase.thermalSpeed()};
    static final double[] NEAR_SUN_TRUTH = java.util.Arrays.copyOf(NearSunCase.truth(), 3);
    /**
     * Relative bound of a benchmark fit's n_p, U_p, w_p from the truth: far outside the noise of these pools
     * (their fits scatter by a few per cent at most: ReferenceTrialsTest, NearSunAlphaTest), so only a broken
     * fit crosses it (common practice: a sanity bound, not a statistical test).
     */
    static final double BOUND = 0.2;
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
        double[][] focus32Case = focus32Reference();
        double[] lo32 = focus32Case[0];
        double[] hi32 = focus32Case[1];
        double[] ref32 = focus32Case[2];
        for (int k = 0; k < POOL; k++) {
            double[] r = new double[ref.length];
            for (int j = 0; j < r.length; j++) {
                r[j] = ref[j] + ReferenceCase.SIGMA * rng.nextGaussian();
            }
            reference[k] = SpectrumInput.summed(ReferenceCase.low(), ReferenceCase.high(), r, ReferenceCase.SIGMA);
            double[] r32 = new double[32];
            for (int j = 0; j < 32; j++) {
                r32[j] = ref32[j] + ReferenceCase.SIGMA * rng.nextGaussian();
            }
            focus32[k] = SpectrumInput.summed(lo32, hi32, r32, ReferenceCase.SIGMA);
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

    /**
     * The 32-window focus case: the default table's windows 16 below to 15 above the reference case's
     * proton peak and their noiseless proton currents, as {low volts, high volts, amperes}.
     */
    static double[][] focus32Reference() {
        int peak = peakWindow(Species.PROTON.voltsAtSpeed(ReferenceCase.SPEED));
        double[] lo32 = new double[32];
        double[] hi32 = new double[32];
        for (int j = 0; j < 32; j++) {
            lo32[j] = DemoCup.TABLE.lowVolts(peak - 16 + j);
            hi32[j] = DemoCup.TABLE.highVolts(peak - 16 + j);
        }
        double[] ref32 = new double[32];
        new PlasmaModel(lo32, hi32, ReferenceCase.AREA, false).evaluate(new double[] {ReferenceCase.DENSITY,
            ReferenceCase.SPEED, ReferenceCase.thermalSpeed()}, ref32, null);
        return new double[][] {lo32, hi32, ref32};
    }

    /** The default-table window holding {@code volts}. */
    static int peakWindow(double volts) {
        for (int w = 0; w < DemoCup.TABLE.windows(); w++) {
            if (DemoCup.TABLE.lowVolts(w) <= volts && volts < DemoCup.TABLE.highVolts(w)) {
                return w;
            }
        }
        throw new IllegalStateException(volts + " V lies outside the default table");
    }

    /** {@code f}, or an exception when it failed or lacks the alphas it should have. */
    static PlasmaFit checked(PlasmaFit f, boolean alphas) {
        if (!f.ok() || alphas && !f.alphasFitted()) {
            throw new IllegalStateException("benchmark fit is wrong: " + f.flagText() + " " + f.protons());
        }
        return f;
    }

    /**
     * {@code f}, or an exception when it failed, lacks the alphas it should have, or its normal proton
     * parameters are out of {@link #BOUND} of {@code truth}.
     */
    static MutablePlasmaFit checked(MutablePlasmaFit f, boolean alphas, double[] truth) {
        if (!f.ok() || alphas && !f.alphasFitted() || !inBounds(f, truth)) {
            throw new IllegalStateException("benchmark fit is wrong: " + f.toPlasmaFit().flagText() + " "
                    + f.toPlasmaFit().protons() + " against the truth " + java.util.Arrays.toString(truth));
        }
        return f;
    }

    /** True when every normal proton parameter of {@code f} lies within {@link #BOUND} of {@code truth}. */
    static boolean inBounds(MutablePlasmaFit f, double[] truth) {
        for (int i = 0; i < truth.length; i++) {
            if (!(Math.abs(f.normalParameter(i) / truth[i] - 1) <= BOUND)) {
                return false;
            }
        }
        return true;
    }

    private int index() {
        next = (next + 1) & (POOL - 1);
        return next;
    }

    /** 14 windows, protons only. */
    @Benchmark
    public MutablePlasmaFit referenceProtons() {
        fitter.fitInto(reference[index()], null, result);
        return checked(result, false, REFERENCE_TRUTH);
    }

    /** 32 windows, protons only. */
    @Benchmark
    public MutablePlasmaFit focus32Protons() {
        fitter.fitInto(focus32[index()], null, result);
        return checked(result, false, REFERENCE_TRUTH);
    }

    /** 128 windows, protons + alphas. */
    @Benchmark
    public MutablePlasmaFit nearSunSurveyJoint() {
        fitter.fitInto(survey[index()], null, result);
        return checked(result, true, NEAR_SUN_TRUTH);
    }

    /** 64 windows, protons + alphas. */
    @Benchmark
    public MutablePlasmaFit nearSunFocusJoint() {
        fitter.fitInto(focus[index()], null, result);
        return checked(result, true, NEAR_SUN_TRUTH);
    }
}
