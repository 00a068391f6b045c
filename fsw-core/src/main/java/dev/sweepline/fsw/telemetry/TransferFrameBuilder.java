package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.octets.Crc16;
/**
 * Packs space packets into fixed-length CCSDS 132.0-B-3 TM transfer frames (telemetry ICD §2):
 * packets of a virtual channel go back to back and span frames; the first header pointer marks the
 * first packet that starts in each frame; a frame is emitted when full, or completed with an idle
 * packet by {@link #flush} (at the end of a run, or when it has waited longer than the flush interval).
 *
 * <pre>
 * ASM(4) | TFVN(2) SCID(10) VCID(3) OCF(1) | MC(8) | VC(8) | 0 0 0 11 FHP(11) | data field | FECF(16)
 * </pre>
 *
 * All buffers are allocated at construction; {@link #writePacket} allocates nothing.
 * Threading: one thread, the executive's.
 */
public final class TransferFrameBuilder {
    /** Octets of the attached sync marker (CCSDS 131.0-B-4 §9). */
    public static final int ASM_LENGTH = 4;
    /** The attached sync marker 0x1ACFFC1D. */
    public static final int ASM = 0x1ACFFC1D;
    /** Octets of the frame primary header. */
    public static final int HEADER_LENGTH = 6;
    /** Octets of the frame error control field. */
    public static final int FECF_LENGTH = 2;
    /** First header pointer: no packet starts in this frame. */
    public static final int FHP_NO_PACKET_START = 0x7FF;
    /** First header pointer: idle data only. */
    public static final int FHP_IDLE_ONLY = 0x7FE;
    /** Virtual channels a builder serves (VCID 0..7). */
    public static final int VIRTUAL_CHANNELS = 8;
    /** Octet value of idle data. */
    public static final byte IDLE_OCTET = 0x55;
    /** Smallest and largest frame lengths this ICD allows. */
    public static final int MIN_FRAME_LENGTH = 128;
    /** Largest frame length this ICD allows (the FHP's 11 bits reach 2047). */
    public static final int MAX_FRAME_LENGTH = 2048;

    private final int spacecraftId;
    private final int frameLength;
    private final long[] flushIntervalMicros = new long[VIRTUAL_CHANNELS];
    private final FrameSink sink;
    private final byte[][] frames = new byte[VIRTUAL_CHANNELS][];
    private final int[] fill = new int[VIRTUAL_CHANNELS];
    private final int[] firstHeaderPointer = new int[VIRTUAL_CHANNELS];
    private final int[] vcCount = new int[VIRTUAL_CHANNELS];
    private final long[] openedAtMicros = new long[VIRTUAL_CHANNELS];
    private final long[] framesEmitted = new long[VIRTUAL_CHANNELS];
    private final byte[] idleHeader = new byte[SpacePacket.PRIMARY_HEADER_LENGTH];
    private int masterCount;
    private int idleSequence;

    /**
     * @param spacecraftId        10-bit SCID
     * @param frameLength         octets per frame, header and FECF included ({@value #MIN_FRAME_LENGTH}..{@value #MAX_FRAME_LENGTH})
     * @param flushIntervalMicros a frame holding data longer than this is completed with idle data by {@link #flushStale}
     * @param sink                receives the frames
     */
    public TransferFrameBuilder(int spacecraftId, int frameLength, long flushIntervalMicros, FrameSink sink) {
        if (frameLength < MIN_FRAME_LENGTH || frameLength > MAX_FRAME_LENGTH || (spacecraftId & ~0x3FF) != 0) {
            throw new IllegalArgumentException("frame length " + frameLength + " or SCID " + spacecraftId);
        }
        this.spacecraftId = spacecraftId;
        this.frameLength = frameLength;
        this.sink = sink;
        for (int vc = 0; vc < VIRTUAL_CHANNELS; vc++) {
            this.flushIntervalMicros[vc] = flushIntervalMicros;
            frames[vc] = new byte[ASM_LENGTH + frameLength];
            writeAsm(frames[vc]);
            fill[vc] = -1;
        }
    }

    /** Octets per frame (without the ASM). */
    public int frameLength() {
        return frameLength;
    }

    /** Octets of packet data one frame carries. */
    public int dataFieldLength() {
        return frameLength - HEADER_LENGTH - FECF_LENGTH;
    }

    /** Appends one whole packet to virtual channel {@code vc}, emitting every frame it fills. */
    public void writePacket(int vc, byte[] packet, int offset, int length, long nowMicros) {
        int pos = offset;
        int remaining = length;
        boolean starting = true;
        while (remaining > 0) {
            if (fill[vc] < 0) {
                open(vc, nowMicros);
            }
            if (starting && firstHeaderPointer[vc] == FHP_NO_PACKET_START) {
                firstHeaderPointer[vc] = fill[vc] - ASM_LENGTH - HEADER_LENGTH;
            }
            starting = false;
            int room = dataEnd() - fill[vc];
            int n = Math.min(room, remaining);
            System.arraycopy(packet, pos, frames[vc], fill[vc], n);
            fill[vc] += n;
            pos += n;
            remaining -= n;
            if (fill[vc] == dataEnd()) {
                emit(vc);
            }
        }
    }

    /** Completes the open frame of {@code vc} (if it holds data) with an idle packet and emits it. */
    public void flush(int vc, long nowMicros) {
        if (fill[vc] < 0) {
            return;
        }
        int tail = dataEnd() - fill[vc];
        // an idle packet needs 7 octets; a shorter tail takes one that also fills the next frame
        int idleLength = tail >= SpacePacket.MIN_LENGTH ? tail : tail + dataFieldLength();
        SpacePacket.writePrimaryHeader(idleHeader, 0, SpacePacket.TYPE_TM, false, SpacePacket.IDLE_APID,
                SpacePacket.UNSEGMENTED, idleSequence, idleLength - SpacePacket.PRIMARY_HEADER_LENGTH);
        idleSequence = (idleSequence + 1) & (SpacePacket.SEQUENCE_MODULUS - 1);
        int headerOctets = SpacePacket.PRIMARY_HEADER_LENGTH;
        int written = 0;
        boolean starting = true;
        while (written < idleLength) {
            if (fill[vc] < 0) {
                open(vc, nowMicros);
            }
            if (starting && firstHeaderPointer[vc] == FHP_NO_PACKET_START) {
                firstHeaderPointer[vc] = fill[vc] - ASM_LENGTH - HEADER_LENGTH;
            }
            starting = false;
            byte[] f = frames[vc];
            while (fill[vc] < dataEnd() && written < idleLength) {
                f[fill[vc]++] = written < headerOctets ? idleHeader[written] : IDLE_OCTET;
                written++;
            }
            if (fill[vc] == dataEnd()) {
                emit(vc);
            }
        }
    }

    /** Flushes every virtual channel. */
    public void flushAll(long nowMicros) {
        for (int vc = 0; vc < VIRTUAL_CHANNELS; vc++) {
            flush(vc, nowMicros);
        }
    }

    /**
     * Sets the flush interval of virtual channel {@code vc} (allocation-free): an open frame of it is
     * completed by the next {@link #flushStale} once it has held data this long.
     */
    public void flushInterval(int vc, long micros) {
        flushIntervalMicros[vc] = micros;
    }

    /** The flush interval of virtual channel {@code vc}, microseconds. */
    public long flushInterval(int vc) {
        return flushIntervalMicros[vc];
    }

    /** Flushes the frames that have waited longer than the flush interval; returns how many. */
    public int flushStale(long nowMicros) {
        int flushed = 0;
        for (int vc = 0; vc < VIRTUAL_CHANNELS; vc++) {
            if (fill[vc] >= 0 && nowMicros - openedAtMicros[vc] >= flushIntervalMicros[vc]) {
                flush(vc, nowMicros);
                flushed++;
            }
        }
        return flushed;
    }

    /** Emits one frame of idle data only (FHP 0x7FE) on {@code vc}, for constant-rate links. */
    public void emitIdleFrame(int vc) {
        if (fill[vc] >= 0) {
            throw new IllegalStateException("VC " + vc + " has an open frame");
        }
        open(vc, 0);
        byte[] f = frames[vc];
        for (int i = fill[vc]; i < dataEnd(); i++) {
            f[i] = IDLE_OCTET;
        }
        fill[vc] = dataEnd();
        firstHeaderPointer[vc] = FHP_IDLE_ONLY;
        emit(vc);
    }

    /** Frames emitted on {@code vc} since construction. */
    public long framesEmitted(int vc) {
        return framesEmitted[vc];
    }

    /** Frames emitted on all virtual channels. */
    public long framesEmitted() {
        long sum = 0;
        for (long n : framesEmitted) {
            sum += n;
        }
        return sum;
    }

    private int dataEnd() {
        return ASM_LENGTH + frameLength - FECF_LENGTH;
    }

    private void open(int vc, long nowMicros) {
        fill[vc] = ASM_LENGTH + HEADER_LENGTH;
        firstHeaderPointer[vc] = FHP_NO_PACKET_START;
        openedAtMicros[vc] = nowMicros;
    }

    private void emit(int vc) {
        byte[] f = frames[vc];
        int h = ASM_LENGTH;
        int word0 = (spacecraftId << 4) | (vc << 1); // TFVN 00, OCF flag 0
        BigEndian.put16(f, h, word0);
        f[h + 2] = (byte) masterCount;
        f[h + 3] = (byte) vcCount[vc];
        int status = 0b0001_1000_0000_0000 | firstHeaderPointer[vc]; // sec hdr 0, sync 0, order 0, SLI 11
        BigEndian.put16(f, h + 4, status);
        int crcAt = ASM_LENGTH + frameLength - FECF_LENGTH;
        BigEndian.put16(f, crcAt, Crc16.of(f, ASM_LENGTH, frameLength - FECF_LENGTH));
        masterCount = (masterCount + 1) & 0xFF;
        vcCount[vc] = (vcCount[vc] + 1) & 0xFF;
        framesEmitted[vc]++;
        fill[vc] = -1;
        sink.accept(f, 0, ASM_LENGTH + frameLength);
    }

    private static void writeAsm(byte[] f) {
        BigEndian.put32(f, 0, ASM);
    }
}
