package dev.sweepline.ground.spectrum;

/** Why a spectrum packet could not be decoded (ICD §4); counted, never thrown. */
public enum SpectrumError {
    /** APID is not 0x100 or 0x101. */
    NOT_A_SPECTRUM,
    /** The secondary header flag is 0 although ICD §3.1 requires the CUC time. */
    NO_SECONDARY_HEADER,
    /**
     * The first user-data octet has bit 7 set but is neither 0x82 nor 0x83: a layout version this ground
     * does not know (ICD §4: 0x82 is layout 2, 0x83 layout 3; layout 1 begins with the mode, bit 7 clear).
     */
    UNKNOWN_LAYOUT,
    /**
     * Layout 3 with a support window count b outside 1..6, a support window offset that is not inside
     * 0..c−1 or not above the previous one, a support window of integration periods outside 1..{@value
     * SpectrumHeader#MAX_DWELL_PERIODS}, or a floor (offset 16) of 0 periods (ICD §4, §10).
     */
    BAD_SUPPORT_WINDOWS,
    /**
     * The instrument id (layout 2) is not one the ground has a description for, or a layout-1 spectrum
     * (the demo cup's, ICD §4) reached a ground configured without the demo cup.
     */
    UNKNOWN_INSTRUMENT,
    /** The sample width w (layout 2) differs from the ADC width of the instrument's description (ICD §4). */
    SAMPLE_WIDTH_MISMATCH,
    /** A field (or a quadrant stream of length Lq) runs past the end of the packet. */
    LENGTH_BEYOND_DATA,
    /** Octets left after the fourth quadrant stream. */
    TRAILING_OCTETS,
    /** Mode not 1 (survey) on 0x100 or 2 (focus) on 0x101. */
    BAD_MODE,
    /** Window count outside 1..256. */
    BAD_WINDOW_COUNT,
    /**
     * Flags that contradict the packet: the interleaved order (bit 5) on a survey spectrum, which the ICD
     * gives to focus sweeps only (ICD §4 flags; commands.md §4.1 focusStyle bit 1).
     */
    BAD_FLAGS,
    /**
     * The integration periods of the packet's windows (ICD §4 offset 16, layout 1 offset 12) outside 1..{@value
     * SpectrumHeader#MAX_DWELL_PERIODS}: no sweep integrates over no period or above the dwell limit
     * (commands.md §4.1); layout 3's floor of 0 is {@link #BAD_SUPPORT_WINDOWS}.
     */
    BAD_DWELL,
    /** A gain-range tag the instrument has no range for (ICD §4 allows 0 .. ranges − 1 of its description). */
    BAD_GAIN_RANGE,
    /** Compression octet neither 0x00 nor 0x01. */
    UNKNOWN_COMPRESSION,
    /** The quadrant decoder reported an error (or, for raw, Lq &lt; c⌈w/8⌉, or a sample above 2^w − 1). */
    DECOMPRESSION_FAILED,
    /**
     * A quadrant stream's samples end a whole octet or more before its stated length Lq (for raw,
     * Lq &gt; c⌈w/8⌉): fill is allowed only to the next octet boundary (ICD §4, §10), so under a good CRC
     * the stream is corrupt or the two sides disagree on it.
     */
    UNUSED_OCTETS,
    /** Compression 0x01 but no CCSDS 121 decoder is plugged in. */
    DECOMPRESSOR_UNAVAILABLE
}
