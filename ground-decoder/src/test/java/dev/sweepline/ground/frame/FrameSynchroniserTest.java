package dev.sweepline.ground.frame;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.Hex;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class FrameSynchroniserTest {
    /** Frame length of the golden frames: 128 octets (GoldenFrames doc, ICD §1 minimum). */
    private static final int L = 128;

    private static final class Log implements FrameListener {
        final List<String> events = new ArrayList<>();

        @Override
        public void onFrame(byte[] buf, int off, int frameOctets, long streamOffset) {
            events.add("GOOD@" + streamOffset + " mc=" + TmFrameHeader.mcCount(buf, off));
        }

        @Override
        public void onBadFrame(FrameReason reason, long streamOffset, int octets) {
            events.add(reason + "@" + streamOffset + "/" + octets);
        }
    }

    private static List<String> run(byte[] stream, int chunk) {
        Log log = new Log();
        FrameSynchroniser s = new FrameSynchroniser(L, FrameConstants.CINDER_SCID, log);
        for (int i = 0; i < stream.length; i += chunk) {
            s.accept(stream, i, Math.min(chunk, stream.length - i));
        }
        s.finish();
        return log.events;
    }

    private static byte[] cat(byte[]... parts) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        for (byte[] p : parts) {
            o.writeBytes(p);
        }
        return o.toByteArray();
    }

    @Test
    void shouldFindEveryGoldenFrameWhateverTheChunking() {
        byte[] s = Hex.stream(GoldenFrames.STREAM);
        List<String> whole = run(s, s.length);
        // 6 frames of 4 + 128 octets, MC 5..10 (GoldenFrames), first frame after the 4-octet ASM
        assertEquals(6, whole.size());
        assertEquals("GOOD@4 mc=5", whole.get(0));
        assertEquals("GOOD@664 mc=10", whole.get(5));
        for (int chunk : new int[] {1, 3, 131, 132, 133, 1000}) {
            // partial reads are normal (issue 3): same events for any chunking
            assertEquals(whole, run(s, chunk), "chunk " + chunk);
        }
    }

    @Test
    void shouldGiveTheSameEventsWhenOneReadIsLongerThanTheBuffer() {
        // golden frames, damaged frames, cut frames and garbage, repeated past the synchroniser's first
        // buffer (frames taken in pieces of it once the length is known), fed whole and frame by frame
        Random rnd = new Random(0x5C4A_11L); // recorded seed
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        byte[] golden = Hex.stream(GoldenFrames.STREAM);
        while (o.size() < 3 * FrameSynchroniser.INITIAL_BUFFER_OCTETS) {
            byte[] part = golden.clone();
            switch (rnd.nextInt(4)) {
                case 0 -> part[4 + rnd.nextInt(part.length - 4)] ^= 0x04; // a bit flip: one bad FECF
                case 1 -> part = java.util.Arrays.copyOf(part, 4 + rnd.nextInt(part.length - 4)); // cut short
                case 2 -> o.writeBytes(new byte[1 + rnd.nextInt(300)]); // garbage before the frames
                default -> { }
            }
            o.writeBytes(part);
        }
        byte[] s = o.toByteArray();
        List<String> whole = run(s, s.length);
        long good = whole.stream().filter(e -> e.startsWith("GOOD")).count();
        // about 62 copies of the 6 golden frames (3 buffers of 16,416 octets / 792), each losing at most 2
        assertTrue(good > 4 * 60, "frames found: " + good);
        assertTrue(whole.stream().anyMatch(e -> e.startsWith("BAD_CRC")), "a bad frame among them");
        for (int chunk : new int[] {1, L + 4, 64 * 1024}) {
            assertEquals(whole, run(s, chunk), "chunk " + chunk);
        }
    }

    @Test
    void shouldCountGarbageBetweenFramesAndResync() {
        byte[] garbage = {0x1A, (byte) 0xCF, 0x00, 0x11, 0x22, 0x1A, (byte) 0xCF, (byte) 0xFC};
        byte[] s = cat(Hex.stream(GoldenFrames.HOUSEKEEPING_WITH_IDLE_TAIL), garbage,
                Hex.stream(GoldenFrames.SPECTRUM_PART_1));
        // 8 garbage octets at offset 132 (one 4 + 128 frame before), next frame after them + its ASM
        assertEquals(List.of("GOOD@4 mc=5", "GARBAGE_BEFORE_SYNC@132/8", "GOOD@144 mc=6"), run(s, 5));
    }

    @Test
    void shouldFlagABitFlipAsBadCrcAndDecodeTheNextFrame() {
        byte[] s = Hex.stream(GoldenFrames.HOUSEKEEPING_WITH_IDLE_TAIL, GoldenFrames.SPECTRUM_PART_1);
        s[4 + 40] ^= 0x10;
        // a single-bit error is always detected by a CRC-16 (CCSDS 132.0-B-3 §4.1.6; common practice)
        assertEquals(List.of("BAD_CRC@4/128", "GOOD@136 mc=6"), run(s, 7));
    }

    @Test
    void shouldFlagATruncatedFrameAndDecodeTheOneAfterIt() {
        byte[] first = Hex.stream(GoldenFrames.HOUSEKEEPING_WITH_IDLE_TAIL);
        byte[] cut = java.util.Arrays.copyOf(first, 4 + 100);
        byte[] s = cat(cut, Hex.stream(GoldenFrames.SPECTRUM_PART_1));
        // 100 of 128 octets arrived; the next ASM sits at 104 so its frame starts at 108
        assertEquals(List.of("TRUNCATED@4/100", "GOOD@108 mc=6"), run(s, 64));
    }

    @Test
    void shouldFlagATruncatedFileEnd() {
        byte[] s = Hex.stream(GoldenFrames.HOUSEKEEPING_WITH_IDLE_TAIL, GoldenFrames.SPECTRUM_PART_1);
        byte[] cut = java.util.Arrays.copyOf(s, s.length - 30);
        // the second frame lost its last 30 octets: 98 of 128 arrived
        assertEquals(List.of("GOOD@4 mc=5", "TRUNCATED@136/98"), run(cut, 50));
    }

    @Test
    void shouldFlagTheWrongSpacecraftAndTheWrongVersion() {
        byte[] wrongScid = reCrc(Hex.bytes(GoldenFrames.IDLE_FRAME), 0, (byte) 0x2D);
        byte[] wrongVersion = reCrc(Hex.bytes(GoldenFrames.IDLE_FRAME), 0, (byte) 0x6C);
        byte[] s = cat(Hex.ASM, wrongScid, Hex.ASM, wrongVersion, Hex.stream(GoldenFrames.IDLE_FRAME));
        // SCID 0x2D5 ≠ 0x2C5 (ICD §1); TFVN 01 ≠ 00 (CCSDS 132.0-B-3 §4.1.2.2); both with a valid FECF
        assertEquals(List.of("WRONG_SCID@4/128", "WRONG_VERSION@136/128", "GOOD@268 mc=8"), run(s, 128));
    }

    @Test
    void shouldRefuseAVcidTheIcdDoesNotUse() {
        // the idle frame's second octet 0x5E is SCID low nibble 5, VCID 7, OCF 0; 0x54 is VCID 2, 0x5C VCID 6
        byte[] vc2 = reCrc(Hex.bytes(GoldenFrames.IDLE_FRAME), 1, (byte) 0x54);
        byte[] vc6 = reCrc(Hex.bytes(GoldenFrames.IDLE_FRAME), 1, (byte) 0x5C);
        byte[] s = cat(Hex.ASM, vc2, Hex.ASM, vc6, Hex.stream(GoldenFrames.IDLE_FRAME));
        // ICD §2 uses VCIDs 0, 1 and 7 only; both with a valid FECF (CCSDS 132.0-B-3 §4.1.6)
        assertEquals(List.of("UNKNOWN_VCID@4/128", "UNKNOWN_VCID@136/128", "GOOD@268 mc=8"), run(s, 128));
    }

    @Test
    void shouldReportTrailingGarbageAtTheEnd() {
        byte[] s = cat(Hex.stream(GoldenFrames.IDLE_FRAME), new byte[] {1, 2});
        // 2 stray octets after the last frame (offset 132)
        assertEquals(List.of("GOOD@4 mc=8", "GARBAGE_BEFORE_SYNC@132/2"), run(s, 1));
    }

    @Test
    void shouldReportNothingButGarbageForRandomOctets() {
        byte[] noise = new byte[10_000];
        new Random(20261201L).nextBytes(noise); // recorded seed
        List<String> ev = run(noise, 999);
        // no frame can pass the CRC and header checks in 10 kB of noise except with probability ~2^-16 per ASM
        assertTrue(ev.stream().noneMatch(e -> e.startsWith("GOOD")), ev.toString());
    }

    @Test
    void shouldKeepTheNextFrameWhenAFrameOneOctetShortStillChecks() {
        // find an idle-frame variant whose FECF ends in 0x1A, the ASM's first octet (ICD §1)
        byte[] x = Hex.bytes(GoldenFrames.IDLE_FRAME);
        for (int v = 0; (x[L - 1] & 0xFF) != 0x1A; v++) {
            reCrc(x, 10, (byte) v);
        }
        byte[] y = Hex.bytes(GoldenFrames.HOUSEKEEPING_WITH_IDLE_TAIL);
        // the stream lost X's last octet; the next ASM's 0x1A stands in for it, so X still checks
        byte[] s = cat(Hex.ASM, java.util.Arrays.copyOf(x, L - 1), Hex.ASM, y);
        // X at 4 (MC 8), then Y one octet early: 4 + 127 + 4 = 135 (MC 5)
        assertEquals(List.of("GOOD@4 mc=8", "GOOD@135 mc=5"), run(s, 1));
        assertEquals(List.of("GOOD@4 mc=8", "GOOD@135 mc=5"), run(s, s.length));
    }

    /** Sets octet i, then rewrites the FECF so that only the header check can reject the frame. */
    private static byte[] reCrc(byte[] f, int i, byte v) {
        f[i] = v;
        int crc = Crc16Ibm3740.compute(f, 0, f.length - 2);
        f[f.length - 2] = (byte) (crc >>> 8);
        f[f.length - 1] = (byte) crc;
        return f;
    }
}
