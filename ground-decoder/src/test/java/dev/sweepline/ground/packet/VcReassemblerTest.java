package dev.sweepline.ground.packet;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.Hex;
import dev.sweepline.ground.decode.RecordingListener;
import dev.sweepline.ground.decode.TestPackets;
import dev.sweepline.ground.frame.Crc16Ibm3740;
import java.io.ByteArrayOutputStream;
import java.util.List;
import org.junit.jupiter.api.Test;

class VcReassemblerTest {
    /** Frame length used here: 128 octets, the ICD §1 minimum, so packets span frames soon. */
    private static final int L = 128;
    private static final long T0 = 0x7FE81780L;

    private static int[][] adc(int c, int base) {
        int[][] a = new int[4][c];
        for (int q = 0; q < 4; q++) {
            for (int i = 0; i < c; i++) {
                a[q][i] = base + 10 * q + i;
            }
        }
        return a;
    }

    private static byte[] spectrum(int seq, int c) {
        return TestPackets.spectrum(0x100, seq, T0 + seq, 0, seq, 0, new int[c], new boolean[c], adc(c, 300));
    }

    private static byte[] stream(List<byte[]> frames) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        for (byte[] f : frames) {
            o.writeBytes(Hex.ASM);
            o.writeBytes(f);
        }
        return o.toByteArray();
    }

    @Test
    void shouldRebuildPacketsSpanningSeveralFrames() {
        FrameStreamBuilder b = new FrameStreamBuilder(L);
        for (int s = 0; s < 5; s++) {
            b.add(0, spectrum(s, 60)); // 6+6+14+15+8+1+4*122 = 538 octets: five frames each
        }
        b.flush(0);
        RecordingListener r = new RecordingListener();
        r.decode(b.stream(), L);
        assertEquals(5, r.packets.size());
        for (int s = 0; s < 5; s++) {
            // octet-exact: the packets the builder put in (ICD §2 packing)
            assertArrayEquals(b.packets().get(s).packet(), r.packets.get(s));
        }
        assertTrue(r.anomalies.isEmpty(), r.anomalies.toString());
    }

    @Test
    void shouldDropThePartialPacketAtAVcGapAndResumeAtTheNextFhp() {
        FrameStreamBuilder b = new FrameStreamBuilder(L);
        for (int s = 0; s < 6; s++) {
            b.add(0, spectrum(s, 20)); // 178 octets: 1.5 frames each
        }
        b.flush(0);
        List<byte[]> frames = new java.util.ArrayList<>(b.frames());
        int lost = b.packets().get(2).frames().get(0); // first frame of packet 2
        frames.remove(lost);
        RecordingListener r = new RecordingListener();
        r.decode(stream(frames), L);
        // one VC 0 frame missing: VC count jump of 1 (ICD §2), and MC jump of 1
        assertEquals(1, r.frameGaps.size());
        assertEquals(1, r.frameGaps.get(0).missing());
        assertEquals(1, r.mcGaps.size());
        // packets touching the lost frame are gone; every other one comes out
        int expected = 0;
        for (FrameStreamBuilder.Carried c : b.packets()) {
            expected += c.frames().contains(lost) ? 0 : 1;
        }
        assertEquals(expected, r.packets.size());
        assertTrue(r.anomalies.stream().anyMatch(a -> a.anomaly() == PacketAnomaly.INCOMPLETE_AT_GAP));
        // and the sequence gap shows at the APID (packets lost: those touching the frame)
        assertEquals(6 - expected, r.sequenceGaps.get(0).missing());
    }

    @Test
    void shouldKeepAPartialPacketWhenOnlyAnotherVcLostAFrame() {
        FrameStreamBuilder b = new FrameStreamBuilder(L);
        b.add(0, spectrum(0, 20)); // 178 octets: frame 0 full, rest open
        b.add(1, TestPackets.housekeeping(1, T0, 0));
        b.flush(1); // a VC 1 frame between the two VC 0 frames
        b.flush(0);
        List<byte[]> frames = new java.util.ArrayList<>(b.frames());
        frames.remove(1); // the VC 1 frame
        RecordingListener r = new RecordingListener();
        r.decode(stream(frames), L);
        // MC jumps by one (ICD §2: MC counts frames of any VC) but VC 0 is whole: its packet comes out
        assertEquals(1, r.mcGaps.size());
        assertEquals(0, r.frameGaps.size());
        assertEquals(1, r.spectra.size());
    }

    @Test
    void shouldJoinAPacketHeaderSplitAcrossFrames() {
        FrameStreamBuilder b = new FrameStreamBuilder(L);
        // a 117-octet packet leaves 3 octets of the 120-octet data field: the event header splits 3 + 3
        byte[] report = TestPackets.packet(0x130, 0, true, new byte[111]);
        b.add(1, report).add(1, TestPackets.event(0, T0, 0, 1, 2, 3)).flush(1);
        RecordingListener r = new RecordingListener();
        r.decode(b.stream(), L);
        // second frame's FHP points past the event's remaining 15 octets (ICD §2); both packets come out
        assertEquals(2, b.frames().size());
        assertEquals(15, dev.sweepline.ground.frame.TmFrameHeader.firstHeaderPointer(b.frames().get(1), 0));
        assertEquals(2, r.packets.size());
        assertEquals(1, r.events.size());
        assertEquals(3, r.events.get(0).reasonCode());
        assertTrue(r.anomalies.isEmpty());
    }

    @Test
    void shouldFlagALengthRunningPastTheNextFhp() {
        // frame 1: a packet claiming 200 octets; frame 2: FHP 10 says a new packet starts after 10 octets
        byte[] big = TestPackets.packet(0x130, 0, true, new byte[194]);
        byte[] d1 = java.util.Arrays.copyOf(big, 120);
        byte[] d2 = new byte[120];
        byte[] ev = TestPackets.event(0, T0, 0, 1, 2, 0);
        System.arraycopy(ev, 0, d2, 10, ev.length);
        byte[] tail = TestPackets.idle(0, 120 - 10 - ev.length);
        System.arraycopy(tail, 0, d2, 10 + ev.length, tail.length);
        RecordingListener r = new RecordingListener();
        r.decode(stream(List.of(frame(0, 0, 0, d1), frame(1, 1, 10, d2))), L);
        // the 200-octet packet cannot end before octet 10 of frame 2: LENGTH_BEYOND_DATA, 130 octets dropped
        assertEquals(List.of(new RecordingListener.Anomaly(1, PacketAnomaly.LENGTH_BEYOND_DATA, 130)), r.anomalies);
        // and reassembly resumed at the FHP: the event comes out
        assertEquals(1, r.events.size());
    }

    @Test
    void shouldFlagAPacketEndingBeforeTheFhp() {
        // frame 1: HK packet (38) then a 100-octet packet starting at 38 (82 octets here, 18 to come)
        byte[] d1 = new byte[120];
        byte[] hk = TestPackets.housekeeping(0, T0, 0);
        System.arraycopy(hk, 0, d1, 0, hk.length);
        byte[] p = TestPackets.packet(0x130, 0, true, new byte[94]);
        System.arraycopy(p, 0, d1, 38, 82);
        // frame 2: FHP 30 although the packet needs only 18 more octets
        byte[] d2 = new byte[120];
        System.arraycopy(p, 82, d2, 0, 18);
        byte[] idle = TestPackets.idle(0, 90);
        System.arraycopy(idle, 0, d2, 30, 90);
        RecordingListener r = new RecordingListener();
        r.decode(stream(List.of(frame(0, 0, 0, d1), frame(1, 1, 30, d2))), L);
        // the packet length and the FHP disagree (ICD §2 FHP definition): flagged, the packet dropped
        assertEquals(PacketAnomaly.FHP_INCONSISTENT, r.anomalies.get(0).anomaly());
        assertEquals(1, r.housekeeping.size());
        assertEquals(1, r.packets.size());
    }

    @Test
    void shouldFlagAnFhpBeyondTheDataField() {
        RecordingListener r = new RecordingListener();
        r.decode(stream(List.of(frame(0, 0, 500, new byte[120]))), L);
        // 500 > 119, not 0x7FE or 0x7FF (CCSDS 132.0-B-3 §4.1.2.7.6)
        assertEquals(PacketAnomaly.FHP_OUT_OF_RANGE, r.anomalies.get(0).anomaly());
    }

    @Test
    void shouldJoinTheIdlePacketThatSpillsIntoTheNextFrame() {
        FrameStreamBuilder b = new FrameStreamBuilder(L);
        b.add(1, TestPackets.housekeeping(0, T0, 0)).add(1, TestPackets.housekeeping(1, T0, 0))
                .add(1, TestPackets.housekeeping(2, T0, 0)).flush(1);
        RecordingListener r = new RecordingListener();
        var d = r.decode(b.stream(), L);
        // 3 x 38 = 114, tail 6 < 7: idle packet of 126 spills into a second frame with FHP 0x7FF (ICD §2)
        assertEquals(2, b.frames().size());
        assertEquals(1, d.stats().packets(0x7FF));
        assertTrue(r.anomalies.isEmpty(), r.anomalies.toString());
    }

    /** A VC 1 frame, L = 128, with the given MC, FHP and 120-octet data field. */
    private static byte[] frame(int mc, int vcc, int fhp, byte[] data) {
        byte[] f = new byte[L];
        f[0] = 0x2C;
        f[1] = 0x52;
        f[2] = (byte) mc;
        f[3] = (byte) vcc;
        f[4] = (byte) (0x18 | (fhp >>> 8));
        f[5] = (byte) fhp;
        System.arraycopy(data, 0, f, 6, 120);
        int crc = Crc16Ibm3740.compute(f, 0, L - 2);
        f[L - 2] = (byte) (crc >>> 8);
        f[L - 1] = (byte) crc;
        return f;
    }
}
