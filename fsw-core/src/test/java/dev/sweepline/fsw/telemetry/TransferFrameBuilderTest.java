package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.octets.Crc16;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class TransferFrameBuilderTest {
    private static final int LENGTH = 128;

    private final List<byte[]> frames = new ArrayList<>();
    private final FrameSink sink = (f, off, len) -> frames.add(Arrays.copyOfRange(f, off, off + len));

    @Test
    void shouldWriteTheStandardsExampleHeader() {
        TransferFrameBuilder b = new TransferFrameBuilder(0x2A5, LENGTH, Long.MAX_VALUE, sink);
        // bring VC 3's count to 0x22 and the master count, mod 256, to 0x11 with idle frames
        for (int i = 0; i < 0x22; i++) {
            b.emitIdleFrame(3);
        }
        for (int i = 0; i < 256 - 0x22 + 0x11; i++) {
            b.emitIdleFrame(0);
        }
        frames.clear();
        byte[] packet = new byte[LENGTH - 8]; // exactly one data field: the frame is emitted, FHP 0
        SpacePacket.writePrimaryHeader(packet, 0, 0, false, 0x100, 3, 0, packet.length - 6);
        b.writePacket(3, packet, 0, packet.length, 0);
        byte[] f = frames.get(0);
        // standards.md, CCSDS 132.0-B-3: SCID 0x2A5, VC 3, MC 0x11, VC 0x22, FHP 0 -> 2A 56 11 22 18 00
        assertArrayEquals(HexFormat.of().parseHex("1acffc1d" + "2a5611221800"), Arrays.copyOf(f, 10));
    }

    @Test
    void shouldEndEveryFrameWithItsCrc() {
        TransferFrameBuilder b = new TransferFrameBuilder(0x2C5, LENGTH, Long.MAX_VALUE, sink);
        b.writePacket(0, packet(0x100, 300, 1), 0, 300, 0);
        b.flushAll(0);
        for (byte[] f : frames) {
            // CRC-16/IBM-3740 residue over frame + FECF is 0 (Cook's catalogue)
            assertEquals(0, Crc16.of(f, 4, LENGTH));
            assertEquals(LENGTH + 4, f.length);
        }
        assertEquals(3, frames.size()); // 300 octets over 120-octet data fields: 3 frames, the last idle-filled
    }

    @Test
    void shouldMarkFramesWhereNoPacketStarts() {
        TransferFrameBuilder b = new TransferFrameBuilder(0x2C5, LENGTH, Long.MAX_VALUE, sink);
        b.writePacket(0, packet(0x100, 10, 1), 0, 10, 0);
        b.writePacket(0, packet(0x100, 300, 2), 0, 300, 0);
        // frame 1: packets start at 0; frame 2: only the continuation (FHP 0x7FF, ICD §2); frame 3:
        // the second packet's tail (300 - 110 - 120 = 70 octets) and then the idle packet at offset 70
        b.flushAll(0);
        assertEquals(0, fhp(frames.get(0)));
        assertEquals(0x7FF, fhp(frames.get(1)));
        assertEquals(70, fhp(frames.get(2)));
    }

    @Test
    void shouldCountMasterAndVirtualChannelFrames() {
        TransferFrameBuilder b = new TransferFrameBuilder(0x2C5, LENGTH, Long.MAX_VALUE, sink);
        b.writePacket(0, packet(0x100, 120, 1), 0, 120, 0);
        b.writePacket(1, packet(0x110, 120, 2), 0, 120, 0);
        b.writePacket(0, packet(0x100, 120, 3), 0, 120, 0);
        assertEquals(0, frames.get(0)[6] & 0xFF); // MC 0
        assertEquals(1, frames.get(1)[6] & 0xFF); // MC 1
        assertEquals(2, frames.get(2)[6] & 0xFF); // MC 2
        assertEquals(1, frames.get(2)[7] & 0xFF); // the second frame of VC 0
        assertEquals(0, frames.get(1)[7] & 0xFF); // the first frame of VC 1
        assertEquals(1, (frames.get(1)[5] >> 1) & 7); // VCID 1
    }

    @Test
    void shouldFillAShortTailWithAnIdlePacketSpanningIntoTheNextFrame() {
        TransferFrameBuilder b = new TransferFrameBuilder(0x2C5, LENGTH, Long.MAX_VALUE, sink);
        b.writePacket(0, packet(0x100, 117, 1), 0, 117, 0); // 3 octets left: less than an idle packet (7)
        b.flush(0, 0);
        assertEquals(2, frames.size());
        assertEquals(0x7FF, fhp(frames.get(1))); // the idle packet continues through the second frame
        List<byte[]> packets = reassemble(frames);
        assertEquals(2, packets.size());
        assertEquals(SpacePacket.IDLE_APID, SpacePacket.apid(packets.get(1), 0));
    }

    @Test
    void shouldFlushOnlyFramesOlderThanTheInterval() {
        TransferFrameBuilder b = new TransferFrameBuilder(0x2C5, LENGTH, 10_000_000, sink);
        b.writePacket(0, packet(0x100, 20, 1), 0, 20, 1_000_000);
        assertEquals(0, b.flushStale(10_999_999)); // T-1: not yet
        assertEquals(1, b.flushStale(11_000_000)); // T: flushed
        assertEquals(1, frames.size());
    }

    @Test
    void shouldCarryPacketsSplitAtEveryOffsetIntact() {
        // every packet length from the minimum to beyond two data fields, after every lead-in length
        SplittableRandom random = new SplittableRandom(20261201L); // recorded seed
        for (int lead = 0; lead < 120; lead += 7) {
            for (int length = SpacePacket.MIN_LENGTH; length <= 260; length += 3) {
                frames.clear();
                TransferFrameBuilder b = new TransferFrameBuilder(0x2C5, LENGTH, Long.MAX_VALUE, sink);
                List<byte[]> sent = new ArrayList<>();
                if (lead >= SpacePacket.MIN_LENGTH) {
                    sent.add(packet(0x110, lead, random.nextInt()));
                }
                sent.add(packet(0x100, length, random.nextInt()));
                sent.add(packet(0x101, 40, random.nextInt()));
                for (byte[] p : sent) {
                    b.writePacket(0, p, 0, p.length, 0);
                }
                b.flushAll(0);
                List<byte[]> got = reassemble(frames);
                got.removeIf(p -> SpacePacket.apid(p, 0) == SpacePacket.IDLE_APID);
                assertEquals(sent.size(), got.size(), "lead " + lead + " length " + length);
                for (int i = 0; i < sent.size(); i++) {
                    assertArrayEquals(sent.get(i), got.get(i), "lead " + lead + " length " + length);
                }
            }
        }
    }

    private static int fhp(byte[] frameWithAsm) {
        return ((frameWithAsm[8] & 0x07) << 8) | (frameWithAsm[9] & 0xFF);
    }

    /** A test-side reassembler: concatenates data fields and cuts packets by their length fields. */
    private static List<byte[]> reassemble(List<byte[]> frames) {
        ByteArrayOutputStream stream = new ByteArrayOutputStream();
        for (byte[] f : frames) {
            assertEquals(0, Crc16.of(f, 4, f.length - 4));
            stream.write(f, 10, f.length - 12);
        }
        byte[] all = stream.toByteArray();
        List<byte[]> packets = new ArrayList<>();
        int at = fhp(frames.get(0));
        while (at + 6 <= all.length) {
            int len = SpacePacket.totalLength(all, at);
            assertTrue(at + len <= all.length, "packet beyond the data");
            packets.add(Arrays.copyOfRange(all, at, at + len));
            at += len;
        }
        return packets;
    }

    private static byte[] packet(int apid, int length, int fillSeed) {
        byte[] p = new byte[length];
        new SplittableRandom(fillSeed).nextBytes(p);
        SpacePacket.writePrimaryHeader(p, 0, 0, false, apid, 3, 0, length - 6);
        return p;
    }
}
