package dev.sweepline.ground.rice;

/**
 * The CCSDS 121.0-B second-extension pair code: a pair (a, b) of mapped values is sent as
 * FS(gamma) with gamma = (a + b)(a + b + 1) / 2 + b. This class inverts gamma.
 */
final class SecondExtension {
    private SecondExtension() {
    }

    /** Sum s = a + b of the pair behind {@code gamma}: the largest s with s(s+1)/2 &lt;= gamma. */
    static long pairSum(long gamma) {
        long s = (long) ((Math.sqrt(8.0 * gamma + 1.0) - 1.0) / 2.0);
        // the double estimate may be one off for large gamma; settle it exactly
        while (s > 0 && triangle(s) > gamma) {
            s--;
        }
        while (triangle(s + 1) <= gamma) {
            s++;
        }
        return s;
    }

    /** s(s+1)/2. */
    static long triangle(long s) {
        return s * (s + 1) / 2;
    }

    /**
     * Largest gamma a valid pair of n-bit mapped values can give, saturated to Long.MAX_VALUE for
     * n &gt;= 30 (such a codeword could not fit in any stream anyway).
     */
    static long maxGamma(int bitsPerSample) {
        if (bitsPerSample >= 30) {
            return Long.MAX_VALUE;
        }
        long max = (1L << bitsPerSample) - 1;
        return triangle(2 * max) + max;
    }
}
