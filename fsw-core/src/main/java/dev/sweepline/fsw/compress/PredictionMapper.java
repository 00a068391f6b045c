package dev.sweepline.fsw.compress;

/**
 * The CCSDS 121.0-B prediction error mapper after a unit-delay predictor, for unsigned samples
 * (x_min = 0, x_max = 2^n - 1):
 *
 * <pre>
 *   delta = x_i - x_{i-1};  theta = min(x_{i-1} - x_min, x_max - x_{i-1})
 *   mapped = 2 delta            if 0 &lt;= delta &lt;= theta
 *            2 |delta| - 1      if -theta &lt;= delta &lt; 0
 *            theta + |delta|    otherwise
 * </pre>
 *
 * The result lies in 0..x_max. Longs hold the unsigned 32-bit case. Stateless.
 */
final class PredictionMapper {
    private PredictionMapper() {
    }

    /** Maps sample {@code x} predicted by {@code previous}; both in 0..{@code maxSample}. */
    static long map(long x, long previous, long maxSample) {
        long delta = x - previous;
        long theta = Math.min(previous, maxSample - previous);
        if (delta >= 0) {
            return delta <= theta ? 2 * delta : theta + delta;
        }
        return -delta <= theta ? -2 * delta - 1 : theta - delta;
    }
}
