package dev.sweepline.sim.scenario;

import dev.sweepline.sim.seed.SeedTree;
import java.util.Arrays;

/**
 * A stationary Ornstein-Uhlenbeck process of zero mean and unit variance, fixed by a key (a fluctuation
 * stream of the run's {@link SeedTree}), evaluated on a grid of step tau/64 and linearly interpolated between grid points.
 *
 * <p>Grid values follow the exact update x[k+1] = a x[k] + sqrt(1 - a^2) g[k+1] with a = exp(-step/tau)
 * and x[0] = g[0], so the variance is 1 and the autocorrelation exp(-lag/tau) at every grid lag
 * (Gillespie 1996, Phys. Rev. E 54, "Exact numerical simulation of the Ornstein-Uhlenbeck process"
 * [memory]). The Gaussian g[k] is a pure function of (key, k) (SplitMix64 mixing of a counter,
 * Steele, Lea and Flood 2014 [memory], then Box-Muller), so any grid point can be recomputed from the
 * nearest checkpoint: the series keeps one checkpoint per block of {@value #BLOCK} points and one cached
 * block, computed from its checkpoint as far as it has been read (a short run pays for the points it
 * reads). Calls in time order cost one interpolation each (each point is computed once); calls in any
 * other order give the same values, at the cost of recomputing a block.
 *
 * <p>Linear interpolation lowers the variance between grid points by at most (1 - a) / 2, 0.8 % at
 * step = tau/64; averaged over a step the rms is 0.9974 of the configured value.
 */
final class OrnsteinUhlenbeckSeries {
    /** Grid points per correlation time. */
    static final int STEPS_PER_TAU = 64;
    /** Grid points per block. */
    static final int BLOCK = 1024;
    /** Room for the cached block's points at first (doubled as needed). */
    private static final int INITIAL_ROOM = 64;
    private final long key;
    private final double stepSeconds;
    private final double a;
    private final double b;
    private double[] checkpoints = new double[16];
    private int checkpointCount;
    /** The cached block's points 0..filled-1 (room grown as they are computed, up to BLOCK + 1). */
    private double[] block = new double[INITIAL_ROOM];
    private long cachedBlock = -1;
    private int filled;

    /** The process of correlation time {@code tauSeconds} for {@code key} ({@link SeedTree#fluctuation}). */
    OrnsteinUhlenbeckSeries(long key, double tauSeconds) {
        this.key = key;
        this.stepSeconds = tauSeconds / STEPS_PER_TAU;
        this.a = Math.exp(-1.0 / STEPS_PER_TAU);
        this.b = Math.sqrt(1.0 - a * a);
        checkpoints[0] = gaussian(0);
        checkpointCount = 1;
    }

    /** The grid step, s. */
    double stepSeconds() {
        return stepSeconds;
    }

    /** x(t); times before 0 read x(0). */
    double at(double seconds) {
        double pos = Math.max(seconds, 0.0) / stepSeconds;
        long k = (long) pos;
        double frac = pos - k;
        long blockIndex = k / BLOCK;
        int i = (int) (k - blockIndex * BLOCK);
        load(blockIndex, i + 1);
        return block[i] + frac * (block[i + 1] - block[i]);
    }

    /** x at grid point {@code k}. */
    double atGridPoint(long k) {
        long blockIndex = k / BLOCK;
        int i = (int) (k - blockIndex * BLOCK);
        load(blockIndex, i);
        return block[i];
    }

    /** Makes points 0..{@code last} of block {@code blockIndex} the cached ones. */
    private void load(long blockIndex, int last) {
        if (blockIndex != cachedBlock) {
            // the checkpoints up to the block's own: each earlier block computed to its end
            while (checkpointCount <= blockIndex) {
                start(checkpointCount - 1);
                extend(BLOCK);
            }
            start(blockIndex);
        }
        if (last >= filled) {
            extend(last);
        }
    }

    /** Block {@code blockIndex} becomes the cached one, its point 0 (its checkpoint) computed. */
    private void start(long blockIndex) {
        block[0] = checkpoints[(int) blockIndex];
        filled = 1;
        cachedBlock = blockIndex;
    }

    /**
     * Computes the cached block's points up to {@code last} from the last computed one, appending the next
     * block's checkpoint when the block's end is reached for the first time.
     */
    private void extend(int last) {
        if (last >= block.length) {
            block = Arrays.copyOf(block, Math.min(BLOCK + 1, Math.max(2 * block.length, last + 1)));
        }
        long k0 = cachedBlock * BLOCK;
        double x = block[filled - 1];
        for (int i = filled; i <= last; i++) {
            x = a * x + b * gaussian(k0 + i);
            block[i] = x;
        }
        filled = last + 1;
        if (filled == BLOCK + 1 && checkpointCount == cachedBlock + 1) {
            if (checkpointCount == checkpoints.length) {
                checkpoints = Arrays.copyOf(checkpoints, checkpoints.length * 2);
            }
            checkpoints[checkpointCount++] = x;
        }
    }

    /** A standard normal value that depends only on (key, k): Box-Muller on two mixed counters. */
    private double gaussian(long k) {
        long h1 = SeedTree.mix64(key + (2 * k + 1) * SeedTree.GOLDEN_GAMMA);
        long h2 = SeedTree.mix64(key + (2 * k + 2) * SeedTree.GOLDEN_GAMMA);
        double u1 = ((h1 >>> 11) + 1) * 0x1.0p-53; // in (0, 1], so the log is finite
        double u2 = (h2 >>> 11) * 0x1.0p-53;
        return Math.sqrt(-2.0 * Math.log(u1)) * Math.cos(2.0 * Math.PI * u2);
    }
}
