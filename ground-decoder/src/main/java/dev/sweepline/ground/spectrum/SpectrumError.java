package dev.sweepline.ground.spectrum;

/** Why a spectrum packet could not be decoded (ICD §4); counted, never thrown. */
public enum SpectrumError {
    /** APID is not 0x100 or 0x101. */
    NOT_A_SPECTRUM,
    /** The secondary header flag is 0 although ICD §3.1 requires the CUC time. */
    NO_SECONDARY_HEADER,
    /** A field (or a quadrant stream of length Lq) runs past the end of the packet. */
    LENGTH_BEYOND_DATA,
    /** Octets left after the fourth quadrant stream. */
    TRAILING_OCTETS,
    /** Mode not 1 (survey) on 0x100 or 2 (focus) on 0x101. */
    BAD_MODE,
    /** Window count outside 1..256. */
    BAD_WINDOW_COUNT,
    /** A gain-range tag of 3 (ICD §4 allows 0..2). */
    BAD_GAIN_RANGE,
    /** Compression octet neither 0x00 nor 0x01. */
    UNKNOWN_COMPRESSION,
    /** The quadrant decoder reported an error (or, for raw, Lq &lt; 2c). */
    DECOMPRESSION_FAILED,
    /**
     * A quadrant stream's samples end a whole octet or more before its stated length Lq (for raw,
     * Lq &gt; 2c): fill is allowed only to the next octet boundary (ICD §4, §10), so under a good CRC
     * the stream is corrupt or the two sides disagree on it.
     */
    UNUSED_OCTETS,
    /** Compression 0x01 but no CCSDS 121 decoder is plugged in. */
    DECOMPRESSOR_UNAVAILABLE,
    /**
     * A spectrum of layout version 2 (ICD §4) of an instrument or sample width this ground has no
     * description for (it knows the demo cup, id 1, 16-bit samples), or an unknown layout version.
     */
    UNKNOWN_INSTRUMENT
}
