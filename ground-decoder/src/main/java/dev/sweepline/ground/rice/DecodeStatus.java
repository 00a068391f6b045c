package dev.sweepline.ground.rice;

/** How a decode ended; every value but {@link #OK} names what was wrong with the input. */
public enum DecodeStatus {
    /** All requested samples were decoded. */
    OK("decoded"),
    /** The stream ended inside a coded data set. */
    TRUNCATED("stream ends inside a coded data set"),
    /** The option ID is not one this parameter set allows (split position k not below n). */
    INVALID_OPTION_ID("option ID not valid for this sample width"),
    /** A zero-block run is longer than what is left of its segment or reference interval. */
    ZERO_RUN_BEYOND_SEGMENT("zero-block run beyond the end of its segment or interval"),
    /** A fundamental sequence has more zeros than any valid value of its field. */
    FS_TOO_LONG("fundamental sequence longer than any valid value"),
    /** A decoded value lies outside the sample range (mapped value above x_max, or a bad pair). */
    VALUE_OUT_OF_RANGE("decoded value outside the sample range"),
    /**
     * With padded reference sample intervals, a fill bit between an interval's last coded data set
     * and the next octet is a one (CCSDS 121.0-B fill is zero); often the sign of a stream that was
     * not padded at all.
     */
    INTERVAL_FILL_NOT_ZERO("fill bits after a padded reference sample interval are not zero"),
    /** The call's arguments do not fit the arrays. */
    BAD_ARGUMENTS("offset, length or sample count outside the arrays");

    private final String reason;

    DecodeStatus(String reason) {
        this.reason = reason;
    }

    /** A short human-readable reason. */
    public String reason() {
        return reason;
    }
}
