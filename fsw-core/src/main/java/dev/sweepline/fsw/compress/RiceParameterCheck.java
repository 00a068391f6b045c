package dev.sweepline.fsw.compress;

/**
 * Outcome of checking a CCSDS 121.0-B parameter set: {@link #OK} or the reason it is refused.
 * The numeric {@link #code()} is stable so that it can go into telemetry as a rejection reason.
 */
public enum RiceParameterCheck {
    /** The parameter set is valid. */
    OK(0),
    /** Bits per sample n outside 1..32 (CCSDS 121.0-B, sample resolution). */
    BITS_PER_SAMPLE_OUT_OF_RANGE(1),
    /** Block size J not one of 8, 16, 32, 64 (CCSDS 121.0-B, block size). */
    BLOCK_SIZE_NOT_ALLOWED(2),
    /** Reference sample interval r outside 1..4096 blocks (CCSDS 121.0-B, reference sample interval). */
    REFERENCE_INTERVAL_OUT_OF_RANGE(3),
    /** The restricted code-option set was asked for with n greater than 4 (it exists for n at most 4 only). */
    RESTRICTED_SET_NEEDS_AT_MOST_4_BITS(4);

    private final int code;

    RiceParameterCheck(int code) {
        this.code = code;
    }

    /** Stable numeric reason code, 0 for {@link #OK}. */
    public int code() {
        return code;
    }
}
