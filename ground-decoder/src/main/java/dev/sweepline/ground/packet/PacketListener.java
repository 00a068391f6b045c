package dev.sweepline.ground.packet;

/**
 * Receives what the packet layer finds, in stream order, on the feeding thread. The packet buffer is
 * only valid during the call: copy what you keep.
 */
public interface PacketListener {
    /** A complete space packet (idle packets included) of {@code octets} octets at {@code buf[off]}. */
    void onPacket(int vcid, byte[] buf, int off, int octets);

    /** Octets dropped by the packet layer, with the reason. */
    void onPacketAnomaly(int vcid, PacketAnomaly anomaly, int octetsDropped);

    /** The VC frame count jumped: {@code missing} frames of this VC were lost before this one. */
    void onFrameGap(int vcid, int expectedVcCount, int actualVcCount, int missing);

    /** The master channel frame count jumped: {@code missing} frames of any VC were lost. */
    void onMasterChannelGap(int expectedMcCount, int actualMcCount, int missing);

    /** A good frame of VC {@code vcid} dropped by its VC count (ICD §10): it fed nothing. */
    void onFrameDropped(int vcid, int vcCount, FrameDrop why);

    /**
     * The VC count sequence started again (ICD §10: a restart, or an outage of more than 127 frames):
     * after {@code lastVcCount} the VC goes on from {@code newVcCount}; the partial packet was dropped.
     */
    void onVcRestart(int vcid, int lastVcCount, int newVcCount);
}
