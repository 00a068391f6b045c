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
