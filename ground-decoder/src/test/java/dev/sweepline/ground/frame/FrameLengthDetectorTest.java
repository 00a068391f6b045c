package dev.sweepline.ground.frame;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.TestPackets;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class FrameLengthDetectorTest {
    private static byte[] stream(int l) {
        FrameStreamBuilder b = new FrameStreamBuilder(l);
        for (int i = 0; i < 40; i++) {
            b.add(1, TestPackets.housekeeping(i, 2_146_965_376L + i, 0));
        }
        b.flush(1).idleFrame();
        return b.stream();
    }

    @ParameterizedTest
    @ValueSource(ints = {128, 200, 1024, 1115, 2048})
    void shouldFindTheFrameLength(int l) {
        byte[] s = stream(l);
        byte[] withGarbage = new byte[s.length + 37];
        new Random(7L).nextBytes(withGarbage); // recorded seed; 37 octets of noise first
        System.arraycopy(s, 0, withGarbage, 37, s.length);
        // L within the ICD §1 range 128..2048; any L the stream was built with must come back
        assertEquals(l, FrameLengthDetector.detect(s, 0, s.length));
        assertEquals(l, FrameLengthDetector.detect(withGarbage, 0, withGarbage.length));
    }

    @Test
    void shouldDetectInsideTheSynchroniser() {
        byte[] s = stream(1115);
        int[] good = {0};
        FrameSynchroniser sync = new FrameSynchroniser(FrameSynchroniser.AUTO_LENGTH, FrameConstants.CINDER_SCID,
                new FrameListener() {
                    @Override
                    public void onFrame(byte[] buf, int off, int n, long at) {
                        good[0]++;
                    }

                    @Override
                    public void onBadFrame(FrameReason r, long at, int n) {
                    }
                });
        for (int i = 0; i < s.length; i += 500) {
            sync.accept(s, i, Math.min(500, s.length - i));
        }
        sync.finish();
        // 1115 as built; frames = all of them (stream length / (L + 4))
        assertEquals(1115, sync.frameOctets());
        assertEquals(s.length / 1119, good[0]);
    }

    @Test
    void shouldGiveUpOnNoise() {
        byte[] noise = new byte[20_000];
        new Random(11L).nextBytes(noise); // recorded seed
        // no ASM + valid FECF + ASM in noise: -1 (chance ~2^-48 per ASM candidate)
        assertEquals(-1, FrameLengthDetector.detect(noise, 0, noise.length));
    }
}
