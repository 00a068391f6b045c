package dev.sweepline.ground.decode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.instrument.InstrumentSet;
import dev.sweepline.ground.spectrum.QuadrantDecompressor;
import dev.sweepline.ground.spectrum.SpectrumView;
import java.lang.management.ManagementFactory;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Once a decoder has met a stream's kinds of packet, decoding more spectra allocates nothing: the frame,
 * packet and spectrum layers reuse their buffers and the listener reads the reused {@link SpectrumView}.
 * Measured with the JVM's count of the bytes the feeding thread allocated (HotSpot's
 * {@code com.sun.management.ThreadMXBean}); the test is skipped on a JVM without it.
 */
class DecodeAllocationTest {
    /** Seed of the spectra, recorded so a failure can be replayed. */
    private static final long SEED = 0xA110_C8L;
    /** Frame length: the ICD §1 default. */
    private static final int L = 1024;
    /** Spectra in the stream: the first half warms the decoder, the second is measured. */
    private static final int SPECTRA = 600;
    /**
     * Bytes the measured half may allocate, for some 300 spectra: less than one small object for every tenth
     * spectrum, so that any allocation per spectrum (a header record, an iterator: 24 to 48 bytes) fails.
     */
    private static final long ALLOWED_BYTES = 1024;

    /** Layout-1 and layout-2 survey and focus spectra of every built-in instrument, raw samples. */
    private static byte[] stream() {
        Random rnd = new Random(SEED);
        FrameStreamBuilder b = new FrameStreamBuilder(L);
        GroundInstrument[] instruments = InstrumentSet.builtIns().all().toArray(new GroundInstrument[0]);
        for (int seq = 0; seq < SPECTRA; seq++) {
            GroundInstrument in = instruments[seq % instruments.length];
            boolean layoutOne = seq % 3 == 0 && in.sampleBits() == QuadrantDecompressor.LAYOUT_1_SAMPLE_BITS;
            int c = 16 + rnd.nextInt(113);
            int[] gains = new int[c];
            boolean[] sat = new boolean[c];
            int[][] adc = new int[4][c];
            for (int i = 0; i < c; i++) {
                gains[i] = rnd.nextInt(in.gains().ranges());
                sat[i] = rnd.nextInt(20) == 0;
                for (int q = 0; q < 4; q++) {
                    adc[q][i] = rnd.nextInt(1 << in.sampleBits());
                }
            }
            int apid = seq % 2 == 0 ? 0x100 : 0x101;
            int count = seq / 2; // each APID's own sequence count, in step (ICD §3: counted per APID)
            byte[] p = layoutOne
                    ? TestPackets.spectrum(apid, count, 0x7FE81780L + seq, 0, seq, 0, gains, sat, adc)
                    : TestPackets.spectrumV2(in.id(), in.sampleBits(), 0, apid, count, 0x7FE81780L + seq, 0,
                            seq, 0, gains, sat, adc);
            b.add(0, p);
        }
        return b.stream();
    }

    @Test
    void shouldAllocateNothingPerSpectrumOnceWarm() {
        java.lang.management.ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        assumeTrue(mx instanceof com.sun.management.ThreadMXBean, "no per-thread allocation count on this JVM");
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) mx;
        assumeTrue(threads.isThreadAllocatedMemorySupported() && threads.isThreadAllocatedMemoryEnabled(),
                "per-thread allocation count switched off");
        byte[] s = stream();
        long[] decoded = new long[1];
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), QuadrantDecompressor.UNAVAILABLE,
                new DecodeListener() {
                    @Override
                    public void onSpectrumView(SpectrumView v) {
                        decoded[0]++;
                    }
                });
        int half = s.length / 2;
        feed(d, s, 0, half);
        long warm = decoded[0];
        long before = threads.getThreadAllocatedBytes(Thread.currentThread().getId());
        feed(d, s, half, s.length);
        long allocated = threads.getThreadAllocatedBytes(Thread.currentThread().getId()) - before;
        long measured = decoded[0] - warm;

        assertTrue(measured > SPECTRA / 3, measured + " spectra measured");
        assertEquals(0, d.stats().spectrumErrors().size(), "spectrum errors: " + d.stats().spectrumErrors());
        assertEquals(0, d.stats().sequenceGaps().size(), "a clean stream");
        assertTrue(allocated < ALLOWED_BYTES, allocated + " bytes allocated for " + measured + " spectra");
    }

    /** Feeds octets {@code from .. to} one frame (ASM included) at a time. */
    private static void feed(TelemetryDecoder d, byte[] s, int from, int to) {
        for (int at = from; at < to; at += L + 4) {
            d.accept(s, at, Math.min(L + 4, to - at));
        }
    }
}
