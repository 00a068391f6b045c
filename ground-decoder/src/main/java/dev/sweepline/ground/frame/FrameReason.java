package dev.sweepline.ground.frame;

/** Why the synchroniser rejected a frame or skipped octets; each is counted, none throws. */
public enum FrameReason {
    /** The FECF does not match the CRC-16/IBM-3740 of the frame (CCSDS 132.0-B-3 §4.1.6). */
    BAD_CRC,
    /** TFVN is not 00 (CCSDS 132.0-B-3 §4.1.2.2). */
    WRONG_VERSION,
    /** SCID is not the configured spacecraft (ICD §1). */
    WRONG_SCID,
    /**
     * A VCID the ICD §2 does not use (2..6): under a good CRC a frame from elsewhere or a corrupted one;
     * refused before it reaches, or starts, any VC's state.
     */
    UNKNOWN_VCID,
    /** Data field status not S=0, Y=0, O=0, SLI=11 (ICD §2). */
    BAD_DATA_FIELD_STATUS,
    /** Fewer than L octets between this ASM and the next ASM or the end of the stream. */
    TRUNCATED,
    /** Octets that were not a frame were skipped to find the next ASM; the count is in the event. */
    GARBAGE_BEFORE_SYNC
}
