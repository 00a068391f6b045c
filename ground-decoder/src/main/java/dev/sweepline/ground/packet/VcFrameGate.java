package dev.sweepline.ground.packet;

import dev.sweepline.ground.frame.BigEndian;
import dev.sweepline.ground.frame.FrameConstants;
import dev.sweepline.ground.frame.TmFrameHeader;

/**
 * Decides which good frames of one virtual channel go on to reassembly, by the 8-bit VC frame count
 * (CCSDS 132.0-B-3 §4.1.2.6, ICD §2) and the rule of ICD §10. With L the count of the last frame
 * accepted and d = (count − L) mod 256:
 * <ul>
 *   <li>d = 1..{@value #AHEAD_WINDOW}: forward, accepted; d − 1 frames were lost;</li>
 *   <li>d = 0 ({@link FrameDrop#DUPLICATE}) or d = 129..255, i.e. 1..127 behind ({@link FrameDrop#STALE}):
 *       dropped, unless it starts a new count sequence (below).</li>
 * </ul>
 * An 8-bit count cannot tell 128 ahead from 128 behind: each way takes half the circle, as in serial
 * number arithmetic (RFC 1982 §3.2), and the tie goes forward, because lost frames are common and a
 * frame replayed from 128 frames back is not.
 *
 * <p>New sequence (a restart of the spacecraft, whose counts start again at 0, or an outage of more than
 * 127 frames of the VC): the gate keeps the FECF of the frame last accepted at each count. A frame behind
 * or equal to L whose FECF differs from the one kept for its count is not a copy of a frame already
 * decoded; it is held, and if the next frame of the VC follows it (count + 1) and is no copy either, the
 * count sequence started again: both are accepted, the first after a {@link Sink#restart}. Otherwise the
 * held frame is dropped by its count as above. A copy (same count, same FECF; two different frames of one
 * count share an FECF with probability 2^-16) is never a restart, so a replayed run of old frames in
 * order is dropped frame by frame. A forward frame is accepted even when it is a copy: on a link
 * carrying one VC only, idle frames repeat octet for octet every 256 frames.
 *
 * <p>Not thread-safe; one per VC.
 */
final class VcFrameGate {
    /** Largest forward distance of the VC count: 1..128 ahead is forward, 1..127 behind is stale (ICD §10). */
    static final int AHEAD_WINDOW = 128;
    /** VC count modulus: 8 bits (CCSDS 132.0-B-3 §4.1.2.6). */
    static final int COUNT_MODULUS = 256;
    private static final int NONE = -1;

    /** Where the gate's decisions go. */
    interface Sink {
        /** A frame accepted, after {@code missing} lost frames of its VC (0: in sequence or first). */
        void accept(byte[] buf, int off, int frameOctets, int missing);

        /** A frame dropped by its count. */
        void drop(int vcCount, FrameDrop why);

        /** The count sequence started again at {@code newCount}; the frame with that count follows. */
        void restart(int lastCount, int newCount);
    }

    private final Sink sink;
    private int last = NONE;
    /**
     * FECF of the frame last accepted at each count, NONE where none was. Kept across gaps and restarts:
     * a frame equal to one accepted at its count, however long ago, is a copy of it.
     */
    private final int[] fecfAt = new int[COUNT_MODULUS];
    /** The frame held while the next one tells whether it starts a new sequence; made when first needed. */
    private byte[] held;
    /** Octets of the held frame; 0 when none is held. */
    private int heldOctets;

    /** @param sink receives the gate's decisions */
    VcFrameGate(Sink sink) {
        this.sink = sink;
        java.util.Arrays.fill(fecfAt, NONE);
    }

    /** Forward distance of {@code count} from {@code last}, 0..255 (RFC 1982 §3.1 addition mod 2^8). */
    static int distance(int last, int count) {
        return (count - last) & (COUNT_MODULUS - 1);
    }

    /** The drop reason of a frame at forward distance {@code d} that is not forward. */
    static FrameDrop dropReason(int d) {
        return d == 0 ? FrameDrop.DUPLICATE : FrameDrop.STALE;
    }

    /** Takes the next good frame of this VC. */
    void offer(byte[] buf, int off, int frameOctets) {
        int count = TmFrameHeader.vcCount(buf, off);
        int fecf = fecf(buf, off, frameOctets);
        if (last == NONE) {
            take(buf, off, frameOctets, count, fecf, 0);
            return;
        }
        boolean copy = fecfAt[count] == fecf;
        if (heldOctets > 0) {
            int heldCount = TmFrameHeader.vcCount(held, 0);
            if (!copy && count == ((heldCount + 1) & (COUNT_MODULUS - 1))) {
                startAgain(heldCount);
                take(buf, off, frameOctets, count, fecf, 0);
                return;
            }
            dropHeld();
        }
        int d = distance(last, count);
        if (d >= 1 && d <= AHEAD_WINDOW) {
            take(buf, off, frameOctets, count, fecf, d - 1);
        } else if (copy) {
            sink.drop(count, dropReason(d));
        } else {
            // not a frame seen before: perhaps the first of a new sequence; the next frame tells
            if (held == null) {
                held = new byte[FrameConstants.MAX_FRAME_OCTETS];
            }
            System.arraycopy(buf, off, held, 0, frameOctets);
            heldOctets = frameOctets;
        }
    }

    /** Ends the stream: a frame still held is dropped by its count. */
    void finish() {
        if (heldOctets > 0) {
            dropHeld();
        }
    }

    private void startAgain(int heldCount) {
        sink.restart(last, heldCount);
        int n = heldOctets;
        heldOctets = 0;
        take(held, 0, n, heldCount, fecf(held, 0, n), 0);
    }

    private void dropHeld() {
        int count = TmFrameHeader.vcCount(held, 0);
        heldOctets = 0;
        sink.drop(count, dropReason(distance(last, count)));
    }

    private void take(byte[] buf, int off, int frameOctets, int count, int fecf, int missing) {
        last = count;
        fecfAt[count] = fecf;
        sink.accept(buf, off, frameOctets, missing);
    }

    private static int fecf(byte[] buf, int off, int frameOctets) {
        int at = off + frameOctets - FrameConstants.FECF_OCTETS;
        return BigEndian.u16(buf, at);
    }
}
