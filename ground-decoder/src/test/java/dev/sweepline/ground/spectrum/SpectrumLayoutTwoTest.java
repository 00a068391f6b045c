package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.GoldenSpectraV2;
import dev.sweepline.ground.decode.Hex;
import dev.sweepline.ground.instrument.InstrumentSet;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Layout-2 spectrum packets (telemetry ICD §4) of the golden {@link GoldenSpectraV2} vectors; every value
 * is the one spelled out there, and currents and edges are python3 from the ICD formulas with the values
 * of the description files (1e-12 relative: double round-off).
 */
class SpectrumLayoutTwoTest {
    private final SpectrumPacketDecoder decoder = new SpectrumPacketDecoder(new Ccsds121QuadrantDecoder());

    private SpectrumResult decode(String hex) {
        byte[] p = Hex.bytes(hex);
        return decoder.decode(p, 0, p.length);
    }

    private SpectrumResult decode(byte[] p) {
        return decoder.decode(p, 0, p.length);
    }

    @Test
    void shouldDecodeTheFineCupsTwentyBitRawSpectrum() {
        SpectrumResult r = decode(GoldenSpectraV2.FINE_RAW);
        assertTrue(r.isOk(), r.detail());
        DecodedSpectrum s = r.spectrum();
        assertEquals(2, s.layoutVersion());
        assertEquals(2, s.instrumentId()); // fine-cup.yaml id
        assertEquals("fine-cup", s.instrument().name());
        assertEquals(20, s.sampleBits());
        assertTrue(s.tableChanged()); // flags 0x40 (ICD §4 bit 6)
        assertFalse(s.steppedDown());
        assertEquals(0x42, s.sweep());
        assertEquals(100, s.firstWindow());
        assertEquals(10, s.windowCount());
        assertEquals(0x6A80, s.peakQ8());
        assertEquals(16, s.integrationPeriods());
        assertArrayEquals(new int[] {0, 0, 1, 1, 1, 1, 1, 0, 0, 0}, s.gainRange());
        assertTrue(s.saturated()[4]);
        assertEquals(1048575, s.adcCounts()[0][4]); // 2^20 − 1, the top code
        assertEquals(701993, s.adcCounts()[2][9]); // 2000 + 77777 × 9
        // python3 (2000+77777*9-1024)*80e-12/(2**20-1-1024) (ICD §4 current with fine-cup.yaml's ADC and FS₀)
        assertEquals(5.353201896614102e-11, s.currentAmps()[2][9], 5.4e-23);
        // range 1 (FS 80 pA × 256): python3 (1024+10000-1024)*80e-12*256/(2**20-1-1024)
        assertEquals(1.9550360793889747e-10, s.currentAmps()[0][2], 2e-22);
        // below the pedestal 1024: python3 (1000-1024)*80e-12/(2**20-1-1024)
        assertEquals(-1.832846324427164e-15, s.currentAmps()[3][0], 2e-27);
        // edges: codes round(800 × 80^(k/256)) = 4431 (k 100) and 5258 (k 110), calibrated
        // (1 − 0.001) × 0.125 V × code + 0.5 V (FORMAT.md, fine-cup.yaml): python3 553.821125 V, 657.09275 V
        assertEquals(553.821125, s.lowVolts()[0], 1e-9);
        assertEquals(657.09275, s.highVolts()[9], 1e-9);
    }

    @Test
    void shouldDecodeTwentyBitCcsds121Streams() {
        SpectrumResult raw = decode(GoldenSpectraV2.FINE_RAW);
        SpectrumResult coded = decode(GoldenSpectraV2.FINE_RICE);
        assertTrue(coded.isOk(), coded.detail());
        // GoldenSpectraV2: the same samples, coded with n = 20 (ICD §4), decoded by aec to them
        assertEquals(SpectrumPacketDecoder.COMPRESSION_CCSDS121, coded.spectrum().compression());
        for (int q = 0; q < 4; q++) {
            assertArrayEquals(raw.spectrum().adcCounts()[q], coded.spectrum().adcCounts()[q], "quadrant " + (q + 1));
        }
        assertArrayEquals(raw.spectrum().totalAmps(), coded.spectrum().totalAmps(), 0.0);
    }

    @Test
    void shouldDecodeTheDemoCupInLayoutTwo() {
        SpectrumResult r = decode(GoldenSpectraV2.DEMO_V2);
        assertTrue(r.isOk(), r.detail());
        DecodedSpectrum s = r.spectrum();
        assertEquals(1, s.instrumentId());
        assertEquals(16, s.sampleBits());
        assertEquals(DecodedSpectrum.MODE_FOCUS, s.mode());
        assertTrue(s.steppedDown()); // flags 0x80
        assertFalse(s.tableChanged());
        assertFalse(s.hasPeak()); // 0xFFFF
        assertArrayEquals(new int[] {0, 1, 2, 2}, s.gainRange());
        // ICD §4: range 2 of the demo cup, python3 (256+3000-256)*40e-12*32*32/(65535-256)
        assertEquals(1.882381776681628e-09, s.currentAmps()[0][3], 1.9e-21);
        // ICD §8: codes round(10 × 50 × 120^(k/128)) = 4716 (k 60), 5477 (k 64); 0.100150 V × code − 0.8 V
        assertEquals(471.5074, s.lowVolts()[0], 1e-9);
        assertEquals(547.72155, s.highVolts()[3], 1e-9);
    }

    @Test
    void shouldStillDecodeLayoutOneAsTheDemoCup() {
        SpectrumResult r = decode(GoldenFrames.SPECTRUM_PACKET);
        assertTrue(r.isOk(), r.detail());
        // ICD §4: layout 1 is the demo cup with 16-bit samples
        assertEquals(1, r.spectrum().layoutVersion());
        assertEquals("demo-cup", r.spectrum().instrument().name());
        assertEquals(16, r.spectrum().sampleBits());
    }

    @Test
    void shouldRefuseAnInstrumentTheGroundHasNoDescriptionFor() {
        SpectrumResult r = decode(GoldenSpectraV2.UNKNOWN_ID);
        assertEquals(SpectrumError.UNKNOWN_INSTRUMENT, r.error());
        assertTrue(r.detail().startsWith("instrument id 7: no description"), r.detail());
        // a ground configured with fine-cup alone refuses the demo cup's spectra of either layout
        SpectrumPacketDecoder fineOnly = new SpectrumPacketDecoder(new Ccsds121QuadrantDecoder(), new WindowCatalogue(),
                InstrumentSet.of(InstrumentSet.builtIns().byName("fine-cup")));
        byte[] v2 = Hex.bytes(GoldenSpectraV2.DEMO_V2);
        assertEquals(SpectrumError.UNKNOWN_INSTRUMENT, fineOnly.decode(v2, 0, v2.length).error());
        byte[] v1 = Hex.bytes(GoldenFrames.SPECTRUM_PACKET);
        SpectrumResult one = fineOnly.decode(v1, 0, v1.length);
        assertEquals(SpectrumError.UNKNOWN_INSTRUMENT, one.error());
        assertTrue(one.detail().contains("layout 1") && one.detail().contains("fine-cup (id 2)"), one.detail());
    }

    @Test
    void shouldRefuseASampleWidthOtherThanTheDescriptionsAdc() {
        SpectrumResult r = decode(GoldenSpectraV2.WRONG_WIDTH);
        assertEquals(SpectrumError.SAMPLE_WIDTH_MISMATCH, r.error());
        // fine-cup.yaml adc.bits 20; the packet says 16
        assertTrue(r.detail().contains("fine-cup (id 2)") && r.detail().contains("16") && r.detail().contains("20"),
                r.detail());
    }

    /** Offsets in FINE_RAW: user data at 12, tags at 12 + 18, the first raw sample at 30 + 3 + 2 + 1 + 2. */
    private static final int TAGS_AT = 30;
    private static final int FIRST_SAMPLE_AT = 38;

    @Test
    void shouldRefuseAGainTagBeyondTheInstrumentsRanges() {
        byte[] p = Hex.bytes(GoldenSpectraV2.FINE_RAW);
        assertEquals(0x05, p[TAGS_AT]); // tags of windows 100..103: 0, 0, 1, 1
        p[TAGS_AT] = 0x06; // window 103 tag 2: fine-cup.yaml has 2 ranges, tags 0..1 (ICD §4)
        SpectrumResult r = decode(p);
        assertEquals(SpectrumError.BAD_GAIN_RANGE, r.error());
        assertTrue(r.detail().startsWith("window 103 tag 2"), r.detail());
    }

    @Test
    void shouldRefuseARawSampleWiderThanW() {
        byte[] p = Hex.bytes(GoldenSpectraV2.FINE_RAW);
        p[FIRST_SAMPLE_AT] |= 0x10; // bit 20 of q1[0]: above 2^20 − 1 (ICD §4: w-bit samples)
        assertEquals(SpectrumError.DECOMPRESSION_FAILED, decode(p).error());
    }

    @Test
    void shouldRefuseARawStreamLongerThanItsSamples() {
        // ICD §10 for w = 20: a raw stream is c × ⌈w/8⌉ = 30 octets; quadrant 4 (the last) given 31
        byte[] good = Hex.bytes(GoldenSpectraV2.FINE_RAW);
        int lq4 = good.length - 30 - 2;
        assertEquals(30, ((good[lq4] & 0xFF) << 8) | (good[lq4 + 1] & 0xFF));
        byte[] p = Arrays.copyOf(good, good.length + 1);
        p[lq4 + 1] = 31;
        assertEquals(SpectrumError.UNUSED_OCTETS, decode(p).error());
        // and one octet short of 30: the last sample is cut
        byte[] q = Arrays.copyOf(good, good.length - 1);
        q[lq4 + 1] = 29;
        assertEquals(SpectrumError.DECOMPRESSION_FAILED, decode(q).error());
    }

    @Test
    void shouldRefuseAnUnknownLayoutAndAShortHeader() {
        byte[] p = Hex.bytes(GoldenSpectraV2.DEMO_V2);
        p[12] = (byte) 0x84; // bit 7 set, version 4: not a layout of ICD §4
        assertEquals(SpectrumError.UNKNOWN_LAYOUT, decode(p).error());
        p[12] = (byte) 0x83; // layout 3 read over a layout-2 body: octet 18 (gain tags 0x1a = 26) is no b of 1..6
        assertEquals(SpectrumError.BAD_SUPPORT_WINDOWS, decode(p).error());
        p[12] = (byte) 0x80;
        assertEquals(SpectrumError.UNKNOWN_LAYOUT, decode(p).error());
        // a layout-2 packet that ends inside its 18 fixed octets
        assertEquals(SpectrumError.LENGTH_BEYOND_DATA, decode(Arrays.copyOf(Hex.bytes(GoldenSpectraV2.DEMO_V2), 12 + 17)).error());
    }
}
