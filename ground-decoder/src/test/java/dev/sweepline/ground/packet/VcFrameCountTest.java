package dev.sweepline.ground.packet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.DecodeStats;
import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.RecordingListener;
import dev.sweepline.ground.decode.TestPackets;
import dev.sweepline.ground.frame.FrameReason;
import dev.sweepline.ground.frame.TmFrameHeader;
import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Repeated, stale and foreign frames, and restarts of the count sequence, through the whole decoder
 * (telemetry ICD §2 and §10; CCSDS 132.0-B-3 §4.1.2.4–6). Each stream is a clean one of this class's
 * builder with frames put in; what must come out is the clean stream's packets, each once.
 */
class VcFrameCountTest {
    /** Frame length: 128 octets, the ICD §1 minimum, so that packets span frames. */
    private static final int L = 128;
    private static final long T0 = 0x7FE81780L;

    /**
     * Spectra of 20 windows: 6 + 6 + 14 + 5 + 3 + 1 + 4 × (2 + 40) = 203 octets (ICD §3, §4), across two or
     * three frames of 120 data octets (ICD §2).
     */
    private static byte[] spectrum(int seq, long coarse) {
        int c = 20;
        int[][] adc = new int[4][c];
        for (int q = 0; q < 4; q++) {
            for (int i = 0; i < c; i++) {
                adc[q][i] = 300 + 10 * q + i + 7 * seq;
            }
        }
        return TestPackets.spectrum(0x100, seq, coarse, 0, seq, 0, new int[c], new boolean[c], adc);
    }

    /**
     * {@code n} spectra on VC 0 and, after the second, a VC 1 frame holding three whole housekeeping
     * packets (38 octets each: 6 + 6 + the 26 of the ICD §5 baseline), 114 of its 120 data octets, so that
     * the idle packet completing it spills into a second VC 1 frame (ICD §2 flush: a tail under 7 octets).
     */
    private static FrameStreamBuilder stream(int n, long t0) {
        return stream(new FrameStreamBuilder(L), n, t0);
    }

    /** As above, appended to {@code b}. */
    private static FrameStreamBuilder stream(FrameStreamBuilder b, int n, long t0) {
        for (int s = 0; s < n; s++) {
            b.add(0, spectrum(s, t0 + s));
            if (s == 1) {
                for (int h = 0; h < HOUSEKEEPING; h++) {
                    b.add(1, TestPackets.housekeeping(h, t0 + s, h));
                }
                b.flush(1);
            }
        }
        return b.flush(0);
    }

    /** Housekeeping packets of {@link #stream}. */
    private static final int HOUSEKEEPING = 3;

    /** Index of the frame of VC {@code vc} in {@code b}'s frames: the first one. */
    private static int firstFrameOfVc(FrameStreamBuilder b, int vc) {
        for (int i = 0; i < b.frames().size(); i++) {
            if (TmFrameHeader.vcid(b.frames().get(i), 0) == vc) {
                return i;
            }
        }
        throw new AssertionError("no frame of VC " + vc);
    }

    /** The first carrying frame of spectrum {@code s} (of VC 0), which spans frames. */
    private static int firstFrameOf(FrameStreamBuilder b, int s) {
        List<Integer> carriers = b.packets().stream().filter(c -> c.vcid() == 0).toList().get(s).frames();
        assertTrue(carriers.size() > 1, "spectrum " + s + " must span frames");
        return carriers.get(0);
    }

    /** What the decoder reported and counted. */
    private record Decoded(RecordingListener r, DecodeStats stats) {
    }

    private static Decoded decode(List<byte[]> frames) {
        RecordingListener r = new RecordingListener();
        return new Decoded(r, r.decode(FrameStreamBuilder.stream(frames), L).stats());
    }

    /** Every packet of {@code b}, once, and no anomaly, gap or error of any kind. */
    private static void assertClean(FrameStreamBuilder b, Decoded d, int spectra) {
        RecordingListener r = d.r();
        assertEquals(b.packets().size(), r.packets.size(), "packets");
        assertEquals(sorted(b.packets().stream().map(FrameStreamBuilder.Carried::packet).toList()),
                sorted(r.packets), "packets, each once");
        assertEquals(spectra, r.spectra.size(), "spectra");
        assertEquals(HOUSEKEEPING, r.housekeeping.size(), "housekeeping");
        assertTrue(r.anomalies.isEmpty(), "anomalies " + r.anomalies);
        assertTrue(r.frameGaps.isEmpty(), "frame gaps " + r.frameGaps);
        assertTrue(r.mcGaps.isEmpty(), "master-channel gaps " + r.mcGaps.size());
        assertTrue(r.sequenceGaps.isEmpty(), "sequence gaps " + r.sequenceGaps);
        assertTrue(r.restarts.isEmpty(), "restarts " + r.restarts);
    }

    private static List<ByteBuffer> sorted(List<byte[]> packets) {
        List<ByteBuffer> l = new ArrayList<>();
        for (byte[] p : packets) {
            l.add(ByteBuffer.wrap(p));
        }
        l.sort(null);
        return l;
    }

    private static int vcCount(byte[] frame) {
        return TmFrameHeader.vcCount(frame, 0);
    }

    @Test
    void shouldDropAnAdjacentRepeatWithoutDuplicateRecordsOrAGap() {
        FrameStreamBuilder b = stream(6, T0);
        List<byte[]> frames = new ArrayList<>(b.frames());
        int a = firstFrameOf(b, 4);
        int hk = firstFrameOfVc(b, 1);
        assertTrue(hk < a);
        frames.add(a + 1, frames.get(a).clone()); // the same frame twice in a row, packet 4 in progress
        frames.add(hk + 1, frames.get(hk).clone()); // and the frame of whole housekeeping packets
        Decoded d = decode(frames);
        assertClean(b, d, 6);
        assertEquals(List.of(new RecordingListener.Drop(1, 0, FrameDrop.DUPLICATE),
                new RecordingListener.Drop(0, vcCount(frames.get(a + 1)), FrameDrop.DUPLICATE)), d.r().drops);
        assertEquals(2, d.stats().framesDropped(FrameDrop.DUPLICATE));
        assertEquals(0, d.stats().framesDropped(FrameDrop.STALE));
    }

    @Test
    void shouldDropAStaleFrameAndKeepThePacketInProgress() {
        FrameStreamBuilder b = stream(6, T0);
        List<byte[]> frames = new ArrayList<>(b.frames());
        int a = firstFrameOf(b, 3);
        frames.add(a + 1, frames.get(0).clone()); // VC count 0 again, a few frames behind (ICD §2)
        Decoded d = decode(frames);
        assertClean(b, d, 6);
        assertEquals(List.of(new RecordingListener.Drop(0, 0, FrameDrop.STALE)), d.r().drops);
        assertEquals(1, d.stats().framesDropped(FrameDrop.STALE));
    }

    @Test
    void shouldDropAReplayedRunOfOldFramesInOrder() {
        FrameStreamBuilder b = stream(8, T0);
        List<byte[]> frames = new ArrayList<>(b.frames());
        int a = firstFrameOf(b, 6);
        // frames 1..5 again, in order: counts that run on among themselves, but copies of frames seen
        for (int k = 5; k >= 1; k--) {
            frames.add(a + 1, frames.get(k).clone());
        }
        Decoded d = decode(frames);
        assertClean(b, d, 8);
        // frames 1..5 are VC 0 counts 1, 2, 3 and VC 1 counts 0, 1; VC 1 has no frame after them, so its
        // count 1 is the last accepted: a duplicate, the other four are stale (ICD §10)
        assertEquals(4, d.stats().framesDropped(FrameDrop.STALE));
        assertEquals(1, d.stats().framesDropped(FrameDrop.DUPLICATE));
        assertEquals(0, d.stats().vcRestarts());
    }

    @Test
    void shouldRejectFramesOfAnUnusedVcidWithoutTouchingAnyVc() {
        FrameStreamBuilder b = stream(6, T0);
        List<byte[]> frames = new ArrayList<>(b.frames());
        int a = firstFrameOf(b, 4);
        int hk = firstFrameOfVc(b, 1);
        // ICD §2 uses VCIDs 0, 1 and 7: CRC-valid frames relabelled 3 and 5, one of whole housekeeping
        // packets, one of a science packet's middle, in the middle of science packet 4
        frames.add(a + 1, FrameStreamBuilder.withVcid(frames.get(a + 1), 3));
        frames.add(a + 1, FrameStreamBuilder.withVcid(frames.get(hk), 5));
        Decoded d = decode(frames);
        assertClean(b, d, 6);
        assertEquals(2, d.stats().framesBad(FrameReason.UNKNOWN_VCID));
        assertEquals(b.frames().size(), d.stats().framesGood(), "good frames: the clean stream's");
        assertTrue(d.r().drops.isEmpty());
    }

    /**
     * Frames of a run that restarts after {@code before}'s frames: the flight software starts its counts
     * at 0 (MC, VC and packet sequence counts), so after a few frames they jump back by less than 128.
     * An idle frame comes first, so that no frame after the restart equals, header and all, one before
     * it: a frame equal to one already accepted is a copy, never the start of a new sequence (ICD §10).
     */
    private static List<byte[]> restarted(FrameStreamBuilder before, FrameStreamBuilder after) {
        assertTrue(before.frames().size() < 128, "the restart must land behind the last count");
        List<byte[]> frames = new ArrayList<>(before.frames());
        frames.addAll(after.frames());
        return frames;
    }

    @Test
    void shouldTakeABackwardRunOfNewFramesAsARestartOfTheCounts() {
        FrameStreamBuilder before = stream(new FrameStreamBuilder(L).idleFrame(), 3, T0);
        FrameStreamBuilder after = stream(3, T0 + 100);
        Decoded d = decode(restarted(before, after));
        RecordingListener r = d.r();
        assertEquals(6, r.spectra.size());
        assertEquals(2 * HOUSEKEEPING, r.housekeeping.size());
        List<byte[]> all = new ArrayList<>();
        before.packets().forEach(c -> all.add(c.packet()));
        after.packets().forEach(c -> all.add(c.packet()));
        assertEquals(sorted(all), sorted(r.packets));
        // VC 0 went 0..5 then starts again at 0; VC 1 went 0..1 then starts again at 0
        assertEquals(List.of(new RecordingListener.Restart(0, 5, 0), new RecordingListener.Restart(1, 1, 0)),
                r.restarts);
        assertEquals(2, d.stats().vcRestarts());
        // a restart is no gap: no frames, and no packets, are known to be missing
        assertTrue(r.frameGaps.isEmpty(), "frame gaps " + r.frameGaps);
        assertTrue(r.mcGaps.isEmpty(), "master-channel gaps " + r.mcGaps.size());
        assertTrue(r.sequenceGaps.isEmpty(), "sequence gaps " + r.sequenceGaps);
        assertTrue(r.anomalies.isEmpty(), "anomalies " + r.anomalies);
        assertTrue(r.drops.isEmpty(), "drops " + r.drops);
    }

    @Test
    void shouldDropThePacketCutShortByARestart() {
        FrameStreamBuilder before = stream(new FrameStreamBuilder(L).idleFrame(), 3, T0);
        List<byte[]> cut = new ArrayList<>(before.frames());
        cut.remove(cut.size() - 1); // the run stops inside spectrum 2
        FrameStreamBuilder after = stream(3, T0 + 100);
        List<byte[]> frames = new ArrayList<>(cut);
        frames.addAll(after.frames());
        RecordingListener r = decode(frames).r();
        // spectra 0 and 1 of the first run, all three of the second; the cut one is dropped, not spliced
        assertEquals(5, r.spectra.size());
        assertEquals(1, r.anomalies.size());
        assertEquals(PacketAnomaly.INCOMPLETE_AT_GAP, r.anomalies.get(0).anomaly());
        assertEquals(2, r.restarts.size());
    }

    @Test
    void shouldStartAgainAfterAnOutageOfMoreThan127FramesAndStillCountThePacketsLost() {
        FrameStreamBuilder b = new FrameStreamBuilder(L);
        for (int s = 0; s < 200; s++) {
            b.add(0, spectrum(s & 0x3FFF, T0 + s));
        }
        b.flush(0);
        List<byte[]> frames = new ArrayList<>(b.frames());
        int from = firstFrameOf(b, 10) + 1;
        int lost = 150; // VC count jumps by 151: 105 behind, the way a restart looks (ICD §10)
        frames.subList(from, from + lost).clear();
        RecordingListener r = decode(frames).r();
        assertEquals(1, r.restarts.size());
        assertTrue(r.frameGaps.isEmpty(), "no frame count can be told: " + r.frameGaps);
        // the packet sequence count (14 bits, CCSDS 133.0-B-2 §4.1.3.4.3) still tells the spectra lost
        int decoded = r.spectra.size();
        assertEquals(1, r.sequenceGaps.size());
        assertEquals(200 - decoded, r.sequenceGaps.get(0).missing());
        assertTrue(r.drops.isEmpty(), "the first frame after the outage is held, then taken: " + r.drops);
    }

    @Test
    void shouldShowARestartWhoseCountsLieAheadAsAGap() {
        // 180 frames of VC 0 before the restart: count 0 is then 76 ahead of the last, 179 (ICD §10: a
        // count cannot tell this restart from a loss of 75 frames)
        FrameStreamBuilder before = new FrameStreamBuilder(L);
        for (int s = 0; before.frames().size() < 180; s++) {
            before.add(0, spectrum(s, T0 + s));
        }
        before.flush(0);
        List<byte[]> frames = new ArrayList<>(before.frames());
        int last = vcCount(frames.get(frames.size() - 1));
        frames.addAll(stream(3, T0 + 1000).frames());
        RecordingListener r = decode(frames).r();
        assertTrue(r.restarts.isEmpty());
        assertEquals(new dev.sweepline.ground.decode.FrameGap(0, (last + 1) & 0xFF, 0, (255 - last) & 0xFF),
                r.frameGaps.get(0));
        assertTrue(r.drops.isEmpty());
    }
}
