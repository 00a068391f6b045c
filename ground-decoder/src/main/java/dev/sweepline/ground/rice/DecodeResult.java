package dev.sweepline.ground.rice;

/**
 * Result of {@link RiceDecoder#decode}: status, samples written to the output, and the bit position
 * (from the start of the input region) where decoding stopped - for an error, the start of the field
 * that failed.
 *
 * @param status          {@link DecodeStatus#OK} or what was wrong
 * @param samplesDecoded  samples written to the output array
 * @param bitPosition     bit offset of the stop (end of the last coded data set when OK)
 */
public record DecodeResult(DecodeStatus status, int samplesDecoded, long bitPosition) {

    /** True if every requested sample was decoded. */
    public boolean ok() {
        return status == DecodeStatus.OK;
    }

    /** Human-readable summary with the reason and the bit position. */
    public String describe() {
        return status + " (" + status.reason() + ") after " + samplesDecoded + " samples at bit " + bitPosition;
    }
}
