package dev.sweepline.ground.rice;

/**
 * Undoes the CCSDS 121.0-B preprocessor for unsigned samples: from a mapped prediction error and the
 * previous sample back to the sample. With theta = min(x_prev, x_max - x_prev):
 *
 * <pre>
 *   mapped &lt;= 2 theta, even:  x = x_prev + mapped / 2
 *   mapped &lt;= 2 theta, odd:   x = x_prev - (mapped + 1) / 2
 *   mapped &gt; 2 theta:         x = mapped            if x_prev is nearer x_min (the jump went up)
 *                             x = x_max - mapped   otherwise (the jump went down)
 * </pre>
 */
final class UnitDelayReconstructor {
    /** Result for a mapped value that no sample can give (above x_max). */
    static final long INVALID = -1;

    private UnitDelayReconstructor() {
    }

    /** The sample for {@code mapped} after {@code previous}, or {@link #INVALID}. */
    static long sample(long mapped, long previous, long maxSample) {
        if (mapped < 0 || mapped > maxSample) {
            return INVALID;
        }
        long roomDown = previous;
        long roomUp = maxSample - previous;
        long theta = Math.min(roomDown, roomUp);
        if (mapped <= 2 * theta) {
            // even: + mapped / 2; odd: - (mapped + 1) / 2 = ~(mapped / 2), without a branch on the parity
            return previous + ((mapped >>> 1) ^ -(mapped & 1));
        }
        return roomDown <= roomUp ? mapped : maxSample - mapped;
    }
}
