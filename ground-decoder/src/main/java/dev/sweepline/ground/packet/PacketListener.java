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
}
