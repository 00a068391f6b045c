package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.RecordingListener;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.decode.TestPackets;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The length Lq of a compressed quadrant stream (telemetry ICD §4 and §10): a stream is zero-filled only
 * to the next octet, so a clean stream ends in its last octet, and one that ends a whole octet or more
 * before its stated length is flagged.
 */
class QuadrantStreamLengthTest {
    /** Recorded seed of the spectra below. */
    static final long SEED = 0x5EED_121AL;
    static final long T0 = 0x7FE81780L;

    /** A spectrum-like quadrant: pedestal 256 (ICD §4), a peak, Gaussian noise; c samples. */
    static int[] quadrant(Random rnd, int c) {
        double peak = rnd.nextInt(c);
        double width = 1 + rnd.nextDouble() * c / 4.0;
        double height = Math.pow(10, 1 + 3.5 * rnd.nextDouble());
        double noise = Math.pow(10, 3 * rnd.nextDouble());
        int[] x = new int[c];
        for (int i = 0; i < c; i++) {
            double d = (i - peak) / width;
            double v = 256 + height * Math.exp(-d * d) + noise * rnd.nextGaussian();
            x[i] = (int) Math.max(0, Math.min(65535, Math.round(v)));
        }
        return x;
    }

    /** A survey spectrum packet of four coded quadrants; {@code extra} octets appended to quadrant 2's stream. */
    static byte[] packet(int seq, int[][] adc, int extra) {
        int c = adc[0].length;
        byte[][] streams = new byte[4][];
        for (int q = 0; q < 4; q++) {
            streams[q] = TestRiceEncoder.encode(adc[q]);
        }
        streams[1] = java.util.Arrays.copyOf(streams[1], streams[1].length + extra);
        return TestPackets.spectrum(0x100, seq, T0 + seq, 0, seq, 0, new int[c], new boolean[c], 0x01, streams);
    }

    private static RecordingListener decodeFramed(byte[] packet) {
        RecordingListener r = new RecordingListener();
        decodeFramed(packet, r);
        return r;
    }

    private static TelemetryDecoder decodeFramed(byte[] packet, RecordingListener r) {
        // framed and CRC'd by the test builder (CCSDS 132.0-B-3 §4.1.6), so only the packet is at fault
        FrameStreamBuilder b = new FrameStreamBuilder(1024).add(0, packet).flush(0);
        byte[] stream = b.stream();
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(), r);
        d.accept(stream, 0, stream.length);
        d.finish();
        return d;
    }

    @Test
    void shouldDecodeCleanStreamsOfTheTestEncoderToTheirSamples() {
        Random rnd = new Random(SEED);
        SpectrumPacketDecoder decoder = new SpectrumPacketDecoder(new Ccsds121QuadrantDecoder());
        for (int s = 0; s < 300; s++) {
            int c = 1 + rnd.nextInt(256); // ICD §4: c = 1..256
            int[][] adc = new int[4][];
            for (int q = 0; q < 4; q++) {
                adc[q] = quadrant(rnd, c);
            }
            byte[] p = packet(s, adc, 0);
            SpectrumResult r = decoder.decode(p, 0, p.length);
            assertTrue(r.isOk(), "spectrum " + s + ": " + r.error() + " " + r.detail());
            for (int q = 0; q < 4; q++) {
                assertArrayEquals(adc[q], r.spectrum().adcCounts()[q], "spectrum " + s + " quadrant " + (q + 1));
            }
        }
    }

    @Test
    void shouldFlagAStreamWithOneOctetMoreThanItUses() {
        Random rnd = new Random(SEED);
        int[][] adc = new int[4][];
        for (int q = 0; q < 4; q++) {
            adc[q] = quadrant(rnd, 128);
        }
        RecordingListener clean = decodeFramed(packet(7, adc, 0));
        assertEquals(1, clean.spectra.size(), "clean: " + clean.spectrumErrors);
        assertArrayEquals(adc[1], clean.spectra.get(0).adcCounts()[1]);
        // the same stream with one octet more in Lq (ICD §4: fill only to the next octet boundary)
        RecordingListener longer = new RecordingListener();
        TelemetryDecoder d = decodeFramed(packet(7, adc, 1), longer);
        assertTrue(longer.spectra.isEmpty(), "a stream that leaves an octet unused must not decode as good");
        assertEquals(java.util.List.of(SpectrumError.UNUSED_OCTETS), longer.spectrumErrors);
        assertEquals(java.util.Map.of(SpectrumError.UNUSED_OCTETS, 1L), d.stats().spectrumErrors());
    }

    @Test
    void shouldFlagARawStreamLongerThanItsSamples() {
        // ICD §4 compression 0x00: c × 2 octets exactly, no fill
        int c = 16;
        byte[][] streams = new byte[4][2 * c];
        streams[2] = new byte[2 * c + 1];
        byte[] p = TestPackets.spectrum(0x100, 1, T0, 0, 1, 0, new int[c], new boolean[c], 0x00, streams);
        assertEquals(SpectrumError.UNUSED_OCTETS,
                new SpectrumPacketDecoder(QuadrantDecompressor.UNAVAILABLE).decode(p, 0, p.length).error());
    }

    /** Mutations a frame CRC cannot see: made before the FECF was computed, or a CRC-16 escape. */
    private enum Mutation {
        /** One bit flipped anywhere in the four quadrant fields (Lq and stream). */
        BIT_IN_QUADRANTS,
        /** One bit flipped in a stream, its Lq left alone. */
        BIT_IN_STREAM,
        /** One stream octet replaced by a random one. */
        OCTET_IN_STREAM,
        /** A burst of 2..16 bits flipped in a stream. */
        BURST_IN_STREAM
    }

    /** Trials per mutation kind of the study below. */
    static final int TRIALS = 10_000;
    /** Share of the silent corruptions caught, per {@link Mutation}, in the recorded run of the study. */
    static final double[] RECORDED_CAUGHT_OF_SILENT = {0.1465, 0.1393, 0.1676, 0.1889};

    @Test
    void shouldCatchAShareOfTheCorruptionsThatDecodedSilently() {
        Random rnd = new Random(SEED + 1);
        SpectrumPacketDecoder checked = new SpectrumPacketDecoder(new Ccsds121QuadrantDecoder());
        dev.sweepline.ground.rice.RiceDecoder rice = new dev.sweepline.ground.rice.RiceDecoder(
                dev.sweepline.ground.rice.RiceSettings.basic(16, 8, Ccsds121QuadrantDecoder.REFERENCE_INTERVAL_BLOCKS));
        // the decoder as it was before the check: any stream that yields its samples is good
        SpectrumPacketDecoder unchecked = new SpectrumPacketDecoder((in, off, len, c, bits, out) -> {
            dev.sweepline.ground.rice.DecodeResult r = rice.decode(in, off, len, c, out);
            return r.ok() ? r.samplesDecoded() : QuadrantDecompressor.ERROR_CORRUPT;
        });
        int corpus = 200;
        byte[][] packets = new byte[corpus][];
        int[][][] samples = new int[corpus][4][];
        for (int s = 0; s < corpus; s++) {
            int c = 16 + rnd.nextInt(241); // ICD §4: up to 256 windows
            for (int q = 0; q < 4; q++) {
                samples[s][q] = quadrant(rnd, c);
            }
            packets[s] = packet(s, samples[s], 0);
        }
        StringBuilder table = new StringBuilder();
        double[] caughtOfSilent = new double[Mutation.values().length];
        int[] silent = new int[Mutation.values().length];
        for (Mutation m : Mutation.values()) {
            int silentBefore = 0;
            int caught = 0;
            int rejectedBefore = 0;
            int harmless = 0;
            for (int t = 0; t < TRIALS; t++) {
                int s = rnd.nextInt(corpus);
                byte[] p = mutate(packets[s], samples[s][0].length, m, rnd);
                SpectrumResult before = unchecked.decode(p, 0, p.length);
                SpectrumResult after = checked.decode(p, 0, p.length);
                if (!before.isOk()) {
                    rejectedBefore++;
                    continue;
                }
                boolean same = java.util.Arrays.deepEquals(samples[s], before.spectrum().adcCounts());
                harmless += same ? 1 : 0;
                silentBefore += same ? 0 : 1;
                if (!after.isOk()) {
                    // the only new check: nothing else may reject what the old decoder took
                    assertEquals(SpectrumError.UNUSED_OCTETS, after.error(), m + ": " + after.detail());
                    caught++;
                    assertTrue(!same, m + ": a stream that decodes its own samples must pass");
                }
            }
            caughtOfSilent[m.ordinal()] = caught / (double) silentBefore;
            silent[m.ordinal()] = silentBefore;
            table.append(String.format("%-17s rejected before %5.1f %%, harmless %4.1f %%, silent before %5.1f %%, "
                            + "caught now %5.1f %% of all = %5.2f %% of the silent ones (%d of %d)%n", m,
                    100.0 * rejectedBefore / TRIALS, 100.0 * harmless / TRIALS, 100.0 * silentBefore / TRIALS,
                    100.0 * caught / TRIALS, 100.0 * caughtOfSilent[m.ordinal()], caught, silentBefore));
        }
        System.out.print("unused-octets study, seed " + Long.toHexString(SEED + 1) + ", " + TRIALS
                + " trials each\n" + table);
        // the recorded run (seed above): the check catches about a seventh of the single-bit corruptions
        // that decoded silently, and about an eighth of all; each kind must stay within 4 binomial standard
        // deviations of its recorded share (common practice), so that a change of the decoder or of the
        // test encoder that moves it is seen
        for (Mutation m : Mutation.values()) {
            double p = RECORDED_CAUGHT_OF_SILENT[m.ordinal()];
            double sd = Math.sqrt(p * (1 - p) / silent[m.ordinal()]);
            assertEquals(p, caughtOfSilent[m.ordinal()], 4 * sd, m + ": share of the silent corruptions caught");
        }
    }

    /** A copy of {@code p} (a packet of c windows) with one mutation of kind {@code m}. */
    private static byte[] mutate(byte[] p, int c, Mutation m, Random rnd) {
        byte[] x = p.clone();
        int quadrants = 6 + 6 + SpectrumHeader.LAYOUT_1_OCTETS + (c + 3) / 4 + (c + 7) / 8 + 1;
        if (m == Mutation.BIT_IN_QUADRANTS) {
            int bit = quadrants * 8 + rnd.nextInt((x.length - quadrants) * 8);
            x[bit / 8] ^= (byte) (0x80 >>> (bit % 8));
            return x;
        }
        // a stream region: skip the Lq fields
        int q = rnd.nextInt(4);
        int at = quadrants;
        for (int k = 0; k < q; k++) {
            at += 2 + (((x[at] & 0xFF) << 8) | (x[at + 1] & 0xFF));
        }
        int lq = ((x[at] & 0xFF) << 8) | (x[at + 1] & 0xFF);
        int from = at + 2;
        switch (m) {
            case BIT_IN_STREAM -> {
                int bit = rnd.nextInt(lq * 8);
                x[from + bit / 8] ^= (byte) (0x80 >>> (bit % 8));
            }
            case OCTET_IN_STREAM -> {
                int i = from + rnd.nextInt(lq);
                x[i] = (byte) (x[i] ^ (1 + rnd.nextInt(255))); // a different octet
            }
            case BURST_IN_STREAM -> {
                int n = 2 + rnd.nextInt(15);
                int start = rnd.nextInt(Math.max(1, lq * 8 - n));
                for (int b = start; b < Math.min(lq * 8, start + n); b++) {
                    if (b == start || b == start + n - 1 || rnd.nextBoolean()) { // a burst: its ends flipped
                        x[from + b / 8] ^= (byte) (0x80 >>> (b % 8));
                    }
                }
            }
            default -> throw new IllegalStateException("unhandled mutation " + m);
        }
        return x;
    }
}
