package dev.sweepline.ground.packet;

import dev.sweepline.ground.frame.FrameConstants;
import dev.sweepline.ground.frame.TmFrameHeader;

/**
 * Splits good frames by virtual channel, checks the master channel and per-VC frame counts
 * (8 bits, wrapping; CCSDS 132.0-B-3 §4.1.2.5–6, ICD §2) and feeds each VC's data field to its
 * {@link VcReassembler}.
 *
 * <p>A partial packet is dropped only when its own VC count jumps: a master-count jump with the VC's
 * count in step means the lost frames belonged to other VCs, and this VC's packet is whole. A frame
 * rejected for a bad FECF cannot be attributed to a VC; the next frame of its VC shows the jump.
 * Not thread-safe.
 */
public final class VirtualChannelDemux {
    /** Number of VCIDs: 3 bits (CCSDS 132.0-B-3 §4.1.2.4). */
    public static final int VC_COUNT = 8;

    private final PacketListener listener;
    private final VcReassembler[] vcs = new VcReassembler[VC_COUNT];
    private final int[] lastVcCount = new int[VC_COUNT];
    private int lastMcCount = -1;

    /** @param listener receives packets, anomalies and gaps of every VC */
    public VirtualChannelDemux(PacketListener listener) {
        this.listener = listener;
        for (int v = 0; v < VC_COUNT; v++) {
            vcs[v] = new VcReassembler(v, listener);
            lastVcCount[v] = -1;
        }
    }

    /** Takes a frame that passed the synchroniser's checks. */
    public void onFrame(byte[] buf, int off, int frameOctets) {
        int mc = TmFrameHeader.mcCount(buf, off);
        if (lastMcCount >= 0) {
            int missing = (mc - lastMcCount - 1) & 0xFF;
            if (missing != 0) {
                listener.onMasterChannelGap((lastMcCount + 1) & 0xFF, mc, missing);
            }
        }
        lastMcCount = mc;
        int vc = TmFrameHeader.vcid(buf, off);
        int count = TmFrameHeader.vcCount(buf, off);
        int last = lastVcCount[vc];
        if (last >= 0) {
            int missing = (count - last - 1) & 0xFF;
            if (missing != 0) {
                listener.onFrameGap(vc, (last + 1) & 0xFF, count, missing);
                vcs[vc].onGap();
            }
        }
        lastVcCount[vc] = count;
        int dataOff = off + FrameConstants.PRIMARY_HEADER_OCTETS;
        int dataLen = frameOctets - FrameConstants.PRIMARY_HEADER_OCTETS - FrameConstants.FECF_OCTETS
                - (TmFrameHeader.ocfFlag(buf, off) ? FrameConstants.OCF_OCTETS : 0);
        vcs[vc].onDataField(buf, dataOff, dataLen, TmFrameHeader.firstHeaderPointer(buf, off));
    }

    /** Ends the stream: partial packets still held are reported. */
    public void finish() {
        for (VcReassembler r : vcs) {
            r.finish();
        }
    }
}
