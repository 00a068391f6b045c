package dev.sweepline.ground.packet;

import dev.sweepline.ground.frame.FrameConstants;

/**
 * Rebuilds the space packets of one virtual channel from the data fields of its frames, using the
 * first header pointer (CCSDS 132.0-B-3 §4.1.2.7.6, ICD §2). Packets wholly inside one frame are
 * reported as views of the frame; packets that span frames are copied into one buffer.
 *
 * <p>Rules: after a frame gap the partial packet is dropped and reassembly resumes at the next FHP;
 * the FHP is checked against the packet in progress (see {@link PacketAnomaly}); when inconsistent the
 * doubtful packet is dropped and reassembly resumes at the FHP. Not thread-safe.
 */
public final class VcReassembler {
    private final int vcid;
    private final PacketListener listener;
    /** Room for the first packets: a frame's worth; grows to the longest packet met, at most 65,542 octets. */
    static final int INITIAL_PARTIAL_OCTETS = FrameConstants.MAX_FRAME_OCTETS;

    /** The packet in progress: {@link #INITIAL_PARTIAL_OCTETS} at first, grown (never shrunk) to fit it. */
    private byte[] partial = new byte[INITIAL_PARTIAL_OCTETS];
    /** Octets of the packet in progress held in {@link #partial}; 0 when none. */
    private int have;
    /** Length of the packet in progress, or -1 while its header is incomplete. */
    private int need = -1;
    /** True when the position in the packet stream is known at the end of the last frame. */
    private boolean synced;

    /** @param vcid the VC this reassembler serves; @param listener receives packets and anomalies */
    public VcReassembler(int vcid, PacketListener listener) {
        this.vcid = vcid;
        this.listener = listener;
    }

    /** Reports a partial packet still held at the end of the stream. */
    public void finish() {
        drop(PacketAnomaly.INCOMPLETE_AT_END);
        synced = false;
    }

    /** A frame of this VC was lost, or its count started again: the partial packet is dropped, sync is lost. */
    public void onGap() {
        drop(PacketAnomaly.INCOMPLETE_AT_GAP);
        synced = false;
    }

    /**
     * Takes the data field of the next frame of this VC.
     *
     * @param d   buffer holding the data field
     * @param off offset of its first octet
     * @param n   data field length, octets
     * @param fhp the frame's first header pointer
     */
    public void onDataField(byte[] d, int off, int n, int fhp) {
        if (fhp == FrameConstants.FHP_IDLE_ONLY) {
            if (inPacket()) {
                drop(PacketAnomaly.LENGTH_BEYOND_DATA);
                synced = false;
            }
            return;
        }
        boolean noStart = fhp == FrameConstants.FHP_NO_PACKET_START;
        if (!noStart && fhp >= n) {
            listener.onPacketAnomaly(vcid, PacketAnomaly.FHP_OUT_OF_RANGE, have + n);
            have = 0;
            need = -1;
            synced = false;
            return;
        }
        if (inPacket()) {
            continuePacket(d, off, noStart ? n : fhp, noStart);
        } else if (noStart) {
            if (synced) {
                // the last packet ended with the last frame, so something must start at offset 0
                listener.onPacketAnomaly(vcid, PacketAnomaly.FHP_INCONSISTENT, n);
            }
            synced = false;
            return;
        } else if (synced && fhp != 0) {
            listener.onPacketAnomaly(vcid, PacketAnomaly.FHP_INCONSISTENT, fhp);
        }
        if (!noStart) {
            startPackets(d, off + fhp, n - fhp);
        }
    }

    /** Feeds the packet in progress with the {@code room} octets before the FHP (or the whole field). */
    private void continuePacket(byte[] d, int off, int room, boolean noStart) {
        int used = feed(d, off, room);
        if (used < 0) {
            drop(PacketAnomaly.BAD_PACKET_HEADER);
            synced = false;
            return;
        }
        boolean complete = need >= 0 && have == need;
        if (!complete) {
            if (noStart) {
                synced = true;
            } else {
                drop(PacketAnomaly.LENGTH_BEYOND_DATA);
            }
            return;
        }
        if (used < room) {
            // the packet ended before the FHP (or mid-frame under FHP 0x7FF): which is wrong is unknown
            drop(PacketAnomaly.FHP_INCONSISTENT);
            synced = false;
            return;
        }
        listener.onPacket(vcid, partial, 0, have);
        have = 0;
        need = -1;
        synced = true;
    }

    private void startPackets(byte[] d, int p, int rem) {
        while (rem > 0) {
            if (rem < SpacePacketHeader.OCTETS) {
                System.arraycopy(d, p, partial, 0, rem);
                have = rem;
                need = -1;
                synced = true;
                return;
            }
            if (!SpacePacketHeader.isTelemetryVersion1(d, p)) {
                listener.onPacketAnomaly(vcid, PacketAnomaly.BAD_PACKET_HEADER, rem);
                synced = false;
                return;
            }
            int total = SpacePacketHeader.totalOctets(d, p);
            if (total > rem) {
                holdUpTo(total);
                System.arraycopy(d, p, partial, 0, rem);
                have = rem;
                need = total;
                synced = true;
                return;
            }
            listener.onPacket(vcid, d, p, total);
            p += total;
            rem -= total;
        }
        synced = true;
    }

    /** Moves up to {@code max} octets into the packet in progress; -1 when its header proves invalid. */
    private int feed(byte[] d, int off, int max) {
        int used = 0;
        if (need < 0) {
            int take = Math.min(SpacePacketHeader.OCTETS - have, max);
            System.arraycopy(d, off, partial, have, take);
            have += take;
            used = take;
            if (have < SpacePacketHeader.OCTETS) {
                return used;
            }
            if (!SpacePacketHeader.isTelemetryVersion1(partial, 0)) {
                return -1;
            }
            need = SpacePacketHeader.totalOctets(partial, 0);
            holdUpTo(need);
        }
        int take = Math.min(need - have, max - used);
        System.arraycopy(d, off + used, partial, have, take);
        have += take;
        return used + take;
    }

    /** Makes {@link #partial} hold {@code octets}, keeping the octets in it; doubles so that growth is rare. */
    private void holdUpTo(int octets) {
        if (octets > partial.length) {
            int grown = Math.min(Math.max(octets, 2 * partial.length), SpacePacketHeader.MAX_PACKET_OCTETS);
            partial = java.util.Arrays.copyOf(partial, grown);
        }
    }

    private boolean inPacket() {
        return have > 0;
    }

    private void drop(PacketAnomaly why) {
        if (have > 0) {
            listener.onPacketAnomaly(vcid, why, have);
        }
        have = 0;
        need = -1;
    }
}
