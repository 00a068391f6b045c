package dev.sweepline.ground.packet;

/** Why the packet layer dropped octets; each is counted, none throws. */
public enum PacketAnomaly {
    /**
     * A partial packet was dropped because frames of its VC were lost (VC count jump) or its VC's count
     * sequence started again (ICD §10).
     */
    INCOMPLETE_AT_GAP,
    /** The stream ended inside a packet. */
    INCOMPLETE_AT_END,
    /**
     * A packet's length runs past the data its VC carries: past the next frame's FHP, or into an
     * idle-only frame.
     */
    LENGTH_BEYOND_DATA,
    /**
     * The FHP disagrees with the packets: a packet ended before the offset where the FHP says the next
     * one starts, or a new packet would start in a frame whose FHP says none does.
     */
    FHP_INCONSISTENT,
    /** FHP beyond the data field and not one of the special values 0x7FE, 0x7FF. */
    FHP_OUT_OF_RANGE,
    /** A packet header that is not a version-1 telemetry header (ICD §3.1). */
    BAD_PACKET_HEADER
}
