package dev.sweepline.fsw.science;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SpectrumFill;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.table.WindowTable;
import org.junit.jupiter.api.Test;

/**
 * A 24-bit ADC at full scale on every window and quadrant (FORMAT.md: adc.bits up to 24): the sweep's
 * sums do not overflow and the packer writes every sample whole, raw in 3 octets (telemetry ICD §4).
 * The CCSDS 121 coding of the same spectrum with n = 24 is decoded by the ground's decoder in hw-sim's
 * {@code WideSpectrumRoundTripTest}.
 */
class WideSampleTest {
    /** Top code of a 24-bit ADC, 2^24 − 1 (FORMAT.md derived values). */
    static final int TOP = (1 << 24) - 1;
    /** The pedestal of the wide cup, counts (FORMAT.md: up to 2^bits / 4). */
    static final int PEDESTAL = 4096;

    /** An invented cup with a 24-bit ADC and three ranges 32 apart, the demo cup's HV side and defaults. */
    static InstrumentDescription wideCup() {
        return InstrumentDescription.builder()
                .identity("wide-cup", 3)
                .preamp(3, 5, 40_000L)
                .adc(24, PEDESTAL)
                .modulator(16, 100, 50_000, 6_000_000, 1000)
                .settleLimits(750, 256)
                .windows(256, 50_000, 6_000_000)
                .defaultParameters(DemoCup.parameters())
                .build();
    }

    /** Every window of a full table at the top range, every quadrant at the ADC top. */
    static Spectrum fullScale(InstrumentDescription cup) {
        Spectrum s = new Spectrum(cup);
        SpectrumFill.begin(s, 1, SweepMode.SURVEY, 0, WindowTable.CAPACITY, true, 0);
        for (int i = 0; i < WindowTable.CAPACITY; i++) {
            SpectrumFill.store(s, i, 2, 0, TOP, TOP, TOP, TOP);
        }
        SpectrumFill.end(s, 1);
        return s;
    }

    @Test
    void shouldSumAFullScaleTwentyFourBitWindowWithoutOverflow() {
        Spectrum s = fullScale(wideCup());
        // 4 quadrants × (2^24 − 1 − 4096) × 32^2 = 68 702 695 424 range-0 units, beyond an int's 2^31
        long expected = 4L * (TOP - PEDESTAL) * 1024;
        assertEquals(68_702_695_424L, expected);
        for (int i = 0; i < WindowTable.CAPACITY; i++) {
            assertEquals(expected, s.currentUnits(i));
            assertEquals(expected / 4, s.maxQuadrantUnits(i));
        }
    }

    @Test
    void shouldPackEveryTwentyFourBitSampleWholeInThreeOctets() {
        InstrumentDescription cup = wideCup();
        SpectrumPacker packer = new SpectrumPacker(false, cup);
        byte[] out = new byte[packer.maxUserDataLength()];
        int n = packer.write(fullScale(cup), 8, 0, 0, out, 0);
        int c = WindowTable.CAPACITY;
        // telemetry ICD §4 layout 2: header, ⌈c/4⌉ tags, ⌈c/8⌉ flags, compression, 4 × (2 + 3c)
        int quadrantsAt = SpectrumLayout.HEADER_LENGTH + c / 4 + c / 8 + 1;
        assertEquals(quadrantsAt + 4 * (2 + 3 * c), n);
        assertEquals(24, out[SpectrumLayout.SAMPLE_WIDTH_OFFSET]);
        assertEquals(3, BigEndian.get16(out, SpectrumLayout.INSTRUMENT_ID_OFFSET));
        for (int q = 0; q < 4; q++) {
            int p = quadrantsAt + q * (2 + 3 * c);
            assertEquals(3 * c, BigEndian.get16(out, p));
            for (int i = 0; i < c; i++) {
                assertEquals(TOP, BigEndian.get24(out, p + 2 + 3 * i), "quadrant " + q + " window " + i);
            }
        }
    }
}
