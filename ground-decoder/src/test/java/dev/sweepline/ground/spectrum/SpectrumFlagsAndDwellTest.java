package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.decode.RecordingListener;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.decode.TestPackets;
import dev.sweepline.ground.instrument.BuiltInInstruments;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Spectrum packets whose flags or dwell contradict the telemetry ICD: the interleaved order (§4 flags bit 5) is
 * a focus sweep's (commands.md §4.1 focusStyle bit 1; the flight scheduler never interleaves a survey), and a
 * window integrates 1..1000 modulation periods (§4 offset 16 and a support window's field; commands.md §4.1:
 * no dwell above the limit of 1000; the description's cadence.integrationPeriods 1..1000). Each is refused
 * with its reason and a detail naming the field and value, counted, and the next packet decodes as usual.
 * And the ICD §4 step rule: every window of an interleaved or monotonic sweep of c = 1..256 has its own step.
 */
class SpectrumFlagsAndDwellTest {
    /** User data of a packet: after the 6-octet primary header and the 6-octet CUC time (ICD §3). */
    private static final int USER_DATA = 12;
    private static final long T0 = 0x7FE81780L;
    private static final int C = 8;

    private final SpectrumPacketDecoder decoder = new SpectrumPacketDecoder(QuadrantDecompressor.UNAVAILABLE);

    /** A layout-2 demo-cup spectrum of C windows, raw, flags {@code flags}, dwell {@code periods} at offset 16. */
    private static byte[] layoutTwo(int apid, int flags, int periods, int seq) {
        int[][] adc = new int[4][C];
        for (int q = 0; q < 4; q++) {
            for (int i = 0; i < C; i++) {
                adc[q][i] = 256 + 1000 * (q + 1) + i;
            }
        }
        byte[] p = TestPackets.spectrumV2(BuiltInInstruments.demoCup().id(), 16, flags, apid, seq, T0 + seq, 0, seq,
                40, new int[C], new boolean[C], adc);
        p[USER_DATA + 16] = (byte) (periods >>> 8);
        p[USER_DATA + 17] = (byte) periods;
        return p;
    }

    /** A layout-1 survey spectrum of C windows with {@code periods} at its offset 12 (ICD §4, version 1). */
    private static byte[] layoutOne(int periods, int seq) {
        byte[] p = TestPackets.spectrum(0x100, seq, T0 + seq, 0, seq, 40, new int[C], new boolean[C], new int[4][C]);
        p[USER_DATA + 12] = (byte) (periods >>> 8);
        p[USER_DATA + 13] = (byte) periods;
        return p;
    }

    private SpectrumResult decode(byte[] p) {
        return decoder.decode(p, 0, p.length);
    }

    @Test
    void shouldRefuseTheInterleavedFlagOnASurveyAndKeepItOnAFocusSpectrum() {
        SpectrumResult survey = decode(layoutTwo(0x100, 0x20, 4, 1));
        assertEquals(SpectrumError.BAD_FLAGS, survey.error(), survey.detail());
        assertTrue(survey.detail().contains("0x20") && survey.detail().contains("survey"), survey.detail());
        // stepped downward too: still the survey's contradiction
        assertEquals(SpectrumError.BAD_FLAGS, decode(layoutTwo(0x100, 0xA0, 4, 2)).error());
        // the next packet decodes: a focus spectrum in the interleaved order, and a survey without it
        SpectrumResult focus = decode(layoutTwo(0x101, 0x20, 4, 3));
        assertTrue(focus.isOk(), focus.detail());
        assertTrue(focus.spectrum().interleaved());
        assertTrue(decode(layoutTwo(0x100, 0x80, 4, 4)).isOk());
    }

    @Test
    void shouldRefuseADwellOutsideOneToAThousandPeriodsInEveryLayout() {
        for (int periods : new int[] {0, 1001, 65535}) {
            for (byte[] p : List.of(layoutTwo(0x101, 0x20, periods, 5), layoutOne(periods, 6))) {
                SpectrumResult r = decode(p);
                assertEquals(SpectrumError.BAD_DWELL, r.error(), "periods " + periods + ": " + r.detail());
                assertTrue(r.detail().contains(Integer.toString(periods)), r.detail());
                assertTrue(decode(layoutTwo(0x101, 0x20, 4, 7)).isOk(), "the next spectrum");
            }
        }
        // the limits themselves decode (T at either end of 1..1000), each window at the packet's dwell
        for (int periods : new int[] {1, 1000}) {
            SpectrumResult two = decode(layoutTwo(0x101, 0, periods, 8));
            assertTrue(two.isOk(), two.detail());
            assertEquals(periods, two.spectrum().windowPeriods()[C - 1]);
            assertTrue(decode(layoutOne(periods, 9)).isOk());
        }
    }

    @Test
    void shouldRefuseASupportWindowAboveTheDwellLimit() {
        // ICD §4 layout 3: a support window's integration periods are 1..1000
        SpectrumResult over = decoder.decode(SpectrumLayoutThreeTest.layoutThree(1, 1, 1001), 0,
                SpectrumLayoutThreeTest.layoutThree(1, 1, 1001).length);
        assertEquals(SpectrumError.BAD_SUPPORT_WINDOWS, over.error(), over.detail());
        assertTrue(over.detail().contains("1001"), over.detail());
        byte[] limit = SpectrumLayoutThreeTest.layoutThree(1, 1, 1000);
        SpectrumResult ok = decoder.decode(limit, 0, limit.length);
        assertTrue(ok.isOk(), ok.detail());
        assertEquals(1000, ok.spectrum().windowPeriods()[1]);
    }

    @Test
    void shouldCountEachRefusalAndDecodeThePacketsAfterIt() {
        FrameStreamBuilder b = new FrameStreamBuilder(1024);
        b.add(0, layoutTwo(0x100, 0x20, 4, 0)).add(0, layoutTwo(0x101, 0x20, 4, 1)).add(0, layoutTwo(0x101, 0x20, 0, 2))
                .add(0, layoutTwo(0x101, 0x20, 65535, 3)).add(0, layoutTwo(0x101, 0x20, 4, 4)).flush(0);
        byte[] stream = b.stream();
        RecordingListener r = new RecordingListener();
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), QuadrantDecompressor.UNAVAILABLE, r);
        d.accept(stream, 0, stream.length);
        d.finish();
        assertEquals(List.of(SpectrumError.BAD_FLAGS, SpectrumError.BAD_DWELL, SpectrumError.BAD_DWELL), r.spectrumErrors);
        assertEquals(Map.of(SpectrumError.BAD_FLAGS, 1L, SpectrumError.BAD_DWELL, 2L), d.stats().spectrumErrors());
        assertEquals(2, r.spectra.size());
        assertArrayEquals(new int[] {1, 4}, r.spectra.stream().mapToInt(DecodedSpectrum::sweep).toArray());
    }

    @Test
    void shouldGiveEveryWindowItsOwnStepInEitherOrderAndDirection() {
        // ICD §4: the step rule is a permutation of 0..c−1 for every c of 1..256 (a window read twice, or a step
        // with no window, would put two windows at one τ)
        for (int c = 1; c <= SpectrumPacketDecoder.MAX_WINDOWS; c++) {
            for (int flags = 0; flags < 4; flags++) {
                boolean down = (flags & 1) != 0;
                boolean interleaved = (flags & 2) != 0;
                boolean[] seen = new boolean[c];
                for (int i = 0; i < c; i++) {
                    int k = SpectrumValues.stepOf(i, c, down, interleaved);
                    assertTrue(k >= 0 && k < c && !seen[k], "c " + c + " flags " + flags + " window " + i + " step " + k);
                    seen[k] = true;
                }
            }
        }
    }
}
