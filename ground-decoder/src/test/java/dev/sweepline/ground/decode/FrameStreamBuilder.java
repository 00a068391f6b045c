package dev.sweepline.ground.decode;

import dev.sweepline.ground.frame.Crc16Ibm3740;
import java.util.ArrayList;
import java.util.List;

/**
 * Packs packets into TM frames the way ICD §2 describes (frames emitted when full; flush with one idle
 * packet filling the tail, spanning into the next frame of the VC when the tail is under 7 octets), and
 * records which frames carry each packet. For tests; frames are returned without ASM. The CRC used is
 * the main code's, whose exactness the golden and catalogue tests pin.
 */
public final class FrameStreamBuilder {
    /** A packet and the indices of the frames carrying it. */
    public record Carried(int vcid, byte[] packet, List<Integer> frames) {
    }

    private final int frameOctets;
    private final int dataOctets;
    private final int scid;
    private final List<byte[]> frames = new ArrayList<>();
    private final List<Carried> packets = new ArrayList<>();
    private final byte[][] open = new byte[8][];
    private final int[] fill = new int[8];
    private final int[] fhp = new int[8];
    private final int[] vcCount = new int[8];
    /** Per VC: the carrier lists of the packets with a piece in the open frame, filled in at emission. */
    private final List<List<List<Integer>>> openCarriers = new ArrayList<>();
    private int mc;
    private int idleSeq;

    /** @param frameOctets L; @param scid spacecraft id */
    public FrameStreamBuilder(int frameOctets, int scid) {
        this.frameOctets = frameOctets;
        this.dataOctets = frameOctets - 8;
        this.scid = scid;
        java.util.Arrays.fill(fhp, -1);
        for (int v = 0; v < 8; v++) {
            openCarriers.add(new ArrayList<>());
        }
    }

    /** With SCID 0x2C5 (ICD §1). */
    public FrameStreamBuilder(int frameOctets) {
        this(frameOctets, 0x2C5);
    }

    /** Adds a packet to a VC; it is recorded unless it is idle. */
    public FrameStreamBuilder add(int vc, byte[] packet) {
        List<Integer> carriers = new ArrayList<>();
        int p = 0;
        while (p < packet.length) {
            if (open[vc] == null) {
                open[vc] = new byte[dataOctets];
                fill[vc] = 0;
                fhp[vc] = -1;
            }
            if (p == 0 && fhp[vc] < 0) {
                fhp[vc] = fill[vc];
            }
            int n = Math.min(packet.length - p, dataOctets - fill[vc]);
            System.arraycopy(packet, p, open[vc], fill[vc], n);
            fill[vc] += n;
            p += n;
            openCarriers.get(vc).add(carriers);
            if (fill[vc] == dataOctets) {
                emit(vc);
            }
        }
        if ((((packet[0] & 0x07) << 8) | (packet[1] & 0xFF)) != 0x7FF) {
            packets.add(new Carried(vc, packet, carriers));
        }
        return this;
    }

    /** Completes the VC's open frame with an idle packet (ICD §2 flush). */
    public FrameStreamBuilder flush(int vc) {
        if (open[vc] == null) {
            return this;
        }
        int tail = dataOctets - fill[vc];
        add(vc, TestPackets.idle(idleSeq++ & 0x3FFF, tail >= 7 ? tail : tail + dataOctets));
        return this;
    }

    /** Emits an idle frame on VC 7 (FHP 0x7FE, data 0x55). */
    public FrameStreamBuilder idleFrame() {
        byte[] d = new byte[dataOctets];
        java.util.Arrays.fill(d, (byte) 0x55);
        frames.add(frame(7, 0x7FE, d));
        return this;
    }

    private void emit(int vc) {
        for (List<Integer> c : openCarriers.get(vc)) {
            c.add(frames.size());
        }
        openCarriers.get(vc).clear();
        frames.add(frame(vc, fhp[vc] < 0 ? 0x7FF : fhp[vc], open[vc]));
        open[vc] = null;
    }

    private byte[] frame(int vc, int firstHeader, byte[] data) {
        byte[] f = new byte[frameOctets];
        int w0 = (scid << 4) | (vc << 1);
        f[0] = (byte) (w0 >>> 8);
        f[1] = (byte) w0;
        f[2] = (byte) mc;
        f[3] = (byte) vcCount[vc];
        f[4] = (byte) (0x18 | (firstHeader >>> 8));
        f[5] = (byte) firstHeader;
        System.arraycopy(data, 0, f, 6, dataOctets);
        int crc = Crc16Ibm3740.compute(f, 0, frameOctets - 2);
        f[frameOctets - 2] = (byte) (crc >>> 8);
        f[frameOctets - 1] = (byte) crc;
        mc = (mc + 1) & 0xFF;
        vcCount[vc] = (vcCount[vc] + 1) & 0xFF;
        return f;
    }

    /** Frames emitted so far (open frames are not included: flush them first). */
    public List<byte[]> frames() {
        return frames;
    }

    /** Non-idle packets added, with their carrying frames. */
    public List<Carried> packets() {
        return packets;
    }

    /** ASM + frame for every frame, concatenated. */
    public byte[] stream() {
        return stream(frames);
    }

    /** ASM + frame for each of {@code frames} (all of one length), concatenated. */
    public static byte[] stream(List<byte[]> frames) {
        int l = frames.isEmpty() ? 0 : frames.get(0).length;
        byte[] s = new byte[frames.size() * (l + 4)];
        int p = 0;
        for (byte[] f : frames) {
            System.arraycopy(Hex.ASM, 0, s, p, 4);
            System.arraycopy(f, 0, s, p + 4, l);
            p += l + 4;
        }
        return s;
    }

    /**
     * A copy of {@code frame} carrying VCID {@code vc} (CCSDS 132.0-B-3 §4.1.2.4: 3 bits after the SCID),
     * with its FECF recomputed so that it passes the CRC (CCSDS 132.0-B-3 §4.1.6).
     */
    public static byte[] withVcid(byte[] frame, int vc) {
        byte[] f = frame.clone();
        f[1] = (byte) ((f[1] & 0xF1) | (vc << 1));
        return withFecf(f);
    }

    /** {@code frame} (changed in place) with its FECF recomputed over all octets before it. */
    public static byte[] withFecf(byte[] frame) {
        int n = frame.length;
        int crc = Crc16Ibm3740.compute(frame, 0, n - 2);
        frame[n - 2] = (byte) (crc >>> 8);
        frame[n - 1] = (byte) crc;
        return frame;
    }
}
