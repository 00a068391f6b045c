package dev.sweepline.sim.interop;

import java.util.Random;

/** Seeded sample sequences for the interop tests: uniform noise, a spectrum-like peak, zero-block runs. */
final class TestSignals {
    /** The signals of the aec cross-checks, one per method below. */
    enum Kind { UNIFORM, SPECTRUM, ZERO_RUNS }

    private TestSignals() {
    }

    /** {@code count} samples of {@code kind}: {@link #uniform}, {@link #spectrum} or {@link #zeroRuns}. */
    static int[] of(Kind kind, Random random, int count, int n, int blockSize) {
        switch (kind) {
            case UNIFORM:
                return uniform(random, count, n);
            case SPECTRUM:
                return spectrum(random, count, n);
            case ZERO_RUNS:
                return zeroRuns(random, count, n, blockSize);
            default:
                throw new IllegalStateException("unknown signal " + kind);
        }
    }

    /** Uniform samples over 0..2^n - 1: maximal entropy, the coder falls back to no compression. */
    static int[] uniform(Random random, int count, int n) {
        long max = (1L << n) - 1;
        int[] samples = new int[count];
        for (int i = 0; i < count; i++) {
            samples[i] = (int) (random.nextLong() & max);
        }
        return samples;
    }

    /**
     * A sweep as the cup gives it: windows x 4 quadrants, a smooth Gaussian peak over the windows at
     * 60 % of full scale on a 1 % floor, plus Gaussian noise of about 0.3 % of full scale and a
     * little quadrant-to-quadrant gain difference, clipped to the range.
     */
    static int[] spectrum(Random random, int count, int n) {
        long max = (1L << n) - 1;
        int windows = Math.max(1, count / 4);
        double peakWindow = windows * (0.3 + 0.4 * random.nextDouble());
        double width = Math.max(2.0, windows / 12.0);
        int[] samples = new int[count];
        for (int i = 0; i < count; i++) {
            int window = i / 4;
            int quadrant = i % 4;
            double u = (window - peakWindow) / width;
            double level = max * (0.01 + 0.6 * Math.exp(-0.5 * u * u)) * (1.0 + 0.02 * (quadrant - 1.5));
            long value = Math.round(level + random.nextGaussian() * max * 0.003);
            samples[i] = (int) Math.max(0, Math.min(max, value));
        }
        return samples;
    }

    /**
     * Long constant stretches (all-zero mapped blocks after the first sample) broken by random bursts
     * of a few blocks, so that zero-block runs of many lengths meet segment and interval ends.
     */
    static int[] zeroRuns(Random random, int count, int n, int blockSize) {
        long max = (1L << n) - 1;
        int[] samples = new int[count];
        int level = (int) (random.nextLong() & max);
        int i = 0;
        while (i < count) {
            int quietBlocks = random.nextInt(140);
            for (int q = 0; q < quietBlocks * blockSize && i < count; q++) {
                samples[i++] = level;
            }
            int burst = (1 + random.nextInt(3)) * blockSize - random.nextInt(blockSize);
            for (int b = 0; b < burst && i < count; b++) {
                samples[i++] = (int) (random.nextLong() & max);
            }
            level = i > 0 ? samples[i - 1] : level;
        }
        return samples;
    }
}
