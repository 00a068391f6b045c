package dev.sweepline.ground.decode;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.spectrum.DecodedSpectrum;
import org.junit.jupiter.api.Test;

/** Decodes the golden frames; every expected value is the one spelled out in {@link GoldenFrames}. */
class GoldenFrameDecodeTest {
    private final RecordingListener r = new RecordingListener();
    private final TelemetryDecoder d = r.decode(Hex.stream(GoldenFrames.STREAM), 128);

    @Test
    void shouldAcceptEveryGoldenFrameWithoutAnomaly() {
        DecodeStats s = d.stats();
        // six frames, MC 5..10 in sequence, VC counts in sequence (GoldenFrames)
        assertEquals(6, s.framesGood());
        assertEquals(1, s.framesIdle());
        assertTrue(s.framesBad().isEmpty());
        assertEquals(0, s.mcFramesMissing());
        assertEquals(0, s.frameGapCount());
        assertTrue(s.packetAnomalies().isEmpty(), s.packetAnomalies().toString());
        // 3 idle packets (seq 0, 1, 2) counted and dropped; 4 housekeeping, 1 spectrum
        assertEquals(3, s.packets(0x7FF));
        assertEquals(4, s.packets(0x110));
        assertEquals(1, s.packets(0x100));
        // 169 spectrum octets = 1352 bits; 4 x 38 HK octets
        assertEquals(169, s.packetOctets(0x100));
        assertEquals(152, s.packetOctets(0x110));
        assertEquals(0, s.sequenceGapCount());
    }

    @Test
    void shouldDecodeTheHousekeepingPacket() {
        HousekeepingReport h = r.housekeeping.get(0);
        // GoldenFrames.HOUSEKEEPING_WITH_IDLE_TAIL field list (ICD §5)
        assertEquals(42, h.sequenceCount());
        assertEquals(0x7FE81780L, h.time().coarseSeconds());
        assertEquals(0x4000, h.time().fine());
        assertEquals(1, h.mode());
        assertTrue(h.hvEnabled());
        assertEquals(0x00012345L, h.stepsSent());
        assertEquals(0x00012340L, h.repliesAccepted());
        assertEquals(2, h.sequenceErrors());
        assertEquals(3, h.replyTimeouts());
        assertEquals(5, h.retries());
        assertEquals(0x0102, h.surveySweeps());
        assertEquals(0x0304, h.focusSweeps());
        assertEquals(1, h.lockLosses());
        assertEquals(0x00ABCDEFL, h.telemetryOctets());
        // the three of THREE_HOUSEKEEPING_SPLIT_IDLE_1: seq 43..45 at T0 + 4, 8, 12 s
        assertEquals(45, r.housekeeping.get(3).sequenceCount());
        assertEquals(0x7FE8178CL, r.housekeeping.get(3).time().coarseSeconds());
    }

    @Test
    void shouldDecodeTheSpectrumSpanningTwoFrames() {
        assertEquals(1, r.spectra.size());
        DecodedSpectrum s = r.spectra.get(0);
        // GoldenFrames.SPECTRUM_PACKET field list (ICD §4)
        assertArrayEquals(Hex.bytes(GoldenFrames.SPECTRUM_PACKET), r.packets.get(1));
        assertEquals(0x100, s.apid());
        assertEquals(7, s.sequenceCount());
        assertEquals("2026-01-01T00:00:10.500000", s.time().isoTai());
        assertEquals(1, s.mode());
        assertTrue(s.steppedDown());
        assertFalse(s.tableChanged());
        assertEquals(0x0123, s.sweep());
        assertEquals(0, s.tableId());
        assertEquals(40, s.firstWindow());
        assertEquals(16, s.windowCount());
        assertEquals(0x2F80, s.peakQ8());
        assertEquals(47.5, s.peakWindow(), 0.0); // 0x2F80 / 256 exactly
        assertEquals(4, s.integrationPeriods());
        assertEquals(0, s.compression());
        assertArrayEquals(new int[] {0, 0, 0, 0, 0, 1, 1, 1, 2, 2, 1, 1, 0, 0, 0, 0}, s.gainRange());
        for (int i = 0; i < 16; i++) {
            assertEquals(i == 8, s.saturated()[i], "window index " + i);
            assertEquals(i == 8 ? 65535 : 256 + 100 * i, s.adcCounts()[0][i]);
            assertEquals(256 + 50 * i, s.adcCounts()[1][i]);
            assertEquals(300 + 7 * i, s.adcCounts()[2][i]);
            assertEquals(250 + i, s.adcCounts()[3][i]);
        }
    }

    @Test
    void shouldConvertTheGoldenSpectrumToAmperesAndVolts() {
        DecodedSpectrum s = r.spectra.get(0);
        // python3: (756-256) * 40e-12*32 / (65535-256) (ICD §4 "Converting to current"); 1e-12 relative:
        // the two sides round the same double operations in a different order
        assertEquals(9.804071753550145e-12, s.currentAmps()[0][5], 9.8e-24);
        // python3: (250-256) * 40e-12 / 65279: below the pedestal gives a negative current (ICD §4)
        assertEquals(-3.676526907581305e-15, s.currentAmps()[3][0], 3.7e-27);
        // the saturated window 48 reads the top of range 2: FS = 40.96 nA (ICD §4)
        assertEquals(4.096e-08, s.currentAmps()[0][8], 4.1e-20);
        // python3 sum of the four quadrants of window index 5
        assertEquals(1.6235542823879043e-11, s.totalAmps()[5], 1.6e-23);
        // python3 code = round(10*50*120**(w/128)) (ICD §4 default table), volts = 0.100150*code - 0.8
        // (ICD §8 HV calibration): windows 40 (codes 2232, 2317) and 55 (3912, 4061); 1e-9 V is round-off
        assertEquals(222.7348, s.lowVolts()[0], 1e-9);
        assertEquals(231.24755, s.highVolts()[0], 1e-9);
        assertEquals(390.9868, s.lowVolts()[15], 1e-9);
        assertEquals(405.90915, s.highVolts()[15], 1e-9);
    }
}
