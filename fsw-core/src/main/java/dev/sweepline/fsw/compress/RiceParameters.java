package dev.sweepline.fsw.compress;

/**
 * An immutable, validated CCSDS 121.0-B (adaptive Rice coder) parameter set, and the quantities
 * derived from it that the encoder needs: option-ID width, largest split position, largest sample.
 * Besides n, J, r, preprocessing and the option set it carries one stream-format option, padding of
 * each reference sample interval to an octet (libaec's "pad RSI" flag, {@code aec -p}): off, the
 * intervals follow each other bit to bit and only the stream's end is zero-filled; on, the bit
 * stream is also zero-filled to the next octet after the last coded data set of every interval.
 *
 * <p>Built once at start-up from the parameter table. {@link #check} gives the reason a set is
 * refused without throwing; {@link #of} is for sets already known to be valid.
 *
 * <pre>
 *   option ID width (bits)   basic set: 3 for n &lt;= 8, 4 for 8 &lt; n &lt;= 16, 5 for n &gt; 16
 *                            restricted set (n &lt;= 4 only): 1 for n &lt;= 2, 2 for n = 3, 4
 *   ID 0 + 1 extra bit       low entropy: 0 = zero-block, 1 = second extension
 *   ID 1                     fundamental sequence (split-sample k = 0)
 *   ID k + 1                 split-sample k
 *   ID all ones              no compression
 * </pre>
 */
public final class RiceParameters {
    /** Largest bits per sample, CCSDS 121.0-B. */
    public static final int MAX_BITS_PER_SAMPLE = 32;
    /** Largest reference sample interval in blocks, CCSDS 121.0-B. */
    public static final int MAX_REFERENCE_INTERVAL_BLOCKS = 4096;
    /** Blocks per zero-block segment (the unit of "remainder of segment"), CCSDS 121.0-B. */
    public static final int SEGMENT_BLOCKS = 64;
    /** Largest n for which the restricted code-option set exists, CCSDS 121.0-B-3. */
    public static final int MAX_RESTRICTED_BITS = 4;

    private final int bitsPerSample;
    private final int blockSize;
    private final int referenceIntervalBlocks;
    private final boolean preprocessed;
    private final boolean restrictedSet;
    private final boolean padIntervalsToOctet;
    private final int idBits;
    private final int maxSplitK;
    private final long maxSample;

    private RiceParameters(int bitsPerSample, int blockSize, int referenceIntervalBlocks,
                           boolean preprocessed, boolean restrictedSet, boolean padIntervalsToOctet) {
        this.bitsPerSample = bitsPerSample;
        this.blockSize = blockSize;
        this.referenceIntervalBlocks = referenceIntervalBlocks;
        this.preprocessed = preprocessed;
        this.restrictedSet = restrictedSet;
        this.padIntervalsToOctet = padIntervalsToOctet;
        this.idBits = idBitsFor(bitsPerSample, restrictedSet);
        // The ID space holds split positions up to 2^idBits - 3; beyond n - 2 a split block is never
        // shorter than the no-compression block, so the encoder does not try those.
        this.maxSplitK = Math.min((1 << idBits) - 3, bitsPerSample - 2);
        this.maxSample = (1L << bitsPerSample) - 1;
    }

    /**
     * Checks a parameter set.
     *
     * @param bitsPerSample           n, 1..32
     * @param blockSize               J, one of 8, 16, 32, 64
     * @param referenceIntervalBlocks r, blocks per reference sample interval, 1..4096
     * @param preprocessed            true for the unit-delay predictor and mapper (unsigned samples)
     * @param restrictedSet           true for the restricted code-option set (n at most 4)
     * @param padIntervalsToOctet     true to zero-fill the stream to an octet at the end of every
     *                                reference sample interval (libaec "pad RSI"); either value goes
     *                                with every n, J, r, preprocessing and option set, so it is
     *                                never a reason for refusal
     * @return {@link RiceParameterCheck#OK} or the first reason the set is refused
     */
    public static RiceParameterCheck check(int bitsPerSample, int blockSize, int referenceIntervalBlocks,
                                           boolean preprocessed, boolean restrictedSet,
                                           boolean padIntervalsToOctet) {
        if (bitsPerSample < 1 || bitsPerSample > MAX_BITS_PER_SAMPLE) {
            return RiceParameterCheck.BITS_PER_SAMPLE_OUT_OF_RANGE;
        }
        if (blockSize != 8 && blockSize != 16 && blockSize != 32 && blockSize != 64) {
            return RiceParameterCheck.BLOCK_SIZE_NOT_ALLOWED;
        }
        if (referenceIntervalBlocks < 1 || referenceIntervalBlocks > MAX_REFERENCE_INTERVAL_BLOCKS) {
            return RiceParameterCheck.REFERENCE_INTERVAL_OUT_OF_RANGE;
        }
        if (restrictedSet && bitsPerSample > MAX_RESTRICTED_BITS) {
            return RiceParameterCheck.RESTRICTED_SET_NEEDS_AT_MOST_4_BITS;
        }
        return RiceParameterCheck.OK;
    }

    /**
     * Builds a parameter set that {@link #check} accepts.
     *
     * @throws IllegalArgumentException naming the {@link RiceParameterCheck} reason if it does not
     *                                  (a start-up programming error; table input goes through {@link #check})
     */
    public static RiceParameters of(int bitsPerSample, int blockSize, int referenceIntervalBlocks,
                                    boolean preprocessed, boolean restrictedSet, boolean padIntervalsToOctet) {
        RiceParameterCheck result = check(bitsPerSample, blockSize, referenceIntervalBlocks, preprocessed,
                restrictedSet, padIntervalsToOctet);
        if (result != RiceParameterCheck.OK) {
            throw new IllegalArgumentException("Rice parameters refused: " + result);
        }
        return new RiceParameters(bitsPerSample, blockSize, referenceIntervalBlocks, preprocessed, restrictedSet,
                padIntervalsToOctet);
    }

    /** Width of the option ID for {@code bitsPerSample} in the basic or restricted set (table above). */
    static int idBitsFor(int bitsPerSample, boolean restrictedSet) {
        if (restrictedSet) {
            return bitsPerSample <= 2 ? 1 : 2;
        }
        if (bitsPerSample <= 8) {
            return 3;
        }
        return bitsPerSample <= 16 ? 4 : 5;
    }

    /** n, bits per sample. */
    public int bitsPerSample() {
        return bitsPerSample;
    }

    /** J, samples per block. */
    public int blockSize() {
        return blockSize;
    }

    /** r, blocks per reference sample interval. */
    public int referenceIntervalBlocks() {
        return referenceIntervalBlocks;
    }

    /** True when the unit-delay predictor and mapper run before the coder. */
    public boolean preprocessed() {
        return preprocessed;
    }

    /** True for the restricted code-option set. */
    public boolean restrictedSet() {
        return restrictedSet;
    }

    /**
     * True when every reference sample interval ends zero-filled to an octet, so each interval starts
     * on an octet of the stream (libaec "pad RSI", {@code aec -p}); false for the plain format, where
     * only the stream's end is zero-filled.
     */
    public boolean padIntervalsToOctet() {
        return padIntervalsToOctet;
    }

    /** Width of the option ID in bits. */
    public int idBits() {
        return idBits;
    }

    /** True if the ID space has the fundamental-sequence and split-sample options (not for a 1-bit ID). */
    public boolean hasSplitOptions() {
        return idBits > 1;
    }

    /** Largest split position k the encoder tries; 0 or less means the fundamental sequence only. */
    public int maxSplitK() {
        return maxSplitK;
    }

    /** x_max = 2^n - 1, the largest unsigned sample. */
    public long maxSample() {
        return maxSample;
    }
}
