package dev.sweepline.ground.rice;

/**
 * The CCSDS 121.0-B parameters a stream was coded with, as the telemetry ICD gives them to the
 * ground: bits per sample n, block size J, reference sample interval r in blocks, whether the
 * unit-delay predictor and mapper ran (unsigned samples), whether the restricted option set is used,
 * and whether every reference sample interval is zero-filled to an octet (libaec "pad RSI").
 *
 * @param bitsPerSample           n, 1..32
 * @param blockSize               J, 8, 16, 32 or 64
 * @param referenceIntervalBlocks r, 1..4096 blocks
 * @param preprocessed            unit-delay predictor + mapper on (x_min = 0, x_max = 2^n - 1)
 * @param restrictedSet           restricted code-option set, only for n at most 4
 * @param padIntervalsToOctet     after the last coded data set of each interval of r blocks the
 *                                stream is zero-filled to the next octet, so every interval starts
 *                                on an octet ({@code aec -p}); false: intervals follow bit to bit.
 *                                Valid with every other setting
 */
public record RiceSettings(int bitsPerSample, int blockSize, int referenceIntervalBlocks,
                           boolean preprocessed, boolean restrictedSet, boolean padIntervalsToOctet) {

    /** Blocks in a zero-block segment (CCSDS 121.0-B: "remainder of segment" counts to its end). */
    public static final int SEGMENT_BLOCKS = 64;

    /**
     * Validates the set; a bad set is a configuration error, not stream input, so it throws. The
     * padding flag has no invalid value and no combination it is refused with.
     */
    public RiceSettings {
        if (bitsPerSample < 1 || bitsPerSample > 32) {
            throw new IllegalArgumentException("bits per sample must be 1..32: " + bitsPerSample);
        }
        if (blockSize != 8 && blockSize != 16 && blockSize != 32 && blockSize != 64) {
            throw new IllegalArgumentException("block size must be 8, 16, 32 or 64: " + blockSize);
        }
        if (referenceIntervalBlocks < 1 || referenceIntervalBlocks > 4096) {
            throw new IllegalArgumentException("reference interval must be 1..4096 blocks: "
                    + referenceIntervalBlocks);
        }
        if (restrictedSet && bitsPerSample > 4) {
            throw new IllegalArgumentException("the restricted option set needs n <= 4: " + bitsPerSample);
        }
    }

    /** The usual set, and the telemetry ICD's (§4): preprocessing on, basic option set, intervals not padded. */
    public static RiceSettings basic(int bitsPerSample, int blockSize, int referenceIntervalBlocks) {
        return new RiceSettings(bitsPerSample, blockSize, referenceIntervalBlocks, true, false, false);
    }

    /**
     * Option-ID width: 3 bits for n at most 8, 4 up to 16, 5 above; restricted set 1 bit for n at most
     * 2 and 2 bits for n = 3, 4 (CCSDS 121.0-B-3 option identification key).
     */
    public int idBits() {
        if (restrictedSet) {
            return bitsPerSample <= 2 ? 1 : 2;
        }
        if (bitsPerSample <= 8) {
            return 3;
        }
        return bitsPerSample <= 16 ? 4 : 5;
    }

    /** x_max = 2^n - 1. */
    public long maxSample() {
        return (1L << bitsPerSample) - 1;
    }
}
