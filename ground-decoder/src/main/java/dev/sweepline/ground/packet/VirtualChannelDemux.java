package dev.sweepline.ground.packet;

import dev.sweepline.ground.frame.FrameConstants;
import dev.sweepline.ground.frame.TmFrameHeader;

/**
 * Splits good frames by virtual channel, lets each VC's {@link VcFrameGate} drop repeated and stale
 * frames and find restarts of the count sequence (ICD §10), checks the master channel count and the
 * per-VC count of the frames accepted (8 bits, wrapping; CCSDS 132.0-B-3 §4.1.2.5–6, ICD §2) and feeds
 * each VC's data field to its {@link VcReassembler}.
 *
 * <p>A partial packet is dropped only when its own VC count jumps forward or starts again: a
 * master-count jump with the VC's count in step means the lost frames belonged to other VCs, and this
 * VC's packet is whole. A dropped frame touches neither count nor packet. A frame rejected for a bad
 * FECF cannot be attributed to a VC; the next frame of its VC shows the jump. The MC count is checked
 * on frames accepted as they arrive; a restart resets it, since the MC count starts again too.
 * Not thread-safe.
 */
public final class VirtualChannelDemux {
    /** Number of VCIDs: 3 bits (CCSDS 132.0-B-3 §4.1.2.4). */
    public static final int VC_COUNT = 8;

    private final PacketListener listener;
    private final VcReassembler[] vcs = new VcReassembler[VC_COUNT];
    private final VcFrameGate[] gates = new VcFrameGate[VC_COUNT];
    private int lastMcCount = -1;
    /** True while the held first frame of a new sequence is fed, which arrived before frames already checked. */
    private boolean lateFrame;

    /** @param listener receives packets, anomalies, gaps, drops and restarts of every VC */
    public VirtualChannelDemux(PacketListener listener) {
        this.listener = listener;
        for (int v = 0; v < VC_COUNT; v++) {
            vcs[v] = new VcReassembler(v, listener);
            gates[v] = new VcFrameGate(new Gated(v));
        }
    }

    /** Takes a frame that passed the synchroniser's checks. */
    public void onFrame(byte[] buf, int off, int frameOctets) {
        gates[TmFrameHeader.vcid(buf, off)].offer(buf, off, frameOctets);
    }

    /** Ends the stream: frames held and partial packets still held are reported. */
    public void finish() {
        for (VcFrameGate g : gates) {
            g.finish();
        }
        for (VcReassembler r : vcs) {
            r.finish();
        }
    }

    private void checkMasterCount(int mc) {
        if (lastMcCount >= 0) {
            int missing = (mc - lastMcCount - 1) & 0xFF;
            if (missing != 0) {
                listener.onMasterChannelGap((lastMcCount + 1) & 0xFF, mc, missing);
            }
        }
        lastMcCount = mc;
    }

    /** The gate decisions of one VC. */
    private final class Gated implements VcFrameGate.Sink {
        private final int vc;

        Gated(int vc) {
            this.vc = vc;
        }

        @Override
        public void accept(byte[] buf, int off, int frameOctets, int missing) {
            if (lateFrame) {
                lateFrame = false;
            } else {
                checkMasterCount(TmFrameHeader.mcCount(buf, off));
            }
            if (missing != 0) {
                int count = TmFrameHeader.vcCount(buf, off);
                listener.onFrameGap(vc, (count - missing) & 0xFF, count, missing);
                vcs[vc].onGap();
            }
            int dataOff = off + FrameConstants.PRIMARY_HEADER_OCTETS;
            int dataLen = frameOctets - FrameConstants.PRIMARY_HEADER_OCTETS - FrameConstants.FECF_OCTETS
                    - (TmFrameHeader.ocfFlag(buf, off) ? FrameConstants.OCF_OCTETS : 0);
            vcs[vc].onDataField(buf, dataOff, dataLen, TmFrameHeader.firstHeaderPointer(buf, off));
        }

        @Override
        public void drop(int vcCount, FrameDrop why) {
            listener.onFrameDropped(vc, vcCount, why);
        }

        @Override
        public void restart(int lastCount, int newCount) {
            vcs[vc].onGap();
            lastMcCount = -1;
            lateFrame = true;
            listener.onVcRestart(vc, lastCount, newCount);
        }
    }
}
