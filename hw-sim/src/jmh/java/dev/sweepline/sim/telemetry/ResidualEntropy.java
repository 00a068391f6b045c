package dev.sweepline.sim.telemetry;

/**
 * The order-0 entropy of the CCSDS 121 mapped prediction residuals (unit-delay predictor, mapper with
 * x_min = 0, x_max = 65535; CCSDS 121.0-B §4, formula as in standards.md), pooled over quadrant streams:
 * the customary bound for a memoryless coder of the residuals. Written here from the standard, not from
 * fsw-core's mapper.
 */
public final class ResidualEntropy {
    private static final int X_MAX = 65535;

    private final long[] histogram = new long[X_MAX + 1];
    private long residuals;
    private long references;

    /** Adds one quadrant stream: its first sample is the reference (sent raw), the rest are mapped. */
    public void add(int[] stream) {
        references++;
        for (int i = 1; i < stream.length; i++) {
            histogram[map(stream[i], stream[i - 1])]++;
            residuals++;
        }
    }

    /** The CCSDS 121 mapper of sample {@code x} predicted by {@code previous}. */
    static int map(int x, int previous) {
        int delta = x - previous;
        int theta = Math.min(previous, X_MAX - previous);
        if (delta >= 0) {
            return delta <= theta ? 2 * delta : theta + delta;
        }
        return -delta <= theta ? -2 * delta - 1 : theta - delta;
    }

    /** Order-0 entropy of the mapped residuals, bits per residual. */
    public double bitsPerResidual() {
        double h = 0;
        for (long n : histogram) {
            if (n > 0) {
                double p = (double) n / residuals;
                h -= p * Math.log(p);
            }
        }
        return h / Math.log(2);
    }

    /**
     * The entropy of the smoothest distribution with the same mass in each bin as the residuals: bins of
     * width 1 below {@code 2 * subBinsPerOctave}, then each octave [2^j, 2^(j+1)) cut into
     * {@code subBinsPerOctave} bins of equal width, the probability spread evenly inside a bin:
     * -sum (n_b / N) log2(n_b / (N w_b)) bits per residual. For the distribution the residuals were drawn
     * from, H = H(bin) + H(value | bin) and H(value | bin) &lt;= log2 w_b, so this is an upper estimate of
     * the true entropy, with a small bias of its own because the bins are few and well filled; the plug-in
     * {@link #bitsPerResidual()} is a lower one when most tail values occur once (Miller 1955).
     */
    public double binnedBitsPerResidual(int subBinsPerOctave) {
        if (Integer.bitCount(subBinsPerOctave) != 1) {
            throw new IllegalArgumentException("sub-bins per octave must be a power of two: " + subBinsPerOctave);
        }
        int fine = 2 * subBinsPerOctave;
        double bits = 0;
        int d = 0;
        while (d <= X_MAX) {
            int width = d < fine ? 1 : Integer.highestOneBit(d) / subBinsPerOctave;
            long n = 0;
            for (int v = d; v < d + width && v <= X_MAX; v++) {
                n += histogram[v];
            }
            if (n > 0) {
                double p = (double) n / residuals;
                bits -= p * Math.log(p / width);
            }
            d += width;
        }
        return bits / Math.log(2);
    }

    /** Distinct mapped residual values seen (occupied histogram bins). */
    public long occupiedSymbols() {
        long k = 0;
        for (long n : histogram) {
            if (n > 0) {
                k++;
            }
        }
        return k;
    }

    /** Samples counted: references and residuals. */
    public long samples() {
        return references + residuals;
    }

    /** Mapped residuals counted. */
    public long residuals() {
        return residuals;
    }

    /**
     * The first-order estimate of how far the plug-in entropy {@link #bitsPerResidual()} lies below the true
     * one for a finite sample, (K - 1) / (2 N ln 2) bits (Miller 1955): with a wide alphabet the histogram
     * under-samples the tails, so the plug-in bound is optimistic by about this much.
     */
    public double finiteSampleBiasBits() {
        return (occupiedSymbols() - 1) / (2.0 * residuals * Math.log(2));
    }

    /**
     * The bound per sample with the references costed as the coder must send them (16 raw bits each):
     * (16 references + H residuals) / samples.
     */
    public double bitsPerSampleWithReferences() {
        return (16.0 * references + bitsPerResidual() * residuals) / (references + residuals);
    }
}
